/**
 * Pieces of a prepared route: a slice (typed-array views, no copy) and a coarser copy for fast runs (the advice
 * searches and the band members). The coarse copy keeps the elevation of every kept sample, so the potential
 * energy released is exact; curve radii keep the tightest in each merged block.
 */

import type { PreparedRoute } from "./prepare-route";

/**
 * A slice [a, b] of a prepared route (views on the same arrays; distances stay absolute).
 * @param route prepared route
 * @param a first sample index
 * @param b last sample index (≥ a + 1)
 * @returns the slice
 * @throws {RangeError} "slice must hold at least 2 samples inside the route"
 * @example sliceRoute(route, 3100, 4200).profile.distanceM[0] // distance of sample 3100, m
 */
export function sliceRoute(route: PreparedRoute, a: number, b: number): PreparedRoute {
  if (!(a >= 0 && b < route.n && b > a)) throw new RangeError("slice must hold at least 2 samples inside the route");
  const p = route.profile;
  const end = b + 1;
  return {
    profile: {
      stepM: p.stepM,
      distanceM: p.distanceM.subarray(a, end),
      lat: p.lat.subarray(a, end),
      lon: p.lon.subarray(a, end),
      elevationM: p.elevationM.subarray(a, end),
      grade: p.grade.subarray(a, end),
      curveRadiusM: p.curveRadiusM.subarray(a, end),
      gapAfter: p.gapAfter.subarray(a, end),
    },
    n: end - a,
    pathM: route.pathM.subarray(a, end),
    dropM: route.dropM.subarray(a, end),
    runM: route.runM.subarray(a, end),
    densityKgM3: route.densityKgM3.subarray(a, end),
    descentGrade: route.descentGrade.subarray(a, end),
  };
}

/**
 * A coarser copy of a route piece: every `factor`-th sample, the ones in `keep` and both ends of every gap, with each
 * merged step's length, drop, run and grade summed or recomputed exactly, the block's mean air density and the
 * block's tightest curve radius.
 * @param route prepared route piece (e.g. a slice)
 * @param factor keep every factor-th sample (≥ 1; 1 returns the piece itself)
 * @param keep local sample indices that must be kept (e.g. the crest)
 * @returns the coarse piece
 * @example coarsenRoute(sliceRoute(route, 0, 700), 5, [50]).n // 142
 */
export function coarsenRoute(route: PreparedRoute, factor: number, keep: readonly number[] = []): PreparedRoute {
  if (factor <= 1 || route.n <= 2) return route;
  const idx = keptIndices(route.n, factor, keep, route.profile.gapAfter);
  const m = idx.length;
  const p = route.profile;
  const col = () => new Float64Array(m);
  const [distanceM, lat, lon, elevationM, grade, curveRadiusM] = [col(), col(), col(), col(), col(), col()];
  const [pathM, dropM, runM, densityKgM3, descentGrade] = [col(), col(), col(), col(), col()];
  const gapAfter = new Uint8Array(m);
  for (let q = 0; q < m; q++) {
    const i = idx[q] as number;
    distanceM[q] = p.distanceM[i] as number;
    lat[q] = p.lat[i] as number;
    lon[q] = p.lon[i] as number;
    elevationM[q] = p.elevationM[i] as number;
    curveRadiusM[q] = p.curveRadiusM[i] as number;
    descentGrade[q] = route.descentGrade[i] as number;
    if (q + 1 === m) break;
    const j = idx[q + 1] as number;
    let path = 0, drop = 0, run = 0, rho = 0, gap = 0, radius = Infinity;
    for (let k = i; k < j; k++) {
      path += route.pathM[k] as number;
      drop += route.dropM[k] as number;
      run += route.runM[k] as number;
      rho += route.densityKgM3[k] as number;
      gap |= p.gapAfter[k] as number;
      if ((p.curveRadiusM[k] as number) < radius) radius = p.curveRadiusM[k] as number;
    }
    pathM[q] = path;
    dropM[q] = drop;
    runM[q] = run;
    densityKgM3[q] = rho / (j - i);
    gapAfter[q] = gap;
    grade[q] = run > 0 ? -drop / run : 0;
    curveRadiusM[q] = radius;
  }
  grade[m - 1] = grade[m - 2] ?? 0;
  return {
    profile: { stepM: p.stepM * factor, distanceM, lat, lon, elevationM, grade, curveRadiusM, gapAfter },
    n: m,
    pathM,
    dropM,
    runM,
    densityKgM3,
    descentGrade,
  };
}

/** @private Sorted unique kept indices: 0, factor, 2·factor, …, the keeps, both ends of every gap, and n − 1. */
function keptIndices(n: number, factor: number, keep: readonly number[], gapAfter: Uint8Array): number[] {
  const set = new Set<number>([n - 1]);
  for (let i = 0; i < n; i += factor) set.add(i);
  for (const k of keep) if (k >= 0 && k < n) set.add(k);
  for (let i = 0; i + 1 < n; i++) if (gapAfter[i] === 1) set.add(i).add(i + 1);
  return [...set].sort((x, y) => x - y);
}
