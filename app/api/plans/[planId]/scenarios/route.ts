import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { createScenario, listScenarios } from "@/lib/server/plans/scenarios-dal";
import { requireSessionUser } from "@/lib/server/session";
import { scenarioInputSchema } from "@/lib/validation/plan";

type Context = { params: Promise<{ planId: string }> };

/** GET /api/plans/:id/scenarios: the plan's saved what-ifs, newest first. */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  return Response.json({ scenarios: await listScenarios(getDb(), user, planId) });
});

/** POST /api/plans/:id/scenarios: save a what-if under a name (planners, owners). */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const input = await readJson(request, scenarioInputSchema, 16 * 1024);
  const db = getDb();
  const id = await createScenario(db, user, planId, input);
  const scenario = (await listScenarios(db, user, planId)).find((s) => s.id === id);
  return Response.json({ scenario }, { status: 201 });
});
