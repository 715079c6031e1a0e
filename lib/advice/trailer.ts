/**
 * Trailer-brake advice on one descent (docs/trade-facts.md §2.1):
 * - Drums that pass their fade-likely line lose grip and hand their work to the tow vehicle (fade feedback,
 *   docs/model.md): a low heat share then is the fade, not a controller to check, and the note says so.
 * - Electric and electric-over-hydraulic brakes follow the stop-light circuit, so engine braking alone does not
 *   apply them. When the trailer does less than its share (its heat share below 80 % of its mass share), or the
 *   tow vehicle reaches the warm line while the trailer stays cool, advise checking the controller gain; with
 *   the gain below 1, re-run at gain 1.0 and report it. With the gain already at 1, advise checking the trailer
 *   brakes themselves. Raising the gain is a trade-off the trade has not settled (trailer drums and bearings).
 * - Override brakes act whenever the trailer pushes, engine braking included, so they drag on a long descent:
 *   enter slower and briefly ease off (gently accelerate) about every 800 m so they release.
 * - An unbraked trailer leaves all the work to the tow vehicle.
 */

import { runPlan, type DescentRun, type DescentRunner } from "./descent-runner";
import type { TrailerAdvice, TrailerNote } from "./types";

/** Heat share below this fraction of the mass share counts as "low". [E] */
const LOW_SHARE_FRACTION = 0.8;

/**
 * Trailer-brake advice for the descent as planned.
 * @param runner the descent
 * @param asPlanned the run as planned (route step)
 * @returns advice, or null without a trailer
 * @example trailerAdvice(runner, runPlan(runner, {}, true))?.notes
 */
export function trailerAdvice(runner: DescentRunner, asPlanned: DescentRun): TrailerAdvice | null {
  const { model } = runner;
  if (model.trailerKg <= 0) return null;
  const gain = model.params.trailerGain ?? 0;
  const shares = heatShares(asPlanned, runner);
  const base = { brakeType: model.trailerBrakeType, gain, ...shares, gainOneOutcome: null };
  if (model.trailerBrakeType === "none") return { ...base, notes: ["unbraked-trailer"] };
  if (model.trailerBrakeType === "override") {
    return { ...base, notes: ["override-drags-under-engine-braking", "override-ease-off"] };
  }
  const notes: TrailerNote[] = ["electric-not-on-engine-braking"];
  // Fading drums explain a low share; an under-set controller is still worth a note.
  const fading = fades(asPlanned);
  if (fading) notes.push("trailer-fades");
  if (fading ? gain >= 1 : !doesLittle(asPlanned, shares)) return { ...base, notes };
  if (gain >= 1) return { ...base, notes: [...notes, "check-trailer-brakes"] };
  const gainOne = runPlan(runner, { trailerGain: 1 }, runner.settings.verifyAtRouteStep).outcome;
  return { ...base, notes: [...notes, "check-raise-gain", "gain-trade-off"], gainOneOutcome: gainOne };
}

/** @private Trailer share of the friction heat on the descent, and its share with an ideal controller. */
function heatShares(run: DescentRun, runner: DescentRunner): { trailerHeatShare: number; idealHeatShare: number } {
  const t = run.result.trace;
  let trailer = 0;
  let total = 0;
  const j = run.result.positions.findIndex((p) => p.position === "trailer");
  for (let k = 1; k < t.length; k++) {
    const d = t.distanceM[k] as number;
    if (d <= runner.descent.startDistanceM || d > runner.descent.endDistanceM) continue;
    for (let q = 0; q < t.energy.brakeJ.length; q++) total += t.energy.brakeJ[q]![k] as number;
    if (j >= 0) trailer += t.energy.brakeJ[j]![k] as number;
  }
  return { trailerHeatShare: total > 0 ? trailer / total : 0, idealHeatShare: runner.model.trailerMassShare };
}

/** @private The trailer's drums reach their fade-likely line in the run. */
function fades(run: DescentRun): boolean {
  const trailer = run.outcome.positions.find((p) => p.position === "trailer");
  return trailer !== undefined && trailer.peakC >= trailer.hotC;
}

/** @private The trailer does little: a low heat share, or the tow vehicle warm while the trailer stays cool. */
function doesLittle(run: DescentRun, shares: { trailerHeatShare: number; idealHeatShare: number }): boolean {
  if (shares.trailerHeatShare < LOW_SHARE_FRACTION * shares.idealHeatShare) return true;
  const trailer = run.outcome.positions.find((p) => p.position === "trailer");
  const towWarm = run.outcome.positions.some((p) => p.position !== "trailer" && p.peakC >= p.warmC);
  return towWarm && trailer !== undefined && trailer.peakC < trailer.warmC;
}
