import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { changeMemberRole, removeMember } from "@/lib/server/members";
import { requireSessionUser } from "@/lib/server/session";
import { roleChangeSchema } from "@/lib/validation/organisation";

type Context = { params: Promise<{ organisationId: string; userId: string }> };

/** PATCH /api/organisations/:id/members/:userId { role }: change a member's role (owners). */
export const PATCH = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId, userId } = await params;
  const { role } = await readJson(request, roleChangeSchema, 1024);
  await changeMemberRole(getDb(), user, organisationId, userId, role);
  return Response.json({ member: { userId, role } });
});

/** DELETE /api/organisations/:id/members/:userId: remove a member (owners), or leave (your own id). */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId, userId } = await params;
  await removeMember(getDb(), user, organisationId, userId);
  return new Response(null, { status: 204 });
});
