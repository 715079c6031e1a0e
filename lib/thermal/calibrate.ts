/**
 * Calibration from brake readings: a driver measures the brakes with an infrared thermometer at a stop, and
 * the rig's cooling factor and engine-braking scale are fitted to those readings by least squares on
 * temperature (docs/model.md, "Calibration"). Each model evaluation is one heat run over the route up to the
 * last reading, with the stops the readings imply (the rig stopped there: a reading "at once" is a 1 s stop, a
 * reading taken minutes after stopping is that long a stop, cooled with the standstill model of standstill.ts).
 *
 * The fit is a bounded search in log space: a coarse grid over both factors (which also tells, per reading,
 * the temperatures the model can reach there at all), then Levenberg–Marquardt steps from the best grid point
 * (K. Levenberg, Q. Appl. Math. 2 (1944) 164–168; D. W. Marquardt, J. SIAM 11 (1963) 431–441) with
 * finite-difference derivatives. A reading no parameter set in the ranges can explain is flagged and left
 * out of the fit. With one usable reading the two factors cannot both be identified: the cooling factor alone
 * is fitted, the engine-braking scale kept, and a note says so.
 */

import { nearestIndex } from "./nearest-index";
import type { CoolDownStop, HeatRunOptions, HeatRunResult } from "./heat-run";
import { runPrepared } from "./heat-run";
import type { PreparedRoute } from "./prepare-route";
import type { BrakePosition } from "./resolve";
import type { Rig } from "./rig";
import { sliceRoute } from "./route-pieces";
import { coolBrakeAtStandstill } from "./standstill";

/** One infrared reading taken at a stop. */
export interface BrakeReading {
  /** Which brake. */
  position: BrakePosition;
  /** Where on the route, m. */
  atM: number;
  /** Temperature read, °C. */
  tempC: number;
  /** Minutes after stopping when it was read (0 = at once; default 0). */
  minutesAfterStop?: number;
}

/** A reading with the model's value before and after the fit. */
export interface CalibratedReading extends BrakeReading {
  /** Model temperature at the reading with the run's own parameters, °C. */
  modelBeforeC: number;
  /** Model temperature at the reading with the fitted factors, °C. */
  modelAfterC: number;
  /** Reading minus model after the fit, K. */
  residualK: number;
}

/** A reading left out of the fit, with the reason in plain words. */
export interface FlaggedReading {
  /** The reading. */
  reading: BrakeReading;
  /** Why it was left out. */
  reason: string;
  /** What the model can reach at the reading over the whole grid, °C (null when not evaluated). */
  reachableC: { minC: number; maxC: number } | null;
}

/** Settings of a calibration. */
export interface CalibrationSettings {
  /** Bounds of the cooling factor and the engine-braking scale (both > 0). */
  coolingRange: readonly [number, number];
  engineRange: readonly [number, number];
  /** Grid points per factor (≥ 2), spaced evenly in log. */
  gridPoints: number;
  /** A reading further than this outside what the grid reaches at its place is flagged, K. */
  toleranceK: number;
  /** A reading further than this below the ambient air temperature is flagged, K. */
  belowAmbientK: number;
  /** Most heat runs of the local refinement. */
  maxRefineRuns: number;
}

/**
 * Default settings [E]. Factors 0.3–3: wide enough for any rig we model (docs/model.md, "Calibration").
 * Tolerance 25 K: about the spread of an infrared reading on a brake (spot, emissivity of a worn surface,
 * the time to walk round the rig). 5 K below the air: a handheld thermometer's stated accuracy is about
 * ±2 K, and a brake cannot be cooler than the air around it.
 */
export const DEFAULT_CALIBRATION_SETTINGS: Readonly<CalibrationSettings> = {
  coolingRange: [0.3, 3],
  engineRange: [0.3, 3],
  gridPoints: 5,
  toleranceK: 25,
  belowAmbientK: 5,
  maxRefineRuns: 45,
};

/** The parameters a calibration fits. */
export type CalibratedParameter = "coolingFactor" | "engineBrakingScale";

/** The result of a calibration. */
export interface CalibrationResult {
  /** The fitted factors (the engine-braking scale is the run's own when only cooling was fitted). */
  fitted: Record<CalibratedParameter, number>;
  /** Which factors were fitted. */
  fittedParameters: CalibratedParameter[];
  /** The readings used in the fit, with model before, after and residual. */
  readings: CalibratedReading[];
  /** The readings left out, with reasons, in the order given. */
  flagged: FlaggedReading[];
  /** Root-mean-square of reading − model over the used readings, before and after the fit, K. */
  rmsBeforeK: number;
  rmsAfterK: number;
  /** Heat runs made. */
  runs: number;
  /** What was done, in plain words. */
  notes: string[];
}

