/**
 * Cuts label points into tiles without a buffer: each point goes into exactly one tile per zoom level, so a
 * label is never placed twice by neighbouring tiles.
 */
import type { GeoJSONVTFeature, GeoJSONVTTile } from "@maplibre/geojson-vt";
import type { PlacePoint } from "./sources";

/** Web-mercator x in [0, 1) for a longitude in degrees. */
export function mercatorX(lon: number): number {
  const x = (lon + 180) / 360;
  return x - Math.floor(x);
}

/** Web-mercator y in [0, 1] (0 at ~85.05°N) for a latitude in degrees. */
export function mercatorY(lat: number): number {
  const sin = Math.sin((lat * Math.PI) / 180);
  const y = 0.5 - (0.25 * Math.log((1 + sin) / (1 - sin))) / Math.PI;
  return Math.min(1, Math.max(0, y));
}

/** Key of a tile in the maps returned here. */
export function tileKey(z: number, x: number, y: number): string {
  return `${z}/${x}/${y}`;
}

/**
 * Builds the `place` layer of every tile that holds a label point.
 * @param points label points in priority order (kept in that order inside each tile)
 * @param maxZoom highest zoom level to cut
 * @param extent tile extent in MVT units
 * @returns tiles by `z/x/y` key, geometry in tile coordinates
 */
export function tilePlaces(points: readonly PlacePoint[], maxZoom: number, extent: number): Map<string, GeoJSONVTTile> {
  const tiles = new Map<string, GeoJSONVTTile>();
  for (const p of points) {
    const mx = mercatorX(p.lon);
    const my = mercatorY(p.lat);
    for (let z = p.minzoom; z <= maxZoom; z++) {
      const n = 2 ** z;
      const tx = Math.min(n - 1, Math.floor(mx * n));
      const ty = Math.min(n - 1, Math.floor(my * n));
      const key = tileKey(z, tx, ty);
      let tile = tiles.get(key);
      if (!tile) {
        tile = { features: [] };
        tiles.set(key, tile);
      }
      const feature: GeoJSONVTFeature = {
        type: 1,
        geometry: [[Math.round((mx * n - tx) * extent), Math.round((my * n - ty) * extent)]],
        tags: { name: p.name, kind: p.kind, pop: p.pop, minzoom: p.minzoom, capital: p.capital },
      };
      tile.features.push(feature);
    }
  }
  return tiles;
}
