/**
 * Uncertainty bands of a heat run: the 10th to 90th percentile of an ensemble of heat runs over the model's
 * uncertain parameters (docs/model.md, "Uncertainty bands"). Members run on a coarse copy of the route (about
 * 50 m steps, the advice engine's search step); each member's difference from a coarse nominal run is taken
 * per sample, and the percentiles of those differences are added to the fine nominal heat trace. The band
 * therefore always contains the nominal run (low ≤ nominal ≤ high), and it follows whatever the physics in
 * runPrepared does: members are ordinary heat runs with parameter overrides.
 *
 * Sampling is deterministic: a Latin hypercube (M. D. McKay, R. J. Beckman, W. J. Conover, "A Comparison of
 * Three Methods for Selecting Values of Input Variables in the Analysis of Output from a Computer Code",
 * Technometrics 21 (1979) 239–245) whose strata are ordered by the additive low-discrepancy sequence of
 * M. Roberts, "The Unreasonable Effectiveness of Quasirandom Sequences" (2018), so there is no seed to carry.
 */

import type { HeatRunOptions, HeatRunResult } from "./heat-run";
import { runPrepared } from "./heat-run";
import type { ModelParams, ModelParamsInput } from "./params";
import type { PreparedRoute } from "./prepare-route";
import type { Rig } from "./rig";
import { coarsenRoute } from "./route-pieces";

/** The uncertain parameters a band spans. */
export type BandParameter =
  | "coolingFactor"
  | "engineBrakingScale"
  | "frontShare"
  | "rotorPartition"
  | "trailerGain"
  | "brakeMassScale";

/**
 * The range of one uncertain parameter around the run's own (resolved) value: "scale" multiplies it by a
 * factor in [lo, hi]; "offset" adds an amount in [lo, hi]. Members are spread evenly over the range.
 */
export interface BandRange {
  kind: "scale" | "offset";
  lo: number;
  hi: number;
}

/**
 * Cooling factor × 0.5–1.5 [E]: published correlations for brake-rotor convection differ by about a factor of
 * two for the same rotor and speed (docs/model.md, "Cooling"), so ±50 % spans them.
 */
export const BAND_COOLING_FACTOR: Readonly<BandRange> = { kind: "scale", lo: 0.5, hi: 1.5 };

/**
 * Engine braking × 0.6–1.5 [E]: the motoring-loss model is a generic friction-mean-effective-pressure fit;
 * real engines, exhaust brakes and converter behaviour spread around it (docs/model.md, "Engine braking").
 */
export const BAND_ENGINE_BRAKING: Readonly<BandRange> = { kind: "scale", lo: 0.6, hi: 1.5 };

/**
 * Front share ± 0.07 around the resolved value [E]: the front/rear split of the service-brake work depends on
 * load, proportioning and pad wear; ±0.07 covers most of the 0.55–0.75 range of docs/model.md ("Heat split").
 */
export const BAND_FRONT_SHARE: Readonly<BandRange> = { kind: "offset", lo: -0.07, hi: 0.07 };

/**
 * Rotor partition −0.05…+0.10 around the resolved value (0.85–1.0 at the default 0.9) [E]: the heat-partition
 * formula of the rotor and the pad (R. Limpert, *Brake Design and Safety*, SAE, 1999, ch. 3) gives about 0.85
 * for semi-metallic pads and close to 1 for organic pads.
 */
export const BAND_ROTOR_PARTITION: Readonly<BandRange> = { kind: "offset", lo: -0.05, hi: 0.1 };

/**
 * Trailer controller gain × 0.5–1.3 around the resolved value [E]: under-set controllers are common, over-set
 * ones lock the trailer wheels and get turned down (docs/model.md, "Trailer brakes"). Only for a rig with
 * trailer brakes.
 */
export const BAND_TRAILER_GAIN: Readonly<BandRange> = { kind: "scale", lo: 0.5, hi: 1.3 };

/**
 * Rotor and drum mass × 0.85–1.25 [E]: catalogue masses of similar rotors and drums vary by about ±15 %, and
 * conduction into the hub and wheel adds effective mass, so the range leans upward (docs/model.md, "Masses").
 */
export const BAND_BRAKE_MASS: Readonly<BandRange> = { kind: "scale", lo: 0.85, hi: 1.25 };

/** Every band range, by parameter (engineering estimates, see each constant). */
export const BAND_RANGES: Readonly<Record<BandParameter, Readonly<BandRange>>> = {
  coolingFactor: BAND_COOLING_FACTOR,
  engineBrakingScale: BAND_ENGINE_BRAKING,
  frontShare: BAND_FRONT_SHARE,
  rotorPartition: BAND_ROTOR_PARTITION,
  trailerGain: BAND_TRAILER_GAIN,
  brakeMassScale: BAND_BRAKE_MASS,
};

