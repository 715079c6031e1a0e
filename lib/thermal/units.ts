/**
 * Unit conversions used at the boundary (UI, CLI, tests). Everything inside lib/thermal is SI; temperatures are
 * in °C in names ending in `C`, temperature differences in K in names ending in `K`.
 * Exact factors: 1 km/h = 1/3.6 m/s; 1 mile = 1609.344 m; 1 lb = 0.45359237 kg; 1 hp = 745.69987 W (mechanical);
 * °F = °C·9/5 + 32 (all by definition, NIST SP 811).
 */

import { CELSIUS_TO_KELVIN } from "./constants";

/** Pounds to kilograms (exact, NIST SP 811). */
export const KG_PER_LB = 0.45359237;
/** Metres per statute mile (exact, NIST SP 811). */
export const M_PER_MILE = 1609.344;
/** Watts per mechanical horsepower (550 ft·lbf/s), W (NIST SP 811). */
export const W_PER_HP = 745.69987158227022;

/**
 * Speed in km/h to m/s.
 * @param kmh speed, km/h
 * @returns speed, m/s
 * @example kmhToMs(36) // 10
 */
export function kmhToMs(kmh: number): number {
  return kmh / 3.6;
}

/**
 * Speed in m/s to km/h.
 * @param ms speed, m/s
 * @returns speed, km/h
 * @example msToKmh(10) // 36
 */
export function msToKmh(ms: number): number {
  return ms * 3.6;
}

/**
 * Miles per hour to m/s.
 * @param mph speed, mph
 * @returns speed, m/s
 * @example mphToMs(60) // 26.8224
 */
export function mphToMs(mph: number): number {
  return (mph * M_PER_MILE) / 3600;
}

/**
 * Temperature in °C to K.
 * @param c temperature, °C
 * @returns temperature, K
 * @example celsiusToKelvin(25) // 298.15
 */
export function celsiusToKelvin(c: number): number {
  return c + CELSIUS_TO_KELVIN;
}

/**
 * Temperature in °F to °C.
 * @param f temperature, °F
 * @returns temperature, °C
 * @example fahrenheitToCelsius(500) // 260
 */
export function fahrenheitToCelsius(f: number): number {
  return ((f - 32) * 5) / 9;
}

/**
 * Temperature in °C to °F.
 * @param c temperature, °C
 * @returns temperature, °F
 * @example celsiusToFahrenheit(100) // 212
 */
export function celsiusToFahrenheit(c: number): number {
  return (c * 9) / 5 + 32;
}

/**
 * Pounds (mass) to kilograms.
 * @param lb mass, lb
 * @returns mass, kg
 * @example lbToKg(4500) // 2041.17
 */
export function lbToKg(lb: number): number {
  return lb * KG_PER_LB;
}

/**
 * Litres to cubic metres (engine displacement is stored in m³).
 * @param litres volume, L
 * @returns volume, m³
 * @example litresToCubicMetres(2.8) // 0.0028
 */
export function litresToCubicMetres(litres: number): number {
  return litres / 1000;
}

/**
 * A thermal conductance in hp/°F to W/K (1 hp/°F = 745.7 W per 5/9 K = 1342.26 W/K).
 * @param hpPerF conductance, hp/°F
 * @returns conductance, W/K
 * @example hpPerFahrenheitToWPerK(1) // 1342.26
 */
export function hpPerFahrenheitToWPerK(hpPerF: number): number {
  return (hpPerF * W_PER_HP * 9) / 5;
}
