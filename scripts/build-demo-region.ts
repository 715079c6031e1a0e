/**
 * Builds the regional map extract of the INVENTED demo island (db/demo/region.ts):
 * `public/tiles/demo-region.pmtiles`, z0–12, with the world archive's layer names — `land` (the island, its
 * lake cut out), `water` (the lake) and `place` (the invented places, with the world archive's properties
 * name, kind, pop, minzoom and capital) — and no `boundary`. The island lies in open ocean, where the world
 * basemap shows only sea; drawn above it, this extract puts the demo routes on land.
 *
 * Reuses the world pipeline unchanged: @maplibre/geojson-vt for cutting, scripts/tiles/places.ts for label
 * points, scripts/tiles/pmtiles-writer.ts for the archive. Deterministic; skipped while a stamp (hash of
 * this script, the region's sources and scripts/tiles/*, package versions, zlib, and the archive's own size
 * and SHA-256) matches. The stamp is `<archive>.stamp.json` (git-ignored like the archive).
 *
 * Usage: `npx tsx scripts/build-demo-region.ts [--force] [--out <file>]`
 */
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { gzipSync } from "node:zlib";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { GeoJSONVT, type GeoJSONVTTile } from "@maplibre/geojson-vt";
import { fromGeojsonVt } from "@maplibre/vt-pbf";
import { coastlineRing, ISLAND_CENTRE, ISLAND_NAME, lakes, PLACES, type PlaceKind, toLonLat } from "@/db/demo/region";
import { EXTENT } from "./tiles/build";
import { tileKey, tilePlaces } from "./tiles/places";
import { buildPmtiles, type TileBlob } from "./tiles/pmtiles-writer";
import type { PlacePoint } from "./tiles/sources";

const scriptsDir = dirname(fileURLToPath(import.meta.url));
const root = resolve(scriptsDir, "..");
/** Highest zoom stored (about 25 m per pixel at the island's latitude); MapLibre overzooms above it. */
const MAX_ZOOM = 12;
const PACKAGES = ["@maplibre/geojson-vt", "@maplibre/vt-pbf", "pmtiles"];
const SOURCES = ["scripts/build-demo-region.ts", "db/demo/region.ts", "db/demo/prng.ts", "lib/route/wgs84.ts"];
/** Lowest zoom at which each kind of place is stored. */
const PLACE_MINZOOM: Record<PlaceKind, number> = { town: 7, village: 9, pass: 10, lookout: 10, camp: 10 };

interface Stamp {
  inputs: Record<string, string>;
  archive: { size: number; sha256: string };
}

const sha256 = (bytes: Buffer): string => createHash("sha256").update(bytes).digest("hex");

function currentInputs(): Record<string, string> {
  const files = [...SOURCES, ...readdirSync(join(scriptsDir, "tiles")).sort().map((f) => `scripts/tiles/${f}`)];
  const hash = createHash("sha256");
  for (const f of files) hash.update(f).update("\0").update(readFileSync(join(root, f))).update("\0");
  const inputs: Record<string, string> = { script: hash.digest("hex"), zlib: process.versions.zlib ?? "unknown" };
  for (const name of PACKAGES) {
    inputs[name] = (JSON.parse(readFileSync(join(root, "node_modules", name, "package.json"), "utf8")) as { version: string }).version;
  }
  return inputs;
}

function upToDate(stampFile: string, out: string, inputs: Record<string, string>): boolean {
  if (!existsSync(stampFile) || !existsSync(out)) return false;
  try {
    const stamp = JSON.parse(readFileSync(stampFile, "utf8")) as Stamp;
    const bytes = readFileSync(out);
    return JSON.stringify(stamp.inputs) === JSON.stringify(inputs) && bytes.length === stamp.archive.size && sha256(bytes) === stamp.archive.sha256;
  } catch {
    return false;
  }
}

/** The island's layers as GeoJSON and label points (kinds other than town/village are re-tagged below). */
function regionLayers(): { land: GeoJSON.FeatureCollection; water: GeoJSON.FeatureCollection; places: PlacePoint[] } {
  const lakeList = lakes();
  const land: GeoJSON.FeatureCollection = {
    type: "FeatureCollection",
    // GeoJSON holes run clockwise (RFC 7946 §3.1.6): the lake rings are reversed.
    features: [{ type: "Feature", properties: {}, geometry: { type: "Polygon", coordinates: [coastlineRing(), ...lakeList.map((l) => [...l.ring].reverse())] } }],
  };
  const water: GeoJSON.FeatureCollection = {
    type: "FeatureCollection",
    features: lakeList.map((l) => ({ type: "Feature", properties: { name: l.name, kind: "lake" }, geometry: { type: "Polygon", coordinates: [l.ring] } })),
  };
  const places = PLACES.map((p): PlacePoint => {
    const [lon, lat] = toLonLat(p.eastM, p.northM);
    const kind = p.kind === "town" ? "town" : "village";
    return { lon, lat, name: p.name, kind, pop: p.pop, minzoom: PLACE_MINZOOM[p.kind], capital: 0 };
  });
  return { land, water, places };
}

