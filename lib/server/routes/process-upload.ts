import "server-only";
import type { Descent, PlacedWaypoint, RouteProblem, RouteProfile, RouteStats, RouteView, TrackSummary } from "@/lib/route";
import { runWorker } from "../workers";

/** What one worker returns for a file it could model. */
export interface ProcessedUpload {
  ok: true;
  profile: RouteProfile;
  descents: Descent[];
  stats: RouteStats;
  tracks: TrackSummary[];
  trackId: string;
  warnings: RouteProblem[];
  view: RouteView;
  waypoints: PlacedWaypoint[];
  pointCount: number;
  name: string | null;
}
export type RejectedUpload = { ok: false; problems: RouteProblem[]; tracks: TrackSummary[] };

/** Limits of one parse (docs/security.md §0.3: a hostile 100 KB file can otherwise hold a thread for 20 s). */
export const PARSE_LIMITS = { timeoutMs: 20_000, maxOldGenerationSizeMb: 512, maxYoungGenerationSizeMb: 64 } as const;
/**
 * Parses and models an uploaded GPX in a worker thread with a memory ceiling and a time limit, so the request
 * thread stays free: other requests keep answering while a hostile file is read (docs/security.md §0.3).
 */
export function processUpload(text: string, trackId?: string): Promise<ProcessedUpload | RejectedUpload> {
  return runWorker<ProcessedUpload | RejectedUpload>("gpx-worker", { text, trackId }, PARSE_LIMITS, {
    timeout: `Reading this file took longer than ${PARSE_LIMITS.timeoutMs / 1000} s, so it was stopped. Is it a GPX export?`,
    failed: "This file could not be read as GPX (it may need more memory than Fadeline allows).",
  });
}
