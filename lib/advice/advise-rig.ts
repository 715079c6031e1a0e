/**
 * Advice for one rig over a route, and the proof. The descents that reach warm or worse as planned are advised
 * in route order. Each is re-run from its lead-in with the brake state the rig carries in under the plans of
 * the descents before it. Its combined plan's run at the route's step (lead-in to bottom) is one piece of the
 * proof; the stretch from its bottom to the next advised descent's lead-in (or the route's end) is run on from
 * that run's end state at the search step (cooling and cruising), and its end state is carried into the next
 * descent. With the run as planned before the first advised descent, these pieces are the whole route with
 * all advice applied: the proof. `proveAdvice` (prove.ts) re-runs the same in one piece at the route's step.
 */

import type { Descent, PlacedWaypoint, RouteProfile } from "@/lib/route";
import { hotColdStops } from "@/lib/stopping";
import {
  prepareRoute,
  runPrepared,
  STEP_CLASSES,
  validateRouteProfile,
  type HeatRunOptions,
  type HeatRunResult,
  type PreparedRoute,
  type Rig,
  type StepClass,
  type ThermalState,
} from "@/lib/thermal";
import { adviseDescent, type DescentDraft } from "./advise-descent";
import { descentRunner, planOptions, runPlan, type DescentRunner } from "./descent-runner";
import { isBelow, outcomeOf } from "./outcome";
import { routePieces } from "./route-window";
import { DEFAULT_ADVICE_SETTINGS, type AdviceSettings } from "./settings";
import { shortfallOf } from "./shortfall";
import { nearestIndex } from "./stop-place";
import type { DescentAdvice, PlanStatus, RigAdvice, RunOutcome } from "./types";
import type { Region } from "@/lib/compliance";
import { legalReasons } from "./legal";
import { rigVerdict, traceVerdict } from "./verdict";

/** Input of {@link adviseRig}. */
export interface AdviseRigInput {
  /** The route: a profile (validated here) or a prepared route shared by several rigs. */
  route: RouteProfile | PreparedRoute;
  /** The route's descents (lib/route findDescents), in route order. */
  descents: readonly Descent[];
  /** The rig. */
  rig: Rig;
  /** The plan's conditions: model parameters, the user's own stops and controls, a starting state. */
  options?: HeatRunOptions;
  /** Waypoints placed on the route (lib/route placeWaypoints), for naming stop places. */
  waypoints?: readonly PlacedWaypoint[];
  /** A heat run of this rig on this route with these options, to reuse instead of running it again. */
  asPlanned?: HeatRunResult;
  /** Advice-engine settings. */
  settings?: Partial<AdviceSettings>;
  /** The rig's region, for its trailer-brake rule (null or absent: the mass ratings only). */
  region?: Region | null;
}

/** @private A piece of the proof: a run from `startIndex` on. */
interface Piece {
  startIndex: number;
  result: HeatRunResult;
}

/**
 * Advise one rig over a route and prove the advice on the whole route.
 * @param input route, descents, rig, conditions, waypoints, settings
 * @returns advice per descent that needs it, the proof per descent, and the rig's verdict
 * @throws {TypeError|RangeError} on an invalid route, rig or options (lib/thermal's exact messages)
 * @example adviseRig({ route: profile, descents, rig: UTE_AND_CARAVAN, waypoints }).verdict // "clear with advice"
 */
export function adviseRig(input: AdviseRigInput): RigAdvice {
  const route = "pathM" in input.route ? input.route : prepareRoute(validateRouteProfile(input.route), input.descents);
  const settings = { ...DEFAULT_ADVICE_SETTINGS, ...input.settings };
  const base = input.options ?? {};
  const waypoints = input.waypoints ?? [];
  const asPlanned = input.asPlanned ?? runPrepared(route, input.rig, base);
  const { descents } = input;
  const planned = descents.map((d) => outcomeOf(asPlanned, d.startDistanceM, d.endDistanceM));
  const flagged = descents.flatMap((_, i) => (planned[i]!.worstClass === "cool" ? [] : [i]));
  const leadIns = descents.map((d, i) => leadInIndex(route, d, i > 0 ? descents[i - 1]!.endIndex : 0, settings.leadInM));
  const pieces: Piece[] = [{ startIndex: 0, result: asPlanned }];
  const advice: DescentAdvice[] = [];
  let state = flagged.length > 0 ? stateAt(asPlanned, leadIns[flagged[0]!]!) : null;
  flagged.forEach((i, q) => {
    const a = leadIns[i]!;
    const next = q + 1 < flagged.length ? leadIns[flagged[q + 1]!]! : route.n - 1;
    const context = { rig: input.rig, base, model: asPlanned.model, settings };
    const runner = descentRunner(route, a, descents[i]!, state as ThermalState, context, settings.bandSpreads[i] ?? 0);
    const draft = adviseDescent(route, runner, waypoints);
    const planRun = runPlan(runner, draft?.plan ?? {}, draft !== null || runner.coarse === runner.fine);
    pieces.push({ startIndex: a, result: planRun.result });
    state = planRun.result.finalState;
    const bottom = descents[i]!.endIndex;
    if (next > bottom) {
      const stretch = runStretch(route, runner, bottom, next, state);
      pieces.push({ startIndex: bottom, result: stretch });
      state = stretch.finalState;
    }
    if (draft) advice.push(finishAdvice(draft, i, runner, planRun.result, planned[i]!));
  });
  const proof = descents.map((d, i) => ({
    descentIndex: i,
    asPlanned: planned[i]!,
    withAdvice: outcomeOf(pieceFor(pieces, d.startIndex).result, d.startDistanceM, d.endDistanceM),
  }));
  const worstClass = { asPlanned: worstOf([{ startIndex: 0, result: asPlanned }]), withAdvice: worstOf(pieces) };
  const legal = legalReasons(input.rig, input.region ?? null);
  return {
    descents: advice,
    proof,
    worstClass,
    verdict: legal.length > 0 ? "not advised" : traceVerdict(rigVerdict(advice, flagged.length > 0, worstClass.withAdvice), worstClass),
    legalReasons: legal,
    uncertainty: [],
    waypoints,
    modelVersion: asPlanned.modelVersion,
  };
}

