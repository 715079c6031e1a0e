import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;
/** A transaction handle or the database itself: data-access functions accept either. */
export type DbOrTx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];

interface DbHandle {
  pool: Pool;
  db: Db;
}

let handle: DbHandle | undefined;
const devCache = globalThis as unknown as { __fadelineDb?: DbHandle };

function open(): DbHandle {
  const connectionString = process.env.DATABASE_URL;
  if (!connectionString) throw new Error("DATABASE_URL is not set (see .env.example)");
  const pool = new Pool({
    connectionString,
    max: Number(process.env.DATABASE_POOL_MAX ?? 10),
    // The pool waits forever by default; a request must fail fast instead when PostgreSQL is away.
    connectionTimeoutMillis: 5_000,
    idleTimeoutMillis: 30_000,
    statement_timeout: 15_000,
    application_name: "fadeline",
  });
  // Without a listener an idle client killed by the server would crash the process.
  pool.on("error", (error) => console.error("[db] idle connection lost:", error.message));
  return { pool, db: drizzle(pool, { schema }) };
}

/**
 * The shared Drizzle handle, opened on first use so that importing a module never needs a database
 * (`next build` imports route modules). Development keeps it on globalThis to survive hot reloads.
 */
export function getDb(): Db {
  if (process.env.NODE_ENV === "development") return (devCache.__fadelineDb ??= open()).db;
  return (handle ??= open()).db;
}

/** Closes the pool; for scripts and tests. */
export async function closeDb(): Promise<void> {
  const current = handle ?? devCache.__fadelineDb;
  handle = undefined;
  devCache.__fadelineDb = undefined;
  await current?.pool.end();
}
