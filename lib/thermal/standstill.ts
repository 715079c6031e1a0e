/**
 * Cooling at standstill, for cool-down stops: standstill convection hA_0 plus radiation, times the wheel-and-arch
 * enclosure factor (docs/model.md §6.3; check case C11). With the exact linearisation of radiation the total
 * loss is G(T)·(T − Ta), G(T) = f·(hA_0 + A_rad·h_rad(T)), h_rad = ε·σ·(T² + Ta²)(T + Ta) in kelvin, so the time
 * to cool is t = ∫ τ(T) d ln(T − Ta) with τ = m·c(T)/G(T); for convection only, t = τ·ln((T0 − Ta)/(T1 − Ta)).
 */

import { radiationCoefficient, specificHeat } from "./cooling";
import { exactStepC } from "./exact-step";
import { fluidProxyStepC } from "./fluid";
import type { BrakePositionSpec } from "./resolve";

/** Thermal state of a rig, aligned with its brake positions. */
export interface ThermalState {
  /** Bulk rotor or drum temperature per position, °C. */
  rotorC: number[];
  /** Fluid proxy per position, °C; NaN where the position has no hydraulic fluid. */
  fluidC: number[];
}

/** Longest standstill sub-step, s. */
const MAX_SUBSTEP_S = 30;
/** Simpson intervals for the cooling-time integral (even). */
const SIMPSON_INTERVALS = 96;

/**
 * Total conductance of one brake at standstill (enclosure factor applied), W/K.
 * @param spec brake position
 * @param tempC brake temperature, °C
 * @param ambientC ambient temperature, °C
 * @returns conductance to ambient, W/K
 * @example standstillConductanceWK(frontSpec, 300, 25) // ≈ 2.1
 */
export function standstillConductanceWK(spec: BrakePositionSpec, tempC: number, ambientC: number): number {
  const radiation = radiationCoefficient(spec.emissivity, tempC, ambientC) * spec.radiatingAreaM2;
  return spec.standstillFactor * (spec.standstillConductanceWK + radiation);
}

/**
 * Temperature of one brake after standing still for a duration (exact steps of ≤ 30 s with a mid-step
 * re-evaluation of radiation and specific heat).
 * @param spec brake position
 * @param tempC temperature at the start of the stop, °C
 * @param ambientC ambient temperature, °C
 * @param durationS length of the stop, s
 * @returns temperature at the end of the stop, °C
 * @example coolBrakeAtStandstill(frontSpec, 300, 25, 2700) // ≈ 100
 */
export function coolBrakeAtStandstill(
  spec: BrakePositionSpec,
  tempC: number,
  ambientC: number,
  durationS: number,
): number {
  const out = [tempC, Number.NaN];
  standstillSubsteps(out, spec, ambientC, durationS, 0, 1);
  return out[0] ?? tempC;
}

/**
 * Time one brake needs at standstill to cool from one temperature to another (Simpson's rule in ln(T − Ta)).
 * @param spec brake position
 * @param fromC temperature at the start of the stop, °C
 * @param toC target temperature, °C
 * @param ambientC ambient temperature, °C
 * @returns duration, s: 0 when already at or below the target, Infinity when the target is at or below ambient
 * @example timeToCoolAtStandstillS(frontSpec, 300, 100, 25) // ≈ 2700
 */
export function timeToCoolAtStandstillS(
  spec: BrakePositionSpec,
  fromC: number,
  toC: number,
  ambientC: number,
): number {
  if (fromC <= toC) return 0;
  if (toC <= ambientC) return Infinity;
  const u0 = Math.log(toC - ambientC);
  const u1 = Math.log(fromC - ambientC);
  const h = (u1 - u0) / SIMPSON_INTERVALS;
  let sum = 0;
  for (let k = 0; k <= SIMPSON_INTERVALS; k++) {
    const t = ambientC + Math.exp(u0 + k * h);
    const tau = (spec.massKg * specificHeat(t, spec.specificHeat, spec.specificHeatSlope)) /
      standstillConductanceWK(spec, t, ambientC);
    sum += (k === 0 || k === SIMPSON_INTERVALS ? 1 : k % 2 === 1 ? 4 : 2) * tau;
  }
  return (sum * h) / 3;
}

