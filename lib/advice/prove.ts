/**
 * All of a rig's advice as heat-run options (to apply it as a what-if, in the browser or on the server), and
 * the proof in one piece: the whole route re-run at its own step with every descent's combined plan applied.
 */

import type { Descent, RouteProfile } from "@/lib/route";
import {
  prepareRoute,
  runPrepared,
  validateRouteProfile,
  type HeatRunOptions,
  type HeatRunResult,
  type PreparedRoute,
  type RangeControl,
  type Rig,
} from "@/lib/thermal";
import { outcomeOf } from "./outcome";
import type { RigAdvice, RunOutcome } from "./types";

/**
 * Heat-run options with every descent's combined plan added to the plan's own options: a control from crest
 * to bottom for the gear and speed, and the cool-down stops.
 * @param advice a rig's advice
 * @param base the plan's own options (conditions, the user's stops and controls)
 * @returns options for runHeatRun / runPrepared
 * @example runHeatRun(profile, rig, adviceOptions(advice, options))
 */
export function adviceOptions(advice: RigAdvice, base: HeatRunOptions = {}): HeatRunOptions {
  const controls: RangeControl[] = [...(base.controls ?? [])];
  const stops = [...(base.stops ?? [])];
  for (const a of advice.descents) {
    const { gear, speedMs } = a.plan.plan;
    if (gear !== undefined || speedMs !== undefined) {
      controls.push({
        startM: a.descent.startDistanceM,
        endM: a.descent.endDistanceM,
        ...(gear !== undefined ? { gear } : {}),
        ...(speedMs !== undefined ? { speedMs } : {}),
      });
    }
    stops.push(...(a.plan.plan.stops ?? []));
  }
  return { ...base, controls, stops };
}

/**
 * Re-run the whole route at its own step with all of a rig's advice applied, in one piece.
 * @param route the route (profile or prepared)
 * @param descents the route's descents
 * @param rig the rig
 * @param advice the rig's advice (adviseRig)
 * @param base the plan's own options
 * @returns the heat run and its outcome on every descent
 * @example proveAdvice(profile, descents, rig, advice).descents[0].marginToHotK > 0
 */
export function proveAdvice(
  route: RouteProfile | PreparedRoute,
  descents: readonly Descent[],
  rig: Rig,
  advice: RigAdvice,
  base: HeatRunOptions = {},
): { result: HeatRunResult; descents: RunOutcome[] } {
  const prepared = "pathM" in route ? route : prepareRoute(validateRouteProfile(route));
  const result = runPrepared(prepared, rig, adviceOptions(advice, base));
  return { result, descents: descents.map((d) => outcomeOf(result, d.startDistanceM, d.endDistanceM)) };
}
