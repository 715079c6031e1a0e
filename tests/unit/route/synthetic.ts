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

/**
 * A gently winding planar path: the heading swings as `swingRad`·sin(s / `waveM`) along the arc length s,
 * so the tightest radius is waveM / swingRad (1 km by default, a straight for any speed a rig drives).
 * Points every `spacingM` along the arc, as (east, north) in m.
 */
export function windingXY(lengthM: number, spacingM: number, swingRad = 0.6, waveM = 600): Array<[number, number]> {
  const out: Array<[number, number]> = [[0, 0]];
  const sub = 10; // sub-steps per point: the midpoint rule integrates the heading to well under 1 mm
  let e = 0;
  let n = 0;
  const count = Math.round(lengthM / spacingM);
  for (let k = 0; k < count; k++) {
    for (let j = 0; j < sub; j++) {
      const s = (k + (j + 0.5) / sub) * spacingM;
      const heading = swingRad * Math.sin(s / waveM);
      e += (spacingM / sub) * Math.cos(heading);
      n += (spacingM / sub) * Math.sin(heading);
    }
    out.push([e, n]);
  }
  return out;
}

/**
 * Slowly drifting noise, as recorded GPS position errors are: a first-order autoregressive sequence
 * x(k+1) = ρ·x(k) + √(1 − ρ²)·σ·n(k), ρ = exp(−spacingM / correlationM), stationary with standard
 * deviation σ (G. E. P. Box and G. M. Jenkins, "Time Series Analysis", 1970, AR(1) process).
 * `correlationM` = 0 gives independent noise.
 */
export function driftingNoise(normal: () => number, count: number, sigma: number, spacingM: number, correlationM: number): Float64Array {
  const rho = correlationM > 0 ? Math.exp(-spacingM / correlationM) : 0;
  const out = new Float64Array(count);
  let x = sigma * normal();
  for (let k = 0; k < count; k++) {
    out[k] = x;
    x = rho * x + Math.sqrt(1 - rho * rho) * sigma * normal();
  }
  return out;
}

/** GPS-like errors to add to a recorded track. Lengths and σ in m. */
export interface TrackNoise {
  seed: number;
  /** Horizontal σ per axis, m, and its correlation length along the track, m (0: independent). */
  horizontalM: number;
  horizontalCorrelationM: number;
  /** Elevation σ, m (independent from point to point). */
  elevationM: number;
  /** One elevation spike (±`spikeM`, one or two points wide) about every `spikeEveryM` of track. */
  spikeM?: number;
  spikeEveryM?: number;
}

/**
 * A recorded track along the planar path `xy` (points `spacingM` apart) with elevation `elevation(d)` of
 * the true distance d along the path, plus the given noise (or none). Seeded, so every run is the same.
 */
export function recordedPoints(
  xy: ReadonlyArray<readonly [number, number]>,
  spacingM: number,
  elevation: (distanceM: number) => number,
  noise?: TrackNoise,
): GpxPoint[] {
  if (noise === undefined) return pathPoints(xy, elevation);
  const normal = gaussian(mulberry32(noise.seed));
  const uniform = mulberry32(noise.seed + 1000);
  const n = xy.length;
  const de = driftingNoise(normal, n, noise.horizontalM, spacingM, noise.horizontalCorrelationM);
  const dn = driftingNoise(normal, n, noise.horizontalM, spacingM, noise.horizontalCorrelationM);
  const eleNoise = driftingNoise(normal, n, noise.elevationM, spacingM, 0);
  const spikeChance = noise.spikeM && noise.spikeEveryM ? spacingM / noise.spikeEveryM : 0;
  for (let k = 0; k < n; k++) {
    if (uniform() < spikeChance) {
      const size = (uniform() < 0.5 ? -1 : 1) * (noise.spikeM as number);
      const width = uniform() < 0.5 ? 1 : 2;
      for (let j = k; j < Math.min(n, k + width); j++) eleNoise[j] = (eleNoise[j] as number) + size;
    }
  }
  const moved = xy.map(([e, nn], k) => [e + (de[k] as number), nn + (dn[k] as number)] as [number, number]);
  // Elevation by the true distance along the path (k·spacingM), not the noisy one.
  return pathPoints(moved, () => 0).map((p, k) => ({ ...p, eleM: elevation(k * spacingM) + (eleNoise[k] as number) }));
}
