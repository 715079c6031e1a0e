import { dedupeSegment } from "./dedupe-segment";
import { type ElevationGap, fillElevation } from "./fill-elevation";
import type { GpxTrack } from "./gpx-types";
import { elevationProblems } from "./elevation-problems";
import { formatCount, formatDistance, type RouteProblem, routeError, routeWarning } from "./problems";

/** One cleaned segment: at least two distinct points, every one with an elevation. */
export interface CleanSegment {
  /** Latitude, degrees (WGS 84). */
  lat: Float64Array;
  /** Longitude, degrees (WGS 84). */
  lon: Float64Array;
  /** Elevation, m (small gaps filled). */
  eleM: Float64Array;
  /** Cumulative geodesic distance from the segment's first point, m; strictly increasing. */
  distanceM: Float64Array;
}

/** A track ready for resampling. */
export interface CleanTrack {
  id: string;
  kind: "track" | "route";
  name: string | null;
  segments: CleanSegment[];
  /** Total length of all segments (gaps between segments excluded), m. */
  lengthM: number;
}

/** Options of {@link cleanTrack}. */
export interface CleanTrackOptions {
  /** Consecutive points closer than this are merged, m. Default 0.05 (about the rounding of 7 decimals). */
  duplicateToleranceM?: number;
  /** Shortest track accepted, m. Default 200. */
  minLengthM?: number;
  /** Longest interior elevation gap filled by interpolation, m. Default 500. */
  maxElevationGapM?: number;
  /** Longest elevation gap filled at a segment's start or end (by holding the nearest value), m. Default 100. */
  maxEdgeGapM?: number;
  /** A single step longer than this is reported as a suspicious jump (warning), m. Default 10 000. */
  maxJumpM?: number;
}

/** Result of {@link cleanTrack}. */
export type CleanTrackResult =
  | { ok: true; track: CleanTrack; warnings: RouteProblem[] }
  | { ok: false; problems: RouteProblem[] };

/**
 * Cleans a chosen track or route: merges consecutive duplicate points, drops segments left with fewer
 * than two distinct points, requires at least two distinct points and `minLengthM` of length, and makes
 * sure every point has an elevation: gaps up to `maxElevationGapM` are interpolated (up to `maxEdgeGapM`
 * at segment ends); a file with no elevation, or with longer gaps, is refused with a message that says how
 * to export one that works. Segments stay separate: the gap between two segments is never distance.
 *
 * @param track from {@link selectTrack}
 * @param options thresholds (see {@link CleanTrackOptions}; all in m)
 * @returns the clean track and warnings, or the problems that make it unusable
 * @example
 * const r = cleanTrack(track, { maxElevationGapM: 300 });
 */
export function cleanTrack(track: GpxTrack, options: CleanTrackOptions = {}): CleanTrackResult {
  const tolerance = options.duplicateToleranceM ?? 0.05;
  const minLengthM = options.minLengthM ?? 200;
  const maxJumpM = options.maxJumpM ?? 10_000;
  const warnings: RouteProblem[] = [];
  const deduped = track.segments.map((s) => dedupeSegment(s, tolerance));
  const kept = deduped.filter((s) => s.lat.length >= 2);
  reportDropsAndMerges(track, deduped, warnings);
  const label = track.kind === "track" ? "track" : "route";
  if (kept.length === 0) {
    const message = `The ${label} has fewer than two distinct points, so it has no length or slope to model.`;
    return { ok: false, problems: [routeError("too-few-points", message)] };
  }
  const lengthM = kept.reduce((sum, s) => sum + (s.dist[s.dist.length - 1] as number), 0);
  if (lengthM < minLengthM) {
    const message =
      `The ${label} is only ${Math.round(lengthM)} m long; Fadeline needs at least ` +
      `${Math.round(minLengthM)} m to model it.`;
    return { ok: false, problems: [routeError("too-short", message, { distanceM: lengthM })] };
  }
  const filled = kept.map((s) =>
    fillElevation(s.ele, s.dist, options.maxElevationGapM ?? 500, options.maxEdgeGapM ?? 100),
  );
  const gaps = trackGaps(kept, filled.map((f) => f.gaps));
  const totalPoints = kept.reduce((n, s) => n + s.lat.length, 0);
  const filledPoints = filled.reduce((n, f) => n + f.filledPoints, 0);
  const elevation = elevationProblems(label, totalPoints, filledPoints, gaps, filled.map((f) => f.ele), {
    maxElevationGapM: options.maxElevationGapM ?? 500,
    lengthM,
    sourcePoints: kept.reduce((n, s) => n + s.ele.filter((e) => e !== null).length, 0),
  });
  if (elevation.some((p) => p.severity === "error")) return { ok: false, problems: elevation };
  warnings.push(...elevation);
  deduped.forEach((s, i) => {
    if (s.longestLegM > maxJumpM) warnings.push(jumpWarning(label, i, s.longestLegM, s.longestLegAt));
  });
  const segments = kept.map((s, i) => ({
    lat: Float64Array.from(s.lat),
    lon: Float64Array.from(s.lon),
    eleM: (filled[i] as { ele: Float64Array }).ele,
    distanceM: Float64Array.from(s.dist),
  }));
  return { ok: true, track: { id: track.id, kind: track.kind, name: track.name, segments, lengthM }, warnings };
}

/** Converts per-segment gaps to distances along the whole track (segments laid end to end). */
function trackGaps(kept: { dist: number[] }[], gaps: ElevationGap[][]): ElevationGap[] {
  const out: ElevationGap[] = [];
  let offset = 0;
  kept.forEach((s, i) => {
    for (const g of gaps[i] ?? []) out.push({ startM: offset + g.startM, lengthM: g.lengthM });
    offset += s.dist[s.dist.length - 1] as number;
  });
  return out;
}

function reportDropsAndMerges(
  track: GpxTrack,
  deduped: { lat: number[]; merged: number }[],
  warnings: RouteProblem[],
): void {
  const merged = deduped.reduce((n, s) => n + s.merged, 0);
  if (merged > 0) {
    warnings.push(
      routeWarning(
        "duplicate-points-merged",
        `${formatCount(merged)} repeated point(s) (the same position twice in a row) were merged.`,
      ),
    );
  }
  const dropped = deduped.flatMap((s, i) => (s.lat.length < 2 ? [i + 1] : []));
  if (dropped.length > 0 && dropped.length < deduped.length) {
    const list = dropped.slice(0, 10).join(", ") + (dropped.length > 10 ? ", …" : "");
    warnings.push(
      routeWarning(
        "empty-segment-dropped",
        `${formatCount(dropped.length)} segment(s) with fewer than two distinct points were left out ` +
          `(segment ${list}).`,
        { kind: track.kind, index: track.index },
      ),
    );
  }
}

function jumpWarning(label: string, segment: number, lengthM: number, at: number): RouteProblem {
  return routeWarning(
    "long-jump",
    `Segment ${segment + 1} of the ${label} jumps ${formatDistance(lengthM)} between two consecutive points ` +
      `(points ${at} and ${at + 1}). Check the file for a stray point.`,
    { segment, point: at },
  );
}
