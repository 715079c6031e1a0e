/**
 * Cooling of one brake: lumped convection rising with speed plus radiation (docs/model.md §6.1–6.2), and the
 * specific heat of cast iron, optionally temperature-dependent (docs/model.md §6.4).
 */

import {
  CELSIUS_TO_KELVIN,
  CONVECTION_SPEED_EXPONENT,
  DISC_RADIATING_AREA_PER_D2,
  DRUM_COOLING_FACTOR,
  DRUM_RADIATING_AREA_PER_D2,
  REFERENCE_ROTOR_DIAMETER_M,
  SOLID_DISC_COOLING_FACTOR,
  SPECIFIC_HEAT_FIT_MAX_C,
  STEFAN_BOLTZMANN,
} from "./constants";
import type { BrakeKind } from "./rig";

/**
 * Convective conductance of one brake hA(v) = hA_0 + a·v^0.8 [E] docs/model.md §6.1.
 * @param standstillWK hA_0, the conductance at standstill, W/K
 * @param slopeWK a, W/K per (m/s)^0.8
 * @param speedMs road speed, m/s
 * @returns convective conductance, W/K
 * @example convectiveConductance(1.25, 0.9, 16.67) // ≈ 9.86
 */
export function convectiveConductance(standstillWK: number, slopeWK: number, speedMs: number): number {
  return standstillWK + slopeWK * Math.pow(speedMs, CONVECTION_SPEED_EXPONENT);
}

/**
 * Linearised radiation coefficient h_rad = ε·σ·(T² + Ta²)·(T + Ta), T in kelvin, so that the radiated flux is
 * h_rad·(T − Ta) exactly (docs/model.md §6.2; check case C9).
 * @param emissivity surface emissivity (dimensionless, 0–1)
 * @param tempC surface temperature, °C
 * @param ambientC ambient temperature, °C
 * @returns radiation coefficient, W/(m²·K)
 * @example radiationCoefficient(0.55, 300, 25) // ≈ 11.34
 */
export function radiationCoefficient(emissivity: number, tempC: number, ambientC: number): number {
  const t = tempC + CELSIUS_TO_KELVIN;
  const a = ambientC + CELSIUS_TO_KELVIN;
  return emissivity * STEFAN_BOLTZMANN * (t * t + a * a) * (t + a);
}

/**
 * Specific heat of cast iron: constant, or c(T) = c20 + slope·(T − 20) held constant above 600 °C
 * ([M] fit, docs/model.md §6.4). A constant c overestimates high temperatures, which is conservative.
 * @param tempC temperature, °C
 * @param c20 specific heat at 20 °C, J/(kg·K)
 * @param slope rise of c per kelvin, J/(kg·K²); 0 for a constant c
 * @returns specific heat, J/(kg·K)
 * @example specificHeat(200, 460, 0.4) // 532
 */
export function specificHeat(tempC: number, c20: number, slope: number): number {
  if (slope === 0) return c20;
  const t = tempC < 20 ? 20 : tempC > SPECIFIC_HEAT_FIT_MAX_C ? SPECIFIC_HEAT_FIT_MAX_C : tempC;
  return c20 + slope * (t - 20);
}

/**
 * Scale of the reference (vented, 330 mm) convection coefficients for a brake: the kind factor (vented 1,
 * solid 0.6, drum 0.5 [E] docs/model.md §6.1) times the area ratio (D / 0.33 m)² [E].
 * @param kind brake hardware
 * @param diameterM outer diameter, m
 * @returns conductance scale (dimensionless)
 * @example brakeConductanceScale("vented-disc", 0.33) // 1
 */
export function brakeConductanceScale(kind: BrakeKind, diameterM: number): number {
  const kindFactor = kind === "vented-disc" ? 1 : kind === "solid-disc" ? SOLID_DISC_COOLING_FACTOR : DRUM_COOLING_FACTOR;
  const ratio = diameterM / REFERENCE_ROTOR_DIAMETER_M;
  return kindFactor * ratio * ratio;
}

/**
 * Radiating area of one brake: the two friction faces of a disc (≈ 1.07·D²) or a drum's shell (≈ 0.8·D²) [E].
 * @param kind brake hardware
 * @param diameterM outer diameter, m
 * @returns radiating area, m²
 * @example radiatingAreaM2("vented-disc", 0.32) // ≈ 0.110
 */
export function radiatingAreaM2(kind: BrakeKind, diameterM: number): number {
  return (kind === "drum" ? DRUM_RADIATING_AREA_PER_D2 : DISC_RADIATING_AREA_PER_D2) * diameterM * diameterM;
}
