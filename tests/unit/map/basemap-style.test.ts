import { validateStyleMin } from "@maplibre/maplibre-gl-style-spec";
import { describe, expect, it } from "vitest";
import {
  BASEMAP_ATTRIBUTION,
  BASEMAP_FIRST_LABEL_LAYER,
  BASEMAP_THEMES,
  basemapStyle,
  pmtilesUrl,
} from "@/lib/map/basemap-style";

describe("basemapStyle", () => {
  it("is a valid MapLibre style for both themes", () => {
    for (const theme of ["light", "dark"] as const) {
      const errors = validateStyleMin(basemapStyle("pmtiles:///tiles/world.pmtiles", { theme }));
      expect(errors.map((e) => e.message)).toEqual([]);
    }
  });

  it("downloads no glyphs or sprites and labels with the app's font family", () => {
    const style = basemapStyle("/tiles/world.pmtiles");
    expect(style.glyphs).toBeUndefined();
    expect(style.sprite).toBeUndefined();
    const fonts = style.layers.flatMap((l) => (l.type === "symbol" ? [l.layout?.["text-font"]] : []));
    expect(fonts.length).toBeGreaterThan(0);
    for (const f of fonts) expect(f).toContain("Inter Variable");
    const custom = basemapStyle("/tiles/world.pmtiles", { fontFamily: "'__Inter_abc123', '__Inter_Fallback_abc123'" });
    const first = custom.layers.find((l) => l.id === BASEMAP_FIRST_LABEL_LAYER);
    expect(first?.type === "symbol" && first.layout?.["text-font"]).toEqual(["__Inter_abc123"]);
  });

  it("points a vector source at the archive through the pmtiles protocol, with attribution", () => {
    const style = basemapStyle("https://example.test/tiles/world.pmtiles", { sourceId: "base" });
    expect(style.sources.base).toEqual({
      type: "vector",
      url: "pmtiles://https://example.test/tiles/world.pmtiles",
      attribution: BASEMAP_ATTRIBUTION,
    });
    expect(BASEMAP_ATTRIBUTION).toMatch(/Natural Earth.*public domain/);
    expect(BASEMAP_ATTRIBUTION).toMatch(/GeoNames.*CC BY 4\.0/);
    expect(pmtilesUrl("pmtiles:///tiles/world.pmtiles")).toBe("pmtiles:///tiles/world.pmtiles");
    expect(pmtilesUrl("/tiles/world.pmtiles")).toBe("pmtiles:///tiles/world.pmtiles");
  });

  it("uses only the archive's layers and puts water, land, borders and labels in that order", () => {
    const style = basemapStyle("/tiles/world.pmtiles");
    const sourceLayers = new Set(style.layers.flatMap((l) => ("source-layer" in l && l["source-layer"] ? [l["source-layer"]] : [])));
    expect([...sourceLayers].sort()).toEqual(["boundary", "land", "place"]);
    const ids = style.layers.map((l) => l.id);
    expect(ids[0]).toBe("basemap-background");
    expect(ids.indexOf("basemap-land")).toBeLessThan(ids.indexOf("basemap-boundary"));
    expect(ids.indexOf("basemap-boundary")).toBeLessThan(ids.indexOf(BASEMAP_FIRST_LABEL_LAYER));
  });

  it("applies theme colours and overrides", () => {
    const style = basemapStyle("/tiles/world.pmtiles", { theme: "dark", colors: { land: "#123456" } });
    const bg = style.layers.find((l) => l.id === "basemap-background");
    const land = style.layers.find((l) => l.id === "basemap-land");
    expect(bg?.type === "background" && bg.paint?.["background-color"]).toBe(BASEMAP_THEMES.dark.water);
    expect(land?.type === "fill" && land.paint?.["fill-color"]).toBe("#123456");
  });
});
