import "server-only";
import { and, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { memberships } from "@/db/schema";
import { can, type Action, type Role } from "@/lib/auth/permissions";
import { forbidden, notFound } from "@/lib/errors";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Whether a string is a UUID; ids from URLs are checked before they reach a query. */
export function isUuid(value: string): boolean {
  return UUID.test(value);
}

/** The signed-in person, as every data-access function receives them. */
export interface Actor {
  userId: string;
}

/** The caller's role in an organisation, read from the database (never from the session), or null. */
export async function getRole(db: DbOrTx, userId: string, organisationId: string): Promise<Role | null> {
  if (!isUuid(organisationId) || !isUuid(userId)) return null;
  const [row] = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.organisationId, organisationId)))
    .limit(1);
  return row?.role ?? null;
}

/**
 * The one gate of the data-access layer. Not a member → 404 (another organisation's records do not visibly
 * exist); a member whose role does not allow the action → 403.
 */
export async function requireAccess(
  db: DbOrTx,
  actor: Actor,
  organisationId: string,
  action: Action,
): Promise<Role> {
  const role = await getRole(db, actor.userId, organisationId);
  if (!role) throw notFound("That organisation");
  if (!can(role, action)) throw forbidden();
  return role;
}
