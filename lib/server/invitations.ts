import "server-only";
import { and, desc, eq, gt, isNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { invitations, organisations, users } from "@/db/schema";
import type { Role } from "@/lib/auth/permissions";
import { AppError, notFound } from "@/lib/errors";
import { recordAudit } from "./audit";
import { isUuid, requireAccess, type Actor } from "./access";
import { isMemberByEmail } from "./members";
import { hashToken, newToken } from "./tokens";

/** An invitation link works for 7 days. */
export const INVITATION_LIFETIME_DAYS = 7;
/** Invitations one organisation may send per day (stops the app being used to send spam). */
export const INVITATIONS_PER_DAY = 50;

export type InvitationStatus = "pending" | "accepted" | "revoked" | "expired";

export interface InvitationRow {
  id: string;
  email: string;
  role: Role;
  status: InvitationStatus;
  createdAt: Date;
  expiresAt: Date;
  invitedByName: string | null;
}

function statusOf(row: { acceptedAt: Date | null; revokedAt: Date | null; expiresAt: Date }): InvitationStatus {
  if (row.acceptedAt) return "accepted";
  if (row.revokedAt) return "revoked";
  return row.expiresAt.getTime() <= Date.now() ? "expired" : "pending";
}

const columns = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  createdAt: invitations.createdAt,
  expiresAt: invitations.expiresAt,
  acceptedAt: invitations.acceptedAt,
  revokedAt: invitations.revokedAt,
  invitedByName: users.name,
};

/** The organisation's invitations, newest first, with their status. */
export async function listInvitations(db: DbOrTx, actor: Actor, organisationId: string): Promise<InvitationRow[]> {
  await requireAccess(db, actor, organisationId, "invitation.read");
  const rows = await db
    .select(columns)
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedByUserId))
    .where(eq(invitations.organisationId, organisationId))
    .orderBy(desc(invitations.createdAt))
    .limit(200);
  return rows.map(({ acceptedAt, revokedAt, ...r }) => ({ ...r, status: statusOf({ acceptedAt, revokedAt, expiresAt: r.expiresAt }) }));
}

export interface CreatedInvitation {
  invitation: InvitationRow;
  /** The plain token, only ever returned here: it goes into the mail and the owner's copy-link button. */
  token: string;
  organisationName: string;
  inviterName: string;
}

/**
 * An owner invites an address with a role. An earlier pending invitation to the same address is withdrawn,
 * so only the newest link works. The mail is sent by the caller after this commits.
 */
export async function createInvitation(
  db: DbOrTx,
  actor: Actor,
  organisationId: string,
  input: { email: string; role: Role },
): Promise<CreatedInvitation> {
  await requireAccess(db, actor, organisationId, "invitation.create");
  if (await isMemberByEmail(db, organisationId, input.email)) {
    throw new AppError("conflict", `${input.email} is already a member of this organisation.`, {
      email: ["Already a member."],
    });
  }
  const { token, hash } = newToken();
  return db.transaction(async (tx) => {
    const [{ sent } = { sent: 0 }] = await tx
      .select({ sent: sql<number>`count(*)::int` })
      .from(invitations)
      .where(and(eq(invitations.organisationId, organisationId), gt(invitations.createdAt, sql`now() - interval '1 day'`)));
    if (sent >= INVITATIONS_PER_DAY) {
      throw new AppError("rate_limited", `This organisation has sent ${INVITATIONS_PER_DAY} invitations today. Try again tomorrow.`);
    }
    await tx
      .update(invitations)
      .set({ revokedAt: sql`now()` })
      .where(and(eq(invitations.organisationId, organisationId), eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    const [row] = await tx
      .insert(invitations)
      .values({
        organisationId,
        email: input.email,
        role: input.role,
        tokenHash: hash,
        invitedByUserId: actor.userId,
        expiresAt: sql`now() + make_interval(days => ${INVITATION_LIFETIME_DAYS})`,
      })
      .returning({ id: invitations.id, createdAt: invitations.createdAt, expiresAt: invitations.expiresAt });
    await recordAudit(tx, {
      organisationId,
      actorUserId: actor.userId,
      action: "invitation.created",
      targetType: "invitation",
      targetId: row!.id,
      detail: { email: input.email, role: input.role },
    });
    const [names] = await tx
      .select({ organisationName: organisations.name, inviterName: users.name })
      .from(organisations)
      .innerJoin(users, eq(users.id, actor.userId))
      .where(eq(organisations.id, organisationId));
    return {
      invitation: { ...row!, email: input.email, role: input.role, status: "pending", invitedByName: names!.inviterName },
      token,
      organisationName: names!.organisationName,
      inviterName: names!.inviterName,
    };
  });
}

export async function revokeInvitation(db: DbOrTx, actor: Actor, organisationId: string, invitationId: string) {
  await requireAccess(db, actor, organisationId, "invitation.revoke");
  if (!isUuid(invitationId)) throw notFound("That invitation");
  await db.transaction(async (tx) => {
    const [row] = await tx
      .update(invitations)
      .set({ revokedAt: sql`now()` })
      .where(and(eq(invitations.id, invitationId), eq(invitations.organisationId, organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
      .returning({ id: invitations.id, email: invitations.email });
    if (!row) throw notFound("A pending invitation with that id");
    await recordAudit(tx, {
      organisationId,
      actorUserId: actor.userId,
      action: "invitation.revoked",
      targetType: "invitation",
      targetId: row.id,
      detail: { email: row.email },
    });
  });
}

/** The invitation a token opens, with the reason it cannot be used when it cannot. */
export async function findInvitationByToken(db: DbOrTx, token: string) {
  const [row] = await db
    .select({
      ...columns,
      organisationId: invitations.organisationId,
      organisationName: organisations.name,
    })
    .from(invitations)
    .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
    .leftJoin(users, eq(users.id, invitations.invitedByUserId))
    .where(eq(invitations.tokenHash, hashToken(token)));
  if (!row) return null;
  return { ...row, status: statusOf(row) };
}

/** The message for a link that no longer works. */
export function unusableInvitation(status: Exclude<InvitationStatus, "pending"> | "unknown"): AppError {
  switch (status) {
    case "unknown":
      return new AppError("not_found", "This invitation link is not valid. Check that you copied all of it.");
    case "accepted":
      return new AppError("gone", "This invitation has already been used. Sign in to reach the organisation.");
    case "revoked":
      return new AppError("gone", "This invitation was withdrawn. Ask the organisation's owner for a new one.");
    case "expired":
      return new AppError("gone", "This invitation has expired. Ask the organisation's owner for a new one.");
  }
}
