/**
 * The check cases C1–C16 of docs/validation.md §1. Each names its basis beside it: [D] plain physics worked
 * from the stated inputs, [M] a constant or formula from memory (marked), [S] a public source.
 * g = 9.80665 m/s² throughout.
 */

import { describe, expect, it } from "vitest";
import {
  coolBrakeAtStandstill,
  exactStepC,
  fahrenheitToCelsius,
  heatPartitionRotor,
  hpPerFahrenheitToWPerK,
  isaAirDensity,
  kmhToMs,
  lbToKg,
  motoringPowerW,
  mphToMs,
  radiationCoefficient,
  runHeatRun,
  summarizeDescents,
  timeToCoolAtStandstillS,
  CAST_IRON_PROPERTIES,
  ORGANIC_PAD_PROPERTIES,
  SEMI_METALLIC_PAD_PROPERTIES,
  STANDARD_GRAVITY,
  type BrakePositionSpec,
} from "@/lib/thermal";
import { constantGradeProfile, stretchesProfile } from "./route-helpers";
import { BARE, soloRig } from "./rig-helpers";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
/** 1 BTU (International Table) = 1055.05585262 J, exact by definition. */
const J_PER_BTU = 1055.05585262;
/** 1 ft·lbf = 1.3558179483 J (exact from the foot and the pound-force). */
const J_PER_FT_LBF = 1.3558179483314004;

describe("C1–C2: one stop from 80 km/h, 3,000 kg ([D] ½mv², adiabatic rise)", () => {
  const rig = soloRig(3000, { frontBrakes: { kind: "vented-disc", diameterM: 0.32, massKg: 10 } });
  const profile = constantGradeProfile(1000, 0);
  const result = runHeatRun(profile, rig, {
    params: { ...BARE, cruiseSpeedMs: kmhToMs(80), endAtRest: true, frontShare: 0.65, rotorPartition: 0.9 },
  });
  const [summary] = summarizeDescents(result, [{ startM: 0, endM: 1000 }]);

  it("C1: kinetic energy shed = ½·m·v² = 740,740.7 J (0.01 %)", () => {
    expect(rel(summary!.energy.kineticJ, 740_740.7)).toBeLessThan(1e-4);
    expect(rel(summary!.energy.brakeJ.front + summary!.energy.brakeJ.rear, 740_740.7)).toBeLessThan(1e-4);
  });

  it("C2: front rotor q = 216,666.7 J, ΔT = 47.10 K (0.1 K)", () => {
    const front = result.trace.rotorC[0]!;
    expect(summary!.energy.brakeJ.front * 0.9 / 2).toBeCloseTo(216_666.7, 0);
    expect(front[front.length - 1]! - 25).toBeCloseTo(47.1, 1);
  });
});

describe("C3–C4: published imperial examples ([S] the article “How hot do brakes get?” and T. Hall, “Braking Horsepower: How Much Does Your Car Have?”, Brake & Front End (docs/validation.md C3–C4) + [D])", () => {
  it("C3: 3,000 lb at 60 mph → 361,036 ft·lbf = 463.96 BTU; four 10 lb rotors at 0.13 BTU/lb°F rise 89.2 °F", () => {
    const ke = 0.5 * lbToKg(3000) * mphToMs(60) ** 2;
    expect(ke / J_PER_FT_LBF).toBeCloseTo(361_036, -1);
    expect(ke / J_PER_BTU).toBeCloseTo(463.96, 1);
    // Adiabatic exact step (hA = 0): ΔT = q/(m·c); c = 0.13 BTU/lb°F = 544.3 J/(kg·K).
    const c = (0.13 * J_PER_BTU) / (KG_PER_LB_LOCAL * (5 / 9));
    const dK = exactStepC(0, 0, ke / 4, 0, lbToKg(10) * c, 1);
    expect(dK * 1.8).toBeCloseTo(89.2, 1);
    // The article “How hot do brakes get?” gives 361,306.4 ft·lb, 469.7 BTU and 90.3 °F (its figure looks like a
    // transcription slip); our exact 89.2 °F is within 1.5 % of it.
    expect(rel(dK * 1.8, 90.3)).toBeLessThan(0.015);
  });

  it("C4: 6,400 lb at 60 mph → 989.8 BTU (article 988 BTU); stop in 140 ft → 27.66 ft/s² = 0.860 g, 3.18 s", () => {
    const v = mphToMs(60);
    expect(rel((0.5 * lbToKg(6400) * v * v) / J_PER_BTU, 989.8)).toBeLessThan(5e-4);
    // T. Hall, “Braking Horsepower: How Much Does Your Car Have?”, Brake & Front End: 988 BTU, a stop in 140 ft,
    // “about three seconds”.
    expect(rel((0.5 * lbToKg(6400) * v * v) / J_PER_BTU, 988)).toBeLessThan(5e-3);
    const d = 140 * 0.3048;
    const a = (v * v) / (2 * d);
    expect(rel(a / 0.3048, 27.66)).toBeLessThan(0.01);
    expect(a / STANDARD_GRAVITY).toBeCloseTo(0.86, 2);
    expect((2 * d) / v).toBeCloseTo(3.18, 2);
  });
});
const KG_PER_LB_LOCAL = 0.45359237;

