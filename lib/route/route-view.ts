import type { Descent } from "./find-descents";
import type { RouteStats } from "./route-stats";
import type { RouteProfile } from "./types";

/**
 * What a browser needs to draw a route: a simplified map line and a downsampled profile, small enough to send
 * for a 100,000-point track (a few hundred kB of JSON) while keeping every bend a map shows and every peak and
 * trough a chart shows. Indices refer to the full {@link RouteProfile}; numbers are rounded for size.
 */
export interface RouteView {
  line: {
    /** Degrees, WGS 84, 6 decimals (≈ 0.1 m). */
    lat: number[];
    lon: number[];
    /** Distance along the route of each vertex, m. */
    distanceM: number[];
    /** Mean grade from vertex i to vertex i+1 (dimensionless, negative downhill); the last repeats. */
    grade: number[];
    /** 1 where the step from vertex i to i+1 crosses a gap between track segments. */
    gapAfter: number[];
  };
  profile: { distanceM: number[]; elevationM: number[]; grade: number[] };
  descents: Descent[];
  stats: RouteStats;
  /** [west, south, east, north], degrees. */
  bounds: [number, number, number, number];
}

/** Limits of {@link buildRouteView}. */
export interface RouteViewOptions {
  /** Most map vertices. Default 4000. */
  maxLinePoints?: number;
  /** Most profile samples. Default 1500. */
  maxProfilePoints?: number;
}

const round = (x: number, digits: number) => Number(x.toFixed(digits));
const EARTH_RADIUS_M = 6_371_008.8; // IUGG mean radius; only used to project for simplification

/**
 * Builds the browser's view of a route. The map line is simplified with the Ramer–Douglas–Peucker algorithm
 * (Douglas & Peucker 1973) on a local equirectangular projection, per segment, the tolerance doubling from
 * 2 m until the line fits `maxLinePoints`; descent ends and segment ends are always kept. The profile keeps
 * the lowest and highest sample of each of `maxProfilePoints / 2` equal buckets, so no peak is lost.
 *
 * @param profile the full profile, SI units
 * @param descents descents found on it
 * @param stats its route stats
 * @param options vertex and sample limits
 * @returns the view, SI units, rounded
 * @example
 * const view = buildRouteView(profile, findDescents(profile), computeRouteStats(profile));
 */
export function buildRouteView(
  profile: RouteProfile,
  descents: Descent[],
  stats: RouteStats,
  options: RouteViewOptions = {},
): RouteView {
  const n = profile.distanceM.length;
  if (n < 2) throw new RangeError("profile needs at least two samples");
  const keep = new Set<number>([0, n - 1]);
  for (const d of descents) keep.add(d.startIndex).add(d.endIndex);
  for (let i = 0; i < n - 1; i++) if (profile.gapAfter[i]) keep.add(i).add(i + 1);
  const lineIdx = simplifyToFit(profile, keep, options.maxLinePoints ?? 4000);
  const profileIdx = bucketExtremes(profile.elevationM, Math.max(2, Math.floor((options.maxProfilePoints ?? 1500) / 2)));
  return {
    line: lineFrom(profile, lineIdx),
    profile: {
      distanceM: profileIdx.map((i) => round(profile.distanceM[i]!, 1)),
      elevationM: profileIdx.map((i) => round(profile.elevationM[i]!, 1)),
      grade: profileIdx.map((i) => round(profile.grade[i]!, 4)),
    },
    descents,
    stats,
    bounds: boundsOf(profile),
  };
}

function lineFrom(p: RouteProfile, idx: number[]): RouteView["line"] {
  const grade: number[] = [];
  const gapAfter: number[] = [];
  for (let k = 0; k < idx.length; k++) {
    const i = idx[k]!;
    const j = idx[k + 1];
    const gap = j !== undefined && hasGap(p, i, j);
    gapAfter.push(gap ? 1 : 0);
    if (j === undefined) grade.push(grade.at(-1) ?? 0);
    else grade.push(gap ? 0 : round((p.elevationM[j]! - p.elevationM[i]!) / Math.max(p.distanceM[j]! - p.distanceM[i]!, 1e-9), 4));
  }
  return {
    lat: idx.map((i) => round(p.lat[i]!, 6)),
    lon: idx.map((i) => round(p.lon[i]!, 6)),
    distanceM: idx.map((i) => round(p.distanceM[i]!, 1)),
    grade,
    gapAfter,
  };
}

