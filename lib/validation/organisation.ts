import { z } from "zod";
import { ROLES } from "@/lib/auth/permissions";
import { emailSchema, newPasswordSchema, personNameSchema, tokenSchema } from "./auth";
import { singleLine } from "./text";

export const organisationNameSchema = singleLine({ empty: "Enter a name.", max: 100 });

export const roleSchema = z.enum(ROLES, { error: "Choose owner, planner or viewer." });

export const organisationInputSchema = z.strictObject({ name: organisationNameSchema });
export const invitationInputSchema = z.strictObject({ email: emailSchema, role: roleSchema });
export const roleChangeSchema = z.strictObject({ role: roleSchema });
export const activeOrganisationSchema = z.strictObject({ organisationId: z.uuid("Choose an organisation.") });

export const invitationTokenSchema = z.strictObject({ token: tokenSchema });
export const acceptInvitationSchema = z.strictObject({
  token: tokenSchema,
  /** Present when the invitee has no account yet and creates one while accepting. */
  account: z.strictObject({ name: personNameSchema, password: newPasswordSchema }).optional(),
});
