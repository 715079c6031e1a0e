/**
 * A plan's stored heat runs and its scenarios through the data-access layer, PostgreSQL and the heat worker:
 * results are keyed by a hash of every input, so a stale result is never shown; computing stores one row per
 * plan rig; reading and computing are open to viewers, saving scenarios is not; other organisations see nothing.
 */
import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { and, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "../../db";
import { auditEvents, heatRuns, routes } from "../../db/schema";
import { VERDICTS } from "../../lib/advice";
import { runPlanJob, type PlanJob, type PlanJobResults } from "../../lib/analysis/plan-run";
import { computePlanRuns, inputsHash, planRuns } from "../../lib/server/plans/heat-runs";
import { createPlan, updatePlan } from "../../lib/server/plans/plans-dal";
import { createScenario, deleteScenario, listScenarios } from "../../lib/server/plans/scenarios-dal";
import { createRig, getRig, updateRig } from "../../lib/server/rigs/rigs-dal";
import { uploadRoute } from "../../lib/server/routes/upload-route";
import { MODEL_VERSION, UTE_AND_CARAVAN, WAGON_AND_CAMPER, type HeatRunOptions, type Rig } from "../../lib/thermal";
import { scenarioInputSchema, type PlanInput } from "../../lib/validation/plan";
import { makeTeam, makeUser } from "./fixtures";

/** A short route: one 3.2 km descent of 225 m (tests/fixtures/gpx/out/tarnwick-saddle-1-0.json). */
const GPX = "tests/fixtures/gpx/tarnwick-saddle-1-0.gpx";

let planner: { userId: string; name: string };
let viewer: { userId: string };
let stranger: { userId: string };
let org: string;
let routeId: string;
let rigA: string;
let rigB: string;

const db = () => getDb();
const clone = <T>(x: T): T => structuredClone(x);

beforeAll(async () => {
  [planner, viewer, stranger] = await Promise.all([makeUser("Runs Planner"), makeUser("Runs Viewer"), makeUser("Runs Stranger")]);
  org = await makeTeam("Tarnwick Convoys", [
    { userId: planner.userId, role: "planner" },
    { userId: viewer.userId, role: "viewer" },
  ]);
  await makeTeam("Ostling Tours", [{ userId: stranger.userId, role: "owner" }]);
  const bytes = new Uint8Array(readFileSync(GPX));
  routeId = (await uploadRoute(db(), planner, org, { bytes, fileName: "tarnwick.gpx" })).route.id;
  rigA = await createRig(db(), planner, org, { name: "Ute and van", region: "AU", rig: clone(UTE_AND_CARAVAN) as never });
  rigB = await createRig(db(), planner, org, { name: "Wagon and camper", region: "AU", rig: clone(WAGON_AND_CAMPER) as never });
});

const planInput = (over: Partial<PlanInput> = {}): PlanInput => ({
  name: "Tarnwick Saddle run",
  routeId,
  tripDate: "2027-02-01",
  ambientC: 31,
  startTempC: null,
  speedPolicy: "standard",
  speedCapMs: null,
  drivingStyle: "steady",
  notes: "",
  rigs: [
    { rigId: rigA, label: "Dana (lead)" },
    { rigId: rigB, label: "Emery" },
  ],
  ...over,
});

async function rowsOf(planRigIds: string[]) {
  return db().select().from(heatRuns).where(inArray(heatRuns.planRigId, planRigIds));
}

/** An executor that must not be called: proves nothing is re-run. */
const mustNotRun = async (): Promise<PlanJobResults> => {
  throw new Error("the model ran although every stored result is current");
};

/** Runs the job in-process (same code as the worker), recording the jobs and the raw (pre-JSON) results. */
function recordingExecutor() {
  const calls: { job: PlanJob; raw: PlanJobResults }[] = [];
  const execute = async (job: PlanJob) => {
    const raw = runPlanJob(job);
    calls.push({ job, raw });
    return raw;
  };
  return { calls, execute };
}

/** Paths of every NaN in a value. */
function nanPaths(value: unknown, path = "$", out: string[] = []): string[] {
  if (typeof value === "number" && Number.isNaN(value)) out.push(path);
  else if (Array.isArray(value)) value.forEach((v, i) => nanPaths(v, `${path}[${i}]`, out));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) nanPaths(v, `${path}.${k}`, out);
  return out;
}

