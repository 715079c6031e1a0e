/**
 * Stopping distance with the brakes at a given temperature, at a fixed pedal effort (ESTIMATE).
 *
 * Model [D] with [E] inputs:
 * - The tow vehicle's brake torque at the pedal effort is calibrated on a stock stop (calibration.ts) and scaled
 *   by each axle's brake diameter relative to the calibration vehicle (torque ∝ effective radius at a fixed line
 *   pressure), front/rear weighted by the front share φ_f, and by the fade curve μ(T)/μ_cold of each brake.
 * - Force at the road = torque / rolling radius, so deceleration falls with mass and with tyre size.
 * - A braked trailer follows the tow vehicle's deceleration through its controller (gain k_c) and fades on its
 *   own curve: a = F_v / (m_v + m_t·(1 − k_c·r_t)), so an ideal, cold trailer (k_c·r_t = 1) stops itself.
 * - Grip caps the deceleration at μ_road·g (default 0.8 [E], dry sealed road).
 * - The stop heats the brakes (kinetic energy split like the heat model, into the rotor share γ, adiabatic over
 *   the few seconds of the stop), so friction keeps falling during a hot stop. Road load is ignored
 *   (conservative) and so is rotating inertia (it cancels in the calibration).
 * - Reaction time is EXCLUDED by default (the check values are braking distances); pass `reactionTimeS` to add
 *   v·t_r, reported separately.
 */

import { STANDARD_GRAVITY, type ResolvedModel } from "@/lib/thermal";
import { pedalTorqueNm, rollingRadiusM, STOCK_UTE_CHECK, type StopCheck } from "./calibration";
import { FADE_CURVE_LABEL, fadeCurveFor, frictionRatio } from "./fade-curve";

/** Options of a stopping estimate. */
export interface StoppingOptions {
  /** Calibration stop (default the stock ute, 42.5 m from 80 km/h). */
  calibration?: StopCheck;
  /** Reaction time added as v·t_r, s (default 0: braking distance only). */
  reactionTimeS?: number;
  /** Tyre–road friction limit μ_road (dimensionless; default 0.8 [E], dry sealed road). */
  roadFriction?: number;
  /** Velocity steps of the stop integration (default 200). */
  steps?: number;
}

/** A stopping estimate. */
export interface StoppingEstimate {
  /** Initial speed, m/s. */
  speedMs: number;
  /** Braking distance, m. */
  brakingDistanceM: number;
  /** Reaction distance v·t_r, m (0 unless a reaction time was given). */
  reactionDistanceM: number;
  /** Braking plus reaction distance, m. */
  totalDistanceM: number;
  /** Mean deceleration v²/(2·braking distance), m/s². */
  meanDecelMs2: number;
  /** μ/μ_cold of each position at the start of the stop (model position order). */
  startFrictionRatio: number[];
  /** Brake temperatures at the end of the stop, °C. */
  endRotorC: number[];
  /** Whether grip rather than the pedal effort limited the deceleration at the start. */
  limitedBy: "pedal" | "grip";
  /** Plain-words label. */
  label: string;
}

/** Label on every stopping estimate. */
export const STOPPING_LABEL =
  `Estimate at the same pedal effort, braking distance without reaction time unless stated; ${FADE_CURVE_LABEL}.`;

/**
 * Stopping distance from a speed with the brakes at given temperatures.
 * @param model resolved model of the rig (lib/thermal resolveModel, or a heat run's `model`)
 * @param rotorC brake temperature per position at the start of the stop, °C (model position order)
 * @param speedMs initial speed, m/s
 * @param options calibration, reaction time, grip, steps
 * @returns the estimate
 * @throws {RangeError} "speedMs must be greater than 0", "rotorC must have one entry per brake position"
 * @example stoppingDistance(model, [25, 25, 25], 80 / 3.6).brakingDistanceM
 */
