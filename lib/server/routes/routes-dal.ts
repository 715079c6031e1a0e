import "server-only";
import { and, desc, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "@/db";
import { routes, users } from "@/db/schema";
import { AppError, notFound } from "@/lib/errors";
import { plansUsing } from "../plans/plans-dal";
import { isUuid, requireAccess, type Actor } from "../access";
import { recordAudit } from "../audit";
import { decodeProfile, encodeProfile } from "./profile-codec";
import type { ProcessedUpload } from "./process-upload";

/** A row of the routes table as lists show it (explicit columns: no file, no profile). */
const listColumns = {
  id: routes.id,
  name: routes.name,
  fileName: routes.fileName,
  lengthM: routes.lengthM,
  totalAscentM: routes.totalAscentM,
  totalDescentM: routes.totalDescentM,
  highestM: routes.highestM,
  lowestM: routes.lowestM,
  descentCount: routes.descentCount,
  steepestGrade: routes.steepestGrade,
  pointCount: routes.pointCount,
  sizeBytes: routes.sizeBytes,
  trackId: routes.trackId,
  createdAt: routes.createdAt,
  updatedAt: routes.updatedAt,
  uploadedByName: users.name,
};
export type RouteListRow = Awaited<ReturnType<typeof listRoutes>>[number];

/** The organisation's routes, newest first. */
export async function listRoutes(db: DbOrTx, actor: Actor, organisationId: string) {
  await requireAccess(db, actor, organisationId, "content.read");
  return db
    .select(listColumns)
    .from(routes)
    .leftJoin(users, eq(users.id, routes.uploadedByUserId))
    .where(eq(routes.organisationId, organisationId))
    .orderBy(desc(routes.createdAt));
}

/** Loads a route's organisation first, so that a route of another organisation answers 404 like a missing one. */
async function organisationOfRoute(db: DbOrTx, routeId: string): Promise<string> {
  if (!isUuid(routeId)) throw notFound("That route");
  const [row] = await db.select({ organisationId: routes.organisationId }).from(routes).where(eq(routes.id, routeId));
  if (!row) throw notFound("That route");
  return row.organisationId;
}

async function guard(db: DbOrTx, actor: Actor, routeId: string, action: "content.read" | "content.update" | "content.delete") {
  const organisationId = await organisationOfRoute(db, routeId);
  try {
    const role = await requireAccess(db, actor, organisationId, action);
    return { organisationId, role };
  } catch (error) {
    // Not a member: the route does not visibly exist.
    if ((error as { code?: string }).code === "not_found") throw notFound("That route");
    throw error;
  }
}

/** One route with what its page shows: the browser view, descents, stats, waypoints and warnings. */
export async function getRoute(db: DbOrTx, actor: Actor, routeId: string) {
  const { organisationId, role } = await guard(db, actor, routeId, "content.read");
  const [row] = await db
    .select({ ...listColumns, organisationId: routes.organisationId, view: routes.view, descents: routes.descents, stats: routes.stats, warnings: routes.warnings, waypoints: routes.waypoints, tracks: routes.tracks })
    .from(routes)
    .leftJoin(users, eq(users.id, routes.uploadedByUserId))
    .where(eq(routes.id, routeId));
  return { ...row!, organisationId, role };
}

/** The full-resolution profile, for the heat model. */
export async function getRouteProfile(db: DbOrTx, actor: Actor, routeId: string) {
  await guard(db, actor, routeId, "content.read");
  const [row] = await db.select({ profile: routes.profile, sampleCount: routes.sampleCount, stepM: routes.stepM }).from(routes).where(eq(routes.id, routeId));
  return decodeProfile(row!.profile, row!.sampleCount, row!.stepM);
}

/** The original file, for download. */
export async function getRouteFile(db: DbOrTx, actor: Actor, routeId: string) {
  await guard(db, actor, routeId, "content.read");
  const [row] = await db.select({ gpx: routes.gpx, name: routes.name }).from(routes).where(eq(routes.id, routeId));
  return row!;
}

/** The route already made from this file and track in the organisation, if any. */
export async function findRouteByContent(db: DbOrTx, organisationId: string, contentSha256: string, trackId: string | null) {
  const [row] = await db
    .select(listColumns)
    .from(routes)
    .leftJoin(users, eq(users.id, routes.uploadedByUserId))
    .where(and(eq(routes.organisationId, organisationId), eq(routes.contentSha256, contentSha256), trackId ? eq(routes.trackId, trackId) : sql`true`))
    .orderBy(routes.createdAt)
    .limit(1);
  return row ?? null;
}

export interface NewRoute {
  name: string;
  fileName: string;
  contentSha256: string;
  gpx: Buffer;
  processed: ProcessedUpload;
}

/**
 * Stores the file and its processed profile in one statement (so never one without the other). A parallel
 * upload of the same file loses the race to the unique index and gets the stored route back instead.
 */
export async function createRoute(db: DbOrTx, actor: Actor, organisationId: string, input: NewRoute) {
  await requireAccess(db, actor, organisationId, "content.create");
  const { processed: p } = input;
  const steepest = p.descents.length ? Math.min(...p.descents.map((d) => d.steepest1kmGrade)) : null;
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(routes)
      .values({
        organisationId,
        name: input.name,
        fileName: input.fileName,
        contentSha256: input.contentSha256,
        gpx: input.gpx,
        sizeBytes: input.gpx.length,
        trackId: p.trackId,
        tracks: p.tracks,
        pointCount: p.pointCount,
        sampleCount: p.profile.distanceM.length,
        stepM: p.profile.stepM,
        lengthM: p.stats.lengthM,
        totalAscentM: p.stats.totalAscentM,
        totalDescentM: p.stats.totalDescentM,
        highestM: p.stats.highestM,
        lowestM: p.stats.lowestM,
        descentCount: p.descents.length,
        steepestGrade: steepest,
        stats: p.stats,
        descents: p.descents,
        warnings: p.warnings,
        waypoints: p.waypoints,
        profile: encodeProfile(p.profile),
        view: p.view,
        uploadedByUserId: actor.userId,
      })
      .onConflictDoNothing()
      .returning({ id: routes.id });
    if (!row) return { created: false as const, route: (await findRouteByContent(tx, organisationId, input.contentSha256, p.trackId))! };
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "route.uploaded", targetType: "route", targetId: row.id, detail: { name: input.name } });
    const [route] = await tx.select(listColumns).from(routes).leftJoin(users, eq(users.id, routes.uploadedByUserId)).where(eq(routes.id, row.id));
    return { created: true as const, route: route! };
  });
}

