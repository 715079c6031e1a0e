import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { createPlan, getPlan, listPlans } from "@/lib/server/plans/plans-dal";
import { requireSessionUser } from "@/lib/server/session";
import { planInputSchema } from "@/lib/validation/plan";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id/plans: the organisation's plans (members). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  return Response.json({ plans: await listPlans(getDb(), user, organisationId) });
});

/** POST /api/organisations/:id/plans { name, routeId, conditions…, rigs: [{ rigId, label }] } (planners, owners). */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  const input = await readJson(request, planInputSchema, 32 * 1024);
  const db = getDb();
  const id = await createPlan(db, user, organisationId, input);
  const { role: _role, ...plan } = await getPlan(db, user, id);
  return Response.json({ plan }, { status: 201 });
});
