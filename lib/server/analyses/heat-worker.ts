/**
 * Worker-thread entry: brake-heat runs off the request thread. Three jobs: heat runs of one or more rigs over one
 * route (analyses), a plan's rigs with their advice (plans), and the fit of a rig to infrared readings
 * (calibrations, docs/model.md §11). Compiled to build/workers/heat-worker.mjs by
 * scripts/build-workers.mjs.
 */
import { parentPort, workerData } from "node:worker_threads";
import { analyzeRoute, type TraceDetail } from "@/lib/analysis/analyze";
import { runCalibrationJob, type CalibrationJob } from "@/lib/analysis/calibration";
import { runPlanJob, type PlanJob } from "@/lib/analysis/plan-run";
import type { Descent, RouteProfile } from "@/lib/route";
import type { HeatRunOptions, Rig } from "@/lib/thermal";

interface AnalysisJob {
  kind?: "analysis";
  profile: RouteProfile;
  descents: Descent[];
  rigs: Rig[];
  options: HeatRunOptions;
  detail: TraceDetail;
}

const job = workerData as AnalysisJob | PlanJob | CalibrationJob;
try {
  if (job.kind === "plan") {
    parentPort?.postMessage({ ok: true, results: runPlanJob(job) });
  } else if (job.kind === "calibration") {
    parentPort?.postMessage({ ok: true, result: runCalibrationJob(job) });
  } else {
    parentPort?.postMessage({ ok: true, results: job.rigs.map((rig) => analyzeRoute(job.profile, job.descents, rig, job.options, job.detail)) });
  }
} catch (error) {
  // The model's guard clauses throw TypeError/RangeError with exact, user-readable messages.
  const invalid = error instanceof TypeError || error instanceof RangeError;
  parentPort?.postMessage(invalid ? { ok: false, message: error.message } : { crashed: true, message: error instanceof Error ? error.message : String(error) });
}
