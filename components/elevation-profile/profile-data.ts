/**
 * Pure data for the elevation profile: chart points in display units, the grade of each drawn stretch, the
 * value under a cursor, colour stops along x, nice axis ticks and the text alternative. No React, no recharts.
 */
import type { RouteView } from "@/lib/route";
import { formatDistance, formatElevation, formatGrade, toDistanceUnit, toElevationUnit, type UnitSystem } from "@/lib/units";
import { stepIndexAt } from "@/components/route-map/geometry";
import type { RouteColouring } from "@/components/route-map/grade-colours";

/** The view's profile. */
export type RouteViewProfile = RouteView["profile"];

/** One chart point: distance and elevation in display units (km or mi; m or ft). */
export interface ChartPoint {
  x: number;
  y: number;
}

/** The profile in display units, for recharts. */
export function chartPoints(profile: RouteViewProfile, system: UnitSystem): ChartPoint[] {
  return profile.distanceM.map((d, i) => ({ x: toDistanceUnit(d, system), y: toElevationUnit(profile.elevationM[i]!, system) }));
}

/** Shortest run over which a stretch's grade is measured, m. */
export const GRADE_WINDOW_M = 100;

/**
 * The grade of each drawn stretch, sample i to i+1 (rise over run, dimensionless; the last repeats). It is
 * the mean grade over the stretch widened to at least {@link GRADE_WINDOW_M} around its middle, never across a
 * gap between segments. Why widen: the view rounds elevations to 0.1 m, which over a 10 m stretch is ±1 % of
 * grade noise and would make colours flicker at a class boundary; over 100 m it is ±0.1 %. It is the mean
 * slope the eye sees between the drawn points, like the map's per-vertex grades.
 * @param profile the view's profile
 * @param gapsM distances of gaps between segments (the view line's distances where `gapAfter` is 1)
 */
export function stretchGrades(profile: RouteViewProfile, gapsM: readonly number[] = []): number[] {
  const { distanceM: d, elevationM: e } = profile;
  const n = d.length;
  if (n < 2) return n === 1 ? [0] : [];
  const end = d[n - 1]!;
  const elevationAt = (x: number, side: "before" | "after") => {
    let i = stepIndexAt(d, x);
    // At a gap two samples share a distance; take the one on the stretch's own side.
    if (side === "before") while (i > 0 && d[i]! >= x && d[i - 1]! === d[i]!) i--;
    const a = d[i]!;
    const b = d[i + 1] ?? a;
    const t = b > a ? Math.min(1, Math.max(0, (x - a) / (b - a))) : side === "before" ? 0 : 1;
    return e[i]! + ((e[i + 1] ?? e[i]!) - e[i]!) * t;
  };
  const out: number[] = [];
  for (let i = 0; i < n - 1; i++) {
    const a = d[i]!;
    const b = d[i + 1]!;
    // A gap (two samples at one distance, or a gap inside a downsampled stretch) is not driven.
    if (!(b > a) || gapsM.some((g) => g > a && g < b)) {
      out.push(0);
      continue;
    }
    const mid = (a + b) / 2;
    let lo = Math.max(0, Math.min(a, mid - GRADE_WINDOW_M / 2));
    let hi = Math.min(end, Math.max(b, mid + GRADE_WINDOW_M / 2));
    for (const g of gapsM) {
      if (g <= a) lo = Math.max(lo, g);
      if (g >= b) hi = Math.min(hi, g);
    }
    out.push((elevationAt(hi, "before") - elevationAt(lo, "after")) / (hi - lo));
  }
  out.push(out.at(-1) ?? 0);
  return out;
}

/** The profile at a distance: elevation interpolated linearly, grade of the stretch it falls in. */
export interface ProfileReading {
  distanceM: number;
  elevationM: number;
  grade: number;
}

/**
 * Reads the profile at a distance (clamped to the route).
 * @param profile the view's profile
 * @param grades from {@link stretchGrades}
 * @param distanceM distance from the start, m
 */
export function profileAt(profile: RouteViewProfile, grades: readonly number[], distanceM: number): ProfileReading | null {
  const { distanceM: d, elevationM: e } = profile;
  if (d.length === 0 || !Number.isFinite(distanceM)) return null;
  const at = Math.min(Math.max(distanceM, d[0]!), d.at(-1)!);
  const i = stepIndexAt(d, at);
  const a = d[i]!;
  const b = d[i + 1] ?? a;
  const t = b > a ? (at - a) / (b - a) : 0;
  const e0 = e[i]!;
  return { distanceM: at, elevationM: e0 + ((e[i + 1] ?? e0) - e0) * t, grade: grades[i] ?? 0 };
}

