/**
 * A rig's calibration from infrared readings (docs/model.md §11) through the data-access layer, PostgreSQL and
 * the heat worker: stored on the rig and cleared, written to the audit list, open to planners and owners only
 * (viewers 403, another organisation 404), every bad input answered with a message naming the reading and the
 * field, and part of the plan runs' inputs hash and options.
 */
import { readFileSync } from "node:fs";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "../../db";
import { auditEvents, rigs } from "../../db/schema";
import { AppError } from "../../lib/errors";
import { parseOrThrow } from "../../lib/http";
import { calibrateRig, clearRigCalibration } from "../../lib/server/rigs/calibration-dal";
import { planRuns } from "../../lib/server/plans/heat-runs";
import { createPlan } from "../../lib/server/plans/plans-dal";
import { createRig, getRig } from "../../lib/server/rigs/rigs-dal";
import { getRoute } from "../../lib/server/routes/routes-dal";
import { uploadRoute } from "../../lib/server/routes/upload-route";
import { UTE_AND_CARAVAN, WAGON_AND_CAMPER } from "../../lib/thermal";
import { calibrationRequestSchema, type CalibrationRequest } from "../../lib/validation/calibration";
import { makeTeam, makeUser, snapshotCounts } from "./fixtures";

/** A short route: one 3.2 km descent of 225 m. */
const GPX = "tests/fixtures/gpx/tarnwick-saddle-1-0.gpx";

let owner: { userId: string };
let planner: { userId: string };
let viewer: { userId: string };
let outsider: { userId: string };
let org: string;
let otherOrg: string;
let routeId: string;
let otherRouteId: string;
let bottomM: number;
let lengthM: number;
let rigId: string;
let soloRigId: string;

const db = () => getDb();
const clone = <T>(x: T): T => structuredClone(x);

beforeAll(async () => {
  [owner, planner, viewer, outsider] = await Promise.all([makeUser("Cal Owner"), makeUser("Cal Planner"), makeUser("Cal Viewer"), makeUser("Cal Outsider")]);
  org = await makeTeam("Tarnwick Calibrators", [
    { userId: owner.userId, role: "owner" },
    { userId: planner.userId, role: "planner" },
    { userId: viewer.userId, role: "viewer" },
  ]);
  otherOrg = await makeTeam("Ostling Calibrators", [{ userId: outsider.userId, role: "owner" }]);
  const bytes = new Uint8Array(readFileSync(GPX));
  routeId = (await uploadRoute(db(), planner, org, { bytes, fileName: "tarnwick.gpx" })).route.id;
  otherRouteId = (await uploadRoute(db(), outsider, otherOrg, { bytes, fileName: "tarnwick.gpx" })).route.id;
  const route = await getRoute(db(), planner, routeId);
  bottomM = route.descents[0]!.endDistanceM;
  lengthM = route.stats.lengthM;
  rigId = await createRig(db(), planner, org, { name: "Ute and van", region: "AU", rig: clone(UTE_AND_CARAVAN) as never });
  soloRigId = await createRig(db(), planner, org, { name: "Wagon alone", region: "AU", rig: { ...clone(WAGON_AND_CAMPER), trailer: undefined } as never });
});

const twoReadings = (): CalibrationRequest => ({
  routeId,
  readings: [
    { position: "front", atM: bottomM, tempC: 240, minutesAfterStop: 0 },
    { position: "trailer", atKm: bottomM / 1000, tempC: 260, minutesAfterStop: 1 },
  ],
});

/** The field errors of a rejected call. */
async function fieldsOf(run: () => Promise<unknown>): Promise<Record<string, string[]>> {
  const error = await run().then(() => null, (e: unknown) => e);
  expect(error).toBeInstanceOf(AppError);
  expect((error as AppError).code).toBe("invalid_input");
  return (error as AppError).fields ?? {};
}

