/**
 * The heat trace: a column-wise record of a heat run, one entry per route sample (typed arrays, no per-step
 * objects). Values at sample k describe the arrival at k; step quantities (power, energy, gear) belong to the
 * step from k−1 to k and are 0 at k = 0 and across gaps.
 */

import type { RouteProfile } from "@/lib/route/types";

/** Energy terms per step, J (whole combination; brake terms per position, all wheels at the position). */
export interface StepEnergies {
  /** Potential energy released m·g·(h_(k−1) − h_k), J (negative when climbing). */
  potentialJ: Float64Array;
  /** Kinetic energy released ½·m_eff·(v_(k−1)² − v_k²), J (negative when speeding up). */
  kineticJ: Float64Array;
  /** Traction work the engine supplied (throttle), J (≥ 0). */
  driveJ: Float64Array;
  /** Aerodynamic drag work, J (≥ 0). */
  aeroJ: Float64Array;
  /** Rolling-resistance work, J (≥ 0). */
  rollingJ: Float64Array;
  /** Engine-braking work at the wheels, J (≥ 0). */
  engineJ: Float64Array;
  /** Friction work per brake position (rotor and pad), J (≥ 0); aligned with the result's positions. */
  brakeJ: Float64Array[];
}

/** The heat trace. All arrays have the profile's length. */
export interface HeatTrace {
  /** Sample count. */
  length: number;
  /** Distance along the route, m (the profile's own array). */
  distanceM: Float64Array;
  /** Elevation, m (the profile's own array). */
  elevationM: Float64Array;
  /** Elapsed time on arrival, s (includes earlier stops). */
  timeS: Float64Array;
  /** Held speed, m/s. */
  speedMs: Float64Array;
  /**
   * Gear the descent gear policy holds over the step ending here while the engine retards, 1-based; 0 where
   * the rig is on throttle, at sample 0 and across gaps.
   */
  gear: Uint8Array;
  /** Cool-down stop made at this sample after arriving, s (0 = none). */
  stopS: Float64Array;
  /** Engine retarding power used over the step ending here, W. */
  enginePowerW: Float64Array;
  /** Bulk rotor/drum temperature per position on arrival, °C. */
  rotorC: Float64Array[];
  /** Fluid proxy per position on arrival, °C (NaN without hydraulic fluid). Unvalidated. */
  fluidC: Float64Array[];
  /** Friction power at ONE wheel of each position over the step ending here, W. */
  brakePowerW: Float64Array[];
  /**
   * 1 where the brakes could not hold the held speed over the step ending here (the demand exceeded the
   * faded brakes' capacity; docs/model.md, "Hold capacity"): every position's class there is runaway.
   */
  holdLost: Uint8Array;
  /** Step class per position (index into STEP_CLASSES). */
  stepClass: Uint8Array[];
  /** Worst step class over the positions. */
  worstClass: Uint8Array;
  /** Energy terms of the step ending here. */
  energy: StepEnergies;
}

/**
 * Allocate an empty trace for a profile and a number of brake positions.
 * @param profile the route profile (its distance and elevation arrays are shared, not copied)
 * @param positions number of brake positions (2 or 3)
 * @returns a zeroed trace
 * @example allocateTrace(profile, 3).rotorC.length // 3
 */
export function allocateTrace(profile: RouteProfile, positions: number): HeatTrace {
  const n = profile.distanceM.length;
  const cols = (): Float64Array[] => Array.from({ length: positions }, () => new Float64Array(n));
  return {
    length: n,
    distanceM: profile.distanceM,
    elevationM: profile.elevationM,
    timeS: new Float64Array(n),
    speedMs: new Float64Array(n),
    gear: new Uint8Array(n),
    stopS: new Float64Array(n),
    enginePowerW: new Float64Array(n),
    rotorC: cols(),
    fluidC: cols(),
    brakePowerW: cols(),
    holdLost: new Uint8Array(n),
    stepClass: Array.from({ length: positions }, () => new Uint8Array(n)),
    worstClass: new Uint8Array(n),
    energy: {
      potentialJ: new Float64Array(n),
      kineticJ: new Float64Array(n),
      driveJ: new Float64Array(n),
      aeroJ: new Float64Array(n),
      rollingJ: new Float64Array(n),
      engineJ: new Float64Array(n),
      brakeJ: cols(),
    },
  };
}
