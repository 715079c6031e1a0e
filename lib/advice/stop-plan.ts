/**
 * Cool-down stops on one descent: before the brakes would cross the line, stop (stop-place.ts) for as long as
 * the standstill cooling model (lib/thermal standstillTimeToReach) needs to bring every brake to its target,
 * each brake's warm line minus a margin, rounded up to whole minutes (at least 5). Each stop is proven by
 * re-running the descent with it; the next stop, if one is needed, is placed on that re-run.
 *
 * The first stop is placed on the search-step run; every stop is proven at the route's step. The arrival state
 * includes the heat of slowing down for the stop: the first duration comes from an estimate of it, a run with
 * the stop in place gives the real one, and if the duration from that differs, the stop is run again with it.
 */

import type { PlacedWaypoint } from "@/lib/route";
import { standstillTimeToReach, type CoolDownStop, type ResolvedModel } from "@/lib/thermal";
import { runPlan, type DescentRun, type DescentRunner } from "./descent-runner";
import { isBelow } from "./outcome";
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
    const crossing = firstCrossing(current.result, descent.startDistanceM, descent.endDistanceM, line);
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
 * (slowing for the stop heats the brakes); if it would not, the stop moves earlier, up to a few times. Asked
 * for the route's step, each place is first tried on the search-step piece: a place whose arrival there misses
 * the margin by more than `doubtK` is passed over without a route-step run (only the last place tried is
 * always proven at the route's step, since it is the one kept when no place meets the margin).
 */
function placeStop(route: PreparedRoute, runner: DescentRunner, c: StopContext): { stop: PlannedStop; run: DescentRun } | null {
  const { settings, descent, model } = runner;
  const screen = c.atRouteStep && runner.coarse !== runner.fine;
  const margin = (arrivalC: readonly number[]) => Math.min(...model.positions.map((p, j) => lineOf(p, c.line) - (arrivalC[j] as number)));
  const prove = (spot: StopSpot, atRouteStep: boolean) => {
    const proven = proveStop(runner, c.basePlan, c.stops, spot.atM, estimateArrivalC(c.current, spot.atM), c.targets, atRouteStep);
    return { stop: { ...proven.stop, place: spot.place }, run: proven.run };
  };
  let latestM: number | undefined;
  let best: { stop: PlannedStop; run: DescentRun } | null = null;
  let passedOver: StopSpot | null = null;
  for (let tries = 0; tries < MAX_PLACE_TRIES; tries++) {
    const window = { fromM: c.fromM, crestM: descent.startDistanceM, ...(latestM === undefined ? {} : { latestM }) };
    const spot = chooseStopSpot(route, c.current.result, c.crossing, window, c.targets, c.waypoints, settings);
    if (spot === null) break;
    latestM = spot.atM - MOVE_EARLIER_M;
    if (screen && margin(arrivalOnCoarse(runner, c, spot.atM)) < settings.stopArrivalMarginK - settings.doubtK) {
      passedOver = spot;
      continue;
    }
    passedOver = null;
    best = prove(spot, c.atRouteStep);
    if (margin(best.stop.arrivalC) >= settings.stopArrivalMarginK) return best;
  }
  return passedOver === null ? best : prove(passedOver, c.atRouteStep);
}

/**
 * @private Arrival temperatures at a stop on the search-step piece: one run with the stop at its estimated
 * duration (the arrival, recorded before the stop cools anything, does not depend on the stop's own length).
 */
function arrivalOnCoarse(runner: DescentRunner, c: StopContext, atM: number): number[] {
  const duration = stopDuration(runner.model, estimateArrivalC(c.current, atM), c.targets, runner.settings).durationS;
  return stateAt(runPlan(runner, { ...c.basePlan, stops: [...c.stops, { atM, durationS: duration }] }, false), atM);
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
 * @example stopDuration(model, [290, 250, 260], [200, 200, 150], { minStopS: 300, maxStopS: 3600 }).durationS
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
  return { durationS: Math.min(minutes, limits.maxStopS), modelTimeS, capped: minutes > limits.maxStopS };
}

/** @private Run the descent with one more stop until its duration matches its arrival state. */
function proveStop(
  runner: DescentRunner,
  basePlan: DrivePlan,
  stops: readonly CoolDownStop[],
  atM: number,
  estimateC: number[],
  targets: number[],
  atRouteStep: boolean,
): { run: DescentRun; stop: Omit<PlannedStop, "place"> } {
  const { model, settings } = runner;
  let duration = stopDuration(model, estimateC, targets, settings);
  for (let attempt = 0; ; attempt++) {
    const plan = { ...basePlan, stops: [...stops, { atM, durationS: duration.durationS }] };
    const run = runPlan(runner, plan, atRouteStep);
    const arrivalC = stateAt(run, atM);
    const actual = stopDuration(model, arrivalC, targets, settings);
    if (actual.durationS === duration.durationS || attempt === 2) {
      return { run, stop: { atM, durationS: duration.durationS, arrivalC, targetC: targets, modelTimeS: actual.modelTimeS, capped: actual.capped } };
    }
    duration = actual;
  }
}

/** @private Brake temperatures at a distance in a run, °C. */
function stateAt(run: DescentRun, atM: number): number[] {
  const t = run.result.trace;
  const k = nearestIndex(t.distanceM, atM);
  return t.rotorC.map((c) => c[k] as number);
}

/**
 * @private Arrival temperatures if the rig stops at `atM`: the run's state there plus the kinetic energy of
 * slowing from the held speed, split as that step's friction work (an estimate for the first duration).
 */
function estimateArrivalC(run: DescentRun, atM: number): number[] {
  const t = run.result.trace;
  const { model } = run.result;
  const k = nearestIndex(t.distanceM, atM);
  const v = t.speedMs[k] as number;
  const energyJ = 0.5 * model.effectiveMassKg * v * v;
  const work = t.energy.brakeJ.map((c) => c[k] as number);
  const total = work.reduce((s, w) => s + w, 0);
  return model.positions.map((p, j) => {
    const share = total > 0 ? (work[j] as number) / total : 0;
    return (t.rotorC[j]![k] as number) + (p.rotorPartition * energyJ * share) / (p.wheels * p.massKg * p.specificHeat);
  });
}
