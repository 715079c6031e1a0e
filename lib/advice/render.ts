/**
 * Plain text of our own for a driver, from the structured advice, in metric or imperial units. Example:
 * "Before the crest at 31.6 km, select 2nd and hold it; keep to 45 km/h; stop for 10 minutes at Fernhollow
 * Camp (36.2 km)." Every piece of advice ends with its re-run result ("With this advice: front 240 °C, …").
 */

import { formatDistance, formatGrade, formatElevation, formatTemperature, formatTemperatureBand, type UnitSystem } from "@/lib/units";
import { GENERAL_CAUTIONS, NOTHING_IS_ENOUGH_OPTIONS, STANDSTILL_CAUTIONS } from "./cautions";
import { at, CLASS_WORDS, gearText, lengthText, minutesText, outcomeText, speedLimitText, stopPlaceText } from "./render-parts";
import { trailerNoteText } from "./render-trailer";
import type { BandNote, DescentAdvice, PlannedStop, RigAdvice } from "./types";

/** A descent's advice as text. */
export interface DescentText {
  /** e.g. "Descent from 31.6 km to 41.0 km: 819 m down at 8.7 %". */
  title: string;
  /** The plan first, then each piece of advice with its result, then stopping distances. */
  lines: string[];
  /** Standstill cautions (when the advice includes a stop). */
  cautions: string[];
}

/** Options of the text. */
export interface RenderOptions {
  /** Word for the trailer: "caravan" (default), "camper", "trailer". */
  trailerNoun?: string;
}

/**
 * A descent's advice as text.
 * @param advice the descent's advice
 * @param system metric or imperial
 * @param options wording options
 * @returns title, lines, cautions
 * @example renderDescentAdvice(advice.descents[0], "metric").lines[0] // "Plan: before the crest at 31.6 km, …"
 */
export function renderDescentAdvice(advice: DescentAdvice, system: UnitSystem, options: RenderOptions = {}): DescentText {
  const noun = options.trailerNoun ?? "caravan";
  const d = advice.descent;
  const result = (o: Parameters<typeof outcomeText>[0]) => outcomeText(o, system, noun);
  const asPlanned = outcomeText(advice.baseline, system, noun, advice.bands?.asPlanned);
  const lines = [planLine(advice, system, noun), `As planned: ${asPlanned}.`];
  lines.push(gearLine(advice, system, result), speedLine(advice, system, result));
  if (advice.stop) lines.push(stopLine(advice.stop.stops, advice.stop.enough, system, result(advice.stop.outcome)));
  for (const note of advice.trailer?.notes ?? []) lines.push(trailerNoteText(note, advice.trailer!, system, noun, result));
  lines.push(stoppingLine(advice, system));
  const stops = (advice.stop?.stops.length ?? 0) > 0 || advice.plan.stops.length > 0;
  return {
    title: `Descent from ${at(d.startDistanceM, system)} to ${at(d.endDistanceM, system)}: ${formatElevation(d.dropM, system)} down at ${formatGrade(-d.meanGrade)}`,
    lines,
    cautions: stops ? [...STANDSTILL_CAUTIONS] : [],
  };
}

/**
 * A rig's advice as text: the verdict, each descent, the whole-route result, and the general cautions.
 * @param advice the rig's advice
 * @param system metric or imperial
 * @param options wording options
 * @returns lines
 * @example renderRigAdvice(advice, "imperial").join("\n")
 */
export function renderRigAdvice(advice: RigAdvice, system: UnitSystem, options: RenderOptions = {}): string[] {
  const out = [`Verdict: ${advice.verdict}.`, ...advice.legalReasons.map((r) => `Not advised as loaded: ${r}`)];
  for (const note of advice.uncertainty) out.push(bandNoteText(note, system, options.trailerNoun ?? "caravan"));
  for (const d of advice.descents) {
    const text = renderDescentAdvice(d, system, options);
    out.push("", text.title, ...text.lines, ...text.cautions);
  }
  out.push("", `Whole route with all advice applied: ${CLASS_WORDS[advice.worstClass.withAdvice]} at worst (as planned: ${CLASS_WORDS[advice.worstClass.asPlanned]}).`);
  out.push("", ...GENERAL_CAUTIONS);
  return out;
}

/**
 * A band note in words: "Could reach fade on descent 2 within the model's uncertainty: caravan up to about
 * 290 °C (its line is 260 °C)."
 * @param note the note
 * @param system unit system
 * @param noun word for the trailer
 * @returns the sentence
 * @example bandNoteText({ descentIndex: 1, line: "hot", hits }, "metric", "caravan")
 */
export function bandNoteText(note: BandNote, system: UnitSystem, noun: string): string {
  const what = note.line === "hot" ? "fade" : "caution";
  const hits = note.hits
    .map((h) => `${h.position === "trailer" ? noun : h.position} up to about ${formatTemperatureBand(h.highC, null, Infinity, system)} (its line is ${formatTemperature(h.limitC, system)})`)
    .join(", ");
  return `Could reach ${what} on descent ${note.descentIndex + 1} within the model's uncertainty: ${hits}.`;
}

