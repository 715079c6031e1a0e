/**
 * Gear and speed searches on one descent. Candidates are ordered from the most to the least cautious; each
 * search looks for the highest that keeps every brake below the line (coarse runs, re-run at the route's step
 * when close to the line), re-runs it at the route's step and, if that fails, takes the next one down.
 * - Gears at the held speed: bisection (a lower gear holds a lower or equal speed at a higher rpm, so passing
 *   is monotone in the gear).
 * - Speeds: a scan of every 5 km/h step from the fastest down. Passing is NOT monotone in speed: in a held
 *   gear the friction power is roughly A·v − B·v² (gravity minus engine braking, which rises with rpm), so the
 *   peak is highest at middling speeds; walking pace can heat the brakes more than 35 km/h in 1st, and a single
 *   5 km/h step can pass between two that fail.
 */

import { descentGear, fixedGearSpeedLimit, isDescentStep } from "@/lib/thermal";
import { checkPlan, highestPassing, runPlan, type DescentRun, type DescentRunner } from "./descent-runner";
import { isBelow } from "./outcome";
import type { AdviceLine, DrivePlan, GearAdvice, SpeedAdvice } from "./types";

/**
 * The highest passing candidate, verified at the route's step.
 * @param runner the descent
 * @param count number of candidates (most cautious first)
 * @param planOf candidate i as a plan
 * @param line the line to stay below
 * @param method bisection (passing monotone in the candidates) or a scan from the highest down
 * @returns index (−1 when none) and its run
 * @example searchHighest(runner, 6, (i) => ({ gear: i + 1 }), "warm").index
 */
export function searchHighest(
  runner: DescentRunner,
  count: number,
  planOf: (i: number) => DrivePlan,
  line: AdviceLine,
  method: "bisect" | "scan" = "bisect",
): { index: number; run: DescentRun | null } {
  const passes = (k: number) => checkPlan(runner, planOf(k), line).pass;
  let i = method === "bisect" ? highestPassing(count, passes) : scanDown(count - 1, passes);
  while (i >= 0) {
    if (!runner.settings.verifyAtRouteStep) return { index: i, run: checkPlan(runner, planOf(i), line) };
    const run = runPlan(runner, planOf(i), true);
    if (isBelow(run.outcome, line)) return { index: i, run };
    i = method === "bisect" ? i - 1 : scanDown(i - 1, passes);
  }
  return { index: -1, run: null };
}

/** @private The highest index ≤ from that passes, scanning down; −1 if none. */
function scanDown(from: number, passes: (i: number) => boolean): number {
  for (let i = from; i >= 0; i--) if (passes(i)) return i;
  return -1;
}

/**
 * Speed candidates: walking pace, then 5 km/h steps up to the fastest speed held on the descent as planned
 * (rounded down to a multiple of the step).
 * @param runner the descent
 * @param plannedTopMs fastest held speed on the descent as planned, m/s
 * @returns speeds, m/s, ascending
 * @example speedCandidates(runner, 55 / 3.6).map((v) => Math.round(v * 3.6)) // [10, 15, …, 55]
 */
export function speedCandidates(runner: DescentRunner, plannedTopMs: number): number[] {
  const { speedStepMs, walkingPaceMs } = runner.settings;
  const top = Math.floor(plannedTopMs / speedStepMs + 1e-9) * speedStepMs;
  const out = [walkingPaceMs];
  for (let v = walkingPaceMs + speedStepMs; v <= top + 1e-9; v += speedStepMs) out.push(v);
  return out;
}

/**
 * Gear advice: the highest gear that keeps every brake below the warm line at the held speed, the held speed
 * capped at the gear's rpm limit, with the converter locked on an automatic. High range first; when even 1st
 * is not enough on a steep descent (runner.lowRangeFirst), the highest low-range gear that is (its held speed
 * also capped at the low-range speed cap). A driver reaches for low range only when high range will not do.
 * @param runner the descent
 * @param lowRange whether low range may be tried when high range is not enough (default: on a steep descent)
 * @returns the advice (gear null when no gear is enough)
 * @example gearAdvice(runner).gear // 2
 */
