/**
 * The result of one run over a descent, and whether it stays below a line. Fluid boil risk counts against both
 * lines, and so does runaway (past the model's valid range, or the brakes no longer holding the speed): a plan
 * that boils the fluid or runs away is never "below" anything, whatever its temperatures. One pass over the descent's samples (this runs
 * for every search step, so it skips the energy account that summarizeDescents keeps).
 */

import { STEP_CLASSES, type HeatRunResult, type StepClass } from "@/lib/thermal";
import type { AdviceLine, PositionOutcome, RunOutcome } from "./types";

/**
 * Summarise a run over the stretch [startM, endM] (a descent from crest to bottom).
 * @param result heat-run result covering the stretch
 * @param startM crest, m along the route
 * @param endM bottom, m along the route
 * @returns the outcome
 * @throws {RangeError} "the run does not cover the stretch"
 * @example outcomeOf(result, 31_640, 41_020).positions[0].peakC
 */
export function outcomeOf(result: HeatRunResult, startM: number, endM: number): RunOutcome {
  const t = result.trace;
  const a = firstAtOrAfter(t.distanceM, t.length, startM - 1e-6);
  let b = firstAtOrAfter(t.distanceM, t.length, endM + 1e-6);
  while (b > a && (b >= t.length || (t.distanceM[b] as number) > endM + 1e-6)) b--;
  if (a >= t.length || b <= a) throw new RangeError("the run does not cover the stretch");
  let worst = 0;
  for (let k = a; k <= b; k++) if ((t.worstClass[k] as number) > worst) worst = t.worstClass[k] as number;
  const positions = result.positions.map((_, j) => positionOutcome(result, j, a, b));
  let warm = Infinity;
  let hot = Infinity;
  for (const p of positions) {
    const fluidMargin = p.boilC !== null && p.peakFluidC !== null ? p.boilC - p.peakFluidC : Infinity;
    warm = Math.min(warm, p.warmC - p.peakC, fluidMargin);
    hot = Math.min(hot, p.hotC - p.peakC, fluidMargin);
  }
  // Runaway where the brakes could not hold the speed, even below the lines: never "below" anything.
  if (STEP_CLASSES[worst] === "runaway") {
    warm = Math.min(warm, -HOLD_LOST_MARGIN_K);
    hot = Math.min(hot, -HOLD_LOST_MARGIN_K);
  }
  return {
    positions,
    worstClass: STEP_CLASSES[worst] ?? "cool",
    marginToWarmK: warm,
    marginToHotK: hot,
    stepM: ((t.distanceM[t.length - 1] as number) - (t.distanceM[0] as number)) / (t.length - 1),
  };
}

/** Margin given to a run whose brakes could not hold the speed, K (below zero: it passes no line). */
const HOLD_LOST_MARGIN_K = 1;

/**
 * Smallest margin to a line, K (> 0: every brake below it and no fluid boil risk).
 * @param outcome a run's outcome
 * @param line warm or hot
 * @returns margin, K
 * @example marginTo(outcome, "warm") > 0 // below the caution line
 */
export function marginTo(outcome: RunOutcome, line: AdviceLine): number {
  return line === "warm" ? outcome.marginToWarmK : outcome.marginToHotK;
}

/**
 * Whether an outcome stays below a line.
 * @param outcome a run's outcome
 * @param line warm or hot
 * @returns true when below
 * @example isBelow(outcome, "hot")
 */
export function isBelow(outcome: RunOutcome, line: AdviceLine): boolean {
  if (classRank(outcome.worstClass) >= classRank(line)) return false;
  return marginTo(outcome, line) > 0;
}

/**
 * Rank of a step class, worst last: cool < warm < hot < boil-risk < runaway (lib/thermal STEP_CLASSES).
 * @param c a step class
 * @returns its rank, 0 for cool
 * @example classRank("runaway") > classRank("boil-risk") // true
 */
export function classRank(c: StepClass): number {
  return STEP_CLASSES.indexOf(c);
}

/** @private First index in [0, n) whose distance is ≥ atM (n if none), by bisection (distances non-decreasing). */
function firstAtOrAfter(d: Float64Array, n: number, atM: number): number {
  let lo = 0;
  let hi = n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((d[mid] as number) < atM) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** @private One position over samples [a, b]; time at or above warm counts driving time (stops excluded). */
function positionOutcome(result: HeatRunResult, j: number, a: number, b: number): PositionOutcome {
  const t = result.trace;
  const spec = result.positions[j]!;
  const rotor = t.rotorC[j]!;
  const fluid = t.fluidC[j]!;
  const { warmC, hotC } = spec.thresholds;
  let peak = -Infinity, peakAt = a, peakFluid = -Infinity, warmS = 0;
  for (let k = a; k <= b; k++) {
    const temp = rotor[k] as number;
    if (temp > peak) (peak = temp), (peakAt = k);
    if ((fluid[k] as number) > peakFluid) peakFluid = fluid[k] as number;
    if (k > a && temp >= warmC) {
      warmS += (t.timeS[k] as number) - (t.timeS[k - 1] as number) - (t.stopS[k - 1] as number);
    }
  }
  return {
    position: spec.position,
    peakC: peak,
    peakAtM: t.distanceM[peakAt] as number,
    endC: rotor[b] as number,
    warmC,
    hotC,
    ceilingC: spec.validityCeilingC,
    timeWarmOrAboveS: warmS,
    peakFluidC: spec.fluid ? peakFluid : null,
    boilC: spec.fluid ? spec.fluid.boilC : null,
  };
}
