/**
 * Reads the built world basemap (public/tiles/world.pmtiles) back with the `pmtiles` reader and decodes tiles.
 * The test command builds the archive first (scripts/build-tiles.ts); a missing archive is a failure.
 */
import { existsSync } from "node:fs";
import { open, type FileHandle } from "node:fs/promises";
import { gunzipSync } from "node:zlib";
import { VectorTile } from "@mapbox/vector-tile";
import { PbfReader } from "pbf";
import { Compression, PMTiles, type Source } from "pmtiles";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { countAntimeridianSteps, planarPolygon, planarRing, type Position } from "@/scripts/tiles/antimeridian";

const ARCHIVE = "public/tiles/world.pmtiles";

/** A pmtiles Source over a local file. */
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
  if (!existsSync(ARCHIVE)) {
    throw new Error(`${ARCHIVE} is missing: build it with \`npx tsx scripts/build-tiles.ts\` (the test command does this first)`);
  }
  handle = await open(ARCHIVE, "r");
  archive = new PMTiles(new FileHandleSource(handle), undefined, decompress);
});

afterAll(async () => {
  await handle?.close();
});

/** The tile containing a position at a zoom level (web mercator). */
function tileAt(lon: number, lat: number, z: number): [number, number] {
  const n = 2 ** z;
  const sin = Math.sin((lat * Math.PI) / 180);
  const y = 0.5 - (0.25 * Math.log((1 + sin) / (1 - sin))) / Math.PI;
  return [Math.floor(((lon + 180) / 360) * n), Math.floor(y * n)];
}

async function decodeTile(z: number, x: number, y: number): Promise<VectorTile> {
  const tile = await archive.getZxy(z, x, y);
  if (!tile) throw new Error(`tile ${z}/${x}/${y} is not in the archive`);
  return new VectorTile(new PbfReader(new Uint8Array(tile.data)));
}

function inRing(pt: Position, ring: readonly number[][]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i] as number[];
    const b = ring[j] as number[];
    const [ax, ay, bx, by] = [a[0] as number, a[1] as number, b[0] as number, b[1] as number];
    if (ay > pt[1] !== by > pt[1] && pt[0] < ((bx - ax) * (pt[1] - ay)) / (by - ay) + ax) inside = !inside;
  }
  return inside;
}

/** Whether the `land` layer of the tile covering (lon, lat) at zoom z contains that point. */
async function isLand(lon: number, lat: number, z: number): Promise<boolean> {
  const [x, y] = tileAt(lon, lat, z);
  const tile = await archive.getZxy(z, x, y);
  if (!tile) return false; // a missing tile is open water
  const layer = new VectorTile(new PbfReader(new Uint8Array(tile.data))).layers.land;
  if (!layer) return false;
  for (let i = 0; i < layer.length; i++) {
    const g = layer.feature(i).toGeoJSON(x, y, z).geometry;
    const polygons = g.type === "Polygon" ? [g.coordinates] : g.type === "MultiPolygon" ? g.coordinates : [];
    for (const [outer, ...holes] of polygons) {
      if (outer && inRing([lon, lat], outer) && !holes.some((h) => inRing([lon, lat], h))) return true;
    }
  }
  return false;
}

