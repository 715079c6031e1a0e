import { segmentRanges } from "./segment-ranges";
import { steepestGrade } from "./steepest-grade";
import type { RouteProfile } from "./types";

/** One descent. Distances and elevations come from the profile (smoothed); grades are negative. */
export interface Descent {
  /**
   * Samples bracketing the descent: the last at or before its start and the first at or after its end
   * (its ends are interpolated between samples).
   */
  startIndex: number;
  endIndex: number;
  /** Distance along the route of the start and the end (rule 3 of {@link findDescents}), m. */
  startDistanceM: number;
  endDistanceM: number;
  /** Elevation of the top and the bottom, m. */
  startElevationM: number;
  endElevationM: number;
  /** Height lost, top minus bottom, m (positive). */
  dropM: number;
  /** Length along the route, m. */
  lengthM: number;
  /** Mean grade, −dropM / lengthM (dimensionless, negative). */
  meanGrade: number;
  /** Steepest mean grade over any 200 m inside the descent (its mean grade if shorter), negative. */
  steepest200mGrade: number;
  /** Steepest mean grade over any 1 km inside the descent (its mean grade if shorter), negative. */
  steepest1kmGrade: number;
}

/** Rules of {@link findDescents}. Lengths and heights in m, grades dimensionless. */
export interface FindDescentsOptions {
  /**
   * Least height lost, m. Default 50. [E] A 5–6 t rig loses about 2.5 MJ on 50 m, enough to take a drum
   * brake's bulk temperature up by some 100 K; a 1 km dip of about 60 m (a common short descent, and one the
   * smoothing rounds to a little under 60 m) is then a descent with its own held speed and advice.
   */
  minDropM?: number;
  /**
   * Least length, m. Default 250. [E] With the 50 m least drop this binds only on pitches steeper than
   * 20 % (50 m / 250 m), so any real road that loses 50 m counts however short it is (500 m at 20 %,
   * 400 m at 15 %; docs/model.md §4.2): for a heavy rig the height lost, not the length, is what heats the
   * brakes. What it still refuses is a "drop" shorter than the elevation smoothing's own footprint
   * (about ±2σ = 160 m at the default σ of 40 m, see smoothElevation), which on a recorded track is an
   * elevation artefact (a bridge, a tunnel, a cliff edge in an elevation model) rather than a road.
   */
  minLengthM?: number;
  /** Greatest rise above the lowest point so far that does not end the descent, m. Default 10. */
  maxRiseM?: number;
  /** Longest stretch without reaching a new low that does not end the descent, m. Default 300. */
  maxInterruptionM?: number;
  /**
   * A point is a new low only if it lies below the previous low by at least this grade times the
   * distance between them (dimensionless). Default 0.01 (1 %): gentler run-outs, where a heavy rig coasts
   * without braking, count as interruptions rather than as descent.
   */
  minGrade?: number;
  /**
   * Height band below the top and above the bottom that locates a descent's ends, m. Default 10.
   * [E] Above the residual noise of a smoothed recorded track (σ about 1.5 m, excursions about 3 m) and
   * outside most of the corner rounding (±2σ of the smoothing): with 3 or 5 m a 500 m pitch at 20 % read
   * 17–18 % on noisy tracks, with 10 m 18.6–21 % (tests/unit/route/descent-stability.test.ts).
   */
  endBandM?: number;
}

type Rules = Required<FindDescentsOptions>;

/** Floating-point slack for the thresholds, m: a drop built as exactly 60 m must count as 60 m. */
const EPS_M = 1e-9;

