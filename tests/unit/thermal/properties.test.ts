/**
 * Property tests of the heat run (docs/validation.md §3): energy conservation, monotonicity, step-size independence, no
 * temperature below ambient. Basis: plain physics [D] (first law; the lumped ODE's exact solution).
 */

import { describe, expect, it } from "vitest";
import { kmhToMs, runHeatRun, summarizeDescents, UTE_AND_CARAVAN, type HeatRunResult } from "@/lib/thermal";
import { constantGradeProfile, longMixedProfile } from "./route-helpers";
import { uteCaravanRig } from "./rig-helpers";

const peakFront = (r: HeatRunResult): number => Math.max(...r.trace.rotorC[0]!);
/** Fixed engine braking keeps gear choice from masking a trend. */
const STEADY = { engineBrakingPowerW: 10_000 };

describe("energy conservation ([D] first law)", () => {
  const profile = longMixedProfile(60_000);

  it("adiabatic brakes store exactly the rotor share of the brake work (0.1 %)", () => {
    const r = runHeatRun(profile, UTE_AND_CARAVAN, { params: { coolingFactor: 0, emissivity: 0 } });
    r.positions.forEach((p, j) => {
      const col = r.trace.rotorC[j]!;
      const stored = p.wheels * p.massKg * p.specificHeat * (col[col.length - 1]! - col[0]!);
      const work = r.trace.energy.brakeJ[j]!.reduce((a, b) => a + b, 0);
      expect(Math.abs(stored - p.rotorPartition * work) / work).toBeLessThan(1e-3);
    });
  });

  it("the energy account balances: potential + kinetic + drive = aero + rolling + engine + brakes", () => {
    const r = runHeatRun(profile, UTE_AND_CARAVAN);
    for (const range of [{ startM: 0, endM: 60_000 }, { startM: 11_000, endM: 17_000 }]) {
      const [s] = summarizeDescents(r, [range]);
      const e = s!.energy;
      const parts = e.aeroJ + e.rollingJ + e.engineJ + e.brakeJ.front + e.brakeJ.rear + e.brakeJ.trailer;
      expect(Math.abs(e.potentialJ + e.kineticJ + e.driveJ - parts) / e.inJ).toBeLessThan(1e-9);
      expect(e.outJ).toBeCloseTo(parts, 3);
    }
  });

  it("potential energy released over the whole route is m·g·Δh", () => {
    const r = runHeatRun(profile, UTE_AND_CARAVAN);
    const [s] = summarizeDescents(r, [{ startM: 0, endM: 60_000 }]);
    const e = profile.elevationM;
    expect(s!.energy.potentialJ).toBeCloseTo(r.model.massKg * 9.80665 * (e[0]! - e[e.length - 1]!), 0);
  });
});

describe("monotonicity", () => {
  const profile = constantGradeProfile(5000, -0.08);

  it("front temperature rises with mass", () => {
    const peaks = [5000, 5500, 6000].map((m) => peakFront(runHeatRun(profile, uteCaravanRig(m), { params: STEADY })));
    expect(peaks[0]!).toBeLessThan(peaks[1]!);
    expect(peaks[1]!).toBeLessThan(peaks[2]!);
  });

  it("front temperature rises with grade", () => {
    const peaks = [-0.06, -0.08, -0.1].map((g) =>
      peakFront(runHeatRun(constantGradeProfile(5000, g), uteCaravanRig(5500), { params: STEADY })));
    expect(peaks[0]!).toBeLessThan(peaks[1]!);
    expect(peaks[1]!).toBeLessThan(peaks[2]!);
  });

  it("front temperature rises with the held descent speed (fixed split: fade feedback moves heat between positions)", () => {
    const peaks = [40, 55, 70].map((kmh) =>
      peakFront(runHeatRun(profile, uteCaravanRig(5500), {
        params: { ...STEADY, fadeFeedback: false, descentSpeeds: [{ minDescentGrade: 0.04, speedMs: kmhToMs(kmh) }] },
      })));
    expect(peaks[0]!).toBeLessThan(peaks[1]!);
    expect(peaks[1]!).toBeLessThan(peaks[2]!);
  });

  it("front temperature falls as the trailer controller gain rises", () => {
    const peaks = [0, 0.5, 1].map((k) =>
      peakFront(runHeatRun(profile, uteCaravanRig(5500), { params: { ...STEADY, trailerGain: k } })));
    expect(peaks[0]!).toBeGreaterThan(peaks[1]!);
    expect(peaks[1]!).toBeGreaterThan(peaks[2]!);
  });

  it("front temperature falls as cooling rises", () => {
    const peaks = [0.5, 1, 2].map((f) =>
      peakFront(runHeatRun(profile, uteCaravanRig(5500), { params: { ...STEADY, coolingFactor: f } })));
    expect(peaks[0]!).toBeGreaterThan(peaks[1]!);
    expect(peaks[1]!).toBeGreaterThan(peaks[2]!);
  });
});

describe("step-size independence with constant inputs ([D] exact step composes exactly)", () => {
  const final = (stepM: number, emissivity: number): number => {
    const r = runHeatRun(constantGradeProfile(4000, -0.07, stepM), uteCaravanRig(5500), {
      params: { ...STEADY, emissivity, fadeFeedback: false },
    });
    const col = r.trace.rotorC[0]!;
    return col[col.length - 1]!;
  };

  it("convection only: 5 m, 20 m and 100 m steps agree to 1e-4 K (rounding only)", () => {
    const t5 = final(5, 0);
    expect(final(20, 0)).toBeCloseTo(t5, 4);
    expect(final(100, 0)).toBeCloseTo(t5, 4);
  });

  it("with radiation (linearised at each step start): agree within 0.5 K", () => {
    const t5 = final(5, 0.55);
    expect(Math.abs(final(20, 0.55) - t5)).toBeLessThan(0.5);
    expect(Math.abs(final(100, 0.55) - t5)).toBeLessThan(0.5);
  });
});

describe("temperature never drops below ambient when starting at ambient", () => {
  it("holds for every position and sample over a mixed 60 km route", () => {
    const r = runHeatRun(longMixedProfile(60_000), UTE_AND_CARAVAN, { params: { ambientC: 12 } });
    for (const col of r.trace.rotorC) expect(Math.min(...col)).toBeGreaterThanOrEqual(12 - 1e-9);
    for (const col of r.trace.fluidC) if (!Number.isNaN(col[0]!)) expect(Math.min(...col)).toBeGreaterThanOrEqual(12 - 1e-9);
  });
});
