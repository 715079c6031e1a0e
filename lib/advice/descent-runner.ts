/**
 * Re-running one descent: from the lead-in before the crest to the bottom, starting from the brake state the
 * rig carries in (heat carries over from earlier descents), with a driving plan applied from crest to bottom.
 * Runs are cached per plan; searches run on a coarser copy of the piece and trust it only when clear of the line.
 */

import type { Descent } from "@/lib/route";
import {
  runPrepared,
  type HeatRunOptions,
  type HeatRunResult,
  type PreparedRoute,
  type RangeControl,
  type ResolvedModel,
  type Rig,
  type ThermalState,
} from "@/lib/thermal";
import { isBelow, marginTo, outcomeOf } from "./outcome";
import { routePieces } from "./route-window";
import type { AdviceSettings } from "./settings";
import type { AdviceLine, DrivePlan, RunOutcome } from "./types";

/** Runs made so far: whole pieces by resolution, and runs up to a stop (for benchmarks and tests; never reset by the engine). */
export const RUN_COUNTS = { fine: 0, coarse: 0, prefix: 0 };

/** One run of a descent. */
export interface DescentRun {
  /** The piece it ran on (the route's step, or the coarse copy). */
  piece: PreparedRoute;
  /** The heat-run result over the piece. */
  result: HeatRunResult;
  /** Its outcome over the descent. */
  outcome: RunOutcome;
}

/** A descent ready for re-runs. */
export interface DescentRunner {
  /** The descent. */
  descent: Descent;
  /** The rig and the plan's own options (conditions, the user's stops and controls). */
  rig: Rig;
  base: HeatRunOptions;
  /** The resolved model of the rig as planned. */
  model: ResolvedModel;
  /** Piece at the route's step, from the lead-in to the bottom; and its coarse copy. */
  fine: PreparedRoute;
  coarse: PreparedRoute;
  /** Brake state at the start of the piece. */
  startState: ThermalState;
  /** Settings. */
  settings: AdviceSettings;
  /** Band spread on this descent (settings.bandSpreads; 0: none), already in each run's outcome margins. */
  bandSpread: number;
  /** Whether low range comes before the caution band here (a steep descent with a low range; settings.lowRangeFromGrade). */
  lowRangeFirst: boolean;
  /** Cached runs by plan key. */
  cache: Map<string, DescentRun>;
}

/**
 * Prepare a descent for re-runs.
 * @param route the whole prepared route
 * @param leadInIndex first sample of the piece (before the crest)
 * @param descent the descent
 * @param startState brake state at `leadInIndex`
 * @param context rig, options as planned, resolved model, settings
 * @param bandSpread band spread on this descent (settings.bandSpreads; default 0)
 * @returns the runner
 * @example descentRunner(route, 3100, descent, state, { rig, base: {}, model, settings })
 */
export function descentRunner(
  route: PreparedRoute,
  leadInIndex: number,
  descent: Descent,
  startState: ThermalState,
  context: { rig: Rig; base: HeatRunOptions; model: ResolvedModel; settings: AdviceSettings },
  bandSpread = 0,
): DescentRunner {
  const factor = Math.max(1, Math.round(context.settings.searchStepM / route.profile.stepM));
  const { fine, coarse } = routePieces(route, leadInIndex, descent.endIndex, factor, [descent.startIndex - leadInIndex]);
  const hasLowRange = context.model.overallRatios.length > context.model.highRangeGears;
  const lowRangeFirst = hasLowRange && -descent.steepest1kmGrade >= context.settings.lowRangeFromGrade - 1e-9;
  return { descent, ...context, fine, coarse, startState, bandSpread, lowRangeFirst, cache: new Map() };
}

/**
 * An outcome judged on its estimated band edge: each brake's margin to a line becomes the margin of
 * peak + k·(peak − ambient), so a plan passes only when its upper edge would clear the line.
 * @param outcome a run's outcome
 * @param spread band spread k (0: the outcome itself)
 * @param ambientC ambient temperature, °C
 * @returns the outcome with the margins of its estimated upper edge (never larger than before)
 * @example withBandSpread(outcome, 0.5, 25).marginToHotK
 */
