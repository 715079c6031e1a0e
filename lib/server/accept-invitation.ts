import "server-only";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { invitations, memberships, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";
import { createUserWithPersonalOrganisation, isUniqueViolation } from "./accounts";
import { recordAudit } from "./audit";
import { findInvitationByToken, unusableInvitation } from "./invitations";

/**
 * Claims the invitation in one statement (single use even under a double click), adds the membership with
 * the role stored on the invitation (never one sent by the client) and makes it the user's active one.
 */
async function claim(tx: DbOrTx, token: string, userId: string) {
  const invitation = await findInvitationByToken(tx, token);
  if (!invitation) throw unusableInvitation("unknown");
  if (invitation.status !== "pending") throw unusableInvitation(invitation.status);
  const [claimed] = await tx
    .update(invitations)
    .set({ acceptedAt: sql`now()`, acceptedByUserId: userId })
    .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, sql`now()`)))
    .returning({ id: invitations.id });
  if (!claimed) throw unusableInvitation("accepted");
  await tx
    .insert(memberships)
    .values({ organisationId: invitation.organisationId, userId, role: invitation.role })
    .onConflictDoNothing();
  await tx.update(users).set({ activeOrganisationId: invitation.organisationId }).where(eq(users.id, userId));
  await recordAudit(tx, {
    organisationId: invitation.organisationId,
    actorUserId: userId,
    action: "invitation.accepted",
    targetType: "invitation",
    targetId: invitation.id,
    detail: { email: invitation.email, role: invitation.role },
  });
  return { organisationId: invitation.organisationId, organisationName: invitation.organisationName, role: invitation.role };
}

/** A signed-in user accepts; the invitation is bound to the address it was sent to. */
export async function acceptInvitationAsUser(db: DbOrTx, user: { userId: string; email: string }, token: string) {
  return db.transaction(async (tx) => {
    const invitation = await findInvitationByToken(tx, token);
    if (invitation && invitation.email !== user.email) {
      throw new AppError(
        "forbidden",
        `This invitation was sent to ${invitation.email}. Sign out, then sign in or sign up with that address.`,
      );
    }
    return claim(tx, token, user.userId);
  });
}

/**
 * The invitee's account: a new one, or one that was started by sign-up but never confirmed (the invitation
 * link proves the address, so it is confirmed now with the name and password just chosen).
 */
async function accountForInvitee(tx: DbOrTx, email: string, name: string, passwordHash: string) {
  const [existing] = await tx
    .select({ id: users.id, verified: users.emailVerifiedAt })
    .from(users)
    .where(eq(users.email, email))
    .for("update");
  if (existing?.verified) throw new AppError("conflict", `${email} already has an account. Sign in to accept the invitation.`);
  if (existing) {
    await tx
      .update(users)
      .set({ name, passwordHash, emailVerifiedAt: sql`now()`, updatedAt: sql`now()` })
      .where(eq(users.id, existing.id));
    return existing.id;
  }
  const created = await createUserWithPersonalOrganisation(tx, { name, email, passwordHash, verified: true });
  return created.userId;
}

/**
 * Someone new accepts: the link reached their inbox, which proves the address, so the account is created
 * confirmed, with its personal organisation, and joins the inviting one.
 */
export async function acceptInvitationWithNewAccount(
  db: DbOrTx,
  token: string,
  input: { name: string; password: string },
) {
  const invitation = await findInvitationByToken(db, token);
  if (!invitation) throw unusableInvitation("unknown");
  if (invitation.status !== "pending") throw unusableInvitation(invitation.status);
  const passwordHash = await hashPassword(input.password);
  try {
    return await db.transaction(async (tx) => {
      const userId = await accountForInvitee(tx, invitation.email, input.name, passwordHash);
      return { ...(await claim(tx, token, userId)), email: invitation.email };
    });
  } catch (error) {
    if (!isUniqueViolation(error)) throw error;
    throw new AppError("conflict", `${invitation.email} already has an account. Sign in to accept the invitation.`);
  }
}
