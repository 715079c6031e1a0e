import { segmentRanges } from "./segment-ranges";
import { DEG, WGS84 } from "./wgs84";

/** Options of {@link computeCurveRadius}. All in m. */
export interface CurveRadiusOptions {
  /** Distance from the middle point to each outer point of the three-point fit, m. Default 25. */
  baseM?: number;
  /** Radii above this are reported as `Infinity` (a straight for any speed a heavy rig drives), m. Default 3000. */
  straightRadiusM?: number;
}

const E2 = WGS84.f * (2 - WGS84.f); // first eccentricity squared, e² = f(2 − f)

/**
 * Horizontal curve radius at every sample: the radius of the circle through the samples about `baseM`
 * before, at, and about `baseM` after it (circumradius R = abc / (4·area) of the triangle), computed in the
 * local tangent plane at the middle sample with the WGS 84 meridian and prime-vertical radii of curvature
 * M = a(1 − e²)/W³ and N = a/W, W = √(1 − e² sin²φ) (standard ellipsoid geometry, e.g. W. Torge and
 * J. Müller, "Geodesy", 4th ed., 2012). On a circular arc at least 2·baseM long this returns the arc's
 * radius exactly, whatever the spacing. `Infinity` on a straight (R > straightRadiusM), at the first and
 * last sample of each segment, and where the three points coincide.
 *
 * Position noise of σ metres, if independent from point to point, adds a false sagitta of about σ over
 * the chord 2·baseM, so a noisy straight could read as a bend of radius (2·baseM)² / (8σ): 156 m for
 * σ = 2 m and baseM = 25 m. Recorded GPS errors drift slowly between consecutive fixes, so real tracks
 * come out far straighter than that bound; planned routes have no such noise.
 *
 * @param lat latitude per sample, degrees
 * @param lon longitude per sample, degrees
 * @param distanceM cumulative distance per sample, m
 * @param gapAfter 1 where the step from sample i to i+1 crosses a gap
 * @returns radius per sample, m
 */
export function computeCurveRadius(
  lat: Float64Array,
  lon: Float64Array,
  distanceM: Float64Array,
  gapAfter: Uint8Array,
  options: CurveRadiusOptions = {},
): Float64Array {
  const baseM = options.baseM ?? 25;
  const straight = options.straightRadiusM ?? 3000;
  if (!(baseM > 0)) throw new RangeError("baseM must be > 0 m");
  const out = new Float64Array(lat.length).fill(Infinity);
  for (const [a, b] of segmentRanges(gapAfter)) {
    if (b - a < 2) continue;
    const spacing = ((distanceM[b] as number) - (distanceM[a] as number)) / (b - a);
    const k = Math.max(1, Math.round(baseM / spacing));
    for (let i = a + 1; i < b; i++) {
      const r = circumradius(lat, lon, Math.max(a, i - k), i, Math.min(b, i + k));
      out[i] = r > straight ? Infinity : r;
    }
  }
  return out;
}

function circumradius(lat: Float64Array, lon: Float64Array, i0: number, i: number, i2: number): number {
  const lat0 = lat[i] as number;
  const lon0 = lon[i] as number;
  const phi = lat0 * DEG;
  const w = Math.sqrt(1 - E2 * Math.sin(phi) ** 2);
  const my = ((WGS84.a * (1 - E2)) / (w * w * w)) * DEG; // m per degree of latitude
  const nx = (WGS84.a / w) * Math.cos(phi) * DEG; // m per degree of longitude
  // A = sample i0 and C = sample i2, relative to B = sample i at the origin of the local plane.
  const ax = dLon(lon[i0] as number, lon0) * nx;
  const ay = ((lat[i0] as number) - lat0) * my;
  const cx = dLon(lon[i2] as number, lon0) * nx;
  const cy = ((lat[i2] as number) - lat0) * my;
  const cross = ax * cy - ay * cx; // twice the signed area of triangle ABC
  const ab = Math.hypot(ax, ay);
  const bc = Math.hypot(cx, cy);
  const ca = Math.hypot(cx - ax, cy - ay);
  if (cross === 0 || ab === 0 || bc === 0) return Infinity;
  return (ab * bc * ca) / (2 * Math.abs(cross));
}

function dLon(l: number, l0: number): number {
  const d = l - l0;
  return d > 180 ? d - 360 : d < -180 ? d + 360 : d;
}