describe("storing and clearing", () => {
  it("a planner's calibration is stored on the rig, read back by a viewer, audited, and cleared", async () => {
    const stored = await calibrateRig(db(), planner, rigId, twoReadings());
    expect(stored.fittedParameters).toEqual(["coolingFactor", "engineBrakingScale"]);
    expect(stored.readings).toHaveLength(2);
    expect(stored.readings[1]).toMatchObject({ routeId, position: "trailer", atM: bottomM, tempC: 260, minutesAfterStop: 1 });
    expect(stored.results.map((r) => r.reading).concat(stored.flagged.map((f) => f.reading)).sort()).toEqual([0, 1]);
    expect(stored.fittedBy).toBe(planner.userId);
    expect(stored.rmsAfterK).toBeLessThanOrEqual(stored.rmsBeforeK);
    const read = await getRig(db(), viewer, rigId);
    expect(read.calibration).toEqual(stored);
    const audit = await db().select().from(auditEvents).where(and(eq(auditEvents.targetId, rigId), eq(auditEvents.action, "rig.calibrated")));
    expect(audit).toHaveLength(1);
    expect(audit[0]!.actorUserId).toBe(planner.userId);

    await clearRigCalibration(db(), owner, rigId);
    expect((await getRig(db(), viewer, rigId)).calibration).toBeNull();
    const cleared = await db().select().from(auditEvents).where(and(eq(auditEvents.targetId, rigId), eq(auditEvents.action, "rig.calibration_cleared")));
    expect(cleared).toHaveLength(1);
  });

  it("one reading fits the cooling factor only, and says so", async () => {
    const stored = await calibrateRig(db(), owner, rigId, { routeId, readings: [{ position: "front", atKm: bottomM / 1000, tempC: 200 }] });
    expect(stored.fittedParameters).toEqual(["coolingFactor"]);
    expect(stored.fitted.engineBrakingScale).toBe(1);
    expect(stored.notes.join(" ")).toMatch(/One usable reading: the cooling factor alone is fitted/);
    await clearRigCalibration(db(), owner, rigId);
  });

  it("a reading no parameter set can explain is flagged with its reason, not absorbed", async () => {
    const input = twoReadings();
    input.readings.push({ position: "rear", atM: bottomM, tempC: 880 });
    const stored = await calibrateRig(db(), planner, rigId, input);
    expect(stored.flagged).toHaveLength(1);
    expect(stored.flagged[0]!.reading).toBe(2);
    expect(stored.flagged[0]!.reason).toMatch(/hotter than any heat run in the allowed ranges/);
    expect(stored.results.map((r) => r.reading)).toEqual([0, 1]);
    await clearRigCalibration(db(), planner, rigId);
  });

  it("when no reading can be explained nothing is stored and the earlier calibration stays", async () => {
    const kept = await calibrateRig(db(), planner, rigId, twoReadings());
    const fields = await fieldsOf(() => calibrateRig(db(), planner, rigId, { routeId, readings: [{ position: "front", atM: bottomM, tempC: 890 }] }));
    expect(fields["readings.0.tempC"]![0]).toMatch(/^Reading 1: hotter than any heat run/);
    expect((await getRig(db(), planner, rigId)).calibration).toEqual(kept);
    await clearRigCalibration(db(), planner, rigId);
  });
});

describe("access", () => {
  it("viewers are refused (403) and write nothing; another organisation's rig or route is 404", async () => {
    const before = await snapshotCounts();
    await expect(calibrateRig(db(), viewer, rigId, twoReadings())).rejects.toMatchObject({ code: "forbidden", status: 403 });
    await expect(clearRigCalibration(db(), viewer, rigId)).rejects.toMatchObject({ code: "forbidden" });
    await expect(calibrateRig(db(), outsider, rigId, twoReadings())).rejects.toMatchObject({ code: "not_found", status: 404 });
    await expect(clearRigCalibration(db(), outsider, rigId)).rejects.toMatchObject({ code: "not_found" });
    expect(await snapshotCounts()).toEqual(before);
    const [row] = await db().select({ calibration: rigs.calibration }).from(rigs).where(eq(rigs.id, rigId));
    expect(row!.calibration).toBeNull();
    // A planner of this organisation cannot fit on another organisation's route.
    await expect(calibrateRig(db(), planner, rigId, { ...twoReadings(), routeId: otherRouteId })).rejects.toMatchObject({ code: "not_found", fields: { routeId: ["Not one of this organisation's routes."] } });
  });
});

