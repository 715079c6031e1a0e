import { date, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { organisations } from "./organisations";
import { rigs } from "./rigs";
import { routes } from "./routes";
import { users } from "./users";

/** How fast the drivers hold descents: Fadeline's standard tiers, a slower set, or one cap for all. */
export const speedPolicyEnum = pgEnum("speed_policy", ["standard", "cautious", "cap"]);
/** How the drivers brake on descents. */
export const drivingStyleEnum = pgEnum("driving_style", ["steady", "snub"]);

/**
 * A plan: a route, the rigs of a convoy, and the conditions of the trip. Routes and rigs a plan uses cannot
 * be deleted while it uses them (nothing a user saved disappears from under a plan).
 */
export const plans = pgTable(
  "plans",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    routeId: uuid("route_id")
      .notNull()
      .references(() => routes.id, { onDelete: "restrict" }),
    tripDate: date("trip_date"),
    ambientC: doublePrecision("ambient_c").notNull(),
    startTempC: doublePrecision("start_temp_c"),
    speedPolicy: speedPolicyEnum("speed_policy").notNull().default("standard"),
    /** With the "cap" policy: the one descent speed, m/s. */
    speedCapMs: doublePrecision("speed_cap_ms"),
    drivingStyle: drivingStyleEnum("driving_style").notNull().default("steady"),
    notes: text("notes").notNull().default(""),
    createdByUserId: uuid("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("plans_organisation_idx").on(t.organisationId, t.updatedAt), index("plans_route_idx").on(t.routeId)],
);

/** A rig in a plan's convoy, with the driver or participant it belongs to. */
export const planRigs = pgTable(
  "plan_rigs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    planId: uuid("plan_id")
      .notNull()
      .references(() => plans.id, { onDelete: "cascade" }),
    rigId: uuid("rig_id")
      .notNull()
      .references(() => rigs.id, { onDelete: "restrict" }),
    label: text("label").notNull(),
    position: integer("position").notNull(),
  },
  (t) => [index("plan_rigs_plan_idx").on(t.planId, t.position), index("plan_rigs_rig_idx").on(t.rigId)],
);

/**
 * The stored result of one heat run: one rig of a plan over its route under its conditions. `inputsHash`
 * covers every input (route profile, rig, conditions, model version), so a result whose inputs changed is
 * never served as current.
 */
export const heatRuns = pgTable(
  "heat_runs",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    planRigId: uuid("plan_rig_id")
      .notNull()
      .references(() => planRigs.id, { onDelete: "cascade" }),
    inputsHash: text("inputs_hash").notNull(),
    modelVersion: text("model_version").notNull(),
    result: jsonb("result").notNull(),
    computedMs: integer("computed_ms").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("heat_runs_inputs_unique").on(t.planRigId, t.inputsHash)],
);

/** A saved what-if of a plan: changed conditions and per-rig settings, with a name. */
export const scenarios = pgTable(
  "scenarios",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    planId: uuid("plan_id")
      .notNull()
      .references(() => plans.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    settings: jsonb("settings").notNull(),
    createdByUserId: uuid("created_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("scenarios_plan_idx").on(t.planId, t.createdAt)],
);

export type PlanRow = typeof plans.$inferSelect;