function hasGap(p: RouteProfile, from: number, to: number): boolean {
  for (let i = from; i < to; i++) if (p.gapAfter[i]) return true;
  return false;
}

function simplifyToFit(p: RouteProfile, keep: Set<number>, max: number): number[] {
  const lat0 = (p.lat[0]! * Math.PI) / 180;
  const x = Float64Array.from(p.lon, (lon) => ((lon * Math.PI) / 180) * Math.cos(lat0) * EARTH_RADIUS_M);
  const y = Float64Array.from(p.lat, (lat) => ((lat * Math.PI) / 180) * EARTH_RADIUS_M);
  for (let tolerance = 2; ; tolerance *= 2) {
    const marked = new Uint8Array(p.lat.length);
    for (const i of keep) marked[i] = 1;
    const anchors = [...keep].sort((a, b) => a - b);
    for (let k = 0; k < anchors.length - 1; k++) douglasPeucker(x, y, anchors[k]!, anchors[k + 1]!, tolerance, marked);
    const idx: number[] = [];
    for (let i = 0; i < marked.length; i++) if (marked[i]) idx.push(i);
    if (idx.length <= max || tolerance > 1e6) return idx;
  }
}

/** Iterative Ramer–Douglas–Peucker between two kept vertices, marking the vertices to keep. */
function douglasPeucker(x: Float64Array, y: Float64Array, first: number, last: number, tol: number, marked: Uint8Array) {
  const stack: [number, number][] = [[first, last]];
  while (stack.length) {
    const [a, b] = stack.pop()!;
    let worst = -1;
    let worstD = tol;
    const dx = x[b]! - x[a]!;
    const dy = y[b]! - y[a]!;
    const len2 = dx * dx + dy * dy;
    for (let i = a + 1; i < b; i++) {
      const t = len2 > 0 ? Math.max(0, Math.min(1, ((x[i]! - x[a]!) * dx + (y[i]! - y[a]!) * dy) / len2)) : 0;
      const d = Math.hypot(x[i]! - x[a]! - t * dx, y[i]! - y[a]! - t * dy);
      if (d > worstD) {
        worstD = d;
        worst = i;
      }
    }
    if (worst >= 0) {
      marked[worst] = 1;
      stack.push([a, worst], [worst, b]);
    }
  }
}

/** Indices of the lowest and highest value in each of `buckets` equal runs, in order. */
function bucketExtremes(values: Float64Array, buckets: number): number[] {
  const n = values.length;
  if (n <= buckets * 2) return Array.from({ length: n }, (_, i) => i);
  const out: number[] = [];
  for (let b = 0; b < buckets; b++) {
    const from = Math.floor((b * n) / buckets);
    const to = Math.floor(((b + 1) * n) / buckets);
    let lo = from;
    let hi = from;
    for (let i = from; i < to; i++) {
      if (values[i]! < values[lo]!) lo = i;
      if (values[i]! > values[hi]!) hi = i;
    }
    out.push(...(lo === hi ? [lo] : lo < hi ? [lo, hi] : [hi, lo]));
  }
  if (out[0] !== 0) out.unshift(0);
  if (out.at(-1) !== n - 1) out.push(n - 1);
  return out;
}

function boundsOf(p: RouteProfile): [number, number, number, number] {
  let w = Infinity, s = Infinity, e = -Infinity, nn = -Infinity;
  for (let i = 0; i < p.lat.length; i++) {
    w = Math.min(w, p.lon[i]!);
    e = Math.max(e, p.lon[i]!);
    s = Math.min(s, p.lat[i]!);
    nn = Math.max(nn, p.lat[i]!);
  }
  return [w, s, e, nn];
}
