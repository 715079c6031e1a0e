import { z } from "zod";
import { isCommonPassword } from "@/lib/auth/common-passwords";
import { singleLine } from "./text";

/** A trimmed, lower-cased address in the form zod's e-mail check accepts (no quoted local parts). */
export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, "Enter your e-mail address.")
  .max(254, "An e-mail address has at most 254 characters.")
  .pipe(z.email({ message: "Enter a valid e-mail address, like name@example.com." }));

export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 128;

/**
 * OWASP ASVS 5.0 §6.2 and the OWASP Authentication Cheat Sheet: a long minimum, a generous maximum, any
 * characters (spaces and emoji included), no composition rules, and no common passwords.
 */
export const newPasswordSchema = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters; a short phrase is easiest to remember.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`)
  .refine((p) => !isCommonPassword(p), "That password is on the list of the most common ones. Choose another.");

export const personNameSchema = singleLine({ empty: "Enter your name.", max: 80 });

export const signUpSchema = z.strictObject({
  name: personNameSchema,
  email: emailSchema,
  password: newPasswordSchema,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

/** Sign-in checks only shape and size; the rules above apply when a password is chosen. */
export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password.").max(1024, "That password is too long."),
});

export const tokenSchema = z
  .string()
  .regex(/^[A-Za-z0-9_-]{43}$/, "This link is not valid. Check that you copied all of it.");

export const emailOnlySchema = z.strictObject({ email: emailSchema });
export const passwordResetSchema = z.strictObject({ token: tokenSchema, password: newPasswordSchema });
