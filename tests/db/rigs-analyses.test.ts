/**
 * Rigs and analyses through the data-access layer, PostgreSQL and the heat worker. Compliance figures are
 * checked against the rules in docs/trade-facts.md §1–2 through lib/compliance (tested there); here: storage, access,
 * and that an analysis of a saved route and rig equals the model run directly (plain consistency).
 */
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "../../db";
import { analyzeRoute } from "../../lib/analysis/analyze";
import { processGpx } from "../../lib/route";
import { runAnalysis } from "../../lib/server/analyses/run-analysis";
import { createRig, deleteRig, getRig, listRigs, updateRig } from "../../lib/server/rigs/rigs-dal";
import { uploadRoute } from "../../lib/server/routes/upload-route";
import { UTE_AND_CARAVAN } from "../../lib/thermal";
import { makeTeam, makeUser } from "./fixtures";

const GPX = "tests/fixtures/gpx/demo/tallowmere-to-kestrel-gap.gpx";
let planner: { userId: string };
let viewer: { userId: string };
let outsider: { userId: string };
let org: string;

beforeAll(async () => {
  [planner, viewer, outsider] = await Promise.all([makeUser("Rig Planner"), makeUser("Rig Viewer"), makeUser("Rig Outsider")]);
  org = await makeTeam("Spinefell Convoys", [
    { userId: planner.userId, role: "planner" },
    { userId: viewer.userId, role: "viewer" },
  ]);
});

describe("rigs", () => {
  it("stores a rig with its region and reports its compliance; viewers read, outsiders see nothing", async () => {
    const id = await createRig(getDb(), planner, org, { name: "Ute and tandem van", region: "AU", rig: structuredClone(UTE_AND_CARAVAN) as never });
    const saved = await getRig(getDb(), viewer, id);
    expect(saved.rig.vehicle.gvmKg).toBe(UTE_AND_CARAVAN.vehicle.gvmKg);
    expect(saved.compliance.region).toBe("AU");
    expect(saved.compliance.checks.map((c) => c.id)).toContain("gcm");
    await expect(getRig(getDb(), outsider, id)).rejects.toMatchObject({ code: "not_found" });
    await expect(updateRig(getDb(), viewer, id, { name: "x", region: "AU", rig: UTE_AND_CARAVAN as never })).rejects.toMatchObject({ code: "forbidden" });
    expect((await listRigs(getDb(), viewer, org)).map((r) => r.name)).toContain("Ute and tandem van");
    await deleteRig(getDb(), planner, id);
    await expect(getRig(getDb(), planner, id)).rejects.toMatchObject({ code: "not_found" });
  });
});

describe("analyses", () => {
  it("a saved route and rig give the same peaks as the model run directly, computed in the worker", async () => {
    const bytes = new Uint8Array(readFileSync(GPX));
    const { route } = await uploadRoute(getDb(), planner, org, { bytes, fileName: "pass.gpx" });
    const rigId = await createRig(getDb(), planner, org, { name: "Preset rig", region: "AU", rig: structuredClone(UTE_AND_CARAVAN) as never });
    const viaWorker = await runAnalysis(getDb(), viewer, { route: { routeId: route.id }, rig: { rigId }, detail: "none" });
    const direct = processGpx(readFileSync(GPX, "utf8"));
    if (!direct.ok) throw new Error("fixture did not parse");
    const expected = analyzeRoute(direct.profile, direct.descents, UTE_AND_CARAVAN, {}, "none");
    expect(viaWorker.peaks).toEqual(expected.peaks);
    expect(viaWorker.descents).toHaveLength(expected.descents.length);
    expect(viaWorker.routeName).toBe(route.name);
  });

  it("analyses an unsaved GPX and rig object, and passes the model's exact message for a bad option", async () => {
    const gpx = new Uint8Array(readFileSync(GPX));
    const result = await runAnalysis(getDb(), outsider, { route: { gpx }, rig: { rig: UTE_AND_CARAVAN }, detail: "sampled" });
    expect(result.trace!.distanceM.length).toBeLessThanOrEqual(2001);
    const bad = await runAnalysis(getDb(), outsider, { route: { gpx }, rig: { rig: UTE_AND_CARAVAN }, options: { params: { coolingFactor: -1 } } }).catch((e: unknown) => e);
    expect(bad).toMatchObject({ code: "invalid_input" });
    expect((bad as Error).message).toMatch(/^The model refused the input: .*coolingFactor/);
  });

  it("another organisation's route or rig answers 404", async () => {
    const bytes = new Uint8Array(readFileSync("tests/fixtures/gpx/demo/cinder-flats-loop.gpx"));
    const { route } = await uploadRoute(getDb(), planner, org, { bytes, fileName: "loop.gpx" });
    await expect(runAnalysis(getDb(), outsider, { route: { routeId: route.id }, rig: { rig: UTE_AND_CARAVAN } })).rejects.toMatchObject({ code: "not_found" });
  });
});
