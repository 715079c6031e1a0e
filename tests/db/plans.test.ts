/** Plans through the data-access layer: convoy, duplicate, access, and that used routes and rigs stay put. */
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "../../db";
import { createPlan, deletePlan, duplicatePlan, getPlan, listPlans, updatePlan } from "../../lib/server/plans/plans-dal";
import { createRig, deleteRig } from "../../lib/server/rigs/rigs-dal";
import { deleteRoute } from "../../lib/server/routes/routes-dal";
import { uploadRoute } from "../../lib/server/routes/upload-route";
import { UTE_AND_CARAVAN, WAGON_AND_CAMPER } from "../../lib/thermal";
import type { PlanInput } from "../../lib/validation/plan";
import { makeTeam, makeUser } from "./fixtures";

let planner: { userId: string };
let viewer: { userId: string };
let stranger: { userId: string };
let org: string;
let otherOrg: string;
let routeId: string;
let rigA: string;
let rigB: string;
let foreignRig: string;

beforeAll(async () => {
  [planner, viewer, stranger] = await Promise.all([makeUser("Plan Planner"), makeUser("Plan Viewer"), makeUser("Plan Stranger")]);
  org = await makeTeam("Harrier Saddle Tours", [
    { userId: planner.userId, role: "planner" },
    { userId: viewer.userId, role: "viewer" },
  ]);
  otherOrg = await makeTeam("Elsewhere Tours", [{ userId: stranger.userId, role: "owner" }]);
  const bytes = new Uint8Array(readFileSync("tests/fixtures/gpx/demo/marrow-creek-track.gpx"));
  routeId = (await uploadRoute(getDb(), planner, org, { bytes, fileName: "marrow.gpx" })).route.id;
  rigA = await createRig(getDb(), planner, org, { name: "Ute and van", region: "AU", rig: structuredClone(UTE_AND_CARAVAN) as never });
  rigB = await createRig(getDb(), planner, org, { name: "Wagon and camper", region: "AU", rig: structuredClone(WAGON_AND_CAMPER) as never });
  foreignRig = await createRig(getDb(), stranger, otherOrg, { name: "Not yours", region: "AU", rig: structuredClone(UTE_AND_CARAVAN) as never });
});

const input = (over: Partial<PlanInput> = {}): PlanInput => ({
  name: "Marrow Creek crossing",
  routeId,
  tripDate: "2027-03-14",
  ambientC: 31,
  startTempC: null,
  speedPolicy: "standard",
  speedCapMs: null,
  drivingStyle: "steady",
  notes: "Meet at the ferry ramp.",
  rigs: [
    { rigId: rigA, label: "Dana (lead)" },
    { rigId: rigB, label: "Emery" },
  ],
  ...over,
});

describe("plans", () => {
  it("keeps the convoy in order, and updates it keeping the rigs that stay", async () => {
    const id = await createPlan(getDb(), planner, org, input());
    const plan = await getPlan(getDb(), viewer, id);
    expect(plan.convoy.map((c) => c.label)).toEqual(["Dana (lead)", "Emery"]);
    const keptId = plan.convoy[1]!.planRigId;
    await updatePlan(getDb(), planner, id, input({ rigs: [{ rigId: rigB, label: "Emery (lead)" }] }));
    const after = await getPlan(getDb(), planner, id);
    expect(after.convoy).toHaveLength(1);
    expect(after.convoy[0]).toMatchObject({ planRigId: keptId, label: "Emery (lead)", position: 0 });
  });

  it("duplicates a plan with its convoy", async () => {
    const id = await createPlan(getDb(), planner, org, input({ name: "Original" }));
    const copy = await getPlan(getDb(), planner, await duplicatePlan(getDb(), planner, id));
    expect(copy.name).toBe("Original (copy)");
    expect(copy.convoy.map((c) => c.rigId)).toEqual([rigA, rigB]);
  });

  it("refuses viewers, outsiders and another organisation's rig", async () => {
    await expect(createPlan(getDb(), viewer, org, input())).rejects.toMatchObject({ code: "forbidden" });
    const id = await createPlan(getDb(), planner, org, input());
    await expect(getPlan(getDb(), stranger, id)).rejects.toMatchObject({ code: "not_found" });
    await expect(deletePlan(getDb(), viewer, id)).rejects.toMatchObject({ code: "forbidden" });
    await expect(createPlan(getDb(), planner, org, input({ rigs: [{ rigId: foreignRig, label: "X" }] }))).rejects.toMatchObject({ code: "not_found" });
    expect((await listPlans(getDb(), viewer, org)).length).toBeGreaterThan(0);
  });

  it("a route or rig a plan uses cannot be deleted, with a message naming the plan", async () => {
    await createPlan(getDb(), planner, org, input({ name: "Guarded trip" }));
    await expect(deleteRoute(getDb(), planner, routeId)).rejects.toMatchObject({ code: "conflict", message: expect.stringContaining("“Guarded trip”") });
    await expect(deleteRig(getDb(), planner, rigA)).rejects.toMatchObject({ code: "conflict", message: expect.stringContaining("“Guarded trip”") });
  });
});
