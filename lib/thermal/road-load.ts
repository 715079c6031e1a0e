/**
 * Road-load forces on the whole combination (textbook forms: *Fundamentals of Vehicle Dynamics* (SAE, 1992),
 * ch. 4 [M]; docs/model.md §3). `grade` is rise over horizontal run (negative downhill), so
 * sin θ = grade/√(1 + grade²) and cos θ = 1/√(1 + grade²).
 */

import { STANDARD_GRAVITY } from "./constants";

/**
 * Aerodynamic drag F = ½·ρ·CdA·v² (still air).
 * @param airDensityKgM3 air density, kg/m³
 * @param cdaM2 drag area Cd·A, m²
 * @param speedMs speed, m/s
 * @returns drag force, N
 * @example aeroDragForce(1.225, 2.5, 20) // 612.5
 */
export function aeroDragForce(airDensityKgM3: number, cdaM2: number, speedMs: number): number {
  return 0.5 * airDensityKgM3 * cdaM2 * speedMs * speedMs;
}

/**
 * Rolling resistance F = Crr·m·g·cos θ.
 * @param rollingResistance rolling-resistance coefficient Crr (dimensionless)
 * @param massKg mass, kg
 * @param grade rise over run (dimensionless)
 * @returns rolling-resistance force, N
 * @example rollingResistanceForce(0.012, 3000, 0) // 353.04
 */
export function rollingResistanceForce(rollingResistance: number, massKg: number, grade: number): number {
  return (rollingResistance * massKg * STANDARD_GRAVITY) / Math.sqrt(1 + grade * grade);
}

/**
 * Grade force along the road F = m·g·sin θ (positive uphill, i.e. resisting; negative downhill, i.e. driving).
 * @param massKg mass, kg
 * @param grade rise over run (dimensionless)
 * @returns grade force, N
 * @example gradeForce(1000, -0.1) // −975.8
 */
export function gradeForce(massKg: number, grade: number): number {
  return (massKg * STANDARD_GRAVITY * grade) / Math.sqrt(1 + grade * grade);
}