async function routeKey() {
  const [row] = await db().select({ id: routes.id, contentSha256: routes.contentSha256, trackId: routes.trackId, stepM: routes.stepM }).from(routes).where(eq(routes.id, routeId));
  return row!;
}

describe("inputsHash", () => {
  const key = { id: "6f1c2b1e-0000-4000-8000-000000000001", contentSha256: "ab".repeat(32), trackId: "route:0", stepM: 10 };
  const options: HeatRunOptions = { params: { ambientC: 31, startTempC: null } };
  const rig = UTE_AND_CARAVAN as Rig;

  it("is stable for equal inputs (the same objects, clones, a JSON round trip)", () => {
    const h = inputsHash(key, rig, options);
    expect(h).toMatch(/^[0-9a-f]{64}$/);
    expect(inputsHash(key, rig, options)).toBe(h);
    expect(inputsHash(clone(key), clone(rig), clone(options))).toBe(h);
    expect(inputsHash(JSON.parse(JSON.stringify(key)), JSON.parse(JSON.stringify(rig)), JSON.parse(JSON.stringify(options)))).toBe(h);
  });

  it("changes with the rig, the options and every part of the route key", () => {
    const h = inputsHash(key, rig, options);
    const heavier = clone(rig);
    heavier.vehicle.gvmKg += 1;
    const seen = new Set([
      h,
      inputsHash(key, heavier, options),
      inputsHash(key, WAGON_AND_CAMPER as Rig, options),
      inputsHash(key, rig, { params: { ambientC: 32, startTempC: null } }),
      inputsHash(key, rig, { params: { ambientC: 31, startTempC: 60 } }),
      inputsHash(key, rig, {}),
      inputsHash({ ...key, id: "6f1c2b1e-0000-4000-8000-000000000002" }, rig, options),
      inputsHash({ ...key, contentSha256: "cd".repeat(32) }, rig, options),
      inputsHash({ ...key, trackId: "track:1" }, rig, options),
      inputsHash({ ...key, stepM: 5 }, rig, options),
    ]);
    expect(seen.size).toBe(10);
  });

  it("a rig read back from the database (jsonb key order) hashes the same on every read, and planRuns uses exactly that hash", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "Hash check", rigs: [{ rigId: rigA, label: "Solo" }] }));
    const { runs } = await planRuns(db(), planner, id);
    const [first, second] = [await getRig(db(), planner, rigA), await getRig(db(), viewer, rigA)];
    const k = await routeKey();
    expect(inputsHash(k, first.rig as Rig, runs[0]!.options, first.region)).toBe(inputsHash(k, second.rig as Rig, runs[0]!.options, second.region));
    expect(runs[0]!.inputsHash).toBe(inputsHash(k, first.rig as Rig, runs[0]!.options, first.region, first.calibration));
    expect((await planRuns(db(), viewer, id)).runs[0]!.inputsHash).toBe(runs[0]!.inputsHash);
  });
});

