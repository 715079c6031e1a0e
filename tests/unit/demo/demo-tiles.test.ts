/**
 * Reads the demo region's map extract (public/tiles/demo-region.pmtiles) back with the `pmtiles` reader and
 * decodes its tiles with @mapbox/vector-tile. The archive is built by `npx tsx scripts/build-demo-region.ts`
 * (run it before the unit tests, like scripts/build-tiles.ts for the world); a missing archive is a failure.
 */
import { existsSync } from "node:fs";
import { open, type FileHandle } from "node:fs/promises";
import { gunzipSync } from "node:zlib";
import { VectorTile } from "@mapbox/vector-tile";
import { PbfReader } from "pbf";
import { Compression, PMTiles, type Source } from "pmtiles";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ISLAND_CENTRE, lakes, PLACES, toLonLat } from "@/db/demo/region";
import { inRing } from "./demo-helpers";

const ARCHIVE = "public/tiles/demo-region.pmtiles";

class FileHandleSource implements Source {
  constructor(private readonly handle: FileHandle) {}
  getKey(): string {
    return ARCHIVE;
  }
  async getBytes(offset: number, length: number): Promise<{ data: ArrayBuffer }> {
    const buf = Buffer.alloc(length);
    const { bytesRead } = await this.handle.read(buf, 0, length, offset);
    return { data: buf.buffer.slice(buf.byteOffset, buf.byteOffset + bytesRead) };
  }
}

async function decompress(buf: ArrayBuffer, compression: Compression): Promise<ArrayBuffer> {
  if (compression === Compression.None) return buf;
  if (compression !== Compression.Gzip) throw new Error(`unexpected compression ${compression}`);
  const out = gunzipSync(Buffer.from(buf));
  return out.buffer.slice(out.byteOffset, out.byteOffset + out.byteLength);
}

let handle: FileHandle;
let archive: PMTiles;

beforeAll(async () => {
  if (!existsSync(ARCHIVE)) throw new Error(`${ARCHIVE} is missing: build it with \`npx tsx scripts/build-demo-region.ts\``);
  handle = await open(ARCHIVE, "r");
  archive = new PMTiles(new FileHandleSource(handle), undefined, decompress);
});

afterAll(async () => {
  await handle?.close();
});

/** The web-mercator tile containing a position (the standard slippy-map tile formula). */
function tileAt(lon: number, lat: number, z: number): [number, number] {
  const n = 2 ** z;
  const sin = Math.sin((lat * Math.PI) / 180);
  return [Math.floor(((lon + 180) / 360) * n), Math.floor((0.5 - (0.25 * Math.log((1 + sin) / (1 - sin))) / Math.PI) * n)];
}

async function tile(lon: number, lat: number, z: number): Promise<{ vt: VectorTile; x: number; y: number } | undefined> {
  const [x, y] = tileAt(lon, lat, z);
  const t = await archive.getZxy(z, x, y);
  return t ? { vt: new VectorTile(new PbfReader(new Uint8Array(t.data))), x, y } : undefined;
}

/** Whether a polygon layer of the tile covering (lon, lat) contains that point. */
async function covers(layerName: string, lon: number, lat: number, z: number): Promise<boolean> {
  const t = await tile(lon, lat, z);
  const layer = t?.vt.layers[layerName];
  if (!t || !layer) return false;
  for (let i = 0; i < layer.length; i++) {
    const g = layer.feature(i).toGeoJSON(t.x, t.y, z).geometry;
    const polygons = g.type === "Polygon" ? [g.coordinates] : g.type === "MultiPolygon" ? g.coordinates : [];
    for (const [outer, ...holes] of polygons) if (outer && inRing(lon, lat, outer) && !holes.some((h) => inRing(lon, lat, h))) return true;
  }
  return false;
}

describe("demo-region.pmtiles", () => {
  it("is a PMTiles v3 archive of gzip MVT tiles at z0–12 bounding the island", async () => {
    const h = await archive.getHeader();
    expect(h.specVersion).toBe(3);
    expect(h.tileType).toBe(1);
    expect(h.tileCompression).toBe(Compression.Gzip);
    expect([h.minZoom, h.maxZoom]).toEqual([0, 12]);
    expect(h.minLon).toBeLessThan(ISLAND_CENTRE.lon);
    expect(h.maxLon).toBeGreaterThan(ISLAND_CENTRE.lon);
    expect(h.maxLon - h.minLon).toBeLessThan(1.2);
    expect(h.maxLat - h.minLat).toBeLessThan(0.6);
  });

  it("has the world archive's layer names except boundary, and says the region is invented", async () => {
    const meta = (await archive.getMetadata()) as { vector_layers: { id: string }[]; attribution: string };
    expect(meta.vector_layers.map((l) => l.id)).toEqual(["land", "water", "place"]);
    expect(meta.attribution).toMatch(/invented/i);
  });

  it("has land at the island's centre at every zoom, and sea just off it", async () => {
    for (const z of [0, 4, 8, 10, 12]) expect(await covers("land", ISLAND_CENTRE.lon, ISLAND_CENTRE.lat, z), `z${z}`).toBe(true);
    expect(await covers("land", ISLAND_CENTRE.lon + 1, ISLAND_CENTRE.lat, 8)).toBe(false);
  });

  it("draws Marrow Water as water, cut out of the land", async () => {
    const ring = lakes()[0]?.ring ?? [];
    const lon = ring.reduce((s, p) => s + p[0], 0) / ring.length;
    const lat = ring.reduce((s, p) => s + p[1], 0) / ring.length;
    expect(await covers("water", lon, lat, 12)).toBe(true);
    expect(await covers("land", lon, lat, 12)).toBe(false);
  });

  it("labels every invented place at z12 with the world archive's properties", async () => {
    for (const p of PLACES) {
      const [lon, lat] = toLonLat(p.eastM, p.northM);
      const layer = (await tile(lon, lat, 12))?.vt.layers.place;
      const props = Array.from({ length: layer?.length ?? 0 }, (_, i) => layer?.feature(i).properties);
      expect(props, p.name).toContainEqual(expect.objectContaining({ name: p.name, kind: p.kind, pop: p.pop, capital: 0 }));
      expect(props.every((q) => typeof q?.minzoom === "number")).toBe(true);
    }
  });
});
