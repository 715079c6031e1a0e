import {
  ISA_DENSITY_EXPONENT,
  ISA_LAPSE_PER_M,
  ISA_SEA_LEVEL_DENSITY,
  ISA_TROPOPAUSE_M,
} from "./constants";

/**
 * Air density of the International Standard Atmosphere troposphere:
 * ρ = 1.225·(1 − 2.25577e-5·h)^4.2559 [M] ISO 2533; docs/model.md §3. Altitudes above 11 km are held at
 * the tropopause value.
 * @param altitudeM geometric altitude above mean sea level, m
 * @returns air density, kg/m³
 * @example isaAirDensity(1000) // 1.1116
 */
export function isaAirDensity(altitudeM: number): number {
  const h = altitudeM > ISA_TROPOPAUSE_M ? ISA_TROPOPAUSE_M : altitudeM;
  return ISA_SEA_LEVEL_DENSITY * Math.pow(1 - ISA_LAPSE_PER_M * h, ISA_DENSITY_EXPONENT);
}
