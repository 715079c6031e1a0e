/**
 * Hand-made route lines for the map tests: plain geometry on the equator and on meridians, where a spherical
 * arc is s = R·Δθ exactly (R the IUGG mean radius, 6,371,008.8 m; Moritz 1980), so every distance is known.
 */
import { readFileSync } from "node:fs";
import type { RouteLine } from "@/components/route-map/geometry";
import { buildRouteView, processGpx, type RouteView } from "@/lib/route";

export const R = 6_371_008.8;
export const M_PER_DEG = (R * Math.PI) / 180; // 111,194.93 m of arc per degree on the sphere

/** A line along the equator from lon 0 eastwards: vertices every `stepDeg`, grades as given (one per step). */
export function equatorLine(grades: number[], stepDeg = 0.01, gapAfter: number[] = []): RouteLine {
  const n = grades.length + 1;
  const lon = Array.from({ length: n }, (_, i) => i * stepDeg);
  return {
    lat: lon.map(() => 0),
    lon,
    distanceM: lon.map((l) => l * M_PER_DEG),
    grade: [...grades, grades.at(-1) ?? 0],
    gapAfter: Array.from({ length: n }, (_, i) => gapAfter[i] ?? 0),
  };
}

/** The fixture "Kestrel Gap" (invented, two segments with a gap) as the browser gets it. */
export function kestrelView(): RouteView {
  const r = processGpx(readFileSync("tests/fixtures/gpx/kestrel-gap-1-1.gpx", "utf8"));
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return buildRouteView(r.profile, r.descents, r.stats);
}
