import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { signUp } from "@/lib/server/accounts";
import { clientIp } from "@/lib/server/client-ip";
import { signUpSchema } from "@/lib/validation/auth";

/** POST /api/account/sign-up: always 202 with the same body, whether or not the address had an account. */
export const POST = route(async (request) => {
  const input = await readJson(request, signUpSchema, 8 * 1024);
  await signUp(getDb(), input, clientIp(request.headers));
  return Response.json(
    { status: "check_inbox", message: `If ${input.email} can be used, a message with the next step is on its way.` },
    { status: 202 },
  );
});