/**
 * Finds the descents of a profile: contiguous downhill sections, each inside one segment (never across a
 * gap). Rules, applied to the smoothed elevation:
 *
 * 1. From a top, follow the profile down, keeping the lowest point so far. A later point becomes the new
 *    low when it is at least `minGrade` × (distance from the old low) below it.
 * 2. The descent goes on through short interruptions: rises of at most `maxRiseM` above the low, and
 *    stretches of at most `maxInterruptionM` without a new low. A bigger rise or a longer stretch ends it
 *    at the last low.
 * 3. Its drop is its highest point (the top) minus its last low (the bottom). Its ends lie on the straight
 *    line through the points where it passes `endBandM` below the top and `endBandM` above the bottom
 *    (interpolated between samples), where that line reaches the top's and the bottom's height; never
 *    before the top or past the bottom. [E] Heights, not grades, place the ends: the smoothed grade near
 *    a rounded crest is small and noisy, so where it first exceeds 1 % moved by several hundred metres
 *    with GPS noise, while a 10 m band lies above the residual elevation noise (about ±3 m) and its
 *    crossing moves by tens of metres. Interpolated ends keep the mean grade independent of where the
 *    samples fall (5, 10 or 20 m steps). See docs/model.md §4.2.
 * 4. It counts when it drops at least `minDropM` over at least `minLengthM` (defaults: 50 m over at least
 *    250 m), so a short steep pitch counts (500 m at 20 %) while a long gentle slope does not (1 km at
 *    3 % loses only 30 m).
 *
 * @param profile from {@link buildRouteProfile}
 * @param options the rules' thresholds
 * @returns descents in route order
 * @example
 * findDescents(profile).map((d) => `${d.dropM.toFixed(0)} m over ${(d.lengthM / 1000).toFixed(1)} km`);
 */
export function findDescents(profile: RouteProfile, options: FindDescentsOptions = {}): Descent[] {
  const rules: Rules = {
    minDropM: options.minDropM ?? 50,
    minLengthM: options.minLengthM ?? 250,
    maxRiseM: options.maxRiseM ?? 10,
    maxInterruptionM: options.maxInterruptionM ?? 300,
    minGrade: options.minGrade ?? 0.01,
    endBandM: options.endBandM ?? 10,
  };
  if (!(rules.minDropM > 0) || !(rules.minLengthM > 0)) throw new RangeError("minDropM and minLengthM must be > 0");
  if (!(rules.maxRiseM >= 0) || !(rules.maxInterruptionM >= 0) || !(rules.minGrade >= 0)) {
    throw new RangeError("maxRiseM, maxInterruptionM and minGrade must be ≥ 0");
  }
  const out: Descent[] = [];
  for (const [a, b] of segmentRanges(profile.gapAfter)) scanSegment(profile, a, b, rules, out);
  return out;
}

function scanSegment(p: RouteProfile, a: number, b: number, rules: Rules, out: Descent[]): void {
  const e = p.elevationM;
  let i = a;
  while (i < b) {
    while (i < b && (e[i + 1] as number) >= (e[i] as number)) i++; // climb to a top
    if (i >= b) return;
    const low = followDown(p, i, b, rules);
    const span = locate(p, i, low, rules);
    if (span !== null && span.endDistanceM - span.startDistanceM >= rules.minLengthM - EPS_M) {
      out.push(describe(p, span, i, low));
    }
    i = Math.max(low, i + 1);
  }
}

/** Rules 1–2: the index of the last low reached from top `s` before an interruption ends the descent. */
function followDown(p: RouteProfile, s: number, b: number, rules: Rules): number {
  const e = p.elevationM;
  const d = p.distanceM;
  let low = s;
  for (let j = s + 1; j <= b; j++) {
    const below = (e[low] as number) - (e[j] as number);
    const run = (d[j] as number) - (d[low] as number);
    if (below >= rules.minGrade * run && below > 0) low = j;
    else if (-below > rules.maxRiseM || run > rules.maxInterruptionM) break;
  }
  return low;
}

/** Where a descent is and how much it loses: see rule 3 of {@link findDescents}. Distances in m. */
interface Span {
  startDistanceM: number;
  endDistanceM: number;
  topM: number;
  bottomM: number;
}

