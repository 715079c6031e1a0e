import type { GpxDocument, GpxTrack } from "./gpx-types";
import { formatCount, type RouteProblem, routeError } from "./problems";

/** Result of {@link selectTrack}. */
export type SelectTrackResult = { ok: true; track: GpxTrack } | { ok: false; problem: RouteProblem };

/**
 * Picks the track or route to model. With an `id` (from {@link listTracks}) that one is returned. Without
 * one, the default is the first track with at least two points, else the first such route, else the first
 * track or route at all (cleaning then explains what is wrong with it). A file with only waypoints is
 * refused with a message saying so (docs/security.md C24).
 *
 * @param gpx a document from {@link parseGpx}
 * @param id "track:N" or "route:N", optional
 * @returns the chosen track, or a problem
 * @example
 * const r = selectTrack(gpx, "route:0");
 */
export function selectTrack(gpx: GpxDocument, id?: string): SelectTrackResult {
  const all = [...gpx.tracks, ...gpx.routes];
  if (all.length === 0) return { ok: false, problem: noTrack(gpx) };
  if (id !== undefined) {
    const found = all.find((t) => t.id === id);
    if (found !== undefined) return { ok: true, track: found };
    const shown = id.length > 40 ? `${id.slice(0, 40)}…` : id;
    return {
      ok: false,
      problem: routeError("unknown-track", `The file has no track or route with the id "${shown}".`),
    };
  }
  const usable = all.find((t) => t.segments.some((s) => s.length >= 2));
  return { ok: true, track: usable ?? (all[0] as GpxTrack) };
}

function noTrack(gpx: GpxDocument): RouteProblem {
  const n = gpx.waypoints.length;
  if (n > 0) {
    return routeError(
      "no-track",
      `The file has only waypoints (${formatCount(n)}) and no track or route, so there is no line to model. ` +
        "Export the track or route itself from your planner or device.",
    );
  }
  return routeError("no-track", "The file contains no tracks, routes or waypoints.");
}
