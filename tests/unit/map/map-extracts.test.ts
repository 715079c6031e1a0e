/**
 * Operator extracts: validation of public/tiles/extracts.json, the loader's failure modes, and how the
 * basemap style layers an extract over the world (checked with MapLibre's own style validator).
 */
import { readFileSync } from "node:fs";
import { validateStyleMin } from "@maplibre/maplibre-gl-style-spec";
import { describe, expect, it, vi } from "vitest";
import { loadMapExtracts, MAX_EXTRACTS, parseExtractsConfig } from "@/components/route-map/map-extracts";
import { BASEMAP_FIRST_LABEL_LAYER, basemapStyle } from "@/lib/map/basemap-style";

const demo = {
  id: "demo-region",
  url: "/tiles/demo-region.pmtiles",
  name: "Demo region (invented)",
  attribution: "Demo region: invented by Fadeline",
  minzoom: 0,
  maxzoom: 12,
};

describe("parseExtractsConfig", () => {
  it("accepts the shipped public/tiles/extracts.json", () => {
    const { extracts, problems } = parseExtractsConfig(JSON.parse(readFileSync("public/tiles/extracts.json", "utf8")));
    expect(problems).toEqual([]);
    expect(extracts).toEqual([demo]);
  });

  it("gives no extracts for anything that is not { extracts: [...] }", () => {
    for (const bad of [null, 3, "x", [], {}, { extracts: {} }]) {
      const r = parseExtractsConfig(bad);
      expect(r.extracts).toEqual([]);
      expect(r.problems).toHaveLength(1);
    }
  });

  it("skips bad entries with a message naming each, keeping the good ones in order", () => {
    const r = parseExtractsConfig({
      extracts: [
        { ...demo, id: "Upper Case" },
        { ...demo, id: "a", url: "https://elsewhere.test/a.pmtiles" },
        { ...demo, id: "b", url: "/tiles/../secret.pmtiles" },
        { ...demo, id: "c", url: "/tiles/sub/c.pmtiles" },
        { ...demo, id: "d", minzoom: 9, maxzoom: 4 },
        { ...demo, id: "e", maxzoom: 2.5 },
        { ...demo, id: "f", name: "" },
        { ...demo, id: "g", attribution: "x".repeat(201) },
        "not an object",
        { ...demo, id: "ok-1", url: "/tiles/ok-1.pmtiles", minzoom: undefined, maxzoom: undefined },
        { ...demo, id: "ok-1" },
      ],
    });
    expect(r.extracts.map((x) => x.id)).toEqual(["ok-1"]);
    expect(r.extracts[0]).not.toHaveProperty("minzoom");
    const text = r.problems.join("\n");
    for (let i = 0; i <= 8; i++) expect(text).toContain(`extracts[${i}]`);
    expect(text).toContain('extracts[10]: "id" "ok-1" is used twice');
  });

  it(`uses at most ${MAX_EXTRACTS} extracts`, () => {
    const many = Array.from({ length: MAX_EXTRACTS + 2 }, (_, i) => ({ ...demo, id: `r${i}`, url: `/tiles/r${i}.pmtiles` }));
    const r = parseExtractsConfig({ extracts: many });
    expect(r.extracts).toHaveLength(MAX_EXTRACTS);
    expect(r.problems).toHaveLength(2);
  });
});

describe("loadMapExtracts", () => {
  const respond = (status: number, body: string) => vi.fn(async () => new Response(body, { status }));

  it("reads and validates the file", async () => {
    const warn = vi.fn();
    const fetchImpl = respond(200, JSON.stringify({ extracts: [demo, { id: "x" }] }));
    expect(await loadMapExtracts({ fetchImpl, warn })).toEqual([demo]);
    expect(fetchImpl).toHaveBeenCalledWith("/tiles/extracts.json", expect.anything());
    expect(warn).toHaveBeenCalled();
  });

  it("treats a missing file as no extracts, quietly", async () => {
    const warn = vi.fn();
    expect(await loadMapExtracts({ fetchImpl: respond(404, "Not found"), warn })).toEqual([]);
    expect(warn).not.toHaveBeenCalled();
  });

  it("treats a server error, bad JSON or a network failure as no extracts, with a warning", async () => {
    const failing = vi.fn(async () => {
      throw new TypeError("network down");
    });
    for (const fetchImpl of [respond(500, ""), respond(200, "{ not json"), failing]) {
      const warn = vi.fn();
      expect(await loadMapExtracts({ fetchImpl, warn })).toEqual([]);
      expect(warn).toHaveBeenCalledOnce();
    }
  });
});

describe("basemapStyle with extracts", () => {
  const style = basemapStyle("/tiles/world.pmtiles", { extracts: [demo, { ...demo, id: "second", url: "/tiles/second.pmtiles", attribution: "A <b>&</b> B", minzoom: 6 }] });
  const ids = style.layers.map((l) => l.id);

  it("is still a valid MapLibre style", () => {
    expect(validateStyleMin(style).map((e) => e.message)).toEqual([]);
  });

  it("adds one vector source per extract through the pmtiles protocol, attribution escaped", () => {
    expect(style.sources["extract-demo-region"]).toEqual({
      type: "vector",
      url: "pmtiles:///tiles/demo-region.pmtiles",
      attribution: "Demo region: invented by Fadeline",
      minzoom: 0,
      maxzoom: 12,
    });
    expect(style.sources["extract-second"]).toMatchObject({ attribution: "A &#60;b&#62;&#38;&#60;/b&#62; B" });
  });

  it("draws extract fills above the world's fills, borders above its borders, labels above its labels", () => {
    const at = (id: string) => ids.indexOf(id);
    expect(at("extract-demo-region-land")).toBeGreaterThan(at("basemap-land"));
    expect(at("extract-demo-region-water")).toBeGreaterThan(at("extract-demo-region-land"));
    expect(at("extract-second-land")).toBeGreaterThan(at("extract-demo-region-water"));
    expect(at("basemap-boundary")).toBeGreaterThan(at("extract-second-water"));
    expect(at("extract-demo-region-boundary")).toBeGreaterThan(at("basemap-boundary"));
    expect(at("extract-demo-region-boundary")).toBeLessThan(at(BASEMAP_FIRST_LABEL_LAYER));
    expect(at("extract-demo-region-place-village")).toBeGreaterThan(at("basemap-place-country"));
    // The first label layer is still the lowest label, so route lines added before it stay under every label.
    expect(style.layers.findIndex((l) => l.type === "symbol")).toBe(at(BASEMAP_FIRST_LABEL_LAYER));
  });

  it("hides an extract below its minzoom, keeping the higher label minzooms", () => {
    const layer = (id: string) => style.layers.find((l) => l.id === id);
    expect(layer("extract-second-land")?.minzoom).toBe(6);
    expect(layer("extract-second-place-city")?.minzoom).toBe(6);
    expect(layer("extract-second-place-village")?.minzoom).toBe(9);
    expect(layer("extract-demo-region-land")?.minzoom).toBeUndefined();
  });

  it("leaves the world-only style unchanged", () => {
    expect(basemapStyle("/tiles/world.pmtiles", { extracts: [] })).toEqual(basemapStyle("/tiles/world.pmtiles"));
  });
});
