import { eq } from "drizzle-orm";
import { getDb } from "@/db";
import { users } from "@/db/schema";
import { readJson, route } from "@/lib/http";
import { findInvitationByToken, unusableInvitation } from "@/lib/server/invitations";
import { invitationTokenSchema } from "@/lib/validation/organisation";

/**
 * POST /api/invitations/preview { token }: what a link invites to, for the accept page. Open to the token
 * holder without a session (the token travels in the body, not the URL, to stay out of logs).
 */
export const POST = route(async (request) => {
  const { token } = await readJson(request, invitationTokenSchema, 1024);
  const db = getDb();
  const invitation = await findInvitationByToken(db, token);
  if (!invitation) throw unusableInvitation("unknown");
  if (invitation.status !== "pending") throw unusableInvitation(invitation.status);
  const [account] = await db.select({ id: users.id, verified: users.emailVerifiedAt }).from(users).where(eq(users.email, invitation.email));
  return Response.json({
    invitation: {
      organisationName: invitation.organisationName,
      role: invitation.role,
      email: invitation.email,
      invitedByName: invitation.invitedByName,
      expiresAt: invitation.expiresAt,
      // The holder of a link mailed to this address may learn whether the address has an account.
      accountExists: Boolean(account?.verified),
    },
  });
});
