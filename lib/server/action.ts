import "server-only";
import type { z } from "zod";
import { getDb, type Db } from "@/db";
import { AppError, type ErrorCode, type FieldErrors } from "@/lib/errors";
import { describeZodError, errorResponse } from "@/lib/http";
import { requireSessionUser, type SessionUser } from "./session";

export type ActionState<T = null> =
  | { ok: true; data: T; at: number }
  | { ok: false; error: { code: ErrorCode; message: string; fields?: FieldErrors }; at: number };

/**
 * Every server action is one call to this: it checks the session, parses the FormData with the schema
 * (field errors come back to the form) and runs the handler, which checks organisation and role itself
 * through the data-access layer. A server action is a public POST endpoint; nothing here trusts the page.
 */
export function serverAction<S extends z.ZodType, T>(
  schema: S,
  handler: (input: z.infer<S>, ctx: { user: SessionUser; db: Db }) => Promise<T>,
) {
  return async (_previous: ActionState<T> | undefined, formData: FormData): Promise<ActionState<T>> => {
    try {
      const user = await requireSessionUser();
      const fields = Object.fromEntries([...formData.entries()].filter(([k]) => !k.startsWith("$ACTION")));
      const parsed = schema.safeParse(fields);
      if (!parsed.success) {
        const { message, fields: errors } = describeZodError(parsed.error);
        throw new AppError("invalid_input", message, errors);
      }
      return { ok: true, data: await handler(parsed.data, { user, db: getDb() }), at: Date.now() };
    } catch (error) {
      const body = (await errorResponse(error).json()) as { error: { code: ErrorCode; message: string; fields?: FieldErrors } };
      return { ok: false, error: body.error, at: Date.now() };
    }
  };
}
