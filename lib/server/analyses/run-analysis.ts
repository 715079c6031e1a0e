import "server-only";
import type { DbOrTx } from "@/db";
import type { AnalysisResult, TraceDetail } from "@/lib/analysis/analyze";
import { calibrationNote, calibrationUse, withCalibration, type CalibrationUse } from "@/lib/analysis/calibration";
import { AppError } from "@/lib/errors";
import type { Descent, RouteProfile } from "@/lib/route";
import type { HeatRunOptions, Rig } from "@/lib/thermal";
import type { StoredCalibration } from "@/lib/validation/calibration";
import type { Actor } from "../access";
import { getRig } from "../rigs/rigs-dal";
import { decodeUpload } from "../routes/decode-upload";
import { processUpload } from "../routes/process-upload";
import { getRoute, getRouteProfile } from "../routes/routes-dal";
import { runWorker } from "../workers";

export const HEAT_LIMITS = { timeoutMs: 30_000, maxOldGenerationSizeMb: 768, maxYoungGenerationSizeMb: 64 } as const;

/** Where the route comes from: a saved route, or a GPX file read for this analysis only (not stored). */
export type RouteSource = { routeId: string } | { gpx: Uint8Array };
/** Where the rig comes from: a saved rig, or a rig object (already validated by the rig schema). */
export type RigSource = { rigId: string } | { rig: Rig };

async function resolveRoute(db: DbOrTx, actor: Actor, source: RouteSource): Promise<{ profile: RouteProfile; descents: Descent[]; name: string }> {
  if ("routeId" in source) {
    const route = await getRoute(db, actor, source.routeId);
    return { profile: await getRouteProfile(db, actor, source.routeId), descents: route.descents, name: route.name };
  }
  const processed = await processUpload(decodeUpload(source.gpx));
  if (!processed.ok) {
    const messages = processed.problems.filter((p) => p.severity !== "warning").map((p) => p.message);
    throw new AppError("invalid_input", messages[0] ?? "This file could not be used.", { gpx: messages.slice(0, 20) });
  }
  return { profile: processed.profile, descents: processed.descents, name: processed.name ?? "Uploaded route" };
}

async function resolveRig(db: DbOrTx, actor: Actor, source: RigSource): Promise<{ rig: Rig; name: string | null; calibration: StoredCalibration | null }> {
  if ("rigId" in source) {
    const saved = await getRig(db, actor, source.rigId);
    return { rig: saved.rig, name: saved.name, calibration: saved.calibration };
  }
  return { rig: source.rig, name: null, calibration: null };
}

/**
 * One analysis: the heat run of a rig over a route with a summary per descent, computed in a worker thread
 * so the request thread never waits on the model. Access to saved routes and rigs is checked as for reading them.
 * A saved rig with a calibration runs with its fitted factors (docs/model.md §11) unless `calibration` is
 * "ignore" or the options set those parameters themselves; the result then says so in `calibration` and its notes.
 */
export async function runAnalysis(
  db: DbOrTx,
  actor: Actor,
  input: { route: RouteSource; rig: RigSource; options?: HeatRunOptions; detail?: TraceDetail; calibration?: "apply" | "ignore" },
): Promise<AnalysisResult & { routeName: string; rigName: string | null; calibration: CalibrationUse | null }> {
  const [route, rig] = await Promise.all([resolveRoute(db, actor, input.route), resolveRig(db, actor, input.rig)]);
  const stored = input.calibration === "ignore" ? null : rig.calibration;
  const own = input.options ?? {};
  const use = calibrationUse(own, stored);
  const [result] = await analyzeInWorker(route.profile, route.descents, [rig.rig], withCalibration(own, stored), input.detail ?? "sampled");
  return { ...result!, notes: use ? [...result!.notes, calibrationNote(use)] : result!.notes, routeName: route.name, rigName: rig.name, calibration: use };
}

/** Heat runs of several rigs over one route in one worker (a convoy). */
export async function analyzeInWorker(profile: RouteProfile, descents: Descent[], rigs: Rig[], options: HeatRunOptions, detail: TraceDetail): Promise<AnalysisResult[]> {
  const message = await runWorker<{ ok: true; results: AnalysisResult[] } | { ok: false; message: string }>(
    "heat-worker",
    { profile, descents, rigs, options, detail },
    HEAT_LIMITS,
    { timeout: "The heat model took too long on this route and was stopped.", failed: "The heat model could not run on this input." },
  );
  if (!message.ok) throw new AppError("invalid_input", `The model refused the input: ${message.message}`);
  return message.results;
}