/**
 * Cool a whole rig's state at standstill for a duration. The fluid proxy keeps following the rotors, so it can
 * still rise for a while after stopping (heat soak; unvalidated, docs/model.md §8).
 * @param state state at the start of the stop
 * @param positions the rig's brake positions (from a heat-run result)
 * @param ambientC ambient temperature, °C
 * @param durationS length of the stop, s
 * @param fluidGain fluid-proxy gain k_f (dimensionless)
 * @param fluidTimeConstantS fluid-proxy time constant τ_f, s
 * @returns the state at the end of the stop (a new object)
 * @example coolStateAtStandstill(state, result.positions, 25, 900, 0.4, 600)
 */
export function coolStateAtStandstill(
  state: ThermalState,
  positions: readonly BrakePositionSpec[],
  ambientC: number,
  durationS: number,
  fluidGain: number,
  fluidTimeConstantS: number,
): ThermalState {
  const rotorC: number[] = [];
  const fluidC: number[] = [];
  const pair = [0, 0];
  positions.forEach((spec, j) => {
    pair[0] = state.rotorC[j] ?? ambientC;
    pair[1] = state.fluidC[j] ?? Number.NaN;
    standstillSubsteps(pair, spec, ambientC, durationS, fluidGain, fluidTimeConstantS);
    rotorC.push(pair[0]);
    fluidC.push(pair[1]);
  });
  return { rotorC, fluidC };
}

/**
 * Shortest stop after which every brake is at or below its target.
 * @param state state at the start of the stop
 * @param positions the rig's brake positions
 * @param targetC target per position, °C (one number for all, or one per position)
 * @param ambientC ambient temperature, °C
 * @returns the stop length, s, and the time each position needs, s
 * @example standstillTimeToReach(state, result.positions, 150, 25).durationS
 */
export function standstillTimeToReach(
  state: ThermalState,
  positions: readonly BrakePositionSpec[],
  targetC: number | readonly number[],
  ambientC: number,
): { durationS: number; perPositionS: number[] } {
  const perPositionS = positions.map((spec, j) => {
    const target = typeof targetC === "number" ? targetC : (targetC[j] ?? ambientC);
    return timeToCoolAtStandstillS(spec, state.rotorC[j] ?? ambientC, target, ambientC);
  });
  return { durationS: perPositionS.reduce((a, b) => (b > a ? b : a), 0), perPositionS };
}

/**
 * Advance [rotorC, fluidC] in place through a standstill of `durationS` (NaN fluid stays NaN).
 * Used by the heat run for cool-down stops.
 * @param pair [rotor °C, fluid °C], updated in place
 * @param spec brake position
 * @param ambientC ambient temperature, °C
 * @param durationS duration, s
 * @param fluidGain fluid-proxy gain (dimensionless)
 * @param fluidTimeConstantS fluid-proxy time constant, s
 * @returns nothing; `pair` holds the result
 * @example standstillSubsteps(pair, spec, 25, 600, 0.4, 600)
 */
export function standstillSubsteps(
  pair: number[],
  spec: BrakePositionSpec,
  ambientC: number,
  durationS: number,
  fluidGain: number,
  fluidTimeConstantS: number,
): void {
  let t = pair[0] ?? ambientC;
  let f = pair[1] ?? Number.NaN;
  let left = durationS;
  while (left > 0) {
    const g0 = standstillConductanceWK(spec, t, ambientC);
    const mc0 = spec.massKg * specificHeat(t, spec.specificHeat, spec.specificHeatSlope);
    const limit = (0.05 * mc0) / g0;
    const dt = Math.min(left, MAX_SUBSTEP_S, limit > 1 ? limit : 1);
    const predicted = exactStepC(t, ambientC, 0, g0, mc0, dt);
    const mid = 0.5 * (t + predicted);
    const g = standstillConductanceWK(spec, mid, ambientC);
    const mc = spec.massKg * specificHeat(mid, spec.specificHeat, spec.specificHeatSlope);
    const next = exactStepC(t, ambientC, 0, g, mc, dt);
    if (f === f) f = fluidProxyStepC(f, 0.5 * (t + next), ambientC, fluidGain, fluidTimeConstantS, dt);
    t = next;
    left -= dt;
  }
  pair[0] = t;
  pair[1] = f;
}