function buildArchive(): { bytes: Buffer; tiles: number; rawBytes: number } {
  const { land, water, places } = regionLayers();
  const options = { maxZoom: MAX_ZOOM, extent: EXTENT, buffer: 64, tolerance: 3 } as const;
  const landIndex = new GeoJSONVT(land, options);
  const waterIndex = new GeoJSONVT(water, options);
  const placeTiles = tilePlaces(places, MAX_ZOOM, EXTENT);
  // tilePlaces knows the world's kinds only; give passes, lookouts and camps their own kind back.
  const kindByName = new Map(PLACES.map((p) => [p.name, p.kind]));
  for (const tile of placeTiles.values()) {
    for (const f of tile.features) if (f.tags) f.tags.kind = kindByName.get(String(f.tags.name)) ?? f.tags.kind;
  }
  const blobs: TileBlob[] = [];
  let rawBytes = 0;
  const nonEmpty = (t: GeoJSONVTTile | null) => (t && t.features.length > 0 ? t : undefined);
  const visit = (z: number, x: number, y: number): void => {
    const landTile = nonEmpty(landIndex.getTile(z, x, y));
    if (!landTile) return; // water and places lie on the island: nothing below either
    const layers: Record<string, GeoJSONVTTile> = { land: landTile };
    const waterTile = nonEmpty(waterIndex.getTile(z, x, y));
    if (waterTile) layers.water = waterTile;
    const placeTile = placeTiles.get(tileKey(z, x, y));
    if (placeTile) layers.place = placeTile;
    const raw = fromGeojsonVt(layers, { version: 2, extent: EXTENT });
    rawBytes += raw.length;
    blobs.push({ z, x, y, data: gzipSync(raw, { level: 9 }) });
    if (z < MAX_ZOOM) for (const [dx, dy] of [[0, 0], [1, 0], [0, 1], [1, 1]] as const) visit(z + 1, 2 * x + dx, 2 * y + dy);
  };
  visit(0, 0, 0);
  const ring = coastlineRing();
  const lons = ring.map((p) => p[0]);
  const lats = ring.map((p) => p[1]);
  const { bytes } = buildPmtiles(blobs, {
    minZoom: 0,
    maxZoom: MAX_ZOOM,
    bounds: [Math.min(...lons), Math.min(...lats), Math.max(...lons), Math.max(...lats)],
    center: [ISLAND_CENTRE.lon, ISLAND_CENTRE.lat, 9],
    metadata: {
      name: "Fadeline demo region",
      description: `${ISLAND_NAME}, an invented island for Fadeline's demo routes; built by scripts/build-demo-region.ts`,
      version: "1",
      type: "overlay",
      format: "pbf",
      attribution: `${ISLAND_NAME} is invented (Fadeline demo data)`,
      vector_layers: [
        { id: "land", description: "The invented island", minzoom: 0, maxzoom: MAX_ZOOM, fields: {} },
        { id: "water", description: "Its lake", minzoom: 0, maxzoom: MAX_ZOOM, fields: { name: "String", kind: "String" } },
        {
          id: "place",
          description: "Invented towns, villages, passes, lookouts and camps",
          minzoom: 7,
          maxzoom: MAX_ZOOM,
          fields: { name: "String", kind: "String", pop: "Number", minzoom: "Number", capital: "Number" },
        },
      ],
    },
  });
  return { bytes, tiles: blobs.length, rawBytes };
}

function main(): void {
  const argv = process.argv.slice(2);
  const force = argv.includes("--force");
  const outAt = argv.indexOf("--out");
  const out = outAt >= 0 && argv[outAt + 1] ? resolve(argv[outAt + 1] as string) : join(root, "public", "tiles", "demo-region.pmtiles");
  if (argv.some((a, i) => a !== "--force" && a !== "--out" && (outAt < 0 || i !== outAt + 1))) throw new Error("usage: build-demo-region.ts [--force] [--out <file>]");
  const stampFile = `${out}.stamp.json`;
  const inputs = currentInputs();
  const shown = relative(root, out);
  if (!force && upToDate(stampFile, out, inputs)) {
    console.log(`build-demo-region: ${shown} is up to date (use --force to rebuild)`);
    return;
  }
  const started = performance.now();
  const { bytes, tiles, rawBytes } = buildArchive();
  mkdirSync(dirname(out), { recursive: true });
  writeFileSync(`${out}.partial`, bytes);
  renameSync(`${out}.partial`, out);
  const stamp: Stamp = { inputs, archive: { size: bytes.length, sha256: sha256(bytes) } };
  writeFileSync(stampFile, `${JSON.stringify(stamp, null, 2)}\n`);
  const kb = (n: number) => (n / 1024).toFixed(0);
  console.log(
    `build-demo-region: wrote ${shown}: ${tiles} tiles, ${kb(bytes.length)} KB (${kb(rawBytes)} KB before gzip), ` +
      `${PLACES.length} places; ${((performance.now() - started) / 1000).toFixed(2)} s`,
  );
}

main();
