/**
 * Worker-thread entry: parses and processes one GPX text off the request thread. The parent gives it a
 * memory ceiling and a time limit and terminates it past them, so a hostile file cannot stall the server.
 */
import { parentPort, workerData } from "node:worker_threads";
import { buildRouteView, placeWaypoints, processGpx } from "@/lib/route";

interface Job {
  text: string;
  trackId?: string;
}

const job = workerData as Job;
try {
  const result = processGpx(job.text, { trackId: job.trackId });
  if (!result.ok) {
    parentPort?.postMessage({ ok: false, problems: result.problems, tracks: result.tracks ?? [] });
  } else {
    const { profile, descents, stats, tracks, trackId, warnings, gpx } = result;
    const track = gpx.tracks.find((t) => t.id === trackId) ?? gpx.routes.find((r) => r.id === trackId);
    const pointCount = track ? track.segments.reduce((sum, s) => sum + s.length, 0) : 0;
    const view = buildRouteView(profile, descents, stats);
    const waypoints = placeWaypoints(profile, gpx.waypoints);
    parentPort?.postMessage(
      { ok: true, profile, descents, stats, tracks, trackId, warnings, view, waypoints, pointCount, name: track?.name ?? gpx.name },
      [profile.distanceM, profile.lat, profile.lon, profile.elevationM, profile.grade, profile.curveRadiusM, profile.gapAfter].map((a) => a.buffer as ArrayBuffer),
    );
  }
} catch (error) {
  parentPort?.postMessage({ ok: false, crashed: true, message: error instanceof Error ? error.message : String(error) });
}