/**
 * First sample of a descent's re-runs: `leadInM` before the crest, but not before the previous descent's
 * bottom nor across a gap between track segments.
 * @param route prepared route
 * @param descent the descent
 * @param floorIndex earliest allowed sample (the previous descent's bottom)
 * @param leadInM lead-in, m
 * @returns sample index
 * @example leadInIndex(route, descent, 0, 500) // descent.startIndex − 50 at 10 m steps
 */
export function leadInIndex(route: PreparedRoute, descent: Descent, floorIndex: number, leadInM: number): number {
  const d = route.profile.distanceM;
  const gap = route.profile.gapAfter;
  let a = descent.startIndex;
  while (a > floorIndex && gap[a - 1] !== 1 && (d[a - 1] as number) >= descent.startDistanceM - leadInM) a--;
  return a;
}

/** @private Run the stretch [from, to] at the search step from a state, with the user's stops and controls. */
function runStretch(route: PreparedRoute, runner: DescentRunner, from: number, to: number, start: ThermalState): HeatRunResult {
  const factor = Math.max(1, Math.round(runner.settings.searchStepM / route.profile.stepM));
  const piece = routePieces(route, from, to, factor).coarse;
  return runPrepared(piece, runner.rig, { ...planOptions(runner, {}, piece), startState: start });
}

/** @private The descent's advice with the proof's figures. */
function finishAdvice(
  draft: DescentDraft,
  descentIndex: number,
  runner: DescentRunner,
  proof: HeatRunResult,
  asPlanned: RunOutcome,
): DescentAdvice {
  const { descent, model } = runner;
  const outcome = outcomeOf(proof, descent.startDistanceM, descent.endDistanceM);
  const ends = (o: RunOutcome) => o.positions.map((p) => p.endC);
  return {
    descentIndex,
    highRangeGears: model.highRangeGears,
    descent,
    crestState: stateAt(draft.asPlanned.result, nearestIndex(draft.asPlanned.result.trace.distanceM, descent.startDistanceM)),
    baseline: asPlanned,
    gear: draft.gear,
    speed: draft.speed,
    stop: draft.stop,
    trailer: draft.trailer,
    nothingIsEnough: draft.nothingIsEnough,
    shortfall: isBelow(outcome, "hot") ? null : shortfallOf(outcome, model, draft.trailer),
    walkingPace: draft.walkingPace,
    plan: {
      plan: draft.plan,
      stops: draft.planStops,
      status: planStatus(outcome),
      outcome,
    },
    stopping: {
      asPlanned: hotColdStops(model, ends(asPlanned)),
      withPlan: hotColdStops(model, ends(outcome)),
    },
  };
}

/**
 * Where a plan's outcome keeps the brakes: below warm, below hot, or not below hot (fluid boil risk and runaway
 * count as not below hot, whatever the temperatures).
 * @param outcome the plan's re-run on the descent
 * @returns the status
 * @example planStatus(outcome) // "below-hot"
 */
export function planStatus(outcome: RunOutcome): PlanStatus {
  return isBelow(outcome, "warm") ? "below-warm" : isBelow(outcome, "hot") ? "below-hot" : "above-hot";
}

/** @private Brake state at a trace sample. */
function stateAt(result: HeatRunResult, k: number): ThermalState {
  return { rotorC: result.trace.rotorC.map((c) => c[k] as number), fluidC: result.trace.fluidC.map((c) => c[k] as number) };
}

/** @private The last piece starting at or before a sample. */
function pieceFor(pieces: readonly Piece[], index: number): Piece {
  let found = pieces[0]!;
  for (const p of pieces) if (p.startIndex <= index) found = p;
  return found;
}

/** @private Worst step class over the pieces, each counted up to where the next begins. */
function worstOf(pieces: readonly Piece[]): StepClass {
  let worst = 0;
  pieces.forEach((p, q) => {
    const t = p.result.trace;
    const stopAt = q + 1 < pieces.length ? pieces[q + 1]!.startIndex - p.startIndex : t.length - 1;
    for (let k = 0; k <= stopAt && k < t.length; k++) if ((t.worstClass[k] as number) > worst) worst = t.worstClass[k] as number;
  });
  return STEP_CLASSES[worst] ?? "cool";
}
