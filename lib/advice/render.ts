/**
 * Plain text of our own for a driver, from the structured advice, in metric or imperial units. Example:
 * "Before the crest at 31.6 km, select 2nd and hold it; keep to 45 km/h; stop for 10 minutes at Fernhollow
 * Camp (36.2 km); the stop adds 10 min to the day." Every piece of advice ends with its re-run result ("With
 * this advice: front 240 °C, …"). A stop is quoted in the same words wherever it appears (stopText), and the
 * plan's stops are the ones the stop line details. When the plan is not enough, the text says which brake,
 * by how much past which line, and what would change it.
 */

import type { BrakePosition } from "@/lib/thermal";
import { BEYOND_RANGE_TEXT, formatDistance, formatGrade, formatElevation, formatTemperature, formatTemperatureBand, type UnitSystem } from "@/lib/units";
import { GENERAL_CAUTIONS, STANDSTILL_CAUTIONS } from "./cautions";
import { DEFAULT_ADVICE_SETTINGS } from "./settings";
import {
  at,
  CLASS_WORDS,
  gearText,
  lengthText,
  outcomeText,
  remedyText,
  shortfallText,
  speedLimitText,
  stopsAddText,
  stopText,
} from "./render-parts";
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
  const stop = stopLine(advice, system, result);
  if (stop !== null) lines.push(stop);
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
  out.push(...bandNotesText(advice.uncertainty, system, options.trailerNoun ?? "caravan"));
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
 * @param ceilingsC each position's validity ceiling, °C: an upper edge at or past it reads "beyond Fadeline's range"
 * @returns the sentence
 * @example bandNoteText({ descentIndex: 1, line: "hot", hits }, "metric", "caravan")
 */
export function bandNoteText(note: BandNote, system: UnitSystem, noun: string, ceilingsC: Partial<Record<BrakePosition, number>> = {}): string {
  const what = note.line === "hot" ? "fade" : "caution";
  const hits = note.hits
    .map((h) => {
      const who = h.position === "trailer" ? noun : h.position;
      const line = `its line is ${formatTemperature(h.limitC, system)}`;
      // An upper edge at or past the brake's validity ceiling is no number to print (docs/model.md, "Validity ceiling").
      if (h.highC >= (ceilingsC[h.position] ?? Infinity)) return `${who} could go ${BEYOND_RANGE_TEXT} (${line})`;
      return `${who} up to about ${formatTemperatureBand(h.highC, null, Infinity, system)} (${line})`;
    })
    .join(", ");
  const sentence = `Could reach ${what} on descent ${note.descentIndex + 1} within the model's uncertainty: ${hits}.`;
  if (note.line !== "hot") return sentence;
  const remedies = (["less-load", "brake-upgrade", "another-route"] as const).map((r) => remedyText(r, { trailerNoun: noun, gain: null }));
  return `${sentence} What would change it: ${remedies.slice(0, -1).join(", ")} or ${remedies.at(-1)}.`;
}

/**
 * Band notes in words, one sentence per line reached, listing its descents: "Could reach fade on descents 1,
 * 3 and 6 within the model's uncertainty: caravan up to about 320 °C (its line is 260 °C). What would change
 * it: …". Each brake's figure is its highest upper edge over those descents.
 * @param notes the notes (RigAdvice.uncertainty)
 * @param system unit system
 * @param noun word for the trailer
 * @param ceilingsC validity ceiling per position, °C (an upper edge past it is not printed as a number)
 * @returns one sentence per line reached (fade first)
 * @example bandNotesText(advice.uncertainty, "metric", "caravan")
 */
export function bandNotesText(
  notes: readonly BandNote[],
  system: UnitSystem,
  noun: string,
  ceilingsC: Partial<Record<BrakePosition, number>> = {},
): string[] {
  const out: string[] = [];
  for (const line of ["hot", "warm"] as const) {
    const of = notes.filter((n) => n.line === line);
    if (of.length === 0) continue;
    const hits = new Map<BrakePosition, { position: BrakePosition; peakC: number; highC: number; limitC: number }>();
    for (const n of of) {
      for (const h of n.hits) {
        const seen = hits.get(h.position);
        if (seen === undefined || h.highC > seen.highC) hits.set(h.position, h);
      }
    }
    const merged: BandNote = { descentIndex: of[0]!.descentIndex, line, hits: [...hits.values()] };
    const numbers = of.map((n) => String(n.descentIndex + 1));
    const list = numbers.length === 1 ? `descent ${numbers[0]}` : `descents ${numbers.slice(0, -1).join(", ")} and ${numbers.at(-1)}`;
    out.push(bandNoteText(merged, system, noun, ceilingsC).replace(`on descent ${merged.descentIndex + 1} `, `on ${list} `));
  }
  return out;
}

