/**
 * The elevation model of the invented Tallow Island (see ./region.ts): a smooth function of position built
 * from a few simple shapes, 0 m on the coast and up to about 1,900 m on the Spinefell Range. Invented; it
 * models no real terrain.
 *
 * - base: a low plateau, 0 m at the coast rising to 320 m about 10 km inland;
 * - Spinefell Range: a ridge running north–south just west of the centre, a steep west face (about 25 %)
 *   and a long, even east flank (about 12–18 %), with Harrier Saddle, a pass, at 2 km north;
 * - two peaks on the range, and the Thistledown Hills around Marrow Water in the north-west;
 * - rolling country east of the range (bumps of 20–60 m, 1–2 km apart);
 * - Cinder Scarp east of the range, a 100 m step with a 50 m core steeper than 20 %;
 * - Marrow Water's flat surface at {@link LAKE_SURFACE_M}, the ground easing down to it over 1.6 km.
 *
 * Smoothstep is the cubic Hermite step 3t² − 2t³ (t clamped to [0, 1]); softplus is ln(1 + eˣ).
 */
import { inlandCoordinate, LAKE_SURFACE_M, lakeShoreDistanceM } from "./region";

function smoothstep(lo: number, hi: number, x: number): number {
  const t = Math.min(1, Math.max(0, (x - lo) / (hi - lo)));
  return t * t * (3 - 2 * t);
}

function softplus(x: number): number {
  return x > 30 ? x : Math.log1p(Math.exp(x));
}

function gauss(dx: number, dy: number, sigma: number): number {
  return Math.exp(-(dx * dx + dy * dy) / (2 * sigma * sigma));
}

/** An even ramp from 0 to `length` with rounded corners of width `corner` (all km). */
function ramp(t: number, length: number, corner: number): number {
  return corner * (softplus(t / corner) - softplus((t - length) / corner) - Math.LN2);
}

/** West–east position of the Spinefell crest at northing y, km. */
export function crestEastKm(yKm: number): number {
  return -3 + Math.sin(yKm / 7);
}

/** Height of the range above the base, m (all lengths km). */
function spinefell(x: number, y: number): number {
  const crest = 1330 / (1 + ((y - 1) / 13.5) ** 8) - 420 * gauss(0, y - 2, 2.2);
  const d = x - crestEastKm(y);
  const t = Math.sqrt(d * d + 0.0625) - 0.25; // |d| with a rounded crest
  const side = d < 0 ? 3.6 : 7.5; // west face and east flank, km
  const profile = 1 - ramp(t, side, 0.25) / side;
  const peaks = 300 * gauss(x + 2.4, y - 8.2, 1.4) + 280 * gauss(x + 4.4, y + 6.5, 1.7);
  const creek = -45 * gauss(d - 8.4, 0, 0.45); // Fernhollow Creek along the foot of the east flank
  return (crest + peaks) * Math.max(0, profile) + creek;
}

/** The Thistledown Hills south of Marrow Water with their saddle, and a spur north of the lake, m. */
function thistledown(x: number, y: number): number {
  const ridge = (360 - 170 * gauss(x + 15, 0, 1.5)) * gauss(0, y - 6.5, 1.6) * smoothstep(-23, -20, x) * (1 - smoothstep(-9.5, -7, x));
  const spur = 240 * gauss(x + 10.6, y - 15.1, 1.3) + 170 * gauss(x + 17.5, y - 13.5, 1.8);
  return ridge + spur;
}

/** Position relative to Cinder Scarp's line through (12, −2.5) km at 20° north of east, km; window 1 along its middle. */
function scarpFrame(x: number, y: number): { across: number; window: number } {
  const c = Math.cos(20 * (Math.PI / 180));
  const s = Math.sin(20 * (Math.PI / 180));
  const along = (x - 12) * c + (y + 2.5) * s;
  const across = -(x - 12) * s + (y + 2.5) * c; // positive on the north-west (high) side
  return { across, window: Math.exp(-((along / 9) ** 6)) };
}

/** Rolling bumps east of the range (smoothed away within 1.5 km of Cinder Scarp), m. */
function rolling(x: number, y: number): number {
  const { across, window } = scarpFrame(x, y);
  const nearScarp = window * (1 - smoothstep(0.5, 1.5, Math.abs(across)));
  const mask = smoothstep(crestEastKm(y) + 6.5, crestEastKm(y) + 8.5, x) * (1 - nearScarp);
  if (mask === 0) return 0;
  const w = (ux: number, uy: number, len: number, phase: number) => Math.sin((2 * Math.PI * (ux * x + uy * y)) / len + phase);
  return mask * (14 * w(0.8, 0.6, 2.2, 0.7) + 11 * w(-0.5, 0.866, 1.6, 2.1) + 8 * w(0.96, -0.28, 1.2, 4.4));
}

/** Cinder Scarp: a step up to the north-west, a 50 m core 0.16 km wide on a 50 m apron 2 km wide, m. */
function cinderScarp(x: number, y: number): number {
  const { across, window } = scarpFrame(x, y);
  return window * (25 * (1 + Math.tanh(across / 0.08)) + 25 * (1 + Math.tanh(across / 1.0)));
}

/**
 * Ground elevation of the invented island.
 * @param eastM metres east of the island's centre
 * @param northM metres north of the island's centre
 * @returns elevation above sea level, m (0 at sea and on the coast)
 */
export function terrainHeightM(eastM: number, northM: number): number {
  const q = inlandCoordinate(eastM, northM);
  if (q <= 0) return 0;
  const x = eastM / 1000;
  const y = northM / 1000;
  const land = 320 * smoothstep(0, 0.45, q) + spinefell(x, y) + thistledown(x, y) + rolling(x, y) + cinderScarp(x, y);
  const h = smoothstep(0, 0.09, q) * Math.max(0, land);
  // Marrow Water: a flat surface, and the ground eased down to it over 1.6 km of shore.
  const shore = lakeShoreDistanceM(eastM, northM);
  if (shore <= 0) return LAKE_SURFACE_M;
  return LAKE_SURFACE_M + (h - LAKE_SURFACE_M) * smoothstep(0, 1600, shore);
}

/**
 * Gradient of {@link terrainHeightM} by central differences over ±2 m.
 * @returns [∂h/∂east, ∂h/∂north], dimensionless (m per m)
 */
export function terrainGradient(eastM: number, northM: number): [number, number] {
  const h = 2;
  return [
    (terrainHeightM(eastM + h, northM) - terrainHeightM(eastM - h, northM)) / (2 * h),
    (terrainHeightM(eastM, northM + h) - terrainHeightM(eastM, northM - h)) / (2 * h),
  ];
}
