import { sql } from "drizzle-orm";
import { getDb } from "@/db";

export const dynamic = "force-dynamic";

/** Liveness and readiness: the app answers; `database` says whether PostgreSQL does (503 when it does not). */
export async function GET() {
  const started = Date.now();
  let database: "up" | "down" = "down";
  try {
    await getDb().execute(sql`select 1`);
    database = "up";
  } catch (error) {
    console.error("[health] database check failed:", error instanceof Error ? error.message : error);
  }
  const body = { app: "up", database, checkedInMs: Date.now() - started, time: new Date().toISOString() };
  return Response.json(body, { status: database === "up" ? 200 : 503, headers: { "cache-control": "no-store" } });
}
