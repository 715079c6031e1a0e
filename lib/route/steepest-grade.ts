/**
 * Steepest sustained downhill grade between samples `start` and `end`: the most negative mean grade
 * (Δelevation / Δdistance) over any stretch of at least `windowM` inside it, found with two pointers in
 * linear time. When the whole stretch is shorter than the window its mean grade is returned.
 *
 * @param distanceM cumulative distance per sample, m
 * @param elevationM elevation per sample, m
 * @param windowM stretch length, m
 * @returns grade, dimensionless, negative downhill
 */
export function steepestGrade(
  distanceM: Float64Array,
  elevationM: Float64Array,
  start: number,
  end: number,
  windowM: number,
): number {
  const d = (i: number) => distanceM[i] as number;
  const e = (i: number) => elevationM[i] as number;
  if (end <= start) return 0;
  if (d(end) - d(start) <= windowM) return (e(end) - e(start)) / (d(end) - d(start));
  let best = Infinity;
  let j = start;
  for (let i = start; i <= end; i++) {
    while (j < end && d(j) - d(i) < windowM) j++;
    if (d(j) - d(i) < windowM) break;
    best = Math.min(best, (e(j) - e(i)) / (d(j) - d(i)));
  }
  return best;
}
