/**
 * Behaviours the trade describes (docs/trade-facts.md §2.1, brake controllers, [2nd]): override brakes push on under
 * engine braking; electric brakes are not applied by engine braking alone. Plus convoy runs, start states and
 * the optional temperature-dependent specific heat.
 */

import { describe, expect, it } from "vitest";
import { runConvoyHeatRuns, runHeatRun, summarizeDescents, timeToReachC, exactStepC, UTE_AND_CARAVAN, WAGON_AND_CAMPER } from "@/lib/thermal";
import { constantGradeProfile } from "./route-helpers";
import { uteCaravanRig } from "./rig-helpers";

const descent = constantGradeProfile(3000, -0.05);
const trailerWork = (brakeType: "override" | "electric"): number => {
  const rig = uteCaravanRig(5500, { brakeType });
  const r = runHeatRun(descent, rig, { params: { engineBrakingPowerW: 500_000 } });
  return summarizeDescents(r, [{ startM: 0, endM: 3000 }])[0]!.energy.brakeJ.trailer;
};

describe("trailer brakes under engine braking alone (docs/trade-facts.md §2.1 [2nd])", () => {
  it("electric brakes stay off when the engine holds the speed", () => expect(trailerWork("electric")).toBe(0));
  it("override brakes push on and heat the trailer", () => expect(trailerWork("override")).toBeGreaterThan(1e6));
});

describe("convoy and start state", () => {
  it("a convoy run gives the same result as separate runs", () => {
    const [a, b] = runConvoyHeatRuns(descent, [UTE_AND_CARAVAN, WAGON_AND_CAMPER]);
    expect(Array.from(a!.trace.rotorC[0]!)).toEqual(Array.from(runHeatRun(descent, UTE_AND_CARAVAN).trace.rotorC[0]!));
    expect(b!.finalState).toEqual(runHeatRun(descent, WAGON_AND_CAMPER).finalState);
  });
  it("continuing from a final state equals one run over both halves", () => {
    const whole = runHeatRun(constantGradeProfile(2000, -0.08), UTE_AND_CARAVAN);
    const first = runHeatRun(constantGradeProfile(1000, -0.08), UTE_AND_CARAVAN);
    const second = runHeatRun(constantGradeProfile(1000, -0.08, 10, 920), UTE_AND_CARAVAN, { startState: first.finalState });
    second.finalState.rotorC.forEach((t, j) => expect(t).toBeCloseTo(whole.finalState.rotorC[j]!, 6));
  });
  it("rejects a start state of the wrong size", () => {
    expect(() => runHeatRun(descent, UTE_AND_CARAVAN, { startState: { rotorC: [25], fluidC: [25] } })).toThrow(
      new RangeError("options.startState must have one entry per brake position"),
    );
  });
});

describe("specific heat", () => {
  it("c(T) rising with temperature gives lower peaks than the conservative constant c (docs/model.md §6.4)", () => {
    const peak = (variableSpecificHeat: boolean): number =>
      Math.max(...runHeatRun(constantGradeProfile(6000, -0.09), UTE_AND_CARAVAN, { params: { variableSpecificHeat } }).trace.rotorC[0]!);
    expect(peak(true)).toBeLessThan(peak(false));
  });
});

describe("time to a limit under constant heat ([D] docs/model.md §7 closed form)", () => {
  it("t = −τ·ln(1 − (T_lim − T0)/(T_ss − T0)) lands exactly on the limit; Infinity when T_ss ≤ T_lim", () => {
    const t = timeToReachC(100, 120, 25, 2000, 20, 4600);
    expect(exactStepC(100, 25, 2000, 20, 4600, t)).toBeCloseTo(120, 9);
    expect(timeToReachC(100, 130, 25, 2000, 20, 4600)).toBe(Infinity);
  });
});
