import "server-only";
import { and, asc, count, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { memberships, users } from "@/db/schema";
import type { Role } from "@/lib/auth/permissions";
import { AppError, notFound } from "@/lib/errors";
import { recordAudit } from "./audit";
import { isUuid, requireAccess, type Actor } from "./access";

export interface MemberRow {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: Date;
}

/** Members of an organisation (explicit columns: never the password hash). */
export async function listMembers(db: DbOrTx, actor: Actor, organisationId: string): Promise<MemberRow[]> {
  await requireAccess(db, actor, organisationId, "member.read");
  return db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organisationId, organisationId))
    .orderBy(asc(users.name));
}

/**
 * Locks the organisation's owner rows and the target's row for the rest of the transaction, so two owners
 * demoting each other at once cannot leave the organisation with none.
 */
async function lockForOwnerChange(tx: DbOrTx, organisationId: string, userId: string) {
  const owners = await tx
    .select({ userId: memberships.userId })
    .from(memberships)
    .where(and(eq(memberships.organisationId, organisationId), eq(memberships.role, "owner")))
    .for("update");
  const [target] = await tx
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)))
    .for("update");
  if (!target) throw notFound("That member");
  return { ownerCount: owners.length, targetRole: target.role };
}

const LAST_OWNER = "An organisation needs at least one owner. Make someone else an owner first.";

export async function changeMemberRole(
  db: DbOrTx,
  actor: Actor,
  organisationId: string,
  userId: string,
  role: Role,
): Promise<void> {
  await requireAccess(db, actor, organisationId, "member.change_role");
  if (!isUuid(userId)) throw notFound("That member");
  await db.transaction(async (tx) => {
    const { ownerCount, targetRole } = await lockForOwnerChange(tx, organisationId, userId);
    if (targetRole === role) return;
    if (targetRole === "owner" && ownerCount <= 1) throw new AppError("conflict", LAST_OWNER);
    await tx
      .update(memberships)
      .set({ role, updatedAt: sql`now()` })
      .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
    await recordAudit(tx, {
      organisationId,
      actorUserId: actor.userId,
      action: "member.role_changed",
      targetType: "member",
      targetId: userId,
      detail: { from: targetRole, to: role },
    });
  });
}

/** Removes a member (an owner's action) or lets a member leave (anyone, for themselves). */
export async function removeMember(db: DbOrTx, actor: Actor, organisationId: string, userId: string) {
  const leaving = actor.userId === userId;
  await requireAccess(db, actor, organisationId, leaving ? "organisation.read" : "member.remove");
  if (!isUuid(userId)) throw notFound("That member");
  await db.transaction(async (tx) => {
    const { ownerCount, targetRole } = await lockForOwnerChange(tx, organisationId, userId);
    if (targetRole === "owner" && ownerCount <= 1) throw new AppError("conflict", LAST_OWNER);
    if (leaving && (await countMemberships(tx, userId)) <= 1) {
      throw new AppError("conflict", "This is your only organisation, so you cannot leave it.");
    }
    await tx
      .delete(memberships)
      .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
    // The removed person's active organisation falls back to another one at their next request.
    await tx
      .update(users)
      .set({ activeOrganisationId: null })
      .where(and(eq(users.id, userId), eq(users.activeOrganisationId, organisationId)));
    await recordAudit(tx, {
      organisationId,
      actorUserId: actor.userId,
      action: leaving ? "member.left" : "member.removed",
      targetType: "member",
      targetId: userId,
      detail: { role: targetRole },
    });
  });
}

async function countMemberships(tx: DbOrTx, userId: string): Promise<number> {
  const [row] = await tx.select({ n: count() }).from(memberships).where(eq(memberships.userId, userId));
  return row?.n ?? 0;
}

/** Whether the address belongs to a member already (an owner inviting them again is told so). */
export async function isMemberByEmail(db: DbOrTx, organisationId: string, email: string): Promise<boolean> {
  const [row] = await db
    .select({ id: users.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.organisationId, organisationId), eq(users.email, email)))
    .limit(1);
  return Boolean(row);
}
