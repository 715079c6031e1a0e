import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { completePasswordReset } from "@/lib/server/accounts";
import { passwordResetSchema } from "@/lib/validation/auth";

/** POST /api/account/password-reset/complete { token, password }: sets the new password; all sessions end. */
export const POST = route(async (request) => {
  const { token, password } = await readJson(request, passwordResetSchema, 2048);
  await completePasswordReset(getDb(), token, password);
  return Response.json({ status: "password_changed" });
});
