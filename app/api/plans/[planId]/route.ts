import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { deletePlan, getPlan, updatePlan } from "@/lib/server/plans/plans-dal";
import { requireSessionUser } from "@/lib/server/session";
import { planInputSchema } from "@/lib/validation/plan";

type Context = { params: Promise<{ planId: string }> };

/** GET /api/plans/:id: the plan, its conditions and its convoy (members). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const { role: _role, ...plan } = await getPlan(getDb(), user, planId);
  return Response.json({ plan });
});

/** PUT /api/plans/:id: replace the plan's fields and convoy (planners, owners). */
export const PUT = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const input = await readJson(request, planInputSchema, 32 * 1024);
  const db = getDb();
  await updatePlan(db, user, planId, input);
  const { role: _role, ...plan } = await getPlan(db, user, planId);
  return Response.json({ plan });
});

/** DELETE /api/plans/:id (planners, owners). */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  await deletePlan(getDb(), user, planId);
  return new Response(null, { status: 204 });
});
