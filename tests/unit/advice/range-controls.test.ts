/**
 * lib/thermal 1.1.0 stretch controls (HeatRunOptions.controls): a held-speed cap and a held gear on one stretch
 * only. Sources: the control semantics are ours (range-controls.ts); the rpm formula is docs/model.md §3
 * (rpm = v·i_gear·i_final·60/(2π·r_dyn)); the converter factor is ModelParams.converterUnlockedFactor [E].
 */

import { describe, expect, it } from "vitest";
import {
  engineRpm,
  fixedGearSpeedLimit,
  MODEL_VERSION,
  resolveModel,
  runHeatRun,
  UTE_AND_CARAVAN,
} from "@/lib/thermal";
import { oneDescent } from "./scenarios";

const route = oneDescent(-0.08, 3000);
const { profile, descent } = route;
const range = { startM: descent.startDistanceM, endM: descent.endDistanceM };
const inRange = (d: number) => d >= range.startM && d <= range.endM;

describe("stretch controls", () => {
  it("carry the model version of the run (model 2 keeps stretch controls; changelog in constants.ts)", () => {
    expect(MODEL_VERSION).toBe("fadeline-thermal 2.0.0");
    expect(runHeatRun(profile, UTE_AND_CARAVAN, { controls: [{ ...range, gear: 2 }] }).modelVersion).toBe(MODEL_VERSION);
  });

  it("change nothing when absent or empty (same numbers as without)", () => {
    const a = runHeatRun(profile, UTE_AND_CARAVAN);
    const b = runHeatRun(profile, UTE_AND_CARAVAN, { controls: [] });
    expect(Array.from(b.trace.rotorC[0]!)).toEqual(Array.from(a.trace.rotorC[0]!));
    expect(Array.from(b.trace.speedMs)).toEqual(Array.from(a.trace.speedMs));
  });

  it("cap the held speed on the stretch only", () => {
    const cap = 30 / 3.6;
    const r = runHeatRun(profile, UTE_AND_CARAVAN, { controls: [{ ...range, speedMs: cap }] });
    const t = r.trace;
    for (let k = 0; k < t.length; k++) {
      if (inRange(t.distanceM[k]!)) expect(t.speedMs[k]!).toBeLessThanOrEqual(cap + 1e-9);
    }
    expect(t.speedMs[10]!).toBeCloseTo(90 / 3.6, 6); // the flat approach keeps the cruise cap (90 km/h default)
    expect(t.speedMs[t.length - 5]!).toBeGreaterThan(cap); // and the run-out speeds up again
  });

  it("hold the gear on the stretch, capped at its rpm limit (docs/model.md §3, gear choice)", () => {
    const r = runHeatRun(profile, UTE_AND_CARAVAN, { controls: [{ ...range, gear: 2 }] });
    const model = resolveModel(UTE_AND_CARAVAN);
    const limit = fixedGearSpeedLimit(model, 2);
    // [D] 2nd is 2.1 × 3.9 = 8.19 overall on 0.78 m tyres (r_dyn = 0.39 × 0.97 m): the limit is where rpm = 3,800
    expect(engineRpm(limit, 2.1 * 3.9, 0.78)).toBeCloseTo(3800, 6);
    const t = r.trace;
    let held = 0;
    for (let k = 1; k < t.length; k++) {
      const mid = 0.5 * (t.distanceM[k - 1]! + t.distanceM[k]!);
      if (mid > range.startM + 1 && mid < range.endM - 1 && t.gear[k]! > 0) {
        expect(t.gear[k]).toBe(2);
        expect(t.speedMs[k]!).toBeLessThanOrEqual(limit + 1e-9);
        held++;
      }
    }
    expect(held).toBeGreaterThan(200);
  });

  it("lock the converter of an automatic where a gear is held (more engine braking than the same gear unlocked)", () => {
    const fixed = runHeatRun(profile, UTE_AND_CARAVAN, { params: { gearPolicy: { kind: "fixed", gear: 2 } } });
    const held = runHeatRun(profile, UTE_AND_CARAVAN, { controls: [{ ...range, gear: 2 }] });
    const k = descent.startIndex + 150;
    expect(fixed.trace.gear[k]).toBe(2);
    expect(held.trace.gear[k]).toBe(2);
    expect(held.trace.speedMs[k]).toBeCloseTo(fixed.trace.speedMs[k]!, 9);
    // ResolvedModel: locked factor / unlocked factor = 1 / converterUnlockedFactor (0.35)
    expect(held.trace.enginePowerW[k]! / fixed.trace.enginePowerW[k]!).toBeCloseTo(1 / 0.35, 6);
    expect(held.model.lockedEngineFactor / held.model.engineFactor).toBeCloseTo(1 / 0.35, 9);
  });

  it("reject bad controls with exact messages", () => {
    const run = (controls: unknown) => () => runHeatRun(profile, UTE_AND_CARAVAN, { controls } as never);
    expect(run("x")).toThrow(new TypeError("options.controls must be an array"));
    expect(run([{ startM: 10, endM: 10 }])).toThrow(new RangeError("options.controls[0].endM must be greater than options.controls[0].startM"));
    expect(run([{ startM: 0, endM: 10, speedMs: 0 }])).toThrow(new RangeError("options.controls[0].speedMs must be greater than 0"));
    // six gears in high range and six in low range
    expect(run([{ startM: 0, endM: 10, gear: 13 }])).toThrow(new RangeError("options.controls[0].gear must be a whole number from 1 to 12"));
    expect(run([{ startM: "a", endM: 10 }])).toThrow(new TypeError("options.controls[0].startM must be a number"));
  });
});
