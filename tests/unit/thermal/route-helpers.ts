/** Synthetic route profiles for the thermal tests and benchmarks (not a lib/route substitute). */

import type { RouteProfile } from "@/lib/route/types";

/** One straight-graded stretch of a synthetic route. */
export interface Stretch {
  /** Horizontal length, m. */
  lengthM: number;
  /** Grade, rise over run (negative downhill). */
  grade: number;
  /** Curve radius over the stretch, m (default Infinity). */
  curveRadiusM?: number;
}

/**
 * Build a profile from consecutive stretches sampled every `stepM` metres (the last step of a stretch may be
 * shorter). Grades are exact: elevation changes by grade × run on each step.
 */
export function stretchesProfile(stretches: readonly Stretch[], stepM = 10, startElevationM = 1000): RouteProfile {
  const d: number[] = [0];
  const e: number[] = [startElevationM];
  const g: number[] = [];
  const r: number[] = [];
  for (const s of stretches) {
    let left = s.lengthM;
    while (left > 1e-9) {
      const dx = Math.min(stepM, left);
      g.push(s.grade);
      r.push(s.curveRadiusM ?? Infinity);
      d.push((d[d.length - 1] as number) + dx);
      e.push((e[e.length - 1] as number) + s.grade * dx);
      left -= dx;
    }
  }
  g.push(g[g.length - 1] ?? 0);
  r.push(r[r.length - 1] ?? Infinity);
  const n = d.length;
  return {
    stepM,
    distanceM: Float64Array.from(d),
    elevationM: Float64Array.from(e),
    grade: Float64Array.from(g),
    curveRadiusM: Float64Array.from(r),
    lat: new Float64Array(n),
    lon: new Float64Array(n),
    gapAfter: new Uint8Array(n),
  };
}

/** A constant-grade line. */
export function constantGradeProfile(lengthM: number, grade: number, stepM = 10, startElevationM = 1000): RouteProfile {
  return stretchesProfile([{ lengthM, grade }], stepM, startElevationM);
}

/**
 * A 300 km mountain-ish route at 10 m steps (30,000 samples): repeating climbs, descents of 4–10 %, curves and
 * flats. Deterministic.
 */
export function longMixedProfile(totalM = 300_000, stepM = 10): RouteProfile {
  const pattern: Stretch[] = [
    { lengthM: 4000, grade: 0 },
    { lengthM: 6000, grade: 0.06 },
    { lengthM: 1000, grade: 0.01, curveRadiusM: 120 },
    { lengthM: 3000, grade: -0.08 },
    { lengthM: 600, grade: -0.1, curveRadiusM: 60 },
    { lengthM: 2400, grade: -0.045 },
    { lengthM: 3000, grade: 0.02 },
  ];
  const stretches: Stretch[] = [];
  let total = 0;
  while (total < totalM) {
    for (const s of pattern) {
      const lengthM = Math.min(s.lengthM, totalM - total);
      if (lengthM <= 0) break;
      stretches.push({ ...s, lengthM });
      total += lengthM;
    }
  }
  return stretchesProfile(stretches, stepM, 500);
}
