/**
 * Synthetic routes and rigs for the advice tests: a flat approach, one constant-grade descent, a flat run-out,
 * built directly as RouteProfile objects (tests/unit/thermal/route-helpers.ts). Rigs are the generic presets of
 * lib/thermal or explicit variants of them.
 */

import { findDescents, type Descent, type PlacedWaypoint, type RouteProfile } from "@/lib/route";
import { MID_SIZE_UTE, UTE_AND_CARAVAN, type Rig } from "@/lib/thermal";
import { soloRig, uteCaravanRig } from "../thermal/rig-helpers";
import { stretchesProfile } from "../thermal/route-helpers";

/** A route with one descent between 3 km flats. */
export interface OneDescent {
  profile: RouteProfile;
  descents: Descent[];
  descent: Descent;
}

/**
 * 3 km flat, a descent of `grade` over `lengthM`, 3 km flat (10 m steps, from 1,000 m).
 * @param grade descent grade (negative)
 * @param lengthM horizontal length of the descent, m
 * @returns the route with its single descent
 */
export function oneDescent(grade: number, lengthM: number): OneDescent {
  const profile = stretchesProfile([{ lengthM: 3000, grade: 0 }, { lengthM, grade }, { lengthM: 3000, grade: 0 }]);
  const descents = findDescents(profile);
  if (descents.length !== 1) throw new Error(`expected one descent, found ${descents.length}`);
  return { profile, descents, descent: descents[0]! };
}

/** The ute and tandem caravan preset (5,360 kg, electric drums, gain 1). */
export const UTE_VAN: Rig = UTE_AND_CARAVAN;

export { twoWheelDrive } from "../thermal/rig-helpers";

/** The mid-size ute alone at 2,600 kg. */
export const SOLO_UTE: Rig = soloRig(2600);

/** A silly rig: 4,500 kg on tiny solid discs and drums. Nothing should be enough on a long steep descent. */
export const SILLY_RIG: Rig = soloRig(4500, {
  // no low range: a two-wheel-drive truck (low range alone would hold this rig at a crawl)
  transmission: { preset: "generic-6-speed-automatic" },
  gvmKg: 6000,
  gcmKg: 9000,
  frontBrakes: { kind: "solid-disc", diameterM: 0.25, massKg: 4 },
  rearBrakes: { kind: "drum", diameterM: 0.2, massKg: 3 },
});

/** A very heavy ute and caravan: 6,000 kg combined (3,100 kg ute, 2,900 kg caravan), electric drums, gain 1. */
export const HEAVY_VAN: Rig = uteCaravanRig(6000);

/** The ute and caravan with override (surge) brakes on the caravan. */
export const UTE_VAN_OVERRIDE: Rig = { ...UTE_AND_CARAVAN, trailer: { ...UTE_AND_CARAVAN.trailer!, brakeType: "override", breakaway: "cable" } };

/** The ute and caravan with the electric controller gain set low (0.5). */
export const UTE_VAN_LOW_GAIN: Rig = { ...UTE_AND_CARAVAN, trailer: { ...UTE_AND_CARAVAN.trailer!, controllerGain: 0.5 } };

/** A manual-gearbox ute (for the "manual mode" wording). */
export const MANUAL_UTE: Rig = soloRig(2600, { transmission: { preset: "generic-6-speed-manual" } });

/**
 * A named waypoint placed on the route at a distance (as lib/route placeWaypoints would place it).
 * @param name the waypoint's name
 * @param distanceM distance along the route (a sample distance), m
 * @returns the placed waypoint
 */
export function waypointAt(name: string, distanceM: number): PlacedWaypoint {
  return { name, lat: 0, lon: 0, distanceM, offsetM: 20 };
}

export { MID_SIZE_UTE };

/** A route with two descents: its profile and descents. */
export interface TwoDescents {
  profile: RouteProfile;
  descents: Descent[];
}

