/**
 * Per-step route quantities that do not depend on the rig, computed once and shared by every rig of a convoy.
 * Step i runs from sample i to sample i+1; a step flagged in `gapAfter` is not driven (length 0, no energy).
 */

import { findDescents, type Descent } from "@/lib/route/find-descents";
import type { RouteProfile } from "@/lib/route/types";
import { isaAirDensity } from "./air";

/** A route profile with its per-step quantities. Arrays have the profile's length n; entry n−1 is unused (0). */
export interface PreparedRoute {
  /** The profile itself. */
  profile: RouteProfile;
  /** Sample count. */
  n: number;
  /** Driven length of each step along the slope √(Δx² + Δh²), m; 0 across a gap. */
  pathM: Float64Array;
  /** Height lost over each step h_i − h_(i+1), m (negative when climbing); 0 across a gap. */
  dropM: Float64Array;
  /** Horizontal run of each step Δx, m (rolling work is Crr·m·g·Δx); 0 across a gap. */
  runM: Float64Array;
  /** ISA air density at each step's mean elevation, kg/m³. */
  densityKgM3: Float64Array;
  /**
   * The grade the driver picks the held speed by, per sample (rise over run, negative): on every sample of a
   * descent, from its top to its bottom, that descent's steepest 1 km grade; 0 off descents. The driver picks
   * one held speed per descent and keeps it; a short dip that is not a descent keeps the cruise speed
   * (docs/model.md, "Held speed").
   */
  descentGrade: Float64Array;
}

/**
 * Compute the rig-independent per-step quantities of a (validated) profile.
 * @param profile the route profile
 * @param descents the route's descents (default: found on the profile with lib/route's default rules)
 * @returns the prepared route
 * @example prepareRoute(profile).pathM[0] // length of the first step, m
 */
export function prepareRoute(profile: RouteProfile, descents?: readonly Descent[]): PreparedRoute {
  const n = profile.distanceM.length;
  const pathM = new Float64Array(n);
  const dropM = new Float64Array(n);
  const runM = new Float64Array(n);
  const densityKgM3 = new Float64Array(n);
  const d = profile.distanceM;
  const e = profile.elevationM;
  for (let i = 0; i + 1 < n; i++) {
    const h0 = e[i] as number;
    const h1 = e[i + 1] as number;
    densityKgM3[i] = isaAirDensity(0.5 * (h0 + h1));
    if (profile.gapAfter[i] === 1) continue;
    const dx = (d[i + 1] as number) - (d[i] as number);
    const dh = h1 - h0;
    runM[i] = dx;
    dropM[i] = -dh;
    pathM[i] = Math.sqrt(dx * dx + dh * dh);
  }
  const descentGrade = new Float64Array(n);
  for (const dsc of descents ?? findDescents(profile)) {
    const to = Math.min(dsc.endIndex, n - 1);
    for (let i = Math.max(0, dsc.startIndex); i <= to; i++) descentGrade[i] = dsc.steepest1kmGrade;
  }
  return { profile, n, pathM, dropM, runM, densityKgM3, descentGrade };
}
