/**
 * Cuts the basemap layers into gzip-compressed Mapbox Vector Tiles and packs them into a PMTiles archive.
 * No file or network I/O happens here; scripts/build-tiles.ts reads the inputs and writes the result.
 */
import { gzipSync } from "node:zlib";
import { GeoJSONVT, type GeoJSONVTTile } from "@maplibre/geojson-vt";
import { fromGeojsonVt } from "@maplibre/vt-pbf";
import { buildPmtiles, type ArchiveStats, type TileBlob } from "./pmtiles-writer";
import { tileKey, tilePlaces } from "./places";
import type { PlacePoint } from "./sources";
import { BASEMAP_ATTRIBUTION, BASEMAP_MAX_ZOOM } from "../../lib/map/basemap-style";

/** Highest zoom level stored; MapLibre overzooms above it (shared with the style). */
export const MAX_ZOOM = BASEMAP_MAX_ZOOM;
/** MVT extent of every tile. */
export const EXTENT = 4096;
/** Latitude limit of web mercator, degrees. */
export const MERCATOR_MAX_LAT = 85.0511287798066;

/** Inputs of the archive, already planar (see antimeridian.ts). */
export interface BasemapInputs {
  land: GeoJSON.FeatureCollection;
  boundaries: GeoJSON.FeatureCollection;
  /** Label points in priority order. */
  places: readonly PlacePoint[];
}

/** The archive bytes and what went into them. */
export interface BasemapArchive {
  bytes: Buffer;
  stats: ArchiveStats & { rawTileBytes: number };
}

const TILER_OPTIONS = { maxZoom: MAX_ZOOM, extent: EXTENT, buffer: 64, tolerance: 3 } as const;

function nonEmpty(tile: GeoJSONVTTile | null): GeoJSONVTTile | undefined {
  return tile && tile.features.length > 0 ? tile : undefined;
}

/**
 * Tiles land (polygons), boundary (lines) and place (points) at z0–8 and builds the PMTiles archive.
 * The output depends only on the inputs (no timestamps; tiles in tile-ID order).
 */
export function buildBasemapArchive(inputs: BasemapInputs): BasemapArchive {
  const land = new GeoJSONVT(inputs.land, TILER_OPTIONS);
  const boundaries = new GeoJSONVT(inputs.boundaries, TILER_OPTIONS);
  const places = tilePlaces(inputs.places, MAX_ZOOM, EXTENT);
  const tiles: TileBlob[] = [];
  let rawTileBytes = 0;

  const emit = (z: number, x: number, y: number, layers: Record<string, GeoJSONVTTile | undefined>): void => {
    const present: Record<string, GeoJSONVTTile> = {};
    for (const [name, tile] of Object.entries(layers)) if (tile) present[name] = tile;
    const raw = fromGeojsonVt(present, { version: 2, extent: EXTENT });
    rawTileBytes += raw.length;
    tiles.push({ z, x, y, data: gzipSync(raw, { level: 9 }) });
  };

  // Depth-first over the tiles that hold land or borders; a tile without either has no children with them.
  const visit = (z: number, x: number, y: number): void => {
    const landTile = nonEmpty(land.getTile(z, x, y));
    const boundaryTile = nonEmpty(boundaries.getTile(z, x, y));
    if (!landTile && !boundaryTile) return;
    const key = tileKey(z, x, y);
    emit(z, x, y, { land: landTile, boundary: boundaryTile, place: places.get(key) });
    places.delete(key);
    if (z < MAX_ZOOM) for (const [dx, dy] of [[0, 0], [1, 0], [0, 1], [1, 1]] as const) visit(z + 1, 2 * x + dx, 2 * y + dy);
  };
  visit(0, 0, 0);
  // Label points on land too small to survive simplification at their zoom level.
  for (const [key, placeTile] of [...places].sort(([a], [b]) => a.localeCompare(b))) {
    const [z, x, y] = key.split("/").map(Number) as [number, number, number];
    emit(z, x, y, { place: placeTile });
  }

  const { bytes, stats } = buildPmtiles(tiles, {
    minZoom: 0,
    maxZoom: MAX_ZOOM,
    bounds: [-180, -MERCATOR_MAX_LAT, 180, MERCATOR_MAX_LAT],
    center: [10, 30, 2],
    metadata: {
      name: "Fadeline world basemap",
      description: "Natural Earth 1:10m land and country borders, GeoNames places; built by scripts/build-tiles.ts",
      version: "1",
      type: "baselayer",
      format: "pbf",
      attribution: BASEMAP_ATTRIBUTION,
      vector_layers: [
        { id: "land", description: "Land polygons", minzoom: 0, maxzoom: MAX_ZOOM, fields: {} },
        { id: "boundary", description: "Land borders between countries", minzoom: 0, maxzoom: MAX_ZOOM, fields: { kind: "String" } },
        {
          id: "place",
          description: "Country and populated-place label points",
          minzoom: 1,
          maxzoom: MAX_ZOOM,
          fields: { name: "String", kind: "String", pop: "Number", minzoom: "Number", capital: "Number" },
        },
      ],
    },
  });
  return { bytes, stats: { ...stats, rawTileBytes } };
}