export async function renameRoute(db: DbOrTx, actor: Actor, routeId: string, name: string) {
  const { organisationId } = await guard(db, actor, routeId, "content.update");
  await db.transaction(async (tx) => {
    const [before] = await tx.select({ name: routes.name }).from(routes).where(eq(routes.id, routeId)).for("update");
    await tx.update(routes).set({ name, updatedAt: sql`now()` }).where(eq(routes.id, routeId));
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "route.renamed", targetType: "route", targetId: routeId, detail: { from: before?.name ?? null, to: name } });
  });
}

export async function deleteRoute(db: DbOrTx, actor: Actor, routeId: string) {
  const { organisationId } = await guard(db, actor, routeId, "content.delete");
  const usedBy = await plansUsing(db, { routeId });
  if (usedBy.length) throw new AppError("conflict", `This route is used by ${usedBy.length === 1 ? "the plan" : "the plans"} ${usedBy.map((n) => `“${n}”`).join(", ")}. Remove it from ${usedBy.length === 1 ? "that plan" : "those plans"} first.`);
  await db.transaction(async (tx) => {
    const [row] = await tx.delete(routes).where(eq(routes.id, routeId)).returning({ name: routes.name });
    await recordAudit(tx, { organisationId, actorUserId: actor.userId, action: "route.deleted", targetType: "route", targetId: routeId, detail: { name: row?.name ?? null } });
  });
}

/** Routes one organisation may keep (docs/security.md C28). */
export const ROUTES_PER_ORGANISATION = 500;
export async function countRoutes(db: DbOrTx, organisationId: string): Promise<number> {
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(routes).where(eq(routes.organisationId, organisationId));
  return row?.n ?? 0;
}