describe("C5: stopping distance from a constant deceleration ([D] v²/2a; regulation limits [M])", () => {
  it("100 km/h at 6.43 m/s² → 60.00 m; 80 km/h at 5.0 m/s² → 49.38 m; limits 70.0 m and 61.23 m", () => {
    expect(kmhToMs(100) ** 2 / (2 * 6.43)).toBeCloseTo(60.0, 2);
    expect(kmhToMs(80) ** 2 / (2 * 5.0)).toBeCloseTo(49.38, 2);
    expect(0.1 * 100 + 0.006 * 100 ** 2).toBeCloseTo(70.0, 2); // UN R13-H M1 Type-0 limit [M]
    expect(0.15 * 80 + 80 ** 2 / 130).toBeCloseTo(61.23, 2); // UN R13 N1 Type-0 limit [M]
  });

  it("the backward pass starts slowing v²/2a before a stop (100 km/h, 6.43 m/s² → 60 m)", () => {
    const profile = constantGradeProfile(1000, 0, 1);
    const result = runHeatRun(profile, soloRig(3000), {
      params: { ...BARE, cruiseSpeedMs: kmhToMs(100), decelMs2: 6.43, endAtRest: true },
    });
    const v = result.trace.speedMs;
    const firstSlow = v.findIndex((s) => s < kmhToMs(100) - 1e-9);
    // The first slowed sample lies within one 1 m step inside the 60 m braking distance.
    const fromStop = 1000 - result.trace.distanceM[firstSlow]!;
    expect(fromStop).toBeGreaterThan(59);
    expect(fromStop).toBeLessThanOrEqual(60);
  });
});

describe("C6: R13 Type-II energy equivalent, 6 % for 6 km at 30 km/h ([D]; test definition [M])", () => {
  for (const [massKg, energyMJ, powerKW] of [[3500, 12.356, 17.16], [6000, 21.18, 29.42]] as const) {
    it(`${massKg} kg: drop 360 m, E = ${energyMJ} MJ, ≈ 720 s, mean ${powerKW} kW (0.5 %)`, () => {
      const profile = constantGradeProfile(6000, -0.06);
      const result = runHeatRun(profile, soloRig(massKg), {
        params: { ...BARE, cruiseSpeedMs: kmhToMs(30), descentSpeeds: [] },
      });
      const [s] = summarizeDescents(result, [{ startM: 0, endM: 6000 }]);
      expect(s!.dropM).toBeCloseTo(360, 6);
      const brakes = s!.energy.brakeJ.front + s!.energy.brakeJ.rear;
      expect(rel(brakes / 1e6, energyMJ)).toBeLessThan(0.005);
      expect(rel(s!.durationS, 720)).toBeLessThan(0.005);
      expect(rel(brakes / s!.durationS / 1000, powerKW)).toBeLessThan(0.005);
    });
  }
});

