/**
 * Calibration of a rig from infrared readings (docs/model.md §11), as the app uses it: the fit as a worker job
 * (lib/thermal calibrate, with every reading referred to by its index), and a stored calibration applied to a
 * heat run as the model parameters `coolingFactor` and `engineBrakingScale`. Pure and isomorphic.
 */

import type { StoredCalibration } from "@/lib/validation/calibration";
import { calibrate, prepareRoute, validateRouteProfile, type BrakeReading, type CalibratedParameter, type HeatRunOptions, type Rig } from "@/lib/thermal";
import type { RouteProfile } from "@/lib/route";
import type { CalibrationUse } from "./calibration-note";

export { calibrationNote, type CalibrationUse } from "./calibration-note";

/** A calibration the heat worker runs: the route's stored profile, the rig, the readings and the run's options. */
export interface CalibrationJob {
  kind: "calibration";
  profile: RouteProfile;
  rig: Rig;
  readings: BrakeReading[];
  options: HeatRunOptions;
}

/** The fit with readings referred to by their index in the job's `readings`. */
export interface CalibrationJobResult {
  fitted: Record<CalibratedParameter, number>;
  fittedParameters: CalibratedParameter[];
  results: { reading: number; modelBeforeC: number; modelAfterC: number; residualK: number }[];
  flagged: { reading: number; reason: string; reachableC: { minC: number; maxC: number } | null }[];
  rmsBeforeK: number;
  rmsAfterK: number;
  notes: string[];
  runs: number;
}

/**
 * Runs the fit. lib/thermal keeps the order of the used readings and returns each flagged reading as the object
 * it was given, so both map back to their index here, before the result leaves the worker.
 * @param job the route, rig, readings and options
 * @returns the fit with readings by index
 * @throws {TypeError|RangeError} lib/thermal's messages on an invalid route, rig or reading
 * @example runCalibrationJob({ kind: "calibration", profile, rig, readings: [{ position: "front", atM: 40_000, tempC: 300 }], options: {} }).fitted
 */
export function runCalibrationJob(job: CalibrationJob): CalibrationJobResult {
  const route = prepareRoute(validateRouteProfile(job.profile));
  const fit = calibrate(route, job.rig, job.readings, job.options);
  const flagged = fit.flagged.map((f) => ({ reading: job.readings.indexOf(f.reading), reason: f.reason, reachableC: f.reachableC }));
  const out = new Set(flagged.map((f) => f.reading));
  const usedIndices = job.readings.map((_, i) => i).filter((i) => !out.has(i));
  const results = fit.readings.map((r, k) => ({ reading: usedIndices[k]!, modelBeforeC: r.modelBeforeC, modelAfterC: r.modelAfterC, residualK: r.residualK }));
  return { fitted: fit.fitted, fittedParameters: fit.fittedParameters, results, flagged, rmsBeforeK: fit.rmsBeforeK, rmsAfterK: fit.rmsAfterK, notes: fit.notes, runs: fit.runs };
}

/**
 * The heat-run options with a stored calibration applied: each fitted factor becomes a model parameter, under
 * any parameter the options already set (a what-if or an explicit override wins). Without a calibration the
 * options are returned as they are.
 * @param options the run's options
 * @param calibration the rig's stored calibration, or null
 * @returns options for lib/thermal
 * @example withCalibration({}, calibration).params.coolingFactor
 */
export function withCalibration(options: HeatRunOptions, calibration: StoredCalibration | null): HeatRunOptions {
  if (!calibration) return options;
  const fitted: Partial<Record<CalibratedParameter, number>> = {};
  for (const k of calibration.fittedParameters) fitted[k] = calibration.fitted[k];
  return { ...options, params: { ...fitted, ...options.params } };
}

/**
 * Which fitted factors a run with these options takes from the calibration (an option set before
 * {@link withCalibration} overrides it), or null when it takes none.
 */
export function calibrationUse(options: HeatRunOptions, calibration: StoredCalibration | null): CalibrationUse | null {
  if (!calibration) return null;
  const applied: Partial<Record<CalibratedParameter, number>> = {};
  const params = (options.params ?? {}) as Record<string, unknown>;
  for (const k of calibration.fittedParameters) if (params[k] === undefined) applied[k] = calibration.fitted[k];
  if (Object.keys(applied).length === 0) return null;
  return { fittedAt: calibration.fittedAt, readings: calibration.readings.length, usedReadings: calibration.results.length, applied };
}