/** @private The combined plan as one sentence, with its result; when it is not enough, why and what would change it. */
function planLine(a: DescentAdvice, system: UnitSystem, noun: string): string {
  const { plan } = a.plan;
  const result = outcomeText(a.plan.outcome, system, noun, a.bands?.withAdvice);
  const parts: string[] = [];
  if (plan.gear !== undefined) {
    const top = plan.speedMs === undefined && a.gear.heldTopMs !== null ? ` (up to ${speedLimitText(a.gear.heldTopMs, system)})` : "";
    parts.push(`select ${gearText(plan.gear, a.highRangeGears)}${a.gear.manualMode ? " in manual mode" : ""} and hold it${top}`);
  }
  if (plan.speedMs !== undefined) parts.push(`keep to ${speedLimitText(plan.speedMs, system)}`);
  for (const s of a.plan.stops) parts.push(stopText(s, system));
  if (a.plan.stops.length > 0) parts.push(stopsAddText(a.plan.stops));
  if (parts.length === 0) parts.push("drive as planned");
  const crest = `before the crest at ${at(a.descent.startDistanceM, system)}`;
  const runaway = a.baseline.worstClass === "runaway" ? " As planned, the brakes may fail on this descent." : "";
  if (a.nothingIsEnough || a.shortfall !== null) {
    const lead = a.nothingIsEnough
      ? `Plan: not enough. No gear, held speed or cool-down stop we can suggest keeps these brakes out of the fade range on this descent. The gentlest plan, ${crest}, is to ${parts.join("; ")}.`
      : `Plan: ${crest}, ${parts.join("; ")}. This is not enough.`;
    return `${lead} With this plan: ${result}.${runaway}${shortfallSentence(a, system, noun)}`;
  }
  const caution = a.plan.status === "below-warm" ? "" : " The brakes still reach the caution range: go gently and check them at the bottom.";
  const saved = runaway === "" ? "" : " As planned, the brakes may fail on this descent: follow this plan.";
  return `Plan: ${crest}, ${parts.join("; ")}. With this plan: ${result}.${caution}${saved}`;
}

/** @private Why the plan is not enough and what would change it (empty without a shortfall). */
function shortfallSentence(a: DescentAdvice, system: UnitSystem, noun: string): string {
  if (a.shortfall === null) return " What would change it: carry less load, have a brake upgrade assessed by a licensed mechanic, or choose another route.";
  const why = shortfallText(a.shortfall, system, noun);
  const remedies = a.shortfall.remedies.map((r) => remedyText(r, { trailerNoun: noun, gain: a.trailer?.gain ?? null }));
  const list = remedies.length > 1 ? `${remedies.slice(0, -1).join(", ")}, or ${remedies.at(-1)}` : (remedies[0] ?? "");
  return ` ${why.charAt(0).toUpperCase()}${why.slice(1)}. What would change it: ${list}.`;
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

/** The places a rig can stand for a cool-down stop, in words (stop-place.ts, with the default stop grade). */
const STAND_PLACES = `the crest, a named waypoint, or road no steeper than ${Math.round(DEFAULT_ADVICE_SETTINGS.maxStopGrade * 100)} %`;

/** Where a cool-down stop is made, in words. */
const STOP_RULE = `A stop is made where a rig can stand (${STAND_PLACES}), as late as it can be before the brakes would pass the line.`;

/**
 * @private The cool-down stop line: the plan's own stops when it has any (the same words as the plan line),
 * else the stops driving as planned, offered instead of the plan; when the plan is not enough and no stop would
 * help, that is said; otherwise null.
 */
function stopLine(a: DescentAdvice, system: UnitSystem, result: (o: DescentAdvice["baseline"]) => string): string | null {
  const each = (stops: readonly PlannedStop[]) =>
    stops.map((s) => `${stopText(s, system)}${s.capped ? " (the longest stop we suggest: the brakes are still warm when you move off)" : ""}`).join("; then ");
  if (a.plan.stops.length > 0) {
    const base = a.plan.plan.gear !== undefined || a.plan.plan.speedMs !== undefined ? ", with the gear and speed above" : "";
    const title = `Cool-down stop${a.plan.stops.length > 1 ? "s" : ""}${base}`;
    return `${title}: ${each(a.plan.stops)}; ${stopsAddText(a.plan.stops)}. ${STOP_RULE} With these stops: ${result(a.plan.outcome)}.`;
  }
  if (a.stop === null) return null;
  if (a.stop.stops.length === 0) {
    if (a.plan.status !== "above-hot") return null;
    return `Cool-down stop: none would help. There is no place a rig can stand (${STAND_PLACES}) before the brakes would pass the fade-likely line where a stop would cool them.`;
  }
  const tail = a.stop.enough ? "" : " Even with these stops the brakes get too hot; use the plan above.";
  return `Cool-down stop, instead of the plan above (driving as planned): ${each(a.stop.stops)}; ${stopsAddText(a.stop.stops)}. ${STOP_RULE} With these stops: ${result(a.stop.outcome)}.${tail}`;
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
