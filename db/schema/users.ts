import { sql } from "drizzle-orm";
import { check, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { unitSystemEnum } from "./enums";
import { organisations } from "./organisations";

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** Stored lower-cased and trimmed; unique. */
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash").notNull(),
    /** Null until the address is confirmed by a link we mailed to it (or by accepting an invitation). */
    emailVerifiedAt: timestamp("email_verified_at", { withTimezone: true }),
    /** The organisation the user last switched to; membership is re-checked on every request. */
    activeOrganisationId: uuid("active_organisation_id").references(() => organisations.id, {
      onDelete: "set null",
    }),
    /** Bumped by "sign out everywhere": a session token carrying an older value is refused. */
    sessionVersion: integer("session_version").notNull().default(0),
    /** How figures are shown to this user; everything is stored in SI. */
    unitSystem: unitSystemEnum("unit_system").notNull().default("metric"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("users_email_unique").on(t.email),
    index("users_active_organisation_idx").on(t.activeOrganisationId),
    check("users_email_lower", sql`${t.email} = lower(${t.email})`),
  ],
);

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
