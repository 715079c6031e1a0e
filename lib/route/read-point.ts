import type { GpxPoint } from "./gpx-types";
import { decimalError, decimalValue } from "./parse-decimal";
import { parseGpxTime } from "./parse-time";
import { type ProblemLocation, type RouteProblem, routeError } from "./problems";

/** What the parser has collected for one `trkpt`, `rtept` or `wpt` before it is validated. */
export interface PendingPoint {
  latText: string | undefined;
  lonText: string | undefined;
  eleText: string | undefined;
  timeText: string | undefined;
  name: string | null;
  description: string | null;
  line: number;
  kind: "track" | "route" | "waypoint";
  /** 0-based index of the track or route (unused for waypoints). */
  index: number;
  /** 0-based segment of a track point. */
  segment: number;
  /** 0-based index of the point in its segment, route or the waypoint list. */
  point: number;
}

/** Where a point is, for a problem (built only when a problem is reported). */
export function pointWhere(p: PendingPoint): ProblemLocation {
  const { line, kind, point } = p;
  if (kind === "waypoint") return { line, kind, point };
  if (kind === "route") return { line, kind, index: p.index, point };
  return { line, kind, index: p.index, segment: p.segment, point };
}

/** Human label of a point for messages: "Track 1, segment 2, point 15 (line 40)". */
export function pointLabel(p: PendingPoint): string {
  const at = `point ${p.point + 1} (line ${p.line})`;
  if (p.kind === "waypoint") return `Waypoint ${p.point + 1} (line ${p.line})`;
  if (p.kind === "route") return `Route ${p.index + 1}, ${at}`;
  return `Track ${p.index + 1}, segment ${p.segment + 1}, ${at}`;
}

/** Value rules applied to every point. */
export interface PointRules {
  maxValueChars: number;
  /** Refuse lon = 180 as GPX 1.1's longitudeType does (−180 ≤ lon < 180). */
  rejectLongitude180: boolean;
  /** Lowest and highest believable elevation, m. */
  minElevationM: number;
  maxElevationM: number;
}

/** Where {@link readPoint} reports bad values (a ProblemList). */
export interface ProblemSink {
  add(problem: RouteProblem): void;
}

/** Where {@link readPoint} reports unreadable or zone-less times of valid points (TimeNotes). */
export interface TimeSink {
  noteTime(issue: "invalid" | "no-zone" | null, p: PendingPoint): void;
}

const REASON = {
  empty: "is empty",
  syntax: "is not a plain decimal number",
  "too-long": "is too long to be a number",
} as const;

/**
 * Validates one point: latitude in [−90, 90] and longitude in [−180, 180] (GPX 1.1 latitudeType and
 * longitudeType; lon = 180, the same meridian as −180, is accepted unless `rejectLongitude180`),
 * elevation within the believable range, all as strict xsd:decimal. Times never make a point invalid.
 * Called once per point, so nothing is allocated on the way but the point itself.
 *
 * @param problems receives one problem per bad value, in the order latitude, longitude, elevation
 * @param times receives the time issue of a valid point (`null` when its time is fine or absent)
 * @returns the point, or `null` when a value is bad
 */
export function readPoint(p: PendingPoint, rules: PointRules, problems: ProblemSink, times: TimeSink): GpxPoint | null {
  const lat = coordinate(p, "latitude", p.latText, 90, false, rules, problems);
  const lon = coordinate(p, "longitude", p.lonText, 180, rules.rejectLongitude180, rules, problems);
  const eleM = elevation(p, rules, problems);
  if (lat === null || lon === null || eleM === undefined) return null;
  let timeS: number | null = null;
  let timeIssue: "invalid" | "no-zone" | null = null;
  if (p.timeText !== undefined) {
    const t = parseGpxTime(p.timeText);
    if (t.ok) {
      timeS = t.timeS;
      if (!t.hasZone) timeIssue = "no-zone";
    } else timeIssue = "invalid";
  }
  times.noteTime(timeIssue, p);
  return { lat, lon, eleM, timeS, line: p.line };
}

function coordinate(
  p: PendingPoint,
  what: "latitude" | "longitude",
  text: string | undefined,
  limit: number,
  maxExclusive: boolean,
  rules: PointRules,
  problems: ProblemSink,
): number | null {
  if (text === undefined) {
    problems.add(routeError("missing-coordinate", `${pointLabel(p)}: the ${what} attribute is missing.`, pointWhere(p)));
    return null;
  }
  const value = decimalValue(text, rules.maxValueChars);
  if (Number.isNaN(value)) {
    problems.add(routeError("invalid-number", `${pointLabel(p)}: ${what} ${quote(text)} ${reason(text, rules)}.`, pointWhere(p)));
    return null;
  }
  if (value < -limit || value > limit || (maxExclusive && value === limit)) {
    const range = `−${limit} to ${maxExclusive ? "below " : ""}${limit}`;
    const code = what === "latitude" ? "latitude-out-of-range" : "longitude-out-of-range";
    problems.add(routeError(code, `${pointLabel(p)}: ${what} ${value} is outside ${range} degrees.`, pointWhere(p)));
    return null;
  }
  return value;
}

/** Elevation in m, `null` when absent, `undefined` when invalid (a problem was added). */
function elevation(p: PendingPoint, rules: PointRules, problems: ProblemSink): number | null | undefined {
  if (p.eleText === undefined) return null;
  const value = decimalValue(p.eleText, rules.maxValueChars);
  if (Number.isNaN(value)) {
    problems.add(
      routeError("invalid-number", `${pointLabel(p)}: elevation ${quote(p.eleText)} ${reason(p.eleText, rules)}.`, pointWhere(p)),
    );
    return undefined;
  }
  if (value < rules.minElevationM || value > rules.maxElevationM) {
    problems.add(
      routeError(
        "elevation-out-of-range",
        `${pointLabel(p)}: elevation ${value} m is outside the believable range ` +
          `${rules.minElevationM} to ${rules.maxElevationM} m.`,
        pointWhere(p),
      ),
    );
    return undefined;
  }
  return value;
}

/** Why a value that {@link decimalValue} refused is not a number, for the message. */
function reason(text: string, rules: PointRules): string {
  return REASON[decimalError(text, rules.maxValueChars) ?? "syntax"];
}

/** Quotes a value for a message, shortened so a hostile value cannot flood the message. */
function quote(text: string): string {
  const short = text.length > 24 ? `${text.slice(0, 24)}…` : text;
  return JSON.stringify(short);
}
