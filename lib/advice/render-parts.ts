/**
 * Words and numbers for the advice text: positions, classes, ordinals, speeds rounded down in the user's unit,
 * outcomes ("front 240 °C, rear 210 °C: caution"). Numbers come in SI and go out through lib/units.
 */

import type { StepClass } from "@/lib/thermal";
import {
  BEYOND_RANGE_TEXT,
  formatDistance,
  formatElevation,
  formatSpeed,
  formatTemperature,
  formatTemperatureBand,
  M_PER_MI,
  type UnitSystem,
} from "@/lib/units";
import type { BandEdges, PlannedStop, RunOutcome, Shortfall, ShortfallRemedy, StopPlace } from "./types";

/** The step classes in the words of the plan page, worst last (runaway is worse than fluid boil risk). */
export const CLASS_WORDS: Readonly<Record<StepClass, string>> = {
  cool: "below caution",
  warm: "caution",
  hot: "fade likely",
  "boil-risk": "brake-fluid boil risk",
  runaway: "runaway: the brakes may fail",
};

/**
 * An ordinal gear name.
 * @param n gear, 1-based
 * @returns "1st", "2nd", "3rd", "4th", … "11th", "12th", "13th", "21st"
 * @example ordinal(2) // "2nd"
 */
export function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? "th" : n % 10 === 1 ? "st" : n % 10 === 2 ? "nd" : n % 10 === 3 ? "rd" : "th";
  return `${n}${suffix}`;
}

/**
 * A speed limit in the user's unit, rounded DOWN to a whole km/h or mph (never faster than advised).
 * @param ms speed, m/s
 * @param system unit system
 * @returns e.g. "45 km/h", "27 mph"
 * @example speedLimitText(45 / 3.6, "imperial") // "27 mph"
 */
export function speedLimitText(ms: number, system: UnitSystem): string {
  const perUnit = system === "metric" ? 1 / 3.6 : M_PER_MI / 3600;
  return formatSpeed(Math.floor(ms / perUnit + 1e-6) * perUnit, system);
}

/**
 * A place along the route: "12.3 km".
 * @param m distance along the route, m
 * @param system unit system
 * @returns text
 * @example at(7800, "metric") // "7.8 km"
 */
export function at(m: number, system: UnitSystem): string {
  return formatDistance(m, system);
}

/**
 * A duration in whole minutes.
 * @param s duration, s
 * @returns e.g. "10 minutes", "1 minute"
 * @example minutesText(600) // "10 minutes"
 */
export function minutesText(s: number): string {
  const n = Math.round(s / 60);
  return `${n} minute${n === 1 ? "" : "s"}`;
}

/**
 * An outcome in words: every position's peak and the worst class.
 * @param outcome a run's outcome
 * @param system unit system
 * @param trailerNoun word for the trailer ("caravan", "trailer")
 * @param band each position's band, when run: peaks then read "about 240 °C (210–290)"
 * @returns e.g. "front 240 °C, rear 210 °C, caravan 180 °C: below caution"
 * @example outcomeText(outcome, "metric", "caravan")
 */
export function outcomeText(outcome: RunOutcome, system: UnitSystem, trailerNoun: string, band?: readonly BandEdges[]): string {
  const peaks = outcome.positions
    .map((p, j) => {
      const edges = band?.[j];
      const value = edges ? formatTemperatureBand(p.peakC, edges, p.ceilingC, system) : peakText(p.peakC, p.ceilingC, system);
      return `${p.position === "trailer" ? trailerNoun : p.position} ${value}`;
    })
    .join(", ");
  return `${peaks}: ${CLASS_WORDS[outcome.worstClass]}`;
}

/**
 * A peak temperature in words: the temperature, or "beyond Fadeline's range" at or past the brake's validity
 * ceiling (a bulk temperature there is not a number to trust).
 * @param peakC peak, °C
 * @param ceilingC the brake's validity ceiling, °C
 * @param system unit system
 * @returns e.g. "240 °C"
 * @example peakText(1290, 600, "metric") // "beyond Fadeline's range"
 */
export function peakText(peakC: number, ceilingC: number, system: UnitSystem): string {
  return peakC >= ceilingC ? BEYOND_RANGE_TEXT : formatTemperature(peakC, system);
}

/**
 * A gear in words: "2nd", or "low range, 2nd" for a gear above the high-range gears.
 * @param gear 1-based gear
 * @param highRangeGears number of high-range gears
 * @returns the name
 * @example gearText(8, 6) // "low range, 2nd"
 */
export function gearText(gear: number, highRangeGears: number): string {
  return gear > highRangeGears ? `low range, ${ordinal(gear - highRangeGears)}` : ordinal(gear);
}

/**
 * Where a stop is, in words. A flat place is never steeper than the advice's stop grade (4 %).
 * @param stop the stop
 * @param system unit system
 * @returns e.g. "at Fernhollow Camp (35.6 km)", "at the crest (31.6 km)", "at 32.7 km, where the road eases to 2 % down"
 * @example stopPlaceText(stop, "metric")
 */