/** @private A reading placed on the route. */
interface Placed {
  reading: BrakeReading;
  sample: number;
  position: number;
  standS: number;
}

/**
 * Fit a rig's cooling factor and engine-braking scale to brake readings.
 * @param route the prepared route the readings were taken on
 * @param rig the rig
 * @param readings readings (any order)
 * @param options the run's own options (conditions, stops, controls); the fit overrides the two factors
 * @param settings search settings
 * @returns fitted factors, readings with model values, flagged readings, RMS before and after
 * @throws {RangeError} with no readings, or a reading that is not a number
 * @example calibrate(route, rig, [{ position: "front", atM: 12_500, tempC: 240 }]).fitted.coolingFactor
 */
export function calibrate(
  route: PreparedRoute,
  rig: Rig,
  readings: readonly BrakeReading[],
  options: HeatRunOptions = {},
  settings: Partial<CalibrationSettings> = {},
): CalibrationResult {
  const s: CalibrationSettings = { ...DEFAULT_CALIBRATION_SETTINGS, ...settings };
  if (readings.length === 0) throw new RangeError("calibration needs at least one reading");
  readings.forEach((r, i) => {
    if (!Number.isFinite(r.atM)) throw new RangeError(`readings[${i}].atM must be a finite number`);
    if (!Number.isFinite(r.tempC)) throw new RangeError(`readings[${i}].tempC must be a finite number`);
    const min = r.minutesAfterStop ?? 0;
    if (!(Number.isFinite(min) && min >= 0)) throw new RangeError(`readings[${i}].minutesAfterStop must be 0 or more`);
  });
  if (!(s.coolingRange[0] > 0 && s.coolingRange[1] > s.coolingRange[0] && s.engineRange[0] > 0 && s.engineRange[1] > s.engineRange[0])) {
    throw new RangeError("calibration ranges must be positive and increasing");
  }
  // Validates the rig and options and resolves the run's own parameters (a two-sample run costs nothing).
  const before = runPrepared(route.n > 2 ? sliceRoute(route, 0, 1) : route, rig, { ...options, stops: [], controls: [] });
  const base = { coolingFactor: before.model.params.coolingFactor, engineBrakingScale: before.model.params.engineBrakingScale };
  const ambientC = before.model.params.ambientC;
  const d = route.profile.distanceM;
  const lengthM = d[route.n - 1] as number;
  const flagged: FlaggedReading[] = [];
  const placed: Placed[] = [];
  for (const reading of readings) {
    const position = before.positions.findIndex((p) => p.position === reading.position);
    if (position < 0) flagged.push({ reading, reason: `the rig has no ${reading.position} brakes`, reachableC: null });
    else if (reading.atM < (d[0] as number) || reading.atM > lengthM) {
      flagged.push({ reading, reason: `outside the route (0–${(lengthM / 1000).toFixed(1)} km)`, reachableC: null });
    } else if (reading.tempC < ambientC - s.belowAmbientK) {
      flagged.push({ reading, reason: `cooler than the air (${ambientC} °C): a brake cannot be; check the reading or the ambient temperature`, reachableC: null });
    } else {
      placed.push({ reading, sample: nearestIndex(d, reading.atM), position, standS: 60 * (reading.minutesAfterStop ?? 0) });
    }
  }
  let runs = 1;
  // The route up to the last reading, with the stops the readings imply (longest stand per place).
  const last = placed.reduce((m, p) => Math.max(m, p.sample), 0);
  const piece = last >= 1 && last < route.n - 1 ? sliceRoute(route, 0, last) : route;
  const standBySample = new Map<number, number>();
  for (const p of placed) standBySample.set(p.sample, Math.max(standBySample.get(p.sample) ?? 0, p.standS));
  const readingStops: CoolDownStop[] = [...standBySample].map(([k, standS]) => ({ atM: d[k] as number, durationS: Math.max(1, standS) }));
  const pieceEnd = piece.profile.distanceM[piece.n - 1] as number;
  const userStops = (options.stops ?? []).filter((st) => st.atM <= pieceEnd);
  const cache = new Map<string, number[]>();
  const modelAt = (c: number, e: number): number[] => {
    const key = `${c}|${e}`;
    const hit = cache.get(key);
    if (hit) return hit;
    const result = runPrepared(piece, rig, {
      ...options,
      params: { ...options.params, coolingFactor: c, engineBrakingScale: e },
      stops: [...userStops, ...readingStops],
    });
    runs++;
    const out = placed.map((p) => readingValue(result, p, ambientC));
    cache.set(key, out);
    return out;
  };
  // Model values before: the run's own parameters, with the readings' stops.
  const beforeValues = placed.length > 0 ? modelAt(base.coolingFactor, base.engineBrakingScale) : [];
  // The grid: what each reading can be at all, and a start for the refinement.
  const logC = logGrid(s.coolingRange, s.gridPoints);
  const logE = logGrid(s.engineRange, s.gridPoints);
  const grid: { x: [number, number]; values: number[] }[] = [];
  if (placed.length > 0) for (const a of logC) for (const b of logE) grid.push({ x: [a, b], values: modelAt(Math.exp(a), Math.exp(b)) });
  const used: number[] = [];
  placed.forEach((p, i) => {
    let minC = Infinity;
    let maxC = -Infinity;
    for (const g of grid) {
      const v = g.values[i] as number;
      if (v < minC) minC = v;
      if (v > maxC) maxC = v;
    }
    const t = p.reading.tempC;
    if (t > maxC + s.toleranceK) {
      flagged.push({ reading: p.reading, reason: `hotter than any heat run in the allowed ranges reaches there (at most ${Math.round(maxC)} °C)`, reachableC: { minC, maxC } });
    } else if (t < minC - s.toleranceK) {
      flagged.push({ reading: p.reading, reason: `cooler than any heat run in the allowed ranges reaches there (at least ${Math.round(minC)} °C)`, reachableC: { minC, maxC } });
    } else used.push(i);
  });
  const notes: string[] = [];
  const fittedParameters: CalibratedParameter[] = used.length >= 2 ? ["coolingFactor", "engineBrakingScale"] : used.length === 1 ? ["coolingFactor"] : [];
  let fitted = { ...base };
  if (used.length > 0) {
    const target = used.map((i) => placed[i]!.reading.tempC);
    const residuals = (x: readonly number[]): number[] => {
      const c = Math.exp(x[0] as number);
      const e = used.length >= 2 ? Math.exp(x[1] as number) : base.engineBrakingScale;
      const v = modelAt(c, e);
      return used.map((i, q) => (v[i] as number) - (target[q] as number));
    };
    const bounds: [number, number][] = [
      [Math.log(s.coolingRange[0]), Math.log(s.coolingRange[1])],
      [Math.log(s.engineRange[0]), Math.log(s.engineRange[1])],
    ];
    let start: number[];
    if (used.length >= 2) {
      start = bestOf(grid.map((g) => g.x), (x) => residuals(x));
    } else {
      notes.push("One usable reading: the cooling factor alone is fitted; the engine-braking scale is kept (both cannot be told apart from one reading).");
      start = bestOf(logC.map((a) => [a]), (x) => residuals(x));
    }
    const dims = used.length >= 2 ? 2 : 1;
    const x = levenbergMarquardt(residuals, start, bounds.slice(0, dims), () => runs < 1 + s.gridPoints ** 2 + 1 + s.maxRefineRuns);
    fitted = { coolingFactor: Math.exp(x[0] as number), engineBrakingScale: dims === 2 ? Math.exp(x[1] as number) : base.engineBrakingScale };
    for (const [k, [lo, hi]] of [["coolingFactor", s.coolingRange], ["engineBrakingScale", s.engineRange]] as const) {
      if (fittedParameters.includes(k) && (fitted[k] <= lo * 1.001 || fitted[k] >= hi * 0.999)) {
        notes.push(`The fitted ${k === "coolingFactor" ? "cooling factor" : "engine-braking scale"} is at the edge of its range (${lo}–${hi}): the readings ask for more than the model allows.`);
      }
    }
  } else {
    notes.push("No usable reading: nothing was fitted.");
  }
  const afterValues = used.length > 0 ? modelAt(fitted.coolingFactor, fitted.engineBrakingScale) : [];
  const out: CalibratedReading[] = used.map((i) => {
    const p = placed[i]!;
    const after = afterValues[i] as number;
    return { ...p.reading, modelBeforeC: beforeValues[i] as number, modelAfterC: after, residualK: p.reading.tempC - after };
  });
  const rms = (key: "modelBeforeC" | "modelAfterC") =>
    out.length ? Math.sqrt(out.reduce((a, r) => a + (r.tempC - r[key]) ** 2, 0) / out.length) : Number.NaN;
  const order = new Map(readings.map((r, i) => [r, i]));
  flagged.sort((a, b) => (order.get(a.reading) ?? 0) - (order.get(b.reading) ?? 0));
  if (flagged.length > 0) notes.push(`${flagged.length} reading${flagged.length > 1 ? "s" : ""} left out of the fit (see flagged).`);
  return { fitted, fittedParameters, readings: out, flagged, rmsBeforeK: rms("modelBeforeC"), rmsAfterK: rms("modelAfterC"), runs, notes };
}

