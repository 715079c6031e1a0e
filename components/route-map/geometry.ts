/**
 * Plain geometry on a {@link RouteView} line for the map and the profile: a position at a distance, the
 * nearest point of the line to a position, colour runs, descent slices and distance markers. Pure (no
 * MapLibre, no DOM), so the unit tests import it directly. Positions are WGS 84 degrees, distances metres.
 *
 * Interpolation between two vertices is linear in latitude and longitude. The simplified line's vertices are
 * close together (legs of a recorded track are metres to hundreds of metres), where this departs from the
 * geodesic by centimetres; it is also exactly how MapLibre draws a LineString leg in Web Mercator at these
 * scales, so a marker placed here sits on the drawn line.
 */
import type { RouteView } from "@/lib/route";

/** The map line of a route view. */
export type RouteLine = RouteView["line"];

/** A GeoJSON position: [longitude, latitude], degrees. */
export type LonLat = [number, number];

/** IUGG mean Earth radius, m (Moritz, "Geodetic Reference System 1980", Bull. Géod. 54, 1980). */
const EARTH_RADIUS_M = 6_371_008.8;
const DEG = Math.PI / 180;

/**
 * Index i of the step [i, i+1] of a non-decreasing distance array that contains `d`: the last i ≤ n−2 with
 * `distances[i] ≤ d`, or 0 below the start. Binary search, O(log n).
 * @param distances cumulative distances, m, non-decreasing, length ≥ 2
 * @param d distance, m
 */
