/**
 * Writes the demo routes (./generate-routes.ts) as files, for browser tests that drop a real file on the
 * upload zone: `tests/fixtures/gpx/demo/<slug>.gpx`. Deterministic; a file whose text is unchanged is left
 * alone.
 *
 * Usage: `npx tsx db/demo/write-demo-gpx.ts [--out <dir>]`
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { demoRoutes } from "./generate-routes";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");

function outDir(argv: readonly string[]): string {
  if (argv.length === 0) return join(root, "tests", "fixtures", "gpx", "demo");
  if (argv.length === 2 && argv[0] === "--out" && argv[1]) return resolve(argv[1]);
  throw new Error("usage: write-demo-gpx.ts [--out <dir>]");
}

function main(): void {
  const dir = outDir(process.argv.slice(2));
  mkdirSync(dir, { recursive: true });
  for (const route of demoRoutes()) {
    const file = join(dir, `${route.slug}.gpx`);
    const same = existsSync(file) && readFileSync(file, "utf8") === route.gpx;
    if (!same) writeFileSync(file, route.gpx);
    const kb = (Buffer.byteLength(route.gpx) / 1024).toFixed(0);
    console.log(`write-demo-gpx: ${relative(root, file)} (${kb} KB) ${same ? "unchanged" : "written"}`);
  }
}

main();
