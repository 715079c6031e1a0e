import { geodesicDistance } from "./geodesic-distance";
import type { GpxDocument, GpxTrack } from "./gpx-types";

/** One entry of the "choose a track" list. */
export interface TrackSummary {
  /** Pass to {@link selectTrack}: "track:0", "route:1", … */
  id: string;
  kind: "track" | "route";
  /** 0-based index in its list. */
  index: number;
  /** The name from the file, plain text, or `null`. */
  name: string | null;
  /** What to show: the name, or "Track 2" / "Route 1" when the file gives none. */
  label: string;
  /** Points in all segments. */
  pointCount: number;
  /** Segments (1 for a route). */
  segmentCount: number;
  /** Geodesic length of all segments, gaps between segments excluded, m. */
  lengthM: number;
  /** Share of points that carry an elevation, 0…1. */
  elevationCoverage: number;
}

/**
 * Lists the tracks and routes of a parsed file (tracks first, in file order) so that the user can choose
 * one when there are several.
 *
 * @param gpx a document from {@link parseGpx}
 * @returns one summary per track and route; empty when the file has only waypoints
 * @example
 * listTracks(gpx).map((t) => `${t.label}: ${(t.lengthM / 1000).toFixed(1)} km`);
 */
export function listTracks(gpx: GpxDocument): TrackSummary[] {
  return [...gpx.tracks, ...gpx.routes].map(summarize);
}

function summarize(track: GpxTrack): TrackSummary {
  let pointCount = 0;
  let withElevation = 0;
  let lengthM = 0;
  for (const seg of track.segments) {
    pointCount += seg.length;
    for (let i = 0; i < seg.length; i++) {
      const p = seg[i];
      const q = seg[i + 1];
      if (p === undefined) continue;
      if (p.eleM !== null) withElevation += 1;
      if (q !== undefined) lengthM += geodesicDistance(p.lat, p.lon, q.lat, q.lon);
    }
  }
  const kindLabel = track.kind === "track" ? "Track" : "Route";
  return {
    id: track.id,
    kind: track.kind,
    index: track.index,
    name: track.name,
    label: track.name ?? `${kindLabel} ${track.index + 1}`,
    pointCount,
    segmentCount: track.segments.length,
    lengthM,
    elevationCoverage: pointCount === 0 ? 0 : withElevation / pointCount,
  };
}