describe("plan heat runs", () => {
  it("a fresh plan has no current runs; computing stores one row per rig; reading again re-runs nothing", async () => {
    const id = await createPlan(db(), planner, org, planInput());
    const fresh = await planRuns(db(), planner, id);
    expect(fresh.plan.id).toBe(id);
    expect(fresh.runs.map((r) => r.label)).toEqual(["Dana (lead)", "Emery"]);
    for (const r of fresh.runs) expect(r).toMatchObject({ result: null, computedAt: null, computedMs: null });
    const planRigIds = fresh.runs.map((r) => r.planRigId);
    expect(await rowsOf(planRigIds)).toHaveLength(0);

    // Through the real heat worker (tests/support/workers/heat-worker.mjs).
    const computed = await computePlanRuns(db(), planner, id);
    expect(computed.computed).toBe(2);
    const rows = await rowsOf(planRigIds);
    expect(rows).toHaveLength(2);
    for (const run of computed.runs) {
      expect(run.result).not.toBeNull();
      expect(run.computedAt).toBeInstanceOf(Date);
      const row = rows.find((r) => r.planRigId === run.planRigId)!;
      expect(row).toBeDefined();
      expect(row.inputsHash).toBe(run.inputsHash);
      expect(row.modelVersion).toBe(MODEL_VERSION);
      expect(row.result).toEqual(run.result);
      expect(row.computedMs).toBe(run.computedMs);
      // The time returned is the time stored (a later planRuns reports the same).
      expect(run.computedAt!.getTime()).toBe(row.createdAt.getTime());
    }
    // The two rigs differ, so their results do.
    expect(computed.runs[0]!.result).not.toEqual(computed.runs[1]!.result);

    const again = await planRuns(db(), viewer, id);
    expect(again.runs.map((r) => r.result)).toEqual(computed.runs.map((r) => r.result));
    expect(again.runs.map((r) => r.inputsHash)).toEqual(computed.runs.map((r) => r.inputsHash));
    for (const run of again.runs) expect(run.computedAt?.getTime()).toBe(rows.find((r) => r.planRigId === run.planRigId)!.createdAt.getTime());

    const second = await computePlanRuns(db(), planner, id, undefined, mustNotRun);
    expect(second.computed).toBe(0);
    expect(second.runs.map((r) => r.result)).toEqual(computed.runs.map((r) => r.result));
    expect(await rowsOf(planRigIds)).toHaveLength(2);

    // The worker's result equals the same job run in-process (the model is deterministic), after JSON.
    const { calls, execute } = recordingExecutor();
    const copy = await createPlan(db(), planner, org, planInput({ name: "Same inputs, other plan" }));
    await computePlanRuns(db(), planner, copy, undefined, execute);
    expect(calls).toHaveLength(1);
    expect(calls[0]!.raw.map((r) => JSON.parse(JSON.stringify(r.result)))).toEqual(computed.runs.map((r) => r.result));
  });

  it("stores JSON (NaN replaced) with a known verdict and the current model version", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "JSON check" }));
    const { calls, execute } = recordingExecutor();
    const { runs } = await computePlanRuns(db(), planner, id, undefined, execute);
    expect(calls).toHaveLength(1);
    expect(calls[0]!.job.members).toHaveLength(2);
    const rows = await rowsOf(runs.map((r) => r.planRigId));
    for (const [k, run] of runs.entries()) {
      const raw = calls[0]!.raw[k]!.result;
      const row = rows.find((r) => r.planRigId === run.planRigId)!;
      // What is returned and stored is the raw result through JSON: NaN (no fluid at a position) becomes null.
      expect(run.result).toEqual(JSON.parse(JSON.stringify(raw)));
      expect(row.result).toEqual(run.result);
      expect(nanPaths(run.result)).toEqual([]);
      expect(nanPaths(row.result)).toEqual([]);
      expect(VERDICTS).toContain(run.result!.advice.verdict);
      expect(["clear", "clear with advice", "not advised"]).toContain((row.result as typeof raw).advice.verdict);
      expect(run.result!.analysis.modelVersion).toBe(MODEL_VERSION);
      expect(row.modelVersion).toBe(MODEL_VERSION);
    }
    // The caravan's electric brakes have no fluid: its raw run has NaN, which the stored result holds as null.
    const withNaN = calls[0]!.raw.map((r) => nanPaths(r.result));
    expect(withNaN.some((p) => p.length > 0)).toBe(true);
  });

  it("changing the plan's air temperature makes every stored result stale; computing again replaces the rows", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "Hot day" }));
    const before = await computePlanRuns(db(), planner, id, undefined, recordingExecutor().execute);
    expect(before.computed).toBe(2);
    const planRigIds = before.runs.map((r) => r.planRigId);

    await updatePlan(db(), planner, id, planInput({ name: "Hot day", ambientC: 38 }));
    const stale = await planRuns(db(), viewer, id);
    // The same plan rigs (kept by updatePlan), so only the hash tells the old result from the current one.
    expect(stale.runs.map((r) => r.planRigId)).toEqual(planRigIds);
    expect(stale.plan.ambientC).toBe(38);
    for (const [k, r] of stale.runs.entries()) {
      expect(r.result).toBeNull();
      expect(r.computedAt).toBeNull();
      expect(r.inputsHash).not.toBe(before.runs[k]!.inputsHash);
    }
    expect(await rowsOf(planRigIds)).toHaveLength(2); // the old rows are still there, just never shown

    const { calls, execute } = recordingExecutor();
    const after = await computePlanRuns(db(), planner, id, undefined, execute);
    expect(after.computed).toBe(2);
    expect(calls[0]!.job.members.map((m) => (m.options.params as { ambientC: number }).ambientC)).toEqual([38, 38]);
    const rows = await rowsOf(planRigIds);
    expect(rows).toHaveLength(2);
    expect(rows.map((r) => r.planRigId).sort()).toEqual([...planRigIds].sort());
    for (const run of after.runs) expect(rows.find((r) => r.planRigId === run.planRigId)!.inputsHash).toBe(run.inputsHash);
    // A hotter day leaves every brake hotter at its peak: the new result, not the old one.
    for (const [k, run] of after.runs.entries()) {
      const old = before.runs[k]!.result!.analysis.peaks;
      run.result!.analysis.peaks.forEach((p, j) => expect(p.peakC).toBeGreaterThan(old[j]!.peakC));
    }

    // Back to the old temperature: the old rows were replaced, so nothing is current.
    await updatePlan(db(), planner, id, planInput({ name: "Hot day" }));
    const back = await planRuns(db(), planner, id);
    expect(back.runs.map((r) => r.inputsHash)).toEqual(before.runs.map((r) => r.inputsHash));
    expect(back.runs.map((r) => r.result)).toEqual([null, null]);
  });

  it("editing a rig makes stale only the plans using that rig; renaming it changes nothing", async () => {
    const edited = await createRig(db(), planner, org, { name: "To be edited", region: "AU", rig: clone(UTE_AND_CARAVAN) as never });
    const uses = await createPlan(db(), planner, org, planInput({ name: "Uses the edited rig", rigs: [{ rigId: edited, label: "Fen" }, { rigId: rigB, label: "Gil" }] }));
    const other = await createPlan(db(), planner, org, planInput({ name: "Does not", rigs: [{ rigId: rigA, label: "Hal" }, { rigId: rigB, label: "Ivo" }] }));
    const exec = recordingExecutor().execute;
    const usesBefore = await computePlanRuns(db(), planner, uses, undefined, exec);
    expect(usesBefore.runs.every((r) => r.result !== null)).toBe(true);
    const otherBefore = await computePlanRuns(db(), planner, other, undefined, exec);

    // A new name only: the rig's data, the only input, is unchanged.
    await updateRig(db(), planner, edited, { name: "Renamed", region: "AU", rig: clone(UTE_AND_CARAVAN) as never });
    expect((await planRuns(db(), planner, uses)).runs.map((r) => r.result)).toEqual(usesBefore.runs.map((r) => r.result));

    const heavier = clone(UTE_AND_CARAVAN) as Rig;
    heavier.load.trailerLoadKg += 300;
    await updateRig(db(), planner, edited, { name: "Renamed", region: "AU", rig: heavier as never });

    const usesNow = await planRuns(db(), viewer, uses);
    expect(usesNow.runs[0]!.result).toBeNull();
    expect(usesNow.runs[0]!.inputsHash).not.toBe(usesBefore.runs[0]!.inputsHash);
    expect(usesNow.runs[1]!.result).toEqual(usesBefore.runs[1]!.result);
    const otherNow = await planRuns(db(), viewer, other);
    expect(otherNow.runs.map((r) => r.result)).toEqual(otherBefore.runs.map((r) => r.result));

    const { calls, execute } = recordingExecutor();
    const recomputed = await computePlanRuns(db(), planner, uses, undefined, execute);
    expect(recomputed.computed).toBe(1);
    expect(calls[0]!.job.members).toHaveLength(1);
    expect(calls[0]!.job.members[0]!.rig).toEqual(heavier);
    const rows = await rowsOf(usesNow.runs.map((r) => r.planRigId));
    expect(rows).toHaveLength(2);
    const editedRows = rows.filter((r) => r.planRigId === usesNow.runs[0]!.planRigId);
    expect(editedRows).toHaveLength(1);
    expect(editedRows[0]!.inputsHash).toBe(usesNow.runs[0]!.inputsHash);
    expect(recomputed.runs[0]!.result).not.toEqual(usesBefore.runs[0]!.result);
  });

  it("computes only the rigs asked for, and refuses a rig that is not in the plan", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "Subset" }));
    const otherPlan = await createPlan(db(), planner, org, planInput({ name: "Someone else's convoy" }));
    const { runs } = await planRuns(db(), planner, id);
    const foreignPlanRig = (await planRuns(db(), planner, otherPlan)).runs[0]!.planRigId;

    for (const bad of [[randomUUID()], [runs[0]!.planRigId, foreignPlanRig], ["not-a-uuid"]]) {
      const error = await computePlanRuns(db(), planner, id, bad, mustNotRun).catch((e: unknown) => e);
      expect(error).toMatchObject({ code: "invalid_input", fields: { planRigIds: ["Not in this plan."] } });
      expect((error as Error).message).toMatch(/not in this plan's convoy/);
    }
    expect(await rowsOf(runs.map((r) => r.planRigId))).toHaveLength(0);

    const one = await computePlanRuns(db(), planner, id, [runs[1]!.planRigId], recordingExecutor().execute);
    expect(one.computed).toBe(1);
    expect(one.runs[0]!.result).toBeNull();
    expect(one.runs[1]!.result).not.toBeNull();
    expect((await rowsOf(runs.map((r) => r.planRigId))).map((r) => r.planRigId)).toEqual([runs[1]!.planRigId]);
  });

  it("a viewer reads and computes runs; another organisation's user finds nothing", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "Viewer computes" }));
    expect((await planRuns(db(), viewer, id)).runs.every((r) => r.result === null)).toBe(true);
    const byViewer = await computePlanRuns(db(), viewer, id, undefined, recordingExecutor().execute);
    expect(byViewer.computed).toBe(2);
    expect(byViewer.runs.every((r) => r.result !== null)).toBe(true);

    await expect(planRuns(db(), stranger, id)).rejects.toMatchObject({ code: "not_found" });
    await expect(computePlanRuns(db(), stranger, id, undefined, mustNotRun)).rejects.toMatchObject({ code: "not_found" });
    await expect(planRuns(db(), planner, randomUUID())).rejects.toMatchObject({ code: "not_found" });
    await expect(planRuns(db(), planner, "not-a-plan")).rejects.toMatchObject({ code: "not_found" });
  });
});

