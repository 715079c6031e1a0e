/** Role changes and removals: the last-owner rule, concurrency, and that access ends at once. */
import { describe, expect, it } from "vitest";
import { getDb } from "../../db";
import { requireAccess } from "../../lib/server/access";
import { listAuditEventsByOrganisation } from "../../lib/server/audit";
import { changeMemberRole, listMembers, removeMember } from "../../lib/server/members";
import { makeTeam, makeUser } from "./fixtures";

const LAST_OWNER = "An organisation needs at least one owner. Make someone else an owner first.";

describe("members", () => {
  it("the last owner can be neither demoted nor removed, nor leave", async () => {
    const owner = await makeUser("Only Owner");
    const planner = await makeUser("Some Planner");
    const org = await makeTeam("Lone Peak Tours", [
      { userId: owner.userId, role: "owner" },
      { userId: planner.userId, role: "planner" },
    ]);
    await expect(changeMemberRole(getDb(), owner, org, owner.userId, "planner")).rejects.toMatchObject({ code: "conflict", message: LAST_OWNER });
    await expect(removeMember(getDb(), owner, org, owner.userId)).rejects.toMatchObject({ code: "conflict", message: LAST_OWNER });
    await changeMemberRole(getDb(), owner, org, planner.userId, "owner");
    await changeMemberRole(getDb(), owner, org, owner.userId, "viewer"); // now allowed: another owner exists
    expect((await listMembers(getDb(), planner, org)).find((m) => m.userId === owner.userId)?.role).toBe("viewer");
  });

  it("two owners demoting each other at the same moment leave one owner", async () => {
    const a = await makeUser("Owner A");
    const b = await makeUser("Owner B");
    const org = await makeTeam("Twin Gap Tours", [
      { userId: a.userId, role: "owner" },
      { userId: b.userId, role: "owner" },
    ]);
    const results = await Promise.allSettled([
      changeMemberRole(getDb(), a, org, b.userId, "viewer"),
      changeMemberRole(getDb(), b, org, a.userId, "viewer"),
    ]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const owners = (await listMembers(getDb(), a, org)).filter((m) => m.role === "owner");
    expect(owners).toHaveLength(1);
  });

  it("a removed or demoted member loses the rights at once (roles come from the database)", async () => {
    const owner = await makeUser("Boss");
    const planner = await makeUser("Former Planner");
    const org = await makeTeam("Dry Creek Tours", [
      { userId: owner.userId, role: "owner" },
      { userId: planner.userId, role: "planner" },
    ]);
    await expect(requireAccess(getDb(), planner, org, "content.create")).resolves.toBe("planner");
    await changeMemberRole(getDb(), owner, org, planner.userId, "viewer");
    await expect(requireAccess(getDb(), planner, org, "content.create")).rejects.toMatchObject({ code: "forbidden" });
    await removeMember(getDb(), owner, org, planner.userId);
    await expect(requireAccess(getDb(), planner, org, "content.read")).rejects.toMatchObject({ code: "not_found" });
    const actions = (await listAuditEventsByOrganisation(getDb(), { organisationId: org })).map((e) => e.action);
    expect(actions).toEqual(["member.removed", "member.role_changed"]);
  });

  it("a member can leave, but not their only organisation", async () => {
    const owner = await makeUser("Host");
    const guest = await makeUser("Guest");
    const org = await makeTeam("Ash Flat Tours", [
      { userId: owner.userId, role: "owner" },
      { userId: guest.userId, role: "viewer" },
    ]);
    await removeMember(getDb(), guest, org, guest.userId);
    await expect(requireAccess(getDb(), guest, org, "content.read")).rejects.toMatchObject({ code: "not_found" });
    await expect(removeMember(getDb(), guest, guest.personalOrganisationId, guest.userId)).rejects.toMatchObject({ code: "conflict" });
  });
});
