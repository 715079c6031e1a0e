import { getDb } from "@/db";
import { route } from "@/lib/http";
import { getRouteFile } from "@/lib/server/routes/routes-dal";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ routeId: string }> };

/**
 * GET /api/routes/:id/gpx: the original file, always as a download with a generated name (docs/security.md C16–C17),
 * never rendered inline, whatever it contains.
 */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { routeId } = await params;
  const { gpx, name } = await getRouteFile(getDb(), user, routeId);
  const safe = name.normalize("NFKD").replace(/[^A-Za-z0-9 _-]+/g, "").trim().replace(/\s+/g, "-").slice(0, 60) || "route";
  return new Response(new Uint8Array(gpx), {
    headers: {
      "content-type": "application/gpx+xml",
      "content-disposition": `attachment; filename="${safe}.gpx"`,
      "x-content-type-options": "nosniff",
    },
  });
});
