import "server-only";
import { sep } from "node:path";
import { Worker } from "node:worker_threads";
import type { Descent, PlacedWaypoint, RouteProblem, RouteProfile, RouteStats, RouteView, TrackSummary } from "@/lib/route";
import { AppError } from "@/lib/errors";

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

/** Limits of one parse (security.md §0.3: a hostile 100 KB file can otherwise hold a thread for 20 s). */
export const PARSE_LIMITS = { timeoutMs: 20_000, maxOldGenerationSizeMb: 512, maxYoungGenerationSizeMb: 64 } as const;
/** Parses at a time per app instance; more wait their turn. */
const CONCURRENCY = 2;
const QUEUE_LIMIT = 16;

let running = 0;
const waiting: (() => void)[] = [];

async function slot<T>(task: () => Promise<T>): Promise<T> {
  if (running >= CONCURRENCY) {
    if (waiting.length >= QUEUE_LIMIT) throw new AppError("unavailable", "Fadeline is busy reading other files. Try again in a minute.");
    await new Promise<void>((resolve) => waiting.push(resolve));
  }
  running++;
  try {
    return await task();
  } finally {
    running--;
    waiting.shift()?.();
  }
}

type WorkerOptions = ConstructorParameters<typeof Worker>[1];

/**
 * Starts the worker from build/workers/gpx-worker.mjs, which scripts/build-workers.mjs compiles from
 * ./gpx-worker.ts before `next build`. Tests, which run TypeScript source, name a bootstrap that loads the
 * same entry through tsx instead.
 */
function startWorker(options: WorkerOptions): Worker {
  const override = process.env.FADELINE_GPX_WORKER_URL;
  const compiled = [process.cwd(), "build", "workers", "gpx-worker.mjs"].join(sep);
  return new Worker(override ? new URL(override) : compiled, options);
}

/**
 * Parses and models an uploaded GPX in a worker thread with a memory ceiling and a time limit, so the request
 * thread stays free: other requests keep answering while a hostile file is read (issue 3 §2).
 */
export function processUpload(text: string, trackId?: string): Promise<ProcessedUpload | RejectedUpload> {
  return slot(
    () =>
      new Promise((resolve, reject) => {
        const worker = startWorker({
          workerData: { text, trackId },
          resourceLimits: { maxOldGenerationSizeMb: PARSE_LIMITS.maxOldGenerationSizeMb, maxYoungGenerationSizeMb: PARSE_LIMITS.maxYoungGenerationSizeMb },
        });
        let settled = false;
        const finish = (fn: () => void) => {
          if (settled) return;
          settled = true;
          clearTimeout(timer);
          void worker.terminate();
          fn();
        };
        const timer = setTimeout(
          () => finish(() => reject(new AppError("invalid_input", `Reading this file took longer than ${PARSE_LIMITS.timeoutMs / 1000} s, so it was stopped. Is it a GPX export?`))),
          PARSE_LIMITS.timeoutMs,
        );
        worker.once("message", (message: (ProcessedUpload | RejectedUpload) & { crashed?: boolean; message?: string }) =>
          finish(() => {
            if (message.crashed) {
              console.error("[routes] worker failed:", message.message);
              reject(new AppError("invalid_input", "This file could not be read as GPX."));
            } else resolve(message);
          }),
        );
        worker.once("error", (error) =>
          finish(() => {
            const outOfMemory = /ERR_WORKER_OUT_OF_MEMORY|heap/i.test(`${(error as { code?: string }).code} ${error.message}`);
            console.error("[routes] worker error:", error.message);
            reject(new AppError("invalid_input", outOfMemory ? "This file needs more memory to read than Fadeline allows." : "This file could not be read as GPX."));
          }),
        );
        worker.once("exit", (code) => finish(() => reject(new AppError("internal", `The GPX reader stopped unexpectedly (${code}).`))));
      }),
  );
}
