/** Uncertainty bands (lib/thermal/ensemble.ts): sampling, containment of the nominal run, peak bands. */

import { describe, expect, it } from "vitest";
import {
  BAND_RANGES,
  bandMemberParams,
  coarsenRoute,
  latinHypercube,
  MID_SIZE_UTE,
  peakBand,
  prepareRoute,
  runBand,
  runPrepared,
  UTE_AND_CARAVAN,
  type Rig,
} from "@/lib/thermal";
import { stretchesProfile } from "./route-helpers";

// A flat lead-in, an 8 % descent of 4 km with a curve, a short flat and a 6 % descent, then a flat run-out.
const profile = stretchesProfile([
  { lengthM: 1500, grade: 0 },
  { lengthM: 4000, grade: -0.08, curveRadiusM: 90 },
  { lengthM: 800, grade: 0 },
  { lengthM: 3000, grade: -0.06 },
  { lengthM: 2000, grade: 0 },
]);
const route = prepareRoute(profile);
const UTE_ALONE: Rig = { vehicle: MID_SIZE_UTE, load: { occupantsKg: 160, vehiclePayloadKg: 300, trailerLoadKg: 0 } };

describe("latinHypercube", () => {
  it("puts exactly one point in each stratum of every dimension", () => {
    const pts = latinHypercube(8, 6);
    for (let d = 0; d < 6; d++) {
      expect(pts.map((p) => Math.floor(p[d]! * 8)).sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    }
  });
  it("is deterministic and does not repeat one ordering in every dimension", () => {
    expect(latinHypercube(8, 6)).toEqual(latinHypercube(8, 6));
    const pts = latinHypercube(8, 6);
    const orders = Array.from({ length: 6 }, (_, d) => pts.map((p) => p[d]).join(","));
    expect(new Set(orders).size).toBe(6);
  });
});

describe("bandMemberParams", () => {
  it("moves each parameter within its range around the resolved value", () => {
    const nominal = runPrepared(route, UTE_AND_CARAVAN, { params: { coolingFactor: 1.2 } });
    const { ranges, members } = bandMemberParams(nominal.model.params, true);
    expect(Object.keys(ranges).sort()).toEqual(Object.keys(BAND_RANGES).sort());
    for (const m of members) {
      expect(m.coolingFactor!).toBeGreaterThanOrEqual(1.2 * 0.5);
      expect(m.coolingFactor!).toBeLessThanOrEqual(1.2 * 1.5);
      expect(Math.abs(m.frontShare! - nominal.model.params.frontShare!)).toBeLessThanOrEqual(0.07 + 1e-12);
      expect(m.rotorPartition!).toBeGreaterThanOrEqual(0.85 - 1e-12);
      expect(m.rotorPartition!).toBeLessThanOrEqual(1);
      expect(m.trailerGain!).toBeGreaterThanOrEqual(0.5 - 1e-12);
      expect(m.trailerGain!).toBeLessThanOrEqual(1.3 + 1e-12);
    }
  });
  it("leaves the trailer gain alone for a rig without trailer brakes", () => {
    const band = runBand(route, UTE_ALONE);
    expect(band.ranges.trailerGain).toBeUndefined();
    expect(band.memberParams.every((m) => m.trailerGain === undefined)).toBe(true);
    expect(band.lowC).toHaveLength(2);
  });
});

describe("runBand", () => {
  const band = runBand(route, UTE_AND_CARAVAN);
  const nominal = runPrepared(route, UTE_AND_CARAVAN, {});

  it("contains the nominal run at every sample of every position", () => {
    expect(band.lowC).toHaveLength(nominal.positions.length);
    nominal.trace.rotorC.forEach((col, j) => {
      expect(band.lowC[j]!.length).toBe(col.length);
      for (let i = 0; i < col.length; i++) {
        expect(band.lowC[j]![i]!).toBeLessThanOrEqual(col[i]!);
        expect(band.highC[j]![i]!).toBeGreaterThanOrEqual(col[i]!);
      }
    });
  });

  it("is around the nominal run itself, which it reuses when given", () => {
    expect(Array.from(band.nominal.trace.rotorC[0]!)).toEqual(Array.from(nominal.trace.rotorC[0]!));
    const again = runBand(route, UTE_AND_CARAVAN, {}, {}, nominal);
    expect(again.nominal).toBe(nominal);
    expect(Array.from(again.highC[0]!)).toEqual(Array.from(band.highC[0]!));
  });

  it("opens up on the descents and is closed at the start, before any braking", () => {
    expect(band.highC[0]![0]! - band.lowC[0]![0]!).toBeCloseTo(0, 6);
    const bottom = 550; // end of the 8 % descent at 10 m
    const width = band.highC[0]![bottom]! - band.lowC[0]![bottom]!;
    expect(width).toBeGreaterThan(20);
    expect(band.highC[0]![bottom]!).toBeGreaterThan(nominal.trace.rotorC[0]![bottom]! + 5);
    expect(band.lowC[0]![bottom]!).toBeLessThan(nominal.trace.rotorC[0]![bottom]! - 5);
  });

  it("widens with wider ranges and narrows to the nominal run with none", () => {
    const none = runBand(route, UTE_AND_CARAVAN, {}, {
      ranges: Object.fromEntries(Object.keys(BAND_RANGES).map((k) => [k, { kind: "offset", lo: 0, hi: 0 }])) as never,
    });
    for (let i = 0; i < route.n; i += 37) expect(none.highC[0]![i]! - none.lowC[0]![i]!).toBeCloseTo(0, 6);
    const wide = runBand(route, UTE_AND_CARAVAN, {}, { ranges: { ...BAND_RANGES, coolingFactor: { kind: "scale", lo: 0.3, hi: 2 } } });
    expect(wide.highC[0]![550]! - wide.lowC[0]![550]!).toBeGreaterThan(band.highC[0]![550]! - band.lowC[0]![550]!);
  });

  it("spans the members at the coarse samples when the percentiles are 0 and 1", () => {
    const full = runBand(route, UTE_AND_CARAVAN, {}, { lowPercentile: 0, highPercentile: 1 });
    const coarse = coarsenRoute(route, 5);
    for (const q of [0, 60, 110, 200, coarse.n - 1]) {
      const i = Math.round(coarse.profile.distanceM[q]! / 10);
      const offsets = full.coarse.memberC.map((m) => m[0]![q]! - full.coarse.nominalC[0]![q]!);
      const nom = nominal.trace.rotorC[0]![i]!;
      expect(full.lowC[0]![i]!).toBeCloseTo(nom + Math.min(0, ...offsets), 6);
      expect(full.highC[0]![i]!).toBeCloseTo(nom + Math.max(0, ...offsets), 6);
    }
  });

  it("members follow the run's options (a long stop cools every member)", () => {
    const stopped = runBand(route, UTE_AND_CARAVAN, { stops: [{ atM: 5500, durationS: 3600 }] });
    const after = 560; // just past the stop
    expect(stopped.highC[0]![after]!).toBeLessThan(band.highC[0]![after]! - 50);
  });

  it("rejects settings it cannot use", () => {
    expect(() => runBand(route, UTE_AND_CARAVAN, {}, { members: 1 })).toThrow(RangeError);
    expect(() => runBand(route, UTE_AND_CARAVAN, {}, { lowPercentile: 0.9, highPercentile: 0.1 })).toThrow(RangeError);
  });
});

describe("peakBand", () => {
  const band = runBand(route, UTE_AND_CARAVAN);
  it("brackets the nominal peak of the whole route and of one descent", () => {
    band.nominal.positions.forEach((_, j) => {
      const whole = peakBand(band, j);
      const col = band.nominal.trace.rotorC[j]!;
      expect(whole.peakC).toBe(Math.max(...col));
      expect(whole.lowC).toBeLessThanOrEqual(whole.peakC);
      expect(whole.highC).toBeGreaterThanOrEqual(whole.peakC);
      const second = peakBand(band, j, 6300, 9300);
      expect(second.atM).toBeGreaterThanOrEqual(6300);
      expect(second.atM).toBeLessThanOrEqual(9300);
      expect(second.lowC).toBeLessThanOrEqual(second.peakC);
      expect(second.highC).toBeGreaterThanOrEqual(second.peakC);
    });
    const front = peakBand(band, 0);
    expect(front.highC - front.lowC).toBeGreaterThan(20);
  });
  it("rejects a position the rig lacks and an empty stretch", () => {
    expect(() => peakBand(band, 5)).toThrow(RangeError);
    expect(() => peakBand(band, 0, 1e9, 2e9)).toThrow(RangeError);
  });
});
