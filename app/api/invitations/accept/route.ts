import { getDb } from "@/db";
import { AppError } from "@/lib/errors";
import { readJson, route } from "@/lib/http";
import { acceptInvitationAsUser, acceptInvitationWithNewAccount } from "@/lib/server/accept-invitation";
import { getSessionUser } from "@/lib/server/session";
import { acceptInvitationSchema } from "@/lib/validation/organisation";

/**
 * POST /api/invitations/accept { token, account? }: signed in, joins as yourself (the invitation must be for
 * your address); signed out, `account: { name, password }` creates your account and joins.
 */
export const POST = route(async (request) => {
  const { token, account } = await readJson(request, acceptInvitationSchema, 2048);
  const user = await getSessionUser();
  const db = getDb();
  if (user) return Response.json({ joined: await acceptInvitationAsUser(db, user, token) });
  if (!account) throw new AppError("unauthenticated", "Sign in, or choose a name and password, to accept.");
  return Response.json({ joined: await acceptInvitationWithNewAccount(db, token, account) }, { status: 201 });
});
