/** Builders for database tests: real rows through the data-access layer, with a fast shared password hash. */
import { randomBytes } from "node:crypto";
import { eq, sql } from "drizzle-orm";
import { getDb } from "../../db";
import { memberships, organisations, users } from "../../db/schema";
import { hashPassword } from "../../lib/auth/password";
import type { Role } from "../../lib/auth/permissions";
import { createUserWithPersonalOrganisation } from "../../lib/server/accounts";

export const FIXTURE_PASSWORD = "a perfectly good test phrase";
let hash: Promise<string> | undefined;

export async function makeUser(name = "Test Person", options: { verified?: boolean; email?: string } = {}) {
  hash ??= hashPassword(FIXTURE_PASSWORD);
  const email = options.email ?? `${name.toLowerCase().replace(/\W+/g, ".")}.${randomBytes(3).toString("hex")}@test.example`;
  const db = getDb();
  const created = await db.transaction((tx) =>
    createUserWithPersonalOrganisation(tx, { name, email, passwordHash: "", verified: options.verified ?? true }),
  );
  await db.update(users).set({ passwordHash: await hash! }).where(eq(users.id, created.userId));
  return { userId: created.userId, personalOrganisationId: created.organisationId, email, name };
}

export async function makeTeam(name: string, members: { userId: string; role: Role }[]) {
  const db = getDb();
  const [org] = await db.insert(organisations).values({ name, kind: "team" }).returning({ id: organisations.id });
  for (const m of members) await db.insert(memberships).values({ organisationId: org!.id, userId: m.userId, role: m.role });
  return org!.id;
}

/** Row counts of the tables a denied request must not touch, and every rig's calibration (as a digest). */
export async function snapshotCounts() {
  const [row] = await getDb().execute<{ m: number; i: number; a: number; o: number; u: number; c: string }>(sql`
    select (select count(*)::int from memberships) as m, (select count(*)::int from invitations) as i,
           (select count(*)::int from audit_events) as a, (select count(*)::int from organisations) as o,
           (select count(*)::int from users) as u,
           (select coalesce(string_agg(id::text || ':' || md5(coalesce(calibration::text, '')), ',' order by id), '') from rigs) as c`).then((r) => r.rows);
  const names = await getDb().select({ id: organisations.id, name: organisations.name }).from(organisations);
  const roles = await getDb().select().from(memberships);
  return { ...row!, names: names.sort((a, b) => a.id.localeCompare(b.id)), roles: roles.map((r) => `${r.organisationId}/${r.userId}/${r.role}`).sort() };
}
