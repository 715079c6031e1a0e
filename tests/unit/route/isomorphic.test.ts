/**
 * lib/route must run unchanged in the browser and on the server (README.md, "Stack": the route and brake-heat
 * cores are pure and isomorphic; docs/security.md §0.1: the DOM-based gpxparser pollutes server globals and
 * must not be imported). A static check of the
 * imports of every module, so a stray Node-only import fails here rather than in a browser bundle.
 */
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import * as route from "@/lib/route";

const DIR = fileURLToPath(new URL("../../../lib/route/", import.meta.url));
const files = readdirSync(DIR).filter((f) => f.endsWith(".ts"));

describe("lib/route is pure and isomorphic", () => {
  it.each(files)("%s imports only sibling modules and saxes", (file) => {
    const source = readFileSync(DIR + file, "utf8");
    const specifiers = [...source.matchAll(/(?:import|export)[^"']*?from\s+["']([^"']+)["']/g)].map((m) => m[1]);
    for (const s of specifiers) expect(s === "saxes" || s?.startsWith("./")).toBe(true);
    expect(source).not.toMatch(/\brequire\(|\bprocess\.|\bBuffer\b|gpxparser|globalThis/);
  });

  it("index.ts exposes the pipeline and every stage", () => {
    const expected = [
      "parseGpx",
      "listTracks",
      "selectTrack",
      "cleanTrack",
      "resampleTrack",
      "smoothElevation",
      "computeGrade",
      "computeCurveRadius",
      "buildRouteProfile",
      "findDescents",
      "computeRouteStats",
      "climbTotals",
      "geodesicDistance",
      "processGpx",
    ];
    for (const name of expected) expect(typeof (route as Record<string, unknown>)[name]).toBe("function");
  });
});
