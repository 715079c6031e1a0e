/**
 * Cool-down stops on one descent: before the brakes would cross the line, stop where a rig can stand
 * (stop-place.ts) for as long as the standstill cooling model (lib/thermal standstillTimeToReach) needs to bring
 * every brake to its target, each brake's warm line minus a margin, rounded up to whole minutes, at least
 * `minStopS` (5 min) and at most `maxStopS` (30 min). One stop is planned first; a second (at most `maxStops`)
 * only when the re-run with the first still crosses the line. Each stop is proven by re-running the descent
 * with it; the next stop, if one is needed, is placed on that re-run.
 *
 * The first stop is placed on the search-step run; every stop is proven at the route's step. The arrival state
 * includes the heat of slowing down for the stop; it comes from a run up to the stop (arrivalAt), which gives
 * it exactly, so the duration is right at once and each stop costs one full run of the descent.
 */

import type { PlacedWaypoint } from "@/lib/route";
import { runPrepared, standstillTimeToReach, type CoolDownStop, type ResolvedModel } from "@/lib/thermal";
import { planOptions, runPlan, RUN_COUNTS, type DescentRun, type DescentRunner } from "./descent-runner";
import { isBelow } from "./outcome";
import { sliceRoute } from "./route-window";
import { chooseStopSpot, firstCrossing, nearestIndex, type StopSpot } from "./stop-place";
import type { AdviceLine, DrivePlan, PlannedStop, StopAdvice } from "./types";
import type { PreparedRoute } from "@/lib/thermal";

/**
 * Plan cool-down stops on top of a driving plan.
 * @param route the whole prepared route
 * @param runner the descent
 * @param basePlan the driving plan the stops are added to (e.g. {} = as planned)
 * @param line the line to stay below
 * @param waypoints placed waypoints
 * @param atRouteStep prove each stop at the route's step (default) or only at the search step (to explore)
 * @returns the stops with the re-run's outcome
 * @example planStops(route, runner, {}, "hot", waypoints).stops[0].durationS // 900
 */
export function planStops(
  route: PreparedRoute,
  runner: DescentRunner,
  basePlan: DrivePlan,
  line: AdviceLine,
  waypoints: readonly PlacedWaypoint[],
  atRouteStep = true,
): StopAdvice {
  const { settings, descent } = runner;
  const targets = stopTargets(runner.model, settings.stopMarginK);
  const stops: PlannedStop[] = [];
  let current = runPlan(runner, basePlan, false);
  for (let n = 0; n < settings.maxStops; n++) {
    const crossing = firstCrossing(current.result, descent.startDistanceM, descent.endDistanceM, line, runner.bandSpread);
    if (crossing < 0) break;
    const lastM = stops.at(-1)?.atM;
    const fromM = lastM === undefined ? (runner.fine.profile.distanceM[0] as number) + 100 : lastM + settings.minStopSpacingM;
    const placed = placeStop(route, runner, { basePlan, stops, current, crossing, fromM, targets, waypoints, atRouteStep, line });
    if (placed === null) break;
    stops.push(placed.stop);
    current = placed.run;
  }
  return { line, stops, outcome: current.outcome, enough: isBelow(current.outcome, line) };
}

/** Inputs of placing one more stop. */
interface StopContext {
  basePlan: DrivePlan;
  stops: readonly PlannedStop[];
  current: DescentRun;
  crossing: number;
  fromM: number;
  targets: number[];
  waypoints: readonly PlacedWaypoint[];
  atRouteStep: boolean;
  line: AdviceLine;
}

/** Most tries at moving a stop earlier when the rig would arrive too close to the line. */
const MAX_PLACE_TRIES = 4;
/** How far earlier each try moves the latest allowed place, m. */
const MOVE_EARLIER_M = 200;

/**
 * @private Place and prove one more stop. The rig must arrive at least `stopArrivalMarginK` below the line
 * (slowing for the stop heats the brakes); if it would not, the stop moves earlier, up to a few times. Each
 * place is judged on its arrival state alone (a run up to the stop, arrivalAt), so a place passed over costs
 * no full run; only the place kept (the first that meets the margin, else the last tried) is run in full. At
 * the route's step, a place whose arrival on the search-step piece misses the margin by more than `doubtK` is
 * passed over on that alone.
 */
function placeStop(route: PreparedRoute, runner: DescentRunner, c: StopContext): { stop: PlannedStop; run: DescentRun } | null {
  const { settings, descent, model } = runner;
  const margin = (arrivalC: readonly number[]) => Math.min(...model.positions.map((p, j) => lineOf(p, c.line) - (arrivalC[j] as number)));
  const screen = c.atRouteStep && runner.coarse !== runner.fine;
  const clearlyFails = (atM: number) =>
    margin(arrivalAt(runner, c.basePlan, c.stops, atM, false)) < settings.stopArrivalMarginK - settings.doubtK;
  let latestM: number | undefined;
  let last: { spot: StopSpot; arrivalC: number[] | null } | null = null;
  for (let tries = 0; tries < MAX_PLACE_TRIES; tries++) {
    const window = { fromM: c.fromM, crestM: descent.startDistanceM, ...(latestM === undefined ? {} : { latestM }) };
    const spot = chooseStopSpot(route, c.current.result, c.crossing, window, c.targets, c.waypoints, settings);
    if (spot === null) break;
    latestM = spot.atM - MOVE_EARLIER_M;
    if (screen && clearlyFails(spot.atM)) {
      last = { spot, arrivalC: null };
      continue;
    }
    const arrivalC = arrivalAt(runner, c.basePlan, c.stops, spot.atM, c.atRouteStep);
    last = { spot, arrivalC };
    if (margin(arrivalC) >= settings.stopArrivalMarginK) break;
  }
  if (last === null) return null;
  const arrivalC = last.arrivalC ?? arrivalAt(runner, c.basePlan, c.stops, last.spot.atM, c.atRouteStep);
  const proven = proveStop(runner, c.basePlan, c.stops, last.spot.atM, arrivalC, c.targets, c.atRouteStep, c.line);
  return { stop: { ...proven.stop, place: last.spot.place }, run: proven.run };
}