describe("world.pmtiles archive", () => {
  it("has a PMTiles v3 header for gzip MVT at z0–8 covering the mercator world", async () => {
    const h = await archive.getHeader();
    expect(h.specVersion).toBe(3);
    expect(h.tileType).toBe(1);
    expect(h.tileCompression).toBe(Compression.Gzip);
    expect(h.clustered).toBe(true);
    expect([h.minZoom, h.maxZoom]).toEqual([0, 8]);
    expect(h.minLon).toBeCloseTo(-180, 5);
    expect(h.maxLon).toBeCloseTo(180, 5);
    expect(h.minLat).toBeCloseTo(-85.0511, 3);
    expect(h.maxLat).toBeCloseTo(85.0511, 3);
    expect(h.numAddressedTiles).toBeGreaterThan(20_000);
    expect(h.numTileContents).toBeLessThan(h.numAddressedTiles);
  });

  it("describes its layers and credits its data in the metadata", async () => {
    const meta = (await archive.getMetadata()) as { vector_layers: { id: string }[]; attribution: string };
    expect(meta.vector_layers.map((l) => l.id)).toEqual(["land", "boundary", "place"]);
    expect(meta.attribution).toContain("Natural Earth");
    expect(meta.attribution).toContain("GeoNames");
    expect(meta.attribution).toContain("CC BY 4.0");
  });

  it("decodes the world tile with land and borders", async () => {
    const tile = await decodeTile(0, 0, 0);
    expect(tile.layers.land?.length).toBeGreaterThan(100);
    expect(tile.layers.boundary?.length).toBeGreaterThan(10);
    expect(tile.layers.land?.extent).toBe(4096);
  });

  it("decodes a z8 tile from a leaf directory with villages in the Alps", async () => {
    const [x, y] = tileAt(10.7, 46.6, 8);
    const tile = await decodeTile(8, x, y);
    const place = tile.layers.place;
    expect(place?.length).toBeGreaterThan(20);
    const kinds = new Set(Array.from({ length: place?.length ?? 0 }, (_, i) => place?.feature(i).properties.kind));
    expect(kinds.has("village")).toBe(true);
  });

  it("stores cities from z2 by population and countries as labels", async () => {
    const [x, y] = tileAt(11.58, 48.14, 5);
    const place = (await decodeTile(5, x, y)).layers.place;
    const names = Array.from({ length: place?.length ?? 0 }, (_, i) => place?.feature(i).properties);
    expect(names).toContainEqual(expect.objectContaining({ name: "Munich", kind: "city" }));
    expect(names.every((p) => typeof p?.minzoom === "number" && p.minzoom <= 5)).toBe(true);
    const [wx, wy] = tileAt(10, 51, 3);
    const countries = (await decodeTile(3, wx, wy)).layers.place;
    const countryNames = Array.from({ length: countries?.length ?? 0 }, (_, i) => countries?.feature(i).properties);
    expect(countryNames).toContainEqual(expect.objectContaining({ name: "Germany", kind: "country" }));
  });

  it("has land far from any coast (0°N 20°E at z4) and at every zoom", async () => {
    expect(await isLand(20, 0, 4)).toBe(true);
    for (const z of [0, 2, 6, 8]) expect(await isLand(20, 0, z)).toBe(true);
  });

  it("has water in open ocean", async () => {
    expect(await isLand(-30, 30, 4)).toBe(false);
    expect(await isLand(-140, -30, 3)).toBe(false);
  });

  // Regression for the spike's defect: stitched antimeridian rings turned into world-wide edges that flipped land
  // and water between ~65°N and ~69°N (Chukotka) and along ~16.5°S (Fiji), and left Antarctica unclosed.
  it("has no phantom land bands from antimeridian-crossing rings", async () => {
    for (const z of [2, 4]) {
      expect(await isLand(-5, 67, z)).toBe(false); // Norwegian Sea
      expect(await isLand(-20, 68, z)).toBe(false); // Greenland Sea
      expect(await isLand(-168.5, 68.5, z)).toBe(false); // Chukchi Sea
      expect(await isLand(-30, -16.8, z)).toBe(false); // South Atlantic
      expect(await isLand(-120, -16.5, z)).toBe(false); // South Pacific
    }
  });

  it("keeps Arctic and Antarctic land in the top and bottom tile rows", async () => {
    for (const z of [2, 4]) {
      expect(await isLand(100, 75, z)).toBe(true); // Taymyr
      expect(await isLand(-40, 75, z)).toBe(true); // Greenland
      expect(await isLand(0, -84.9, z)).toBe(true); // Antarctica at the mercator edge
      expect(await isLand(140, -80, z)).toBe(true);
    }
  });
});

describe("antimeridian handling", () => {
  it("unwraps a ring that crosses ±180° and keeps the hole next to its exterior", () => {
    const outer: Position[] = [[-180, 60], [170, 60], [170, 70], [-175, 70], [-175, 60], [-180, 60]];
    const hole: Position[] = [[172, 62], [174, 62], [174, 64], [172, 62]];
    const [o, h] = planarPolygon([outer, hole]);
    expect(countAntimeridianSteps([o ?? [], h ?? []])).toBe(0);
    const xs = (o ?? []).map((p) => p[0]);
    expect(Math.min(...xs)).toBe(170);
    expect(Math.max(...xs)).toBe(185);
    expect((h ?? [])[0]?.[0]).toBe(172);
  });

  it("closes a ring around the south pole along the pole", () => {
    const ring: Position[] = [[-180, -70], [-60, -75], [60, -72], [180, -70]];
    const closed = planarRing([...ring, [-180, -70]]);
    expect(countAntimeridianSteps([closed])).toBe(0);
    const polar = closed.filter((p) => p[1] === -90);
    expect(polar.map((p) => p[0])).toEqual([180, -180]);
    expect(closed[0]).toEqual(closed[closed.length - 1]);
  });
});
