/**
 * When the best plan is not enough: which brake is furthest past which line, by how much, where, and what
 * would change it. The user reads this instead of a bare "nothing is enough". The lines are those of the step
 * classes (docs/model.md): the fade-likely (hot) line of the friction material, the fluid's estimated boiling
 * point, and the validity ceiling past which the step is runaway. What would change it: less load (less energy
 * on the same drop), a higher trailer-controller gain where the trailer brakes do less than their share (but
 * not when the trailer's own brakes are the ones too hot: a higher gain heats them more), fresh fluid where the
 * fluid boils (its boiling point falls as it takes up water, FMVSS No. 116 dry and wet minimums), a brake
 * upgrade assessed by a licensed mechanic, or another route.
 */

import type { ResolvedModel } from "@/lib/thermal";
import { classRank } from "./outcome";
import type { RunOutcome, Shortfall, ShortfallRemedy, TrailerAdvice } from "./types";

/**
 * The shortfall of a plan that does not keep the brakes below the hot line.
 * @param outcome the plan's proven re-run on the descent
 * @param model the rig's resolved model (brake kinds, validity ceilings, fluid)
 * @param trailer the descent's trailer advice, or null
 * @returns the shortfall, or null when the outcome is below the hot line with no boil risk or runaway
 * @example shortfallOf(plan.outcome, model, trailer)?.position // "trailer"
 */
export function shortfallOf(outcome: RunOutcome, model: ResolvedModel, trailer: TrailerAdvice | null): Shortfall | null {
  let best: Omit<Shortfall, "remedies"> | null = null;
  let bestRank = -1;
  outcome.positions.forEach((p, j) => {
    const spec = model.positions[j]!;
    const brake = spec.kind === "drum" ? "drum" : "disc";
    const found: [number, Omit<Shortfall, "remedies">][] = [];
    if (p.peakC >= spec.validityCeilingC) found.push([3, { position: p.position, brake, line: "runaway", peakC: p.peakC, lineC: spec.validityCeilingC, atM: p.peakAtM }]);
    if (p.peakFluidC !== null && p.boilC !== null && p.peakFluidC >= p.boilC) {
      found.push([2, { position: p.position, brake, line: "boil", peakC: p.peakFluidC, lineC: p.boilC, atM: p.peakAtM }]);
    }
    if (p.peakC >= p.hotC) found.push([1, { position: p.position, brake, line: "hot", peakC: p.peakC, lineC: p.hotC, atM: p.peakAtM }]);
    for (const [rank, s] of found) {
      const over = s.peakC - s.lineC;
      if (rank > bestRank || (rank === bestRank && best !== null && over > best.peakC - best.lineC)) (best = s), (bestRank = rank);
    }
  });
  if (best === null && classRank(outcome.worstClass) >= classRank("runaway")) {
    // runaway without a temperature past the ceiling: the brakes can no longer hold the speed
    const p = outcome.positions.reduce((a, b) => (b.peakC - b.hotC > a.peakC - a.hotC ? b : a));
    const j = outcome.positions.indexOf(p);
    best = { position: p.position, brake: model.positions[j]!.kind === "drum" ? "drum" : "disc", line: "runaway", peakC: p.peakC, lineC: Number.NaN, atM: p.peakAtM };
  }
  if (best === null) return null;
  return { ...(best as Omit<Shortfall, "remedies">), remedies: remediesFor(best, model, trailer) };
}

/** @private What would change it, in the order a driver can act on them. */
function remediesFor(s: Omit<Shortfall, "remedies">, model: ResolvedModel, trailer: TrailerAdvice | null): ShortfallRemedy[] {
  const out: ShortfallRemedy[] = ["less-load"];
  if (s.position !== "trailer" && trailer !== null && trailer.notes.includes("check-raise-gain")) out.push("raise-trailer-gain");
  const fluid = model.positions.find((p) => p.position === s.position)?.fluid;
  if (s.line === "boil" && fluid && fluid.yearsSinceChange > 0) out.push("fresh-fluid");
  out.push("brake-upgrade", "another-route");
  return out;
}
