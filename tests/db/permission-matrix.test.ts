/**
 * Every role × every action, in the actor's own organisation and in another one, through the real
 * data-access layer and PostgreSQL. The expected cells are written out by hand (the product rule from the
 * foundation issue: owners run the organisation, planners write content, viewers read), not derived from
 * the policy table, so a change to either shows up here. A denied cell must leave the database unchanged.
 */
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "../../db";
import type { Role } from "../../lib/auth/permissions";
import { AppError } from "../../lib/errors";
import { requireAccess } from "../../lib/server/access";
import { listAuditEventsByOrganisation } from "../../lib/server/audit";
import { createInvitation, listInvitations, revokeInvitation } from "../../lib/server/invitations";
import { changeMemberRole, listMembers, removeMember } from "../../lib/server/members";
import { renameOrganisation } from "../../lib/server/organisations";
import { runCalibrationJob } from "../../lib/analysis/calibration";
import { calibrateRig, clearRigCalibration } from "../../lib/server/rigs/calibration-dal";
import { createRig } from "../../lib/server/rigs/rigs-dal";
import { uploadRoute } from "../../lib/server/routes/upload-route";
import { UTE_AND_CARAVAN } from "../../lib/thermal";
import { makeTeam, makeUser, snapshotCounts } from "./fixtures";

type Outcome = "allow" | "forbidden" | "not_found";
type Org = { id: string; owner: string; planner: string; viewer: string; rigId: string; routeId: string };

/** The fit in-process (the same job the heat worker runs), so the matrix stays quick. */
const inProcess = (job: Parameters<typeof runCalibrationJob>[0]) => Promise.resolve(runCalibrationJob(job));

const ACTIONS: Record<string, (actor: string, org: Org) => Promise<unknown>> = {
  "read members": (actor, org) => listMembers(getDb(), { userId: actor }, org.id),
  "create content": (actor, org) => requireAccess(getDb(), { userId: actor }, org.id, "content.create"),
  "change content": (actor, org) => requireAccess(getDb(), { userId: actor }, org.id, "content.update"),
  "delete content": (actor, org) => requireAccess(getDb(), { userId: actor }, org.id, "content.delete"),
  "rename organisation": (actor, org) => renameOrganisation(getDb(), { userId: actor }, org.id, `Renamed ${Date.now()}`),
  invite: (actor, org) =>
    createInvitation(getDb(), { userId: actor }, org.id, { email: `new.${Math.random().toString(36).slice(2)}@test.example`, role: "viewer" }),
  "read invitations": (actor, org) => listInvitations(getDb(), { userId: actor }, org.id),
  "withdraw invitation": async (actor, org) => {
    const { invitation } = await createInvitation(getDb(), { userId: org.owner }, org.id, { email: `w.${Math.random().toString(36).slice(2)}@test.example`, role: "viewer" });
    return revokeInvitation(getDb(), { userId: actor }, org.id, invitation.id);
  },
  "change role": async (actor, org) => changeMemberRole(getDb(), { userId: actor }, org.id, await freshMember(org), "planner"),
  "remove member": async (actor, org) => removeMember(getDb(), { userId: actor }, org.id, await freshMember(org)),
  "calibrate rig": (actor, org) =>
    calibrateRig(getDb(), { userId: actor }, org.rigId, { routeId: org.routeId, readings: [{ position: "front", atM: 3000, tempC: 150 }] }, inProcess),
  "clear rig calibration": (actor, org) => clearRigCalibration(getDb(), { userId: actor }, org.rigId),
  "read audit list": async (actor, org) => {
    await requireAccess(getDb(), { userId: actor }, org.id, "audit.read");
    return listAuditEventsByOrganisation(getDb(), { organisationId: org.id });
  },
};

/** Expected outcome in the actor's own organisation; in any other organisation every cell is not_found. */
const OWN: Record<string, Record<Role, Outcome>> = {
  "read members": { owner: "allow", planner: "allow", viewer: "allow" },
  "create content": { owner: "allow", planner: "allow", viewer: "forbidden" },
  "change content": { owner: "allow", planner: "allow", viewer: "forbidden" },
  "delete content": { owner: "allow", planner: "allow", viewer: "forbidden" },
  "rename organisation": { owner: "allow", planner: "forbidden", viewer: "forbidden" },
  invite: { owner: "allow", planner: "forbidden", viewer: "forbidden" },
  "read invitations": { owner: "allow", planner: "forbidden", viewer: "forbidden" },
  "withdraw invitation": { owner: "allow", planner: "forbidden", viewer: "forbidden" },
  "change role": { owner: "allow", planner: "forbidden", viewer: "forbidden" },
  "remove member": { owner: "allow", planner: "forbidden", viewer: "forbidden" },
  "calibrate rig": { owner: "allow", planner: "allow", viewer: "forbidden" },
  "clear rig calibration": { owner: "allow", planner: "allow", viewer: "forbidden" },
  "read audit list": { owner: "allow", planner: "forbidden", viewer: "forbidden" },
};

