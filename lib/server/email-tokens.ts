import "server-only";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { emailTokens } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { hashToken, newToken } from "./tokens";

export type EmailTokenPurpose = "confirm_email" | "reset_password";

const LIFETIME_MINUTES: Record<EmailTokenPurpose, number> = { confirm_email: 24 * 60, reset_password: 60 };

/** Stores a new single-use token for the user and returns the plain token for the mailed link. */
export async function issueEmailToken(db: DbOrTx, userId: string, purpose: EmailTokenPurpose): Promise<string> {
  const { token, hash } = newToken();
  await db.insert(emailTokens).values({
    userId,
    purpose,
    tokenHash: hash,
    expiresAt: sql`now() + make_interval(mins => ${LIFETIME_MINUTES[purpose]})`,
  });
  return token;
}

/**
 * Marks a token used and returns its user, in one statement so that two clicks cannot both succeed.
 * Unknown, used and expired tokens all get the same answer: the holder learns nothing more.
 */
export async function consumeEmailToken(db: DbOrTx, token: string, purpose: EmailTokenPurpose): Promise<string> {
  const [row] = await db
    .update(emailTokens)
    .set({ usedAt: sql`now()` })
    .where(
      and(
        eq(emailTokens.tokenHash, hashToken(token)),
        eq(emailTokens.purpose, purpose),
        isNull(emailTokens.usedAt),
        gt(emailTokens.expiresAt, sql`now()`),
      ),
    )
    .returning({ userId: emailTokens.userId });
  if (!row) {
    throw new AppError("gone", "This link has expired or was already used. Ask for a new one.");
  }
  return row.userId;
}