/** @private The model's value at a reading: the arrival temperature, cooled at standstill for its minutes. */
function readingValue(result: HeatRunResult, p: Placed, ambientC: number): number {
  const arrival = (result.trace.rotorC[p.position] as Float64Array)[p.sample] as number;
  if (p.standS <= 0) return arrival;
  return coolBrakeAtStandstill(result.positions[p.position]!, arrival, ambientC, p.standS);
}

/** @private `count` logs evenly spaced from log(lo) to log(hi). */
function logGrid([lo, hi]: readonly [number, number], count: number): number[] {
  const n = Math.max(2, Math.round(count));
  return Array.from({ length: n }, (_, k) => Math.log(lo) + ((Math.log(hi) - Math.log(lo)) * k) / (n - 1));
}

/** @private The point with the least sum of squares. */
function bestOf(points: number[][], residuals: (x: readonly number[]) => number[]): number[] {
  let best = points[0]!;
  let bestS = Infinity;
  for (const p of points) {
    const sse = sumSq(residuals(p));
    if (sse < bestS) (bestS = sse), (best = p);
  }
  return [...best];
}

/** @private */
function sumSq(r: readonly number[]): number {
  let s = 0;
  for (const v of r) s += v * v;
  return s;
}

/**
 * @private Bounded Levenberg–Marquardt in 1 or 2 dimensions with forward-difference derivatives; stops when a
 * step is below 1e-5 (log units), after 40 iterations, or when `more()` says the run budget is spent.
 */