/** Settings of a band. */
export interface BandSettings {
  /** Ensemble members (≥ 2). */
  members: number;
  /** Step of the coarse route the members run on, m (the route's own step when it is coarser). */
  stepM: number;
  /** Lower and upper percentile of the band (0–1). */
  lowPercentile: number;
  highPercentile: number;
  /** Ranges per parameter (defaults: {@link BAND_RANGES}). */
  ranges: Readonly<Record<BandParameter, Readonly<BandRange>>>;
}

/**
 * Default band settings [E]: 8 members at 50 m (the advice search step). Eight Latin-hypercube members stratify
 * each parameter into eighths; with the linear-interpolation percentile, the 10th and 90th percentiles fall
 * between the lowest two and the highest two member differences. Chosen for speed: one rig's band is nine
 * coarse heat runs, about a fifth of the fine run's cost each (tests/bench/band.bench.ts).
 */
export const DEFAULT_BAND_SETTINGS: Readonly<BandSettings> = {
  members: 8,
  stepM: 50,
  lowPercentile: 0.1,
  highPercentile: 0.9,
  ranges: BAND_RANGES,
};

/** The band of a heat trace. */
export interface HeatBand {
  /** Lower edge per position (the nominal run's position order), per sample of the fine route, °C. */
  lowC: Float64Array[];
  /** Upper edge, same layout, °C. */
  highC: Float64Array[];
  /** Ensemble members run. */
  members: number;
  /** The parameters varied and their ranges (trailer gain only with trailer brakes). */
  ranges: Partial<Record<BandParameter, BandRange>>;
  /** The overrides of each member (concrete values). */
  memberParams: Partial<Pick<ModelParams, BandParameter>>[];
  /** Step of the coarse route, m. */
  stepM: number;
  /** Percentiles of the edges. */
  percentiles: { low: number; high: number };
  /** The fine nominal heat run the band is around. */
  nominal: HeatRunResult;
  /** The coarse runs, for peak bands: sample distances, the coarse nominal and each member, per position, °C. */
  coarse: { distanceM: Float64Array; nominalC: Float64Array[]; memberC: Float64Array[][] };
}

/** A peak with its band. */
export interface PeakBand {
  /** Peak of the nominal run over the range, °C. */
  peakC: number;
  /** Where, m along the route. */
  atM: number;
  /** Band of the peak, °C (lowC ≤ peakC ≤ highC). */
  lowC: number;
  highC: number;
}

/**
 * Deterministic Latin-hypercube points in [0, 1)^dims: in every dimension each of the `count` strata holds
 * exactly one point, at its centre; strata are matched across dimensions by the ranks of Roberts' additive
 * sequence frac(0.5 + k·α_d), α_d = g^−(d+1), g the positive root of x^(dims+1) = x + 1.
 * @param count number of points (≥ 1)
 * @param dims number of dimensions (≥ 1)
 * @returns count points of dims coordinates
 * @example latinHypercube(4, 2).map((p) => Math.floor(p[0] * 4)).sort() // [0, 1, 2, 3]
 */
export function latinHypercube(count: number, dims: number): number[][] {
  if (!(Number.isInteger(count) && count >= 1 && Number.isInteger(dims) && dims >= 1)) {
    throw new RangeError("latinHypercube needs whole numbers count ≥ 1 and dims ≥ 1");
  }
  let g = 2;
  for (let i = 0; i < 60; i++) g = Math.pow(1 + g, 1 / (dims + 1));
  const points = Array.from({ length: count }, () => new Array<number>(dims).fill(0));
  for (let d = 0; d < dims; d++) {
    const alpha = Math.pow(1 / g, d + 1) % 1;
    const order = Array.from({ length: count }, (_, k) => k).sort(
      (a, b) => ((0.5 + a * alpha) % 1) - ((0.5 + b * alpha) % 1),
    );
    order.forEach((k, rank) => ((points[k] as number[])[d] = (rank + 0.5) / count));
  }
  return points;
}

/** @private Coarse copies per route and factor (a convoy shares its route, so it shares these). */
const COARSE = new WeakMap<PreparedRoute, Map<number, PreparedRoute>>();

/** @private The route coarsened to about `stepM` (cached). */
function coarseRoute(route: PreparedRoute, stepM: number): PreparedRoute {
  const factor = Math.max(1, Math.round(stepM / route.profile.stepM));
  let byFactor = COARSE.get(route);
  if (byFactor === undefined) COARSE.set(route, (byFactor = new Map()));
  let hit = byFactor.get(factor);
  if (hit === undefined) byFactor.set(factor, (hit = coarsenRoute(route, factor)));
  return hit;
}

