/**
 * The exact step of the lumped rotor ODE m·c·dT/dt = q − hA·(T − Ta) for constant q and hA over the step
 * (docs/model.md §7, check case C8 in docs/validation.md):
 *   T(t+Δt) = T + (q − hA·(T − Ta))·(1 − e^(−hA·Δt/(m·c)))/hA,
 * which equals T_ss + (T − T_ss)·e^(−Δt/τ) with T_ss = Ta + q/hA, τ = m·c/hA, and tends to T + q·Δt/(m·c)
 * as hA → 0. Written with expm1 so both limits are exact in floating point.
 */

/**
 * Temperature after one exact step.
 * @param tempC temperature at the start of the step, °C
 * @param ambientC ambient temperature, °C
 * @param heatW heat flow into the body, W (≥ 0)
 * @param conductanceWK total conductance to ambient hA (convection + linearised radiation), W/K (≥ 0)
 * @param heatCapacityJK heat capacity m·c, J/K (> 0)
 * @param dtS step duration, s (≥ 0)
 * @returns temperature at the end of the step, °C
 * @example exactStepC(100, 25, 2000, 20, 4600, 60) // ≈ 105.74
 */
export function exactStepC(
  tempC: number,
  ambientC: number,
  heatW: number,
  conductanceWK: number,
  heatCapacityJK: number,
  dtS: number,
): number {
  const x = (conductanceWK * dtS) / heatCapacityJK;
  const gain = x > 1e-12 ? -Math.expm1(-x) / conductanceWK : dtS / heatCapacityJK;
  return tempC + (heatW - conductanceWK * (tempC - ambientC)) * gain;
}

/**
 * Time for a body heated by a constant q to go from T0 to a limit (docs/model.md §7):
 * t = −τ·ln(1 − (T_lim − T0)/(T_ss − T0)); Infinity when the steady state T_ss = Ta + q/hA does not pass T_lim.
 * @param startC starting temperature, °C
 * @param limitC limit temperature, °C (above startC)
 * @param ambientC ambient temperature, °C
 * @param heatW heat flow in, W
 * @param conductanceWK conductance hA, W/K (> 0)
 * @param heatCapacityJK heat capacity m·c, J/K
 * @returns time to the limit, s
 * @example timeToReachC(100, 120, 25, 2000, 20, 4600) // ≈ 370.2
 */
export function timeToReachC(
  startC: number,
  limitC: number,
  ambientC: number,
  heatW: number,
  conductanceWK: number,
  heatCapacityJK: number,
): number {
  const steadyC = ambientC + heatW / conductanceWK;
  if (steadyC <= limitC) return Infinity;
  const tau = heatCapacityJK / conductanceWK;
  return -tau * Math.log(1 - (limitC - startC) / (steadyC - startC));
}
