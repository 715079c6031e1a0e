import { gaussianFilter } from "./gaussian-filter";
import { segmentRanges } from "./segment-ranges";
import { DEG, WGS84 } from "./wgs84";

/** Options of {@link computeCurveRadius}. All in m. */
export interface CurveRadiusOptions {
  /**
   * Distance from the middle point to each outer point of the shorter three-point fit, m; the longer fit
   * uses twice it. Default 25.
   */
  baseM?: number;
  /** Radii above this are reported as `Infinity` (a straight for any speed a heavy rig drives), m. Default 3000. */
  straightRadiusM?: number;
  /**
   * Standard deviation of the Gaussian that smooths the positions along the route before the fits, m;
   * 0 for none. Default 30.
   */
  positionSigmaM?: number;
}

const E2 = WGS84.f * (2 - WGS84.f); // first eccentricity squared, e² = f(2 − f)

/**
 * Horizontal curve radius at every sample, from positions smoothed along the route so that GPS noise
 * invents no bends:
 *
 * 1. latitude and longitude are smoothed, inside each segment, by a Gaussian of standard deviation
 *    `positionSigmaM` along the distance (cut at ±3σ, segment ends extended by odd reflection, which
 *    continues a straight exactly). Over ±3σ = ±90 m the map from degrees to metres is linear to well under
 *    a millimetre, so smoothing the degrees is smoothing the local tangent plane;
 * 2. two three-point fits, with outer points about `baseM` and about 2·`baseM` before and after the sample:
 *    the radius of the circle through the three (circumradius R = abc / (4·area) of the triangle), computed
 *    in the local tangent plane at the middle sample with the WGS 84 meridian and prime-vertical radii of
 *    curvature M = a(1 − e²)/W³ and N = a/W, W = √(1 − e² sin²φ) (standard ellipsoid geometry, e.g.
 *    W. Torge and J. Müller, "Geodesy", 4th ed., 2012);
 * 3. the larger of the two radii (the gentler reading) is the sample's radius.
 *
 * Why [E]: position noise of σ metres adds a false sagitta s to a chord c, read as a bend of radius
 * c² / (8s). Unsmoothed, independent noise of σ = 3 m over the 50 m chord reads as radii near 20 m on a
 * straight, and slowly drifting recorded noise near 70–120 m: the rig would slow to 23 km/h for bends
 * that are not there. Smoothing at σ = 30 m cuts the noise's sagitta several times, and the 100 m chord
 * of the longer fit quarters the radius error a given sagitta makes; on straights with σ = 3 m noise,
 * drifting or independent, no sample then reads below about 300 m (curve speed ≈ 88 km/h at 2 m/s²,
 * above the towing cruise). A real bend keeps its radius: the Gaussian shrinks a circular arc by the
 * factor exp(−σ²/(2R²)) (under 1 % at R = 400 m, about 4 % at R = 100 m), and a hairpin turns so far
 * within either chord that both fits read it tight: a 20 m hairpin still reads about 20 m (both checked
 * in tests/unit/route/profile.test.ts). `Infinity` on a straight (R > straightRadiusM), at the first and
 * last sample of each segment, and where the three points coincide.
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
  const sigmaM = options.positionSigmaM ?? 30;
  if (!(sigmaM >= 0)) throw new RangeError("positionSigmaM must be ≥ 0 m");
  const out = new Float64Array(lat.length).fill(Infinity);
  const sLat = new Float64Array(lat.length);
  const sLon = new Float64Array(lon.length);
  const unwrapped = new Float64Array(lon.length);
  for (const [a, b] of segmentRanges(gapAfter)) {
    if (b - a < 2) continue;
    const spacing = ((distanceM[b] as number) - (distanceM[a] as number)) / (b - a);
    unwrapped[a] = lon[a] as number;
    for (let i = a + 1; i <= b; i++) unwrapped[i] = (unwrapped[i - 1] as number) + dLon(lon[i] as number, lon[i - 1] as number);
    if (sigmaM > 0) {
      const sigma = sigmaM / spacing;
      gaussianFilter(lat, a, b, sigma, sLat);
      gaussianFilter(unwrapped, a, b, sigma, sLon);
    } else {
      sLat.set(lat.subarray(a, b + 1), a);
      sLon.set(unwrapped.subarray(a, b + 1), a);
    }
    const k = Math.max(1, Math.round(baseM / spacing));
    const k2 = Math.max(2, Math.round((2 * baseM) / spacing));
    for (let i = a + 1; i < b; i++) {
      const short = circumradius(sLat, sLon, Math.max(a, i - k), i, Math.min(b, i + k));
      const long = circumradius(sLat, sLon, Math.max(a, i - k2), i, Math.min(b, i + k2));
      const r = Math.max(short, long);
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
