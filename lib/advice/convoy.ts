/**
 * Advice for a convoy: each rig's advice on the same route, a descents × rigs matrix, the worst rig on each
 * descent, and the overall verdict judged by the weakest rig (rule in verdict.ts).
 */

import type { Descent, PlacedWaypoint, RouteProfile } from "@/lib/route";
import { prepareRoute, STEP_CLASSES, validateRouteProfile, type HeatRunOptions, type HeatRunResult, type PreparedRoute, type Rig } from "@/lib/thermal";
import { adviseRig } from "./advise-rig";
import type { AdviceSettings } from "./settings";
import type { RigAdvice, RunOutcome, Verdict } from "./types";
import { worstVerdict } from "./verdict";

/** One rig of a convoy. */
export interface ConvoyMember {
  /** Driver or participant label (the user's own words). */
  label: string;
  /** The rig. */
  rig: Rig;
  /** Its conditions (model parameters, the user's stops and controls). */
  options?: HeatRunOptions;
  /** Its heat run as planned, to reuse. */
  asPlanned?: HeatRunResult;
}

/** One cell of the descents × rigs matrix. */
export interface ConvoyCell {
  /** Rig index in the convoy, and its label. */
  rigIndex: number;
  label: string;
  /** The descent as planned, and with the rig's advice applied (the proof). */
  asPlanned: RunOutcome;
  withAdvice: RunOutcome;
}

/** Advice for a convoy. */
export interface ConvoyAdvice {
  /** Each rig's advice, in convoy order. */
  rigs: { label: string; advice: RigAdvice }[];
  /** Per descent: the descent, a cell per rig, and the worst rig as planned (index into the convoy). */
  descents: { descentIndex: number; descent: Descent; cells: ConvoyCell[]; worstRigIndex: number }[];
  /** The overall verdict: the weakest rig's. */
  verdict: Verdict;
  /** Indices of the rigs whose verdict is the overall one (the weakest rigs). */
  weakestRigIndices: number[];
}

/**
 * Advise every rig of a convoy on one route (the route is prepared once and shared).
 * @param input route, descents, rigs, waypoints, settings
 * @returns per-rig advice, the matrix, the worst rig per descent and the verdict
 * @throws {RangeError} "members must hold at least one rig"
 * @example adviseConvoy({ route: profile, descents, members: [{ label: "Van 1", rig }] }).verdict
 */
export function adviseConvoy(input: {
  route: RouteProfile | PreparedRoute;
  descents: readonly Descent[];
  members: readonly ConvoyMember[];
  waypoints?: readonly PlacedWaypoint[];
  settings?: Partial<AdviceSettings>;
}): ConvoyAdvice {
  if (input.members.length === 0) throw new RangeError("members must hold at least one rig");
  const route = "pathM" in input.route ? input.route : prepareRoute(validateRouteProfile(input.route), input.descents);
  const rigs = input.members.map((m) => ({
    label: m.label,
    advice: adviseRig({ ...input, route, rig: m.rig, options: m.options, asPlanned: m.asPlanned }),
  }));
  const descents = input.descents.map((descent, i) => {
    const cells = rigs.map((r, rigIndex) => ({
      rigIndex,
      label: r.label,
      asPlanned: r.advice.proof[i]!.asPlanned,
      withAdvice: r.advice.proof[i]!.withAdvice,
    }));
    return { descentIndex: i, descent, cells, worstRigIndex: worstCell(cells) };
  });
  const verdict = worstVerdict(rigs.map((r) => r.advice.verdict));
  const weakestRigIndices = rigs.flatMap((r, i) => (r.advice.verdict === verdict ? [i] : []));
  return { rigs, descents, verdict, weakestRigIndices };
}

/**
 * The worst cell as planned: the highest step class, then the smallest margin to the hot line.
 * @param cells one descent's cells
 * @returns rig index of the worst
 * @example worstCell(cells) // 2
 */
export function worstCell(cells: readonly ConvoyCell[]): number {
  const rank = (c: ConvoyCell) => STEP_CLASSES.indexOf(c.asPlanned.worstClass);
  let worst = cells[0]!;
  for (const c of cells) {
    const better = rank(c) > rank(worst) || (rank(c) === rank(worst) && c.asPlanned.marginToHotK < worst.asPlanned.marginToHotK);
    if (better) worst = c;
  }
  return worst.rigIndex;
}
