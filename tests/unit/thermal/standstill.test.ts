/** Cool-down stops: state cooling, time to a target, heat soak of the fluid proxy, stops inside a heat run. */

import { describe, expect, it } from "vitest";
import {
  coolStateAtStandstill,
  runHeatRun,
  standstillTimeToReach,
  summarizeDescents,
  timeToCoolAtStandstillS,
  UTE_AND_CARAVAN,
} from "@/lib/thermal";
import { constantGradeProfile } from "./route-helpers";

describe("standstill cooling of a rig's state", () => {
  const hot = runHeatRun(constantGradeProfile(6000, -0.09), UTE_AND_CARAVAN);
  const state = hot.finalState;
  const ta = hot.model.params.ambientC;

  it("cools every rotor, never below ambient, and the time to a target matches the cooling", () => {
    const cooled = coolStateAtStandstill(state, hot.positions, ta, 1200, 0.4, 600);
    cooled.rotorC.forEach((t, j) => {
      expect(t).toBeLessThan(state.rotorC[j]!);
      expect(t).toBeGreaterThan(ta);
    });
    const { durationS, perPositionS } = standstillTimeToReach(state, hot.positions, 150, ta);
    expect(durationS).toBe(Math.max(...perPositionS));
    const after = coolStateAtStandstill(state, hot.positions, ta, durationS, 0.4, 600);
    expect(Math.max(...after.rotorC)).toBeCloseTo(150, 0);
  });

  it("a target at or below ambient is never reached; one already met takes no time", () => {
    expect(timeToCoolAtStandstillS(hot.positions[0]!, 300, ta, ta)).toBe(Infinity);
    expect(timeToCoolAtStandstillS(hot.positions[0]!, 100, 150, ta)).toBe(0);
  });

  it("the fluid proxy keeps rising for a while after stopping (heat soak; unvalidated)", () => {
    const soak = coolStateAtStandstill(state, hot.positions, ta, 120, 0.4, 600);
    expect(soak.fluidC[0]!).toBeGreaterThan(state.fluidC[0]!);
  });
});

describe("cool-down stops inside a heat run", () => {
  const profile = constantGradeProfile(10_000, -0.08);
  const plain = runHeatRun(profile, UTE_AND_CARAVAN);
  const stopped = runHeatRun(profile, UTE_AND_CARAVAN, { stops: [{ atM: 5000, durationS: 900 }] });

  it("the rig slows to a standstill at the stop and the stop adds its time", () => {
    expect(stopped.trace.speedMs[500]).toBe(0);
    expect(stopped.trace.stopS[500]).toBe(900);
    expect(stopped.trace.timeS[501]! - stopped.trace.timeS[500]!).toBeGreaterThan(900);
  });

  it("the brakes leave the stop cooler and end the descent cooler", () => {
    expect(stopped.trace.rotorC[0]![501]!).toBeLessThan(stopped.trace.rotorC[0]![500]!);
    const end = (r: typeof plain): number => r.trace.rotorC[0]![r.trace.length - 1]!;
    expect(end(stopped)).toBeLessThan(end(plain));
  });

  it("time above thresholds counts the part of the stop still above them", () => {
    const [s] = summarizeDescents(stopped, [{ startM: 0, endM: 10_000 }]);
    const [p] = summarizeDescents(plain, [{ startM: 0, endM: 10_000 }]);
    expect(s!.positions[0]!.timeWarmOrAboveS).toBeGreaterThan(0);
    expect(s!.durationS).toBeGreaterThan(p!.durationS + 900);
  });
});
