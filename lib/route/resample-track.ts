import type { CleanSegment, CleanTrack } from "./clean-track";
import { interpolatePosition } from "./interpolate-position";

/** A track resampled at a fixed step, before smoothing: the raw columns of a {@link RouteProfile}. */
export interface ResampledTrack {
  /** Nominal step, m. */
  stepM: number;
  /** Cumulative driven distance, m; equal on both sides of a segment gap. */
  distanceM: Float64Array;
  /** Latitude, degrees (WGS 84). */
  lat: Float64Array;
  /** Longitude, degrees (WGS 84). */
  lon: Float64Array;
  /** Elevation interpolated from the track points, m (not smoothed). */
  elevationM: Float64Array;
  /** 1 where the step from sample i to i+1 crosses a gap between segments, else 0. */
  gapAfter: Uint8Array;
}

/** Smallest accepted resampling step, m. */
export const MIN_STEP_M = 5;
/** Largest accepted resampling step, m (beyond it the smoothing and curve fits lose short features). */
export const MAX_STEP_M = 50;

/**
 * Resamples a clean track at a fixed step along its geodesic length. Each segment of length L is cut into
 * n = ⌈L / stepM⌉ equal steps of L / n (≤ stepM, so the segment's end is a sample and no sliver step is
 * left over); positions and elevations are interpolated between the surrounding track points by distance.
 * Segments are laid end to end: the gap between two segments adds no distance and is marked in `gapAfter`.
 *
 * @param track from {@link cleanTrack}
 * @param stepM step, m, 5…50 (default 10)
 * @returns column-wise samples
 * @example
 * const r = resampleTrack(track, 10); // r.distanceM: 0, 10, 20, …
 */
export function resampleTrack(track: CleanTrack, stepM = 10): ResampledTrack {
  if (!(stepM >= MIN_STEP_M && stepM <= MAX_STEP_M)) {
    throw new RangeError(`stepM must be between ${MIN_STEP_M} and ${MAX_STEP_M} m`);
  }
  if (track.segments.length === 0) throw new Error("track has no segments");
  const steps = track.segments.map((s) => Math.max(1, Math.ceil(lastOf(s.distanceM) / stepM - 1e-9)));
  const n = steps.reduce((sum, k) => sum + k + 1, 0);
  const out: ResampledTrack = {
    stepM,
    distanceM: new Float64Array(n),
    lat: new Float64Array(n),
    lon: new Float64Array(n),
    elevationM: new Float64Array(n),
    gapAfter: new Uint8Array(n),
  };
  let k = 0;
  let offset = 0;
  track.segments.forEach((seg, i) => {
    k = sampleSegment(seg, steps[i] as number, offset, out, k);
    if (i < track.segments.length - 1) out.gapAfter[k - 1] = 1;
    offset += lastOf(seg.distanceM);
  });
  return out;
}

/** Writes the n + 1 samples of one segment from index k; returns the next free index. */
function sampleSegment(seg: CleanSegment, n: number, offset: number, out: ResampledTrack, k: number): number {
  const d = seg.distanceM;
  const L = lastOf(d);
  let j = 0; // leg from point j to j + 1
  for (let s = 0; s <= n; s++, k++) {
    const at = s === n ? L : (L * s) / n;
    while (j < d.length - 2 && (d[j + 1] as number) <= at) j++;
    const d0 = d[j] as number;
    const leg = (d[j + 1] as number) - d0;
    const t = Math.min(1, Math.max(0, (at - d0) / leg));
    interpolatePosition(
      seg.lat[j] as number,
      seg.lon[j] as number,
      seg.lat[j + 1] as number,
      seg.lon[j + 1] as number,
      t,
      leg,
      out.lat,
      out.lon,
      k,
    );
    const e0 = seg.eleM[j] as number;
    out.elevationM[k] = e0 + ((seg.eleM[j + 1] as number) - e0) * t;
    out.distanceM[k] = offset + at;
  }
  return k;
}

function lastOf(a: Float64Array): number {
  return a[a.length - 1] as number;
}
