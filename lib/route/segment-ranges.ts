/**
 * The sample ranges between segment gaps: `[first, last]` index pairs (inclusive), in order. Every
 * per-segment computation (smoothing, grades, curves, descents, ascent totals) runs inside one range, so
 * nothing is ever computed across a gap.
 *
 * @param gapAfter 1 where the step from sample i to i+1 crosses a gap
 * @returns inclusive index ranges covering all samples
 */
export function segmentRanges(gapAfter: Uint8Array): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  let start = 0;
  for (let i = 0; i < gapAfter.length; i++) {
    if (gapAfter[i] === 1 || i === gapAfter.length - 1) {
      out.push([start, i]);
      start = i + 1;
    }
  }
  return out;
}

/**
 * Value at index `idx` of `y` restricted to `[a, b]`, extended beyond the ends by odd (point) reflection:
 * y(a − k) = 2·y(a) − y(a + k). Odd reflection continues a straight line exactly, so filters applied near a
 * segment end neither bend a constant grade nor pull the end elevation towards the interior.
 */
export function reflected(y: Float64Array, a: number, b: number, idx: number): number {
  if (idx < a) return 2 * (y[a] as number) - (y[Math.min(b, 2 * a - idx)] as number);
  if (idx > b) return 2 * (y[b] as number) - (y[Math.max(a, 2 * b - idx)] as number);
  return y[idx] as number;
}
