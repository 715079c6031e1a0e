import { getDb } from "@/db";
import { route } from "@/lib/http";
import { requireAccess } from "@/lib/server/access";
import { listAuditEventsByOrganisation } from "@/lib/server/audit";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id/audit-events: who did what, newest first (owners). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  const db = getDb();
  await requireAccess(db, user, organisationId, "audit.read");
  return Response.json({ events: await listAuditEventsByOrganisation(db, { organisationId }) });
});
