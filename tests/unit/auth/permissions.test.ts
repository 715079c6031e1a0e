/** The role table read the way the foundation issue states it; the full matrix runs against PostgreSQL in tests/db. */
import { expect, it } from "vitest";
import { ACTIONS, can, ROLES } from "@/lib/auth/permissions";

it("owners may do everything", () => {
  for (const action of ACTIONS) expect(can("owner", action)).toBe(true);
});

it("viewers may only read", () => {
  const allowed = ACTIONS.filter((a) => can("viewer", a));
  expect(allowed.sort()).toEqual(["content.read", "member.read", "organisation.read"]);
});

it("planners write content but do not run the organisation", () => {
  const allowed = ACTIONS.filter((a) => can("planner", a));
  expect(allowed.sort()).toEqual(["content.create", "content.delete", "content.read", "content.update", "member.read", "organisation.read"]);
  expect(ROLES).toEqual(["owner", "planner", "viewer"]);
});
