import { z } from "zod";
import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { computePlanRuns, planRuns, type PlanRigRun } from "@/lib/server/plans/heat-runs";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ planId: string }> };

const computeSchema = z.object({ planRigIds: z.array(z.string().uuid({ error: "Not a rig of a plan." })).max(50).optional() }).strict();

const status = (runs: PlanRigRun[], withResults: boolean) =>
  runs.map((r) => ({
    planRigId: r.planRigId,
    label: r.label,
    rigName: r.rigName,
    current: r.result !== null,
    computedAt: r.computedAt,
    computedMs: r.computedMs,
    ...(withResults ? { result: r.result } : {}),
  }));

/** GET /api/plans/:id/heat-runs: per rig of the convoy, whether a result for its current inputs is stored. `?results=1` adds them. */
export const GET = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const { runs } = await planRuns(getDb(), user, planId);
  return Response.json({ runs: status(runs, new URL(request.url).searchParams.get("results") === "1") });
});

/** POST /api/plans/:id/heat-runs: run the model and the advice for the rigs whose result is missing or stale (or the `planRigIds` given). */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const { planRigIds } = await readJson(request, computeSchema, 8 * 1024);
  const { computed, runs } = await computePlanRuns(getDb(), user, planId, planRigIds);
  return Response.json({ computed, runs: status(runs, false) });
});
