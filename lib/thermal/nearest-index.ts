/**
 * Index of the sample nearest a distance (binary search).
 * @param d distances, m (non-decreasing)
 * @param atM distance, m
 * @returns index
 * @example nearestIndex(Float64Array.from([0, 10, 20]), 12) // 1
 */
export function nearestIndex(d: Float64Array, atM: number): number {
  let lo = 0;
  let hi = d.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((d[mid] as number) <= atM) lo = mid;
    else hi = mid;
  }
  return Math.abs((d[hi] as number) - atM) < Math.abs((d[lo] as number) - atM) ? hi : lo;
}
