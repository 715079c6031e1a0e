/**
 * Calibration of the pedal-limited stopping model on a check value from practice (common practice, no
 * published source): a stock dual-cab ute stopped from 80 km/h in 42.5 m (mean 5.81 m/s²). The masses and tyre
 * sizes are our assumptions: 2,250 kg on 0.78 m tyres stock; 2,750 kg on 0.84 m tyres for the loaded check
 * (about 57 m, 4.33 m/s², also common practice, no published source).
 *
 * At a fixed pedal effort the line pressure, and so the brake torque, is fixed [D]: T = μ·p·A·r_eff. The force at
 * the road is T / r_roll, and the deceleration is T / (r_roll·m). One stock stop therefore fixes T.
 */

import { DYNAMIC_RADIUS_FACTOR } from "@/lib/thermal";

/** A stop from practice: who stopped, from what speed, in what distance. */
export interface StopCheck {
  /** Mass of the vehicle as tested, kg (our assumption). */
  massKg: number;
  /** Tyre outer diameter, m (our assumption). */
  tyreDiameterM: number;
  /** Front rotor diameter, m (our assumption; the torque scales with it). */
  frontRotorDiameterM: number;
  /** Rear brake diameter, m (our assumption). */
  rearBrakeDiameterM: number;
  /** Initial speed, m/s. */
  speedMs: number;
  /** Braking distance, m (no reaction time). */
  distanceM: number;
}

/** 80 km/h in m/s (22.22 m/s). */
export const KMH_80_MS = 80 / 3.6;

/** 50 mph in m/s (22.35 m/s; 1 mi = 1609.344 m exactly). */
export const MPH_50_MS = (50 * 1609.344) / 3600;

/** The stock check: 80 km/h → 0 in 42.5 m; 2,250 kg and 0.78 m tyres assumed. Common practice, no published source. */
export const STOCK_UTE_CHECK: StopCheck = {
  massKg: 2250,
  tyreDiameterM: 0.78,
  frontRotorDiameterM: 0.32,
  rearBrakeDiameterM: 0.295,
  speedMs: KMH_80_MS,
  distanceM: 42.5,
};

/** The loaded check: about 500 kg more and bigger tyres, about 57 m. Common practice, no published source. */
export const LOADED_UTE_CHECK: StopCheck = { ...STOCK_UTE_CHECK, massKg: 2750, tyreDiameterM: 0.84, distanceM: 57 };

/**
 * Rolling radius of a tyre, m: half the outer diameter times the dynamic-radius factor of lib/thermal (0.97).
 * @param tyreDiameterM tyre outer diameter, m
 * @returns rolling radius, m
 * @example rollingRadiusM(0.78) // 0.3783
 */
export function rollingRadiusM(tyreDiameterM: number): number {
  return 0.5 * tyreDiameterM * DYNAMIC_RADIUS_FACTOR;
}

/**
 * Mean deceleration of a stop from its speed and braking distance, a = v²/(2d) [D].
 * @param speedMs initial speed, m/s
 * @param distanceM braking distance, m (> 0)
 * @returns deceleration, m/s²
 * @example meanDecelerationMs2(80 / 3.6, 42.5) // ≈ 5.81
 */
export function meanDecelerationMs2(speedMs: number, distanceM: number): number {
  if (!(distanceM > 0)) throw new RangeError("distanceM must be greater than 0");
  return (speedMs * speedMs) / (2 * distanceM);
}

/**
 * Total brake torque at the calibration pedal effort, N·m (all wheels, cold brakes): T = a·m·r_roll.
 * @param check the stop from practice (default the stock ute)
 * @returns torque, N·m
 * @example pedalTorqueNm() // ≈ 4,945
 */
export function pedalTorqueNm(check: StopCheck = STOCK_UTE_CHECK): number {
  return meanDecelerationMs2(check.speedMs, check.distanceM) * check.massKg * rollingRadiusM(check.tyreDiameterM);
}
