import { index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import type { Region } from "../../lib/compliance";
import type { Rig } from "../../lib/thermal";
import { organisations } from "./organisations";
import { users } from "./users";

/**
 * A rig of an organisation: tow vehicle, optional trailer and load as the rig JSON schema
 * (lib/validation/rig.ts) describes them, in SI units, and the region whose rules it is checked against.
 */
export const rigs = pgTable(
  "rigs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    region: text("region").$type<Region>().notNull(),
    rig: jsonb("rig").$type<Rig>().notNull(),
    createdByUserId: uuid("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("rigs_organisation_idx").on(t.organisationId, t.name)],
);

export type RigRow = typeof rigs.$inferSelect;
