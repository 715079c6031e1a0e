import { index, pgTable, primaryKey, timestamp, uuid } from "drizzle-orm/pg-core";
import { roleEnum } from "./enums";
import { organisations } from "./organisations";
import { users } from "./users";

export const memberships = pgTable(
  "memberships",
  {
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.organisationId, t.userId] }), index("memberships_user_idx").on(t.userId)],
);

export type Membership = typeof memberships.$inferSelect;
