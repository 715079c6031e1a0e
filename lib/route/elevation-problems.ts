import type { ElevationGap } from "./fill-elevation";
import { formatCount, formatDistance, type RouteProblem, routeError, routeWarning } from "./problems";

/** How to get a file with elevation; part of every elevation error. */
export const ELEVATION_ADVICE =
  "Re-export it from your planner or device with elevation (altitude) included, or add elevation with a " +
  "planner that fills it in from a terrain model.";

/** Facts about the track needed to word the elevation messages. */
export interface ElevationContext {
  maxElevationGapM: number;
  lengthM: number;
  /** Points that had an elevation in the file (before filling). */
  sourcePoints: number;
}

/**
 * Words the elevation verdict of a cleaned track: an error when the file has no elevation at all or has
 * gaps too long to fill; warnings when gaps were filled or every point has the same elevation (a file
 * whose elevations are all 0 is valid, but probably has no real elevation data).
 *
 * @param label "track" or "route"
 * @param totalPoints points after merging duplicates
 * @param filledPoints points whose elevation was interpolated or held
 * @param gaps gaps too long to fill, positions along the track in m
 * @param eles filled elevations per segment, m
 * @returns problems, errors first
 */
export function elevationProblems(
  label: string,
  totalPoints: number,
  filledPoints: number,
  gaps: readonly ElevationGap[],
  eles: readonly Float64Array[],
  ctx: ElevationContext,
): RouteProblem[] {
  if (ctx.sourcePoints === 0) {
    return [
      routeError("no-elevation", `The file has no elevation data, so Fadeline cannot find descents. ${ELEVATION_ADVICE}`),
    ];
  }
  if (gaps.length > 0) return [gapsError(label, gaps, ctx)];
  const out: RouteProblem[] = [];
  if (filledPoints > 0) {
    out.push(
      routeWarning(
        "elevation-gaps-filled",
        `Elevation was missing on ${formatCount(filledPoints)} of ${formatCount(totalPoints)} points and was ` +
          `filled in from the points around them (gaps of up to ${formatDistance(ctx.maxElevationGapM)}).`,
      ),
    );
  }
  const first = eles[0]?.[0];
  if (first !== undefined && eles.every((e) => e.every((v) => v === first))) {
    out.push(
      routeWarning(
        "flat-elevation",
        `Every point of the ${label} has the same elevation (${first} m). If the ${label} is not flat, the ` +
          `file has no real elevation data. ${ELEVATION_ADVICE}`,
      ),
    );
  }
  return out;
}

function gapsError(label: string, gaps: readonly ElevationGap[], ctx: ElevationContext): RouteProblem {
  const missing = gaps.reduce((sum, g) => sum + g.lengthM, 0);
  const longest = gaps.reduce((a, b) => (b.lengthM > a.lengthM ? b : a));
  return routeError(
    "elevation-gaps",
    `Elevation is missing for ${formatDistance(missing)} of the ${formatDistance(ctx.lengthM)} ${label} ` +
      `(the longest gap is ${formatDistance(longest.lengthM)}, from ${formatDistance(longest.startM)}). ` +
      `Gaps of up to ${formatDistance(ctx.maxElevationGapM)} are filled in; longer ones cannot be. ` +
      ELEVATION_ADVICE,
    { distanceM: longest.startM },
  );
}
