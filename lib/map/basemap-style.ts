/**
 * The MapLibre style of Fadeline's self-hosted world basemap (public/tiles/world.pmtiles, built by
 * scripts/build-tiles.ts). Pure and isomorphic: no Node or DOM imports.
 *
 * The look is deliberately quiet — pale land, soft grey-blue water, thin dashed borders, small grey labels —
 * so that a heat-coloured route line drawn on top carries all the colour on the map. There is no coastline
 * stroke: Natural Earth land is cut along ±180°, and a stroke would draw that cut across Chukotka and Fiji.
 *
 * Labels are rendered locally by MapLibre 6 from the CSS font family in `text-font` (no `glyphs` URL, so no
 * glyph download). The page must load that family (the app loads Inter as "Inter Variable").
 */
import type { ExpressionSpecification, LayerSpecification, StyleSpecification, SymbolLayerSpecification } from "maplibre-gl";

/** Colours of the basemap (any CSS colour MapLibre accepts). */
export interface BasemapColors {
  /** Oceans and seas (the map background). */
  water: string;
  /** Land fill. */
  land: string;
  /** Country borders. */
  boundary: string;
  /** City labels. */
  label: string;
  /** Town and village labels. */
  labelMuted: string;
  /** Country labels. */
  countryLabel: string;
  /** Halo behind every label (usually the land colour). */
  halo: string;
}

/** Built-in colour sets. */
export const BASEMAP_THEMES: Readonly<Record<"light" | "dark", Readonly<BasemapColors>>> = {
  light: {
    water: "#d3dde2",
    land: "#f3f1ec",
    boundary: "#aaa29a",
    label: "#43484e",
    labelMuted: "#6c7177",
    countryLabel: "#8a8580",
    halo: "#f3f1ec",
  },
  dark: {
    water: "#161c21",
    land: "#252a2f",
    boundary: "#59616a",
    label: "#c3c8cd",
    labelMuted: "#969ca3",
    countryLabel: "#7f878f",
    halo: "#1b2025",
  },
};

/** Options of {@link basemapStyle}. */
export interface BasemapStyleOptions {
  /** Built-in colour set; default `light`. */
  theme?: keyof typeof BASEMAP_THEMES;
  /** Colours that override the theme's. */
  colors?: Partial<BasemapColors>;
  /**
   * CSS font family for labels, already loaded by the page (e.g. through `@font-face`); default
   * `Inter Variable`. Only the first entry of a list is used and quotes are stripped, so next/font's
   * `style.fontFamily` can be passed as it is. Medium and SemiBold labels use the same family at weight
   * 500 / 600 (MapLibre reads the weight from a "<family> Medium" / "<family> SemiBold" name that falls back
   * to the family itself).
   */
  fontFamily?: string;
  /** Source id of the world archive; default `world`. */
  sourceId?: string;
  /** Regional archives drawn above the world layers, in order (later ones on top). */
  extracts?: readonly BasemapExtract[];
}

/**
 * A regional PMTiles archive with the world archive's layer names (`land`, `boundary`, `place`, and
 * optionally `water`). Its fills are drawn above the world fills, its borders above the world borders and its
 * labels with (above) the world labels, so a finer regional coastline and its places win where both exist.
 */
export interface BasemapExtract {
  /** Lower-case id (letters, digits, dashes); the source is `extract-<id>`, its layers `extract-<id>-…`. */
  id: string;
  /** Where the archive is served, e.g. `/tiles/demo-region.pmtiles` (see {@link pmtilesUrl}). */
  url: string;
  /** Data credit, plain text (escaped here, since MapLibre shows attributions as HTML). */
  attribution: string;
  /** Lowest zoom at which the extract is drawn (below it only the world shows); default: the archive's. */
  minzoom?: number;
  /** Highest zoom stored in the archive (MapLibre overzooms above it); default: the archive's. */
  maxzoom?: number;
}

