/**
 * The GPX document as read by {@link parseGpx}: only what Fadeline models (tracks, routes, waypoints,
 * their names, descriptions, positions, elevations and times). Everything else in the file is ignored.
 */

/** The GPX 1.0 namespace (Topografix, http://www.topografix.com/GPX/1/0/gpx.xsd). */
export const GPX_1_0_NS = "http://www.topografix.com/GPX/1/0";
/** The GPX 1.1 namespace (Topografix, http://www.topografix.com/GPX/1/1/gpx.xsd). */
export const GPX_1_1_NS = "http://www.topografix.com/GPX/1/1";

/** One point of a track segment, a route or a waypoint. */
export interface GpxPoint {
  /** Latitude, degrees (WGS 84), in [−90, 90]. */
  lat: number;
  /** Longitude, degrees (WGS 84), in [−180, 180]. */
  lon: number;
  /** Elevation, m; `null` when the file has none for this point (0 is a real value: sea level). */
  eleM: number | null;
  /** Time, s since 1970-01-01T00:00:00Z; `null` when absent or unreadable. */
  timeS: number | null;
  /** 1-based line of the point's opening tag in the source text. */
  line: number;
}

/** A waypoint: a point with its own name and description (plain text). */
export interface GpxWaypoint extends GpxPoint {
  name: string | null;
  description: string | null;
}

/** A track (`trk`, recorded, with segments) or a route (`rte`, planned, one sequence of points). */
export interface GpxTrack {
  /** Stable id within the document: "track:0", "route:1", … (0-based index in its list). */
  id: string;
  kind: "track" | "route";
  /** 0-based index in `tracks` or `routes`. */
  index: number;
  /** Name as plain text (CDATA and entities decoded, never HTML), trimmed; `null` when absent or empty. */
  name: string | null;
  description: string | null;
  /** Track segments in file order; a route has exactly one. A segment may be empty. */
  segments: GpxPoint[][];
  /**
   * `true` when every timed point is at or after the previous timed point, `false` when some go backwards,
   * `null` when no point has a time.
   */
  timesOrdered: boolean | null;
}

/** A parsed GPX file. */
export interface GpxDocument {
  /** "1.0" or "1.1" from the namespace; `null` for a `gpx` root without a namespace (read as 1.1). */
  version: "1.0" | "1.1" | null;
  /** Document name (GPX 1.1 `metadata/name`, GPX 1.0 `gpx/name`), plain text. */
  name: string | null;
  description: string | null;
  tracks: GpxTrack[];
  routes: GpxTrack[];
  waypoints: GpxWaypoint[];
}