export function gearAdvice(runner: DescentRunner, lowRange = runner.lowRangeFirst): GearAdvice {
  const { model } = runner;
  const high = model.highRangeGears;
  let found = searchHighest(runner, high, (i) => ({ gear: i + 1 }), "warm");
  let offset = 0;
  if (found.index < 0 && lowRange && model.overallRatios.length > high) {
    found = searchHighest(runner, model.overallRatios.length - high, (i) => ({ gear: high + i + 1 }), "warm");
    offset = high;
  }
  const gear = found.index >= 0 ? offset + found.index + 1 : null;
  const outcome = found.run?.outcome ?? runPlan(runner, { gear: 1 }, false).outcome;
  return {
    gear,
    gearLimitMs: gear === null ? null : fixedGearSpeedLimit(model, gear),
    heldTopMs: found.run === null ? null : topSpeedMs(found.run, runner),
    maxRpm: model.params.maxRpm ?? 0,
    manualMode: model.transmission.kind === "automatic",
    outcome,
  };
}

/**
 * Speed advice: the highest steady speed on the 5 km/h grid that keeps every brake below the warm line, each
 * speed in the advised gear for it: the lowest gear that reaches it within the rpm limit, held (converter
 * locked on an automatic). The same search gives step 2 of the combined plan.
 * @param runner the descent
 * @param speeds candidates, m/s ascending (speedCandidates)
 * @param lowRange whether low-range gears may carry the speeds (default: on a steep descent with a low range)
 * @returns the advice (speed null when no step is enough; the outcome is then walking pace in 1st)
 * @example speedAdvice(runner, speedCandidates(runner, 55 / 3.6)).speedMs
 */
export function speedAdvice(runner: DescentRunner, speeds: readonly number[], lowRange = runner.lowRangeFirst): SpeedAdvice {
  const planOf = (i: number) => gearForSpeed(runner, speeds[i] as number, lowRange);
  const found = searchHighest(runner, speeds.length, planOf, "warm", "scan");
  const plan = found.index >= 0 ? planOf(found.index) : planOf(0);
  const run = found.run ?? runPlan(runner, plan, false);
  return {
    speedMs: found.index >= 0 ? (speeds[found.index] as number) : null,
    gear: plan.gear as number,
    gearSource: "advised",
    manualMode: runner.model.transmission.kind === "automatic",
    outcome: run.outcome,
  };
}

/**
 * A speed with the lowest gear that reaches it within the rpm limit, held (converter locked).
 * @param runner the descent
 * @param speedMs speed, m/s
 * @param lowRange whether a low-range gear may be chosen (default: on a steep descent with a low range)
 * @returns the plan
 * @example gearForSpeed(runner, 30 / 3.6) // { gear: 1, speedMs: 8.33 }
 */
export function gearForSpeed(runner: DescentRunner, speedMs: number, lowRange = runner.lowRangeFirst): DrivePlan {
  return { gear: descentGear(runner.model, speedMs, lowRange), speedMs };
}

/**
 * Fastest held speed on the descent's policy steps (as steep as the gentlest descent-speed tier) in a run,
 * m/s; on a descent with no such step, the fastest held speed on it. A speed cap above this binds nowhere
 * the policy applies, so it is where the speed candidates stop.
 * @param run a run of the descent
 * @param runner the descent
 * @returns speed, m/s
 * @example topSpeedMs(runPlan(runner, {}, true), runner) // 15.28 (55 km/h)
 */
export function topSpeedMs(run: DescentRun, runner: DescentRunner): number {
  const t = run.result.trace;
  const grade = run.piece.descentGrade;
  let top = 0;
  let topAny = 0;
  for (let k = 0; k < t.length; k++) {
    const d = t.distanceM[k] as number;
    if (d < runner.descent.startDistanceM || d > runner.descent.endDistanceM) continue;
    const v = t.speedMs[k] as number;
    if (v > topAny) topAny = v;
    if (v > top && isDescentStep(grade[k] as number, runner.model)) top = v;
  }
  return top > 0 ? top : topAny;
}