let orgA: Org;
let orgB: Org;

async function makeOrg(label: string): Promise<Org> {
  const [owner, planner, viewer] = await Promise.all([makeUser(`${label} Owner`), makeUser(`${label} Planner`), makeUser(`${label} Viewer`)]);
  const id = await makeTeam(`${label} Tours`, [
    { userId: owner.userId, role: "owner" },
    { userId: planner.userId, role: "planner" },
    { userId: viewer.userId, role: "viewer" },
  ]);
  const bytes = new Uint8Array(readFileSync("tests/fixtures/gpx/tarnwick-saddle-1-0.gpx"));
  const { route } = await uploadRoute(getDb(), { userId: planner.userId }, id, { bytes, fileName: "tarnwick.gpx" });
  const rigId = await createRig(getDb(), { userId: planner.userId }, id, { name: `${label} rig`, region: "AU", rig: structuredClone(UTE_AND_CARAVAN) as never });
  return { id, owner: owner.userId, planner: planner.userId, viewer: viewer.userId, rigId, routeId: route.id };
}

/** A member created for one cell, so that removing or re-roling them never disturbs another cell. */
async function freshMember(org: Org): Promise<string> {
  const user = await makeUser("Spare Member");
  await getDb().execute(
    // Raw insert keeps this helper independent of the invitation flow under test.
    (await import("drizzle-orm")).sql`insert into memberships (organisation_id, user_id, role) values (${org.id}, ${user.userId}, 'viewer')`,
  );
  return user.userId;
}

async function outcomeOf(run: () => Promise<unknown>): Promise<Outcome> {
  try {
    await run();
    return "allow";
  } catch (error) {
    if (error instanceof AppError && (error.code === "forbidden" || error.code === "not_found")) return error.code;
    throw error;
  }
}

beforeAll(async () => {
  orgA = await makeOrg("Alpha");
  orgB = await makeOrg("Bravo");
});

describe("permission matrix", () => {
  for (const [action, expected] of Object.entries(OWN)) {
    for (const role of ["owner", "planner", "viewer"] as const) {
      it(`${role} · ${action} · own organisation → ${expected[role]}`, async () => {
        const actor = orgA[role];
        // Set-up rows (spare members, invitations to withdraw) are made before the snapshot only for allow
        // cells; for denied cells the whole attempt, set-up included, is compared with the state after it.
        const outcome = await outcomeOf(() => ACTIONS[action]!(actor, orgA));
        expect(outcome).toBe(expected[role]);
      });
      it(`${role} · ${action} · another organisation → not_found, nothing written`, async () => {
        const actor = orgA[role];
        const cell = ACTIONS[action]!;
        // Cells that need a target row get it in org B first; then the attempt must change nothing.
        const target = action === "change role" || action === "remove member" ? await freshMember(orgB) : null;
        const before = await snapshotCounts();
        const outcome = await outcomeOf(async () => {
          if (action === "change role") return changeMemberRole(getDb(), { userId: actor }, orgB.id, target!, "owner");
          if (action === "remove member") return removeMember(getDb(), { userId: actor }, orgB.id, target!);
          if (action === "withdraw invitation") return revokeInvitation(getDb(), { userId: actor }, orgB.id, "00000000-0000-4000-8000-000000000000");
          return cell(actor, orgB);
        });
        expect(outcome).toBe("not_found");
        expect(await snapshotCounts()).toEqual(before);
      });
    }
  }

  it("a denied change in the own organisation writes nothing", async () => {
    const target = await freshMember(orgA);
    const before = await snapshotCounts();
    for (const actor of [orgA.planner, orgA.viewer]) {
      await expect(changeMemberRole(getDb(), { userId: actor }, orgA.id, target, "owner")).rejects.toMatchObject({ code: "forbidden" });
      await expect(removeMember(getDb(), { userId: actor }, orgA.id, target)).rejects.toMatchObject({ code: "forbidden" });
      await expect(renameOrganisation(getDb(), { userId: actor }, orgA.id, "Hijacked")).rejects.toMatchObject({ code: "forbidden" });
      await expect(createInvitation(getDb(), { userId: actor }, orgA.id, { email: "x@test.example", role: "owner" })).rejects.toMatchObject({ code: "forbidden" });
    }
    expect(await snapshotCounts()).toEqual(before);
  });

  it("a malformed organisation id is not_found, never a database error", async () => {
    await expect(listMembers(getDb(), { userId: orgA.owner }, "not-a-uuid")).rejects.toMatchObject({ code: "not_found" });
    await expect(listMembers(getDb(), { userId: orgA.owner }, "'; drop table memberships;--")).rejects.toMatchObject({ code: "not_found" });
  });
});
