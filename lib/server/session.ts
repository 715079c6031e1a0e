import "server-only";
import { eq } from "drizzle-orm";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { getDb } from "@/db";
import { users } from "@/db/schema";
import { authOptions } from "@/lib/auth/options";
import { unauthenticated } from "@/lib/errors";
import type { UnitSystem } from "@/lib/units";
import { isUuid, type Actor } from "./access";

export interface SessionUser extends Actor {
  name: string;
  email: string;
  activeOrganisationId: string | null;
  unitSystem: UnitSystem;
}

/**
 * The signed-in user, re-read from the database: a token whose user is gone, or whose session version is
 * older than the user's (after "sign out everywhere" or a password reset), opens no session.
 */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id || !isUuid(id)) return null;
  const [row] = await getDb()
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      activeOrganisationId: users.activeOrganisationId,
      unitSystem: users.unitSystem,
      sessionVersion: users.sessionVersion,
      verified: users.emailVerifiedAt,
    })
    .from(users)
    .where(eq(users.id, id));
  if (!row || !row.verified || row.sessionVersion !== session.user.sessionVersion) return null;
  return { userId: row.userId, name: row.name, email: row.email, activeOrganisationId: row.activeOrganisationId, unitSystem: row.unitSystem };
});

/** For route handlers and server actions: the user, or a 401. */
export async function requireSessionUser(): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) throw unauthenticated();
  return user;
}
