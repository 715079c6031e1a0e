import { RIG_PRESETS } from "@/lib/analysis/presets";
import { route } from "@/lib/http";
import { requireSessionUser } from "@/lib/server/session";

/** GET /api/rig-presets: generic vehicles, trailers and whole rigs to start from (typical values, not products). */
export const GET = route(async () => {
  await requireSessionUser();
  return Response.json({ presets: RIG_PRESETS });
});
