import "server-only";
import { and, count, eq, gt, lt, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { rateLimitHits, signInAttempts } from "@/db/schema";

/** Failed sign-ins allowed per account and per client address within the window (OWASP ASVS 6.3.1). */
export const SIGN_IN_LIMIT = { failures: 10, windowMinutes: 15 } as const;

const since = (minutes: number) => sql`now() - make_interval(mins => ${minutes})`;

/** Whether this address or this client has used up its failed sign-ins for now. */
export async function signInBlocked(db: DbOrTx, email: string, ip: string): Promise<boolean> {
  const recentFailures = (column: typeof signInAttempts.email | typeof signInAttempts.ip, value: string) =>
    db
      .select({ n: count() })
      .from(signInAttempts)
      .where(
        and(
          eq(column, value),
          eq(signInAttempts.succeeded, false),
          gt(signInAttempts.createdAt, since(SIGN_IN_LIMIT.windowMinutes)),
        ),
      );
  const [[byEmail], [byIp]] = await Promise.all([
    recentFailures(signInAttempts.email, email),
    recentFailures(signInAttempts.ip, ip),
  ]);
  return (byEmail?.n ?? 0) >= SIGN_IN_LIMIT.failures || (byIp?.n ?? 0) >= SIGN_IN_LIMIT.failures;
}

export async function recordSignInAttempt(db: DbOrTx, email: string, ip: string, succeeded: boolean) {
  await db.insert(signInAttempts).values({ email, ip, succeeded });
  // Old rows have no further use; trimming on a small share of writes keeps the table short.
  if (Math.random() < 0.02) await db.delete(signInAttempts).where(lt(signInAttempts.createdAt, since(24 * 60)));
}

/**
 * Counts one event in `bucket` and says whether it is within `limit` per `windowMinutes`. Used for sign-ups
 * per client, mails per recipient and invitations per organisation.
 */
export async function takeRateLimit(
  db: DbOrTx,
  bucket: string,
  limit: number,
  windowMinutes: number,
): Promise<boolean> {
  const [row] = await db
    .select({ n: count() })
    .from(rateLimitHits)
    .where(and(eq(rateLimitHits.bucket, bucket), gt(rateLimitHits.createdAt, since(windowMinutes))));
  if ((row?.n ?? 0) >= limit) return false;
  await db.insert(rateLimitHits).values({ bucket });
  if (Math.random() < 0.02) await db.delete(rateLimitHits).where(lt(rateLimitHits.createdAt, since(24 * 60)));
  return true;
}
