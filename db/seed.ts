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
import { and, eq } from "drizzle-orm";
import { demoRoutes } from "./demo/generate-routes";
import { DEMO_OWNER_RIGS, DEMO_TEAM_RIGS, type DemoRig } from "./demo/rigs";
import { plans, rigs, routes } from "./schema";
import { runPlanJob } from "../lib/analysis/plan-run";
import { createRig } from "../lib/server/rigs/rigs-dal";
import { rigSchema } from "../lib/validation/rig";
import { createPlan } from "../lib/server/plans/plans-dal";
import { computePlanRuns } from "../lib/server/plans/heat-runs";

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

/** The demo rigs: the operator's three, and the caravan owner's one. Found again by name. */
async function seedRigs(organisationId: string, userId: string, list: DemoRig[]): Promise<Record<string, string>> {
  const db = getDb();
  const ids: Record<string, string> = {};
  for (const r of list) {
    const [found] = await db.select({ id: rigs.id }).from(rigs).where(and(eq(rigs.organisationId, organisationId), eq(rigs.name, r.name)));
    ids[r.key] = found?.id ?? (await createRig(db, { userId }, organisationId, { name: r.name, region: "AU", rig: rigSchema.parse(r.rig) }));
  }
  return ids;
}

async function routeIdOf(organisationId: string, fileName: string): Promise<string> {
  const [row] = await getDb().select({ id: routes.id }).from(routes).where(and(eq(routes.organisationId, organisationId), eq(routes.fileName, fileName)));
  if (!row) throw new Error(`demo route ${fileName} is missing`);
  return row.id;
}

/**
 * The demo plans, with their heat runs and advice computed here (in-process: the app's worker bundles are built
 * after seeding): the operator's shakedown on Marrow Creek Track and its Kestrel Gap crossing, and the caravan
 * owner's own crossing. Found again by name; a plan that exists keeps its changes, and only stale runs re-run.
 */
export async function seedDemoPlans(): Promise<void> {
  const db = getDb();
  const planner = DEMO_USERS[1];
  const caravan = DEMO_USERS[3];
  const teamRigs = await seedRigs(TEAM.id, planner.id, DEMO_TEAM_RIGS);
  const ownerOrg = personalOrgId(caravan.id);
  const ownerRigs = await seedRigs(ownerOrg, caravan.id, DEMO_OWNER_RIGS);
  const convoy = [
    { rigId: teamRigs["lead-ute"]!, label: "Guide: Rafe" },
    { rigId: teamRigs["ashcombe-van"]!, label: "The Ashcombes" },
    { rigId: teamRigs["pell-camper"]!, label: "The Pells" },
  ];
  const wanted = [
    {
      organisationId: TEAM.id,
      userId: planner.id,
      input: {
        name: "Marrow Creek shakedown",
        routeId: await routeIdOf(TEAM.id, "marrow-creek-track.gpx"),
        tripDate: "2027-03-13",
        ambientC: 28,
        startTempC: null,
        speedPolicy: "standard" as const,
        speedCapMs: null,
        drivingStyle: "steady" as const,
        notes: "First day of the autumn tag-along. Regroup at the creek crossing; UHF channel 12.",
        rigs: convoy,
      },
    },
    {
      organisationId: TEAM.id,
      userId: planner.id,
      input: {
        name: "Kestrel Gap crossing",
        routeId: await routeIdOf(TEAM.id, "tallowmere-to-kestrel-gap.gpx"),
        tripDate: "2027-03-15",
        ambientC: 31,
        startTempC: null,
        speedPolicy: "standard" as const,
        speedCapMs: null,
        drivingStyle: "steady" as const,
        notes: "The long pass day. Fuel at Tallowmere before the climb.",
        rigs: convoy,
      },
    },
    {
      organisationId: ownerOrg,
      userId: caravan.id,
      input: {
        name: "Over Kestrel Gap with the van",
        routeId: await routeIdOf(ownerOrg, "tallowmere-to-kestrel-gap.gpx"),
        tripDate: "2027-01-04",
        ambientC: 33,
        startTempC: null,
        speedPolicy: "cautious" as const,
        speedCapMs: null,
        drivingStyle: "steady" as const,
        notes: "",
        rigs: [{ rigId: ownerRigs["holloway-van"]!, label: "Cass" }],
      },
    },
  ];
  for (const w of wanted) {
    const [found] = await db.select({ id: plans.id }).from(plans).where(and(eq(plans.organisationId, w.organisationId), eq(plans.name, w.input.name)));
    const planId = found?.id ?? (await createPlan(db, { userId: w.userId }, w.organisationId, w.input));
    await computePlanRuns(db, { userId: w.userId }, planId, undefined, async (job) => runPlanJob(job));
  }
}

if (process.argv[1]?.endsWith("seed.ts")) {
  seedDemo()
    .then(() => seedDemoRoutes())
    .then(() => seedDemoPlans())
    .then(() => console.log(describeDemoAccounts()))
    .catch((error: unknown) => {
      console.error("seeding failed:", error instanceof Error ? error.message : error);
      process.exitCode = 1;
    })
    .finally(() => closeDb());
}
