import { segmentRanges } from "./segment-ranges";

/**
 * Grade of every step as rise over horizontal run: (e[i+1] − e[i]) / (d[i+1] − d[i]), dimensionless,
 * negative downhill (−0.08 is an 8 % descent). Distances are geodesic (horizontal) distances, so this is
 * the surveyor's grade, not the sine of the slope angle. A step across a segment gap gets 0; the last
 * entry repeats the one before it (a {@link RouteProfile} has one grade per sample).
 *
 * @param distanceM cumulative distance per sample, m
 * @param elevationM smoothed elevation per sample, m
 * @param gapAfter 1 where the step from sample i to i+1 crosses a gap
 * @returns grade per sample, dimensionless
 * @example
 * computeGrade(Float64Array.of(0, 100), Float64Array.of(500, 492), Uint8Array.of(0, 0)); // [-0.08, -0.08]
 */
export function computeGrade(distanceM: Float64Array, elevationM: Float64Array, gapAfter: Uint8Array): Float64Array {
  const n = elevationM.length;
  const grade = new Float64Array(n);
  for (const [a, b] of segmentRanges(gapAfter)) {
    for (let i = a; i < b; i++) {
      const run = (distanceM[i + 1] as number) - (distanceM[i] as number);
      grade[i] = run > 0 ? ((elevationM[i + 1] as number) - (elevationM[i] as number)) / run : 0;
    }
  }
  if (n >= 2 && gapAfter[n - 2] !== 1) grade[n - 1] = grade[n - 2] as number;
  return grade;
}
