/**
 * What a heat run says about the calibration it used (docs/model.md §11). Kept apart from calibration.ts so the
 * rig page can word it without bundling the model.
 */

type CalibratedParameter = "coolingFactor" | "engineBrakingScale";

/** What a heat run reports about the calibration it used. */
export interface CalibrationUse {
  fittedAt: string;
  readings: number;
  usedReadings: number;
  /** The factors the run used (a factor overridden by the run's own options is not listed). */
  applied: Partial<Record<CalibratedParameter, number>>;
}

const FACTOR_NAMES: Record<CalibratedParameter, string> = { coolingFactor: "cooling factor", engineBrakingScale: "engine-braking scale" };

/**
 * The note a heat run carries when its factors came from a calibration.
 * @example calibrationNote(use) // "Cooling factor 0.82 and engine-braking scale 1.31 from the rig's calibration of 2026-12-04 (2 readings)."
 */
export function calibrationNote(use: CalibrationUse): string {
  const parts = (Object.entries(use.applied) as [CalibratedParameter, number][]).map(([k, v]) => `${FACTOR_NAMES[k]} ${v.toFixed(2)}`);
  const text = parts.join(" and ");
  const left = use.readings - use.usedReadings;
  const count = `${use.readings} reading${use.readings === 1 ? "" : "s"}${left > 0 ? `, ${left} left out of the fit` : ""}`;
  return `${text.charAt(0).toUpperCase()}${text.slice(1)} from the rig's calibration of ${use.fittedAt.slice(0, 10)} (${count}).`;
}
