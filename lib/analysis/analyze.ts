import type { Descent, RouteProfile } from "@/lib/route";
import {
  runHeatRun,
  STEP_CLASSES,
  summarizeDescents,
  type BrakePositionSpec,
  type DescentSummary,
  type HeatRunOptions,
  type HeatRunResult,
  type ResolvedModel,
  type Rig,
  type StepClass,
} from "@/lib/thermal";

/** How much of the heat trace an analysis carries. */
export type TraceDetail = "none" | "sampled" | "full";

/** The heat trace as plain arrays (JSON-ready), per brake position in `positions` order. */
export interface AnalysisTrace {
  distanceM: number[];
  elevationM: number[];
  speedMs: number[];
  gear: number[];
  rotorC: number[][];
  brakePowerW: number[][];
  worstClass: StepClass[];
}

/**
 * One heat run as the API, the command line and the UI exchange it (the "analysis result" JSON schema of the
 * README). Units are SI, temperatures in °C.
 */
export interface AnalysisResult {
  modelVersion: string;
  model: ResolvedModel;
  positions: BrakePositionSpec[];
  notes: string[];
  route: { lengthM: number; descentCount: number };
  /** Worst step class over the whole route. */
  worstClass: StepClass;
  /** Peak per position over the whole route. */
  peaks: { position: string; peakC: number; atM: number }[];
  /** One summary per descent, with the descent it covers. */
  descents: (DescentSummary & { descent: Descent })[];
  trace: AnalysisTrace | null;
}

const round = (x: number, d: number) => (Number.isFinite(x) ? Number(x.toFixed(d)) : x);

function traceOf(result: HeatRunResult, detail: TraceDetail, maxSamples = 2000): AnalysisTrace | null {
  if (detail === "none") return null;
  const t = result.trace;
  const step = detail === "full" ? 1 : Math.max(1, Math.ceil(t.length / maxSamples));
  const idx: number[] = [];
  for (let i = 0; i < t.length; i += step) idx.push(i);
  if (idx.at(-1) !== t.length - 1) idx.push(t.length - 1);
  return {
    distanceM: idx.map((i) => round(t.distanceM[i]!, 1)),
    elevationM: idx.map((i) => round(t.elevationM[i]!, 1)),
    speedMs: idx.map((i) => round(t.speedMs[i]!, 2)),
    gear: idx.map((i) => t.gear[i]!),
    rotorC: t.rotorC.map((column) => idx.map((i) => round(column[i]!, 1))),
    brakePowerW: t.brakePowerW.map((column) => idx.map((i) => round(column[i]!, 0))),
    worstClass: idx.map((i) => STEP_CLASSES[t.worstClass[i]!]!),
  };
}

function peaksOf(result: HeatRunResult): AnalysisResult["peaks"] {
  return result.positions.map((p, k) => {
    const column = result.trace.rotorC[k]!;
    let at = 0;
    for (let i = 1; i < column.length; i++) if (column[i]! > column[at]!) at = i;
    return { position: p.position, peakC: round(column[at]!, 1), atM: round(result.trace.distanceM[at]!, 1) };
  });
}

/**
 * Runs the brake-heat model for one rig over a route and summarises every descent.
 *
 * @param profile the route (lib/route), SI units
 * @param descents the descents lib/route found on it
 * @param rig the rig
 * @param options model overrides, cool-down stops, starting state (lib/thermal)
 * @param detail how much of the trace to keep: none, sampled (≤ 2000 samples) or full
 * @returns the analysis result, °C and SI units
 * @example analyzeRoute(profile, descents, UTE_AND_CARAVAN).descents[0].positions[0].peakC
 */
export function analyzeRoute(
  profile: RouteProfile,
  descents: readonly Descent[],
  rig: Rig,
  options: HeatRunOptions = {},
  detail: TraceDetail = "sampled",
): AnalysisResult {
  return summarizeAnalysis(profile, descents, runHeatRun(profile, rig, options), detail);
}

/**
 * The analysis result of a heat run already made (the plan runs reuse the run for the advice).
 * @param profile the route the run covered
 * @param descents its descents
 * @param result the heat run
 * @param detail how much of the trace to keep
 * @returns the analysis result
 * @example summarizeAnalysis(profile, descents, runHeatRun(profile, rig), "none").worstClass
 */
export function summarizeAnalysis(
  profile: RouteProfile,
  descents: readonly Descent[],
  result: HeatRunResult,
  detail: TraceDetail = "sampled",
): AnalysisResult {
  const summaries = descents.length ? summarizeDescents(result, descents.map((d) => ({ startM: d.startDistanceM, endM: d.endDistanceM }))) : [];
  let worst = 0;
  for (let i = 0; i < result.trace.length; i++) worst = Math.max(worst, result.trace.worstClass[i]!);
  return {
    modelVersion: result.modelVersion,
    model: result.model,
    positions: result.positions,
    notes: result.notes,
    route: { lengthM: profile.distanceM[profile.distanceM.length - 1] ?? 0, descentCount: descents.length },
    worstClass: STEP_CLASSES[worst]!,
    peaks: peaksOf(result),
    descents: summaries.map((s, i) => ({ ...s, descent: descents[i]! })),
    trace: traceOf(result, detail),
  };
}
