import { renderDescentAdvice, type DescentAdvice, type PlannedStop, type RigAdvice, type Verdict } from "@/lib/advice";
import type { Descent, RouteProfile } from "@/lib/route";
import {
  peakBand,
  prepareRoute,
  runBand,
  runPrepared,
  STEP_CLASSES,
  summarizeDescents,
  validateRouteProfile,
  type BandParameter,
  type BandRange,
  type BandSettings,
  type BrakePositionSpec,
  type DescentSummary,
  type HeatBand,
  type HeatRunOptions,
  type HeatRunResult,
  type PositionSummary,
  type ResolvedModel,
  type Rig,
  type StepClass,
} from "@/lib/thermal";

/** How much of the heat trace an analysis carries. */
export type TraceDetail = "none" | "sampled" | "full";

/**
 * The heat trace as plain arrays (JSON-ready), per brake position in `positions` order. Temperatures are
 * capped at each position's validity ceiling (the class there is "runaway"), and so are the band edges.
 */
export interface AnalysisTrace {
  distanceM: number[];
  elevationM: number[];
  speedMs: number[];
  gear: number[];
  rotorC: number[][];
  brakePowerW: number[][];
  worstClass: StepClass[];
  /** The band of the heat trace (10th–90th percentile), per position, °C; absent when no band was run. */
  band?: { lowC: number[][]; highC: number[][] };
}

/** The band of a peak, °C, capped at the validity ceiling. */
export interface BandEdges {
  lowC: number;
  highC: number;
}

/**
 * What every reported peak carries: the peak, capped at the validity ceiling (`beyondValidity` true when the
 * model went at or past it: a bulk temperature there no longer describes a working brake, docs/model.md),
 * and its band when a band was run.
 */
export interface PeakReport {
  peakC: number;
  beyondValidity: boolean;
  band?: BandEdges;
}

/** A descent's position summary as reported (peak, end and margins from the capped peak). */
export type AnalysisPosition = PositionSummary & PeakReport;

/** How the band was made (lib/thermal/ensemble.ts). */
export interface AnalysisBand {
  members: number;
  stepM: number;
  percentiles: { low: number; high: number };
  ranges: Partial<Record<BandParameter, BandRange>>;
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
  peaks: ({ position: string; atM: number } & PeakReport)[];
  /** One summary per descent, with the descent it covers. */
  descents: (Omit<DescentSummary, "positions"> & { positions: AnalysisPosition[]; descent: Descent })[];
  trace: AnalysisTrace | null;
  /** How the bands were made; absent when no band was run. */
  band?: AnalysisBand;
}

const round = (x: number, d: number) => (Number.isFinite(x) ? Number(x.toFixed(d)) : x);

/** @private A temperature capped at a ceiling, rounded to 0.1 °C. */
const capped = (x: number, ceilingC: number) => round(x < ceilingC ? x : ceilingC, 1);

/** @private A peak as reported: capped at the ceiling, with its band. */
function peakReport(peakC: number, spec: BrakePositionSpec, band: { lowC: number; highC: number } | null): PeakReport {
  const ceiling = spec.validityCeilingC;
  return {
    peakC: capped(peakC, ceiling),
    beyondValidity: peakC >= ceiling,
    ...(band ? { band: { lowC: capped(band.lowC, ceiling), highC: capped(band.highC, ceiling) } } : {}),
  };
}

function traceOf(result: HeatRunResult, detail: TraceDetail, band: HeatBand | null, maxSamples = 2000): AnalysisTrace | null {
  if (detail === "none") return null;
  const t = result.trace;
  const ceilings = result.positions.map((p) => p.validityCeilingC);
  const step = detail === "full" ? 1 : Math.max(1, Math.ceil(t.length / maxSamples));
  const idx: number[] = [];
  for (let i = 0; i < t.length; i += step) idx.push(i);
  if (idx.at(-1) !== t.length - 1) idx.push(t.length - 1);
  return {
    distanceM: idx.map((i) => round(t.distanceM[i]!, 1)),
    elevationM: idx.map((i) => round(t.elevationM[i]!, 1)),
    speedMs: idx.map((i) => round(t.speedMs[i]!, 2)),
    gear: idx.map((i) => t.gear[i]!),
    rotorC: t.rotorC.map((column, j) => idx.map((i) => capped(column[i]!, ceilings[j]!))),
    brakePowerW: t.brakePowerW.map((column) => idx.map((i) => round(column[i]!, 0))),
    worstClass: idx.map((i) => STEP_CLASSES[t.worstClass[i]!]!),
    ...(band
      ? {
          band: {
            lowC: band.lowC.map((column, j) => idx.map((i) => capped(column[i]!, ceilings[j]!))),
            highC: band.highC.map((column, j) => idx.map((i) => capped(column[i]!, ceilings[j]!))),
          },
        }
      : {}),
  };
}

function peaksOf(result: HeatRunResult, band: HeatBand | null): AnalysisResult["peaks"] {
  return result.positions.map((p, k) => {
    const column = result.trace.rotorC[k]!;
    let at = 0;
    for (let i = 1; i < column.length; i++) if (column[i]! > column[at]!) at = i;
    return { position: p.position, ...peakReport(column[at]!, p, band ? peakBand(band, k) : null), atM: round(result.trace.distanceM[at]!, 1) };
  });
}

/** @private A descent's position summary as reported: capped peak and end, margins from the capped peak, band. */
function positionReport(s: PositionSummary, spec: BrakePositionSpec, band: { lowC: number; highC: number } | null): AnalysisPosition {
  const report = peakReport(s.peakC, spec, band);
  const ceiling = spec.validityCeilingC;
  return {
    ...s,
    ...report,
    endC: s.endC < ceiling ? s.endC : ceiling,
    marginToWarmK: spec.thresholds.warmC - report.peakC,
    marginToHotK: spec.thresholds.hotC - report.peakC,
  };
}

