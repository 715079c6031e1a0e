/** The speed the driver holds: caps, curve speed, descent policy, acceleration limits, gaps. */

import { describe, expect, it } from "vitest";
import { kmhToMs, runHeatRun } from "@/lib/thermal";
import { constantGradeProfile, stretchesProfile } from "./route-helpers";
import { soloRig, uteCaravanRig } from "./rig-helpers";

describe("held speed", () => {
  it("solo: the cruise cap; towing: the lower of the cruise cap and the towing limit", () => {
    const flat = constantGradeProfile(2000, 0);
    const solo = runHeatRun(flat, soloRig(2500), { params: { cruiseSpeedMs: kmhToMs(110) } });
    expect(solo.trace.speedMs[100]).toBeCloseTo(kmhToMs(110), 10);
    const towing = runHeatRun(flat, uteCaravanRig(5500), { params: { cruiseSpeedMs: kmhToMs(110) } });
    expect(towing.trace.speedMs[100]).toBeCloseTo(kmhToMs(100), 10);
  });

  it("curve speed is √(a_lat·R) ([D] centripetal acceleration v²/R)", () => {
    const p = stretchesProfile([{ lengthM: 1000, grade: 0 }, { lengthM: 1000, grade: 0, curveRadiusM: 100 }]);
    const r = runHeatRun(p, soloRig(2500), { params: { lateralAccelMs2: 2.5 } });
    expect(r.trace.speedMs[150]).toBeCloseTo(Math.sqrt(2.5 * 100), 10);
  });

  it("descent tiers: the steepest matching tier's speed applies", () => {
    const tiers = [{ minDescentGrade: 0.04, speedMs: kmhToMs(70) }, { minDescentGrade: 0.08, speedMs: kmhToMs(50) }];
    const speedOn = (grade: number): number =>
      runHeatRun(constantGradeProfile(2000, grade), soloRig(2500), { params: { descentSpeeds: tiers } }).trace.speedMs[100]!;
    expect(speedOn(-0.02)).toBeCloseTo(kmhToMs(90), 10);
    expect(speedOn(-0.05)).toBeCloseTo(kmhToMs(70), 10);
    expect(speedOn(-0.09)).toBeCloseTo(kmhToMs(50), 10);
    expect(speedOn(0.09)).toBeCloseTo(kmhToMs(90), 10);
  });

  it("a fixed descent gear caps the descent speed at the rpm limit in that gear", () => {
    const r = runHeatRun(constantGradeProfile(2000, -0.08), soloRig(2500), {
      params: { gearPolicy: { kind: "fixed", gear: 1 }, maxRpm: 3000 },
    });
    const ratio = 3.5 * 3.9;
    const vMax = (3000 * 2 * Math.PI * 0.39 * 0.97) / (60 * ratio);
    expect(r.trace.speedMs[100]).toBeCloseTo(vMax, 8);
    expect(r.trace.gear[100]).toBe(1);
  });

  it("transitions respect the acceleration and deceleration limits: |Δ(v²)| ≤ 2·a·Δs", () => {
    const p = stretchesProfile([
      { lengthM: 1000, grade: 0 },
      { lengthM: 300, grade: 0, curveRadiusM: 40 },
      { lengthM: 1500, grade: 0 },
    ]);
    const r = runHeatRun(p, soloRig(2500), { params: { accelMs2: 0.6, decelMs2: 1.8, startFromRest: true, endAtRest: true } });
    const v = r.trace.speedMs;
    const d = r.trace.distanceM;
    for (let i = 0; i + 1 < v.length; i++) {
      const dv2 = v[i + 1]! ** 2 - v[i]! ** 2;
      const ds = d[i + 1]! - d[i]!;
      expect(dv2).toBeLessThanOrEqual(2 * 0.6 * ds + 1e-9);
      expect(-dv2).toBeLessThanOrEqual(2 * 1.8 * ds + 1e-9);
    }
    expect(v[0]).toBe(0);
    expect(v[v.length - 1]).toBe(0);
  });

  it("a gap step carries no distance, time or energy", () => {
    const p = constantGradeProfile(200, -0.1);
    p.gapAfter[5] = 1;
    const r = runHeatRun(p, soloRig(2500));
    expect(r.trace.timeS[6]).toBe(r.trace.timeS[5]);
    expect(r.trace.energy.potentialJ[6]).toBe(0);
    expect(r.trace.rotorC[0]![6]).toBe(r.trace.rotorC[0]![5]);
  });
});
