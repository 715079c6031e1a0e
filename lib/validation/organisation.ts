import { z } from "zod";
import { ROLES } from "@/lib/auth/permissions";
import { emailSchema, newPasswordSchema, personNameSchema, tokenSchema } from "./auth";

export const organisationNameSchema = z
  .string({ error: "Enter a name." })
  .trim()
  .min(1, "Enter a name.")
  .max(100, "Use at most 100 characters.")
  .refine((s) => !/[\r\n\u0000]/.test(s), "A name cannot contain line breaks.");

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
