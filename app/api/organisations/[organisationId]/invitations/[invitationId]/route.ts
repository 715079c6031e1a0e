import { getDb } from "@/db";
import { route } from "@/lib/http";
import { revokeInvitation } from "@/lib/server/invitations";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ organisationId: string; invitationId: string }> };

/** DELETE /api/organisations/:id/invitations/:invitationId: withdraw a pending invitation (owners). */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId, invitationId } = await params;
  await revokeInvitation(getDb(), user, organisationId, invitationId);
  return new Response(null, { status: 204 });
});