export function withBandSpread(outcome: RunOutcome, spread: number, ambientC: number): RunOutcome {
  if (!(spread > 0)) return outcome;
  let warm = outcome.marginToWarmK;
  let hot = outcome.marginToHotK;
  for (const p of outcome.positions) {
    const high = p.peakC + spread * Math.max(0, p.peakC - ambientC);
    warm = Math.min(warm, p.warmC - high);
    hot = Math.min(hot, p.hotC - high);
  }
  return { ...outcome, marginToWarmK: warm, marginToHotK: hot };
}

/**
 * Run a plan on the descent.
 * @param runner the descent
 * @param plan driving plan
 * @param atRouteStep run at the route's own step (true) or the coarse search step (false)
 * @returns the run (cached)
 * @example runPlan(runner, { gear: 2 }, true).outcome.positions[0].peakC
 */
export function runPlan(runner: DescentRunner, plan: DrivePlan, atRouteStep: boolean): DescentRun {
  const piece = atRouteStep || runner.coarse === runner.fine ? runner.fine : runner.coarse;
  const key = `${piece === runner.fine ? "f" : "c"}|${plan.gear ?? ""}|${plan.speedMs ?? ""}|${plan.trailerGain ?? ""}|${
    (plan.stops ?? []).map((s) => `${s.atM}:${s.durationS}`).join(",")
  }`;
  const hit = runner.cache.get(key);
  if (hit) return hit;
  const result = runPrepared(piece, runner.rig, planOptions(runner, plan, piece));
  RUN_COUNTS[piece === runner.fine ? "fine" : "coarse"]++;
  const outcome = withBandSpread(
    outcomeOf(result, runner.descent.startDistanceM, runner.descent.endDistanceM),
    runner.bandSpread,
    runner.model.params.ambientC,
  );
  const run = { piece, result, outcome };
  runner.cache.set(key, run);
  return run;
}

/**
 * Whether a plan keeps the descent below a line: decided on the coarse piece unless the coarse result lies
 * within `doubtK` of the line, then at the route's step.
 * @param runner the descent
 * @param plan driving plan
 * @param line warm or hot
 * @returns whether it passes, with the run that decided
 * @example checkPlan(runner, { speedMs: 40 / 3.6 }, "warm").pass
 */
export function checkPlan(runner: DescentRunner, plan: DrivePlan, line: AdviceLine): DescentRun & { pass: boolean } {
  const coarse = runPlan(runner, plan, false);
  if (runner.coarse !== runner.fine && Math.abs(marginTo(coarse.outcome, line)) < runner.settings.doubtK) {
    const fine = runPlan(runner, plan, true);
    return { ...fine, pass: isBelow(fine.outcome, line) };
  }
  return { ...coarse, pass: isBelow(coarse.outcome, line) };
}

/**
 * Heat-run options of a plan over a piece: the plan's own options, the user's stops inside the piece, and a
 * control from crest to bottom for the plan's gear and speed.
 * @param runner the descent
 * @param plan driving plan
 * @param piece the piece the options are for
 * @returns heat-run options
 * @example planOptions(runner, { gear: 2 }, runner.fine).controls
 */
export function planOptions(runner: DescentRunner, plan: DrivePlan, piece: PreparedRoute): HeatRunOptions {
  const d = piece.profile.distanceM;
  const first = d[0] as number;
  const last = d[d.length - 1] as number;
  const inside = (atM: number) => atM >= first && atM <= last;
  const controls: RangeControl[] = [...(runner.base.controls ?? [])];
  if (plan.gear !== undefined || plan.speedMs !== undefined) {
    controls.push({
      startM: runner.descent.startDistanceM,
      endM: runner.descent.endDistanceM,
      ...(plan.gear !== undefined ? { gear: plan.gear } : {}),
      ...(plan.speedMs !== undefined ? { speedMs: plan.speedMs } : {}),
    });
  }
  const params = plan.trailerGain === undefined ? runner.base.params : { ...runner.base.params, trailerGain: plan.trailerGain };
  return {
    params,
    stops: [...(runner.base.stops ?? []).filter((s) => inside(s.atM)), ...(plan.stops ?? [])],
    controls,
    startState: runner.startState,
  };
}

/**
 * The highest candidate that passes, by bisection, for candidates ordered from the most to the least cautious
 * (passing is assumed monotone: if one passes, every more cautious one does).
 * @param count number of candidates
 * @param passes test of candidate i
 * @returns index of the highest passing candidate, or −1 when none passes
 * @example highestPassing(6, (g) => g < 3) // 2
 */
export function highestPassing(count: number, passes: (i: number) => boolean): number {
  let lo = -1;
  let hi = count;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (passes(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}
