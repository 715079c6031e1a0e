/**
 * Reference ellipsoids used by lib/route. All lengths in metres.
 */

/** An oblate ellipsoid of revolution given by its semi-major axis and flattening. */
export interface Ellipsoid {
  /** Semi-major (equatorial) axis a, m. */
  a: number;
  /** Flattening f = (a − b) / a, dimensionless. */
  f: number;
}

/**
 * WGS 84: a = 6 378 137 m, 1/f = 298.257223563.
 * Source: NIMA TR8350.2, "Department of Defense World Geodetic System 1984", 3rd ed. (2000), Table 3.1.
 */
export const WGS84: Ellipsoid = { a: 6_378_137, f: 1 / 298.257223563 };

/**
 * Mean radius R1 = (2a + b) / 3 of WGS 84, m (about 6 371 008.8 m). Definition of the mean radius:
 * H. Moritz, "Geodetic Reference System 1980", Bulletin Géodésique 54 (1980), and NIMA TR8350.2 §3.
 */
export const WGS84_MEAN_RADIUS_M = (2 * WGS84.a + WGS84.a * (1 - WGS84.f)) / 3;

/** Degrees to radians. */
export const DEG = Math.PI / 180;
