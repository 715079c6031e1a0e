/**
 * Total ascent and descent of `e[a..b]` with a hysteresis (dead band) of `thresholdM`: the profile is
 * reduced to its turning points, keeping a top or a bottom only once the elevation has moved back from it
 * by at least the threshold, and the rises and falls between consecutive turning points are summed. The
 * first and last samples are always turning points, so ascent − descent = e[b] − e[a] exactly. Wiggles
 * smaller than the threshold (residual GPS noise after smoothing) add nothing, while every real climb
 * counts in full.
 *
 * @param thresholdM dead band, m (0 sums every rise and fall)
 * @returns ascent and descent, m, both ≥ 0
 */
export function climbTotals(
  e: Float64Array,
  a: number,
  b: number,
  thresholdM: number,
): { ascentM: number; descentM: number } {
  let ascentM = 0;
  let descentM = 0;
  let anchor = e[a] as number; // last confirmed turning point
  let extreme = anchor; // running top (dir 1) or bottom (dir −1) since the anchor
  let dir = 0;
  const leg = (from: number, to: number) => {
    if (to > from) ascentM += to - from;
    else descentM += from - to;
  };
  for (let i = a + 1; i <= b; i++) {
    const v = e[i] as number;
    if (dir === 0) {
      if (Math.abs(v - anchor) >= thresholdM && v !== anchor) {
        dir = v > anchor ? 1 : -1;
        extreme = v;
      }
    } else if (dir * (v - extreme) > 0) {
      extreme = v;
    } else if (dir * (extreme - v) >= thresholdM && v !== extreme) {
      leg(anchor, extreme);
      anchor = extreme;
      extreme = v;
      dir = -dir;
    }
  }
  const last = e[b] as number;
  if (dir !== 0) {
    leg(anchor, extreme);
    anchor = extreme;
  }
  leg(anchor, last);
  return { ascentM, descentM };
}
