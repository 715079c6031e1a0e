import { getDb } from "@/db";
import { route } from "@/lib/http";
import { getPlan } from "@/lib/server/plans/plans-dal";
import { encodeProfile } from "@/lib/server/routes/profile-codec";
import { getRouteProfile } from "@/lib/server/routes/routes-dal";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ planId: string }> };

/**
 * GET /api/plans/:id/route-profile: the plan route's full-resolution profile for the browser's what-if runs, packed
 * as in the database (lib/route/profile-bytes.ts reads it): six little-endian Float64 columns, then the gap flags.
 */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { planId } = await params;
  const db = getDb();
  const plan = await getPlan(db, user, planId);
  const profile = await getRouteProfile(db, user, plan.routeId);
  const bytes = encodeProfile(profile);
  return new Response(new Uint8Array(bytes), {
    headers: {
      "content-type": "application/octet-stream",
      "x-sample-count": String(profile.distanceM.length),
      "x-step-m": String(profile.stepM),
      "cache-control": "private, max-age=3600",
    },
  });
});