/** Distances closer than this to a sample are that sample's, m: exact constructions give exact ends. */
const SNAP_M = 1e-6;

/**
 * Rule 3: locates the descent from top-side sample `s` to its low by the heights `endBandM` below the top
 * and above the bottom, crossed between samples by linear interpolation, and extends the straight line
 * through those two crossings up to the top's and down to the bottom's height. Returns null when the top
 * is not `minDropM` above the bottom.
 */
function locate(p: RouteProfile, s: number, low: number, rules: Rules): Span | null {
  const e = p.elevationM;
  const d = p.distanceM;
  let top = s;
  for (let k = s + 1; k <= low; k++) if ((e[k] as number) > (e[top] as number)) top = k;
  const topM = e[top] as number;
  const bottomM = e[low] as number;
  const drop = topM - bottomM;
  if (!(drop >= rules.minDropM - EPS_M)) return null;
  // [E] The band never takes more than a quarter of the drop from each end, so a body is always left.
  const band = Math.min(rules.endBandM, drop / 4);
  const hi = topM - band;
  const lo = bottomM + band;
  // The last sample still in the top band, then the first one after it inside the bottom band: a dip of
  // noise back into the top band, or a spike of the low band, cannot move the ends far.
  let a = low;
  while (a > top && (e[a] as number) < hi) a--;
  let b = a + 1;
  while (b < low && (e[b] as number) > lo) b++;
  const xs = crossing(d, e, a, hi);
  const xe = crossing(d, e, b - 1, lo);
  // [E] The body's mean grade, not the grade near each end: measured over the whole body, GPS noise
  // barely moves it (a grade from one band alone wandered by up to 240 m on the noisy test road).
  const along = (xe - xs) / (hi - lo); // m of road per m of height
  return {
    startDistanceM: Math.max(d[top] as number, xs - band * along),
    endDistanceM: Math.min(d[low] as number, xe + band * along),
    topM,
    bottomM,
  };
}

/** Distance where elevation passes `level` between samples i and i + 1 (linear interpolation). */
function crossing(d: Float64Array, e: Float64Array, i: number, level: number): number {
  const e0 = e[i] as number;
  const e1 = e[i + 1] as number;
  const t = e0 === e1 ? 0 : Math.min(1, Math.max(0, (e0 - level) / (e0 - e1)));
  return (d[i] as number) + t * ((d[i + 1] as number) - (d[i] as number));
}

function describe(p: RouteProfile, span: Span, first: number, last: number): Descent {
  const d = p.distanceM;
  let startIndex = first;
  while (startIndex < last && (d[startIndex + 1] as number) <= span.startDistanceM + SNAP_M) startIndex++;
  let endIndex = last;
  while (endIndex > startIndex && (d[endIndex - 1] as number) >= span.endDistanceM - SNAP_M) endIndex--;
  const snap = (x: number, i: number) => (Math.abs((d[i] as number) - x) <= SNAP_M ? (d[i] as number) : x);
  const startDistanceM = snap(span.startDistanceM, startIndex);
  const endDistanceM = snap(span.endDistanceM, endIndex);
  const lengthM = endDistanceM - startDistanceM;
  const dropM = span.topM - span.bottomM;
  const meanGrade = -dropM / lengthM;
  // [E] A descent shorter than a window reads its mean grade there (interpolated ends, not the bracketing
  // samples), and no window reads gentler than the mean: the held speed never depends on sample placement.
  const steepest = (windowM: number) =>
    lengthM <= windowM ? meanGrade : Math.min(meanGrade, steepestGrade(d, p.elevationM, startIndex, endIndex, windowM));
  return {
    startIndex,
    endIndex,
    startDistanceM,
    endDistanceM,
    startElevationM: span.topM,
    endElevationM: span.bottomM,
    dropM,
    lengthM,
    meanGrade,
    steepest200mGrade: steepest(200),
    steepest1kmGrade: steepest(1000),
  };
}
