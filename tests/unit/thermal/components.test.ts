/** Unit tests of the model's pieces: road load, engine braking, heat split, thresholds, masses, presets. */

import { describe, expect, it } from "vitest";
import {
  aeroDragForce,
  brakeConductanceScale,
  chooseDescentGear,
  classifyBrake,
  convectiveConductance,
  engineBrakingWheelPowerW,
  engineRpm,
  fluidBoilingPointC,
  fluidWaterContentPct,
  FMVSS_116_BOILING_POINTS,
  gradeForce,
  kmhToMs,
  motoringFmepPa,
  PRESET_LABEL,
  resolveModel,
  rigMasses,
  rollingResistanceForce,
  specificHeat,
  splitRetardingWork,
  STEP_CLASSES,
  LARGE_WAGON,
  MID_SIZE_UTE,
  SINGLE_AXLE_CAMPER,
  TANDEM_AXLE_CARAVAN,
  UTE_AND_CARAVAN,
} from "@/lib/thermal";

describe("road load (textbook forms: Fundamentals of Vehicle Dynamics ch. 4 [M])", () => {
  it("aero drag is ½·ρ·CdA·v²", () => expect(aeroDragForce(1.225, 2.5, 20)).toBeCloseTo(612.5, 10));
  it("rolling resistance is Crr·m·g·cos θ", () => {
    expect(rollingResistanceForce(0.012, 3000, 0)).toBeCloseTo(0.012 * 3000 * 9.80665, 10);
    expect(rollingResistanceForce(0.012, 3000, -0.1)).toBeCloseTo(0.012 * 3000 * 9.80665 * Math.cos(Math.atan(0.1)), 10);
  });
  it("grade force is m·g·sin θ, negative downhill", () => {
    expect(gradeForce(1000, -0.1)).toBeCloseTo(-1000 * 9.80665 * Math.sin(Math.atan(0.1)), 10);
  });
});

describe("engine braking (motoring model, docs/model.md §3)", () => {
  it("FMEP fit passes through the [E] table values 1.5 / 2.0 / 2.6 bar at 2,000 / 3,000 / 4,000 rpm", () => {
    expect(motoringFmepPa(2000)).toBeCloseTo(1.5e5, 6);
    expect(motoringFmepPa(3000)).toBeCloseTo(2.0e5, 6);
    expect(motoringFmepPa(4000)).toBeCloseTo(2.6e5, 6);
  });
  it("a 2.8 L engine motors ≈ 7, 14, 24 kW at 2,000, 3,000, 4,000 rpm (docs/model.md §3, [E])", () => {
    const kw = (rpm: number): number => engineBrakingWheelPowerW(rpm, 0.0028, 1, 1, 800) / 1000;
    expect(kw(2000)).toBeCloseTo(7, 0);
    expect(kw(3000)).toBeCloseTo(14, 6);
    expect(kw(4000)).toBeCloseTo(24.3, 1);
  });
  it("nothing below idle; the factor and driveline efficiency scale it", () => {
    expect(engineBrakingWheelPowerW(700, 0.0028, 1, 1, 800)).toBe(0);
    expect(engineBrakingWheelPowerW(3000, 0.0028, 1.5, 0.92, 800)).toBeCloseTo((14_000 * 1.5) / 0.92, 6);
  });
  it("rpm = v·i·60/(2π·r_dyn) with r_dyn = 0.97·D/2", () => {
    expect(engineRpm(10, 10, 0.8)).toBeCloseTo((10 * 10 * 60) / (2 * Math.PI * 0.388), 8);
  });
  it("the rpm-band policy picks the lowest gear at or below the limit", () => {
    const ratios = [13.65, 8.19, 5.655, 3.9, 2.808, 2.34];
    expect(chooseDescentGear(kmhToMs(60), ratios, 0.78, 3800)).toBe(1);
    expect(chooseDescentGear(kmhToMs(30), ratios, 0.78, 3800)).toBe(0);
    expect(chooseDescentGear(kmhToMs(400), ratios, 0.78, 3800)).toBe(5);
  });
  it("an unlocked converter retards less; an exhaust brake more", () => {
    const factor = (brakeMode: "motoring" | "exhaust-brake", locked: boolean): number =>
      resolveModel({
        ...UTE_AND_CARAVAN,
        vehicle: { ...MID_SIZE_UTE, engine: { ...MID_SIZE_UTE.engine, brakeMode }, transmission: { preset: "generic-6-speed-automatic", converterLocked: locked } },
      }).engineFactor;
    expect(factor("motoring", true)).toBe(1);
    expect(factor("motoring", false)).toBeCloseTo(0.35, 10);
    expect(factor("exhaust-brake", true)).toBeCloseTo(1.5, 10);
  });
});

describe("heat split (docs/model.md §5; docs/trade-facts.md §2.1, brake controllers)", () => {
  const out = new Float64Array(4);
  it("electric: engine first, trailer takes gain × mass share of the service-brake remainder", () => {
    expect(Array.from(splitRetardingWork(out, 100, 30, "electric", 0.5, 1, 0.65))).toEqual([30, 22.75, 12.25, 35]);
  });
  it("electric brakes are not applied by engine braking alone", () => {
    expect(Array.from(splitRetardingWork(out, 100, 150, "electric", 0.5, 1, 0.65))).toEqual([100, 0, 0, 0]);
  });
  it("override brakes push on under engine braking", () => {
    expect(Array.from(splitRetardingWork(out, 100, 150, "override", 0.5, 1, 0.65))).toEqual([50, 0, 0, 50]);
  });
  it("an unbraked trailer puts everything on the tow vehicle; the parts always sum to the whole", () => {
    splitRetardingWork(out, 100, 30, "none", 0.5, 1, 0.65);
    expect(out[3]).toBe(0);
    for (const type of ["none", "override", "electric", "electric-over-hydraulic"] as const) {
      splitRetardingWork(out, 123.4, 40, type, 0.45, 1.3, 0.6);
      expect(out.reduce((a, b) => a + b, 0)).toBeCloseTo(123.4, 10);
    }
  });
});