describe("C8: exact step vs closed form ([D] lumped ODE)", () => {
  it("T0 = 100, Ta = 25, q = 2,000 W, hA = 20 W/K, mc = 4,600 J/K, Δt = 60 s → 105.74 °C (T_ss 125, τ 230 s)", () => {
    const closed = 125 + (100 - 125) * Math.exp(-60 / 230);
    expect(exactStepC(100, 25, 2000, 20, 4600, 60)).toBeCloseTo(closed, 10);
    expect(exactStepC(100, 25, 2000, 20, 4600, 60)).toBeCloseTo(105.74, 2);
    // Euler would give 100 + 60·(2000 − 20·75)/4600 = 106.52: the step is not Euler.
    expect(Math.abs(exactStepC(100, 25, 2000, 20, 4600, 60) - 106.52)).toBeGreaterThan(0.5);
  });
  it("hA → 0 gives T + q·Δt/(m·c)", () => {
    expect(exactStepC(100, 25, 2000, 0, 4600, 60)).toBeCloseTo(100 + (2000 * 60) / 4600, 10);
    expect(exactStepC(100, 25, 2000, 1e-15, 4600, 60)).toBeCloseTo(100 + (2000 * 60) / 4600, 8);
  });
});

describe("C9: linearised radiation coefficient ε = 0.55, Ta = 25 °C ([D]; σ CODATA)", () => {
  const expected: [number, number][] = [[100, 4.78], [200, 7.52], [300, 11.34], [400, 16.42], [500, 22.94]];
  for (const [t, h] of expected) {
    it(`${t} °C → ${h} W/m²K (0.5 %)`, () => expect(rel(radiationCoefficient(0.55, t, 25), h)).toBeLessThan(0.005));
  }
});

describe("C10: heat partition ([D]; formula [M] Brake Design and Safety ch. 3)", () => {
  it("iron vs organic pad γ = 0.901; vs semi-metallic γ = 0.793", () => {
    expect(heatPartitionRotor(CAST_IRON_PROPERTIES, ORGANIC_PAD_PROPERTIES)).toBeCloseTo(0.901, 3);
    expect(heatPartitionRotor(CAST_IRON_PROPERTIES, SEMI_METALLIC_PAD_PROPERTIES)).toBeCloseTo(0.793, 3);
  });
});

/** The C11 rotor: 10 kg, c = 460, A = 0.2 m², h = 4 W/m²K, ε = 0.55 on the same area, no enclosure factor. */
export const C11_SPEC: BrakePositionSpec = {
  position: "front", wheels: 2, kind: "vented-disc", diameterM: 0.32, massKg: 10, padFamily: "organic",
  standstillConductanceWK: 4 * 0.2, conductanceSlopeWK: 0, radiatingAreaM2: 0.2, emissivity: 0.55,
  standstillFactor: 1, specificHeat: 460, specificHeatSlope: 0, rotorPartition: 0.9,
  thresholds: { warmC: 250, hotC: 300 }, validityCeilingC: 600, fluid: null,
};

describe("C11: standstill cool-down 300 → 100 °C ([D]; h range [S] stationary-disc study, J. Mech. Eng. 66(1) 2020)", () => {
  it("takes 2,778 s ≈ 46.3 min (2 %), matching an independent 1 s explicit integration", () => {
    const t = timeToCoolAtStandstillS(C11_SPEC, 300, 100, 25);
    expect(rel(t, 2778)).toBeLessThan(0.02);
    // Independent check: 1 s explicit (Euler) steps of m·c·dT/dt = −hA(T−Ta) − εσA(T⁴−Ta⁴).
    let temp = 300;
    let s = 0;
    while (temp > 100) {
      const tk = temp + 273.15;
      temp -= (0.8 * (temp - 25) + 0.55 * 5.670374419e-8 * 0.2 * (tk ** 4 - 298.15 ** 4)) / 4600;
      s += 1;
    }
    expect(rel(t, s)).toBeLessThan(0.005);
    expect(coolBrakeAtStandstill(C11_SPEC, 300, 25, t)).toBeCloseTo(100, 0);
  });
  it("convection only: t = τ·ln((T0 − Ta)/(T1 − Ta)) with τ = m·c/hA ([D] closed form)", () => {
    const spec = { ...C11_SPEC, emissivity: 0 };
    const analytic = (4600 / 0.8) * Math.log(275 / 75);
    expect(rel(timeToCoolAtStandstillS(spec, 300, 100, 25), analytic)).toBeLessThan(1e-9);
    expect(coolBrakeAtStandstill(spec, 300, 25, analytic)).toBeCloseTo(100, 6);
  });
});

