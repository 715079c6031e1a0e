import { getDb } from "@/db";
import { route } from "@/lib/http";
import { endAllSessions } from "@/lib/server/accounts";
import { requireSessionUser } from "@/lib/server/session";

/** DELETE /api/account/sessions: signs the user out on every device, this one included. */
export const DELETE = route(async () => {
  const user = await requireSessionUser();
  await endAllSessions(getDb(), user.userId);
  return new Response(null, { status: 204 });
});
