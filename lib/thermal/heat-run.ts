/**
 * Heat runs: the brake temperature of each brake position of a rig along a route (docs/model.md §2–8), for one
 * rig or a convoy sharing one route.
 */

import type { RouteProfile } from "@/lib/route/types";
import { MODEL_VERSION } from "./constants";
import { FLUID_PROXY_LABEL } from "./fluid";
import { integrateHeatRun } from "./integrate";
import { rigMasses } from "./masses";
import type { ModelParamsInput } from "./params";
import { prepareRoute, type PreparedRoute } from "./prepare-route";
import { controlColumns, type RangeControl } from "./range-controls";
import { resolveModel, type BrakePositionSpec, type ResolvedModel } from "./resolve";
import type { Rig } from "./rig";
import type { ThermalState } from "./standstill";
import { PAD_THRESHOLD_LABEL } from "./thresholds";
import type { HeatTrace } from "./trace";
import { validateHeatRunOptions, validateRouteProfile } from "./validate-run";
import { validateRig } from "./validate-rig";

/** A cool-down stop: the rig stands still at the sample nearest `atM` for `durationS`. */
export interface CoolDownStop {
  /** Where, m along the route. */
  atM: number;
  /** How long, s. */
  durationS: number;
}

/** Options of a heat run. */
export interface HeatRunOptions {
  /** Parameter overrides (every model parameter; see ModelParams). */
  params?: ModelParamsInput;
  /** Cool-down stops. */
  stops?: readonly CoolDownStop[];
  /** Driving instructions on stretches of the route: a held-speed cap, a held gear (model 1.1.0). */
  controls?: readonly RangeControl[];
  /** Starting state instead of the start temperature (aligned with the rig's positions: front, rear, trailer). */
  startState?: ThermalState;
}

/** The result of a heat run. */
export interface HeatRunResult {
  /** Model version. */
  modelVersion: string;
  /** Every parameter used, concrete. */
  model: ResolvedModel;
  /** Brake positions (same as model.positions), the order of every per-position array. */
  positions: BrakePositionSpec[];
  /** The heat trace. */
  trace: HeatTrace;
  /** State at the end of the route. */
  finalState: ThermalState;
  /** Labels and assumptions in plain words. */
  notes: string[];
}

/**
 * Run the brake-heat model for one rig along a route.
 * @param profile the route profile (from lib/route)
 * @param rig the rig
 * @param options parameter overrides, cool-down stops, starting state
 * @returns the heat trace with every parameter used
 * @throws {TypeError|RangeError} on invalid input, with an exact message
 * @example runHeatRun(profile, UTE_AND_CARAVAN).trace.rotorC[0] // front rotor temperature per sample, °C
 */
export function runHeatRun(profile: RouteProfile, rig: Rig, options: HeatRunOptions = {}): HeatRunResult {
  validateRouteProfile(profile);
  return runPrepared(prepareRoute(profile), rig, options);
}

/**
 * Run the model for several rigs on one route (the route's per-step quantities are computed once).
 * @param profile the route profile
 * @param rigs the rigs
 * @param options one set of options for all, or one per rig
 * @returns one result per rig, in order
 * @example runConvoyHeatRuns(profile, [rigA, rigB]).map((r) => r.finalState)
 */
export function runConvoyHeatRuns(
  profile: RouteProfile,
  rigs: readonly Rig[],
  options: HeatRunOptions | readonly HeatRunOptions[] = {},
): HeatRunResult[] {
  validateRouteProfile(profile);
  if (Array.isArray(options) && options.length !== rigs.length) {
    throw new RangeError("options must have one entry per rig");
  }
  const route = prepareRoute(profile);
  return rigs.map((rig, i) =>
    runPrepared(route, rig, Array.isArray(options) ? (options[i] as HeatRunOptions) : (options as HeatRunOptions)),
  );
}

/**
 * Run the model on a prepared route (validation of the rig and options included).
 * @param route prepared route (see prepareRoute)
 * @param rig the rig
 * @param options options
 * @returns the result
 * @example runPrepared(prepareRoute(profile), rig, {})
 */
export function runPrepared(route: PreparedRoute, rig: Rig, options: HeatRunOptions): HeatRunResult {
  validateRig(rig);
  const model = resolveModel(rig, validateHeatRunOptions(options, rig).params);
  const stopS = stopDurations(route.profile.distanceM, options.stops ?? []);
  const start = options.startState ?? initialState(model);
  if (start.rotorC.length !== model.positions.length || start.fluidC.length !== model.positions.length) {
    throw new RangeError("options.startState must have one entry per brake position");
  }
  const controls = controlColumns(route, model, options.controls);
  const { trace, finalState } = integrateHeatRun(route, model, stopS, start, controls);
  const notes = [
    `Brake thresholds: ${PAD_THRESHOLD_LABEL}.`,
    `Fluid temperatures: ${FLUID_PROXY_LABEL}.`,
    "Temperatures are bulk (lumped) rotor and drum temperatures; surface temperatures run higher.",
    ...rigMasses(rig).notes,
  ];
  return { modelVersion: MODEL_VERSION, model, positions: model.positions, trace, finalState, notes };
}

/**
 * The starting state: every rotor at the start temperature; each fluid proxy at its steady value for it.
 * @param model resolved model
 * @returns the starting state
 * @example initialState(model).rotorC // [25, 25, 25]
 */
export function initialState(model: ResolvedModel): ThermalState {
  const { ambientC, fluidGain } = model.params;
  const startC = model.params.startTempC ?? ambientC;
  return {
    rotorC: model.positions.map(() => startC),
    fluidC: model.positions.map((p) => (p.fluid ? ambientC + fluidGain * (startC - ambientC) : Number.NaN)),
  };
}

/**
 * Stop duration at each sample: each stop goes to the sample nearest its position (stops at one sample add up).
 * @param distanceM sample distances, m (non-decreasing)
 * @param stops the stops
 * @returns stop duration per sample, s
 * @example stopDurations(new Float64Array([0, 10, 20]), [{ atM: 12, durationS: 600 }]) // [0, 600, 0]
 */
export function stopDurations(distanceM: Float64Array, stops: readonly CoolDownStop[]): Float64Array {
  const out = new Float64Array(distanceM.length);
  for (const s of stops) {
    let lo = 0;
    let hi = distanceM.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if ((distanceM[mid] as number) <= s.atM) lo = mid;
      else hi = mid;
    }
    const k = Math.abs((distanceM[hi] as number) - s.atM) < Math.abs((distanceM[lo] as number) - s.atM) ? hi : lo;
    out[k] = (out[k] as number) + s.durationS;
  }
  return out;
}
