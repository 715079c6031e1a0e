"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { serverAction } from "@/lib/server/action";
import { renameOrganisation, setActiveOrganisation } from "@/lib/server/organisations";
import { organisationNameSchema } from "@/lib/validation/organisation";
import { eq, sql } from "drizzle-orm";
import { users } from "@/db/schema";
import { UNIT_SYSTEMS } from "@/lib/units";

/** Switch the organisation the signed-in pages show (any member of it). */
export const switchOrganisation = serverAction(
  z.strictObject({ organisationId: z.uuid("Choose an organisation.") }),
  async ({ organisationId }, { user, db }) => {
    await setActiveOrganisation(db, user, organisationId);
    revalidatePath("/", "layout");
    return { organisationId };
  },
);

/** Rename an organisation (owners). */
export const renameOrganisationAction = serverAction(
  z.strictObject({ organisationId: z.uuid("Choose an organisation."), name: organisationNameSchema }),
  async ({ organisationId, name }, { user, db }) => {
    await renameOrganisation(db, user, organisationId, name);
    revalidatePath("/", "layout");
    return { name };
  },
);

/** Show figures in metric or imperial units (the signed-in user's own setting). */
export const setUnitSystemAction = serverAction(
  z.strictObject({ unitSystem: z.enum(UNIT_SYSTEMS as ["metric", "imperial"], { error: "Choose metric or imperial." }) }),
  async ({ unitSystem }, { user, db }) => {
    await db.update(users).set({ unitSystem, updatedAt: sql`now()` }).where(eq(users.id, user.userId));
    revalidatePath("/", "layout");
    return { unitSystem };
  },
);