export function stoppingDistance(
  model: ResolvedModel,
  rotorC: readonly number[],
  speedMs: number,
  options: StoppingOptions = {},
): StoppingEstimate {
  if (!(speedMs > 0)) throw new RangeError("speedMs must be greater than 0");
  if (rotorC.length !== model.positions.length) throw new RangeError("rotorC must have one entry per brake position");
  const steps = options.steps ?? 200;
  const rig = rigBraking(model, options.calibration ?? STOCK_UTE_CHECK);
  const gripMs2 = (options.roadFriction ?? 0.8) * STANDARD_GRAVITY;
  const temp = [...rotorC];
  const curves = model.positions.map((p) => fadeCurveFor(p.padFamily, p.thresholds));
  const ratio = curves.map((c, j) => frictionRatio(temp[j] as number, c));
  const startRatio = [...ratio];
  const limitedBy = decel(rig, startRatio, gripMs2) >= gripMs2 ? "grip" : "pedal";
  const dv = speedMs / steps;
  let distance = 0;
  for (let k = 0; k < steps; k++) {
    const v = speedMs - (k + 0.5) * dv;
    for (let j = 0; j < curves.length; j++) ratio[j] = frictionRatio(temp[j] as number, curves[j]!);
    const a = decel(rig, ratio, gripMs2);
    distance += (v * dv) / a;
    heatBrakes(model, rig, ratio, temp, model.massKg * v * dv);
  }
  const reactionDistanceM = speedMs * (options.reactionTimeS ?? 0);
  return {
    speedMs,
    brakingDistanceM: distance,
    reactionDistanceM,
    totalDistanceM: distance + reactionDistanceM,
    meanDecelMs2: (speedMs * speedMs) / (2 * distance),
    startFrictionRatio: startRatio,
    endRotorC: temp,
    limitedBy,
    label: STOPPING_LABEL,
  };
}

/** @private What the stop needs to know about the rig. */
interface RigBraking {
  /** Cold tow-vehicle brake force at the road, front and rear, N. */
  frontN: number;
  rearN: number;
  vehicleKg: number;
  trailerKg: number;
  /** Controller gain of a braked trailer (0 when unbraked). */
  gain: number;
  /** Index of the trailer position, −1 if none. */
  trailerIndex: number;
}

/** @private */
function rigBraking(model: ResolvedModel, cal: StopCheck): RigBraking {
  const [front, rear] = model.positions;
  const phi = model.params.frontShare ?? 0.65;
  const forceN = pedalTorqueNm(cal) / rollingRadiusM(model.tyreDiameterM);
  const trailerIndex = model.positions.findIndex((p) => p.position === "trailer");
  return {
    frontN: forceN * phi * ((front?.diameterM ?? cal.frontRotorDiameterM) / cal.frontRotorDiameterM),
    rearN: forceN * (1 - phi) * ((rear?.diameterM ?? cal.rearBrakeDiameterM) / cal.rearBrakeDiameterM),
    vehicleKg: model.massKg - model.trailerKg,
    trailerKg: model.trailerKg,
    gain: trailerIndex >= 0 ? (model.params.trailerGain ?? 0) : 0,
    trailerIndex,
  };
}

/** @private Brake forces at the road for the current friction ratios (pedal-limited), N, and the deceleration. */
function forces(rig: RigBraking, ratio: readonly number[]): { frontN: number; rearN: number; trailerN: number; a: number } {
  const frontN = rig.frontN * (ratio[0] ?? 1);
  const rearN = rig.rearN * (ratio[1] ?? 1);
  const follow = rig.trailerIndex >= 0 ? Math.min(1, rig.gain * (ratio[rig.trailerIndex] ?? 1)) : 0;
  const a = (frontN + rearN) / (rig.vehicleKg + rig.trailerKg * (1 - follow));
  return { frontN, rearN, trailerN: follow * rig.trailerKg * a, a };
}

/** @private Deceleration for the current friction ratios, capped by grip, m/s². */
function decel(rig: RigBraking, ratio: readonly number[], gripMs2: number): number {
  const { a } = forces(rig, ratio);
  return a < gripMs2 ? a : gripMs2;
}

/** @private Put one speed step's kinetic energy into the brakes, in proportion to their forces. */
function heatBrakes(model: ResolvedModel, rig: RigBraking, ratio: readonly number[], temp: number[], energyJ: number): void {
  const f = forces(rig, ratio);
  const total = f.frontN + f.rearN + f.trailerN;
  model.positions.forEach((p, j) => {
    const forceN = p.position === "front" ? f.frontN : p.position === "rear" ? f.rearN : f.trailerN;
    const share = forceN / total;
    temp[j] = (temp[j] as number) + (p.rotorPartition * energyJ * share) / (p.wheels * p.massKg * p.specificHeat);
  });
}