describe("cooling pieces", () => {
  it("hA(v) = hA_0 + a·v^0.8 ([E] docs/model.md §6.1): ≈ 10 W/K at 60 km/h for the reference vented rotor", () => {
    expect(convectiveConductance(1.25, 0.9, kmhToMs(60))).toBeCloseTo(1.25 + 0.9 * kmhToMs(60) ** 0.8, 10);
    expect(convectiveConductance(1.25, 0.9, kmhToMs(60))).toBeGreaterThan(9);
    expect(convectiveConductance(1.25, 0.9, kmhToMs(60))).toBeLessThan(11);
  });
  it("solid discs cool 0.6× and drums 0.5× a vented disc of the same size ([E] docs/model.md §6.1)", () => {
    expect(brakeConductanceScale("solid-disc", 0.33)).toBeCloseTo(0.6, 10);
    expect(brakeConductanceScale("drum", 0.33)).toBeCloseTo(0.5, 10);
  });
  it("c(T) ≈ 460 + 0.4·(T − 20): ≈ 540 at 200 °C, ≈ 610 at 400 °C, held above 600 °C ([M] docs/model.md §6.4)", () => {
    expect(specificHeat(200, 460, 0.4)).toBeCloseTo(532, 6);
    expect(specificHeat(400, 460, 0.4)).toBeCloseTo(612, 6);
    expect(specificHeat(900, 460, 0.4)).toBeCloseTo(692, 6);
    expect(specificHeat(900, 460, 0)).toBe(460);
  });
});

describe("thresholds and classes", () => {
  it("FMVSS No. 116 minimum boiling points (49 CFR 571.116 S5.1.1/S5.1.2; DOT 5.1 as DOT 5 [M])", () => {
    expect(FMVSS_116_BOILING_POINTS["DOT 3"]).toEqual({ dryC: 205, wetC: 140 });
    expect(FMVSS_116_BOILING_POINTS["DOT 4"]).toEqual({ dryC: 230, wetC: 155 });
    expect(FMVSS_116_BOILING_POINTS["DOT 5.1"]).toEqual({ dryC: 260, wetC: 180 });
    expect(FMVSS_116_BOILING_POINTS["DOT 5"]).toEqual({ dryC: 260, wetC: 180 });
  });
  it("boiling point by age: dry when new, wet once at the 3.7 % wet-test water content ([E] 2 %/year [2nd])", () => {
    expect(fluidBoilingPointC("DOT 4", 0, 2)).toBe(230);
    expect(fluidBoilingPointC("DOT 4", 2, 2)).toBe(155);
    expect(fluidBoilingPointC("DOT 4", 1, 2)).toBeCloseTo(230 - 75 * (2 / 3.7), 10);
    expect(fluidWaterContentPct("DOT 5", 5, 2)).toBe(0);
  });
  it("classes in our words, worst first: runaway, boil-risk, hot, warm, cool", () => {
    expect(STEP_CLASSES).toEqual(["cool", "warm", "hot", "boil-risk", "runaway"]);
    expect(classifyBrake(600, 160, 250, 300, 155, 600)).toBe(4);
    expect(classifyBrake(599, 50, 250, 300, 155, 600)).toBe(2);
    expect(classifyBrake(100, 50, 250, 300, 155)).toBe(0);
    expect(classifyBrake(260, 50, 250, 300, 155)).toBe(1);
    expect(classifyBrake(300, 50, 250, 300, 155)).toBe(2);
    expect(classifyBrake(100, 160, 250, 300, 155)).toBe(3);
    expect(classifyBrake(100, Number.NaN, 250, 300, 155)).toBe(0);
  });
});

describe("masses and presets", () => {
  it("ute and caravan: combination = vehicle without ball + trailer; ball estimated at 10 % (common practice)", () => {
    const m = rigMasses(UTE_AND_CARAVAN);
    expect(m.trailerKg).toBe(2800);
    expect(m.towBallKg).toBeCloseTo(280, 10);
    expect(m.towBallSource).toBe("estimate");
    expect(m.vehicleKg).toBeCloseTo(2560 + 280, 10);
    expect(m.combinationKg).toBe(5360);
  });
  it("a running-order empty mass already holds a 75 kg driver ([M] EU 1230/2012)", () => {
    const rig = { ...UTE_AND_CARAVAN, vehicle: { ...MID_SIZE_UTE, emptyMassDefinition: "running-order" as const } };
    expect(rigMasses(rig).vehicleWithoutBallKg).toBe(2560 - 75);
  });
  it("presets carry no brands and are labelled typical values", () => {
    for (const p of [MID_SIZE_UTE, LARGE_WAGON, SINGLE_AXLE_CAMPER, TANDEM_AXLE_CARAVAN]) {
      expect(p.name).toContain(PRESET_LABEL);
    }
  });
  it("the ute + caravan combination CdA defaults to ≈ 2.5 m² ([E] docs/model.md §13.1)", () => {
    expect(resolveModel(UTE_AND_CARAVAN).params.cdaM2).toBeCloseTo(2.5, 10);
  });
});
