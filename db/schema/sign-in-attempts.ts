import { bigserial, boolean, index, pgTable, text, timestamp } from "drizzle-orm/pg-core";

/**
 * One row per sign-in attempt, kept in PostgreSQL so the limit holds across app instances. `email` is the
 * normalised address typed (it may belong to no account); `ip` is the client address as the app sees it.
 */
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    email: text("email").notNull(),
    ip: text("ip").notNull(),
    succeeded: boolean("succeeded").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("sign_in_attempts_email_idx").on(t.email, t.createdAt),
    index("sign_in_attempts_ip_idx").on(t.ip, t.createdAt),
  ],
);
