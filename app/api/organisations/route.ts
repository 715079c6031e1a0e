import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { createOrganisation, listOrganisationsForUser } from "@/lib/server/organisations";
import { requireSessionUser } from "@/lib/server/session";
import { organisationInputSchema } from "@/lib/validation/organisation";

/** GET /api/organisations: the organisations you belong to, with your role in each. */
export const GET = route(async () => {
  const user = await requireSessionUser();
  return Response.json({ organisations: await listOrganisationsForUser(getDb(), user.userId) });
});

/** POST /api/organisations { name }: a new team organisation that you own. */
export const POST = route(async (request) => {
  const user = await requireSessionUser();
  const { name } = await readJson(request, organisationInputSchema, 2048);
  return Response.json({ organisation: await createOrganisation(getDb(), user, name) }, { status: 201 });
});
