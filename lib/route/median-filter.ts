import { reflected } from "./segment-ranges";

/**
 * Running median over 2h + 1 samples of `y[a..b]` into `out[a..b]` (J. W. Tukey, "Exploratory Data
 * Analysis", 1977, running medians). A median removes isolated spikes up to h samples wide completely,
 * yet returns a monotonic stretch (a steady climb or descent) unchanged, unlike a mean.
 *
 * @param h half window, samples (≥ 1)
 */
export function medianFilter(y: Float64Array, a: number, b: number, h: number, out: Float64Array): void {
  // A sorted copy of the window slides along: each step removes the value leaving and inserts the one
  // entering (O(h) per sample instead of sorting the whole window again).
  const n = 2 * h + 1;
  const w = new Float64Array(n);
  for (let k = -h; k <= h; k++) w[k + h] = reflected(y, a, b, a + k);
  w.sort();
  out[a] = w[h] as number;
  for (let i = a + 1; i <= b; i++) {
    const leaving = reflected(y, a, b, i - h - 1);
    const entering = reflected(y, a, b, i + h);
    let j = lowerBound(w, leaving);
    // Shift towards the gap left by `leaving` until `entering` fits.
    if (entering >= leaving) {
      while (j + 1 < n && (w[j + 1] as number) < entering) {
        w[j] = w[j + 1] as number;
        j++;
      }
    } else {
      while (j > 0 && (w[j - 1] as number) > entering) {
        w[j] = w[j - 1] as number;
        j--;
      }
    }
    w[j] = entering;
    out[i] = w[h] as number;
  }
}

/** First index of sorted `w` whose value is ≥ `v` (binary search). */
function lowerBound(w: Float64Array, v: number): number {
  let lo = 0;
  let hi = w.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((w[mid] as number) < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
