/**
 * The rows the heat chart draws (pure, so it can be tested without a browser): the trace in buckets of at most
 * {@link MAX_POINTS} samples, each position's maximum per bucket (so peaks never vanish), its band as the
 * bucket's lowest lower edge and highest upper edge, every temperature capped at the position's validity
 * ceiling (docs/model.md, "Validity ceiling"), and the y axis: it ends at the highest ceiling and never labels
 * a temperature at or past the lowest one.
 */

import { toDistanceUnit, type UnitSystem } from "@/lib/units";
import { lowerBound } from "./heat-colours";

/** A trace to draw: distances and rotor temperatures per position (°C). */
export interface ChartTrace {
  distanceM: ArrayLike<number>;
  rotorC: ArrayLike<number>[];
}

/** A band to draw: lower and upper edge per position and sample (°C), on the samples of its trace. */
export interface ChartBand {
  lowC: ArrayLike<number>[];
  highC: ArrayLike<number>[];
}

/**
 * One row of the chart. Keys per position k: `p{k}` the plan's temperature and `b{k}` its band ([low, high])
 * in the user's unit; `c{k}` and `e{k}` the same in °C for the tooltip; `w…` the what-if's (`w{k}`, `wb{k}`,
 * `wc{k}`, `we{k}`).
 */
export type ChartRow = { x: number } & Record<string, number | [number, number]>;

/** Most rows drawn. */
export const MAX_POINTS = 1200;

/** °C in the user's unit. */
export const toUserT = (c: number, system: UnitSystem) => (system === "metric" ? c : (c * 9) / 5 + 32);

const cap = (c: number, ceilingC: number) => (c < ceilingC ? c : ceilingC);

/** @private The maximum of a column over [a, b), capped. */
function maxOf(col: ArrayLike<number>, a: number, b: number, ceilingC: number): number {
  let m = -Infinity;
  for (let i = a; i < b; i++) m = Math.max(m, col[i] as number);
  return cap(m, ceilingC);
}
function minOf(col: ArrayLike<number>, a: number, b: number, ceilingC: number): number {
  let m = Infinity;
  for (let i = a; i < b; i++) m = Math.min(m, col[i] as number);
  return cap(m, ceilingC);
}

/** @private Puts one trace's bucket [a, b) into the row under a key prefix. */
function fill(row: ChartRow, prefix: "" | "w", trace: ChartTrace, band: ChartBand | null | undefined, a: number, b: number, ceilingsC: readonly number[], system: UnitSystem) {
  trace.rotorC.forEach((col, k) => {
    const ceiling = ceilingsC[k] ?? Infinity;
    const c = maxOf(col, a, b, ceiling);
    row[`${prefix}c${k}`] = c;
    row[prefix === "" ? `p${k}` : `w${k}`] = Math.round(toUserT(c, system));
    const low = band?.lowC[k];
    const high = band?.highC[k];
    if (low && high) {
      const lo = Math.min(minOf(low, a, b, ceiling), c);
      const hi = Math.max(maxOf(high, a, b, ceiling), c);
      row[`${prefix}e${k}`] = [lo, hi];
      row[`${prefix}b${k}`] = [Math.round(toUserT(lo, system)), Math.round(toUserT(hi, system))];
    }
  });
}


/**
 * The chart's rows.
 * @param trace the plan's trace
 * @param band the plan's band on the same samples, if run
 * @param whatIf a what-if's trace, if any (any sampling: it is bucketed on the plan's distances)
 * @param whatIfBand the what-if's band on the what-if's samples, once ready
 * @param ceilingsC each position's validity ceiling, °C
 * @param system unit system
 * @returns the rows, in distance order
 * @example chartRows(trace, trace.band, null, null, [600, 590, 590], "metric")[0].p0
 */
export function chartRows(trace: ChartTrace, band: ChartBand | null | undefined, whatIf: ChartTrace | null | undefined, whatIfBand: ChartBand | null | undefined, ceilingsC: readonly number[], system: UnitSystem): ChartRow[] {
  const n = trace.distanceM.length;
  const step = Math.max(1, Math.ceil(n / MAX_POINTS));
  const out: ChartRow[] = [];
  const wn = whatIf?.distanceM.length ?? 0;
  for (let a = 0; a < n; a += step) {
    const b = Math.min(n, a + step);
    const row: ChartRow = { x: toDistanceUnit(trace.distanceM[a] as number, system) };
    fill(row, "", trace, band, a, b, ceilingsC, system);
    if (whatIf && wn > 0) {
      // The what-if samples from this bucket's start to its end (at least the one just before, on a coarse trace).
      const fromM = trace.distanceM[a] as number;
      const toM = trace.distanceM[b - 1] as number;
      let wa = lowerBound(whatIf.distanceM, fromM);
      let wb = lowerBound(whatIf.distanceM, toM + 1e-9);
      if (wb <= wa) (wa = Math.max(0, Math.min(wa, wn - 1))), (wb = wa + 1);
      fill(row, "w", whatIf, whatIfBand, wa, Math.min(wb, wn), ceilingsC, system);
    }
    out.push(row);
  }
  return out;
}

/**
 * The temperature axis: from 0 (or below, on a freezing day) to the highest ceiling, ticks every 100 °C or
 * 200 °F strictly below the lowest ceiling, so no tick prints a temperature Fadeline cannot vouch for.
 * @param rows the chart's rows
 * @param ceilingsC each position's validity ceiling, °C
 * @param system unit system
 * @returns the domain and the ticks, in the user's unit
 * @example yAxis(rows, [600, 590], "metric") // { domain: [0, 600], ticks: [0, 100, 200, 300, 400, 500] }
 */
export function yAxis(rows: readonly ChartRow[], ceilingsC: readonly number[], system: UnitSystem): { domain: [number, number]; ticks: number[]; lowestCeiling: number } {
  const finite = ceilingsC.filter(Number.isFinite);
  const top = Math.round(toUserT(finite.length ? Math.max(...finite) : 600, system));
  const lowestCeiling = Math.round(toUserT(finite.length ? Math.min(...finite) : 600, system));
  const step = system === "metric" ? 100 : 200;
  let min = 0;
  for (const r of rows) for (const [key, v] of Object.entries(r)) if (key !== "x" && /^(p|w)\d+$/.test(key) && typeof v === "number") min = Math.min(min, v);
  const bottom = Math.floor(min / step) * step;
  const ticks: number[] = [];
  for (let t = bottom; t < lowestCeiling; t += step) ticks.push(t);
  return { domain: [bottom, top], ticks, lowestCeiling };
}
