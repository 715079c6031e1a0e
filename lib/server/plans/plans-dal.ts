import "server-only";
import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { planRigs, plans, rigs, routes, users } from "@/db/schema";
import { notFound } from "@/lib/errors";
import type { PlanInput } from "@/lib/validation/plan";
import { isUuid, requireAccess, type Actor } from "../access";
import { recordAudit } from "../audit";

const planColumns = {
  id: plans.id,
  organisationId: plans.organisationId,
  name: plans.name,
  routeId: plans.routeId,
  tripDate: plans.tripDate,
  ambientC: plans.ambientC,
  startTempC: plans.startTempC,
  speedPolicy: plans.speedPolicy,
  speedCapMs: plans.speedCapMs,
  drivingStyle: plans.drivingStyle,
  notes: plans.notes,
  createdAt: plans.createdAt,
  updatedAt: plans.updatedAt,
};

/** The organisation's plans, newest change first, with route name and convoy size. */
export async function listPlans(db: DbOrTx, actor: Actor, organisationId: string) {
  await requireAccess(db, actor, organisationId, "content.read");
  return db
    .select({
      ...planColumns,
      routeName: routes.name,
      routeLengthM: routes.lengthM,
      rigCount: sql<number>`(select count(*)::int from plan_rigs pr where pr.plan_id = ${plans.id})`,
      createdByName: users.name,
    })
    .from(plans)
    .innerJoin(routes, eq(routes.id, plans.routeId))
    .leftJoin(users, eq(users.id, plans.createdByUserId))
    .where(eq(plans.organisationId, organisationId))
    .orderBy(desc(plans.updatedAt));
}

async function guard(db: DbOrTx, actor: Actor, planId: string, action: "content.read" | "content.update" | "content.delete" | "content.create") {
  if (!isUuid(planId)) throw notFound("That plan");
  const [row] = await db.select({ organisationId: plans.organisationId }).from(plans).where(eq(plans.id, planId));
  if (!row) throw notFound("That plan");
  try {
    return { organisationId: row.organisationId, role: await requireAccess(db, actor, row.organisationId, action) };
  } catch (error) {
    if ((error as { code?: string }).code === "not_found") throw notFound("That plan");
    throw error;
  }
}

/** A plan with its convoy (each rig's data, in order) and its route's summary. */
export async function getPlan(db: DbOrTx, actor: Actor, planId: string) {
  const { role } = await guard(db, actor, planId, "content.read");
  const [plan] = await db.select(planColumns).from(plans).where(eq(plans.id, planId));
  const convoy = await db
    .select({ planRigId: planRigs.id, rigId: planRigs.rigId, label: planRigs.label, position: planRigs.position, rigName: rigs.name, region: rigs.region, rig: rigs.rig, calibration: rigs.calibration, rigUpdatedAt: rigs.updatedAt })
    .from(planRigs)
    .innerJoin(rigs, eq(rigs.id, planRigs.rigId))
    .where(eq(planRigs.planId, planId))
    .orderBy(asc(planRigs.position));
  return { ...plan!, convoy, role };
}

/** Checks that the route and every rig belong to the organisation (else they do not visibly exist). */
async function checkParts(db: DbOrTx, organisationId: string, input: PlanInput) {
  const [route] = await db.select({ id: routes.id }).from(routes).where(and(eq(routes.id, input.routeId), eq(routes.organisationId, organisationId)));
  if (!route) throw notFound("That route");
  const ids = [...new Set(input.rigs.map((r) => r.rigId))];
  const found = await db.select({ id: rigs.id }).from(rigs).where(and(inArray(rigs.id, ids), eq(rigs.organisationId, organisationId)));
  if (found.length !== ids.length) throw notFound("One of those rigs");
}

