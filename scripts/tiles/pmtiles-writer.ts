/**
 * A small, deterministic PMTiles v3 writer (the `pmtiles` npm package only reads).
 *
 * Layout: 127-byte header | root directory | JSON metadata | leaf directories | tile data.
 * Tile contents are deduplicated by SHA-1, consecutive tile IDs with the same content become one run-length
 * entry, and the data is clustered (ordered by tile ID). When the root directory does not fit in the first
 * 16 KiB the entries move into leaf directories. Spec: https://github.com/protomaps/PMTiles/blob/main/spec/v3/spec.md
 */
import { createHash } from "node:crypto";
import { gzipSync } from "node:zlib";
import { zxyToTileId } from "pmtiles";

/** One tile to store: position and its bytes, already compressed as `tileCompression` says. */
export interface TileBlob {
  z: number;
  x: number;
  y: number;
  data: Uint8Array;
}

/** Archive-level fields for the header and metadata. */
export interface ArchiveOptions {
  minZoom: number;
  maxZoom: number;
  /** [west, south, east, north] in degrees. */
  bounds: [number, number, number, number];
  /** [longitude, latitude, zoom]. */
  center: [number, number, number];
  /** JSON metadata (vector_layers, attribution, …); stored gzip-compressed. */
  metadata: Record<string, unknown>;
}

/** Counts reported after writing. */
export interface ArchiveStats {
  addressedTiles: number;
  tileEntries: number;
  tileContents: number;
  leafDirectories: number;
}

interface Entry {
  tileId: number;
  offset: number;
  length: number;
  runLength: number;
}

const HEADER_BYTES = 127;
const ROOT_LIMIT = 16384;

/** Appends an unsigned varint; uses arithmetic so IDs above 2^32 stay exact. */
function pushVarint(out: number[], value: number): void {
  let v = value;
  while (v >= 0x80) {
    out.push((v % 0x80) | 0x80);
    v = Math.floor(v / 0x80);
  }
  out.push(v);
}

function serializeDirectory(entries: readonly Entry[]): Buffer {
  const out: number[] = [];
  pushVarint(out, entries.length);
  let lastId = 0;
  for (const e of entries) {
    pushVarint(out, e.tileId - lastId);
    lastId = e.tileId;
  }
  for (const e of entries) pushVarint(out, e.runLength);
  for (const e of entries) pushVarint(out, e.length);
  entries.forEach((e, i) => {
    const prev = i > 0 ? entries[i - 1] : undefined;
    pushVarint(out, prev && e.offset === prev.offset + prev.length ? 0 : e.offset + 1);
  });
  return gzipSync(Buffer.from(out), { level: 9 });
}

/** Splits entries into leaves until the root directory fits in the first 16 KiB with the header. */
function buildDirectories(entries: readonly Entry[]): { root: Buffer; leaves: Buffer; leafCount: number } {
  const root = serializeDirectory(entries);
  if (HEADER_BYTES + root.length <= ROOT_LIMIT) return { root, leaves: Buffer.alloc(0), leafCount: 0 };
  for (let leafSize = 4096; ; leafSize *= 2) {
    const rootEntries: Entry[] = [];
    const leafParts: Buffer[] = [];
    let offset = 0;
    for (let i = 0; i < entries.length; i += leafSize) {
      const chunk = entries.slice(i, i + leafSize);
      const leaf = serializeDirectory(chunk);
      rootEntries.push({ tileId: chunk[0]?.tileId ?? 0, offset, length: leaf.length, runLength: 0 });
      leafParts.push(leaf);
      offset += leaf.length;
    }
    const leafRoot = serializeDirectory(rootEntries);
    if (HEADER_BYTES + leafRoot.length <= ROOT_LIMIT) {
      return { root: leafRoot, leaves: Buffer.concat(leafParts), leafCount: leafParts.length };
    }
  }
}

function writeUint64(buf: Buffer, offset: number, value: number): void {
  buf.writeBigUInt64LE(BigInt(value), offset);
}

function e7(degrees: number): number {
  return Math.round(degrees * 1e7);
}

/**
 * Builds a complete PMTiles v3 archive for gzip-compressed MVT tiles.
 * @param tiles tiles in any order; a position must not repeat
 * @param options header and metadata fields
 * @returns the archive bytes and counts
 */
export function buildPmtiles(tiles: readonly TileBlob[], options: ArchiveOptions): { bytes: Buffer; stats: ArchiveStats } {
  const sorted = tiles
    .map((t) => ({ id: zxyToTileId(t.z, t.x, t.y), data: t.data }))
    .sort((a, b) => a.id - b.id);
  const entries: Entry[] = [];
  const contentOffsets = new Map<string, number>();
  const dataParts: Uint8Array[] = [];
  let dataLength = 0;
  for (const tile of sorted) {
    const hash = createHash("sha1").update(tile.data).digest("hex");
    let offset = contentOffsets.get(hash);
    if (offset === undefined) {
      offset = dataLength;
      contentOffsets.set(hash, offset);
      dataParts.push(tile.data);
      dataLength += tile.data.length;
    }
    const last = entries[entries.length - 1];
    if (last && last.tileId === tile.id) throw new Error(`duplicate tile id ${tile.id}`);
    if (last && last.offset === offset && last.tileId + last.runLength === tile.id) last.runLength++;
    else entries.push({ tileId: tile.id, offset, length: tile.data.length, runLength: 1 });
  }

  const { root, leaves, leafCount } = buildDirectories(entries);
  const metadata = gzipSync(Buffer.from(JSON.stringify(options.metadata), "utf8"), { level: 9 });
  const rootOffset = HEADER_BYTES;
  const metadataOffset = rootOffset + root.length;
  const leafOffset = metadataOffset + metadata.length;
  const dataOffset = leafOffset + leaves.length;

  const header = Buffer.alloc(HEADER_BYTES);
  header.write("PMTiles", 0, "latin1");
  header.writeUInt8(3, 7);
  writeUint64(header, 8, rootOffset);
  writeUint64(header, 16, root.length);
  writeUint64(header, 24, metadataOffset);
  writeUint64(header, 32, metadata.length);
  writeUint64(header, 40, leafOffset);
  writeUint64(header, 48, leaves.length);
  writeUint64(header, 56, dataOffset);
  writeUint64(header, 64, dataLength);
  writeUint64(header, 72, sorted.length);
  writeUint64(header, 80, entries.length);
  writeUint64(header, 88, dataParts.length);
  header.writeUInt8(1, 96); // clustered
  header.writeUInt8(2, 97); // internal compression: gzip
  header.writeUInt8(2, 98); // tile compression: gzip
  header.writeUInt8(1, 99); // tile type: MVT
  header.writeUInt8(options.minZoom, 100);
  header.writeUInt8(options.maxZoom, 101);
  const [west, south, east, north] = options.bounds;
  header.writeInt32LE(e7(west), 102);
  header.writeInt32LE(e7(south), 106);
  header.writeInt32LE(e7(east), 110);
  header.writeInt32LE(e7(north), 114);
  header.writeUInt8(options.center[2], 118);
  header.writeInt32LE(e7(options.center[0]), 119);
  header.writeInt32LE(e7(options.center[1]), 123);

  const bytes = Buffer.concat([header, root, metadata, leaves, ...dataParts]);
  return {
    bytes,
    stats: {
      addressedTiles: sorted.length,
      tileEntries: entries.length,
      tileContents: dataParts.length,
      leafDirectories: leafCount,
    },
  };
}
