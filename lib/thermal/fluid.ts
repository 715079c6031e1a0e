/**
 * Brake-fluid temperature proxy — UNVALIDATED, advisory only. No published transfer function from rotor to
 * fluid temperature was found (docs/model.md §8). Proposal [E]:
 *   dT_f/dt = (Ta + k_f·(T_rotor − Ta) − T_f)/τ_f, k_f ≈ 0.3–0.5, τ_f ≈ 5–15 min,
 * stepped exactly for a constant rotor temperature over the step. The lag keeps T_f rising for a while after
 * a stop (heat soak).
 */

/** Label carried by every fluid-proxy output. */
export const FLUID_PROXY_LABEL = "brake-fluid temperature proxy: unvalidated estimate";

/**
 * One exact step of the fluid proxy.
 * @param fluidC proxy temperature at the start of the step, °C
 * @param rotorC mean rotor temperature over the step, °C
 * @param ambientC ambient temperature, °C
 * @param gain k_f (dimensionless, 0–1)
 * @param timeConstantS τ_f, s (> 0)
 * @param dtS step duration, s
 * @returns proxy temperature at the end of the step, °C
 * @example fluidProxyStepC(25, 325, 25, 0.4, 600, 600) // ≈ 100.9
 */
export function fluidProxyStepC(
  fluidC: number,
  rotorC: number,
  ambientC: number,
  gain: number,
  timeConstantS: number,
  dtS: number,
): number {
  const targetC = ambientC + gain * (rotorC - ambientC);
  return fluidC + (targetC - fluidC) * -Math.expm1(-dtS / timeConstantS);
}