describe("C12: heating snub 120 → 60 km/h ([D]; R13-H Type-I / FMVSS 135 style [M])", () => {
  for (const [massKg, snubMJ] of [[3000, 1.25], [2000, 0.8333]] as const) {
    it(`${massKg} kg: ${snubMJ} MJ per snub, ${(snubMJ * 15).toFixed(2)} MJ for 15`, () => {
      const ke = 0.5 * massKg * (kmhToMs(120) ** 2 - kmhToMs(60) ** 2);
      expect(rel(ke / 1e6, snubMJ)).toBeLessThan(0.001);
      expect(rel((15 * ke) / 1e6, snubMJ * 15)).toBeLessThan(0.001);
    });
  }
  it("the model's slow-down for a curve sheds 1.25 MJ and heats a 10 kg front rotor by 79.5 K (0.1 %)", () => {
    // A curve whose speed √(a·R) is 60 km/h, after a straight at 120 km/h.
    const radius = kmhToMs(60) ** 2 / 2;
    const profile = stretchesProfile([{ lengthM: 500, grade: 0 }, { lengthM: 500, grade: 0, curveRadiusM: radius }], 1);
    const result = runHeatRun(profile, soloRig(3000), {
      params: { ...BARE, cruiseSpeedMs: kmhToMs(120), lateralAccelMs2: 2, frontShare: 0.65, rotorPartition: 0.9 },
    });
    const [s] = summarizeDescents(result, [{ startM: 0, endM: 1000 }]);
    expect(rel(s!.energy.kineticJ, 1.25e6)).toBeLessThan(0.001);
    const front = result.trace.rotorC[0]!;
    expect(rel(front[front.length - 1]! - 25, 79.5)).toBeLessThan(0.001);
  });
});

describe("C13: GSRS reference form ([M] constants, FHWA-RD-81/185 (Johnson, DiMarco and Allen, 1982), docs/sources.md §3; structure [D])", () => {
  // W = 80,000 lb, θ = 0.06, V = 30 mph, L = 5 mi, Ti = 150 °F, T∞ = 90 °F. Constants from memory: structural check.
  const V = 30;
  const hpB = (80_000 * 0.06 * V) / 375 - ((460 + 17.25 * V) * V) / 375 - 73;
  const K1 = 1.1852 + 0.0331 * V;
  const K2 = 1 / (0.1602 + 0.0078 * V);
  it("HP_B = 232.8 hp, K1 = 2.1782 1/h, K2 = 2.5368 °F/hp", () => {
    expect(hpB).toBeCloseTo(232.8, 1);
    expect(K1).toBeCloseTo(2.1782, 4);
    expect(K2).toBeCloseTo(2.5368, 4);
  });
  it("our exact step reproduces T(5 mi) = 311.5 °F; L = 0 → 150 °F; L → ∞ → 680.6 °F", () => {
    // In °F and hours: hA = 1/K2 (hp/°F), m·c = hA/K1 (hp·h/°F), q = HP_B; Δt = L/V hours.
    const step = (hours: number): number => exactStepC(150, 90, hpB, 1 / K2, 1 / K2 / K1, hours);
    expect(rel(step(5 / V), 311.5)).toBeLessThan(0.001);
    expect(step(0)).toBeCloseTo(150, 10);
    expect(rel(step(1e6), 680.6)).toBeLessThan(0.001);
  });
});

describe("C14–C16: motoring power, ISA density, unit conversions", () => {
  it("C14: FMEP 2.0 bar, 2.8 L, 3,000 rpm → 14.0 kW ([D] P = FMEP·V_d·n/120, [M] Internal Combustion Engine Fundamentals ch. 13)", () => {
    expect(motoringPowerW(2e5, 0.0028, 3000)).toBeCloseTo(14_000, 6);
  });
  it("C15: ISA density 1.1116 kg/m³ at 1,000 m and 1.0065 at 2,000 m (0.1 %) ([M] ISO 2533 formula)", () => {
    expect(rel(isaAirDensity(0), 1.225)).toBeLessThan(1e-12);
    expect(rel(isaAirDensity(1000), 1.1116)).toBeLessThan(0.001);
    expect(rel(isaAirDensity(2000), 1.0065)).toBeLessThan(0.001);
  });
  it("C16: 1 hp/°F = 1,342.26 W/K; 500 °F = 260.0 °C ([D] NIST SP 811 factors)", () => {
    expect(hpPerFahrenheitToWPerK(1)).toBeCloseTo(1342.26, 2);
    expect(fahrenheitToCelsius(500)).toBeCloseTo(260, 10);
  });
});
