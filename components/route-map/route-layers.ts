/**
 * The route's GeoJSON sources and MapLibre layers, built from a {@link RouteView}. Pure (types only from
 * maplibre-gl), so the layer order and the data can be unit-tested without WebGL.
 *
 * Layer order, bottom to top: a soft band under descents, the dark casing, the coloured line (all three below
 * the basemap's labels, so place names stay readable), then km markers, descent badges and the start and end
 * markers above everything. The "Start"/"End" labels are always drawn and block nothing; of the rest MapLibre
 * places symbol layers from the top down, so descent badges win collisions over km markers, and among km
 * markers the round numbers win (`symbol-sort-key`).
 */
import type { FeatureCollection, LineString, MultiLineString, Point } from "geojson";
import type { ExpressionSpecification, LayerSpecification } from "maplibre-gl";
import type { RouteView } from "@/lib/route";
import { M_PER_MI, type UnitSystem } from "@/lib/units";
import { ROUTE_INK, type RouteColouring } from "./grade-colours";
import { colourRuns, distanceMarkers, markerStep, positionAtDistance, sliceLine } from "./geometry";

/** Source ids of the route. */
export const ROUTE_SOURCES = { line: "route-line", descents: "route-descents", points: "route-points" } as const;

/** Image ids of the marker badges (added with `map.addImage`, see map-badges.ts). */
export const BADGE_IMAGES = { km: "route-badge-km", descent: "route-badge-descent" } as const;

/** The three GeoJSON payloads of the route sources. */
export interface RouteSourceData {
  line: FeatureCollection<LineString, { colour: string; descent: 0 | 1 }>;
  descents: FeatureCollection<MultiLineString, { number: number }>;
  points: FeatureCollection<Point, { kind: "km" | "descent" | "start" | "end"; label: string; rank: number }>;
}

/**
 * GeoJSON for the route sources.
 * @param view the route view
 * @param colouring "colour by" rule of the line
 * @param system units of the km (or mi) markers
 */
export function routeSourceData(view: RouteView, colouring: RouteColouring, system: UnitSystem): RouteSourceData {
  const { line } = view;
  const runs = colourRuns(line, colouring.colourOf, view.descents);
  const unitM = system === "metric" ? 1000 : M_PER_MI;
  const lengthM = line.distanceM.at(-1) ?? 0;
  const step = markerStep(lengthM / unitM);
  const points: RouteSourceData["points"]["features"] = distanceMarkers(line, unitM, step).map((m) => ({
    type: "Feature",
    geometry: { type: "Point", coordinates: m.position },
    properties: { kind: "km", label: String(m.value), rank: m.rank },
  }));
  view.descents.forEach((d, i) => {
    const at = positionAtDistance(line, d.startDistanceM);
    if (at) points.push({ type: "Feature", geometry: { type: "Point", coordinates: at }, properties: { kind: "descent", label: `↓${i + 1}`, rank: 0 } });
  });
  const start = positionAtDistance(line, 0);
  const end = positionAtDistance(line, lengthM);
  if (start) points.push({ type: "Feature", geometry: { type: "Point", coordinates: start }, properties: { kind: "start", label: "Start", rank: 0 } });
  if (end) points.push({ type: "Feature", geometry: { type: "Point", coordinates: end }, properties: { kind: "end", label: "End", rank: 0 } });
  return {
    line: {
      type: "FeatureCollection",
      features: runs.map((r) => ({
        type: "Feature",
        geometry: { type: "LineString", coordinates: r.coordinates },
        properties: { colour: r.colour, descent: r.inDescent ? 1 : 0 },
      })),
    },
    descents: {
      type: "FeatureCollection",
      features: view.descents.map((d, i) => ({
        type: "Feature",
        geometry: { type: "MultiLineString", coordinates: sliceLine(line, d.startDistanceM, d.endDistanceM) },
        properties: { number: i + 1 },
      })),
    },
    points: { type: "FeatureCollection", features: points },
  };
}

