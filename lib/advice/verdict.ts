/**
 * Verdicts in our words, for one rig and for a convoy (judged by its weakest rig). The rule:
 * - "clear": no descent takes any brake to the warm (caution) line or the fluid to boil risk, as planned;
 * - "not advised": on some descent nothing is enough (even 1st gear at walking pace with the converter locked
 *   leaves a brake at or above the hot line or the fluid at boil risk), or the proven combined plan still does,
 *   or the whole route with all advice applied reaches the hot line, boil risk or runaway anywhere;
 * - "clear with advice": otherwise: every descent that needs advice has a combined plan whose whole-route
 *   re-run keeps every brake below the hot (fade-likely) line and the fluid below boil risk. A plan may leave
 *   a brake in the warm band; that is said plainly in the advice ("caution"), but it is not a reason to refuse.
 * A descent that reaches runaway as planned is never "clear": it reaches warm or worse, so it has advice.
 */

import type { StepClass } from "@/lib/thermal";
import { classRank } from "./outcome";
import type { DescentAdvice, Verdict } from "./types";

/** Verdicts from best to worst. */
export const VERDICTS: readonly Verdict[] = ["clear", "clear with advice", "not advised"];

/**
 * A rig's verdict from its descent advice.
 * @param advice advice for every descent that needs it
 * @param reachedWarm whether any descent reached warm or worse as planned (default: some advice exists); a
 *   descent can need no advice of its own once the plans before it have cooled the brakes
 * @param worstWithAdvice worst class over the whole route with all advice applied (default: judged from the
 *   descents alone)
 * @returns the verdict
 * @example rigVerdict([]) // "clear"
 */
export function rigVerdict(
  advice: readonly DescentAdvice[],
  reachedWarm = advice.length > 0,
  worstWithAdvice?: StepClass,
): Verdict {
  const routeRank = classRank(worstWithAdvice ?? "cool");
  if (!reachedWarm && routeRank === classRank("cool")) return "clear";
  const fails = advice.some((a) => a.nothingIsEnough || a.plan.status === "above-hot");
  if (fails || routeRank >= classRank("hot")) return "not advised";
  return "clear with advice";
}

/**
 * The verdict held against the whole-route heat trace: it never says less than the trace. A route whose trace
 * reaches warm anywhere as planned is not "clear"; one whose trace with the advice applied still reaches hot,
 * boil risk or runaway anywhere is "not advised" (docs/model.md, "Verdict").
 * @param verdict the verdict from the descent advice (rigVerdict)
 * @param worst worst class over the whole route, as planned and with the advice applied
 * @returns the verdict, never milder than the trace
 * @example traceVerdict("clear", { asPlanned: "hot", withAdvice: "hot" }) // "not advised"
 */
export function traceVerdict(verdict: Verdict, worst: { asPlanned: StepClass; withAdvice: StepClass }): Verdict {
  const severe = worst.withAdvice === "hot" || worst.withAdvice === "boil-risk" || worst.withAdvice === "runaway";
  if (severe) return "not advised";
  if (verdict === "clear" && worst.asPlanned !== "cool") return "clear with advice";
  return verdict;
}

/**
 * The worst of several verdicts (the weakest rig decides).
 * @param verdicts verdicts
 * @returns the worst ("clear" for none)
 * @example worstVerdict(["clear", "not advised"]) // "not advised"
 */
export function worstVerdict(verdicts: readonly Verdict[]): Verdict {
  let worst = 0;
  for (const v of verdicts) worst = Math.max(worst, VERDICTS.indexOf(v));
  return VERDICTS[worst] ?? "clear";
}
