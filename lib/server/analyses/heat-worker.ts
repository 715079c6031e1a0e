/**
 * Worker-thread entry: brake-heat runs of one or more rigs over one route, off the request thread.
 * Compiled to build/workers/heat-worker.mjs by scripts/build-workers.mjs.
 */
import { parentPort, workerData } from "node:worker_threads";
import { analyzeRoute, type TraceDetail } from "@/lib/analysis/analyze";
import type { Descent, RouteProfile } from "@/lib/route";
import type { HeatRunOptions, Rig } from "@/lib/thermal";

interface Job {
  profile: RouteProfile;
  descents: Descent[];
  rigs: Rig[];
  options: HeatRunOptions;
  detail: TraceDetail;
}

const job = workerData as Job;
try {
  parentPort?.postMessage({ ok: true, results: job.rigs.map((rig) => analyzeRoute(job.profile, job.descents, rig, job.options, job.detail)) });
} catch (error) {
  // The model's guard clauses throw TypeError/RangeError with exact, user-readable messages.
  const invalid = error instanceof TypeError || error instanceof RangeError;
  parentPort?.postMessage(invalid ? { ok: false, message: error.message } : { crashed: true, message: error instanceof Error ? error.message : String(error) });
}