/** A colour stop of the profile's horizontal gradient; `offset` is the fraction of the route length, 0…1. */
export interface GradientStop {
  offset: number;
  colour: string;
}

/**
 * Hard-edged gradient stops along x, one pair per run of equal colour, so the area and the line are coloured
 * stretch by stretch exactly like the map.
 * @param profile the view's profile
 * @param grades from {@link stretchGrades}
 * @param colouring the "colour by" rule
 */
export function gradientStops(profile: RouteViewProfile, grades: readonly number[], colouring: RouteColouring): GradientStop[] {
  const d = profile.distanceM;
  const total = d.at(-1) ?? 0;
  if (d.length < 2 || !(total > 0)) return [];
  const stops: GradientStop[] = [];
  let colour: string | null = null;
  for (let i = 0; i < d.length - 1; i++) {
    if (!(d[i + 1]! > d[i]!)) continue;
    const c = colouring.colourOf({ fromM: d[i]!, toM: d[i + 1]!, grade: grades[i] ?? 0 });
    if (c === colour) continue;
    const offset = d[i]! / total;
    if (colour !== null) stops.push({ offset, colour });
    stops.push({ offset, colour: c });
    colour = c;
  }
  if (colour !== null) stops.push({ offset: 1, colour });
  return stops;
}

/**
 * A "nice" axis: a step of 1, 2 or 5 × 10ⁿ and the domain rounded out to whole steps (Heckbert, "Nice numbers
 * for graph labels", Graphics Gems, 1990). By default the step is rounded up, so there are at most about
 * `maxTicks` ticks; with `nearest` it is Heckbert's nearest nice step, giving about `maxTicks` ticks.
 * @param min lowest value to show
 * @param max highest value to show
 * @param maxTicks wanted tick count, ≥ 2
 * @param nearest round the step to the nearest nice number instead of up
 */
export function niceScale(min: number, max: number, maxTicks = 5, nearest = false): { domain: [number, number]; ticks: number[]; step: number } {
  const span = max > min ? max - min : Math.max(Math.abs(min), 1);
  const raw = span / Math.max(1, maxTicks - 1);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const norm = raw / mag;
  const nice = nearest ? (norm < 1.5 ? 1 : norm < 3 ? 2 : norm < 7 ? 5 : 10) : norm <= 1 ? 1 : norm <= 2 ? 2 : norm <= 5 ? 5 : 10;
  const step = nice * mag;
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  const lo = Math.floor(min / step) * step;
  const hi = Math.max(Math.ceil(max / step) * step, lo + step);
  const ticks: number[] = [];
  for (let k = 0; lo + k * step <= hi + step * 1e-9; k++) ticks.push(Number((lo + k * step).toFixed(decimals)));
  return { domain: [Number(lo.toFixed(decimals)), Number(hi.toFixed(decimals))], ticks, step };
}

/** A grade in words, e.g. "8.1 % down", "level". */
export function gradeInWords(grade: number): string {
  if (Math.abs(grade) < 0.0005) return "level";
  return `${formatGrade(Math.abs(grade))} ${grade < 0 ? "down" : "up"}`;
}

/**
 * The profile's text alternative: length, ends, highest and lowest point, totals and every descent.
 * @param view the route view
 * @param system display units
 */
export function profileSummary(view: RouteView, system: UnitSystem): string {
  const { stats, profile, descents } = view;
  const dist = (m: number) => formatDistance(m, system);
  const elev = (m: number) => formatElevation(m, system);
  const first = profile.elevationM[0] ?? 0;
  const last = profile.elevationM.at(-1) ?? first;
  const parts = [
    `Elevation profile over ${dist(stats.lengthM)}: starts at ${elev(first)} and ends at ${elev(last)}.`,
    `Highest point ${elev(stats.highestM)} at ${dist(stats.highestAtM)}, lowest ${elev(stats.lowestM)} at ${dist(stats.lowestAtM)}.`,
    `${elev(stats.totalAscentM)} of climbing and ${elev(stats.totalDescentM)} of descent in total.`,
    descents.length === 0 ? "No descents long and steep enough to mark." : `${descents.length === 1 ? "One descent" : `${descents.length} descents`}:`,
    ...descents.map(
      (d, i) =>
        `descent ${i + 1} from ${dist(d.startDistanceM)} to ${dist(d.endDistanceM)}, ${elev(d.dropM)} down over ${dist(d.lengthM)}, ` +
        `${formatGrade(Math.abs(d.meanGrade))} on average, steepest 200 m at ${formatGrade(Math.abs(d.steepest200mGrade))}.`,
    ),
  ];
  return parts.join(" ");
}
