/**
 * The committed migrations apply to an empty database, are idempotent, and several app instances migrating
 * at once take turns (PostgreSQL advisory lock; drizzle's migrator has none of its own).
 */
import { randomBytes } from "node:crypto";
import { Client } from "pg";
import { expect, it } from "vitest";
import { runMigrations } from "../../db/migrate";
import { adminUrl, withAdmin } from "./global-setup";

it("three instances migrating one empty database at once all succeed, each migration applied once", async () => {
  const name = `fadeline_m_${randomBytes(4).toString("hex")}`;
  await withAdmin((c) => c.query(`create database ${name}`));
  try {
    const url = adminUrl(name);
    await Promise.all([runMigrations(url), runMigrations(url), runMigrations(url)]);
    await runMigrations(url); // and again later: nothing to do
    const client = new Client({ connectionString: url });
    await client.connect();
    const applied = await client.query("select hash from drizzle.__drizzle_migrations");
    const tables = await client.query("select table_name from information_schema.tables where table_schema = 'public' order by 1");
    await client.end();
    const journal = (await import("../../db/migrations/meta/_journal.json")).default as { entries: unknown[] };
    expect(applied.rowCount).toBe(journal.entries.length);
    expect(tables.rows.map((r) => r.table_name)).toEqual(
      expect.arrayContaining(["audit_events", "email_tokens", "invitations", "memberships", "organisations", "rate_limit_hits", "sign_in_attempts", "users"]),
    );
  } finally {
    await withAdmin((c) => c.query(`drop database if exists ${name} with (force)`));
  }
});
