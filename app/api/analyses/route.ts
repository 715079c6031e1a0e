import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { runAnalysis } from "@/lib/server/analyses/run-analysis";
import { requireSessionUser } from "@/lib/server/session";
import { analysisRequestSchema } from "@/lib/validation/analysis";
import type { HeatRunOptions } from "@/lib/thermal";

/**
 * POST /api/analyses { routeId | gpx, rigId | rig, options?, detail?, calibration? }: the heat run of a rig over a
 * route with a summary per descent (signed in; saved routes and rigs must be readable by you). The model runs in
 * a worker. A saved rig's calibration is applied unless `calibration` is "ignore".
 */
export const POST = route(async (request) => {
  const user = await requireSessionUser();
  const body = await readJson(request, analysisRequestSchema, 21 * 1024 * 1024);
  const result = await runAnalysis(getDb(), user, {
    route: body.routeId ? { routeId: body.routeId } : { gpx: new TextEncoder().encode(body.gpx!) },
    rig: body.rigId ? { rigId: body.rigId } : { rig: body.rig! },
    options: body.options as HeatRunOptions | undefined,
    detail: body.detail,
    calibration: body.calibration,
  });
  return Response.json({ analysis: result });
});