/**
 * Runs the brake-heat model for one rig over a route and summarises every descent.
 *
 * @param profile the route (lib/route), SI units
 * @param descents the descents lib/route found on it
 * @param rig the rig
 * @param options model overrides, cool-down stops, starting state (lib/thermal)
 * @param detail how much of the trace to keep: none, sampled (≤ 2000 samples) or full
 * @param band band settings (lib/thermal/ensemble.ts), or false for no band
 * @returns the analysis result, °C and SI units; every peak with its band
 * @example analyzeRoute(profile, descents, UTE_AND_CARAVAN).descents[0].positions[0].band.highC
 */
export function analyzeRoute(
  profile: RouteProfile,
  descents: readonly Descent[],
  rig: Rig,
  options: HeatRunOptions = {},
  detail: TraceDetail = "sampled",
  band: Partial<BandSettings> | false = {},
): AnalysisResult {
  const route = prepareRoute(validateRouteProfile(profile));
  const result = runPrepared(route, rig, options);
  return summarizeAnalysis(profile, descents, result, detail, band === false ? undefined : runBand(route, rig, options, band, result));
}

/**
 * The analysis result of a heat run already made (the plan runs reuse the run for the advice).
 * @param profile the route the run covered
 * @param descents its descents
 * @param result the heat run
 * @param detail how much of the trace to keep
 * @param band the band of this run (lib/thermal runBand), when one was made
 * @returns the analysis result
 * @example summarizeAnalysis(profile, descents, runHeatRun(profile, rig), "none").worstClass
 */
export function summarizeAnalysis(
  profile: RouteProfile,
  descents: readonly Descent[],
  result: HeatRunResult,
  detail: TraceDetail = "sampled",
  band?: HeatBand,
): AnalysisResult {
  const b = band ?? null;
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
    peaks: peaksOf(result, b),
    descents: summaries.map((s, i) => ({
      ...s,
      positions: s.positions.map((p, j) =>
        positionReport(p, result.positions[j]!, b ? peakBand(b, j, s.startM, s.endM) : null),
      ),
      descent: descents[i]!,
    })),
    trace: traceOf(result, detail, b),
    ...(b ? { band: { members: b.members, stepM: b.stepM, percentiles: b.percentiles, ranges: b.ranges } } : {}),
  };
}

/** A cool-down stop of the advice as reported. */
export interface AdviceStopReport {
  /** Where, m along the route. */
  atM: number;
  /** How long, s. */
  durationS: number;
  /** The place, in words (a waypoint's name, the crest, or a flat stretch). */
  place: string;
  /** The descent it belongs to (index into the route's descents). */
  descentIndex: number;
  /** From the descent's combined plan ("plan"), or from the stop advice when driving as planned ("as-planned"). */
  source: "plan" | "as-planned";
}

/** A rig's advice as the command line reports it (lib/advice RigAdvice, in short, with its text). */
export interface AdviceReport {
  verdict: Verdict;
  worstClass: RigAdvice["worstClass"];
  descents: {
    descentIndex: number;
    startM: number;
    endM: number;
    /** Below which line the proven plan keeps the brakes. */
    status: DescentAdvice["plan"]["status"];
    nothingIsEnough: boolean;
    plan: { gear: number | null; speedMs: number | null; stops: AdviceStopReport[] };
    /** Stops that would be enough when driving as planned, when the descent needs them. */
    asPlannedStops: AdviceStopReport[];
    /** The advice in words (metric): title, then the lines, then the standstill cautions. */
    title: string;
    lines: string[];
    cautions: string[];
  }[];
  /** Every cool-down stop of the advice, in route order. */
  stops: AdviceStopReport[];
}

/** @private */
function placeWords(p: PlannedStop["place"]): string {
  return p.kind === "waypoint" ? p.name : p.kind === "crest" ? "at the crest" : `on a flat stretch (${(p.grade * 100).toFixed(1)} %)`;
}

/**
 * A rig's advice in short, JSON-ready, with its text in metric units.
 * @param advice the rig's advice (lib/advice adviseRig)
 * @returns verdict, per-descent plan with its cool-down stops and lines, every stop
 * @example adviceReport(adviseRig({ route, descents, rig })).stops[0].durationS
 */
export function adviceReport(advice: RigAdvice): AdviceReport {
  const stop = (descentIndex: number, source: AdviceStopReport["source"]) => (s: PlannedStop): AdviceStopReport => ({
    atM: round(s.atM, 1),
    durationS: s.durationS,
    place: placeWords(s.place),
    descentIndex,
    source,
  });
  const descents = advice.descents.map((a) => {
    const text = renderDescentAdvice(a, "metric");
    return {
      descentIndex: a.descentIndex,
      startM: a.descent.startDistanceM,
      endM: a.descent.endDistanceM,
      status: a.plan.status,
      nothingIsEnough: a.nothingIsEnough,
      plan: {
        gear: a.plan.plan.gear ?? null,
        speedMs: a.plan.plan.speedMs ?? null,
        stops: a.plan.stops.map(stop(a.descentIndex, "plan")),
      },
      asPlannedStops: (a.stop?.stops ?? []).map(stop(a.descentIndex, "as-planned")),
      title: text.title,
      lines: text.lines,
      cautions: text.cautions,
    };
  });
  const stops = descents.flatMap((d) => [...d.plan.stops, ...d.asPlannedStops]).sort((x, y) => x.atM - y.atM);
  return { verdict: advice.verdict, worstClass: advice.worstClass, descents, stops };
}
