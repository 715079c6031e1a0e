import { gaussianFilter } from "./gaussian-filter";
import { medianFilter } from "./median-filter";
import { segmentRanges } from "./segment-ranges";

/** Options of {@link smoothElevation}. All in m. */
export interface SmoothElevationOptions {
  /**
   * Width of the spike-removing median window, m. Default 80 (9 samples at a 10 m step, 5 at 20 m).
   * [E] A median removes a spike up to half its window wide; a spike of one or two recorded points
   * spreads over up to three point spacings once interpolated, so at a 20 m step a 50 m window (3
   * samples) let two-sample spikes through and moved descent ends by up to 300 m. 80 m still keeps a
   * sharp V valley within 3 m of its depth (tests/unit/route/profile.test.ts).
   */
  medianWindowM?: number;
  /** Standard deviation of the Gaussian, m. Default 40 (at least one step is always used). */
  sigmaM?: number;
}

/**
 * Smooths resampled elevations so that GPS noise and spikes do not invent climbs and descents, while real
 * ones keep their height. Two passes, each inside one segment (never across a gap), each extended past
 * the segment ends by odd reflection so a grade running into an end is preserved:
 *
 * 1. a running median over 2h + 1 samples, h = max(1, ⌊medianWindowM / (2·spacing)⌋): removes spikes up
 *    to h samples wide and leaves monotonic stretches untouched;
 * 2. a Gaussian of standard deviation `sigmaM` (in samples: sigmaM / spacing), cut at ±3σ: averages the
 *    remaining noise (white noise of σₙ per sample drops to about σₙ / √(2√π·σ/spacing)) and returns
 *    straight lines unchanged, so a constant 8 % grade stays 8 % and a 600 m drop stays 600 m; only
 *    the corners where the grade changes are rounded over about ±2σ.
 *
 * @param distanceM cumulative distance per sample, m (uniform spacing within a segment)
 * @param elevationM raw elevation per sample, m
 * @param gapAfter 1 where the step from sample i to i+1 crosses a segment gap
 * @param options window sizes in m
 * @returns smoothed elevation per sample, m
 * @example
 * const smooth = smoothElevation(r.distanceM, r.elevationM, r.gapAfter, { sigmaM: 40 });
 */
export function smoothElevation(
  distanceM: Float64Array,
  elevationM: Float64Array,
  gapAfter: Uint8Array,
  options: SmoothElevationOptions = {},
): Float64Array {
  const medianWindowM = options.medianWindowM ?? 80;
  const sigmaM = options.sigmaM ?? 40;
  if (!(medianWindowM >= 0) || !(sigmaM >= 0)) throw new RangeError("smoothing windows must be ≥ 0 m");
  if (distanceM.length !== elevationM.length || gapAfter.length !== elevationM.length) {
    throw new RangeError("distanceM, elevationM and gapAfter must have the same length");
  }
  const despiked = new Float64Array(elevationM.length);
  const out = new Float64Array(elevationM.length);
  for (const [a, b] of segmentRanges(gapAfter)) {
    if (b === a) {
      out[a] = elevationM[a] as number;
      continue;
    }
    const spacing = ((distanceM[b] as number) - (distanceM[a] as number)) / (b - a);
    const h = Math.max(1, Math.floor(medianWindowM / (2 * spacing)));
    if (medianWindowM > 0) medianFilter(elevationM, a, b, h, despiked);
    else despiked.set(elevationM.subarray(a, b + 1), a);
    const sigma = Math.max(1, sigmaM / spacing);
    if (sigmaM > 0) gaussianFilter(despiked, a, b, sigma, out);
    else out.set(despiked.subarray(a, b + 1), a);
  }
  return out;
}
