/**
 * lib/stopping: stopping distance at a fixed pedal effort, cold and hot. Check values of two kinds, each named
 * beside its check:
 * - from practice (common practice, no published source): a stock dual-cab ute stopped from 80 km/h in 42.5 m;
 *   with about 500 kg more and bigger tyres, about 57 m; after repeated hard stops the distance grew from about
 *   50 m to just over 60 m;
 * - plain physics: kinematics at constant deceleration (d = v²/2a), Newton's second law (a = F/m), and the
 *   torque–force relation at the tyre (F = T/r).
 * The masses and tyre sizes of the practice checks are our assumptions, stated where they are used.
 */

import { describe, expect, it } from "vitest";
import {
  fadeCurveFor,
  FADE_SHAPES,
  frictionRatio,
  hotColdStops,
  KMH_80_MS,
  meanDecelerationMs2,
  MPH_50_MS,
  pedalTorqueNm,
  rollingRadiusM,
  stoppingDistance,
} from "@/lib/stopping";
import { resolveModel, STANDARD_GRAVITY, UTE_AND_CARAVAN, type PadFamily, type Rig } from "@/lib/thermal";
import { soloRig } from "../thermal/rig-helpers";

/** Assumed stock ute: 2,250 kg on 0.78 m tyres (the preset's 320 mm front rotors, 295 mm rear drums). */
const STOCK = resolveModel(soloRig(2250));
/** Assumed loaded ute: 500 kg more (2,750 kg) on 0.84 m tyres (e.g. 265/75R16 → 285/75R17 class), same brakes. */
const LOADED = resolveModel(soloRig(2750, { tyreDiameterM: 0.84 }));

const cold = (model: ReturnType<typeof resolveModel>) => model.positions.map(() => model.params.ambientC);