function planValues(input: PlanInput) {
  return {
    name: input.name,
    routeId: input.routeId,
    tripDate: input.tripDate ?? null,
    ambientC: input.ambientC,
    startTempC: input.startTempC ?? null,
    speedPolicy: input.speedPolicy,
    speedCapMs: input.speedPolicy === "cap" ? (input.speedCapMs ?? null) : null,
    drivingStyle: input.drivingStyle,
    notes: input.notes ?? "",
  };
}

export async function createPlan(db: DbOrTx, actor: Actor, organisationId: string, input: PlanInput): Promise<string> {
  await requireAccess(db, actor, organisationId, "content.create");
  await checkParts(db, organisationId, input);
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(plans).values({ organisationId, ...planValues(input), createdByUserId: actor.userId }).returning({ id: plans.id });
    await tx.insert(planRigs).values(input.rigs.map((r, position) => ({ planId: row!.id, rigId: r.rigId, label: r.label, position })));
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "plan.created", targetType: "plan", targetId: row!.id, detail: { name: input.name } });
    return row!.id;
  });
}

/** Replaces a plan's fields and convoy. Rigs that stay keep their stored heat runs (matched by rig and label). */
export async function updatePlan(db: DbOrTx, actor: Actor, planId: string, input: PlanInput) {
  const { organisationId } = await guard(db, actor, planId, "content.update");
  await checkParts(db, organisationId, input);
  await db.transaction(async (tx) => {
    await tx.update(plans).set({ ...planValues(input), updatedAt: sql`now()` }).where(eq(plans.id, planId));
    const existing = await tx.select().from(planRigs).where(eq(planRigs.planId, planId)).for("update");
    const keep = new Set<string>();
    for (const [position, r] of input.rigs.entries()) {
      const match = existing.find((e) => e.rigId === r.rigId && !keep.has(e.id));
      if (match) {
        keep.add(match.id);
        await tx.update(planRigs).set({ label: r.label, position }).where(eq(planRigs.id, match.id));
      } else {
        await tx.insert(planRigs).values({ planId, rigId: r.rigId, label: r.label, position });
      }
    }
    const drop = existing.filter((e) => !keep.has(e.id)).map((e) => e.id);
    if (drop.length) await tx.delete(planRigs).where(inArray(planRigs.id, drop));
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "plan.updated", targetType: "plan", targetId: planId, detail: { name: input.name } });
  });
}

/** A copy of a plan (fields and convoy, not its results), named "… (copy)". */
export async function duplicatePlan(db: DbOrTx, actor: Actor, planId: string): Promise<string> {
  const plan = await getPlan(db, actor, planId);
  const name = `${plan.name} (copy)`.slice(0, 120);
  return createPlan(db, actor, plan.organisationId, {
    name,
    routeId: plan.routeId,
    tripDate: plan.tripDate,
    ambientC: plan.ambientC,
    startTempC: plan.startTempC,
    speedPolicy: plan.speedPolicy,
    speedCapMs: plan.speedCapMs,
    drivingStyle: plan.drivingStyle,
    notes: plan.notes,
    rigs: plan.convoy.map((c) => ({ rigId: c.rigId, label: c.label })),
  });
}

export async function deletePlan(db: DbOrTx, actor: Actor, planId: string) {
  const { organisationId } = await guard(db, actor, planId, "content.delete");
  await db.transaction(async (tx) => {
    const [row] = await tx.delete(plans).where(eq(plans.id, planId)).returning({ name: plans.name });
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "plan.deleted", targetType: "plan", targetId: planId, detail: { name: row?.name ?? null } });
  });
}

/** Names of the plans that use a route or a rig (for a clear refusal to delete it). */
export async function plansUsing(db: DbOrTx, what: { routeId: string } | { rigId: string }): Promise<string[]> {
  const rows =
    "routeId" in what
      ? await db.select({ name: plans.name }).from(plans).where(eq(plans.routeId, what.routeId))
      : await db.selectDistinct({ name: plans.name }).from(planRigs).innerJoin(plans, eq(plans.id, planRigs.planId)).where(eq(planRigs.rigId, what.rigId));
  return rows.map((r) => r.name);
}
