/**
 * Hot versus cold stopping distance at the bottom of a descent (checked in docs/validation.md §5): from 80 km/h and from 50 mph, with
 * the brakes at their predicted temperature beside the same rig with cold brakes (ambient). ESTIMATE.
 */

import type { ResolvedModel } from "@/lib/thermal";
import { KMH_80_MS, MPH_50_MS } from "./calibration";
import { stoppingDistance, type StoppingEstimate, type StoppingOptions } from "./stopping-distance";

/** Hot and cold stops from one speed. */
export interface HotColdStop {
  /** Which check speed: "80 km/h" or "50 mph". */
  from: "80 km/h" | "50 mph";
  /** Initial speed, m/s. */
  speedMs: number;
  /** With the brakes at ambient temperature. */
  cold: StoppingEstimate;
  /** With the brakes at the given (predicted) temperatures. */
  hot: StoppingEstimate;
  /** hot / cold braking distance (dimensionless). */
  ratio: number;
}

/**
 * Hot and cold stopping distances from 80 km/h and 50 mph.
 * @param model resolved model of the rig
 * @param rotorC brake temperatures, °C (model position order), e.g. at the bottom of a descent
 * @param options stopping options
 * @returns one entry per check speed (80 km/h, then 50 mph)
 * @example hotColdStops(result.model, [420, 380, 300])[0].hot.brakingDistanceM
 */
export function hotColdStops(
  model: ResolvedModel,
  rotorC: readonly number[],
  options: StoppingOptions = {},
): HotColdStop[] {
  return CHECK_SPEEDS.map(({ from, speedMs }) => {
    const cold = coldStop(model, speedMs, options);
    const hot = stoppingDistance(model, rotorC, speedMs, options);
    return { from, speedMs, cold, hot, ratio: hot.brakingDistanceM / cold.brakingDistanceM };
  });
}

/** @private The check speeds. */
const CHECK_SPEEDS = [
  { from: "80 km/h" as const, speedMs: KMH_80_MS },
  { from: "50 mph" as const, speedMs: MPH_50_MS },
];

/** @private Cold stops per model, options and speed (the same for every descent of a rig). */
const COLD_CACHE = new WeakMap<ResolvedModel, Map<string, StoppingEstimate>>();

/** @private The cold stop of a model from a speed, cached. */
function coldStop(model: ResolvedModel, speedMs: number, options: StoppingOptions): StoppingEstimate {
  let byKey = COLD_CACHE.get(model);
  if (byKey === undefined) COLD_CACHE.set(model, (byKey = new Map()));
  const key = `${speedMs}|${JSON.stringify(options)}`;
  let hit = byKey.get(key);
  if (hit === undefined) {
    hit = stoppingDistance(model, model.positions.map(() => model.params.ambientC), speedMs, options);
    byKey.set(key, hit);
  }
  return hit;
}
