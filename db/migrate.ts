/**
 * Applies the committed migrations in db/migrations. Used by the start and test commands and, in production,
 * as its own deploy step (never by `next build`). Drizzle's migrator takes no lock, so two instances starting
 * at once could race; a PostgreSQL advisory lock makes them take turns. Each migration runs in a transaction,
 * so a broken one leaves the database at the previous version and this exits non-zero.
 */
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { fileURLToPath } from "node:url";
import { Client } from "pg";

const MIGRATION_LOCK = 7_301_942_118; // any fixed bigint shared by every instance of this app

export async function runMigrations(connectionString: string): Promise<void> {
  const client = new Client({ connectionString, application_name: "fadeline-migrate" });
  await client.connect();
  try {
    await client.query("select pg_advisory_lock($1)", [MIGRATION_LOCK]);
    await migrate(drizzle(client), {
      migrationsFolder: fileURLToPath(new URL("./migrations", import.meta.url)),
    });
  } finally {
    await client.query("select pg_advisory_unlock($1)", [MIGRATION_LOCK]).catch(() => undefined);
    await client.end();
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error("DATABASE_URL is not set");
    process.exit(1);
  }
  runMigrations(url).then(
    () => console.log("migrations applied"),
    (error: unknown) => {
      console.error("migration failed:", error instanceof Error ? error.message : error);
      process.exit(1);
    },
  );
}
