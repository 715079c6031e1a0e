import { bigserial, index, pgTable, text, timestamp } from "drizzle-orm/pg-core";

/**
 * Counted events for limits other than sign-in (sign-ups per address, mails per recipient, invitations per
 * organisation). `bucket` names the limit and its key, e.g. `sign-up:ip:203.0.113.9`.
 */
export const rateLimitHits = pgTable(
  "rate_limit_hits",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    bucket: text("bucket").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("rate_limit_hits_bucket_idx").on(t.bucket, t.createdAt)],
);