function levenbergMarquardt(
  residuals: (x: readonly number[]) => number[],
  start: number[],
  bounds: [number, number][],
  more: () => boolean,
): number[] {
  const clamp = (x: number[]) => x.map((v, k) => Math.min(bounds[k]![1], Math.max(bounds[k]![0], v)));
  let x = clamp(start);
  let r = residuals(x);
  let sse = sumSq(r);
  let lambda = 1e-2;
  const h = 1e-4;
  for (let iter = 0; iter < 40 && sse > 0 && more(); iter++) {
    // Forward differences, stepping inward at an upper bound.
    const J = x.map((v, k) => {
      const step = v + h > bounds[k]![1] ? -h : h;
      const xs = [...x];
      xs[k] = v + step;
      const rs = residuals(xs);
      return rs.map((ri, q) => (ri - (r[q] as number)) / step);
    });
    const dims = x.length;
    const g = J.map((col) => col.reduce((a, v, q) => a + v * (r[q] as number), 0));
    const A = J.map((ci) => J.map((cj) => ci.reduce((a, v, q) => a + v * (cj[q] as number), 0)));
    let accepted = false;
    for (let tries = 0; tries < 8 && more(); tries++) {
      const M = A.map((row, i) => row.map((v, j) => (i === j ? v * (1 + lambda) + 1e-12 : v)));
      const delta = dims === 1 ? [-(g[0] as number) / M[0]![0]!] : solve2(M, g.map((v) => -v));
      const next = clamp(x.map((v, k) => v + (delta[k] as number)));
      const rn = residuals(next);
      const sn = sumSq(rn);
      if (sn < sse) {
        const moved = Math.max(...next.map((v, k) => Math.abs(v - (x[k] as number))));
        x = next;
        r = rn;
        sse = sn;
        lambda = Math.max(lambda / 3, 1e-9);
        accepted = true;
        if (moved < 1e-5) return x;
        break;
      }
      lambda *= 4;
    }
    if (!accepted) break;
  }
  return x;
}

/** @private Solve a 2×2 system. */
function solve2(M: number[][], b: number[]): number[] {
  const [a, c] = M[0] as [number, number];
  const [d, e] = M[1] as [number, number];
  const det = a * e - c * d;
  if (det === 0) return [0, 0];
  return [((b[0] as number) * e - c * (b[1] as number)) / det, (a * (b[1] as number) - d * (b[0] as number)) / det];
}