/**
 * The overrides of each band member: the run's own resolved values moved within each range.
 * @param params the nominal run's resolved parameters (HeatRunResult.model.params)
 * @param hasTrailerBrakes whether the rig has trailer brakes (trailer gain varies only then)
 * @param settings band settings
 * @returns the varied ranges and one override set per member
 * @example bandMemberParams(result.model.params, true, DEFAULT_BAND_SETTINGS).members.length // 8
 */
export function bandMemberParams(
  params: ModelParams,
  hasTrailerBrakes: boolean,
  settings: BandSettings = DEFAULT_BAND_SETTINGS,
): { ranges: Partial<Record<BandParameter, BandRange>>; members: Partial<Pick<ModelParams, BandParameter>>[] } {
  const names = (Object.keys(settings.ranges) as BandParameter[]).filter((k) => k !== "trailerGain" || hasTrailerBrakes);
  const ranges: Partial<Record<BandParameter, BandRange>> = {};
  for (const k of names) ranges[k] = { ...settings.ranges[k] };
  const points = latinHypercube(settings.members, names.length);
  const members = points.map((u) => {
    const out: Partial<Pick<ModelParams, BandParameter>> = {};
    names.forEach((k, d) => {
      const r = settings.ranges[k];
      const base = (params[k] ?? 0) as number;
      const x = r.lo + (r.hi - r.lo) * (u[d] as number);
      const value = r.kind === "scale" ? base * x : base + x;
      out[k] = clampParam(k, value);
    });
    return out;
  });
  return { ranges, members };
}

/** @private Keep a member inside the model's own limits (shares 0–1, gain 0–2, factors ≥ 0). */
function clampParam(k: BandParameter, v: number): number {
  const [lo, hi] = k === "frontShare" || k === "rotorPartition" ? [0, 1] : k === "trailerGain" ? [0, 2] : [0, Infinity];
  return v < lo ? lo : v > hi ? hi : v;
}

/** @private Percentile of sorted values by linear interpolation between order statistics (Hyndman–Fan type 7). */
function percentileSorted(sorted: Float64Array, p: number): number {
  const h = (sorted.length - 1) * p;
  const i = Math.floor(h);
  const lo = sorted[i] as number;
  return i + 1 < sorted.length ? lo + (h - i) * ((sorted[i + 1] as number) - lo) : lo;
}

/**
 * The band of a heat run over a prepared route: 10th–90th percentile of the ensemble, per position and sample.
 * @param route prepared route (the fine one the nominal run uses)
 * @param rig the rig
 * @param options the run's options (overrides, stops, controls, start state): every member uses them too
 * @param settings band settings (members, step, percentiles, ranges)
 * @param nominal the nominal run on `route` with `options`, when already made (else it is run here)
 * @returns the band, with the nominal run
 * @throws {TypeError|RangeError} on invalid input (lib/thermal's messages) or settings
 * @example runBand(prepareRoute(profile), UTE_AND_CARAVAN).highC[0] // front rotor upper edge per sample, °C
 */
