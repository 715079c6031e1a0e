import { z } from "zod";
import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { deleteRoute, getRoute, renameRoute } from "@/lib/server/routes/routes-dal";
import { requireSessionUser } from "@/lib/server/session";
import { singleLine } from "@/lib/validation/text";

type Context = { params: Promise<{ routeId: string }> };

/** GET /api/routes/:id: the route with its map view, descents, stats and waypoints (members). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { routeId } = await params;
  const { role: _role, ...found } = await getRoute(getDb(), user, routeId);
  return Response.json({ route: found });
});

const renameSchema = z.strictObject({ name: singleLine({ empty: "Enter a name.", max: 120 }) });

/** PATCH /api/routes/:id { name }: rename (planners and owners). */
export const PATCH = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { routeId } = await params;
  const { name } = await readJson(request, renameSchema, 2048);
  await renameRoute(getDb(), user, routeId, name);
  return Response.json({ route: { id: routeId, name } });
});

/** DELETE /api/routes/:id: delete the route and its file (planners and owners). */
export const DELETE = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { routeId } = await params;
  await deleteRoute(getDb(), user, routeId);
  return new Response(null, { status: 204 });
});
