/**
 * Range checks against facts from practice (docs/validation.md §4). These are COMMON PRACTICE, NO PUBLISHED SOURCE:
 * rotors can pass 300 °C when towing down a long, steep hill; about 600 °C is extreme race-track territory;
 * a stock dual-cab ute stopped from 80 km/h in 42.5 m (5.81 m/s²); with about 500 kg of accessories and bigger
 * tyres it needed about 57 m (4.33 m/s²).
 */

import { describe, expect, it } from "vitest";
import { kmhToMs, runHeatRun, summarizeDescents, type TowVehicle } from "@/lib/thermal";
import { constantGradeProfile } from "./route-helpers";
import { BARE, soloRig, uteCaravanRig } from "./rig-helpers";

/** The 6-tonne ute and caravan with an exhaust brake; `locked` = manual mode (converter locked). */
function sixTonne(locked: boolean): ReturnType<typeof uteCaravanRig> {
  const vehicle: Partial<TowVehicle> = {
    engine: { displacementM3: 0.0028, fuel: "diesel", brakeMode: "exhaust-brake" },
    transmission: { preset: "generic-6-speed-automatic", converterLocked: locked },
  };
  return uteCaravanRig(6000, {}, vehicle);
}

function peakFront(grade: number, lengthM: number, gear: number, kmh: number, locked: boolean): number {
  const r = runHeatRun(constantGradeProfile(lengthM, grade), sixTonne(locked), {
    params: { gearPolicy: { kind: "fixed", gear }, descentSpeeds: [{ minDescentGrade: 0.04, speedMs: kmhToMs(kmh) }] },
  });
  return summarizeDescents(r, [{ startM: 0, endM: lengthM }])[0]!.positions[0]!.peakC;
}

describe("six-tonne ute and caravan on a long 8–10 % descent (common practice, no published source)", () => {
  it("with only light engine braking (top gear, converter unlocked, 60 km/h) the front rotors pass 300 °C", () => {
    expect(peakFront(-0.08, 6000, 6, 60, false)).toBeGreaterThan(300);
    expect(peakFront(-0.1, 6000, 6, 60, false)).toBeGreaterThan(300);
  });

  it("but stay under the ≈ 600 °C of race-track territory on 6 km of 8 %", () => {
    expect(peakFront(-0.08, 6000, 6, 60, false)).toBeLessThan(600);
  });

  it("in a low gear (first, locked, exhaust brake, 35 km/h) they stay well below 300 °C", () => {
    expect(peakFront(-0.08, 6000, 1, 35, true)).toBeLessThan(225);
    expect(peakFront(-0.09, 6000, 1, 35, true)).toBeLessThan(250);
  });
});

describe("stopping from 80 km/h (common practice, no published source)", () => {
  for (const [label, metres, decel] of [["stock ute", 42.5, 5.81], ["with 500 kg of accessories", 57, 4.33]] as const) {
    it(`${label}: ${metres} m is a mean deceleration of ${decel} m/s², and the model brakes over that distance`, () => {
      expect(kmhToMs(80) ** 2 / (2 * metres)).toBeCloseTo(decel, 2);
      const r = runHeatRun(constantGradeProfile(500, 0, 0.5), soloRig(2600), {
        params: { ...BARE, cruiseSpeedMs: kmhToMs(80), decelMs2: kmhToMs(80) ** 2 / (2 * metres), endAtRest: true },
      });
      const firstSlow = r.trace.speedMs.findIndex((v) => v < kmhToMs(80) - 1e-9);
      expect(500 - r.trace.distanceM[firstSlow]!).toBeGreaterThanOrEqual(metres - 0.5);
      expect(500 - r.trace.distanceM[firstSlow]!).toBeLessThanOrEqual(metres);
    });
  }
});
