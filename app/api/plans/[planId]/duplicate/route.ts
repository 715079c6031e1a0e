import { getDb } from "@/db";
import { route } from "@/lib/http";
import { duplicatePlan, getPlan } from "@/lib/server/plans/plans-dal";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ planId: string }> };

/** POST /api/plans/:id/duplicate: a copy of the plan and its convoy (planners, owners). */
export const POST = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const db = getDb();
  const id = await duplicatePlan(db, user, planId);
  const { role: _role, ...plan } = await getPlan(db, user, id);
  return Response.json({ plan }, { status: 201 });
});