/** Data credits of the world archive (HTML, shown by MapLibre's attribution control). */
export const BASEMAP_ATTRIBUTION =
  '<a href="https://www.naturalearthdata.com/">Natural Earth</a> (public domain) · ' +
  '<a href="https://www.geonames.org/">GeoNames</a> (CC BY 4.0)';

/** Highest zoom stored in the world archive; MapLibre overzooms above it. */
export const BASEMAP_MAX_ZOOM = 8;

/** Id of the lowest label layer: add route layers before it to keep labels on top, or after all to cover them. */
export const BASEMAP_FIRST_LABEL_LAYER = "basemap-place-village";

/**
 * Turns an archive location into a `pmtiles://` source URL for `pmtiles.Protocol`.
 * @param archiveUrl `pmtiles:///tiles/world.pmtiles`, `/tiles/world.pmtiles` or an absolute http(s) URL
 */
export function pmtilesUrl(archiveUrl: string): string {
  return archiveUrl.startsWith("pmtiles://") ? archiveUrl : `pmtiles://${archiveUrl}`;
}

interface LabelSpec {
  id: string;
  kinds: string[];
  font: string[];
  color: string;
  size: ExpressionSpecification;
  extraLayout?: SymbolLayerSpecification["layout"];
  minzoom?: number;
  maxzoom?: number;
}

function placeLabel(spec: LabelSpec, source: string, halo: string, idPrefix = "", minzoomFloor = 0): LayerSpecification {
  const minzoom = Math.max(spec.minzoom ?? 0, minzoomFloor);
  return {
    id: idPrefix ? `${idPrefix}-${spec.id.replace(/^basemap-/, "")}` : spec.id,
    type: "symbol",
    source,
    "source-layer": "place",
    ...(minzoom > 0 ? { minzoom } : {}),
    ...(spec.maxzoom === undefined ? {} : { maxzoom: spec.maxzoom }),
    filter: ["in", ["get", "kind"], ["literal", spec.kinds]],
    layout: {
      "text-field": ["get", "name"],
      "text-font": spec.font,
      "text-size": spec.size,
      "text-max-width": 8,
      "text-padding": 3,
      "symbol-sort-key": ["-", 0, ["get", "pop"]],
      ...spec.extraLayout,
    },
    paint: { "text-color": spec.color, "text-halo-color": halo, "text-halo-width": 1.4, "text-halo-blur": 0.5 },
  };
}

/** Escapes text for an HTML attribution string. */
function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => `&#${ch.charCodeAt(0)};`);
}

const zoomRamp = (...stops: number[]): ExpressionSpecification =>
  ["interpolate", ["linear"], ["zoom"], ...stops] as ExpressionSpecification;

/**
 * Builds the basemap style: background (water), land, country borders and place labels, with any regional
 * extracts layered above the world's (see {@link BasemapExtract}).
 * @param archiveUrl where the world PMTiles archive is served (see {@link pmtilesUrl}); register
 *   `pmtiles.Protocol` with `maplibregl.addProtocol("pmtiles", protocol.tile)` before creating the map
 * @param options theme, colour overrides, label font family, source id, regional extracts
 * @returns a MapLibre style specification (version 8) without `glyphs` or `sprite`
 */
