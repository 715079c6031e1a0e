import "server-only";
import { and, desc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { plans, scenarios, users } from "@/db/schema";
import { AppError, notFound } from "@/lib/errors";
import type { WhatIfSettings } from "@/lib/analysis/what-if";
import type { ScenarioInput } from "@/lib/validation/plan";
import { isUuid, requireAccess, type Actor } from "../access";
import { recordAudit } from "../audit";
import { getPlan } from "./plans-dal";

/** A plan's saved what-ifs, newest first. */
export async function listScenarios(db: DbOrTx, actor: Actor, planId: string) {
  await getPlan(db, actor, planId);
  const rows = await db
    .select({ id: scenarios.id, name: scenarios.name, settings: scenarios.settings, createdAt: scenarios.createdAt, createdByName: users.name })
    .from(scenarios)
    .leftJoin(users, eq(users.id, scenarios.createdByUserId))
    .where(eq(scenarios.planId, planId))
    .orderBy(desc(scenarios.createdAt));
  return rows.map((r) => ({ ...r, settings: r.settings as WhatIfSettings }));
}

/** Saves a what-if as a named scenario of the plan (planners, owners). */
export async function createScenario(db: DbOrTx, actor: Actor, planId: string, input: ScenarioInput): Promise<string> {
  const plan = await getPlan(db, actor, planId);
  await requireAccess(db, actor, plan.organisationId, "content.update");
  if (!plan.convoy.some((c) => c.planRigId === input.settings.planRigId)) {
    throw new AppError("invalid_input", "That rig is not in this plan's convoy any more. Reload the page.", { "settings.planRigId": ["Not in this plan."] });
  }
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(scenarios).values({ planId, name: input.name, settings: input.settings, createdByUserId: actor.userId }).returning({ id: scenarios.id });
    await recordAudit(tx, { organisationId: plan.organisationId, actorUserId: actor.userId, action: "scenario.saved", targetType: "scenario", targetId: row!.id, detail: { name: input.name, planId } });
    return row!.id;
  });
}

/** Deletes a scenario (planners, owners). */
export async function deleteScenario(db: DbOrTx, actor: Actor, scenarioId: string) {
  if (!isUuid(scenarioId)) throw notFound("That scenario");
  const [row] = await db.select({ planId: scenarios.planId, organisationId: plans.organisationId, name: scenarios.name }).from(scenarios).innerJoin(plans, eq(plans.id, scenarios.planId)).where(eq(scenarios.id, scenarioId));
  if (!row) throw notFound("That scenario");
  try {
    await requireAccess(db, actor, row.organisationId, "content.update");
  } catch (error) {
    if ((error as { code?: string }).code === "not_found") throw notFound("That scenario");
    throw error;
  }
  await db.transaction(async (tx) => {
    await tx.delete(scenarios).where(and(eq(scenarios.id, scenarioId), eq(scenarios.planId, row.planId)));
    await recordAudit(tx, { organisationId: row.organisationId, actorUserId: actor.userId, action: "scenario.deleted", targetType: "scenario", targetId: scenarioId, detail: { name: row.name } });
  });
}
