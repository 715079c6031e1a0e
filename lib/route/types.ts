/**
 * Shared route types. A {@link RouteProfile} is what lib/route hands to lib/thermal: a track resampled at a
 * fixed step along its length, stored column-wise (one typed array per quantity) so that a 300 km route at a
 * 10 m step (30,000 samples) stays small and fast to walk. All quantities are SI.
 */

/** A track resampled along its length. Every array has the same length n (the sample count). */
export interface RouteProfile {
  /** Nominal resampling step, m. */
  stepM: number;
  /** Cumulative distance along the route at each sample, m; non-decreasing, starts at 0. */
  distanceM: Float64Array;
  /** Latitude of each sample, degrees (WGS 84). */
  lat: Float64Array;
  /** Longitude of each sample, degrees (WGS 84). */
  lon: Float64Array;
  /** Smoothed elevation of each sample, m above mean sea level. */
  elevationM: Float64Array;
  /**
   * Grade of the step from sample i to sample i+1 as rise over horizontal run (dimensionless, negative
   * downhill; −0.08 is an 8 % descent). The last entry repeats the one before it. 0 across a gap.
   */
  grade: Float64Array;
  /** Horizontal curve radius at each sample, m; `Infinity` on a straight. */
  curveRadiusM: Float64Array;
  /**
   * 1 where the step from sample i to sample i+1 crosses a gap between GPX track segments (that step is not
   * driven: it carries no distance, no time and no energy), else 0.
   */
  gapAfter: Uint8Array;
}
