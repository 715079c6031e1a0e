/**
 * Fixtures of the advice benchmark: a synthetic 300 km mountain route at 10 m steps (30,001 samples) with six
 * long descents of about 10 km and 600 m each (steeper and curvier in turn), and a 12-rig convoy of the
 * generic presets of lib/thermal with their loads varied. Deterministic.
 */

import { findDescents, type Descent, type RouteProfile } from "@/lib/route";
import { MID_SIZE_UTE, UTE_AND_CARAVAN, WAGON_AND_CAMPER, type Rig } from "@/lib/thermal";
import { stretchesProfile, type Stretch } from "../unit/thermal/route-helpers";

/** One 50 km cycle: a flat, a 500 m climb, a crest, a long descent in three pitches, a gentle run-out climb. */
function cycle(i: number): Stretch[] {
  const steep = -0.07 - 0.01 * (i % 3); // 7, 8, 9 % in turn
  return [
    { lengthM: 12_000, grade: 0 },
    { lengthM: 10_000, grade: 0.05 },
    { lengthM: 1000, grade: 0 },
    { lengthM: 3000, grade: steep, curveRadiusM: i % 2 === 0 ? 80 : Infinity },
    { lengthM: 1000, grade: -0.03 },
    { lengthM: 6000, grade: -0.06 },
    { lengthM: 17_000, grade: 0.005 },
  ];
}

/** The 300 km route at 10 m steps and its descents (lib/route findDescents). */
export function mountainRoute300(): { profile: RouteProfile; descents: Descent[] } {
  const stretches = Array.from({ length: 6 }, (_, i) => cycle(i)).flat();
  const profile = stretchesProfile(stretches, 10, 500);
  return { profile, descents: findDescents(profile) };
}

/** Twelve rigs: ute and caravan, wagon and camper, ute alone, in turn, each with a little more load. */
export function convoy12(): { label: string; rig: Rig }[] {
  return Array.from({ length: 12 }, (_, i) => {
    const kind = i % 3;
    const base: Rig =
      kind === 0 ? UTE_AND_CARAVAN
      : kind === 1 ? WAGON_AND_CAMPER
      : { vehicle: MID_SIZE_UTE, load: { occupantsKg: 160, vehiclePayloadKg: 300, trailerLoadKg: 0 } };
    const load = {
      ...base.load,
      vehiclePayloadKg: base.load.vehiclePayloadKg + 25 * i,
      trailerLoadKg: base.trailer ? base.load.trailerLoadKg + 40 * i : 0,
    };
    return { label: `Rig ${i + 1}`, rig: { ...base, load } };
  });
}