describe("kinematics and the pedal-limited model (plain physics)", () => {
  it("mean deceleration from speed and distance is v²/2d (kinematics, constant deceleration)", () => {
    // 80 km/h = 22.222 m/s; 22.222² / (2 × 42.5) = 5.810 m/s²
    expect(meanDecelerationMs2(80 / 3.6, 42.5)).toBeCloseTo((80 / 3.6) ** 2 / 85, 9);
    expect(meanDecelerationMs2(80 / 3.6, 42.5)).toBeCloseTo(5.81, 2);
    // docs/validation.md C5a [D]: 100 km/h at 6.43 m/s² stops in 60.00 m, 80 km/h at 5.0 m/s² in 49.38 m
    expect((100 / 3.6) ** 2 / (2 * 6.43)).toBeCloseTo(60.0, 1);
    expect(meanDecelerationMs2(80 / 3.6, 49.38)).toBeCloseTo(5.0, 2);
    expect(() => meanDecelerationMs2(20, 0)).toThrow(RangeError);
  });

  it("check speeds are exact unit conversions (1 mi = 1609.344 m)", () => {
    expect(KMH_80_MS).toBeCloseTo(22.2222, 4);
    expect(MPH_50_MS).toBeCloseTo(22.352, 4);
  });

  it("the calibration torque is T = a·m·r_roll (Newton's second law with F = T/r at the tyre)", () => {
    const a = meanDecelerationMs2(KMH_80_MS, 42.5);
    expect(pedalTorqueNm()).toBeCloseTo(a * 2250 * rollingRadiusM(0.78), 6);
    expect(rollingRadiusM(0.78)).toBeCloseTo(0.5 * 0.78 * 0.97, 9); // dynamic-radius factor 0.97 (lib/thermal)
  });

  it("with cold brakes the distance is v²/2a and grows as v² (kinematics, constant deceleration)", () => {
    const from80 = stoppingDistance(STOCK, cold(STOCK), KMH_80_MS);
    const from50mph = stoppingDistance(STOCK, cold(STOCK), MPH_50_MS);
    expect(from80.meanDecelMs2).toBeCloseTo(from50mph.meanDecelMs2, 6); // same pedal, same deceleration
    expect(from50mph.brakingDistanceM / from80.brakingDistanceM).toBeCloseTo((MPH_50_MS / KMH_80_MS) ** 2, 6);
    const half = stoppingDistance(STOCK, cold(STOCK), KMH_80_MS / 2);
    expect(half.brakingDistanceM / from80.brakingDistanceM).toBeCloseTo(0.25, 6);
  });

  it("at a fixed brake force, doubling the mass doubles the distance (a = F/m, d = v²/2a)", () => {
    const light = resolveModel(soloRig(2000));
    const heavy = resolveModel(soloRig(4000, { gvmKg: 5000 }));
    const ratio = stoppingDistance(heavy, cold(heavy), KMH_80_MS).brakingDistanceM
      / stoppingDistance(light, cold(light), KMH_80_MS).brakingDistanceM;
    expect(ratio).toBeCloseTo(2, 6);
  });

  it("grip caps the deceleration at μ_road·g: a light vehicle stops in v²/(2·μ·g) and says so (kinematics)", () => {
    const light = resolveModel(soloRig(1200, { gvmKg: 2000 })); // 5.81 × 2250/1200 = 10.9 m/s² > 0.8 g by the pedal
    const s = stoppingDistance(light, cold(light), KMH_80_MS, { roadFriction: 0.8 });
    expect(s.limitedBy).toBe("grip");
    expect(s.brakingDistanceM).toBeCloseTo(KMH_80_MS ** 2 / (2 * 0.8 * STANDARD_GRAVITY), 6); // 31.5 m
    expect(stoppingDistance(STOCK, cold(STOCK), KMH_80_MS).limitedBy).toBe("pedal");
  });

  it("adds the reaction distance v·t_r separately (kinematics, constant speed)", () => {
    const s = stoppingDistance(STOCK, cold(STOCK), KMH_80_MS, { reactionTimeS: 1.5 });
    expect(s.reactionDistanceM).toBeCloseTo(KMH_80_MS * 1.5, 9);
    expect(s.totalDistanceM).toBeCloseTo(s.brakingDistanceM + KMH_80_MS * 1.5, 9);
  });

  it("an ideal, cold trailer brakes its own mass; an unbraked one adds its mass to the tow vehicle's (a = F/m)", () => {
    const model = resolveModel(UTE_AND_CARAVAN); // gain 1, electric drums
    const vehicleKg = model.massKg - model.trailerKg;
    const rigCold = stoppingDistance(model, cold(model), KMH_80_MS).brakingDistanceM;
    const solo = resolveModel(soloRig(vehicleKg));
    expect(rigCold).toBeCloseTo(stoppingDistance(solo, cold(solo), KMH_80_MS).brakingDistanceM, 6);
    const unbrakedRig: Rig = { ...UTE_AND_CARAVAN, trailer: { ...UTE_AND_CARAVAN.trailer!, controllerGain: 0 } };
    const unbraked = resolveModel(unbrakedRig);
    const d = stoppingDistance(unbraked, cold(unbraked), KMH_80_MS).brakingDistanceM;
    expect(d / rigCold).toBeCloseTo(model.massKg / vehicleKg, 6);
  });
});

