import "server-only";
import { eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { memberships, organisations, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { AppError } from "@/lib/errors";
import type { SignUpInput } from "@/lib/validation/auth";
import { recordAudit } from "./audit";
import { consumeEmailToken, issueEmailToken } from "./email-tokens";
import { appUrl, sendMail } from "./mail";
import { accountExistsMail, confirmEmailMail, resetPasswordMail } from "./mail-templates";
import { takeRateLimit } from "./rate-limit";

/** Mails about one account, at most this many per hour, so the forms cannot be used to flood an inbox. */
const MAILS_PER_ADDRESS_PER_HOUR = 5;
const SIGN_UPS_PER_CLIENT_PER_HOUR = 20;

/** The organisation every new user owns, for their own rigs and plans. */
export function personalOrganisationName(name: string): string {
  return `${name} (personal)`.slice(0, 100);
}

/**
 * Creates a user who owns a new personal organisation, inside the caller's transaction. `verified` is true
 * when the address is already proven (an invitation link reached it).
 */
export async function createUserWithPersonalOrganisation(
  tx: DbOrTx,
  input: { name: string; email: string; passwordHash: string; verified: boolean },
): Promise<{ userId: string; organisationId: string }> {
  const [org] = await tx
    .insert(organisations)
    .values({ name: personalOrganisationName(input.name), kind: "personal" })
    .returning({ id: organisations.id });
  const [user] = await tx
    .insert(users)
    .values({
      name: input.name,
      email: input.email,
      passwordHash: input.passwordHash,
      activeOrganisationId: org!.id,
      emailVerifiedAt: input.verified ? sql`now()` : null,
    })
    .returning({ id: users.id });
  await tx.insert(memberships).values({ organisationId: org!.id, userId: user!.id, role: "owner" });
  await recordAudit(tx, {
    organisationId: org!.id,
    actorUserId: user!.id,
    action: "organisation.created",
    targetType: "organisation",
    targetId: org!.id,
    detail: { kind: "personal" },
  });
  return { userId: user!.id, organisationId: org!.id };
}

async function mailAllowed(db: DbOrTx, email: string): Promise<boolean> {
  return takeRateLimit(db, `mail:${email}`, MAILS_PER_ADDRESS_PER_HOUR, 60);
}

/**
 * Sign-up. The answer is the same whether or not the address already has an account (OWASP Authentication
 * Cheat Sheet): a new or unconfirmed account gets a confirmation link, a confirmed one gets a notice.
 */
export async function signUp(db: DbOrTx, input: SignUpInput, ip: string): Promise<void> {
  if (!(await takeRateLimit(db, `sign-up:ip:${ip}`, SIGN_UPS_PER_CLIENT_PER_HOUR, 60))) {
    throw new AppError("rate_limited", "Too many sign-ups from this network. Try again in an hour.");
  }
  const passwordHash = await hashPassword(input.password);
  const [existing] = await db
    .select({ id: users.id, verified: users.emailVerifiedAt })
    .from(users)
    .where(eq(users.email, input.email));
  if (existing?.verified) {
    if (await mailAllowed(db, input.email)) {
      await sendMail(
        accountExistsMail({ to: input.email, signInLink: appUrl("/sign-in"), resetLink: appUrl("/reset-password") }),
      );
    }
    return;
  }
  const userId = existing
    ? await refreshUnconfirmed(db, existing.id, input.name, passwordHash)
    : await createUnconfirmed(db, input, passwordHash);
  if (!userId) return;
  if (!(await mailAllowed(db, input.email))) return;
  const token = await issueEmailToken(db, userId, "confirm_email");
  await sendMail(confirmEmailMail({ to: input.email, name: input.name, link: appUrl(`/confirm-email?token=${token}`) }));
}

/** A new, unconfirmed account; null when a parallel sign-up with the same address won the race. */
async function createUnconfirmed(db: DbOrTx, input: SignUpInput, passwordHash: string): Promise<string | null> {
  try {
    return await db.transaction(async (tx) => {
      const created = await createUserWithPersonalOrganisation(tx, { ...input, passwordHash, verified: false });
      return created.userId;
    });
  } catch (error) {
    if (isUniqueViolation(error)) return null;
    throw error;
  }
}

/** PostgreSQL's unique_violation (SQLSTATE 23505), as node-postgres or Drizzle report it. */
export function isUniqueViolation(error: unknown): boolean {
  const code = (error as { code?: string })?.code ?? (error as { cause?: { code?: string } })?.cause?.code;
  return code === "23505";
}

/** Someone signing up again before confirming chooses the name and password anew. */
async function refreshUnconfirmed(db: DbOrTx, userId: string, name: string, passwordHash: string) {
  await db.update(users).set({ name, passwordHash, updatedAt: sql`now()` }).where(eq(users.id, userId));
  return userId;
}

/** Confirms an address from its mailed link. */
export async function confirmEmail(db: DbOrTx, token: string): Promise<{ email: string }> {
  return db.transaction(async (tx) => {
    const userId = await consumeEmailToken(tx, token, "confirm_email");
    const [user] = await tx
      .update(users)
      .set({ emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())` })
      .where(eq(users.id, userId))
      .returning({ email: users.email });
    return { email: user!.email };
  });
}

/** Mails a new-password link when the address has an account; answers the same either way. */
export async function requestPasswordReset(db: DbOrTx, email: string): Promise<void> {
  const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  if (!user || !(await mailAllowed(db, email))) return;
  const token = await issueEmailToken(db, user.id, "reset_password");
  await sendMail(resetPasswordMail({ to: email, link: appUrl(`/reset-password?token=${token}`) }));
}

/** Sets a new password from a reset link; every existing session of the user ends. */
export async function completePasswordReset(db: DbOrTx, token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password);
  await db.transaction(async (tx) => {
    const userId = await consumeEmailToken(tx, token, "reset_password");
    await tx
      .update(users)
      .set({
        passwordHash,
        sessionVersion: sql`${users.sessionVersion} + 1`,
        emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, now())`,
        updatedAt: sql`now()`,
      })
      .where(eq(users.id, userId));
  });
}

/** "Sign out everywhere": tokens issued before this no longer open a session. */
export async function endAllSessions(db: DbOrTx, userId: string): Promise<void> {
  await db
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
}
