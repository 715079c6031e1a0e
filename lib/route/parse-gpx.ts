import { GpxBuilder } from "./gpx-builder";
import { DEFAULT_GPX_LIMITS, type GpxLimits } from "./gpx-limits";
import { runSax } from "./gpx-sax";
import type { GpxDocument } from "./gpx-types";
import { formatCount, type RouteProblem, routeError } from "./problems";

/** Options of {@link parseGpx}. */
export interface ParseGpxOptions {
  /** Overrides of the hardening limits (defaults: {@link DEFAULT_GPX_LIMITS}). */
  limits?: Partial<GpxLimits>;
  /**
   * Refuse lon = 180 exactly, as the GPX 1.1 schema's longitudeType does (−180 ≤ lon < 180). Default
   * `false`: 180 is the same meridian as −180 and some tools write it, so it is accepted.
   */
  rejectLongitude180?: boolean;
  /**
   * Believable elevation range, m. Default [−500, 9000]: the lowest dry land on Earth lies about 430 m
   * below sea level and the highest summit about 8 850 m above it; values outside are device errors or
   * "no data" markers such as −99999.
   */
  elevationRangeM?: readonly [number, number];
}

/** Result of {@link parseGpx}: never a partial document when something fatal was found. */
export type ParseGpxResult =
  | { ok: true; gpx: GpxDocument; warnings: RouteProblem[] }
  | { ok: false; problems: RouteProblem[] };

/**
 * Parses GPX 1.0 or 1.1 text with a streaming, DOM-free XML parser, hardened for untrusted uploads
 * (docs/security.md §C): any DOCTYPE is refused (so no entity is ever declared, expanded or fetched), nesting,
 * attributes, text lengths and point counts are capped, malformed XML is an error rather than an empty
 * result, and the root must be `gpx` (GPX 1.0 / 1.1 namespace, or none: read as 1.1 with a warning).
 * Coordinates and elevations are strict xsd:decimal values in range; every bad value is reported with
 * where it is (track, segment, point, line) and makes the parse fail. Times are optional: unreadable or
 * out-of-order times are kept out or flagged, never fatal. Names and descriptions are plain text.
 *
 * Pure and isomorphic: no I/O, no DOM, no Node-only API. The caller decodes bytes to text (UTF-8, or
 * UTF-16 with a byte-order mark); a leading U+FEFF is ignored.
 *
 * @param text the file's text
 * @param options limits and value rules (see {@link ParseGpxOptions})
 * @returns `{ ok: true, gpx, warnings }` or `{ ok: false, problems }` with at least one error
 * @example
 * const r = parseGpx(text);
 * if (!r.ok) showProblems(r.problems); else listTracks(r.gpx);
 */
export function parseGpx(text: string, options: ParseGpxOptions = {}): ParseGpxResult {
  if (typeof text !== "string") throw new TypeError("text must be a string");
  const limits: GpxLimits = { ...DEFAULT_GPX_LIMITS, ...options.limits };
  const [minElevationM, maxElevationM] = options.elevationRangeM ?? [-500, 9000];
  if (!(minElevationM < maxElevationM)) throw new RangeError("elevationRangeM must be [min, max] with min < max");
  if (text.replace(/^\uFEFF/, "").trim() === "") {
    return { ok: false, problems: [routeError("file-empty", "The file is empty.")] };
  }
  if (text.length > limits.maxInputChars) {
    return {
      ok: false,
      problems: [
        routeError(
          "file-too-large",
          `The file is ${formatCount(text.length)} characters long; Fadeline reads GPX files of up to ` +
            `${formatCount(limits.maxInputChars)} characters.`,
        ),
      ],
    };
  }
  const builder = new GpxBuilder(limits, {
    maxValueChars: limits.maxValueChars,
    rejectLongitude180: options.rejectLongitude180 ?? false,
    minElevationM,
    maxElevationM,
  });
  const fatal = runSax(text, builder, limits);
  if (fatal !== null) return { ok: false, problems: [fatal] };
  builder.notes.finish(builder.problems);
  const problems = builder.problems.list();
  if (builder.problems.hasErrors) return { ok: false, problems };
  return { ok: true, gpx: builder.doc, warnings: problems };
}
