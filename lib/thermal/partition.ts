/**
 * How the braking work is shared: trailer versus tow vehicle by brake type and controller gain, front versus
 * rear, and rotor versus pad (docs/model.md §5; docs/trade-facts.md §2.1, brake controllers).
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
 * [M] *Brake Design and Safety* (SAE, 1999), ch. 3; docs/model.md §5.5, check case C10.
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
 * The override (surge) coupling gain G of a cold-gain setting k_c: the trailer's brake force follows the push
 * on the coupling, F_t = G·r_t·F_c, so with the trailer's inertial force m_t·a = F_t + F_c its share of its own
 * braking is G·r_t/(1 + G·r_t); cold (r_t = 1) that is k_c, hence G = k_c/(1 − k_c), capped near k_c = 1
 * (docs/model.md, "Fade feedback").
 * @param gain cold share of the trailer's own braking that its override brakes take (dimensionless)
 * @returns coupling gain G (dimensionless)
 * @example overrideCouplingGain(0.75) // 3
 */
export function overrideCouplingGain(gain: number): number {
  return gain >= OVERRIDE_MAX_COLD_SHARE ? OVERRIDE_MAX_COLD_SHARE / (1 - OVERRIDE_MAX_COLD_SHARE) : gain / (1 - gain);
}

/** Highest cold share an override brake can take of its trailer's braking (dimensionless); keeps G finite. */
const OVERRIDE_MAX_COLD_SHARE = 0.98;

/**
 * Split the retarding work of one step between the engine, the trailer brakes and the tow vehicle's front and
 * rear brakes, writing [engineJ, frontJ, rearJ, trailerJ, unheldJ] into `out` (no allocation; the heat-run hot
 * path). With fade feedback (docs/model.md, "Fade feedback") each brake's friction ratio r = μ(T)/μ_cold moves
 * the split; the driver keeps the retarding force the speed needs, so energy is conserved and only the split
 * moves. Cold (every r = 1), this is the fixed split of model 1:
 *
 * - Override (surge) brakes act whenever the trailer pushes, including under engine braking (docs/trade-facts.md §2.1),
 *   so they take a share of all the retarding work first: the trailer's mass share × gain × r_t·(1 + G)/(1 + G·r_t)
 *   (G from overrideCouplingGain; cold, exactly gain × mass share). A fading override brake pushes harder on
 *   the coupling and so partly compensates itself.
 * - Electric and electric-over-hydraulic brakes follow the stop-light circuit: engine braking alone does not
 *   apply them (docs/trade-facts.md §2.1). The engine takes what it can first; the controller commands gain × mass
 *   share of the service-brake remainder ([E] P_trailer = P_b·k_c·m_trailer/m_total) and the drums deliver r_t
 *   of it; the tow vehicle takes the rest.
 * - The tow vehicle's service-brake work is split front/rear by the installed front share φ_f weighted by
 *   friction: φ' = φ_f·r_f / (φ_f·r_f + (1 − φ_f)·r_r) (one line pressure; force ∝ μ at each axle).
 * - Hold capacity: each unit can absorb at most r × its cold capacity this step. The trailer's excess goes to
 *   the tow vehicle; what the tow vehicle cannot absorb is `unheldJ` (the brakes cannot hold the speed: the
 *   heat run marks the step runaway). All the work still goes into the brakes, so the energy account closes.
 * @param out output, length ≥ 4 (≥ 5 to receive unheldJ): engine, front, rear, trailer and unheld work, J
 * @param retardingJ work the engine and brakes must absorb this step, J (≥ 0)
 * @param engineAvailableJ most the engine can absorb this step, J (≥ 0)
 * @param brakeType trailer brake type ("none" without a trailer)
 * @param trailerMassShare trailer mass / combination mass (dimensionless)
 * @param gain controller gain k_c relative to ideal (dimensionless)
 * @param frontShare front share of the service-brake force φ_f (dimensionless)
 * @param rFront friction ratio of the front brakes (dimensionless, default 1)
 * @param rRear friction ratio of the rear brakes (dimensionless, default 1)
 * @param rTrailer friction ratio of the trailer brakes (dimensionless, default 1)
 * @param towCapJ cold capacity of the tow vehicle's brakes this step, J (default unlimited)
 * @param trailerCapJ cold capacity of the trailer's brakes this step, J (default unlimited)
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
  rFront = 1,
  rRear = 1,
  rTrailer = 1,
  towCapJ = Infinity,
  trailerCapJ = Infinity,
): Float64Array {
  let trailerJ = 0;
  let rest = retardingJ;
  if (brakeType === "override") {
    // gain·r·(1 + G)/(1 + G·r): cold exactly gain (for gain < 0.98 this is G·r/(1 + G·r)).
    const g = overrideCouplingGain(gain);
    let share = (trailerMassShare * gain * rTrailer * (1 + g)) / (1 + g * rTrailer);
    if (share > 1) share = 1;
    trailerJ = share * rest;
    const cap = rTrailer * trailerCapJ;
    if (trailerJ > cap) trailerJ = cap;
    rest -= trailerJ;
  }
  const engineJ = engineAvailableJ < rest ? engineAvailableJ : rest;
  rest -= engineJ;
  if (brakeType === "electric" || brakeType === "electric-over-hydraulic") {
    let share = gain * trailerMassShare * rTrailer;
    if (share > 1) share = 1;
    trailerJ = share * rest;
    const cap = rTrailer * trailerCapJ;
    if (trailerJ > cap) trailerJ = cap;
    rest -= trailerJ;
  }
  const wf = frontShare * rFront;
  const wr = (1 - frontShare) * rRear;
  const front = wf + wr > 0 ? wf / (wf + wr) : frontShare;
  out[0] = engineJ;
  out[1] = front * rest;
  out[2] = rest - front * rest;
  out[3] = trailerJ;
  if (out.length > 4) {
    const towCap = (wf + wr) * towCapJ;
    out[4] = rest > towCap ? rest - towCap : 0;
  }
  return out;
}
