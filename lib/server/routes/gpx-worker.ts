/**
 * Worker-thread entry: parses and processes one GPX text off the request thread. The parent gives it a
 * memory ceiling and a time limit and terminates it past them, so a hostile file cannot stall the server.
 * Compiled to build/workers/gpx-worker.mjs by scripts/build-workers.mjs.
 */
import { parentPort, workerData } from "node:worker_threads";
import { runGpxJob } from "./gpx-job";

const job = workerData as { text: string; trackId?: string };
try {
  const result = runGpxJob(job.text, job.trackId);
  if (!result.ok) parentPort?.postMessage(result);
  else {
    const p = result.profile;
    const transfer = [p.distanceM, p.lat, p.lon, p.elevationM, p.grade, p.curveRadiusM, p.gapAfter].map((a) => a.buffer as ArrayBuffer);
    parentPort?.postMessage(result, transfer);
  }
} catch (error) {
  parentPort?.postMessage({ ok: false, crashed: true, message: error instanceof Error ? error.message : String(error) });
}
