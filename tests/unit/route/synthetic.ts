/**
 * Synthetic tracks for the route tests and benchmark: plain geometry, no real places. Positions are laid
 * out in a local tangent plane around an origin and converted to latitude/longitude with the WGS 84 radii
 * of curvature; elevations are a function of the cumulative geodesic distance of the points actually
 * generated, so that a "constant 8 % grade" is exactly 8 % by the library's own distance.
 */
import { geodesicDistance } from "@/lib/route/geodesic-distance";
import type { GpxPoint } from "@/lib/route/gpx-types";

const A = 6_378_137;
const F = 1 / 298.257223563; // WGS 84, NIMA TR8350.2 Table 3.1
const E2 = F * (2 - F);
const DEG = Math.PI / 180;

/** East/north offsets (m) → latitude/longitude around an origin (local tangent plane). */
export function enuToLatLon(lat0: number, lon0: number, east: number, north: number): [number, number] {
  const phi = lat0 * DEG;
  const w = Math.sqrt(1 - E2 * Math.sin(phi) ** 2);
  const m = (A * (1 - E2)) / w ** 3;
  const n = A / w;
  return [lat0 + north / m / DEG, lon0 + east / (n * Math.cos(phi)) / DEG];
}

/** Points along a planar path given as (east, north) in m; elevation from cumulative geodesic distance. */
export function pathPoints(
  xy: ReadonlyArray<readonly [number, number]>,
  elevation: (distanceM: number) => number | null,
  origin: readonly [number, number] = [-44.5, 160.5],
): GpxPoint[] {
  const out: GpxPoint[] = [];
  let d = 0;
  xy.forEach(([e, n], i) => {
    const [lat, lon] = enuToLatLon(origin[0], origin[1], e, n);
    const prev = out[i - 1];
    if (prev !== undefined) d += geodesicDistance(prev.lat, prev.lon, lat, lon);
    out.push({ lat, lon, eleM: elevation(d), timeS: null, line: i + 1 });
  });
  return out;
}

/** A straight line heading east: `count` points `spacingM` apart. */
export function straightXY(count: number, spacingM: number, startEast = 0): Array<[number, number]> {
  return Array.from({ length: count }, (_, i) => [startEast + i * spacingM, 0] as [number, number]);
}

/** Seeded PRNG (mulberry32, T. Ettinger, public domain), uniform in [0, 1). */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by the Box–Muller transform (Box and Muller, Ann. Math. Stat. 29, 1958). */
export function gaussian(rand: () => number): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

/** GPX 1.1 text with one track of the given segments. */
export function toGpx(segments: GpxPoint[][], name = "Kestrel Gap"): string {
  const pt = (p: GpxPoint) =>
    `<trkpt lat="${p.lat.toFixed(8)}" lon="${p.lon.toFixed(8)}">` +
    (p.eleM === null ? "" : `<ele>${p.eleM.toFixed(2)}</ele>`) +
    "</trkpt>";
  const segs = segments.map((s) => `<trkseg>\n${s.map(pt).join("\n")}\n</trkseg>`).join("\n");
  return (
    '<?xml version="1.0" encoding="UTF-8"?>\n' +
    '<gpx xmlns="http://www.topografix.com/GPX/1/1" version="1.1" creator="fadeline-tests">\n' +
    `<trk><name>${name}</name>\n${segs}\n</trk>\n</gpx>\n`
  );
}

/**
 * An invented mountain road: `km` kilometres of rolling terrain with long descents, as an elevation
 * function of distance (m → m). Used by the benchmark and the noise test.
 */
export function rollingRoad(distanceM: number): number {
  const x = distanceM / 1000;
  return 800 + 350 * Math.sin(x / 7) + 120 * Math.sin(x / 1.9 + 1) + 25 * Math.sin(x / 0.45);
}
