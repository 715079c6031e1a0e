import { getDb } from "@/db";
import { route } from "@/lib/http";
import { deleteScenario } from "@/lib/server/plans/scenarios-dal";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ scenarioId: string }> };

/** DELETE /api/scenarios/:id (planners, owners). */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { scenarioId } = await params;
  await deleteScenario(getDb(), user, scenarioId);
  return new Response(null, { status: 204 });
});
