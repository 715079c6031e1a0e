import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { deleteRig, getRig, updateRig } from "@/lib/server/rigs/rigs-dal";
import { requireSessionUser } from "@/lib/server/session";
import { savedRigInputSchema } from "@/lib/validation/rig";

type Context = { params: Promise<{ rigId: string }> };

/** GET /api/rigs/:id: the rig and its compliance report (members). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { rigId } = await params;
  const { role: _role, ...saved } = await getRig(getDb(), user, rigId);
  return Response.json({ rig: saved });
});

/** PUT /api/rigs/:id { name, region, rig }: replace the rig (planners and owners). */
export const PUT = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { rigId } = await params;
  const input = await readJson(request, savedRigInputSchema, 64 * 1024);
  const db = getDb();
  await updateRig(db, user, rigId, input);
  const { role: _role, ...saved } = await getRig(db, user, rigId);
  return Response.json({ rig: saved });
});

/** DELETE /api/rigs/:id (planners and owners). */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { rigId } = await params;
  await deleteRig(getDb(), user, rigId);
  return new Response(null, { status: 204 });
});
