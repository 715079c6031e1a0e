import "server-only";
import { notFound } from "next/navigation";
import { getDb } from "@/db";
import { AppError } from "@/lib/errors";
import { planRuns } from "@/lib/server/plans/heat-runs";
import { listScenarios } from "@/lib/server/plans/scenarios-dal";
import { getRoute } from "@/lib/server/routes/routes-dal";
import { requireWorkContext } from "@/lib/server/work-context";

/** Everything the plan pages show: the plan with its convoy runs, its route and its scenarios (404 when unseen). */
export async function loadPlan(planId: string, path: string) {
  const { user } = await requireWorkContext(path);
  const db = getDb();
  try {
    const { plan, runs } = await planRuns(db, user, planId);
    const [route, scenarios] = await Promise.all([getRoute(db, user, plan.routeId), listScenarios(db, user, planId)]);
    return { user, plan, runs, route, scenarios };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