describe("check values from practice", () => {
  it("stock dual-cab ute: 80 km/h → 0 in 42.5 m (common practice, no published source; the calibration stop)", () => {
    // The model is calibrated on this stop, so this checks that the calibration is applied as stated.
    expect(stoppingDistance(STOCK, cold(STOCK), KMH_80_MS).brakingDistanceM).toBeCloseTo(42.5, 6);
  });

  it("about 500 kg more and bigger tyres: about 57 m (common practice, no published source), within 10 %", () => {
    // Same pedal effort → same brake torque; a = T/(r·m), so d scales with m·r:
    // 42.5 × (2,750/2,250) × (0.84/0.78) = 55.9 m, 2 % short of the 57 m from practice.
    const d = stoppingDistance(LOADED, cold(LOADED), KMH_80_MS).brakingDistanceM;
    expect(d).toBeCloseTo(42.5 * (2750 / 2250) * (0.84 / 0.78), 6);
    expect(Math.abs(d - 57) / 57).toBeLessThan(0.1);
    expect(d).toBeGreaterThan(42.5 * (2750 / 2250)); // the tyres alone add distance, not only the mass
  });

  it("after repeated hard stops the distance grew from about 50 m to just over 60 m (common practice, no published source)", () => {
    // Assumed: a ute of 2,650 kg on 0.78 m tyres (≈ 50 m cold by the model), full stops from 80 km/h one after
    // another with no cooling between them (an upper bound on the heating: docs/model.md §7, hA → 0).
    const model = resolveModel(soloRig(2650));
    let temps = cold(model);
    const distances: number[] = [];
    for (let n = 0; n < 20; n++) {
      const s = stoppingDistance(model, temps, KMH_80_MS);
      distances.push(s.brakingDistanceM);
      temps = s.endRotorC;
    }
    expect(distances[0]!).toBeGreaterThan(47.5);
    expect(distances[0]!).toBeLessThan(52.5);
    for (let n = 1; n < distances.length; n++) expect(distances[n]!).toBeGreaterThanOrEqual(distances[n - 1]! - 1e-9);
    const past60 = distances.findIndex((d) => d > 60);
    // it takes several hard stops (not one or two), and the first stop past 60 m is "just over" it (< 70 m)
    expect(past60).toBeGreaterThanOrEqual(3);
    expect(past60).toBeLessThanOrEqual(15);
    expect(distances[past60]!).toBeLessThan(70);
  });
});

describe("hot versus cold", () => {
  const families: PadFamily[] = ["organic", "ceramic", "semi-metallic", "drum-lining"];

  it.each(families)("the %s fade curve never rises with temperature and stays in [floor, 1]", (family) => {
    const curve = fadeCurveFor(family);
    let last = Infinity;
    for (let t = 0; t <= 900; t += 2.5) {
      const r = frictionRatio(t, curve);
      expect(r).toBeLessThanOrEqual(last + 1e-12);
      expect(r).toBeLessThanOrEqual(1);
      expect(r).toBeGreaterThanOrEqual(FADE_SHAPES[family].floorRatio - 1e-12);
      last = r;
    }
    expect(frictionRatio(curve.warmC, curve)).toBe(1);
    expect(frictionRatio(curve.hotC, curve)).toBeCloseTo(FADE_SHAPES[family].ratioAtHot, 9);
  });

  it("the hot distance is never shorter than the cold one, and grows monotonically with temperature", () => {
    const rigs = [STOCK, LOADED, resolveModel(UTE_AND_CARAVAN)];
    for (const model of rigs) {
      let last = 0;
      for (let t = model.params.ambientC; t <= 700; t += 10) {
        const [from80, from50mph] = hotColdStops(model, model.positions.map(() => t));
        for (const s of [from80!, from50mph!]) {
          expect(s.hot.brakingDistanceM).toBeGreaterThanOrEqual(s.cold.brakingDistanceM - 1e-9);
          expect(s.ratio).toBeGreaterThanOrEqual(1 - 1e-12);
        }
        expect(from80!.hot.brakingDistanceM).toBeGreaterThanOrEqual(last - 1e-9);
        last = from80!.hot.brakingDistanceM;
      }
      // far past the hot lines the friction is at the floor (about half), so the distance is well up
      expect(last / hotColdStops(model, cold(model))[0]!.cold.brakingDistanceM).toBeGreaterThan(1.5);
    }
  });

  it("only one hot position is enough to lengthen the stop, and a hotter one lengthens it more", () => {
    const frontOnly = (t: number) => stoppingDistance(STOCK, [t, 25], KMH_80_MS).brakingDistanceM;
    expect(frontOnly(350)).toBeGreaterThan(frontOnly(25));
    expect(frontOnly(450)).toBeGreaterThan(frontOnly(350));
  });
});
