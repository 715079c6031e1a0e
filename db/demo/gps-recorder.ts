/**
 * Turns a road's centre line into what a GPS logger in a towing vehicle would record: a fix every second
 * at a plausible speed for a loaded 4x4 with a caravan (so fixes fall 4–15 m apart), with correlated
 * horizontal error, elevation error with occasional spikes, and now and then a missed fix. Everything is
 * seeded; nothing here is a real recording.
 *
 * - Road elevation: the terrain under the centre line, averaged over ±{@link CUT_FILL_M} m along the road
 *   (cut and fill smooth the ground's small bumps out of the road surface).
 * - Speed: at most 54 km/h, slower on climbs (about 37 km/h at 9 %) and descents steeper than 5 %
 *   (about 40 km/h, holding back the load), and in bends, where the lateral acceleration v²/R stays at or
 *   below 1.3 m/s²; acceleration is limited to 0.5 m/s² and braking to 0.9 m/s² by a forward and a
 *   backward pass over the speed limits (the usual speed-profile construction).
 * - Horizontal error: per axis a sum of sinusoids with periods of 40–400 s and random phases, about 2.8 m
 *   RMS (receiver errors drift slowly, so consecutive fixes share most of their error), plus 0.3 m white.
 * - Elevation error: sinusoids of 120–1200 s, about 2.5 m RMS, plus 1 m white, plus a 10–20 m spike on about
 *   one fix in 300 (one or two fixes long).
 */
import { normal, type Rand } from "./prng";
import { STEP_M } from "./road-builder";
import { toLonLat } from "./region";
import { terrainHeightM } from "./terrain";

/** Half-width of the along-road average that gives the road surface its elevation, m. */
export const CUT_FILL_M = 20;

/** One recorded fix. */
export interface Fix {
  lon: number;
  lat: number;
  /** Recorded elevation, m. */
  eleM: number;
  /** Seconds after the recording started. */
  t: number;
}

/** Road-surface elevation at every centre-line point, m. */
export function roadElevation(east: readonly number[], north: readonly number[]): Float64Array {
  const n = east.length;
  const ground = Float64Array.from(east, (x, i) => terrainHeightM(x, north[i] as number));
  const prefix = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) prefix[i + 1] = (prefix[i] as number) + (ground[i] as number);
  const h = Math.round(CUT_FILL_M / STEP_M);
  return Float64Array.from(ground, (_, i) => {
    const a = Math.max(0, i - h);
    const b = Math.min(n - 1, i + h);
    return ((prefix[b + 1] as number) - (prefix[a] as number)) / (b - a + 1);
  });
}

/** Speed limit at every centre-line point, m/s, from grade and bend radius. */
function speedLimits(east: readonly number[], north: readonly number[], ele: Float64Array): Float64Array {
  const n = east.length;
  const k = 5; // ±10 m for heading change and grade
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = Math.max(0, i - k);
    const b = Math.min(n - 1, i + k);
    const h1 = Math.atan2((north[Math.min(n - 1, a + 1)] as number) - (north[a] as number), (east[Math.min(n - 1, a + 1)] as number) - (east[a] as number));
    const h2 = Math.atan2((north[b] as number) - (north[Math.max(0, b - 1)] as number), (east[b] as number) - (east[Math.max(0, b - 1)] as number));
    const turn = Math.abs(Math.atan2(Math.sin(h2 - h1), Math.cos(h2 - h1)));
    const radius = turn > 1e-6 ? ((b - a) * STEP_M) / turn : Infinity;
    const grade = b > a ? ((ele[b] as number) - (ele[a] as number)) / ((b - a) * STEP_M) : 0;
    let v = 15;
    if (grade > 0) v = Math.min(v, Math.max(5, 15.3 - 55 * grade));
    else if (grade < -0.05) v = Math.min(v, 11);
    out[i] = Math.min(v, Math.sqrt(1.3 * radius));
  }
  // Forward (acceleration) and backward (braking) passes: v² ≤ v_prev² + 2·a·Δs.
  out[0] = Math.min(out[0] as number, 3);
  for (let i = 1; i < n; i++) out[i] = Math.min(out[i] as number, Math.sqrt((out[i - 1] as number) ** 2 + 2 * 0.5 * STEP_M));
  out[n - 1] = Math.min(out[n - 1] as number, 3);
  for (let i = n - 2; i >= 0; i--) out[i] = Math.min(out[i] as number, Math.sqrt((out[i + 1] as number) ** 2 + 2 * 0.9 * STEP_M));
  return out;
}

/** A smooth random signal of time: Σ aᵢ sin(2π t / Pᵢ + φᵢ), scaled to the given RMS. */
function drift(rand: Rand, rms: number, minPeriodS: number, maxPeriodS: number, terms = 5): (t: number) => number {
  const waves = Array.from({ length: terms }, (_, i) => ({
    period: minPeriodS * (maxPeriodS / minPeriodS) ** (i / (terms - 1)),
    amp: 0.5 + rand(),
    phase: 2 * Math.PI * rand(),
  }));
  const scale = rms / Math.sqrt(waves.reduce((s, w) => s + (w.amp * w.amp) / 2, 0));
  return (t) => scale * waves.reduce((s, w) => s + w.amp * Math.sin((2 * Math.PI * t) / w.period + w.phase), 0);
}

/**
 * Records a drive along a centre line.
 * @param east centre line, m east in the local frame of ./region.ts
 * @param north centre line, m north
 * @param rand seeded uniform source
 * @param startT seconds at the first fix (to continue a recording after a gap)
 * @returns one fix per second (minus a few missed ones), first and last point of the line included
 */
export function recordDrive(east: readonly number[], north: readonly number[], rand: Rand, startT = 0): Fix[] {
  const ele = roadElevation(east, north);
  const limits = speedLimits(east, north, ele);
  const gauss = normal(rand);
  const [ex, ey] = [drift(rand, 2, 40, 400), drift(rand, 2, 40, 400)]; // √(2² + 2²) ≈ 2.8 m
  const ez = drift(rand, 2.5, 120, 1200);
  const fixes: Fix[] = [];
  let spikeLeft = 0;
  let spike = 0;
  const fixAt = (pos: number, t: number): Fix => {
    if (spikeLeft > 0) spikeLeft--;
    else if (rand() < 1 / 300) {
      spikeLeft = rand() < 0.5 ? 1 : 2;
      spike = (rand() < 0.5 ? -1 : 1) * (10 + 10 * rand());
    }
    // Interpolate along the centre line at `pos` metres.
    const i = Math.min(east.length - 2, Math.floor(pos / STEP_M));
    const f = Math.min(1, pos / STEP_M - i);
    const lerp = (a: ArrayLike<number>) => (a[i] as number) + f * ((a[i + 1] as number) - (a[i] as number));
    const [lon, lat] = toLonLat(lerp(east) + ex(t) + 0.3 * gauss(), lerp(north) + ey(t + 1000) + 0.3 * gauss());
    return { lon, lat, eleM: lerp(ele) + ez(t) + gauss() + (spikeLeft > 0 ? spike : 0), t };
  };
  let t = startT;
  let pos = 0; // metres along the line
  const length = (east.length - 1) * STEP_M;
  fixes.push(fixAt(0, t));
  for (;;) {
    pos += limits[Math.floor(pos / STEP_M)] as number; // one second at the local speed
    t += 1;
    if (pos >= length) break;
    if (rand() < 0.004) continue; // a missed fix
    fixes.push(fixAt(pos, t));
  }
  fixes.push(fixAt(length, t));
  return fixes;
}
