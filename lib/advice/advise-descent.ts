/**
 * Advice for one descent: gear, speed, cool-down stops, trailer brakes, whether anything is enough, and the
 * combined plan. The combined plan follows the order in which an experienced driver reaches for them (common
 * practice, no published source: gear and speed first, then one cool-down stop, then a second):
 * 1. the gear advice if there is one (hold that gear; the speed it allows is stated, not imposed: in the model a
 *    lower speed in the same gear can heat the brakes more, the engine braking less at lower rpm);
 * 2. else the speed advice: the fastest 5 km/h step, in the lowest gear that reaches it within the rpm limit,
 *    held, that keeps every brake below the warm line;
 * 3. else, when some gear (held) or speed step (in its gear, held) keeps them below the hot line, the one that
 *    keeps them furthest below it (the brakes will be in the caution range, so the most margin wins over
 *    speed), with cool-down stops added if they bring it below the warm line;
 *    High range first: low range joins the candidates of steps 1–3 only on a steep descent (settings
 *    lowRangeFromGrade, where 4x4 drivers reach for it), and otherwise only when no high-range gear or speed
 *    keeps the brakes below the hot line. Stops are added in step 3 only when they are short (settings
 *    cautionStopMaxS): a plan may leave the brakes in the caution band.
 * 4. else cool-down stops on top of the coolest gear and speed, else driving as planned with stops, if they
 *    keep every brake below the hot line; stops are only where a rig can stand, one first and two at most, each
 *    at most 30 minutes (stop-plan.ts, stop-place.ts);
 * 5. else nothing is enough: no gear (held), no speed from walking pace up (in its lowest gear, held) and no
 *    stops keep every brake below the hot line and the fluid below boil risk. The plan is then the coolest of
 *    those gears and speeds, and the advice says plainly that it is not enough, why (which brake, how far past
 *    which line) and what would change it (shortfall.ts).
 * Gear and speed come first because a rig that keeps rolling cools faster than a parked one (docs/model.md);
 * stops are added only when gear and speed alone leave the brakes too warm. "Nothing is enough" covers every
 * speed step, not only walking pace: below the engine's useful rpm engine braking fades, so in the model
 * walking pace is not always the gentlest way down; and a stop can rescue a descent that no gear or speed can
 * (at the crest, when the rig arrives hot).
 */

import type { PlacedWaypoint } from "@/lib/route";
import type { PreparedRoute } from "@/lib/thermal";
import { runPlan, type DescentRun, type DescentRunner } from "./descent-runner";
import { gearAdvice, gearForSpeed, searchHighest, speedAdvice, speedCandidates, topSpeedMs } from "./gear-speed";
import { isBelow } from "./outcome";
import { planStops } from "./stop-plan";
import { trailerAdvice } from "./trailer";
import type { DrivePlan, GearAdvice, PlannedStop, RunOutcome, SpeedAdvice, StopAdvice, TrailerAdvice } from "./types";

/** Advice for one descent before the whole-route proof. */
export interface DescentDraft {
  asPlanned: DescentRun;
  gear: GearAdvice;
  speed: SpeedAdvice;
  stop: StopAdvice | null;
  trailer: TrailerAdvice | null;
  nothingIsEnough: boolean;
  walkingPace: RunOutcome;
  /** The combined plan, to be proven in the whole-route run, and its stops in detail. */
  plan: DrivePlan;
  planStops: PlannedStop[];
}

/**
 * Advise one descent.
 * @param route the whole prepared route
 * @param runner the descent, with the brake state carried in
 * @param waypoints placed waypoints (named stop places)
 * @returns the draft advice, or null when the descent stays cool as planned
 * @example adviseDescent(route, runner, waypoints)?.gear.gear // 2
 */
export function adviseDescent(
  route: PreparedRoute,
  runner: DescentRunner,
  waypoints: readonly PlacedWaypoint[],
): DescentDraft | null {
  const asPlanned = runPlan(runner, {}, false);
  if (!needsAdvice(runner, asPlanned)) return null;
  const speeds = speedCandidates(runner, topSpeedMs(asPlanned, runner));
  let gear = gearAdvice(runner);
  let speed = speedAdvice(runner, speeds);
  const stop = isBelow(asPlanned.outcome, "hot") ? null : planStops(route, runner, {}, "hot", waypoints);
  const trailer = trailerAdvice(runner, asPlanned);
  const combined = combinedPlan(route, runner, gear, speed, stop, speeds, waypoints);
  // A plan in low range: the gear and speed lines say what low range does too, so they agree with the plan.
  if ((combined.plan.gear ?? 0) > runner.model.highRangeGears && !runner.lowRangeFirst) {
    if (gear.gear === null) gear = gearAdvice(runner, true);
    if (speed.speedMs === null) speed = speedAdvice(runner, speeds, true);
  }
  const walkingPlan = gearForSpeed(runner, runner.settings.walkingPaceMs, true);
  const walkingPace = runPlan(runner, walkingPlan, combined.nothingIsEnough || runner.coarse === runner.fine).outcome;
  const { nothingIsEnough } = combined;
  return { asPlanned, gear, speed, stop, trailer, nothingIsEnough, walkingPace, plan: combined.plan, planStops: combined.stops };
}

/** @private Whether the descent reaches warm or worse (a coarse run near the line is re-run at the route's step). */
function needsAdvice(runner: DescentRunner, coarse: DescentRun): boolean {
  if (coarse.outcome.worstClass !== "cool") return true;
  if (coarse.outcome.marginToWarmK >= runner.settings.doubtK) return false;
  return runPlan(runner, {}, true).outcome.worstClass !== "cool";
}

