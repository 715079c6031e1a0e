"use client";

import { climbTotals, geodesicDistance } from "@/lib/route";

export interface PreviewTrack {
  /** The server's id of this track in the file ("track:0", "route:0"). */
  id: string;
  name: string;
  points: number;
  lengthM: number;
  ascentM: number | null;
  descentM: number | null;
}

export interface GpxPreview {
  tracks: PreviewTrack[];
  waypoints: number;
}

interface ParsedPoint {
  lat: number;
  lon: number;
  ele: number | null;
}

/** Length along the points, m, and climb totals when every point has an elevation (5 m dead band). */
function measure(points: ParsedPoint[]): Pick<PreviewTrack, "lengthM" | "ascentM" | "descentM"> {
  let lengthM = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (Number.isFinite(a.lat + a.lon + b.lat + b.lon)) lengthM += geodesicDistance(a.lat, a.lon, b.lat, b.lon);
  }
  const elevations = points.map((p) => p.ele);
  if (points.length < 2 || elevations.some((e) => e === null || !Number.isFinite(e))) return { lengthM, ascentM: null, descentM: null };
  const { ascentM, descentM } = climbTotals(Float64Array.from(elevations as number[]), 0, points.length - 1, 5);
  return { lengthM, ascentM, descentM };
}

/**
 * A quick look at a dropped file in the browser, before anything is sent: gpxparser reads it (loaded only
 * now, on the client, because it installs browser globals when imported on a server). The server reads the
 * file again with its own strict parser; its figures, from the cleaned and smoothed profile, are the ones kept.
 */
export async function previewGpx(text: string): Promise<GpxPreview> {
  const doc = new DOMParser().parseFromString(text, "application/xml");
  if (doc.getElementsByTagName("parsererror").length > 0) throw new Error("This file is not well-formed XML.");
  if (doc.documentElement.localName !== "gpx") throw new Error(`This is a <${doc.documentElement.localName}> document, not GPX.`);
  const { default: GpxParser } = await import("gpxparser");
  const parser = new GpxParser();
  parser.parse(text);
  const tracks: PreviewTrack[] = [
    ...parser.tracks.map((t: { name: string | null; points: ParsedPoint[] }, i: number) => ({ id: `track:${i}`, name: t.name || `Track ${i + 1}`, points: t.points.length, ...measure(t.points) })),
    ...parser.routes.map((r: { name: string | null; points: ParsedPoint[] }, i: number) => ({ id: `route:${i}`, name: r.name || `Planned route ${i + 1}`, points: r.points.length, ...measure(r.points) })),
  ];
  if (tracks.length === 0) throw new Error(parser.waypoints.length ? "This file has waypoints only; Fadeline needs a track or a route." : "This file has no tracks or routes.");
  return { tracks, waypoints: parser.waypoints.length };
}
