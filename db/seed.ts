/**
 * The demo scenario, invented from start to finish: "Tallowmere Tag-Along Tours", a small operator that leads
 * convoys of customers' 4x4s and caravans, with one user per role, and a caravan owner who plans alone in a
 * personal organisation. Idempotent: fixed ids, and rows that exist are left as they are (a demo user who
 * changed a role or password keeps the change).
 */
import { sql } from "drizzle-orm";
import { closeDb, getDb } from "./index";
import { memberships, organisations, users } from "./schema";
import { hashPassword } from "../lib/auth/password";
import { createHash } from "node:crypto";
import { runGpxJob } from "../lib/server/routes/gpx-job";
import { createRoute, findRouteByContent } from "../lib/server/routes/routes-dal";
import { demoRoutes } from "./demo/generate-routes";

export const DEMO_PASSWORD = "switchback-demo-2026";

const TEAM = { id: "6f1d3c2a-0b7e-4c1a-9d55-3a1e0c7b9d01", name: "Tallowmere Tag-Along Tours" } as const;

export const DEMO_USERS = [
  { id: "0b9e7c35-5a3f-4e8e-8d1c-6a9f0e2b7a11", name: "Olive Marsh", email: "olive.marsh@tallowmere-tours.example", teamRole: "owner" },
  { id: "1c8f6d44-6b4e-4f9f-9e2d-7b0a1f3c8b22", name: "Rafe Dunmore", email: "rafe.dunmore@tallowmere-tours.example", teamRole: "planner" },
  { id: "2d7a5e53-7c5f-4a0a-8f3e-8c1b2a4d9c33", name: "Vera Quill", email: "vera.quill@tallowmere-tours.example", teamRole: "viewer" },
  { id: "3e6b4f62-8d6a-4b1b-9a4f-9d2c3b5e0d44", name: "Cass Holloway", email: "cass.holloway@caravan-owner.example", teamRole: null },
] as const;

/** Each person's personal organisation id is derived from theirs so reseeding finds it. */
const personalOrgId = (userId: string) => `${userId.slice(0, 24)}aaaaaaaaaaaa`;

export async function seedDemo(): Promise<void> {
  const db = getDb();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    await tx.insert(organisations).values({ id: TEAM.id, name: TEAM.name, kind: "team" }).onConflictDoNothing();
    for (const person of DEMO_USERS) {
      const personalId = personalOrgId(person.id);
      await tx
        .insert(organisations)
        .values({ id: personalId, name: `${person.name} (personal)`, kind: "personal" })
        .onConflictDoNothing();
      await tx
        .insert(users)
        .values({
          id: person.id,
          name: person.name,
          email: person.email,
          passwordHash,
          emailVerifiedAt: sql`now()`,
          activeOrganisationId: person.teamRole ? TEAM.id : personalId,
        })
        .onConflictDoNothing();
      await tx.insert(memberships).values({ organisationId: personalId, userId: person.id, role: "owner" }).onConflictDoNothing();
      if (person.teamRole) {
        await tx.insert(memberships).values({ organisationId: TEAM.id, userId: person.id, role: person.teamRole }).onConflictDoNothing();
      }
    }
  });
}

/** The lines the start command prints so a new user can sign in straight away. */
export function describeDemoAccounts(): string {
  const rows = DEMO_USERS.map((u) => {
    const where = u.teamRole ? `${u.teamRole} of ${TEAM.name}` : "caravan owner, own organisation";
    return `    ${u.email.padEnd(40)} ${where}`;
  });
  return [`  Demo accounts (password for each: ${DEMO_PASSWORD}):`, ...rows].join("\n");
}

/**
 * The demo routes of the invented Tallow Island (db/demo): all of them for the tour operator, uploaded by its
 * planner, and the long pass crossing for the caravan owner. Already-seeded routes are found by content.
 */
export async function seedDemoRoutes(): Promise<void> {
  const db = getDb();
  const planner = DEMO_USERS[1];
  const caravan = DEMO_USERS[3];
  const targets = [
    ...demoRoutes().map((route) => ({ route, organisationId: TEAM.id, userId: planner.id })),
    ...demoRoutes()
      .filter((r) => r.slug === "tallowmere-to-kestrel-gap")
      .map((route) => ({ route, organisationId: personalOrgId(caravan.id), userId: caravan.id })),
  ];
  for (const { route, organisationId, userId } of targets) {
    const bytes = Buffer.from(route.gpx, "utf8");
    const hash = createHash("sha256").update(bytes).digest("hex");
    if (await findRouteByContent(db, organisationId, hash, null)) continue;
    const processed = runGpxJob(route.gpx);
    if (!processed.ok) throw new Error(`demo route ${route.slug}: ${processed.problems[0]?.message}`);
    await createRoute(db, { userId }, organisationId, {
      name: route.name,
      fileName: `${route.slug}.gpx`,
      contentSha256: hash,
      gpx: bytes,
      processed,
    });
  }
}

if (process.argv[1]?.endsWith("seed.ts")) {
  seedDemo()
    .then(() => seedDemoRoutes())
    .then(() => console.log(describeDemoAccounts()))
    .catch((error: unknown) => {
      console.error("seeding failed:", error instanceof Error ? error.message : error);
      process.exitCode = 1;
    })
    .finally(() => closeDb());
}
