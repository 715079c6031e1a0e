/** Trailer-brake notes in words (docs/trade-facts.md §2.1). */

import type { UnitSystem } from "@/lib/units";
import { at } from "./render-parts";
import type { RunOutcome, TrailerAdvice, TrailerNote } from "./types";

/**
 * One trailer note in words.
 * @param note the note
 * @param advice the trailer advice (shares, gain re-run)
 * @param system unit system
 * @param noun word for the trailer ("caravan")
 * @param result outcome in words
 * @returns the sentence
 * @example trailerNoteText("override-ease-off", advice, "metric", "caravan", text)
 */
export function trailerNoteText(
  note: TrailerNote,
  advice: TrailerAdvice,
  system: UnitSystem,
  noun: string,
  result: (o: RunOutcome) => string,
): string {
  const pct = (x: number) => `${Math.round(x * 100)} %`;
  switch (note) {
    case "electric-not-on-engine-braking":
      return `Electric ${noun} brakes work from the brake-light circuit: engine braking alone doesn't apply them, so while the engine holds your speed the ${noun} isn't braked and pushes.`;
    case "check-raise-gain":
      return `The ${noun}'s brakes take ${pct(advice.trailerHeatShare)} of the heat for ${pct(advice.idealHeatShare)} of the weight: check the brake controller's gain and set it as its instructions say (on a dry, level road, just short of locking the ${noun}'s wheels).` +
        (advice.gainOneOutcome ? ` With the gain at 1.0: ${result(advice.gainOneOutcome)}.` : "");
    case "check-trailer-brakes":
      return `The ${noun}'s brakes take ${pct(advice.trailerHeatShare)} of the heat for ${pct(advice.idealHeatShare)} of the weight although the gain is at 1.0: have them checked (adjustment, magnets, wiring).`;
    case "trailer-fades":
      return `As planned the ${noun}'s drums pass their fade-likely line and lose grip, so the tow vehicle's brakes take over their work (${pct(advice.trailerHeatShare)} of the heat for ${pct(advice.idealHeatShare)} of the weight) and heat faster from there.`;
    case "gain-trade-off":
      return `A higher gain moves heat into the ${noun}'s drums and bearings; the trade has not settled how far to go.`;
    case "override-drags-under-engine-braking":
      return `Override brakes act whenever the ${noun} pushes, so under engine braking they keep dragging and its drums heat up even without the pedal.`;
    case "override-ease-off":
      return `Enter the descent slower, and about every ${at(800, system)} ease off briefly (a touch of throttle) so the ${noun}'s brakes release.`;
    case "unbraked-trailer":
      return `The ${noun} has no brakes of its own: the tow vehicle's brakes stop the whole rig.`;
  }
}
