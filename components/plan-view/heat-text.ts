/**
 * Brake temperatures as the plan views print them. A bulk temperature at or past a brake's validity ceiling
 * is not a number to trust (docs/model.md, "Validity ceiling"): it always reads "beyond Fadeline's range".
 * With a band (10th–90th percentile of the ensemble, docs/model.md "Uncertainty bands") a peak reads
 * "about 240 °C (210–290)".
 */

import { peakText } from "@/lib/advice/render-parts";
import { formatTemperatureBand, type UnitSystem } from "@/lib/units";

/** A band's edges, °C. */
export interface Edges {
  lowC: number;
  highC: number;
}

/**
 * A peak in words, with its band when there is one.
 * @param peakC the peak, °C
 * @param ceilingC the brake's validity ceiling, °C
 * @param band its band, if run
 * @param system unit system
 * @returns e.g. "about 240 °C (210–290)", "240 °C", "beyond Fadeline's range"
 * @example peakWithBand(243, 600, { lowC: 212, highC: 288 }, "metric") // "about 240 °C (210–290)"
 */
export function peakWithBand(peakC: number, ceilingC: number, band: Edges | null | undefined, system: UnitSystem): string {
  return band ? formatTemperatureBand(peakC, band, ceilingC, system) : peakText(peakC, ceilingC, system);
}

/**
 * The position that speaks for a run in one figure: the first at or past its ceiling, else the hottest.
 * @param positions each position's peak and ceiling, °C
 * @returns its index (0 for an empty list)
 * @example worstPosition([{ peakC: 300, ceilingC: 600 }, { peakC: 590, ceilingC: 590 }]) // 1
 */
export function worstPosition(positions: readonly { peakC: number; ceilingC: number }[]): number {
  const beyond = positions.findIndex((p) => p.peakC >= p.ceilingC);
  if (beyond >= 0) return beyond;
  let best = 0;
  positions.forEach((p, j) => {
    if (p.peakC > positions[best]!.peakC) best = j;
  });
  return best;
}

/**
 * Each position's validity ceiling, by position (for lib/advice bandNoteText).
 * @param positions a run's positions with their ceilings
 * @returns e.g. { front: 600, rear: 590, trailer: 590 }
 * @example ceilingsByPosition(advice.proof[0].asPlanned.positions).trailer // 590
 */
export function ceilingsByPosition<P extends string>(positions: readonly { position: P; ceilingC: number }[]): Partial<Record<P, number>> {
  const out: Partial<Record<P, number>> = {};
  for (const p of positions) out[p.position] = p.ceilingC;
  return out;
}