export function basemapStyle(archiveUrl: string, options: BasemapStyleOptions = {}): StyleSpecification {
  const c: BasemapColors = { ...BASEMAP_THEMES[options.theme ?? "light"], ...options.colors };
  const source = options.sourceId ?? "world";
  const family = (options.fontFamily ?? "Inter Variable").split(",")[0]?.replace(/["']/g, "").trim() || "Inter Variable";
  const regular = [family];
  const semibold = [`${family} SemiBold`, family];
  const medium = [`${family} Medium`, family];
  const labels: LabelSpec[] = [
    // Villages (< 30k) are stored at z8 but shown from z9, so the z8 view around a route stays readable.
    {
      id: BASEMAP_FIRST_LABEL_LAYER,
      kinds: ["village"],
      font: regular,
      color: c.labelMuted,
      size: zoomRamp(9, 10, 14, 13),
      minzoom: 9,
      extraLayout: { "text-padding": 6 },
    },
    // Passes, lookouts and camps: only regional extracts carry them; they name the stops advice points to.
    {
      id: "basemap-place-landmark",
      kinds: ["pass", "lookout", "camp"],
      font: regular,
      color: c.labelMuted,
      size: zoomRamp(10, 10, 14, 12.5),
      minzoom: 10,
      extraLayout: { "text-padding": 4, "text-letter-spacing": 0.04 },
    },
    { id: "basemap-place-town", kinds: ["town"], font: regular, color: c.labelMuted, size: zoomRamp(6, 10.5, 14, 14) },
    { id: "basemap-place-city", kinds: ["city"], font: medium, color: c.label, size: zoomRamp(2, 11, 8, 14, 14, 17) },
    {
      id: "basemap-place-country",
      kinds: ["country"],
      font: semibold,
      color: c.countryLabel,
      // Bigger countries (lower minzoom) get bigger type.
      size: ["interpolate", ["linear"], ["zoom"], 1, ["-", 11, ["*", 0.4, ["get", "minzoom"]]], 6, ["-", 15, ["*", 0.6, ["get", "minzoom"]]]],
      maxzoom: 9,
      // Smaller minzoom means a bigger country: placed first.
      extraLayout: { "text-transform": "uppercase", "text-letter-spacing": 0.12, "text-max-width": 7, "symbol-sort-key": ["get", "minzoom"] },
    },
  ];
  const extracts = (options.extracts ?? []).map((x) => ({ ...x, source: `extract-${x.id}`, prefix: `extract-${x.id}` }));
  const floor = (x: BasemapExtract) => (x.minzoom && x.minzoom > 0 ? { minzoom: x.minzoom } : {});
  const boundaryPaint = {
    "line-color": c.boundary,
    "line-width": ["interpolate", ["linear"], ["zoom"], 1, 0.4, 6, 1, 12, 1.6],
    "line-dasharray": [3, 2],
  } satisfies Extract<LayerSpecification, { type: "line" }>["paint"];
  return {
    version: 8,
    name: "Fadeline basemap",
    sources: {
      [source]: { type: "vector", url: pmtilesUrl(archiveUrl), attribution: BASEMAP_ATTRIBUTION },
      ...Object.fromEntries(
        extracts.map((x) => [
          x.source,
          {
            type: "vector" as const,
            url: pmtilesUrl(x.url),
            attribution: escapeHtml(x.attribution),
            ...(x.minzoom === undefined ? {} : { minzoom: x.minzoom }),
            ...(x.maxzoom === undefined ? {} : { maxzoom: x.maxzoom }),
          },
        ]),
      ),
    },
    layers: [
      { id: "basemap-background", type: "background", paint: { "background-color": c.water } },
      { id: "basemap-land", type: "fill", source, "source-layer": "land", paint: { "fill-color": c.land } },
      // An extract's water is drawn over its own land, so it can also cut the world's coarser coastline back.
      ...extracts.flatMap((x): LayerSpecification[] => [
        { id: `${x.prefix}-land`, type: "fill", source: x.source, "source-layer": "land", ...floor(x), paint: { "fill-color": c.land } },
        { id: `${x.prefix}-water`, type: "fill", source: x.source, "source-layer": "water", ...floor(x), paint: { "fill-color": c.water } },
      ]),
      { id: "basemap-boundary", type: "line", source, "source-layer": "boundary", layout: { "line-join": "round" }, paint: boundaryPaint },
      ...extracts.map(
        (x): LayerSpecification => ({
          id: `${x.prefix}-boundary`,
          type: "line",
          source: x.source,
          "source-layer": "boundary",
          ...floor(x),
          layout: { "line-join": "round" },
          paint: boundaryPaint,
        }),
      ),
      ...labels.map((spec) => placeLabel(spec, source, c.halo)),
      // Later symbol layers are placed first, so an extract's labels win collisions with the world's.
      ...extracts.flatMap((x) => labels.map((spec) => placeLabel(spec, x.source, c.halo, x.prefix, x.minzoom ?? 0))),
    ],
  };
}
