/**
 * Friction versus temperature: a fade curve of our own per friction family. ESTIMATE: no standard or
 * published curve stands behind these numbers (no standard defines fade onset; docs/model.md, "Fade").
 * The heat run (fade feedback: a fading brake hands work to the others) and the stopping-distance estimate
 * (lib/stopping) use the same curve.
 *
 * The curve gives μ(T)/μ_cold, the friction coefficient relative to a cold brake:
 * - flat (1) up to the family's warm (caution) line;
 * - a gentle fall to `ratioAtHot` at the hot (fade-likely) line;
 * - a steeper fall beyond the hot line, levelling at `floorRatio` from `hotC + floorSpanK`.
 * The three knots are joined by a monotone cubic Hermite curve (Fritsch–Butland slope at the hot knot, zero
 * slope at both ends), so it is smooth (C¹), never rises with temperature and never leaves [floorRatio, 1].
 */

import type { PadFamily } from "./rig";
import { DEFAULT_PAD_THRESHOLDS } from "./thresholds";

/** Label carried by every figure that uses the fade curve. */
export const FADE_CURVE_LABEL = "estimate: a fade curve of our own, not a measured or published curve";

/** Shape of a fade curve beyond the thresholds (dimensionless ratios, K). */
export interface FadeShape {
  /** μ/μ_cold at the hot line (dimensionless, 0–1). */
  ratioAtHot: number;
  /** μ/μ_cold far beyond the hot line (dimensionless, 0–ratioAtHot). */
  floorRatio: number;
  /** How far past the hot line the curve reaches its floor, K (> 0). */
  floorSpanK: number;
}

/** A fade curve: the family's shape anchored at a brake's warm and hot lines. */
export interface FadeCurve extends FadeShape {
  /** Warm (caution) line: μ is flat up to here, °C. */
  warmC: number;
  /** Hot (fade-likely) line, °C (> warmC). */
  hotC: number;
}

/**
 * Shapes per friction family [E], our own estimates: every family loses about a tenth of its grip between
 * the warm and the hot line; organic/NAO pads and drum linings fall furthest and fastest beyond it (drums also
 * expand away from their shoes, docs/trade-facts.md §4.3), semi-metallic pads least.
 */
export const FADE_SHAPES: Readonly<Record<PadFamily, FadeShape>> = {
  organic: { ratioAtHot: 0.9, floorRatio: 0.5, floorSpanK: 200 },
  ceramic: { ratioAtHot: 0.9, floorRatio: 0.55, floorSpanK: 200 },
  "semi-metallic": { ratioAtHot: 0.92, floorRatio: 0.6, floorSpanK: 200 },
  "drum-lining": { ratioAtHot: 0.88, floorRatio: 0.45, floorSpanK: 190 },
};

/**
 * The fade curve of a friction family, anchored at given warm and hot lines (by default the model's default
 * thresholds for the family, lib/thermal thresholds.ts).
 * @param family friction family
 * @param thresholds warm and hot lines, °C (default: the family's default thresholds)
 * @returns the curve
 * @throws {RangeError} "thresholds.hotC must be greater than thresholds.warmC"
 * @example fadeCurveFor("organic").hotC // 300
 */
export function fadeCurveFor(
  family: PadFamily,
  thresholds: { warmC: number; hotC: number } = DEFAULT_PAD_THRESHOLDS[family],
): FadeCurve {
  if (!(thresholds.hotC > thresholds.warmC)) {
    throw new RangeError("thresholds.hotC must be greater than thresholds.warmC");
  }
  return { ...FADE_SHAPES[family], warmC: thresholds.warmC, hotC: thresholds.hotC };
}

/**
 * Friction relative to a cold brake, μ(T)/μ_cold, on a fade curve (estimate).
 * @param tempC bulk brake temperature, °C
 * @param curve the fade curve
 * @returns ratio (dimensionless, floorRatio–1)
 * @example frictionRatio(340, fadeCurveFor("organic")) // ≈ 0.807
 */
export function frictionRatio(tempC: number, curve: FadeCurve): number {
  const { warmC, hotC, ratioAtHot, floorRatio, floorSpanK } = curve;
  if (tempC <= warmC) return 1;
  const floorC = hotC + floorSpanK;
  if (tempC >= floorC) return floorRatio;
  const d1 = (ratioAtHot - 1) / (hotC - warmC);
  const d2 = (floorRatio - ratioAtHot) / floorSpanK;
  // Fritsch–Butland: harmonic mean of the neighbouring secants (0 if either is flat) keeps the curve monotone.
  const mHot = d1 < 0 && d2 < 0 ? (2 * d1 * d2) / (d1 + d2) : 0;
  return tempC <= hotC
    ? hermite(tempC, warmC, hotC, 1, ratioAtHot, 0, mHot)
    : hermite(tempC, hotC, floorC, ratioAtHot, floorRatio, mHot, 0);
}

/** @private Cubic Hermite between (x0, y0, slope m0) and (x1, y1, slope m1). */
function hermite(x: number, x0: number, x1: number, y0: number, y1: number, m0: number, m1: number): number {
  const h = x1 - x0;
  const t = (x - x0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * y0 + (t3 - 2 * t2 + t) * h * m0 + (-2 * t3 + 3 * t2) * y1 + (t3 - t2) * h * m1;
}