/** @private A brake's line temperature, °C. */
function lineOf(p: ResolvedModel["positions"][number], line: AdviceLine): number {
  return line === "warm" ? p.thresholds.warmC : p.thresholds.hotC;
}

/**
 * Stop target per position: warm line minus the margin, but at least 15 K above ambient.
 * @param model resolved model
 * @param marginK margin below the warm line, K
 * @returns target per position, °C
 * @example stopTargets(model, 50) // [200, 200, 150]
 */
export function stopTargets(model: ResolvedModel, marginK: number): number[] {
  const floor = model.params.ambientC + 15;
  return model.positions.map((p) => Math.max(p.thresholds.warmC - marginK, floor));
}

/**
 * Duration of a stop from the arrival state: the cooling model's time, rounded up to whole minutes, at least
 * the shortest stop and at most the longest.
 * @param model resolved model
 * @param arrivalC brake temperatures on arrival, °C
 * @param targetC target per position, °C
 * @param limits shortest and longest stop, s
 * @returns duration, s; the cooling model's time, s; whether it was capped
 * @example stopDuration(model, [290, 250, 260], [200, 200, 150], { minStopS: 300, maxStopS: 1800 }).durationS
 */
export function stopDuration(
  model: ResolvedModel,
  arrivalC: readonly number[],
  targetC: readonly number[],
  limits: { minStopS: number; maxStopS: number },
): { durationS: number; modelTimeS: number; capped: boolean } {
  const state = { rotorC: [...arrivalC], fluidC: arrivalC.map(() => Number.NaN) };
  const modelTimeS = standstillTimeToReach(state, model.positions, targetC, model.params.ambientC).durationS;
  const minutes = Math.max(limits.minStopS, Math.ceil(modelTimeS / 60 - 1e-9) * 60);
  const longest = Math.floor(limits.maxStopS / 60 + 1e-9) * 60;
  return { durationS: Math.min(minutes, longest), modelTimeS, capped: minutes > longest };
}

/**
 * Brake temperatures on arriving at a stop (after slowing for it), °C, exactly as a run with the stop gives
 * them, from a run that ends at the stop. The trace records a sample before its stop cools anything, and
 * nothing after a standstill changes the speeds before it (the backward pass starts again from zero there),
 * so neither the stop's length nor the rest of the descent changes the arrival.
 * @param runner the descent
 * @param basePlan the driving plan
 * @param stops the stops before this one (in route order)
 * @param atM where the stop is, m
 * @param atRouteStep at the route's step, or on the search-step piece
 * @returns arrival temperature per position, °C
 * @example arrivalAt(runner, { gear: 2 }, [], 31_900, true) // [262.4, 201.7, 240.3]
 */
export function arrivalAt(
  runner: DescentRunner,
  basePlan: DrivePlan,
  stops: readonly CoolDownStop[],
  atM: number,
  atRouteStep: boolean,
): number[] {
  const piece = atRouteStep || runner.coarse === runner.fine ? runner.fine : runner.coarse;
  const k = nearestIndex(piece.profile.distanceM, atM);
  const plan = { ...basePlan, stops: [...stops.filter((s) => s.atM <= atM), { atM, durationS: 1 }] };
  if (k < 1) return stateAt(runPlan(runner, plan, atRouteStep), atM);
  const prefix = sliceRoute(piece, 0, k);
  const result = runPrepared(prefix, runner.rig, planOptions(runner, plan, prefix));
  RUN_COUNTS.prefix++;
  return result.trace.rotorC.map((c) => c[k] as number);
}

/** Steps in which a stop that is enough is shortened, s (whole minutes, as the advice quotes them). */
const SHORTEN_STEP_S = 300;

/**
 * @private Run the descent with one more stop, as long as the cooling model needs from its arrival state
 * (which the stop's own length does not change, see arrivalAt). When that keeps the descent below the line,
 * the stop is cut to the shortest 5-minute step that still does: a driver stops no longer than needed.
 */
function proveStop(
  runner: DescentRunner,
  basePlan: DrivePlan,
  stops: readonly CoolDownStop[],
  atM: number,
  arrivalC: readonly number[],
  targets: number[],
  atRouteStep: boolean,
  line: AdviceLine,
): { run: DescentRun; stop: Omit<PlannedStop, "place"> } {
  const { model, settings } = runner;
  const duration = stopDuration(model, arrivalC, targets, settings);
  const runFor = (durationS: number) => runPlan(runner, { ...basePlan, stops: [...stops, { atM, durationS }] }, atRouteStep);
  let durationS = duration.durationS;
  let run = runFor(durationS);
  if (isBelow(run.outcome, line)) {
    for (let d = settings.minStopS; d < durationS; d += SHORTEN_STEP_S) {
      const shorter = runFor(d);
      if (isBelow(shorter.outcome, line)) {
        durationS = d;
        run = shorter;
        break;
      }
    }
  }
  const stop = { atM, durationS, arrivalC: stateAt(run, atM), targetC: targets, modelTimeS: duration.modelTimeS, capped: duration.capped };
  return { run, stop };
}

/** @private Brake temperatures at a distance in a run, °C. */
function stateAt(run: DescentRun, atM: number): number[] {
  const t = run.result.trace;
  const k = nearestIndex(t.distanceM, atM);
  return t.rotorC.map((c) => c[k] as number);
}
