import { sql } from "drizzle-orm";
import { check, customType, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import type { Descent, PlacedWaypoint, RouteProblem, RouteStats, RouteView, TrackSummary } from "../../lib/route";
import { organisations } from "./organisations";
import { users } from "./users";

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

/** Finite: PostgreSQL's double precision accepts NaN and ±Infinity, which must never reach the maths. */
const finite = (column: string) => sql.raw(`${column} > '-Infinity'::float8 and ${column} < 'Infinity'::float8`);

/**
 * An uploaded GPX route of an organisation: the original file, the track chosen from it, and the processed
 * profile (lib/route) with its descents and stats. `profile` packs the profile's typed arrays (see
 * lib/server/routes/profile-codec.ts); `view` is the simplified geometry the browser draws.
 */
export const routes = pgTable(
  "routes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    organisationId: uuid("organisation_id")
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    /** The uploaded file's name, cleaned for display only; files are stored by id, never by this name. */
    fileName: text("file_name").notNull(),
    /** SHA-256 of the uploaded bytes, hex: the same file uploaded again is found, not stored twice. */
    contentSha256: text("content_sha256").notNull(),
    gpx: bytea("gpx").notNull(),
    sizeBytes: integer("size_bytes").notNull(),
    /** Which track or route of the file was modelled ("track:0", "route:1", …). */
    trackId: text("track_id").notNull(),
    tracks: jsonb("tracks").$type<TrackSummary[]>().notNull(),
    pointCount: integer("point_count").notNull(),
    sampleCount: integer("sample_count").notNull(),
    stepM: doublePrecision("step_m").notNull(),
    lengthM: doublePrecision("length_m").notNull(),
    totalAscentM: doublePrecision("total_ascent_m").notNull(),
    totalDescentM: doublePrecision("total_descent_m").notNull(),
    highestM: doublePrecision("highest_m").notNull(),
    lowestM: doublePrecision("lowest_m").notNull(),
    descentCount: integer("descent_count").notNull(),
    /** Steepest grade held over 1 km on any descent (negative), or null without descents. */
    steepestGrade: doublePrecision("steepest_grade"),
    stats: jsonb("stats").$type<RouteStats>().notNull(),
    descents: jsonb("descents").$type<Descent[]>().notNull(),
    warnings: jsonb("warnings").$type<RouteProblem[]>().notNull(),
    /** The file's waypoints, placed along the route where they lie near it (names for stops and advice). */
    waypoints: jsonb("waypoints").$type<PlacedWaypoint[]>().notNull(),
    profile: bytea("profile").notNull(),
    view: jsonb("view").$type<RouteView>().notNull(),
    uploadedByUserId: uuid("uploaded_by_user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("routes_content_unique").on(t.organisationId, t.contentSha256, t.trackId),
    index("routes_organisation_idx").on(t.organisationId, t.createdAt),
    check("routes_length_finite", finite("length_m")),
    check("routes_ascent_finite", finite("total_ascent_m")),
    check("routes_descent_finite", finite("total_descent_m")),
    check("routes_highest_finite", finite("highest_m")),
    check("routes_lowest_finite", finite("lowest_m")),
    check("routes_step_finite", finite("step_m")),
    check("routes_steepest_finite", sql.raw("steepest_grade is null or (steepest_grade > '-Infinity'::float8 and steepest_grade < 'Infinity'::float8)")),
  ],
);

export type RouteRow = typeof routes.$inferSelect;
