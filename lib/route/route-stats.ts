import { climbTotals } from "./climb-totals";
import { segmentRanges } from "./segment-ranges";
import type { RouteProfile } from "./types";

/** Whole-route figures. Elevations are the profile's (smoothed) values. */
export interface RouteStats {
  /** Driven length, gaps between segments excluded, m. */
  lengthM: number;
  /** Total ascent and descent with a dead band (see {@link climbTotals}), m. */
  totalAscentM: number;
  totalDescentM: number;
  /** Highest and lowest elevation, m, and where they are along the route, m. */
  highestM: number;
  highestAtM: number;
  lowestM: number;
  lowestAtM: number;
  /** Number of track segments. */
  segmentCount: number;
}

/** Options of {@link computeRouteStats}. */
export interface RouteStatsOptions {
  /** Dead band of the ascent and descent totals, m. Default 5. */
  climbThresholdM?: number;
}

/**
 * Length, total ascent and descent, and highest and lowest point of a profile. Ascent and descent are
 * summed per segment (nothing across a gap) over the smoothed elevation with a 5 m dead band, so that
 * residual noise does not inflate them while every real climb counts in full.
 *
 * @param profile from {@link buildRouteProfile}
 * @param options dead band, m
 * @returns the figures, SI units
 * @example
 * const { totalAscentM, totalDescentM } = computeRouteStats(profile);
 */
export function computeRouteStats(profile: RouteProfile, options: RouteStatsOptions = {}): RouteStats {
  const threshold = options.climbThresholdM ?? 5;
  if (!(threshold >= 0)) throw new RangeError("climbThresholdM must be ≥ 0 m");
  const n = profile.elevationM.length;
  if (n === 0) throw new RangeError("profile is empty");
  const ranges = segmentRanges(profile.gapAfter);
  let totalAscentM = 0;
  let totalDescentM = 0;
  for (const [a, b] of ranges) {
    const t = climbTotals(profile.elevationM, a, b, threshold);
    totalAscentM += t.ascentM;
    totalDescentM += t.descentM;
  }
  let hi = 0;
  let lo = 0;
  for (let i = 1; i < n; i++) {
    if ((profile.elevationM[i] as number) > (profile.elevationM[hi] as number)) hi = i;
    if ((profile.elevationM[i] as number) < (profile.elevationM[lo] as number)) lo = i;
  }
  return {
    lengthM: profile.distanceM[n - 1] as number,
    totalAscentM,
    totalDescentM,
    highestM: profile.elevationM[hi] as number,
    highestAtM: profile.distanceM[hi] as number,
    lowestM: profile.elevationM[lo] as number,
    lowestAtM: profile.distanceM[lo] as number,
    segmentCount: ranges.length,
  };
}