describe("scenarios", () => {
  const settings = (planRigId: string, over: Record<string, unknown> = {}) => ({
    planRigId,
    applyAdvice: true,
    descentSpeedMs: 40 / 3.6,
    gear: 3,
    ambientC: 36,
    trailerGain: 0.8,
    vehiclePayloadKg: 250,
    trailerLoadKg: null,
    padFamily: "ceramic",
    ...over,
  });

  it("saves scenarios parsed as the API does, lists them newest first, and refuses a rig not in the plan", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "What if" }));
    const other = await createPlan(db(), planner, org, planInput({ name: "Another plan" }));
    const { runs } = await planRuns(db(), planner, id);
    const first = scenarioInputSchema.parse({ name: "Slower, third gear", settings: settings(runs[0]!.planRigId) });
    const second = scenarioInputSchema.parse({ name: "Lighter van", settings: settings(runs[1]!.planRigId, { applyAdvice: false, gear: null, padFamily: null, trailerLoadKg: 400 }) });
    expect(scenarioInputSchema.safeParse({ name: "Bad gear", settings: settings(runs[0]!.planRigId, { gear: 0 }) }).success).toBe(false);
    expect(scenarioInputSchema.safeParse({ name: "Extra", settings: { ...settings(runs[0]!.planRigId), extra: 1 } }).success).toBe(false);

    const firstId = await createScenario(db(), planner, id, first);
    const secondId = await createScenario(db(), planner, id, second);
    const listed = await listScenarios(db(), viewer, id);
    expect(listed.map((s) => s.id)).toEqual([secondId, firstId]);
    expect(listed[0]!.createdAt.getTime()).toBeGreaterThanOrEqual(listed[1]!.createdAt.getTime());
    expect(listed[1]).toMatchObject({ name: "Slower, third gear", settings: first.settings, createdByName: planner.name });
    expect(listed[0]!.settings).toEqual(second.settings);
    expect(await listScenarios(db(), planner, other)).toEqual([]);
    const [audit] = await db().select().from(auditEvents).where(and(eq(auditEvents.action, "scenario.saved"), eq(auditEvents.targetId, firstId)));
    expect(audit).toMatchObject({ organisationId: org, actorUserId: planner.userId });

    const foreignPlanRig = (await planRuns(db(), planner, other)).runs[0]!.planRigId;
    for (const planRigId of [foreignPlanRig, randomUUID()]) {
      const error = await createScenario(db(), planner, id, scenarioInputSchema.parse({ name: "Wrong rig", settings: settings(planRigId) })).catch((e: unknown) => e);
      expect(error).toMatchObject({ code: "invalid_input", fields: { "settings.planRigId": ["Not in this plan."] } });
    }
    expect(await listScenarios(db(), planner, id)).toHaveLength(2);
  });

  it("viewers cannot save or delete scenarios, another organisation finds none, and a planner deletes", async () => {
    const id = await createPlan(db(), planner, org, planInput({ name: "Scenario access" }));
    const { runs } = await planRuns(db(), planner, id);
    const input = scenarioInputSchema.parse({ name: "Cool morning", settings: settings(runs[0]!.planRigId, { ambientC: 12 }) });

    await expect(createScenario(db(), viewer, id, input)).rejects.toMatchObject({ code: "forbidden" });
    await expect(createScenario(db(), stranger, id, input)).rejects.toMatchObject({ code: "not_found" });
    await expect(listScenarios(db(), stranger, id)).rejects.toMatchObject({ code: "not_found" });
    expect(await listScenarios(db(), planner, id)).toEqual([]);

    const scenarioId = await createScenario(db(), planner, id, input);
    await expect(deleteScenario(db(), viewer, scenarioId)).rejects.toMatchObject({ code: "forbidden" });
    await expect(deleteScenario(db(), stranger, scenarioId)).rejects.toMatchObject({ code: "not_found" });
    expect((await listScenarios(db(), viewer, id)).map((s) => s.id)).toEqual([scenarioId]);

    await deleteScenario(db(), planner, scenarioId);
    expect(await listScenarios(db(), planner, id)).toEqual([]);
    await expect(deleteScenario(db(), planner, scenarioId)).rejects.toMatchObject({ code: "not_found" });
    await expect(deleteScenario(db(), planner, "not-a-uuid")).rejects.toMatchObject({ code: "not_found" });
    const deleted = await db().select().from(auditEvents).where(and(eq(auditEvents.action, "scenario.deleted"), eq(auditEvents.targetId, scenarioId)));
    expect(deleted).toHaveLength(1);
  });
});
