import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { requestPasswordReset } from "@/lib/server/accounts";
import { emailOnlySchema } from "@/lib/validation/auth";

/** POST /api/account/password-reset { email }: mails a link when the address has an account; 202 either way. */
export const POST = route(async (request) => {
  const { email } = await readJson(request, emailOnlySchema, 1024);
  await requestPasswordReset(getDb(), email);
  return Response.json(
    { status: "check_inbox", message: `If ${email} has an account, a link to choose a new password is on its way.` },
    { status: 202 },
  );
});
