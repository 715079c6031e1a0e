/** Builders shared by the profile, smoothing, descent and stats tests. */
import { buildRouteProfile, type BuildProfileOptions, cleanTrack, type GpxPoint, type GpxTrack } from "@/lib/route";
import type { RouteProfile } from "@/lib/route/types";

/** A track from point lists, one per segment. */
export function trackOf(...segments: GpxPoint[][]): GpxTrack {
  return { id: "track:0", kind: "track", index: 0, name: null, description: null, segments, timesOrdered: null };
}

/** Clean + profile, throwing on any problem. */
export function profileOf(segments: GpxPoint[][], options: BuildProfileOptions = {}): RouteProfile {
  const clean = cleanTrack(trackOf(...segments));
  if (!clean.ok) throw new Error(JSON.stringify(clean.problems));
  return buildRouteProfile(clean.track, options);
}

/**
 * A profile written directly (no GPS, no smoothing): samples every `stepM` along each segment's length
 * with the given elevation function of the distance from the route start. Used to test the descent and
 * stats rules exactly.
 */
export function rawProfile(segmentLengthsM: number[], elevation: (d: number, segment: number) => number, stepM = 10): RouteProfile {
  const d: number[] = [];
  const e: number[] = [];
  const gap: number[] = [];
  let offset = 0;
  segmentLengthsM.forEach((L, s) => {
    const n = Math.round(L / stepM);
    for (let k = 0; k <= n; k++) {
      d.push(offset + k * stepM);
      e.push(elevation(offset + k * stepM, s));
      gap.push(k === n && s < segmentLengthsM.length - 1 ? 1 : 0);
    }
    offset += n * stepM;
  });
  const n = d.length;
  return {
    stepM,
    distanceM: Float64Array.from(d),
    lat: new Float64Array(n),
    lon: new Float64Array(n),
    elevationM: Float64Array.from(e),
    grade: new Float64Array(n),
    curveRadiusM: new Float64Array(n).fill(Infinity),
    gapAfter: Uint8Array.from(gap),
  };
}

/** Piecewise-linear elevation: `[lengthM, grade]` legs from a start elevation (grade negative downhill). */
export function legs(startM: number, pieces: Array<[number, number]>): (d: number) => number {
  return (d) => {
    let e = startM;
    let at = 0;
    for (const [len, g] of pieces) {
      const run = Math.min(Math.max(d - at, 0), len);
      e += g * run;
      at += len;
    }
    return e;
  };
}
