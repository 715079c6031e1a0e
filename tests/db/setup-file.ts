/** Runs before each database test file: a private copy of the migrated template database. */
import { randomBytes } from "node:crypto";
import { afterAll } from "vitest";
import { applyTestEnv } from "../support/test-env";
import { adminUrl, TEMPLATE_DB, withAdmin } from "./global-setup";

const name = `fadeline_t_${randomBytes(5).toString("hex")}`;
await withAdmin((c) => c.query(`create database ${name} template ${TEMPLATE_DB}`));
applyTestEnv({ DATABASE_URL: adminUrl(name) });

afterAll(async () => {
  const { closeDb } = await import("../../db");
  await closeDb();
  await withAdmin((c) => c.query(`drop database if exists ${name} with (force)`));
});
