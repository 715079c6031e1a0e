import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { createRig, getRig, listRigs } from "@/lib/server/rigs/rigs-dal";
import { requireSessionUser } from "@/lib/server/session";
import { savedRigInputSchema } from "@/lib/validation/rig";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id/rigs: the organisation's rigs with their compliance reports (members). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  return Response.json({ rigs: await listRigs(getDb(), user, organisationId) });
});

/** POST /api/organisations/:id/rigs { name, region, rig }: save a rig (planners and owners). */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  const input = await readJson(request, savedRigInputSchema, 64 * 1024);
  const db = getDb();
  const id = await createRig(db, user, organisationId, input);
  const { role: _role, ...saved } = await getRig(db, user, id);
  return Response.json({ rig: saved }, { status: 201 });
});
