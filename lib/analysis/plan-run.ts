/**
 * One rig of a plan over the plan's route: the heat run as planned (summarised, with a sampled trace for the
 * map and the charts) and the advice for every descent that gets warm or worse, proven by re-running. Pure and
 * isomorphic: the server's worker runs it for stored results, and the same code can run in the browser.
 */

import { adviseWithBands, type RigAdvice } from "@/lib/advice";
import type { Region } from "@/lib/compliance";
import type { Descent, PlacedWaypoint, RouteProfile } from "@/lib/route";
import { prepareRoute, runPrepared, validateRouteProfile, type HeatRunOptions, type PreparedRoute, type Rig } from "@/lib/thermal";
import { summarizeAnalysis, type AnalysisResult } from "./analyze";

/** A plan rig's stored result (JSON-ready: NaN becomes null when stored). */
export interface PlanRigResult {
  /** The heat run as planned, with a sampled trace. */
  analysis: AnalysisResult;
  /** The advice and its proof. */
  advice: RigAdvice;
}

/**
 * Runs the model and the advice engine for one rig of a plan.
 * @param route the route, prepared once for every rig of the convoy
 * @param profile the same route's profile (for the summary's length)
 * @param descents the route's descents
 * @param waypoints the route's placed waypoints (names for stop places)
 * @param rig the rig
 * @param options the plan's conditions as model options
 * @param region the rig's region, for its trailer-brake rule (null: the mass ratings only)
 * @returns analysis and advice
 * @example runPlanRig(prepareRoute(profile), profile, descents, [], UTE_AND_CARAVAN, {}).advice.verdict
 */
export function runPlanRig(
  route: PreparedRoute,
  profile: RouteProfile,
  descents: readonly Descent[],
  waypoints: readonly PlacedWaypoint[],
  rig: Rig,
  options: HeatRunOptions,
  region: Region | null = null,
): PlanRigResult {
  const asPlanned = runPrepared(route, rig, options);
  const { advice, plannedBand } = adviseWithBands({ route, descents, rig, options, waypoints, asPlanned, region });
  const analysis = summarizeAnalysis(profile, descents, asPlanned, "sampled", plannedBand);
  return { analysis, advice };
}

/** A plan's rigs over its route: what the heat worker (or the seed, in-process) runs. */
export interface PlanJob {
  kind: "plan";
  profile: RouteProfile;
  descents: Descent[];
  waypoints: PlacedWaypoint[];
  /** `notes` are added to the member's result notes (where its calibrated factors came from). */
  members: { rig: Rig; options: HeatRunOptions; region?: Region | null; notes?: string[] }[];
}

/** Each member's result with the time it took, ms. */
export type PlanJobResults = { result: PlanRigResult; computedMs: number }[];

/**
 * Runs a plan job: the route is prepared once and shared by every rig.
 * @param job route, descents, waypoints and the rigs with their options
 * @returns one result per member, in order
 * @example runPlanJob({ kind: "plan", profile, descents, waypoints: [], members: [{ rig, options: {} }] })[0].result.advice.verdict
 */
export function runPlanJob(job: PlanJob): PlanJobResults {
  const route = prepareRoute(validateRouteProfile(job.profile), job.descents);
  return job.members.map((m) => {
    const started = performance.now();
    const result = runPlanRig(route, job.profile, job.descents, job.waypoints, m.rig, m.options, m.region ?? null);
    if (m.notes?.length) result.analysis.notes = [...result.analysis.notes, ...m.notes];
    return { result, computedMs: Math.round(performance.now() - started) };
  });
}
