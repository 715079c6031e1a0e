/**
 * A what-if on a plan: one rig's conditions changed (descent speed, held gear, ambient temperature, trailer
 * controller gain, load, pad family, and two of the model's uncertain parameters: cooling and the front/rear
 * heat split, docs/model.md "Uncertainty bands"), optionally with the plan's advice applied, re-run through the same
 * lib/thermal as the server. Pure and isomorphic: the plan page runs it in the browser on every change.
 */

import { adviceOptions, outcomeOf, type RigAdvice, type RunOutcome } from "@/lib/advice";
import type { Descent } from "@/lib/route";
import { runPrepared, type HeatRunOptions, type HeatRunResult, type PadFamily, type PreparedRoute, type RangeControl, type Rig } from "@/lib/thermal";

/** The settings of a what-if (SI units, °C); null means "as in the plan". Saved as a scenario's settings. */
export interface WhatIfSettings {
  /** The plan rig the what-if changes. */
  planRigId: string;
  /** Apply the plan's advice for this rig (gears, speeds and stops) before the changes below. */
  applyAdvice: boolean;
  /** Held-speed cap on every descent, m/s. */
  descentSpeedMs: number | null;
  /** Gear held on every descent, 1-based (manual mode on an automatic). */
  gear: number | null;
  /** Ambient temperature, °C. */
  ambientC: number | null;
  /** Trailer brake-controller gain (dimensionless, 0–2). */
  trailerGain: number | null;
  /** Payload in the vehicle, kg. */
  vehiclePayloadKg: number | null;
  /** Load in the trailer, kg. */
  trailerLoadKg: number | null;
  /** Pad family of the vehicle's disc brakes. */
  padFamily: PadFamily | null;
  /**
   * Multiplier on the brakes' convective cooling (dimensionless, 0.5–1.5: the spread of published correlations,
   * docs/model.md "Cooling"). Absent in scenarios saved before it existed: same as null.
   */
  coolingFactor?: number | null;
  /** Front share of the tow vehicle's service-brake work (0.5–0.8, docs/model.md "Heat split"). Absent: null. */
  frontShare?: number | null;
}

/** Range of the what-if's cooling factor (dimensionless): BAND_COOLING_FACTOR of lib/thermal/ensemble.ts. */
export const WHAT_IF_COOLING_RANGE = { min: 0.5, max: 1.5 } as const;
/** Range of the what-if's front share of the service-brake work (docs/model.md, "Heat split"). */
export const WHAT_IF_FRONT_SHARE_RANGE = { min: 0.5, max: 0.8 } as const;

/** A what-if with nothing changed, for a rig. */
export function emptyWhatIf(planRigId: string): WhatIfSettings {
  return { planRigId, applyAdvice: false, descentSpeedMs: null, gear: null, ambientC: null, trailerGain: null, vehiclePayloadKg: null, trailerLoadKg: null, padFamily: null, coolingFactor: null, frontShare: null };
}

/**
 * A saved scenario's settings with every field present (scenarios saved before a field existed lack it).
 * @param s the settings as stored
 * @returns the settings, absent fields null
 * @example normalizeWhatIf({ ...old }).coolingFactor // null
 */
export function normalizeWhatIf(s: WhatIfSettings): WhatIfSettings {
  return { ...emptyWhatIf(s.planRigId), ...s, coolingFactor: s.coolingFactor ?? null, frontShare: s.frontShare ?? null };
}

/** Whether a what-if changes anything. */
export function changesAnything(s: WhatIfSettings): boolean {
  return s.applyAdvice || s.descentSpeedMs !== null || s.gear !== null || s.ambientC !== null || s.trailerGain !== null || s.vehiclePayloadKg !== null || s.trailerLoadKg !== null || s.padFamily !== null || (s.coolingFactor ?? null) !== null || (s.frontShare ?? null) !== null;
}

/**
 * The rig as the what-if changes it.
 * @param rig the plan's rig
 * @param s the what-if
 * @returns a new rig (the input is not changed)
 */
export function whatIfRig(rig: Rig, s: WhatIfSettings): Rig {
  const out: Rig = { ...rig, vehicle: { ...rig.vehicle }, load: { ...rig.load }, ...(rig.trailer ? { trailer: { ...rig.trailer } } : {}) };
  if (s.padFamily !== null) {
    out.vehicle.padFamily = s.padFamily;
    for (const key of ["frontBrakes", "rearBrakes"] as const) {
      const b = out.vehicle[key];
      if (b.kind !== "drum") out.vehicle[key] = { ...b, padFamily: s.padFamily };
    }
  }
  if (s.vehiclePayloadKg !== null) out.load.vehiclePayloadKg = s.vehiclePayloadKg;
  if (out.trailer) {
    if (s.trailerLoadKg !== null) out.load.trailerLoadKg = s.trailerLoadKg;
    if (s.trailerGain !== null && out.trailer.brakeType !== "none") out.trailer.controllerGain = s.trailerGain;
  }
  return out;
}

/**
 * The heat-run options as the what-if changes them: the plan's options, the advice if applied, then a control
 * on every descent for the speed and the gear, and the ambient temperature, cooling factor and front share.
 * @param base the plan's options
 * @param descents the route's descents
 * @param advice the rig's advice (used when `s.applyAdvice`)
 * @param s the what-if
 */
export function whatIfOptions(base: HeatRunOptions, descents: readonly Descent[], advice: RigAdvice | null, s: WhatIfSettings): HeatRunOptions {
  const withAdvice = s.applyAdvice && advice ? adviceOptions(advice, base) : base;
  const controls: RangeControl[] = [...(withAdvice.controls ?? [])];
  if (s.descentSpeedMs !== null || s.gear !== null) {
    for (const d of descents) {
      controls.push({
        startM: d.startDistanceM,
        endM: d.endDistanceM,
        ...(s.descentSpeedMs !== null ? { speedMs: s.descentSpeedMs } : {}),
        ...(s.gear !== null ? { gear: s.gear } : {}),
      });
    }
  }
  const params = {
    ...(withAdvice.params ?? {}),
    ...(s.ambientC !== null ? { ambientC: s.ambientC } : {}),
    ...((s.coolingFactor ?? null) !== null ? { coolingFactor: s.coolingFactor! } : {}),
    ...((s.frontShare ?? null) !== null ? { frontShare: s.frontShare! } : {}),
  };
  return { ...withAdvice, params, controls };
}

/** A what-if's result: the run and its outcome on each descent. */
export interface WhatIfResult {
  rig: Rig;
  options: HeatRunOptions;
  result: HeatRunResult;
  descents: RunOutcome[];
}

/**
 * Runs a what-if.
 * @param route the route, prepared once
 * @param descents its descents
 * @param rig the plan's rig
 * @param base the plan's options
 * @param advice the rig's advice, or null
 * @param s the what-if
 * @returns the run and per-descent outcomes
 * @throws {TypeError|RangeError} lib/thermal's messages on an impossible setting (e.g. a gear the rig lacks)
 * @example runWhatIf(route, descents, rig, options, advice, { ...emptyWhatIf(id), descentSpeedMs: 40 / 3.6 })
 */
export function runWhatIf(route: PreparedRoute, descents: readonly Descent[], rig: Rig, base: HeatRunOptions, advice: RigAdvice | null, s: WhatIfSettings): WhatIfResult {
  const changedRig = whatIfRig(rig, s);
  const options = whatIfOptions(base, descents, advice, s);
  const result = runPrepared(route, changedRig, options);
  return { rig: changedRig, options, result, descents: descents.map((d) => outcomeOf(result, d.startDistanceM, d.endDistanceM)) };
}
