import "server-only";
import { and, eq, isNotNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { rigs } from "@/db/schema";
import type { CalibrationJob, CalibrationJobResult } from "@/lib/analysis/calibration";
import { AppError, type FieldErrors } from "@/lib/errors";
import { MODEL_VERSION, resolveModel, type BrakeReading, type Rig } from "@/lib/thermal";
import { storedCalibrationSchema, type CalibrationRequest, type StoredCalibration, type StoredReading } from "@/lib/validation/calibration";
import type { Actor } from "../access";
import { recordAudit } from "../audit";
import { HEAT_LIMITS } from "../analyses/run-analysis";
import { getRoute, getRouteProfile } from "../routes/routes-dal";
import { runWorker } from "../workers";
import { getRig, guardRig } from "./rigs-dal";

/** Runs a calibration job: in the heat worker (the app), or in-process (tests that pass their own). */
export type CalibrationExecutor = (job: CalibrationJob) => Promise<CalibrationJobResult>;

/**
 * The fit runs in the heat worker under the heat runs' own time and memory limits: it is at most about 70 heat
 * runs over the route up to the last reading (lib/thermal/calibrate.ts), each a few milliseconds on 100 km.
 */
async function runInWorker(job: CalibrationJob): Promise<CalibrationJobResult> {
  const message = await runWorker<{ ok: true; result: CalibrationJobResult } | { ok: false; message: string }>("heat-worker", job, HEAT_LIMITS, {
    timeout: "The calibration took too long on this route and was stopped.",
    failed: "The calibration could not run on this input.",
  });
  if (!message.ok) throw new AppError("invalid_input", `The model refused these readings: ${message.message}`);
  return message.result;
}

const POSITION_WORDS = { front: "front", rear: "rear", trailer: "trailer" } as const;

/**
 * Readings placed on the route in SI, or a 422 naming every field that is wrong: a position the rig has no
 * brakes at, a place past the end of the route.
 */
function placeReadings(input: CalibrationRequest, rig: Rig, routeLengthM: number): StoredReading[] {
  const positions = resolveModel(rig).positions.map((p) => p.position);
  const fields: FieldErrors = {};
  const placed = input.readings.map((r, i) => {
    const n = `Reading ${i + 1}`;
    if (!positions.includes(r.position)) {
      fields[`readings.${i}.position`] = [`${n}: this rig has no ${POSITION_WORDS[r.position]} brakes (it has ${positions.join(", ")}).`];
    }
    const atM = r.atM ?? r.atKm! * 1000;
    if (atM > routeLengthM) {
      const key = r.atM !== undefined ? "atM" : "atKm";
      fields[`readings.${i}.${key}`] = [`${n}: ${(atM / 1000).toFixed(1)} km is past the end of the route (${(routeLengthM / 1000).toFixed(1)} km).`];
    }
    return { routeId: input.routeId, position: r.position, atM, tempC: r.tempC, minutesAfterStop: r.minutesAfterStop ?? 0 };
  });
  if (Object.keys(fields).length > 0) throw new AppError("invalid_input", "Some readings need attention.", fields);
  return placed;
}

/**
 * Fits the rig's cooling factor and engine-braking scale to readings taken at a cool-down stop on one of the
 * organisation's routes (docs/model.md §11), on the route's stored profile with the model's default conditions
 * (the quick heat run's), and stores the result on the rig, replacing any earlier calibration. Readings no
 * parameter set can explain are flagged and left out; when none is left, nothing is stored (422).
 * Planners and owners; viewers 403; another organisation's rig or route 404.
 * @returns the stored calibration
 */
export async function calibrateRig(db: DbOrTx, actor: Actor, rigId: string, input: CalibrationRequest, execute: CalibrationExecutor = runInWorker): Promise<StoredCalibration> {
  const { organisationId } = await guardRig(db, actor, rigId, "content.update");
  const saved = await getRig(db, actor, rigId);
  const route = await getRoute(db, actor, input.routeId).catch((error: unknown) => {
    if ((error as { code?: string }).code === "not_found") throw new AppError("not_found", "That route was not found.", { routeId: ["Not one of this organisation's routes."] });
    throw error;
  });
  if (route.organisationId !== organisationId) throw new AppError("not_found", "That route was not found.", { routeId: ["Not one of this organisation's routes."] });
  const profile = await getRouteProfile(db, actor, input.routeId);
  const lengthM = profile.distanceM[profile.distanceM.length - 1] ?? 0;
  const readings = placeReadings(input, saved.rig, lengthM);
  const job: CalibrationJob = {
    kind: "calibration",
    profile,
    rig: saved.rig,
    readings: readings.map((r): BrakeReading => ({ position: r.position, atM: r.atM, tempC: r.tempC, minutesAfterStop: r.minutesAfterStop })),
    options: {},
  };
  const fit = await execute(job);
  if (fit.fittedParameters.length === 0) {
    const fields: FieldErrors = {};
    for (const f of fit.flagged) fields[`readings.${f.reading}.tempC`] = [`Reading ${f.reading + 1}: ${f.reason}.`];
    throw new AppError("invalid_input", "No reading could be explained by the model, so nothing was fitted and the rig's calibration was not changed.", fields);
  }
  // Checked on the way in: what is stored always reads back through the same schema.
  const calibration = storedCalibrationSchema.parse({
    routeId: input.routeId,
    fitted: fit.fitted,
    fittedParameters: fit.fittedParameters,
    readings,
    results: fit.results,
    flagged: fit.flagged,
    rmsBeforeK: fit.rmsBeforeK,
    rmsAfterK: fit.rmsAfterK,
    notes: fit.notes,
    modelVersion: MODEL_VERSION,
    fittedAt: new Date().toISOString(),
    fittedBy: actor.userId,
  });
  await db.transaction(async (tx) => {
    await tx.update(rigs).set({ calibration, updatedAt: sql`now()` }).where(eq(rigs.id, rigId));
    await recordAudit(tx, {
      organisationId,
      actorUserId: actor.userId,
      action: "rig.calibrated",
      targetType: "rig",
      targetId: rigId,
      detail: { name: saved.name, readings: readings.length, flagged: fit.flagged.length, coolingFactor: Number(fit.fitted.coolingFactor.toFixed(3)), engineBrakingScale: Number(fit.fitted.engineBrakingScale.toFixed(3)) },
    });
  });
  return calibration;
}

/** Clears the rig's calibration (planners and owners); clearing none is not an error and records nothing. */
export async function clearRigCalibration(db: DbOrTx, actor: Actor, rigId: string): Promise<void> {
  const { organisationId } = await guardRig(db, actor, rigId, "content.update");
  await db.transaction(async (tx) => {
    const [row] = await tx.update(rigs).set({ calibration: null, updatedAt: sql`now()` }).where(and(eq(rigs.id, rigId), isNotNull(rigs.calibration))).returning({ name: rigs.name });
    if (!row) return;
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "rig.calibration_cleared", targetType: "rig", targetId: rigId, detail: { name: row.name } });
  });
}
