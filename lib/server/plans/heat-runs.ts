import "server-only";
import { createHash } from "node:crypto";
import { and, eq, inArray, notInArray } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { heatRuns, planRigs, routes } from "@/db/schema";
import { DEFAULT_ADVICE_SETTINGS } from "@/lib/advice";
import { calibrationNote, calibrationUse, withCalibration, type CalibrationUse } from "@/lib/analysis/calibration";
import { conditionsToOptions, type PlanConditions } from "@/lib/analysis/conditions";
import type { Region } from "@/lib/compliance";
import { findDescents } from "@/lib/route";
import type { PlanJob, PlanJobResults, PlanRigResult } from "@/lib/analysis/plan-run";
import { AppError } from "@/lib/errors";
import { MODEL_VERSION, type HeatRunOptions, type Rig } from "@/lib/thermal";
import { readStoredCalibration, type StoredCalibration } from "@/lib/validation/calibration";
import type { Actor } from "../access";
import { getRoute, getRouteProfile } from "../routes/routes-dal";
import { runWorker } from "../workers";
import { getPlan } from "./plans-dal";

export type { PlanJob, PlanJobResults };
/** Runs a plan job: in a worker thread (the app), or in-process (the seed, before the workers are built). */
export type PlanExecutor = (job: PlanJob) => Promise<PlanJobResults>;

async function runInWorker(job: PlanJob): Promise<PlanJobResults> {
  const message = await runWorker<{ ok: true; results: PlanJobResults } | { ok: false; message: string }>("heat-worker", job, PLAN_LIMITS, {
    timeout: "The heat model took too long on this plan and was stopped.",
    failed: "The heat model could not run on this plan.",
  });
  if (!message.ok) throw new AppError("invalid_input", `The model refused this plan's input: ${message.message}`);
  return message.results;
}

/** A plan of 12 rigs over a long route stays well inside this. */
const PLAN_LIMITS = { timeoutMs: 120_000, maxOldGenerationSizeMb: 1024, maxYoungGenerationSizeMb: 64 } as const;

/** One rig of the plan with its inputs' hash and, when a result for exactly those inputs is stored, the result. */
export interface PlanRigRun {
  planRigId: string;
  rigId: string;
  label: string;
  rigName: string;
  rig: Rig;
  /** The rig's region, for its trailer-brake rule. */
  region: Region;
  /** The plan's conditions as model options, with the rig's calibrated factors (docs/model.md §11). */
  options: HeatRunOptions;
  /** The rig's calibration and which of its factors the run takes, or null. */
  calibration: CalibrationUse | null;
  inputsHash: string;
  /** The stored result for these inputs, or null (never computed, or an input changed since). */
  result: PlanRigResult | null;
  computedAt: Date | null;
  computedMs: number | null;
}

export function planConditions(plan: Pick<PlanConditions, keyof PlanConditions>): PlanConditions {
  return { ambientC: plan.ambientC, startTempC: plan.startTempC, speedPolicy: plan.speedPolicy, speedCapMs: plan.speedCapMs, drivingStyle: plan.drivingStyle };
}

/**
 * Hash of every input of one rig's heat run and advice: the route (its row is immutable apart from its name, so
 * id, file hash, track and step identify its profile and waypoints), the rig as stored, the conditions as model
 * options (with the calibrated factors), the model version, the advice engine's settings, and the calibration
 * the run used (when it fits the factors are in the options; its date and readings are in the result's notes,
 * so a new calibration with the same factors still gives a new hash). Any change gives a new hash, so an old
 * result is never taken for the current one. Without a calibration the hash is what it was before calibrations.
 */
export function inputsHash(
  route: { id: string; contentSha256: string; trackId: string; stepM: number },
  rig: Rig,
  options: HeatRunOptions,
  region: Region | null = null,
  calibration: StoredCalibration | null = null,
): string {
  const inputs = {
    model: MODEL_VERSION,
    advice: DEFAULT_ADVICE_SETTINGS,
    route,
    rig,
    options,
    region,
    ...(calibration ? { calibration: { fittedAt: calibration.fittedAt, coolingFactor: calibration.fitted.coolingFactor, engineBrakingScale: calibration.fitted.engineBrakingScale, fittedParameters: calibration.fittedParameters, readings: calibration.readings.length, used: calibration.results.length } } : {}),
  };
  return createHash("sha256").update(JSON.stringify(inputs)).digest("hex");
}

async function routeKey(db: DbOrTx, routeId: string) {
  const [row] = await db.select({ id: routes.id, contentSha256: routes.contentSha256, trackId: routes.trackId, stepM: routes.stepM }).from(routes).where(eq(routes.id, routeId));
  return row!;
}