describe("validation", () => {
  it("the request schema names the reading and the field", () => {
    const fields = (body: unknown) => {
      try {
        parseOrThrow(calibrationRequestSchema, body);
      } catch (error) {
        return (error as AppError).fields ?? {};
      }
      throw new Error("accepted");
    };
    expect(fields({ routeId, readings: [] })).toEqual({ readings: ["readings: give at least one reading."] });
    expect(fields({ routeId, readings: Array.from({ length: 21 }, () => ({ position: "front", atM: 10, tempC: 100 })) })).toEqual({ readings: ["readings: at most 20 readings."] });
    expect(fields({ routeId: "nope", readings: [{ position: "front", atM: 10, tempC: 100 }] })).toEqual({ routeId: ["routeId: not a valid route id."] });
    const bad = fields({
      routeId,
      readings: [
        { position: "front", atM: 10, tempC: 950 },
        { position: "roof", atM: 10, tempC: 100 },
        { position: "rear", tempC: 100 },
        { position: "rear", atM: 10, tempC: -30, minutesAfterStop: -1 },
      ],
    });
    expect(bad["readings.0.tempC"]).toEqual(["The temperature (tempC) is at most 900 °C."]);
    expect(bad["readings.1.position"]).toEqual(["Choose front, rear or trailer."]);
    expect(bad["readings.2.atM"]).toEqual(["Give where on the route as atKm or atM (one of them)."]);
    expect(bad["readings.3.tempC"]).toEqual(["The temperature (tempC) is at least -20 °C."]);
    expect(bad["readings.3.minutesAfterStop"]).toEqual(["The minutes after stopping (minutesAfterStop) are 0 or more."]);
  });

  it("positions the rig lacks and places past the route's end are refused before the fit, per reading", async () => {
    const fields = await fieldsOf(() =>
      calibrateRig(db(), planner, soloRigId, {
        routeId,
        readings: [
          { position: "trailer", atM: bottomM, tempC: 200 },
          { position: "front", atKm: lengthM / 1000 + 5, tempC: 200 },
        ],
      }),
    );
    expect(fields["readings.0.position"]![0]).toBe("Reading 1: this rig has no trailer brakes (it has front, rear).");
    expect(fields["readings.1.atKm"]![0]).toMatch(/^Reading 2: [\d.]+ km is past the end of the route \([\d.]+ km\)\.$/);
    expect((await getRig(db(), planner, soloRigId)).calibration).toBeNull();
  });
});

describe("plan heat runs", () => {
  it("run with the fitted factors, and the inputs hash changes with the calibration", async () => {
    const planId = await createPlan(db(), planner, org, {
      name: "Calibrated run",
      routeId,
      tripDate: null,
      ambientC: 28,
      startTempC: null,
      speedPolicy: "standard",
      speedCapMs: null,
      drivingStyle: "steady",
      notes: "",
      rigs: [{ rigId, label: "Lead" }],
    });
    const plain = (await planRuns(db(), planner, planId)).runs[0]!;
    expect(plain.calibration).toBeNull();
    expect(plain.options.params).not.toHaveProperty("coolingFactor");

    const first = await calibrateRig(db(), planner, rigId, twoReadings());
    const calibrated = (await planRuns(db(), viewer, planId)).runs[0]!;
    expect(calibrated.inputsHash).not.toBe(plain.inputsHash);
    expect(calibrated.options.params).toMatchObject({ ambientC: 28, coolingFactor: first.fitted.coolingFactor, engineBrakingScale: first.fitted.engineBrakingScale });
    expect(calibrated.calibration).toMatchObject({ fittedAt: first.fittedAt, readings: 2 });
    // Read again: the same hash (the stored calibration hashes the same on every read).
    expect((await planRuns(db(), planner, planId)).runs[0]!.inputsHash).toBe(calibrated.inputsHash);

    // A new calibration, even from the same readings, is a new input.
    await new Promise((r) => setTimeout(r, 5));
    await calibrateRig(db(), planner, rigId, twoReadings());
    const again = (await planRuns(db(), planner, planId)).runs[0]!;
    expect(again.inputsHash).not.toBe(calibrated.inputsHash);

    await clearRigCalibration(db(), planner, rigId);
    expect((await planRuns(db(), planner, planId)).runs[0]!.inputsHash).toBe(plain.inputsHash);
  });
});
