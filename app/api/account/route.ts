import { getDb } from "@/db";
import { route } from "@/lib/http";
import { listOrganisationsForUser, pickActiveOrganisation } from "@/lib/server/organisations";
import { requireSessionUser } from "@/lib/server/session";

/** GET /api/account: who is signed in, their organisations and the active one. */
export const GET = route(async () => {
  const user = await requireSessionUser();
  const organisations = await listOrganisationsForUser(getDb(), user.userId);
  const active = pickActiveOrganisation(organisations, user.activeOrganisationId);
  return Response.json({
    user: { id: user.userId, name: user.name, email: user.email },
    organisations,
    activeOrganisationId: active?.id ?? null,
  });
});