export function stopPlaceText(stop: Pick<PlannedStop, "atM" | "place">, system: UnitSystem): string {
  const where = at(stop.atM, system);
  const place: StopPlace = stop.place;
  if (place.kind === "waypoint") return `at ${place.name} (${where})`;
  if (place.kind === "crest") return `at the crest (${where})`;
  const pct = Math.abs(place.grade * 100);
  if (pct < 1) return `at ${where}, where the road is nearly level`;
  return `at ${where}, where the road eases to ${pct.toFixed(0)} % ${place.grade < 0 ? "down" : "up"}`;
}

/**
 * Each stop as an instruction, the same words wherever the stop is quoted.
 * @param stop the stop
 * @param system unit system
 * @returns e.g. "stop for 20 minutes at the crest (3.0 km)"
 * @example stopText(stop, "metric")
 */
export function stopText(stop: PlannedStop, system: UnitSystem): string {
  return `stop for ${minutesText(stop.durationS)} ${stopPlaceText(stop, system)}`;
}

/**
 * The time a descent's stops add to the day.
 * @param stops the stops
 * @returns e.g. "the stop adds 20 min to the day", "the two stops add 35 min to the day"; "" without stops
 * @example stopsAddText(stops) // "the two stops add 35 min to the day"
 */
export function stopsAddText(stops: readonly PlannedStop[]): string {
  if (stops.length === 0) return "";
  const minutes = Math.round(stops.reduce((sum, s) => sum + s.durationS, 0) / 60);
  const count = ["", "the stop adds", "the two stops add", "the three stops add"][stops.length] ?? `the ${stops.length} stops add`;
  return `${count} ${minutes} min to the day`;
}

/**
 * A temperature difference in the user's unit (K shown as °C, or as °F at 9/5 per K).
 * @param k difference, K
 * @param system unit system
 * @returns e.g. "58 °C", "104 °F"
 * @example temperatureDifferenceText(58, "imperial") // "104 °F"
 */
export function temperatureDifferenceText(k: number, system: UnitSystem): string {
  return system === "metric" ? `${Math.round(k).toLocaleString("en")} °C` : `${Math.round((k * 9) / 5).toLocaleString("en")} °F`;
}

/**
 * Why a plan is not enough, in words: which brake, how hot, how far past which line, and where.
 * @param s the shortfall
 * @param system unit system
 * @param trailerNoun word for the trailer ("caravan")
 * @returns e.g. "the caravan drums would still reach about 318 °C, 58 °C past their fade-likely line (near 8.1 km)"
 * @example shortfallText(advice.shortfall, "metric", "caravan")
 */
export function shortfallText(s: Shortfall, system: UnitSystem, trailerNoun: string): string {
  const owner = s.position === "trailer" ? trailerNoun : s.position;
  const brakes = `the ${owner} ${s.brake}s`;
  const near = `near ${at(s.atM, system)}`;
  const over = temperatureDifferenceText(s.peakC - s.lineC, system);
  const peak = formatTemperature(s.peakC, system);
  if (s.line === "hot") return `${brakes} would still reach about ${peak}, ${over} past their fade-likely line (${near})`;
  if (s.line === "boil") return `the ${owner} brake fluid would still reach about ${peak}, ${over} past its estimated boiling point (${near})`;
  if (Number.isNaN(s.lineC)) return `${brakes} could no longer hold the speed, so the brakes may fail there (${near})`;
  // Past the validity ceiling the peak is not a number to print (docs/model.md, "Validity ceiling").
  return `${brakes} would go ${BEYOND_RANGE_TEXT}, past what the model can describe, so the brakes may fail there (${near})`;
}

/**
 * What would change a plan that is not enough, in words.
 * @param remedy the remedy
 * @param context the trailer noun and the controller gain in use (for the gain remedy)
 * @returns e.g. "carry less load"
 * @example remedyText("brake-upgrade", { trailerNoun: "caravan", gain: 1 }) // "have a brake upgrade assessed by a licensed mechanic"
 */
export function remedyText(remedy: ShortfallRemedy, context: { trailerNoun: string; gain: number | null }): string {
  switch (remedy) {
    case "less-load":
      return "carry less load";
    case "raise-trailer-gain": {
      const now = context.gain === null ? "" : ` (now ${Math.round(context.gain * 100) / 100})`;
      return `raise the brake controller's gain${now} so the ${context.trailerNoun}'s brakes do their share`;
    }
    case "fresh-fluid":
      return "have the brake fluid changed (fresh fluid boils hotter)";
    case "brake-upgrade":
      return "have a brake upgrade assessed by a licensed mechanic";
    case "another-route":
      return "choose another route";
  }
}

/**
 * A stopping distance in the user's length unit.
 * @param m distance, m
 * @param system unit system
 * @returns e.g. "57 m", "187 ft"
 * @example lengthText(57, "metric") // "57 m"
 */
export function lengthText(m: number, system: UnitSystem): string {
  return formatElevation(m, system);
}
