/** A convoy's verdict and its worst rig per descent, as text. */

import type { UnitSystem } from "@/lib/units";
import { GENERAL_CAUTIONS } from "./cautions";
import type { ConvoyAdvice } from "./convoy";
import { at, CLASS_WORDS, outcomeText } from "./render-parts";

/**
 * A convoy as text: the verdict (judged by the weakest rig), then per descent the worst rig as planned and
 * with its advice, then the general cautions.
 * @param convoy the convoy's advice
 * @param system metric or imperial
 * @param trailerNoun word for trailers ("caravan")
 * @returns lines
 * @example renderConvoy(adviseConvoy(input), "metric")[0] // "Convoy verdict: clear with advice (weakest: Van 2)."
 */
export function renderConvoy(convoy: ConvoyAdvice, system: UnitSystem, trailerNoun = "caravan"): string[] {
  const weakest = convoy.weakestRigIndices.map((i) => convoy.rigs[i]!.label).join(", ");
  const out = [`Convoy verdict: ${convoy.verdict} (weakest: ${weakest}).`];
  for (const d of convoy.descents) {
    const cell = d.cells[d.worstRigIndex]!;
    if (cell.asPlanned.worstClass === "cool") continue;
    out.push(
      `Descent from ${at(d.descent.startDistanceM, system)}: worst rig ${cell.label}, ${CLASS_WORDS[cell.asPlanned.worstClass]} as planned; ` +
        `with its advice ${outcomeText(cell.withAdvice, system, trailerNoun)}.`,
    );
  }
  out.push(...GENERAL_CAUTIONS);
  return out;
}
