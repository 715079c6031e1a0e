/**
 * Hardening limits for {@link parseGpx}. They bound the work and memory any input can cause, so that
 * hostile files (docs/security.md C6–C10: deep nesting, attribute floods, huge text nodes, point floods) are
 * refused quickly with a specific message. Real GPX files stay far below every one of them.
 */
export interface GpxLimits {
  /** Longest input accepted, UTF-16 code units (≈ bytes for ASCII GPX). */
  maxInputChars: number;
  /** Longest prolog (XML declaration, comments) before the root element, characters. */
  maxPrologChars: number;
  /** Deepest element nesting, counting the root as 1. GPX itself needs 5 (gpx/trk/trkseg/trkpt/ele). */
  maxDepth: number;
  /** Most attributes on one element (namespace declarations included). */
  maxAttributes: number;
  /** Longest name (track, route, waypoint, document), characters. */
  maxNameChars: number;
  /** Longest description, characters. */
  maxDescriptionChars: number;
  /** Longest value of an elevation, time or coordinate, characters. */
  maxValueChars: number;
  /** Most points (trkpt + rtept + wpt) in the file. */
  maxPoints: number;
  /** Most tracks plus routes. */
  maxTracks: number;
  /** Most track segments, all tracks together. */
  maxSegments: number;
  /** Most problems listed; the rest are counted in one final "too-many-problems" entry. */
  maxProblems: number;
}

/** Default limits. */
export const DEFAULT_GPX_LIMITS: Readonly<GpxLimits> = Object.freeze({
  maxInputChars: 30_000_000,
  maxPrologChars: 65_536,
  maxDepth: 64,
  maxAttributes: 50,
  maxNameChars: 200,
  maxDescriptionChars: 2000,
  maxValueChars: 64,
  maxPoints: 200_000,
  maxTracks: 1000,
  maxSegments: 10_000,
  maxProblems: 50,
});
