import "server-only";
import { asc, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { memberships, organisations, users } from "@/db/schema";
import type { Role } from "@/lib/auth/permissions";
import { recordAudit } from "./audit";
import { requireAccess, type Actor } from "./access";

export interface OrganisationSummary {
  id: string;
  name: string;
  kind: "team" | "personal";
  role: Role;
}

/** The organisations the user belongs to, personal first, then by name. */
export async function listOrganisationsForUser(db: DbOrTx, userId: string): Promise<OrganisationSummary[]> {
  return db
    .select({ id: organisations.id, name: organisations.name, kind: organisations.kind, role: memberships.role })
    .from(memberships)
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
    .where(eq(memberships.userId, userId))
    .orderBy(sql`${organisations.kind} = 'team'`, asc(organisations.name));
}

/**
 * The organisation the user works in now: the one they last switched to while they are still a member of
 * it, else their first one. Null only for a user with no membership at all.
 */
export function pickActiveOrganisation(
  list: OrganisationSummary[],
  activeOrganisationId: string | null,
): OrganisationSummary | null {
  return list.find((o) => o.id === activeOrganisationId) ?? list[0] ?? null;
}

export async function getOrganisation(db: DbOrTx, actor: Actor, organisationId: string) {
  const role = await requireAccess(db, actor, organisationId, "organisation.read");
  const [org] = await db
    .select({ id: organisations.id, name: organisations.name, kind: organisations.kind, createdAt: organisations.createdAt })
    .from(organisations)
    .where(eq(organisations.id, organisationId));
  return { ...org!, role };
}

/** Creates a team organisation owned by the actor and makes it their active one. */
export async function createOrganisation(db: DbOrTx, actor: Actor, name: string) {
  return db.transaction(async (tx) => {
    const [org] = await tx.insert(organisations).values({ name, kind: "team" }).returning({ id: organisations.id });
    await tx.insert(memberships).values({ organisationId: org!.id, userId: actor.userId, role: "owner" });
    await tx.update(users).set({ activeOrganisationId: org!.id }).where(eq(users.id, actor.userId));
    await recordAudit(tx, {
      organisationId: org!.id,
      actorUserId: actor.userId,
      action: "organisation.created",
      targetType: "organisation",
      targetId: org!.id,
      detail: { name },
    });
    return { id: org!.id, name, kind: "team" as const, role: "owner" as const };
  });
}

export async function renameOrganisation(db: DbOrTx, actor: Actor, organisationId: string, name: string) {
  await requireAccess(db, actor, organisationId, "organisation.rename");
  await db.transaction(async (tx) => {
    const [before] = await tx
      .select({ name: organisations.name })
      .from(organisations)
      .where(eq(organisations.id, organisationId))
      .for("update");
    await tx.update(organisations).set({ name, updatedAt: sql`now()` }).where(eq(organisations.id, organisationId));
    await recordAudit(tx, {
      organisationId,
      actorUserId: actor.userId,
      action: "organisation.renamed",
      targetType: "organisation",
      targetId: organisationId,
      detail: { from: before?.name ?? null, to: name },
    });
  });
}

/** Switches the organisation the user works in; they must be a member of it. */
export async function setActiveOrganisation(db: DbOrTx, actor: Actor, organisationId: string) {
  await requireAccess(db, actor, organisationId, "organisation.read");
  await db
    .update(users)
    .set({ activeOrganisationId: organisationId })
    .where(eq(users.id, actor.userId));
}
