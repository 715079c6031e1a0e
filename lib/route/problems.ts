/**
 * Problems found while reading or cleaning a route file. Every problem carries a stable machine code, a
 * plain-English message written for the person who uploaded the file, and where it was found.
 */

/** Stable problem codes. Errors make the operation fail; warnings are informational. */
export type RouteProblemCode =
  // the file as a whole
  | "file-empty"
  | "file-too-large"
  | "not-xml"
  | "doctype"
  | "undefined-entity"
  | "stray-ampersand"
  | "prolog-too-long"
  | "too-deep"
  | "too-many-attributes"
  | "text-too-long"
  | "too-many-points"
  | "too-many-tracks"
  | "too-many-segments"
  | "not-gpx"
  | "wrong-namespace"
  | "no-namespace"
  | "too-many-problems"
  // one point
  | "missing-coordinate"
  | "invalid-number"
  | "latitude-out-of-range"
  | "longitude-out-of-range"
  | "elevation-out-of-range"
  | "invalid-time"
  | "time-without-zone"
  | "times-out-of-order"
  // choosing and cleaning a track
  | "no-track"
  | "unknown-track"
  | "empty-segment-dropped"
  | "duplicate-points-merged"
  | "too-few-points"
  | "too-short"
  | "long-jump"
  | "no-elevation"
  | "elevation-gaps"
  | "elevation-gaps-filled"
  | "flat-elevation";

/** Where a problem was found. Indices are 0-based; messages show them 1-based. */
export interface ProblemLocation {
  /** 1-based line in the source text. */
  line?: number;
  /** 0-based column in the source text. */
  column?: number;
  /** Which list the point belongs to. */
  kind?: "track" | "route" | "waypoint";
  /** Index of the track, route or waypoint in its list. */
  index?: number;
  /** Index of the segment within a track (routes have one). */
  segment?: number;
  /** Index of the point within its segment, route or the waypoint list. */
  point?: number;
  /** Distance along the chosen track, m. */
  distanceM?: number;
}

/** One problem. */
export interface RouteProblem {
  code: RouteProblemCode;
  severity: "error" | "warning";
  /** Plain-text message for the user (never HTML). */
  message: string;
  where?: ProblemLocation;
}

/** Builds an error problem. */
export function routeError(code: RouteProblemCode, message: string, where?: ProblemLocation): RouteProblem {
  return where === undefined ? { code, severity: "error", message } : { code, severity: "error", message, where };
}

/** Builds a warning problem. */
export function routeWarning(code: RouteProblemCode, message: string, where?: ProblemLocation): RouteProblem {
  return where === undefined
    ? { code, severity: "warning", message }
    : { code, severity: "warning", message, where };
}

/** Formats a count with thousands separators, independent of the runtime locale ("200,000"). */
export function formatCount(n: number): string {
  return String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ",");
}

/** Formats a distance for a message: "850 m" below 1 km, else "12.3 km". */
export function formatDistance(m: number): string {
  return m < 1000 ? `${Math.round(m)} m` : `${(m / 1000).toFixed(1)} km`;
}
