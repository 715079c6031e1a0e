/**
 * Pieces of a prepared route for re-running one descent: a slice from just before the crest and a coarser copy
 * of it for searching, made once per route (lib/thermal/route-pieces.ts makes them).
 */

import { coarsenRoute, sliceRoute, type PreparedRoute } from "@/lib/thermal";

export { coarsenRoute, sliceRoute };

/** @private Pieces made so far, per prepared route (rigs of a convoy share the route, so they share these). */
const PIECES = new WeakMap<PreparedRoute, Map<string, { fine: PreparedRoute; coarse: PreparedRoute }>>();

/**
 * The slice [a, b] of a prepared route and its coarse copy (coarsenRoute with `factor` and the local `keep`
 * indices), made once per route and shared by every later caller (e.g. the rigs of a convoy). Pieces are
 * never written to, so sharing them is safe.
 * @param route prepared route
 * @param a first sample index
 * @param b last sample index (≥ a + 1)
 * @param factor coarsening factor (≥ 1)
 * @param keep local sample indices the coarse copy must keep
 * @returns the slice and its coarse copy
 * @example routePieces(route, 3100, 4200, 5, [50]).coarse.n
 */
export function routePieces(
  route: PreparedRoute,
  a: number,
  b: number,
  factor: number,
  keep: readonly number[] = [],
): { fine: PreparedRoute; coarse: PreparedRoute } {
  let byKey = PIECES.get(route);
  if (byKey === undefined) PIECES.set(route, (byKey = new Map()));
  const key = `${a}|${b}|${factor}|${keep.join(",")}`;
  let hit = byKey.get(key);
  if (hit === undefined) {
    const fine = sliceRoute(route, a, b);
    hit = { fine, coarse: coarsenRoute(fine, factor, keep) };
    byKey.set(key, hit);
  }
  return hit;
}
