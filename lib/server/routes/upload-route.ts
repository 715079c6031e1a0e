import "server-only";
import { createHash } from "node:crypto";
import type { DbOrTx } from "@/db";
import { AppError } from "@/lib/errors";
import { requireAccess, type Actor } from "../access";
import { takeRateLimit } from "../rate-limit";
import { decodeUpload } from "./decode-upload";
import { processUpload } from "./process-upload";
import { countRoutes, createRoute, findRouteByContent, ROUTES_PER_ORGANISATION } from "./routes-dal";

/** Uploads one person may make per hour (docs/security.md C28). */
export const UPLOADS_PER_HOUR = 60;

/**
 * A file name fit for display: no folders, no control or bidirectional-override characters (which can make
 * "evil‮xpg.exe" read as "evilexe.gpx"), at most 200 characters. Files are stored by id, never by name.
 */
export function cleanFileName(raw: string | null): string {
  const base = (raw ?? "").split(/[\\/]/).pop() ?? "";
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f\u200e\u200f\u202a-\u202e\u2066-\u2069]/g, "").trim();
  return (clean || "route.gpx").slice(0, 200);
}

function routeNameFrom(trackName: string | null, fileName: string): string {
  const fromFile = fileName.replace(/\.gpx$/i, "").replace(/[_-]+/g, " ").trim();
  return (trackName?.trim() || fromFile || "Unnamed route").slice(0, 120);
}

export interface UploadInput {
  bytes: Uint8Array;
  fileName: string | null;
  trackId?: string;
}

/**
 * Checks rights and limits, finds an earlier upload of the same file, else reads the file in a worker and
 * stores file and profile together. Problems in the file come back as a 422 listing each of them.
 */
export async function uploadRoute(db: DbOrTx, actor: Actor, organisationId: string, input: UploadInput) {
  await requireAccess(db, actor, organisationId, "content.create");
  const fileName = cleanFileName(input.fileName);
  const contentSha256 = createHash("sha256").update(input.bytes).digest("hex");
  const existing = await findRouteByContent(db, organisationId, contentSha256, input.trackId ?? null);
  if (existing) return { duplicate: true as const, route: existing, warnings: [], tracks: [] };
  if ((await countRoutes(db, organisationId)) >= ROUTES_PER_ORGANISATION) {
    throw new AppError("conflict", `This organisation keeps ${ROUTES_PER_ORGANISATION} routes, the most allowed. Delete some before adding more.`);
  }
  if (!(await takeRateLimit(db, `upload:user:${actor.userId}`, UPLOADS_PER_HOUR, 60))) {
    throw new AppError("rate_limited", `You have uploaded ${UPLOADS_PER_HOUR} files in the last hour. Try again later.`);
  }
  const text = decodeUpload(input.bytes);
  const processed = await processUpload(text, input.trackId);
  if (!processed.ok) {
    const messages = processed.problems.filter((p) => p.severity !== "warning").map((p) => p.message);
    throw new AppError("invalid_input", messages[0] ?? "This file could not be used.", { file: messages.slice(0, 20) });
  }
  const stored = await createRoute(db, actor, organisationId, {
    name: routeNameFrom(processed.name, fileName),
    fileName,
    contentSha256,
    gpx: Buffer.from(input.bytes),
    processed,
  });
  return {
    duplicate: !stored.created,
    route: stored.route,
    warnings: processed.warnings.map((w) => w.message),
    tracks: processed.tracks,
  };
}
