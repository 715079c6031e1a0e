import "server-only";
import { eq } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { users } from "@/db/schema";
import { verifyAgainstDummy, verifyPassword } from "@/lib/auth/password";
import { signInSchema } from "@/lib/validation/auth";
import { recordSignInAttempt, signInBlocked } from "./rate-limit";

/** Error codes that next-auth passes to the sign-in form (`signIn()` returns them as `error`). */
export const SIGN_IN_ERRORS = {
  rateLimited: "RateLimited",
  unconfirmed: "EmailUnconfirmed",
} as const;

export interface SignedInUser {
  id: string;
  name: string;
  email: string;
  sessionVersion: number;
}

/**
 * Checks an e-mail and password for next-auth's credentials provider. Wrong password, unknown address and
 * malformed input all return null, which the form shows as one generic message; an unknown address still
 * costs one bcrypt comparison so timing does not tell them apart. Failures count towards the per-account and
 * per-client limits in PostgreSQL.
 */
export async function checkCredentials(db: DbOrTx, raw: unknown, ip: string): Promise<SignedInUser | null> {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  if (await signInBlocked(db, email, ip)) throw new Error(SIGN_IN_ERRORS.rateLimited);

  const [user] = await db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      passwordHash: users.passwordHash,
      verified: users.emailVerifiedAt,
      sessionVersion: users.sessionVersion,
    })
    .from(users)
    .where(eq(users.email, email));
  const ok = user ? await verifyPassword(password, user.passwordHash) : await verifyAgainstDummy(password);
  await recordSignInAttempt(db, email, ip, ok);
  if (!ok || !user) return null;
  // Only someone who knows the password learns that the address still needs confirming.
  if (!user.verified) throw new Error(SIGN_IN_ERRORS.unconfirmed);
  return { id: user.id, name: user.name, email: user.email, sessionVersion: user.sessionVersion };
}
