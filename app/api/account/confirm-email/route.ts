import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { confirmEmail } from "@/lib/server/accounts";
import { invitationTokenSchema } from "@/lib/validation/organisation";

/** POST /api/account/confirm-email { token }: confirms the address a sign-up link was sent to. */
export const POST = route(async (request) => {
  const { token } = await readJson(request, invitationTokenSchema, 1024);
  const { email } = await confirmEmail(getDb(), token);
  return Response.json({ status: "confirmed", email });
});