/** @private The combined plan, by the rule in the module comment. */
function combinedPlan(
  route: PreparedRoute,
  runner: DescentRunner,
  gear: GearAdvice,
  speed: SpeedAdvice,
  stop: StopAdvice | null,
  speeds: readonly number[],
  waypoints: readonly PlacedWaypoint[],
): { plan: DrivePlan; stops: PlannedStop[]; nothingIsEnough: boolean } {
  const none = { stops: [], nothingIsEnough: false };
  if (gear.gear !== null) return { ...none, plan: { gear: gear.gear } };
  const planOf = (i: number) => gearForSpeed(runner, speeds[i] as number);
  if (speed.speedMs !== null) return { ...none, plan: { gear: speed.gear, speedMs: speed.speedMs } };
  // High range first (low range too on a steep descent: runner.lowRangeFirst); low range always in the last resort.
  const highGears = runner.lowRangeFirst ? runner.model.overallRatios.length : runner.model.highRangeGears;
  const candidates = [
    ...Array.from({ length: highGears }, (_, i): DrivePlan => ({ gear: i + 1 })),
    ...speeds.map((_, i) => planOf(i)),
  ];
  let base = coolestBelowHot(runner, candidates);
  const everyGear = Array.from({ length: runner.model.overallRatios.length }, (_, i): DrivePlan => ({ gear: i + 1 }));
  const every = [...everyGear, ...speeds.map((v) => gearForSpeed(runner, v, true))];
  // Low range when high range cannot keep the brakes below the fade-likely line: the highest low-range gear
  // that keeps them below the caution line (crawling slower than needed is no better), else the coolest.
  if (base === null && every.length > candidates.length) base = lowRangeBelowWarm(runner) ?? coolestBelowHot(runner, every);
  if (base === null) return lastResort(route, runner, stop, every, waypoints);
  const withStops = exploreStops(route, runner, base, "warm", waypoints);
  const stopTimeS = withStops === null ? Infinity : withStops.stops.reduce((t, x) => t + x.durationS, 0);
  if (withStops === null || stopTimeS > runner.settings.cautionStopMaxS) return { ...none, plan: base };
  return { plan: { ...base, stops: withStops.stops.map(stripStop) }, stops: withStops.stops, nothingIsEnough: false };
}

/** @private The highest low-range gear (held) that keeps every brake below the warm line, or null. */
function lowRangeBelowWarm(runner: DescentRunner): DrivePlan | null {
  const high = runner.model.highRangeGears;
  const count = runner.model.overallRatios.length - high;
  if (count <= 0) return null;
  const found = searchHighest(runner, count, (i) => ({ gear: high + i + 1 }), "warm");
  return found.index >= 0 ? { gear: high + found.index + 1 } : null;
}

/** @private Step 3's base: the candidate furthest below the hot line (search step), confirmed at the route's step. */
function coolestBelowHot(runner: DescentRunner, candidates: readonly DrivePlan[]): DrivePlan | null {
  const ranked = rankCoolest(runner, candidates);
  for (const plan of ranked.slice(0, 2)) {
    const run = runner.settings.verifyAtRouteStep ? runPlan(runner, plan, true) : runPlan(runner, plan, false);
    if (isBelow(run.outcome, "hot")) return plan;
  }
  return null;
}

/** @private Candidates from the furthest below the hot line to the nearest (search-step runs). */
function rankCoolest(runner: DescentRunner, candidates: readonly DrivePlan[]): DrivePlan[] {
  const margin = new Map(candidates.map((p) => [p, runPlan(runner, p, false).outcome.marginToHotK]));
  return [...candidates].sort((a, b) => (margin.get(b) as number) - (margin.get(a) as number));
}

/** @private Steps 4–5 of the rule: stops on the coolest gear and speed, else stops as planned, else nothing is enough. */
function lastResort(
  route: PreparedRoute,
  runner: DescentRunner,
  stop: StopAdvice | null,
  combos: readonly DrivePlan[],
  waypoints: readonly PlacedWaypoint[],
): { plan: DrivePlan; stops: PlannedStop[]; nothingIsEnough: boolean } {
  const coolest = rankCoolest(runner, combos)[0]!;
  const withStops = exploreStops(route, runner, coolest, "hot", waypoints);
  if (withStops !== null) {
    return { plan: { ...coolest, stops: withStops.stops.map(stripStop) }, stops: withStops.stops, nothingIsEnough: false };
  }
  if (stop !== null && stop.enough && stop.stops.length > 0) {
    return { plan: { stops: stop.stops.map(stripStop) }, stops: stop.stops, nothingIsEnough: false };
  }
  return { plan: coolest, stops: [], nothingIsEnough: true };
}

/** @private Stops on top of a plan: explored at the search step, then proven at the route's step; null if not enough. */
function exploreStops(
  route: PreparedRoute,
  runner: DescentRunner,
  base: DrivePlan,
  line: "warm" | "hot",
  waypoints: readonly PlacedWaypoint[],
): StopAdvice | null {
  const explored = planStops(route, runner, base, line, waypoints, false);
  if (!explored.enough || explored.stops.length === 0) return null;
  const proven = planStops(route, runner, base, line, waypoints, true);
  return proven.enough && proven.stops.length > 0 ? proven : null;
}

/** @private A planned stop as a plain cool-down stop. */
function stripStop(s: { atM: number; durationS: number }): { atM: number; durationS: number } {
  return { atM: s.atM, durationS: s.durationS };
}
