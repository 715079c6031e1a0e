/**
 * How the braking work is shared: trailer versus tow vehicle by brake type and controller gain, front versus
 * rear, and rotor versus pad (thermal-model.md §1.3; trade-facts.md §2 "Brake controllers").
 */

import type { TrailerBrakeType } from "./rig";

/** Thermal properties of a friction-pair material. */
export interface MaterialProperties {
  /** Density, kg/m³. */
  densityKgM3: number;
  /** Specific heat, J/(kg·K). */
  specificHeat: number;
  /** Thermal conductivity, W/(m·K). */
  conductivity: number;
}

/**
 * Share of the friction heat that enters the rotor, γ = 1/(1 + √((ρck)_pad/(ρck)_rotor))
 * [M] *Brake Design and Safety* (SAE, 1999), ch. 3; thermal-model.md §1.3, check case C10.
 * @param rotor rotor material
 * @param pad pad material
 * @returns rotor share of the heat (dimensionless, 0–1)
 * @example heatPartitionRotor(CAST_IRON_PROPERTIES, ORGANIC_PAD_PROPERTIES) // ≈ 0.901
 */
export function heatPartitionRotor(rotor: MaterialProperties, pad: MaterialProperties): number {
  const effusivityRatio =
    (pad.densityKgM3 * pad.specificHeat * pad.conductivity) /
    (rotor.densityKgM3 * rotor.specificHeat * rotor.conductivity);
  return 1 / (1 + Math.sqrt(effusivityRatio));
}

/**
 * Split the retarding work of one step between the engine, the trailer brakes and the tow vehicle's front and
 * rear brakes, writing [engineJ, frontJ, rearJ, trailerJ] into `out` (no allocation; the heat-run hot path).
 *
 * - Override (surge) brakes act whenever the trailer pushes, including under engine braking (trade-facts.md §2),
 *   so they take gain × mass share of all the retarding work first; the engine then takes what it can.
 * - Electric and electric-over-hydraulic brakes follow the stop-light circuit: engine braking alone does not
 *   apply them (trade-facts.md §2). The engine takes what it can first; the trailer takes gain × mass share of
 *   the service-brake remainder ([E] thermal-model.md §1.3, P_trailer = P_b·k_c·m_trailer/m_total).
 * - The tow vehicle's service-brake work is split front/rear by the installed front share φ_f.
 * @param out output, length ≥ 4: engine, front, rear and trailer work, J
 * @param retardingJ work the engine and brakes must absorb this step, J (≥ 0)
 * @param engineAvailableJ most the engine can absorb this step, J (≥ 0)
 * @param brakeType trailer brake type ("none" without a trailer)
 * @param trailerMassShare trailer mass / combination mass (dimensionless)
 * @param gain controller gain k_c relative to ideal (dimensionless)
 * @param frontShare front share of the service-brake force φ_f (dimensionless)
 * @returns `out`
 * @example splitRetardingWork(new Float64Array(4), 100, 30, "electric", 0.5, 1, 0.65) // [30, 22.75, 12.25, 35]
 */
export function splitRetardingWork(
  out: Float64Array,
  retardingJ: number,
  engineAvailableJ: number,
  brakeType: TrailerBrakeType,
  trailerMassShare: number,
  gain: number,
  frontShare: number,
): Float64Array {
  let share = brakeType === "none" ? 0 : gain * trailerMassShare;
  if (share > 1) share = 1;
  let trailerJ = 0;
  let rest = retardingJ;
  if (brakeType === "override") {
    trailerJ = share * rest;
    rest -= trailerJ;
  }
  const engineJ = engineAvailableJ < rest ? engineAvailableJ : rest;
  rest -= engineJ;
  if (brakeType === "electric" || brakeType === "electric-over-hydraulic") {
    trailerJ = share * rest;
    rest -= trailerJ;
  }
  out[0] = engineJ;
  out[1] = frontShare * rest;
  out[2] = rest - frontShare * rest;
  out[3] = trailerJ;
  return out;
}