/**
 * 3 km flat, 8 % down for 3 km, 2 km flat, 5 % up for 2 km, 6 % down for 4 km, 2 km flat (10 m steps): two
 * descents of 240 m each, the second longer and gentler, with a climb between them (21 km in all).
 * @returns the route with its two descents
 */
export function twoDescents(): TwoDescents {
  const profile = stretchesProfile([
    { lengthM: 3000, grade: 0 },
    { lengthM: 3000, grade: -0.08 },
    { lengthM: 2000, grade: 0 },
    { lengthM: 2000, grade: 0.05 },
    { lengthM: 4000, grade: -0.06 },
    { lengthM: 2000, grade: 0 },
  ]);
  const descents = findDescents(profile);
  if (descents.length !== 2) throw new Error(`expected two descents, found ${descents.length}`);
  return { profile, descents };
}

/**
 * 3 km flat, 10 % down for 1 km, a 300 m bench at 2 % down (a place a rig can stand), 10 % down for 800 m,
 * 3 km flat (10 m steps): one descent of 210 m, crest at 3.0 km, bench from 4.0 to 4.3 km, bottom at 5.1 km.
 * @returns the route with its single descent
 */
export function benchDescent(): OneDescent {
  const profile = stretchesProfile([
    { lengthM: 3000, grade: 0 },
    { lengthM: 1000, grade: -0.1 },
    { lengthM: 300, grade: -0.02 },
    { lengthM: 800, grade: -0.1 },
    { lengthM: 3000, grade: 0 },
  ]);
  const descents = findDescents(profile);
  if (descents.length !== 1) throw new Error(`expected one descent, found ${descents.length}`);
  return { profile, descents, descent: descents[0]! };
}

/**
 * Mean grade of a profile over ±halfWidthM around a distance, from its elevations (rise over run): the grade
 * a rig parked there stands on, computed here independently of lib/advice.
 * @param profile the route profile
 * @param atM distance, m
 * @param halfWidthM half the parking stretch, m
 * @returns grade (negative downhill)
 */
export function gradeAround(profile: RouteProfile, atM: number, halfWidthM = 50): number {
  const d = profile.distanceM;
  const nearest = (m: number) => {
    let best = 0;
    for (let i = 0; i < d.length; i++) if (Math.abs(d[i]! - m) < Math.abs(d[best]! - m)) best = i;
    return best;
  };
  const a = nearest(atM - halfWidthM);
  const b = nearest(atM + halfWidthM);
  return (profile.elevationM[b]! - profile.elevationM[a]!) / (d[b]! - d[a]!);
}

/**
 * A profile from stretches with its descents (10 m steps, from 1,000 m).
 * @param stretches the stretches
 * @returns the profile and its descents
 */
export function routeOf(stretches: readonly { lengthM: number; grade: number }[]): { profile: RouteProfile; descents: Descent[] } {
  const profile = stretchesProfile(stretches);
  return { profile, descents: findDescents(profile) };
}

/**
 * 3 km flat, then `count` times `lengthM` at `grade` followed by a `benchM` bench at 2 % down (a place a rig
 * can stand), then 3 km flat: one long descent broken by benches.
 * @param grade grade of the steep pitches (negative)
 * @param lengthM length of each pitch, m
 * @param benchM length of each bench, m
 * @param count number of pitches
 * @returns the route with its single descent
 */
export function benchesDescent(grade: number, lengthM: number, benchM: number, count: number): OneDescent {
  const stretches = [{ lengthM: 3000, grade: 0 }];
  for (let i = 0; i < count; i++) stretches.push({ lengthM, grade }, { lengthM: benchM, grade: -0.02 });
  stretches.push({ lengthM: 3000, grade: 0 });
  const { profile, descents } = routeOf(stretches);
  if (descents.length !== 1) throw new Error(`expected one descent, found ${descents.length}`);
  return { profile, descents, descent: descents[0]! };
}
