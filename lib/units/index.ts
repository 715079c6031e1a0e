/**
 * Showing SI values in the user's unit system. Conversion factors are exact by definition: the international
 * foot is 0.3048 m and the international mile 1609.344 m (International Yard and Pound Agreement, 1959;
 * NIST SP 811 App. B); the avoirdupois pound is 0.45359237 kg (same agreement).
 */
export type UnitSystem = "metric" | "imperial";
export const UNIT_SYSTEMS: readonly UnitSystem[] = ["metric", "imperial"];

export const M_PER_FT = 0.3048;
export const M_PER_MI = 1609.344;
export const KG_PER_LB = 0.45359237;

const fmt = (value: number, digits: number) =>
  value.toLocaleString("en", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** A route length: km or mi, one decimal under 100. */
export function formatDistance(m: number, system: UnitSystem): string {
  const v = system === "metric" ? m / 1000 : m / M_PER_MI;
  return `${fmt(v, Math.abs(v) < 100 ? 1 : 0)} ${system === "metric" ? "km" : "mi"}`;
}

/** An elevation or height difference: m or ft, whole numbers. */
export function formatElevation(m: number, system: UnitSystem): string {
  return system === "metric" ? `${fmt(m, 0)} m` : `${fmt(m / M_PER_FT, 0)} ft`;
}

/** A grade (rise over run) as a percentage; descents negative. */
export function formatGrade(grade: number): string {
  return `${fmt(grade * 100, 1)} %`;
}

/** A speed given in m/s: km/h or mph. */
export function formatSpeed(ms: number, system: UnitSystem): string {
  return system === "metric" ? `${fmt(ms * 3.6, 0)} km/h` : `${fmt((ms * 3600) / M_PER_MI, 0)} mph`;
}

/** A temperature given in °C: °C or °F. */
export function formatTemperature(c: number, system: UnitSystem): string {
  return system === "metric" ? `${fmt(c, 0)} °C` : `${fmt((c * 9) / 5 + 32, 0)} °F`;
}

/** What is shown instead of a temperature at or past a brake's validity ceiling (docs/model.md). */
export const BEYOND_RANGE_TEXT = "beyond Fadeline's range";

/**
 * A modelled temperature with its uncertainty band, rounded to tens: "about 240 °C (210–290)". At or past the
 * validity ceiling the number is not shown ("beyond Fadeline's range"); a band edge past it reads "beyond".
 * @param c the temperature, °C
 * @param band its band edges, °C (null: no band)
 * @param ceilingC the brake's validity ceiling, °C
 * @param system unit system
 * @returns the text
 * @example formatTemperatureBand(243, { lowC: 212, highC: 288 }, 600, "metric") // "about 240 °C (210–290)"
 */
export function formatTemperatureBand(
  c: number,
  band: { lowC: number; highC: number } | null,
  ceilingC: number,
  system: UnitSystem,
): string {
  if (c >= ceilingC) return BEYOND_RANGE_TEXT;
  const shown = (x: number) => Math.round((system === "metric" ? x : (x * 9) / 5 + 32) / 10) * 10;
  const unit = system === "metric" ? "°C" : "°F";
  if (band === null) return `${fmt(shown(c), 0)} ${unit}`;
  const high = band.highC >= ceilingC ? "beyond" : fmt(shown(band.highC), 0);
  return `about ${fmt(shown(c), 0)} ${unit} (${fmt(shown(band.lowC), 0)}–${high})`;
}

/** A mass given in kg: kg or lb. */
export function formatMass(kg: number, system: UnitSystem): string {
  return system === "metric" ? `${fmt(kg, 0)} kg` : `${fmt(kg / KG_PER_LB, 0)} lb`;
}

/** Unit label for axis titles. */
export function distanceUnit(system: UnitSystem): "km" | "mi" {
  return system === "metric" ? "km" : "mi";
}
export function elevationUnit(system: UnitSystem): "m" | "ft" {
  return system === "metric" ? "m" : "ft";
}
/** Converts metres to the display unit of distances (km or mi). */
export function toDistanceUnit(m: number, system: UnitSystem): number {
  return system === "metric" ? m / 1000 : m / M_PER_MI;
}
/** Converts metres to the display unit of elevations (m or ft). */
export function toElevationUnit(m: number, system: UnitSystem): number {
  return system === "metric" ? m : m / M_PER_FT;
}
/** Converts a distance in the display unit (km or mi) to metres. */
export function fromDistanceUnit(value: number, system: UnitSystem): number {
  return system === "metric" ? value * 1000 : value * M_PER_MI;
}
/** Unit label of temperatures. */
export function temperatureUnit(system: UnitSystem): "°C" | "°F" {
  return system === "metric" ? "°C" : "°F";
}
/** Converts °C to the display unit of temperatures (°C or °F). */
export function toTemperatureUnit(c: number, system: UnitSystem): number {
  return system === "metric" ? c : (c * 9) / 5 + 32;
}
/** Converts a temperature in the display unit (°C or °F) to °C. */
export function fromTemperatureUnit(value: number, system: UnitSystem): number {
  return system === "metric" ? value : ((value - 32) * 5) / 9;
}
/** A temperature difference given in K: "+12 K" or, in imperial, "+22 °F" (a kelvin is 1.8 °F). */
export function formatTemperatureDifference(k: number, system: UnitSystem): string {
  const v = system === "metric" ? k : k * 1.8;
  const r = Math.round(v);
  const sign = r > 0 ? "+" : r < 0 ? "−" : "±";
  return `${sign}${fmt(Math.abs(r), 0)} ${system === "metric" ? "K" : "°F"}`;
}
