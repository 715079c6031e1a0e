import { getDb } from "@/db";
import { readJson, route } from "@/lib/http";
import { setActiveOrganisation } from "@/lib/server/organisations";
import { requireSessionUser } from "@/lib/server/session";
import { activeOrganisationSchema } from "@/lib/validation/organisation";

/** PUT /api/account/active-organisation { organisationId }: switch the organisation you work in. */
export const PUT = route(async (request) => {
  const user = await requireSessionUser();
  const { organisationId } = await readJson(request, activeOrganisationSchema, 1024);
  await setActiveOrganisation(getDb(), user, organisationId);
  return Response.json({ activeOrganisationId: organisationId });
});