export function runBand(
  route: PreparedRoute,
  rig: Rig,
  options: HeatRunOptions = {},
  settings: Partial<BandSettings> = {},
  nominal?: HeatRunResult,
): HeatBand {
  const s: BandSettings = { ...DEFAULT_BAND_SETTINGS, ...settings };
  if (!(Number.isInteger(s.members) && s.members >= 2)) throw new RangeError("band members must be a whole number ≥ 2");
  if (!(s.stepM > 0)) throw new RangeError("band stepM must be greater than 0");
  if (!(s.lowPercentile >= 0 && s.lowPercentile <= s.highPercentile && s.highPercentile <= 1)) {
    throw new RangeError("band percentiles must satisfy 0 ≤ low ≤ high ≤ 1");
  }
  const fine = nominal ?? runPrepared(route, rig, options);
  const coarse = coarseRoute(route, s.stepM);
  const coarseNominal = coarse === route ? fine : runPrepared(coarse, rig, options);
  const hasTrailerBrakes = fine.positions.some((p) => p.position === "trailer");
  const { ranges, members } = bandMemberParams(fine.model.params, hasTrailerBrakes, s);
  const memberC = members.map(
    (m) => runPrepared(coarse, rig, { ...options, params: { ...options.params, ...m } as ModelParamsInput }).trace.rotorC,
  );
  const P = fine.positions.length;
  const M = members.length;
  const nc = coarse.n;
  const buf = new Float64Array(M);
  const lowOff = Array.from({ length: P }, () => new Float64Array(nc));
  const highOff = Array.from({ length: P }, () => new Float64Array(nc));
  for (let j = 0; j < P; j++) {
    const nom = coarseNominal.trace.rotorC[j] as Float64Array;
    const lo = lowOff[j] as Float64Array;
    const hi = highOff[j] as Float64Array;
    for (let q = 0; q < nc; q++) {
      const base = nom[q] as number;
      for (let m = 0; m < M; m++) {
        // Insertion sort while filling: M is small, and a typed-array sort call costs more here.
        const v = (((memberC[m] as Float64Array[])[j] as Float64Array)[q] as number) - base;
        let k = m;
        while (k > 0 && (buf[k - 1] as number) > v) {
          buf[k] = buf[k - 1] as number;
          k--;
        }
        buf[k] = v;
      }
      const a = percentileSorted(buf, s.lowPercentile);
      const b = percentileSorted(buf, s.highPercentile);
      lo[q] = a < 0 ? a : 0;
      hi[q] = b > 0 ? b : 0;
    }
  }
  const lowC: Float64Array[] = [];
  const highC: Float64Array[] = [];
  const df = route.profile.distanceM;
  const dc = coarse.profile.distanceM;
  for (let j = 0; j < P; j++) {
    const nom = fine.trace.rotorC[j] as Float64Array;
    const lo = lowOff[j] as Float64Array;
    const hi = highOff[j] as Float64Array;
    const outLo = new Float64Array(route.n);
    const outHi = new Float64Array(route.n);
    let q = 0;
    for (let i = 0; i < route.n; i++) {
      const d = df[i] as number;
      while (q + 2 < nc && (dc[q + 1] as number) <= d) q++;
      const d0 = dc[q] as number;
      const d1 = dc[q + 1 < nc ? q + 1 : q] as number;
      const w = d1 > d0 ? Math.min(1, Math.max(0, (d - d0) / (d1 - d0))) : 0;
      const q1 = q + 1 < nc ? q + 1 : q;
      const t = nom[i] as number;
      outLo[i] = t + (lo[q] as number) + w * ((lo[q1] as number) - (lo[q] as number));
      outHi[i] = t + (hi[q] as number) + w * ((hi[q1] as number) - (hi[q] as number));
    }
    lowC.push(outLo);
    highC.push(outHi);
  }
  return {
    lowC,
    highC,
    members: M,
    ranges,
    memberParams: members,
    stepM: coarse.profile.stepM,
    percentiles: { low: s.lowPercentile, high: s.highPercentile },
    nominal: fine,
    coarse: { distanceM: dc, nominalC: coarseNominal.trace.rotorC, memberC },
  };
}

/**
 * The band of one position's peak over a stretch of the route: the percentiles of each member's own peak
 * minus the coarse nominal peak, added to the fine nominal peak (so lowC ≤ peakC ≤ highC).
 * @param band a band from {@link runBand}
 * @param position index of the position (the nominal run's order)
 * @param startM start of the stretch, m (default: the route's start)
 * @param endM end of the stretch, m (default: the route's end)
 * @returns the nominal peak, where it is, and its band
 * @throws {RangeError} for a position the rig lacks or a stretch with no sample
 * @example peakBand(band, 0, descent.startDistanceM, descent.endDistanceM).highC
 */
export function peakBand(band: HeatBand, position: number, startM = -Infinity, endM = Infinity): PeakBand {
  const fineC = band.nominal.trace.rotorC[position];
  if (fineC === undefined) throw new RangeError(`the band has no position ${position}`);
  const df = band.nominal.trace.distanceM;
  let at = -1;
  for (let i = 0; i < df.length; i++) {
    const d = df[i] as number;
    if (d >= startM && d <= endM && (at < 0 || (fineC[i] as number) > (fineC[at] as number))) at = i;
  }
  if (at < 0) throw new RangeError("the stretch holds no sample of the route");
  const dc = band.coarse.distanceM;
  // Coarse samples of the stretch, widened to the nearest coarse sample on each side of a short stretch.
  let a = 0;
  while (a + 1 < dc.length && (dc[a + 1] as number) <= startM) a++;
  let b = dc.length - 1;
  while (b > a && (dc[b - 1] as number) >= endM) b--;
  const peakOf = (col: Float64Array) => {
    let m = -Infinity;
    for (let q = a; q <= b; q++) if ((col[q] as number) > m) m = col[q] as number;
    return m;
  };
  const base = peakOf(band.coarse.nominalC[position] as Float64Array);
  const diffs = Float64Array.from(band.coarse.memberC, (cols) => peakOf(cols[position] as Float64Array) - base).sort();
  const lo = percentileSorted(diffs, band.percentiles.low);
  const hi = percentileSorted(diffs, band.percentiles.high);
  const peakC = fineC[at] as number;
  return { peakC, atM: df[at] as number, lowC: peakC + (lo < 0 ? lo : 0), highC: peakC + (hi > 0 ? hi : 0) };
}
