import { reflected } from "./segment-ranges";

/**
 * Running median over 2h + 1 samples of `y[a..b]` into `out[a..b]` (J. W. Tukey, "Exploratory Data
 * Analysis", 1977, running medians). A median removes isolated spikes up to h samples wide completely,
 * yet returns a monotonic stretch (a steady climb or descent) unchanged, unlike a mean.
 *
 * @param h half window, samples (≥ 1)
 */
export function medianFilter(y: Float64Array, a: number, b: number, h: number, out: Float64Array): void {
  const w = new Float64Array(2 * h + 1);
  for (let i = a; i <= b; i++) {
    for (let k = -h; k <= h; k++) w[k + h] = reflected(y, a, b, i + k);
    insertionSort(w);
    out[i] = w[h] as number;
  }
}

function insertionSort(w: Float64Array): void {
  for (let i = 1; i < w.length; i++) {
    const v = w[i] as number;
    let j = i - 1;
    while (j >= 0 && (w[j] as number) > v) {
      w[j + 1] = w[j] as number;
      j--;
    }
    w[j + 1] = v;
  }
}
