import { index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import type { Region } from "../../lib/compliance";
import type { Rig } from "../../lib/thermal";
import type { StoredCalibration } from "../../lib/validation/calibration";
import { organisations } from "./organisations";
import { users } from "./users";

/**
 * A rig of an organisation: tow vehicle, optional trailer and load as the rig JSON schema
 * (lib/validation/rig.ts) describes them, in SI units, and the region whose rules it is checked against.
 * `calibration`, when set, is the rig's cooling factor and engine-braking scale fitted to infrared readings
 * (docs/model.md §11; lib/validation/calibration.ts checks it on the way in and out).
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
    calibration: jsonb("calibration").$type<StoredCalibration>(),
    createdByUserId: uuid("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("rigs_organisation_idx").on(t.organisationId, t.name)],
);

export type RigRow = typeof rigs.$inferSelect;
