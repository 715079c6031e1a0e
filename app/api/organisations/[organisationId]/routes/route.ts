import { getDb } from "@/db";
import { AppError } from "@/lib/errors";
import { route } from "@/lib/http";
import { requireAccess } from "@/lib/server/access";
import { readUploadBody } from "@/lib/server/routes/decode-upload";
import { listRoutes } from "@/lib/server/routes/routes-dal";
import { uploadRoute } from "@/lib/server/routes/upload-route";
import { requireSessionUser } from "@/lib/server/session";

type Context = { params: Promise<{ organisationId: string }> };

/** GET /api/organisations/:id/routes: the organisation's routes (any member). */
export const GET = route(async (_request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  return Response.json({ routes: await listRoutes(getDb(), user, organisationId) });
});

const UPLOAD_TYPES = /^(application\/gpx\+xml|application\/xml|text\/xml|application\/octet-stream)\b/i;
const TRACK_ID = /^(track|route):\d{1,4}$/;

/**
 * POST /api/organisations/:id/routes?fileName=…&trackId=…: upload one GPX file as the request body
 * (planners and owners). 201 with the new route; 200 with `duplicate: true` when this file is already there.
 */
export const POST = route(async (request, { params }: Context) => {
  const user = await requireSessionUser();
  const { organisationId } = await params;
  if (!UPLOAD_TYPES.test(request.headers.get("content-type") ?? "")) {
    throw new AppError("unsupported_media_type", "Send the GPX file as the request body (Content-Type: application/gpx+xml).");
  }
  const url = new URL(request.url);
  const trackId = url.searchParams.get("trackId") ?? undefined;
  if (trackId !== undefined && !TRACK_ID.test(trackId)) {
    throw new AppError("invalid_input", "Choose a track from the file.", { trackId: ["Not a track of this file."] });
  }
  const db = getDb();
  // The role is checked before the body is read, so a viewer's upload is refused without reading it.
  await requireAccess(db, user, organisationId, "content.create");
  const bytes = await readUploadBody(request);
  const result = await uploadRoute(db, user, organisationId, { bytes, fileName: url.searchParams.get("fileName"), trackId });
  return Response.json(result, { status: result.duplicate ? 200 : 201 });
});
