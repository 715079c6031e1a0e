import { getDb } from "@/db";
import { route } from "@/lib/http";
import { listMembers } from "@/lib/server/members";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id/members: every member with their role. */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  return Response.json({ members: await listMembers(getDb(), user, organisationId) });
});