/** The plan, its convoy with each rig's current inputs hash and stored result (null where stale or missing). */
export async function planRuns(db: DbOrTx, actor: Actor, planId: string) {
  const plan = await getPlan(db, actor, planId);
  const key = await routeKey(db, plan.routeId);
  const conditions = conditionsToOptions(planConditions(plan));
  const members = plan.convoy.map((c) => {
    // A calibrated rig runs with its fitted factors; a what-if on the plan page changes them on top.
    const calibration = readStoredCalibration(c.calibration);
    const options = withCalibration(conditions, calibration);
    return {
      planRigId: c.planRigId,
      rigId: c.rigId,
      label: c.label,
      rigName: c.rigName,
      rig: c.rig as Rig,
      region: c.region as Region,
      options,
      calibration: calibrationUse(conditions, calibration),
      inputsHash: inputsHash(key, c.rig as Rig, options, c.region as Region, calibration),
    };
  });
  const stored = members.length
    ? await db
        .select({ planRigId: heatRuns.planRigId, inputsHash: heatRuns.inputsHash, result: heatRuns.result, createdAt: heatRuns.createdAt, computedMs: heatRuns.computedMs })
        .from(heatRuns)
        .where(inArray(heatRuns.planRigId, members.map((m) => m.planRigId)))
    : [];
  const runs: PlanRigRun[] = members.map((m) => {
    const hit = stored.find((s) => s.planRigId === m.planRigId && s.inputsHash === m.inputsHash);
    return { ...m, result: (hit?.result as PlanRigResult | undefined) ?? null, computedAt: hit?.createdAt ?? null, computedMs: hit?.computedMs ?? null };
  });
  return { plan, runs };
}

/**
 * Runs the model and the advice in a worker for the plan's rigs whose stored result is missing or stale (or
 * only for `planRigIds`), stores each result under its inputs hash and drops the results of older inputs.
 * Reading the plan is enough: the results are derived from what the plan holds, never an edit of it.
 * @returns how many rigs were computed, and the plan's runs afterwards
 */
export async function computePlanRuns(db: DbOrTx, actor: Actor, planId: string, planRigIds?: readonly string[], execute?: PlanExecutor) {
  const { plan, runs } = await planRuns(db, actor, planId);
  if (planRigIds) {
    const unknown = planRigIds.find((id) => !runs.some((r) => r.planRigId === id));
    if (unknown) throw new AppError("invalid_input", "That rig is not in this plan's convoy any more. Reload the page.", { planRigIds: ["Not in this plan."] });
  }
  const todo = runs.filter((r) => r.result === null && (!planRigIds || planRigIds.includes(r.planRigId)));
  if (todo.length === 0) return { computed: 0, plan, runs };
  const [route, profile] = await Promise.all([getRoute(db, actor, plan.routeId), getRouteProfile(db, actor, plan.routeId)]);
  // Descents are found again on the stored profile, so every route gets the current model's descent rules.
  const descents = findDescents(profile);
  const waypoints = route.waypoints.filter((w) => w.distanceM !== null);
  const members = todo.map((r) => ({ rig: r.rig, options: r.options, region: r.region, notes: r.calibration ? [calibrationNote(r.calibration)] : [] }));
  const job: PlanJob = { kind: "plan", profile, descents, waypoints, members };
  const results = await (execute ?? runInWorker)(job);
  const now = new Date();
  for (const [k, run] of todo.entries()) {
    const { result, computedMs } = results[k]!;
    // NaN (no fluid at a position) is not JSON: round-trip so the stored and the returned result agree.
    const stored = JSON.parse(JSON.stringify(result)) as PlanRigResult;
    await db.transaction(async (tx) => {
      // The convoy may have changed while the model ran: store only for a rig still in the plan.
      const [still] = await tx.select({ id: planRigs.id }).from(planRigs).where(eq(planRigs.id, run.planRigId));
      if (!still) return;
      await tx
        .insert(heatRuns)
        .values({ planRigId: run.planRigId, inputsHash: run.inputsHash, modelVersion: result.analysis.modelVersion, result: stored, computedMs, createdAt: now })
        .onConflictDoUpdate({ target: [heatRuns.planRigId, heatRuns.inputsHash], set: { result: stored, computedMs, modelVersion: result.analysis.modelVersion, createdAt: now } });
      await tx.delete(heatRuns).where(and(eq(heatRuns.planRigId, run.planRigId), notInArray(heatRuns.inputsHash, [run.inputsHash])));
    });
    run.result = stored;
    run.computedAt = now;
    run.computedMs = computedMs;
  }
  return { computed: todo.length, plan, runs };
}
