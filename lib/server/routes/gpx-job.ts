import { buildRouteView, placeWaypoints, processGpx } from "@/lib/route";
import type { ProcessedUpload, RejectedUpload } from "./process-upload";

/**
 * Reads one GPX text into everything a route keeps: the profile, descents, stats, the browser's view and the
 * placed waypoints. Runs in the upload worker thread (gpx-worker.ts) and, for the demo scenario, in the seed.
 * No Node-only or server-only imports, so a worker bundle stays small.
 */
export function runGpxJob(text: string, trackId?: string): ProcessedUpload | RejectedUpload {
  const result = processGpx(text, { trackId });
  if (!result.ok) return { ok: false, problems: result.problems, tracks: result.tracks ?? [] };
  const { profile, descents, stats, tracks, warnings, gpx } = result;
  const track = gpx.tracks.find((t) => t.id === result.trackId) ?? gpx.routes.find((r) => r.id === result.trackId);
  return {
    ok: true,
    profile,
    descents,
    stats,
    tracks,
    trackId: result.trackId,
    warnings,
    view: buildRouteView(profile, descents, stats),
    waypoints: placeWaypoints(profile, gpx.waypoints),
    pointCount: track ? track.segments.reduce((sum, s) => sum + s.length, 0) : 0,
    name: track?.name ?? gpx.name,
  };
}
