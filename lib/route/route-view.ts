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
 * (Douglas & Peucker 1973) on a local equirectangular projection, between kept vertices (route ends, descent
 * ends, both sides of every segment gap), with the smallest tolerance of at least 2 m at which the line fits
 * `maxLinePoints`: every dropped sample lies within that tolerance of the drawn line. The profile keeps the
 * lowest and highest sample of each of `maxProfilePoints / 2` equal buckets, so no peak is lost.
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
  const anchors = new Uint8Array(n);
  anchors[0] = anchors[n - 1] = 1;
  for (const d of descents) anchors[d.startIndex] = anchors[d.endIndex] = 1;
  for (let i = 0; i < n - 1; i++) if (profile.gapAfter[i]) anchors[i] = anchors[i + 1] = 1;
  const lineIdx = simplifyToFit(profile, anchors, options.maxLinePoints ?? 4000);
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

/** Smallest simplification tolerance, m: finer wiggles are GPS noise at any map zoom. */
const MIN_TOLERANCE_M = 2;

/** Indices of the simplified line: the anchors and every vertex more significant than the chosen tolerance. */
function simplifyToFit(p: RouteProfile, anchors: Uint8Array, max: number): number[] {
  const n = p.lat.length;
  const cosLat0 = Math.cos((p.lat[0]! * Math.PI) / 180);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = ((p.lon[i]! * Math.PI) / 180) * cosLat0 * EARTH_RADIUS_M;
    y[i] = ((p.lat[i]! * Math.PI) / 180) * EARTH_RADIUS_M;
  }
  const sig = significance(x, y, anchors, MIN_TOLERANCE_M);
  const tolerance = fittingTolerance(sig, anchors, max);
  const idx: number[] = [];
  for (let i = 0; i < n; i++) if (anchors[i] || sig[i]! > tolerance) idx.push(i);
  return idx;
}

/**
 * Each vertex's Ramer–Douglas–Peucker significance, found in one pass: the recursion splits every span at
 * its farthest vertex (the first, on a tie) down to `floorM`, and records that distance, clamped to the
 * significance of the split that made the span. RDP with any tolerance t ≥ `floorM` then keeps exactly the
 * vertices whose significance exceeds t, because a vertex is kept iff it and every split above it stand
 * more than t off their chords. Vertices never split off get 0; anchors get Infinity.
 */
function significance(x: Float64Array, y: Float64Array, anchors: Uint8Array, floorM: number): Float64Array {
  const n = x.length;
  const sig = new Float64Array(n);
  const spans = new Int32Array(2 * n); // pending spans as (first, last) pairs
  const caps = new Float64Array(n); // significance of the split that made each pending span
  let top = 0;
  for (let a = -1, i = 0; i < n; i++) {
    if (!anchors[i]) continue;
    sig[i] = Infinity;
    if (a >= 0 && i - a > 1) {
      spans[2 * top] = a;
      spans[2 * top + 1] = i;
      caps[top++] = Infinity;
    }
    a = i;
  }
  const floor2 = floorM * floorM;
  while (top > 0) {
    top--;
    const a = spans[2 * top]!;
    const b = spans[2 * top + 1]!;
    const cap = caps[top]!;
    const ax = x[a]!;
    const ay = y[a]!;
    const dx = x[b]! - ax;
    const dy = y[b]! - ay;
    const len2 = dx * dx + dy * dy;
    let worst = -1;
    let worst2 = floor2;
    for (let i = a + 1; i < b; i++) {
      const px = x[i]! - ax;
      const py = y[i]! - ay;
      const t = len2 > 0 ? Math.max(0, Math.min(1, (px * dx + py * dy) / len2)) : 0;
      const ex = px - t * dx;
      const ey = py - t * dy;
      const d2 = ex * ex + ey * ey;
      if (d2 > worst2) {
        worst2 = d2;
        worst = i;
      }
    }
    if (worst < 0) continue;
    const s = Math.min(Math.sqrt(worst2), cap);
    sig[worst] = s;
    if (worst - a > 1) {
      spans[2 * top] = a;
      spans[2 * top + 1] = worst;
      caps[top++] = s;
    }
    if (b - worst > 1) {
      spans[2 * top] = worst;
      spans[2 * top + 1] = b;
      caps[top++] = s;
    }
  }
  return sig;
}

/** The smallest tolerance ≥ {@link MIN_TOLERANCE_M} that leaves at most `max` vertices (anchors always stay). */
function fittingTolerance(sig: Float64Array, anchors: Uint8Array, max: number): number {
  let anchorCount = 0;
  let candidates = 0;
  for (let i = 0; i < sig.length; i++) {
    if (anchors[i]) anchorCount++;
    else if (sig[i]! > MIN_TOLERANCE_M) candidates++;
  }
  const budget = max - anchorCount;
  if (candidates <= budget) return MIN_TOLERANCE_M;
  if (budget <= 0) return Infinity;
  const values = new Float64Array(candidates);
  for (let i = 0, k = 0; i < sig.length; i++) if (!anchors[i] && sig[i]! > MIN_TOLERANCE_M) values[k++] = sig[i]!;
  values.sort();
  return values[candidates - budget - 1]!; // keeps those above it: at most `budget`, fewer on a tie
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
