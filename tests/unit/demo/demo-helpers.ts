/**
 * Plain-geometry helpers for the demo-region tests (no project code, so they check it independently).
 */
import { demoRoutes, type DemoRoute } from "@/db/demo/generate-routes";
import { type ProcessedRoute, processGpx } from "@/lib/route";

/**
 * Even–odd ray casting (W. R. Franklin, "PNPOLY — Point Inclusion in Polygon Test", 1970s; the standard
 * crossing-number test): whether (x, y) lies inside a closed ring of [x, y] positions.
 */
export function inRing(x: number, y: number, ring: readonly (readonly number[])[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i] as [number, number];
    const [xj, yj] = ring[j] as [number, number];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * Great-circle distance by the haversine formula on a sphere of the IUGG mean Earth radius 6,371.0088 km
 * (R. W. Sinnott, "Virtues of the Haversine", Sky and Telescope 68 (1984) 159), m.
 */
export function haversineM(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const r = Math.PI / 180;
  const a = Math.sin(((lat2 - lat1) * r) / 2) ** 2 + Math.cos(lat1 * r) * Math.cos(lat2 * r) * Math.sin(((lon2 - lon1) * r) / 2) ** 2;
  return 2 * 6_371_008.8 * Math.asin(Math.sqrt(a));
}

/**
 * Alternating highs and lows of a profile with a reversal threshold (a "zig-zag" filter): a running
 * extreme is confirmed once the profile has come back from it by at least `thresholdM`.
 * @returns the heights between consecutive extremes (climbs and dips), m
 */
export function swings(elevationM: ArrayLike<number>, from: number, to: number, thresholdM: number): number[] {
  const first = elevationM[from] as number;
  const extremes: number[] = [];
  let dir = 0;
  let cand = first;
  for (let i = from + 1; i <= to; i++) {
    const e = elevationM[i] as number;
    if (dir === 0) {
      if (Math.abs(e - first) >= thresholdM) {
        extremes.push(first);
        dir = e > first ? 1 : -1;
        cand = e;
      }
    } else if (dir * (e - cand) > 0) cand = e;
    else if (dir * (cand - e) >= thresholdM) {
      extremes.push(cand);
      dir = -dir;
      cand = e;
    }
  }
  extremes.push(cand);
  return extremes.slice(1).map((e, k) => Math.abs(e - (extremes[k] as number)));
}

let cached: { routes: DemoRoute[]; processed: Map<string, ProcessedRoute> } | undefined;

/** The demo routes and their lib/route results, generated once per test file. */
export function demo(): { routes: DemoRoute[]; processed: Map<string, ProcessedRoute> } {
  if (!cached) {
    const routes = demoRoutes();
    const processed = new Map<string, ProcessedRoute>();
    for (const r of routes) {
      const res = processGpx(r.gpx);
      if (!res.ok) throw new Error(`${r.slug}: ${res.problems.map((p) => p.message).join("; ")}`);
      processed.set(r.slug, res);
    }
    cached = { routes, processed };
  }
  return cached;
}
