import { reflected } from "./segment-ranges";

/**
 * Gaussian smoothing of `y[a..b]` into `out[a..b]` with standard deviation `sigma` samples, the kernel cut
 * at ±3σ (99.7 % of its weight) and renormalised. A Gaussian kernel is symmetric and sums to one, so it
 * returns any straight line unchanged (a constant grade keeps its grade, a long drop keeps its height);
 * it only rounds off changes of grade over about ±2σ.
 *
 * @param sigma standard deviation, samples (> 0)
 */
export function gaussianFilter(y: Float64Array, a: number, b: number, sigma: number, out: Float64Array): void {
  const r = Math.max(1, Math.ceil(3 * sigma));
  const w = new Float64Array(2 * r + 1);
  let sum = 0;
  for (let k = -r; k <= r; k++) {
    const v = Math.exp(-(k * k) / (2 * sigma * sigma));
    w[k + r] = v;
    sum += v;
  }
  for (let k = 0; k < w.length; k++) w[k] = (w[k] as number) / sum;
  for (let i = a; i <= b; i++) {
    let acc = 0;
    if (i - r >= a && i + r <= b) {
      for (let k = 0; k < w.length; k++) acc += (w[k] as number) * (y[i - r + k] as number); // interior: no reflection
    } else {
      for (let k = -r; k <= r; k++) acc += (w[k + r] as number) * reflected(y, a, b, i + k);
    }
    out[i] = acc;
  }
}
