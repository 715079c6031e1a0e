import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { calibrateRig, clearRigCalibration } from "@/lib/server/rigs/calibration-dal";
import { requireSessionUser } from "@/lib/server/session";
import { calibrationRequestSchema } from "@/lib/validation/calibration";

type Context = { params: Promise<{ rigId: string }> };

/**
 * POST /api/rigs/:id/calibration { routeId, readings: [{ position, atKm | atM, tempC, minutesAfterStop? }] }:
 * fits the rig's cooling factor and engine-braking scale to infrared readings on one of the organisation's
 * routes (docs/model.md §11; the fit runs in the heat worker) and stores it on the rig: 201 with the stored
 * calibration (planners and owners).
 */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { rigId } = await params;
  const input = await readJson(request, calibrationRequestSchema, 16 * 1024);
  const calibration = await calibrateRig(getDb(), user, rigId, input);
  return Response.json({ calibration }, { status: 201 });
});

/** DELETE /api/rigs/:id/calibration: clears the rig's calibration (planners and owners): 204. */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { rigId } = await params;
  await clearRigCalibration(getDb(), user, rigId);
  return new Response(null, { status: 204 });
});
