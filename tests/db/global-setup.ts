/**
 * Database tests run against the real PostgreSQL server the test command started. Once per run this builds a
 * template database from the committed migrations; every test file then gets its own copy (see
 * setup-file.ts), so files can run in parallel and never see each other's rows.
 */
import { Client } from "pg";
import { runMigrations } from "../../db/migrate";

export const TEMPLATE_DB = "fadeline_test_template";

export function adminUrl(database = "postgres"): string {
  const url = process.env.DATABASE_URL;
  if (!url) {
    throw new Error("DATABASE_URL is not set: run the database tests through scripts/test.sh (or export it).");
  }
  const parsed = new URL(url);
  parsed.pathname = `/${database}`;
  return parsed.toString();
}

export async function withAdmin<T>(fn: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: adminUrl() });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

export default async function setup(): Promise<() => Promise<void>> {
  await withAdmin(async (c) => {
    await c.query(`drop database if exists ${TEMPLATE_DB} with (force)`);
    await c.query(`create database ${TEMPLATE_DB}`);
  });
  await runMigrations(adminUrl(TEMPLATE_DB));
  return async () => {
    await withAdmin((c) => c.query(`drop database if exists ${TEMPLATE_DB} with (force)`));
  };
}
