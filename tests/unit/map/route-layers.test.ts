/**
 * The route's sources and layers on the invented "Kestrel Gap" fixture (two descents, two segments with a gap):
 * what is drawn, in which order, and that MapLibre's style validator accepts it.
 */
import { validateStyleMin } from "@maplibre/maplibre-gl-style-spec";
import { describe, expect, it } from "vitest";
import { gradeColour, gradeColouring, type RouteColouring } from "@/components/route-map/grade-colours";
import { ROUTE_LINE_LAYER_COUNT, ROUTE_SOURCES, routeLayers, routeSourceData } from "@/components/route-map/route-layers";
import { basemapStyle } from "@/lib/map/basemap-style";
import { kestrelView } from "./line-fixtures";

const view = kestrelView();

describe("routeSourceData", () => {
  const data = routeSourceData(view, gradeColouring, "metric");

  it("colours every drawn run by its grade and leaves the gap undrawn", () => {
    const gapAt = view.line.gapAfter.indexOf(1);
    expect(gapAt).toBeGreaterThan(0);
    const gapStart = [view.line.lon[gapAt], view.line.lat[gapAt]];
    const gapEnd = [view.line.lon[gapAt + 1], view.line.lat[gapAt + 1]];
    for (const f of data.line.features) {
      const c = f.geometry.coordinates;
      for (let k = 0; k < c.length - 1; k++) expect([c[k], c[k + 1]]).not.toEqual([gapStart, gapEnd]);
    }
    const colours = new Set(data.line.features.map((f) => f.properties.colour));
    for (const g of view.line.grade.slice(0, -1)) if (g !== 0) expect(colours).toContain(gradeColour(g));
  });

  it("marks the descent runs and slices each descent (split at the gap)", () => {
    expect(data.line.features.some((f) => f.properties.descent === 1)).toBe(true);
    expect(data.descents.features).toHaveLength(view.descents.length);
    expect(data.descents.features[0]!.properties.number).toBe(1);
  });

  it("has a km marker per whole km, numbered descents, a start and an end", () => {
    const kinds = data.points.features.map((f) => f.properties);
    const km = Math.floor(view.stats.lengthM / 1000 - 0.25);
    expect(kinds.filter((p) => p.kind === "km").map((p) => p.label)).toEqual(Array.from({ length: km }, (_, i) => String(i + 1)));
    expect(kinds.filter((p) => p.kind === "descent").map((p) => p.label)).toEqual(view.descents.map((_, i) => `↓${i + 1}`));
    expect(kinds.filter((p) => p.kind === "start" || p.kind === "end").map((p) => p.label)).toEqual(["Start", "End"]);
    const start = data.points.features.find((f) => f.properties.kind === "start")!;
    expect(start.geometry.coordinates).toEqual([view.line.lon[0], view.line.lat[0]]);
  });

  it("counts miles in imperial units (4.5 km is 2.8 mi: markers 1 and 2)", () => {
    const mi = routeSourceData(view, gradeColouring, "imperial").points.features.filter((f) => f.properties.kind === "km");
    expect(mi.map((f) => f.properties.label)).toEqual(["1", "2"]);
  });

  it("takes any colouring: the colour-by function decides, the layers do not change", () => {
    const stripes: RouteColouring = { id: "test", title: "Test", legend: [], colourOf: (s) => (s.fromM < 2000 ? "#000001" : "#000002") };
    const colours = routeSourceData(view, stripes, "metric").line.features.map((f) => f.properties.colour);
    expect(new Set(colours)).toEqual(new Set(["#000001", "#000002"]));
  });
});

describe("routeLayers", () => {
  const layers = routeLayers("Inter Variable");

  it("puts the band, casing and coloured line first (they go under the labels) and markers after", () => {
    expect(layers.slice(0, ROUTE_LINE_LAYER_COUNT).map((l) => l.id)).toEqual(["route-descent-band", "route-casing", "route-colour"]);
    expect(layers.slice(ROUTE_LINE_LAYER_COUNT).every((l) => l.type === "symbol" || l.type === "circle")).toBe(true);
  });

  it("is valid MapLibre style-spec together with the basemap and the route sources", () => {
    const base = basemapStyle("/tiles/world.pmtiles");
    const data = routeSourceData(view, gradeColouring, "metric");
    const style = {
      ...base,
      sources: {
        ...base.sources,
        [ROUTE_SOURCES.line]: { type: "geojson" as const, data: data.line },
        [ROUTE_SOURCES.descents]: { type: "geojson" as const, data: data.descents },
        [ROUTE_SOURCES.points]: { type: "geojson" as const, data: data.points },
      },
      layers: [...base.layers, ...layers],
    };
    expect(validateStyleMin(style).map((e) => e.message)).toEqual([]);
  });

  it("downloads no glyphs: marker text uses the page's font family", () => {
    for (const l of layers) if (l.type === "symbol") expect(l.layout?.["text-font"]).toContain("Inter Variable");
  });
});
