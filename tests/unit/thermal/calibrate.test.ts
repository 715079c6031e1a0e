/** Calibration from brake readings (lib/thermal/calibrate.ts): recovery, flagging, one versus several readings. */

import { describe, expect, it } from "vitest";
import {
  calibrate,
  coolBrakeAtStandstill,
  prepareRoute,
  runPrepared,
  UTE_AND_CARAVAN,
  type BrakeReading,
  type HeatRunOptions,
} from "@/lib/thermal";
import { stretchesProfile } from "./route-helpers";

// Flat, an 8 % descent (a stop at its bottom), a flat, a 6 % descent (a stop at its bottom), a flat.
const route = prepareRoute(
  stretchesProfile([
    { lengthM: 1000, grade: 0 },
    { lengthM: 4000, grade: -0.08 },
    { lengthM: 1000, grade: 0 },
    { lengthM: 5000, grade: -0.06 },
    { lengthM: 3000, grade: 0 },
  ]),
);
const TRUTH = { coolingFactor: 1.4, engineBrakingScale: 0.8 };

/**
 * Readings as the model itself gives them with the true factors: the rig stops at each place (1 s for a
 * reading at once, else the minutes), and a reading after some minutes is cooled at standstill.
 */
function modelReadings(spec: Omit<BrakeReading, "tempC">[], options: HeatRunOptions = {}): BrakeReading[] {
  const stand = new Map<number, number>();
  for (const r of spec) stand.set(r.atM, Math.max(stand.get(r.atM) ?? 0, 60 * (r.minutesAfterStop ?? 0)));
  const stops = [...stand].map(([atM, s]) => ({ atM, durationS: Math.max(1, s) }));
  const run = runPrepared(route, UTE_AND_CARAVAN, { ...options, params: { ...options.params, ...TRUTH }, stops });
  return spec.map((r) => {
    const j = run.positions.findIndex((p) => p.position === r.position);
    const k = Math.round(r.atM / 10);
    const arrival = run.trace.rotorC[j]![k]!;
    const minutes = r.minutesAfterStop ?? 0;
    const tempC = minutes > 0 ? coolBrakeAtStandstill(run.positions[j]!, arrival, run.model.params.ambientC, 60 * minutes) : arrival;
    return { ...r, tempC };
  });
}

const SEVERAL = modelReadings([
  { position: "front", atM: 5000 },
  { position: "trailer", atM: 5000 },
  { position: "rear", atM: 5000, minutesAfterStop: 12 },
  { position: "front", atM: 11_000 },
  { position: "trailer", atM: 11_000, minutesAfterStop: 8 },
]);

describe("calibrate", () => {
  it("recovers known factors from readings the model made with them", () => {
    const fit = calibrate(route, UTE_AND_CARAVAN, SEVERAL);
    expect(fit.fittedParameters).toEqual(["coolingFactor", "engineBrakingScale"]);
    expect(fit.fitted.coolingFactor).toBeGreaterThan(1.4 * 0.97);
    expect(fit.fitted.coolingFactor).toBeLessThan(1.4 * 1.03);
    expect(fit.fitted.engineBrakingScale).toBeGreaterThan(0.8 * 0.97);
    expect(fit.fitted.engineBrakingScale).toBeLessThan(0.8 * 1.03);
    expect(fit.flagged).toEqual([]);
    expect(fit.rmsAfterK).toBeLessThan(1);
    expect(fit.rmsBeforeK).toBeGreaterThan(10);
    expect(fit.runs).toBeLessThan(90);
    for (const r of fit.readings) {
      expect(r.residualK).toBeCloseTo(r.tempC - r.modelAfterC, 9);
      expect(Math.abs(r.residualK)).toBeLessThan(2);
    }
  });

  it("model-before is the run with the rig's own factors", () => {
    const fit = calibrate(route, UTE_AND_CARAVAN, SEVERAL);
    const own = modelReadingsWith({ coolingFactor: 1, engineBrakingScale: 1 });
    fit.readings.forEach((r, i) => expect(r.modelBeforeC).toBeCloseTo(own[i]!, 6));
  });

  it("flags a reading no parameter set can explain and leaves it out of the fit", () => {
    const impossible: BrakeReading[] = [
      { position: "front", atM: 900, tempC: 900 }, // on the flat before the first descent
      { position: "rear", atM: 5000, tempC: 5 }, // 20 °C below the 25 °C air
    ];
    const fit = calibrate(route, UTE_AND_CARAVAN, [...SEVERAL, ...impossible]);
    expect(fit.flagged.map((f) => f.reading)).toEqual(impossible);
    expect(fit.flagged[0]!.reason).toMatch(/^hotter than any heat run/);
    expect(fit.flagged[0]!.reachableC!.maxC).toBeLessThan(200);
    expect(fit.flagged[1]!.reason).toMatch(/^cooler than the air/);
    expect(fit.readings).toHaveLength(SEVERAL.length);
    expect(fit.fitted.coolingFactor).toBeCloseTo(1.4, 1);
    expect(fit.notes.join(" ")).toContain("2 readings left out");
  });

  it("flags a reading far below what the model reaches on a descent", () => {
    const fit = calibrate(route, UTE_AND_CARAVAN, [...SEVERAL, { position: "front", atM: 11_000, tempC: 40 }]);
    expect(fit.flagged).toHaveLength(1);
    expect(fit.flagged[0]!.reason).toMatch(/^cooler than any heat run/);
  });

  it("fits cooling alone from one reading, and several readings fit better than one", () => {
    const one = calibrate(route, UTE_AND_CARAVAN, [SEVERAL[3]!]);
    expect(one.fittedParameters).toEqual(["coolingFactor"]);
    expect(one.fitted.engineBrakingScale).toBe(1);
    expect(one.notes[0]).toMatch(/cooling factor alone/);
    expect(one.rmsAfterK).toBeLessThan(1);
    const several = calibrate(route, UTE_AND_CARAVAN, SEVERAL);
    // Judged on every reading: the one-reading fit explains its own reading but not the others.
    const heldOut = (f: typeof one) => {
      const v = modelReadingsWith(f.fitted);
      return Math.sqrt(SEVERAL.reduce((a, r, i) => a + (r.tempC - v[i]!) ** 2, 0) / SEVERAL.length);
    };
    expect(heldOut(several)).toBeLessThan(heldOut(one) / 3);
    expect(Math.abs(several.fitted.coolingFactor - 1.4)).toBeLessThan(Math.abs(one.fitted.coolingFactor - 1.4));
  });

  it("rejects no readings and a reading that is not a number", () => {
    expect(() => calibrate(route, UTE_AND_CARAVAN, [])).toThrow(RangeError);
    expect(() => calibrate(route, UTE_AND_CARAVAN, [{ position: "front", atM: 100, tempC: Number.NaN }])).toThrow(
      "readings[0].tempC must be a finite number",
    );
  });
});

/** @private The model's value at each of SEVERAL's places with given factors (same stops as the readings). */
function modelReadingsWith(factors: { coolingFactor: number; engineBrakingScale: number }): number[] {
  const stops = [{ atM: 5000, durationS: 720 }, { atM: 11_000, durationS: 480 }];
  const run = runPrepared(route, UTE_AND_CARAVAN, { params: factors, stops });
  return SEVERAL.map((r) => {
    const j = run.positions.findIndex((p) => p.position === r.position);
    const arrival = run.trace.rotorC[j]![Math.round(r.atM / 10)]!;
    const m = r.minutesAfterStop ?? 0;
    return m > 0 ? coolBrakeAtStandstill(run.positions[j]!, arrival, run.model.params.ambientC, 60 * m) : arrival;
  });
}
