import { DEG } from "./wgs84";

/** Legs longer than this are interpolated along a great circle rather than linearly in degrees, m. */
const LINEAR_MAX_M = 1000;

/**
 * Position at fraction `t` of the leg from point 1 to point 2, written into `lat[k]`, `lon[k]`.
 *
 * Legs up to 1 km (every leg of a recorded track) are interpolated linearly in latitude and longitude:
 * the path then departs from the geodesic by about L²·tan φ / (8R), under 3 cm for L = 1 km below 60°
 * latitude. Longer legs (sparse planned routes) are interpolated along the great circle by spherical
 * linear interpolation (K. Shoemake, "Animating rotation with quaternion curves", SIGGRAPH 1985), whose
 * departure from the ellipsoidal geodesic is of order f·L, metres over tens of kilometres. Longitudes are
 * unwrapped across the antimeridian and returned in [−180, 180).
 *
 * @param t fraction of the leg, 0…1
 * @param legM leg length, m
 */
export function interpolatePosition(
  lat1: number,
  lon1: number,
  lat2: number,
  lon2: number,
  t: number,
  legM: number,
  lat: Float64Array,
  lon: Float64Array,
  k: number,
): void {
  let dLon = lon2 - lon1;
  if (dLon > 180) dLon -= 360;
  else if (dLon < -180) dLon += 360;
  if (legM <= LINEAR_MAX_M || t === 0 || t === 1) {
    lat[k] = t === 1 ? lat2 : lat1 + (lat2 - lat1) * t;
    lon[k] = t === 1 ? lon2 : wrapLon(lon1 + dLon * t);
    return;
  }
  slerp(lat1 * DEG, lon1 * DEG, lat2 * DEG, (lon1 + dLon) * DEG, t, lat, lon, k);
}

function slerp(
  p1: number,
  l1: number,
  p2: number,
  l2: number,
  t: number,
  lat: Float64Array,
  lon: Float64Array,
  k: number,
): void {
  const x1 = Math.cos(p1) * Math.cos(l1);
  const y1 = Math.cos(p1) * Math.sin(l1);
  const z1 = Math.sin(p1);
  const x2 = Math.cos(p2) * Math.cos(l2);
  const y2 = Math.cos(p2) * Math.sin(l2);
  const z2 = Math.sin(p2);
  const omega = Math.acos(Math.min(1, Math.max(-1, x1 * x2 + y1 * y2 + z1 * z2)));
  const s = Math.sin(omega);
  const a = s < 1e-12 ? 1 - t : Math.sin((1 - t) * omega) / s;
  const b = s < 1e-12 ? t : Math.sin(t * omega) / s;
  const x = a * x1 + b * x2;
  const y = a * y1 + b * y2;
  const z = a * z1 + b * z2;
  lat[k] = Math.atan2(z, Math.hypot(x, y)) / DEG;
  lon[k] = wrapLon(Math.atan2(y, x) / DEG);
}

function wrapLon(lon: number): number {
  return lon >= 180 ? lon - 360 : lon < -180 ? lon + 360 : lon;
}