export function stepIndexAt(distances: ArrayLike<number>, d: number): number {
  let lo = 0;
  let hi = distances.length - 2;
  if (hi < 0 || !(d >= distances[0]!)) return 0;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (distances[mid]! <= d) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function lerpVertex(line: RouteLine, i: number, t: number): LonLat {
  const lon0 = line.lon[i]!;
  const lat0 = line.lat[i]!;
  if (t <= 0) return [lon0, lat0];
  const lon1 = line.lon[i + 1] ?? lon0;
  const lat1 = line.lat[i + 1] ?? lat0;
  if (t >= 1) return [lon1, lat1];
  return [lon0 + (lon1 - lon0) * t, lat0 + (lat1 - lat0) * t];
}

/**
 * Position at a distance along the line, interpolated between vertices. Distances outside the line are
 * clamped to its ends; at a gap between segments the start of the next segment is returned (the gap itself
 * carries no distance).
 * @param line the view's line
 * @param distanceM distance from the start, m
 * @returns [lon, lat] in degrees, or null for an empty line or a non-finite distance
 */
export function positionAtDistance(line: RouteLine, distanceM: number): LonLat | null {
  const n = line.distanceM.length;
  if (n === 0 || !Number.isFinite(distanceM)) return null;
  if (n === 1) return [line.lon[0]!, line.lat[0]!];
  const i = stepIndexAt(line.distanceM, distanceM);
  const a = line.distanceM[i]!;
  const b = line.distanceM[i + 1]!;
  if (line.gapAfter[i]) return lerpVertex(line, i, 1);
  return lerpVertex(line, i, b > a ? (distanceM - a) / (b - a) : 0);
}

/** The point of a line nearest to a position. */
export interface NearestPoint {
  /** Distance along the route of the nearest point, m. */
  distanceM: number;
  /** The nearest point, [lon, lat] degrees. */
  position: LonLat;
  /** Ground distance from the query position to it, m (local plane, good to < 0.5 % within 50 km). */
  offsetM: number;
}

/**
 * The point of the line nearest to a position, searching every drawn step (gaps between segments are
 * skipped). Steps are projected onto a plane tangent at the query position (equirectangular: x = R·Δλ·cos φ₀,
 * y = R·Δφ; Snyder, "Map Projections — A Working Manual", USGS PP 1395, 1987, p. 90), where the foot of the
 * perpendicular is the classic clamped vector projection t = (p − a)·(b − a) / |b − a|².
 * @param line the view's line
 * @param lat latitude of the query position, degrees
 * @param lon longitude of the query position, degrees
 * @returns the nearest point, or null for an empty line
 */
export function nearestOnLine(line: RouteLine, lat: number, lon: number): NearestPoint | null {
  const n = line.distanceM.length;
  if (n === 0 || !Number.isFinite(lat) || !Number.isFinite(lon)) return null;
  const kx = EARTH_RADIUS_M * DEG * Math.cos(lat * DEG);
  const ky = EARTH_RADIUS_M * DEG;
  const px = (i: number) => wrapDelta(line.lon[i]! - lon) * kx;
  const py = (i: number) => (line.lat[i]! - lat) * ky;
  let best: NearestPoint = { distanceM: line.distanceM[0]!, position: [line.lon[0]!, line.lat[0]!], offsetM: Math.hypot(px(0), py(0)) };
  for (let i = 0; i < n - 1; i++) {
    if (line.gapAfter[i]) continue;
    const ax = px(i);
    const ay = py(i);
    const dx = px(i + 1) - ax;
    const dy = py(i + 1) - ay;
    const len2 = dx * dx + dy * dy;
    const t = len2 > 0 ? Math.max(0, Math.min(1, -(ax * dx + ay * dy) / len2)) : 0;
    const offset = Math.hypot(ax + t * dx, ay + t * dy);
    if (offset < best.offsetM) {
      const a = line.distanceM[i]!;
      best = { distanceM: a + t * (line.distanceM[i + 1]! - a), position: lerpVertex(line, i, t), offsetM: offset };
    }
  }
  return best;
}

function wrapDelta(dLon: number): number {
  return dLon > 180 ? dLon - 360 : dLon < -180 ? dLon + 360 : dLon;
}

/** A run of consecutive steps of one colour, drawn as one LineString. */
export interface ColourRun {
  coordinates: LonLat[];
  colour: string;
  /** Whether the run lies inside one of the given descents. */
  inDescent: boolean;
  /** Distance along the route where the run starts and ends, m. */
  fromM: number;
  toM: number;
}

/** A distance range along the route, m (a descent's `startDistanceM`…`endDistanceM`). */
export interface DistanceRange {
  startDistanceM: number;
  endDistanceM: number;
}

/** Whether distance `d` lies inside any of the ranges (sorted or not; there are only a handful). */
export function inRanges(ranges: readonly DistanceRange[], d: number): boolean {
  return ranges.some((r) => d >= r.startDistanceM && d <= r.endDistanceM);
}

/**
 * Splits the line into runs of one colour, never across a gap between segments and never across a descent's
 * end, so the map draws it as a few LineStrings with data-driven `line-color` and `line-width` instead of one
 * feature per step. A step belongs to a descent when its midpoint does (the view keeps descent ends as
 * vertices, so no step straddles one).
 * @param line the view's line
 * @param colourOf colour of the step from vertex i to i+1 (see `RouteColouring.colourOf`)
 * @param descents ranges to mark as `inDescent`; default none
 */
export function colourRuns(
  line: RouteLine,
  colourOf: (stretch: { fromM: number; toM: number; grade: number }) => string,
  descents: readonly DistanceRange[] = [],
): ColourRun[] {
  const runs: ColourRun[] = [];
  let current: ColourRun | null = null;
  let lastVertex = -1;
  for (let i = 0; i < line.distanceM.length - 1; i++) {
    if (line.gapAfter[i]) {
      current = null;
      continue;
    }
    const fromM = line.distanceM[i]!;
    const toM = line.distanceM[i + 1]!;
    const colour = colourOf({ fromM, toM, grade: line.grade[i] ?? 0 });
    const inDescent = inRanges(descents, (fromM + toM) / 2);
    if (current && current.colour === colour && current.inDescent === inDescent && lastVertex === i) {
      current.coordinates.push([line.lon[i + 1]!, line.lat[i + 1]!]);
      current.toM = toM;
    } else {
      const coordinates: LonLat[] = [[line.lon[i]!, line.lat[i]!], [line.lon[i + 1]!, line.lat[i + 1]!]];
      current = { coordinates, colour, inDescent, fromM, toM };
      runs.push(current);
    }
    lastVertex = i + 1;
  }
  return runs;
}

/**
 * The part of the line between two distances, cut at interpolated ends and split at gaps (one array of
 * positions per drawn piece). Used to highlight descents.
 * @param line the view's line
 * @param fromM start distance, m
 * @param toM end distance, m
 */
export function sliceLine(line: RouteLine, fromM: number, toM: number): LonLat[][] {
  const parts: LonLat[][] = [];
  let current: LonLat[] | null = null;
  for (let i = 0; i < line.distanceM.length - 1; i++) {
    const a = line.distanceM[i]!;
    const b = line.distanceM[i + 1]!;
    if (line.gapAfter[i] || b < fromM || a > toM) {
      if (current) parts.push(current);
      current = null;
      continue;
    }
    if (!(b > a)) continue;
    const s = Math.max(a, fromM);
    const e = Math.min(b, toM);
    if (!current) current = [lerpVertex(line, i, (s - a) / (b - a))];
    current.push(lerpVertex(line, i, (e - a) / (b - a)));
  }
  if (current) parts.push(current);
  return parts.filter((p) => p.length >= 2);
}

/** A distance marker along the line (every km or mi). */
export interface DistanceMarker {
  /** Distance from the start, m. */
  distanceM: number;
  /** Label value in display units (e.g. 5 for "5 km"). */
  value: number;
  position: LonLat;
  /**
   * Placement priority when markers crowd (lower wins): 0 every 10 steps, 1 every 5, 2 every 2, 3 the rest.
   * The map uses it as the symbol sort key, so zoomed out the round numbers stay.
   */
  rank: number;
}

const MARKER_STEPS = [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];

/**
 * The marker step, in display units, for a route of a given length: the smallest of 1, 2, 5, 10, 20, … that
 * gives at most `maxMarkers` markers.
 * @param lengthUnits route length in display units (km or mi)
 * @param maxMarkers most markers; default 60
 */
export function markerStep(lengthUnits: number, maxMarkers = 60): number {
  return MARKER_STEPS.find((s) => lengthUnits / s <= maxMarkers) ?? MARKER_STEPS.at(-1)!;
}

/**
 * Markers every `step` display units along the line, from the first step to the end (none at the start, and
 * none within a quarter step of the end, where the end marker sits).
 * @param line the view's line
 * @param unitM metres per display unit (1000 for km, 1609.344 for mi)
 * @param step marker spacing in display units (see {@link markerStep})
 */
export function distanceMarkers(line: RouteLine, unitM: number, step: number): DistanceMarker[] {
  const end = line.distanceM.at(-1) ?? 0;
  const stepM = unitM * step;
  if (!(stepM > 0)) return [];
  const out: DistanceMarker[] = [];
  for (let k = 1; k * stepM <= end - 0.25 * stepM; k++) {
    const distanceM = k * stepM;
    const position = positionAtDistance(line, distanceM);
    if (!position) break;
    const rank = k % 10 === 0 ? 0 : k % 5 === 0 ? 1 : k % 2 === 0 ? 2 : 3;
    out.push({ distanceM, value: k * step, position, rank });
  }
  return out;
}
