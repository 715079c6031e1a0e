import { segmentRanges } from "./segment-ranges";
import { steepestGrade } from "./steepest-grade";
import type { RouteProfile } from "./types";

/** One descent. Distances and elevations come from the profile (smoothed); grades are negative. */
export interface Descent {
  /** Sample index of the top and of the bottom in the profile. */
  startIndex: number;
  endIndex: number;
  /** Distance along the route of the top and the bottom, m. */
  startDistanceM: number;
  endDistanceM: number;
  /** Elevation of the top and the bottom, m. */
  startElevationM: number;
  endElevationM: number;
  /** Height lost, top minus bottom, m (positive). */
  dropM: number;
  /** Length along the route, m. */
  lengthM: number;
  /** Mean grade, −dropM / lengthM (dimensionless, negative). */
  meanGrade: number;
  /** Steepest mean grade over any 200 m inside the descent (its mean grade if shorter), negative. */
  steepest200mGrade: number;
  /** Steepest mean grade over any 1 km inside the descent (its mean grade if shorter), negative. */
  steepest1kmGrade: number;
}

/** Rules of {@link findDescents}. Lengths and heights in m, grades dimensionless. */
export interface FindDescentsOptions {
  /** Least height lost, m. Default 60. */
  minDropM?: number;
  /**
   * Least length, m. Default 250. [E] With the 60 m least drop this binds only on pitches steeper than
   * 24 % (60 m / 250 m), so any real road that loses 60 m counts however short it is (500 m at 20 %,
   * 400 m at 15 %; docs/model.md §4.2): for a heavy rig the height lost, not the length, is what heats the
   * brakes. What it still refuses is a "drop" shorter than the elevation smoothing's own footprint
   * (about ±2σ = 160 m at the default σ of 40 m, see smoothElevation), which on a recorded track is an
   * elevation artefact (a bridge, a tunnel, a cliff edge in an elevation model) rather than a road.
   */
  minLengthM?: number;
  /** Greatest rise above the lowest point so far that does not end the descent, m. Default 10. */
  maxRiseM?: number;
  /** Longest stretch without reaching a new low that does not end the descent, m. Default 300. */
  maxInterruptionM?: number;
  /**
   * A point is a new low only if it lies below the previous low by at least this grade times the
   * distance between them (dimensionless). Default 0.01 (1 %): gentler run-outs, where a heavy rig coasts
   * without braking, count as interruptions rather than as descent.
   */
  minGrade?: number;
}

type Rules = Required<FindDescentsOptions>;

/** Floating-point slack for the thresholds, m: a drop built as exactly 60 m must count as 60 m. */
const EPS_M = 1e-9;

/**
 * Finds the descents of a profile: contiguous downhill sections, each inside one segment (never across a
 * gap). Rules, applied to the smoothed elevation:
 *
 * 1. From a top, follow the profile down, keeping the lowest point so far. A later point becomes the new
 *    low when it is at least `minGrade` × (distance from the old low) below it.
 * 2. The descent goes on through short interruptions: rises of at most `maxRiseM` above the low, and
 *    stretches of at most `maxInterruptionM` without a new low. A bigger rise or a longer stretch ends it
 *    at the last low.
 * 3. It is trimmed to start at its highest point and then past any leading or trailing steps gentler than
 *    `minGrade`, so it runs from where the road starts to fall to where it stops.
 * 4. It counts when it drops at least `minDropM` over at least `minLengthM` (defaults: 60 m over at least
 *    250 m), so a short steep pitch counts (500 m at 20 %) while a long gentle slope does not (1 km at
 *    3 % loses only 30 m).
 *
 * @param profile from {@link buildRouteProfile}
 * @param options the rules' thresholds
 * @returns descents in route order
 * @example
 * findDescents(profile).map((d) => `${d.dropM.toFixed(0)} m over ${(d.lengthM / 1000).toFixed(1)} km`);
 */
export function findDescents(profile: RouteProfile, options: FindDescentsOptions = {}): Descent[] {
  const rules: Rules = {
    minDropM: options.minDropM ?? 60,
    minLengthM: options.minLengthM ?? 250,
    maxRiseM: options.maxRiseM ?? 10,
    maxInterruptionM: options.maxInterruptionM ?? 300,
    minGrade: options.minGrade ?? 0.01,
  };
  if (!(rules.minDropM > 0) || !(rules.minLengthM > 0)) throw new RangeError("minDropM and minLengthM must be > 0");
  if (!(rules.maxRiseM >= 0) || !(rules.maxInterruptionM >= 0) || !(rules.minGrade >= 0)) {
    throw new RangeError("maxRiseM, maxInterruptionM and minGrade must be ≥ 0");
  }
  const out: Descent[] = [];
  for (const [a, b] of segmentRanges(profile.gapAfter)) scanSegment(profile, a, b, rules, out);
  return out;
}

function scanSegment(p: RouteProfile, a: number, b: number, rules: Rules, out: Descent[]): void {
  const e = p.elevationM;
  let i = a;
  while (i < b) {
    while (i < b && (e[i + 1] as number) >= (e[i] as number)) i++; // climb to a top
    if (i >= b) return;
    const low = followDown(p, i, b, rules);
    const [start, end] = trim(p, i, low, rules.minGrade);
    const drop = (e[start] as number) - (e[end] as number);
    const length = (p.distanceM[end] as number) - (p.distanceM[start] as number);
    if (drop >= rules.minDropM - EPS_M && length >= rules.minLengthM - EPS_M) out.push(describe(p, start, end));
    i = Math.max(low, i + 1);
  }
}

/** Rules 1–2: the index of the last low reached from top `s` before an interruption ends the descent. */
function followDown(p: RouteProfile, s: number, b: number, rules: Rules): number {
  const e = p.elevationM;
  const d = p.distanceM;
  let low = s;
  for (let j = s + 1; j <= b; j++) {
    const below = (e[low] as number) - (e[j] as number);
    const run = (d[j] as number) - (d[low] as number);
    if (below >= rules.minGrade * run && below > 0) low = j;
    else if (-below > rules.maxRiseM || run > rules.maxInterruptionM) break;
  }
  return low;
}

/** Rule 3: start at the highest point, then drop gentle steps at both ends. */
function trim(p: RouteProfile, s: number, low: number, minGrade: number): [number, number] {
  const e = p.elevationM;
  const d = p.distanceM;
  let start = s;
  for (let k = s + 1; k <= low; k++) if ((e[k] as number) > (e[start] as number)) start = k;
  const steep = (i: number) =>
    (e[i] as number) - (e[i + 1] as number) >= minGrade * ((d[i + 1] as number) - (d[i] as number));
  let end = low;
  while (start < end && !steep(start)) start++;
  while (end > start && !steep(end - 1)) end--;
  return [start, end];
}

function describe(p: RouteProfile, start: number, end: number): Descent {
  const startDistanceM = p.distanceM[start] as number;
  const endDistanceM = p.distanceM[end] as number;
  const startElevationM = p.elevationM[start] as number;
  const endElevationM = p.elevationM[end] as number;
  const lengthM = endDistanceM - startDistanceM;
  const dropM = startElevationM - endElevationM;
  return {
    startIndex: start,
    endIndex: end,
    startDistanceM,
    endDistanceM,
    startElevationM,
    endElevationM,
    dropM,
    lengthM,
    meanGrade: -dropM / lengthM,
    steepest200mGrade: steepestGrade(p.distanceM, p.elevationM, start, end, 200),
    steepest1kmGrade: steepestGrade(p.distanceM, p.elevationM, start, end, 1000),
  };
}
