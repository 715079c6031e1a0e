/** A stretch whose elevation could not be filled. */
export interface ElevationGap {
  /** Distance of the gap's start from the segment start, m. */
  startM: number;
  lengthM: number;
}

/** Result of {@link fillElevation} for one segment. */
export interface FilledElevation {
  /** Elevation at every point, m, with filled gaps; `NaN` where a gap could not be filled. */
  ele: Float64Array;
  /** Points that received an interpolated or held value. */
  filledPoints: number;
  /** Gaps too long to fill. */
  gaps: ElevationGap[];
}

/**
 * Fills missing elevations of one segment. An interior run of missing values is interpolated linearly in
 * distance when the two known points around it are at most `maxGapM` apart; a run at the start or end of
 * the segment takes the nearest known value when it is at most `maxEdgeGapM` long (there is nothing to
 * interpolate towards, so a shorter limit applies). Longer runs stay `NaN` and are reported as gaps.
 *
 * @param ele elevation per point, m, `null` where missing
 * @param dist cumulative distance per point, m
 * @param maxGapM longest interior stretch filled, m
 * @param maxEdgeGapM longest leading or trailing stretch filled, m
 */
export function fillElevation(
  ele: readonly (number | null)[],
  dist: readonly number[],
  maxGapM: number,
  maxEdgeGapM: number,
): FilledElevation {
  const n = ele.length;
  const out = new Float64Array(n).fill(Number.NaN);
  const result: FilledElevation = { ele: out, filledPoints: 0, gaps: [] };
  let prev = -1; // index of the last known value
  for (let i = 0; i <= n; i++) {
    const v = i < n ? ele[i] : null;
    if (v === null || v === undefined) {
      if (i < n) continue;
    } else out[i] = v;
    if (i - prev > 1) fillRun(result, ele, dist, prev, i < n ? i : -1, maxGapM, maxEdgeGapM);
    prev = i;
  }
  return result;
}

/** Fills the missing run strictly between known indices `a` and `b` (−1 when that side has none). */
function fillRun(
  r: FilledElevation,
  ele: readonly (number | null)[],
  dist: readonly number[],
  a: number,
  b: number,
  maxGapM: number,
  maxEdgeGapM: number,
): void {
  const first = a + 1;
  const last = b < 0 ? ele.length - 1 : b - 1;
  const d = (k: number) => dist[k] as number;
  const from = a < 0 ? d(0) : d(a);
  const to = b < 0 ? d(ele.length - 1) : d(b);
  const limit = a < 0 || b < 0 ? maxEdgeGapM : maxGapM;
  if ((a < 0 && b < 0) || to - from > limit) {
    r.gaps.push({ startM: from, lengthM: to - from });
    return;
  }
  for (let k = first; k <= last; k++) {
    if (a < 0) r.ele[k] = ele[b] as number;
    else if (b < 0) r.ele[k] = ele[a] as number;
    else r.ele[k] = (ele[a] as number) + ((ele[b] as number) - (ele[a] as number)) * ((d(k) - from) / (to - from));
    r.filledPoints += 1;
  }
}
