/**
 * Browser-only helpers of the route map: loading MapLibre and the PMTiles protocol on demand, and putting the
 * route's sources, images and layers on a map. Imported by route-map.tsx inside effects only; maplibre-gl
 * itself is loaded with a dynamic import, so nothing here runs during server rendering or prerendering.
 */
import type { GeoJSONSource, Map as MlMap } from "maplibre-gl";
import { BASEMAP_FIRST_LABEL_LAYER } from "@/lib/map/basemap-style";
import type { RouteView } from "@/lib/route";
import type { UnitSystem } from "@/lib/units";
import type { RouteColouring } from "./grade-colours";
import { ROUTE_INK } from "./grade-colours";
import { badgeImage } from "./map-badges";
import { BADGE_IMAGES, ROUTE_LINE_LAYER_COUNT, ROUTE_SOURCES, routeLayers, routeSourceData } from "./route-layers";

/** The maplibre-gl module (v6 has no default export: use the namespace). */
export type MapLib = typeof import("maplibre-gl");

/** Where the world archive is served (public/tiles, with HTTP Range). */
export const WORLD_ARCHIVE_URL = "/tiles/world.pmtiles";

/**
 * Where MapLibre's worker is served: maplibre-gl 6 loads it as a module next to its own bundle, which is not
 * in Next's chunks, so scripts/copy-map-worker.mjs copies it to public/ on every install.
 */
export const MAP_WORKER_URL = "/maplibre-gl-worker.mjs";

let loading: Promise<MapLib> | null = null;

/**
 * Loads maplibre-gl and pmtiles once per page, sets the worker URL and registers the `pmtiles://` protocol
 * (protocols are global to MapLibre, so registering per map would stack handlers).
 */
export function loadMapLib(): Promise<MapLib> {
  loading ??= Promise.all([import("maplibre-gl"), import("pmtiles")]).then(([ml, pm]) => {
    ml.setWorkerUrl(MAP_WORKER_URL);
    ml.addProtocol("pmtiles", new pm.Protocol().tile);
    return ml;
  });
  loading.catch(() => {
    loading = null; // let a later map try again, e.g. after a flaky network
  });
  return loading;
}

/**
 * The label font family MapLibre should draw with: the first family of the element's computed font (the
 * app's next/font family), waited for so that the first glyphs are not drawn with a fallback font.
 * @param el an element inside the map's container
 */
export async function readyLabelFont(el: HTMLElement): Promise<string> {
  const family = getComputedStyle(el).fontFamily.split(",")[0]?.replace(/["']/g, "").trim() || "Inter Variable";
  const timeout = new Promise((resolve) => setTimeout(resolve, 1500));
  const fonts = Promise.all([400, 600].map((w) => document.fonts.load(`${w} 12px "${family}"`))).catch(() => undefined);
  await Promise.race([fonts, timeout]);
  return family;
}

/**
 * Adds the route (images, sources, layers) to a map whose style has loaded. The line layers go under the
 * basemap's labels; markers go on top.
 */
export function addRoute(map: MlMap, view: RouteView, colouring: RouteColouring, system: UnitSystem, fontFamily: string): void {
  const km = badgeImage("#ffffff", ROUTE_INK.casing);
  const descent = badgeImage(ROUTE_INK.descent, "#ffffff");
  if (!map.hasImage(BADGE_IMAGES.km)) map.addImage(BADGE_IMAGES.km, km.image, km.options);
  if (!map.hasImage(BADGE_IMAGES.descent)) map.addImage(BADGE_IMAGES.descent, descent.image, descent.options);
  const data = routeSourceData(view, colouring, system);
  map.addSource(ROUTE_SOURCES.line, { type: "geojson", data: data.line });
  map.addSource(ROUTE_SOURCES.descents, { type: "geojson", data: data.descents });
  map.addSource(ROUTE_SOURCES.points, { type: "geojson", data: data.points });
  const below = map.getLayer(BASEMAP_FIRST_LABEL_LAYER) ? BASEMAP_FIRST_LABEL_LAYER : undefined;
  routeLayers(fontFamily).forEach((layer, i) => map.addLayer(layer, i < ROUTE_LINE_LAYER_COUNT ? below : undefined));
}

/** Replaces the route's data after the view, the colouring or the units changed. */
export function updateRoute(map: MlMap, view: RouteView, colouring: RouteColouring, system: UnitSystem): void {
  const data = routeSourceData(view, colouring, system);
  map.getSource<GeoJSONSource>(ROUTE_SOURCES.line)?.setData(data.line);
  map.getSource<GeoJSONSource>(ROUTE_SOURCES.descents)?.setData(data.descents);
  map.getSource<GeoJSONSource>(ROUTE_SOURCES.points)?.setData(data.points);
}

/**
 * Padding for fitting the route: room for the markers, the "Start"/"End" labels (drawn beside their dots) and
 * the controls, less on a phone.
 */
export function fitPadding(el: HTMLElement): { top: number; bottom: number; left: number; right: number } {
  const base = Math.round(Math.min(56, Math.max(24, Math.min(el.clientWidth, el.clientHeight) * 0.1)));
  return { top: base, bottom: base + 12, left: base + 12, right: base + 24 };
}

/** The hover marker's element: an ink dot in a white ring (neutral, so it never reads as a colour class). */
export function hoverMarkerElement(): HTMLElement {
  const el = document.createElement("div");
  el.setAttribute("data-testid", "route-map-hover-marker");
  el.setAttribute("aria-hidden", "true");
  Object.assign(el.style, {
    width: "16px",
    height: "16px",
    borderRadius: "9999px",
    background: ROUTE_INK.hover,
    border: "3px solid #ffffff",
    boxShadow: "0 0 0 1.5px rgb(22 35 42 / 0.55), 0 1px 4px rgb(22 35 42 / 0.35)",
    pointerEvents: "none",
  });
  return el;
}
