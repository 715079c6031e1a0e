import { pgEnum } from "drizzle-orm/pg-core";

/** Roles inside an organisation, from most to least rights. Mirrored by {@link Role} in lib/auth/permissions. */
export const roleEnum = pgEnum("role", ["owner", "planner", "viewer"]);

/** A team organisation (a tour operator) or the personal one every user gets at sign-up. */
export const organisationKindEnum = pgEnum("organisation_kind", ["team", "personal"]);

/** The units a user reads figures in (see lib/units). */
export const unitSystemEnum = pgEnum("unit_system", ["metric", "imperial"]);
