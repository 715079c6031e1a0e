import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { getOrganisation, renameOrganisation } from "@/lib/server/organisations";
import { requireSessionUser } from "@/lib/server/session";
import { organisationInputSchema } from "@/lib/validation/organisation";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id: name, kind and your role (404 unless you are a member). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  return Response.json({ organisation: await getOrganisation(getDb(), user, organisationId) });
});

/** PATCH /api/organisations/:id { name }: rename (owners). */
export const PATCH = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  const { name } = await readJson(request, organisationInputSchema, 2048);
  await renameOrganisation(getDb(), user, organisationId, name);
  return Response.json({ organisation: await getOrganisation(getDb(), user, organisationId) });
});