/** @private The combined plan as one sentence, with its result. */
function planLine(a: DescentAdvice, system: UnitSystem, noun: string): string {
  const { plan } = a.plan;
  const result = outcomeText(a.plan.outcome, system, noun, a.bands?.withAdvice);
  if (a.nothingIsEnough) {
    const pace = plan.speedMs === undefined ? "walking pace" : speedLimitText(plan.speedMs, system);
    return `Nothing we can suggest keeps these brakes out of the fade range on this descent: even the gentlest plan ` +
      `(${gearText(plan.gear ?? 1, a.highRangeGears)} held, at ${pace}) gives ${result}. ` +
      `Please ${NOTHING_IS_ENOUGH_OPTIONS.slice(0, -1).join(", ")}, or ${NOTHING_IS_ENOUGH_OPTIONS.at(-1)}.`;
  }
  const parts: string[] = [];
  if (plan.gear !== undefined) {
    const top = plan.speedMs === undefined && a.gear.heldTopMs !== null ? ` (up to ${speedLimitText(a.gear.heldTopMs, system)})` : "";
    parts.push(`select ${gearText(plan.gear, a.highRangeGears)}${a.gear.manualMode ? " in manual mode" : ""} and hold it${top}`);
  }
  if (plan.speedMs !== undefined) parts.push(`keep to ${speedLimitText(plan.speedMs, system)}`);
  for (const s of a.plan.stops) parts.push(`stop for ${minutesText(s.durationS)} ${stopPlaceText(s, system)}`);
  if (parts.length === 0) parts.push("drive as planned");
  const caution = a.plan.status === "below-warm" ? "" : " The brakes still reach the caution range: go gently and check them at the bottom.";
  return `Plan: before the crest at ${at(a.descent.startDistanceM, system)}, ${parts.join("; ")}. With this plan: ${result}.${caution}`;
}

/** @private */
function gearLine(a: DescentAdvice, system: UnitSystem, result: (o: DescentAdvice["baseline"]) => string): string {
  const g = a.gear;
  if (g.gear === null) return `Gear: no gear keeps the brakes below caution at the usual descent speed. In 1st, held: ${result(g.outcome)}.`;
  const limit = g.gearLimitMs === null ? "" : `; at ${g.maxRpm.toLocaleString("en")} rpm it allows up to ${speedLimitText(g.gearLimitMs, system)}`;
  return `Gear: select ${gearText(g.gear, a.highRangeGears)} before the crest and hold it${g.manualMode ? " (manual mode, so the gearbox keeps it)" : ""}${limit}. ` +
    `A higher gear is not enough. With this advice: ${result(g.outcome)}.`;
}

/** @private */
function speedLine(a: DescentAdvice, system: UnitSystem, result: (o: DescentAdvice["baseline"]) => string): string {
  const s = a.speed;
  if (s.speedMs === null) return `Speed: no steady speed down to walking pace keeps the brakes below caution. At walking pace in ${gearText(s.gear, a.highRangeGears)}: ${result(s.outcome)}.`;
  const faster = system === "metric" ? "5 km/h" : "about 3 mph";
  return `Speed: keep to ${speedLimitText(s.speedMs, system)} in ${gearText(s.gear, a.highRangeGears)}${s.manualMode ? " (manual mode)" : ""}, held; ` +
    `${faster} faster is not enough. With this advice: ${result(s.outcome)}.`;
}

/** @private */
function stopLine(stops: readonly PlannedStop[], enough: boolean, system: UnitSystem, result: string): string {
  if (stops.length === 0) return "Cool-down stop: no place before the brakes get too hot would let them cool; slow down before the crest instead.";
  const each = stops.map((s) => `stop for ${minutesText(s.durationS)} ${stopPlaceText(s, system)}${s.capped ? " (longer if you can: the brakes need more)" : ""}`);
  const tail = enough ? "" : " Even with these stops the brakes get too hot; use the plan above.";
  return `Cool-down stop, driving as planned: ${each.join("; then ")}. With these stops: ${result}.${tail}`;
}

/** @private Hot versus cold stopping distance at the bottom. */
function stoppingLine(a: DescentAdvice, system: UnitSystem): string {
  const pick = system === "metric" ? 0 : 1;
  const planned = a.stopping.asPlanned[pick]!;
  const withPlan = a.stopping.withPlan[pick]!;
  return `Stopping from ${planned.from} at the bottom (estimate, braking distance only): about ${lengthText(planned.cold.brakingDistanceM, system)} ` +
    `with cold brakes, ${lengthText(planned.hot.brakingDistanceM, system)} as planned, ${lengthText(withPlan.hot.brakingDistanceM, system)} with the plan.`;
}

/**
 * A distance along the route for headings (re-exported for the UI).
 * @param m distance, m
 * @param system unit system
 * @returns text
 * @example distanceText(31_600, "metric") // "31.6 km"
 */
export function distanceText(m: number, system: UnitSystem): string {
  return formatDistance(m, system);
}