/** Line width growing with zoom; descents wider. Values are CSS pixels at zoom 8 and 14. */
function width(plain: [number, number], descent: [number, number]): ExpressionSpecification {
  const pick = (a: number, b: number): ExpressionSpecification => ["case", ["==", ["get", "descent"], 1], b, a];
  return ["interpolate", ["linear"], ["zoom"], 8, pick(plain[0], descent[0]), 14, pick(plain[1], descent[1])];
}

const kind = (k: string): ExpressionSpecification => ["==", ["get", "kind"], k];

/**
 * The route layers, in drawing order. Add the first three before the basemap's first label layer and the
 * rest on top (see {@link ROUTE_LINE_LAYER_COUNT}).
 * @param fontFamily CSS family for marker text (the basemap's label family)
 */
export function routeLayers(fontFamily: string): LayerSpecification[] {
  const font = [fontFamily];
  const bold = [`${fontFamily} SemiBold`, fontFamily];
  return [
    {
      id: "route-descent-band",
      type: "line",
      source: ROUTE_SOURCES.descents,
      layout: { "line-join": "round", "line-cap": "round" },
      paint: {
        "line-color": ROUTE_INK.descent,
        "line-opacity": 0.26,
        "line-width": ["interpolate", ["linear"], ["zoom"], 8, 12, 14, 22],
        "line-blur": 2,
      },
    },
    {
      id: "route-casing",
      type: "line",
      source: ROUTE_SOURCES.line,
      layout: { "line-join": "round", "line-cap": "round" },
      paint: { "line-color": ROUTE_INK.casing, "line-width": width([4.5, 8], [7, 12]) },
    },
    {
      id: "route-colour",
      type: "line",
      source: ROUTE_SOURCES.line,
      layout: { "line-join": "round", "line-cap": "round" },
      paint: { "line-color": ["get", "colour"], "line-width": width([2.5, 5], [4.5, 8]) },
    },
    {
      id: "route-km-markers",
      type: "symbol",
      source: ROUTE_SOURCES.points,
      filter: kind("km"),
      layout: {
        "icon-image": BADGE_IMAGES.km,
        "icon-text-fit": "both",
        "icon-text-fit-padding": [1, 3, 1, 3],
        "text-field": ["get", "label"],
        "text-font": bold,
        "text-size": 11,
        "symbol-sort-key": ["get", "rank"],
        "icon-padding": 3,
      },
      paint: { "text-color": ROUTE_INK.casing },
    },
    {
      id: "route-descent-badges",
      type: "symbol",
      source: ROUTE_SOURCES.points,
      filter: kind("descent"),
      layout: {
        "icon-image": BADGE_IMAGES.descent,
        "icon-text-fit": "both",
        "icon-text-fit-padding": [1, 4, 1, 4],
        "text-field": ["get", "label"],
        "text-font": bold,
        "text-size": 12,
        "icon-anchor": "bottom",
        "text-anchor": "bottom",
        "text-offset": [0, -0.9],
      },
      paint: { "text-color": "#ffffff" },
    },
    {
      id: "route-ends",
      type: "circle",
      source: ROUTE_SOURCES.points,
      filter: ["any", kind("start"), kind("end")],
      paint: {
        "circle-radius": 7,
        "circle-color": ["case", kind("start"), ROUTE_INK.start, ROUTE_INK.end],
        "circle-stroke-color": "#ffffff",
        "circle-stroke-width": 2.5,
      },
    },
    {
      id: "route-end-labels",
      type: "symbol",
      source: ROUTE_SOURCES.points,
      filter: ["any", kind("start"), kind("end")],
      layout: {
        "text-field": ["get", "label"],
        "text-font": bold,
        "text-size": 13,
        "text-variable-anchor": ["left", "right", "top", "bottom"],
        "text-radial-offset": 1,
        "text-allow-overlap": true,
        // Always drawn but blocking nothing, so a descent that begins at the start keeps its badge.
        "text-ignore-placement": true,
      },
      paint: { "text-color": ROUTE_INK.casing, "text-halo-color": "#ffffff", "text-halo-width": 2 },
    },
  ];
}

/** How many of {@link routeLayers} (from the start) go below the basemap labels. */
export const ROUTE_LINE_LAYER_COUNT = 3;

/** Id of the route line layer (for pointer hit tests). */
export const ROUTE_LINE_LAYER = "route-colour";
