import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { createInvitation, listInvitations } from "@/lib/server/invitations";
import { sendInvitationMail } from "@/lib/server/invitation-mail";
import { requireSessionUser } from "@/lib/server/session";
import { invitationInputSchema } from "@/lib/validation/organisation";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id/invitations: invitations with their status (owners). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  return Response.json({ invitations: await listInvitations(getDb(), user, organisationId) });
});

/**
 * POST /api/organisations/:id/invitations { email, role }: invite someone (owners). 201 with the link, which
 * the owner may also copy; `mailSent` is false when the mail could not be handed to the SMTP server.
 */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  const input = await readJson(request, invitationInputSchema, 2048);
  const created = await createInvitation(getDb(), user, organisationId, input);
  const { link, mailSent } = await sendInvitationMail(created);
  return Response.json({ invitation: created.invitation, link, mailSent }, { status: 201 });
});
