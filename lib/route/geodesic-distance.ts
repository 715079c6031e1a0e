import { DEG, type Ellipsoid, WGS84 } from "./wgs84";

const MAX_ITERATIONS = 200;
/** Convergence threshold on λ, rad (1e-12 rad is about 6 µm on the Earth). */
const LAMBDA_EPSILON = 1e-12;

/**
 * Geodesic (shortest) distance between two points on an ellipsoid, by T. Vincenty's inverse formula:
 * "Direct and inverse solutions of geodesics on the ellipsoid with application of nested equations",
 * Survey Review 23 (176), 1975, pp. 88–93, equations (13)–(20) with (3)–(6). Accurate to well under a
 * millimetre for the point spacings of a GPS track.
 *
 * Vincenty's iteration does not converge for some nearly antipodal pairs (more than about 179.5° of
 * longitude apart). Those are never consecutive points of a real track; for them this function falls back
 * to the great-circle distance on a sphere of the ellipsoid's mean radius (2a + b) / 3, which is within
 * about 0.5 % of the true value, instead of throwing.
 *
 * @param lat1 latitude of the first point, degrees
 * @param lon1 longitude of the first point, degrees
 * @param lat2 latitude of the second point, degrees
 * @param lon2 longitude of the second point, degrees
 * @param ellipsoid reference ellipsoid (default WGS 84)
 * @returns distance along the ellipsoid surface, m (0 for identical points)
 * @example
 * geodesicDistance(-37.9510334, 144.4248701, -37.6528211, 143.9264955); // ≈ 54 972.27 m
 */
export function geodesicDistance(
  lat1: number,
  lon1: number,
  lat2: number,
  lon2: number,
  ellipsoid: Ellipsoid = WGS84,
): number {
  const { a, f } = ellipsoid;
  const b = a * (1 - f);
  const L = normalizeRad((lon2 - lon1) * DEG);
  const U1 = Math.atan((1 - f) * Math.tan(lat1 * DEG));
  const U2 = Math.atan((1 - f) * Math.tan(lat2 * DEG));
  const sinU1 = Math.sin(U1);
  const cosU1 = Math.cos(U1);
  const sinU2 = Math.sin(U2);
  const cosU2 = Math.cos(U2);

  let lambda = L;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const sinLambda = Math.sin(lambda);
    const cosLambda = Math.cos(lambda);
    const t1 = cosU2 * sinLambda;
    const t2 = cosU1 * sinU2 - sinU1 * cosU2 * cosLambda;
    const sinSigma = Math.sqrt(t1 * t1 + t2 * t2); // eq. (14)
    if (sinSigma === 0) return 0; // coincident points
    const cosSigma = sinU1 * sinU2 + cosU1 * cosU2 * cosLambda; // eq. (15)
    const sigma = Math.atan2(sinSigma, cosSigma); // eq. (16)
    const sinAlpha = (cosU1 * cosU2 * sinLambda) / sinSigma; // eq. (17)
    const cos2Alpha = 1 - sinAlpha * sinAlpha;
    // eq. (18); on an equatorial line cos²α = 0 and the term vanishes.
    const cos2SigmaM = cos2Alpha === 0 ? 0 : cosSigma - (2 * sinU1 * sinU2) / cos2Alpha;
    const C = (f / 16) * cos2Alpha * (4 + f * (4 - 3 * cos2Alpha)); // eq. (10)
    const previous = lambda;
    lambda =
      L +
      (1 - C) *
        f *
        sinAlpha *
        (sigma + C * sinSigma * (cos2SigmaM + C * cosSigma * (-1 + 2 * cos2SigmaM * cos2SigmaM))); // eq. (11)
    if (Math.abs(lambda) > Math.PI) break; // diverging: nearly antipodal
    if (Math.abs(lambda - previous) < LAMBDA_EPSILON) {
      return vincentyLength(b, (a * a - b * b) / (b * b), cos2Alpha, sinSigma, cosSigma, sigma, cos2SigmaM);
    }
  }
  return sphericalDistance(lat1, lon1, lat2, lon2, (2 * a + b) / 3);
}

/** Eqs. (3), (4), (6) and (19) of Vincenty (1975): the geodesic length s from the converged auxiliary arc. */
function vincentyLength(
  b: number,
  ePrime2: number,
  cos2Alpha: number,
  sinSigma: number,
  cosSigma: number,
  sigma: number,
  cos2SigmaM: number,
): number {
  const u2 = cos2Alpha * ePrime2;
  const A = 1 + (u2 / 16384) * (4096 + u2 * (-768 + u2 * (320 - 175 * u2)));
  const B = (u2 / 1024) * (256 + u2 * (-128 + u2 * (74 - 47 * u2)));
  const c2 = cos2SigmaM * cos2SigmaM;
  const deltaSigma =
    B *
    sinSigma *
    (cos2SigmaM +
      (B / 4) *
        (cosSigma * (-1 + 2 * c2) - (B / 6) * cos2SigmaM * (-3 + 4 * sinSigma * sinSigma) * (-3 + 4 * c2)));
  return b * A * (sigma - deltaSigma);
}

/** Great-circle distance by the haversine formula (R. W. Sinnott, Sky & Telescope 68 (2), 1984, p. 159). */
function sphericalDistance(lat1: number, lon1: number, lat2: number, lon2: number, radius: number): number {
  const dLat = (lat2 - lat1) * DEG;
  const dLon = (lon2 - lon1) * DEG;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * DEG) * Math.cos(lat2 * DEG) * Math.sin(dLon / 2) ** 2;
  return 2 * radius * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** Wraps an angle to (−π, π], rad. */
function normalizeRad(x: number): number {
  let y = x % (2 * Math.PI);
  if (y > Math.PI) y -= 2 * Math.PI;
  if (y <= -Math.PI) y += 2 * Math.PI;
  return y;
}
