import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { rigs, users } from "@/db/schema";
import { checkRigCompliance, type Region } from "@/lib/compliance";
import type { Rig } from "@/lib/thermal";
import { AppError, notFound } from "@/lib/errors";
import { readStoredCalibration } from "@/lib/validation/calibration";
import type { SavedRigInput } from "@/lib/validation/rig";
import { isUuid, requireAccess, type Actor } from "../access";
import { recordAudit } from "../audit";
import { plansUsing } from "../plans/plans-dal";

const columns = {
  id: rigs.id,
  name: rigs.name,
  region: rigs.region,
  rig: rigs.rig,
  calibration: rigs.calibration,
  createdAt: rigs.createdAt,
  updatedAt: rigs.updatedAt,
  createdByName: users.name,
};

/** Rigs one organisation may keep. */
export const RIGS_PER_ORGANISATION = 300;

/** The organisation's rigs, by name, each with its compliance summary. */
export async function listRigs(db: DbOrTx, actor: Actor, organisationId: string) {
  await requireAccess(db, actor, organisationId, "content.read");
  const rows = await db.select(columns).from(rigs).leftJoin(users, eq(users.id, rigs.createdByUserId)).where(eq(rigs.organisationId, organisationId)).orderBy(asc(rigs.name));
  return rows.map(withCompliance);
}

/** A row as answered: its compliance report, and its calibration checked against the schema on the way out. */
function withCompliance<T extends { rig: Rig; region: Region; calibration: unknown }>(row: T) {
  return { ...row, calibration: readStoredCalibration(row.calibration), compliance: checkRigCompliance(row.rig, row.region) };
}

/** A rig's organisation, read first so that another organisation's rig answers 404 like a missing one. */
export async function guardRig(db: DbOrTx, actor: Actor, rigId: string, action: "content.read" | "content.update" | "content.delete") {
  if (!isUuid(rigId)) throw notFound("That rig");
  const [row] = await db.select({ organisationId: rigs.organisationId }).from(rigs).where(eq(rigs.id, rigId));
  if (!row) throw notFound("That rig");
  try {
    return { organisationId: row.organisationId, role: await requireAccess(db, actor, row.organisationId, action) };
  } catch (error) {
    if ((error as { code?: string }).code === "not_found") throw notFound("That rig");
    throw error;
  }
}

export async function getRig(db: DbOrTx, actor: Actor, rigId: string) {
  const { organisationId, role } = await guardRig(db, actor, rigId, "content.read");
  const [row] = await db.select(columns).from(rigs).leftJoin(users, eq(users.id, rigs.createdByUserId)).where(eq(rigs.id, rigId));
  return { ...withCompliance(row!), organisationId, role };
}

export async function createRig(db: DbOrTx, actor: Actor, organisationId: string, input: SavedRigInput) {
  await requireAccess(db, actor, organisationId, "content.create");
  return db.transaction(async (tx) => {
    const [{ n } = { n: 0 }] = await tx.select({ n: sql<number>`count(*)::int` }).from(rigs).where(eq(rigs.organisationId, organisationId));
    if (n >= RIGS_PER_ORGANISATION) {
      throw new AppError("conflict", `This organisation keeps ${RIGS_PER_ORGANISATION} rigs, the most allowed. Delete some first.`);
    }
    const [row] = await tx.insert(rigs).values({ organisationId, name: input.name, region: input.region, rig: input.rig, createdByUserId: actor.userId }).returning({ id: rigs.id });
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "rig.created", targetType: "rig", targetId: row!.id, detail: { name: input.name } });
    return row!.id;
  });
}

export async function updateRig(db: DbOrTx, actor: Actor, rigId: string, input: SavedRigInput) {
  const { organisationId } = await guardRig(db, actor, rigId, "content.update");
  await db.transaction(async (tx) => {
    await tx.update(rigs).set({ name: input.name, region: input.region, rig: input.rig, updatedAt: sql`now()` }).where(eq(rigs.id, rigId));
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "rig.updated", targetType: "rig", targetId: rigId, detail: { name: input.name } });
  });
}

export async function deleteRig(db: DbOrTx, actor: Actor, rigId: string) {
  const { organisationId } = await guardRig(db, actor, rigId, "content.delete");
  const usedBy = await plansUsing(db, { rigId });
  if (usedBy.length) throw new AppError("conflict", `This rig is in ${usedBy.length === 1 ? "the plan" : "the plans"} ${usedBy.map((n) => `“${n}”`).join(", ")}. Take it out of ${usedBy.length === 1 ? "that plan" : "those plans"} first.`);
  await db.transaction(async (tx) => {
    const [row] = await tx.delete(rigs).where(eq(rigs.id, rigId)).returning({ name: rigs.name });
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "rig.deleted", targetType: "rig", targetId: rigId, detail: { name: row?.name ?? null } });
  });
}
