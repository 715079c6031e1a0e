/**
 * Driving instructions on one stretch of the route ("hold 45 km/h on this descent", "select 2nd and hold it
 * here"), so that advice can be re-run through the model on that descent only (model 1.1.0). Turned into
 * per-sample columns once per run, so the hot loop reads one typed-array entry per step.
 */

import type { PreparedRoute } from "./prepare-route";
import type { ResolvedModel } from "./resolve";
import { fixedGearSpeedLimit } from "./speed-profile";

/** A driving instruction on a stretch [startM, endM] of the route. */
export interface RangeControl {
  /** Start of the stretch, m along the route. */
  startM: number;
  /** End of the stretch, m along the route (> startM). */
  endM: number;
  /** Cap on the held speed at every sample of the stretch, m/s. */
  speedMs?: number;
  /**
   * Gear held on the stretch, 1-based: used on every step of it where the engine retards, with the converter
   * locked on an automatic (the gear held in manual mode); the held speed is capped at the gear's rpm limit.
   */
  gear?: number;
}

/** Per-sample and per-step columns of a run's controls. */
export interface ControlColumns {
  /** Held-speed cap per sample, m/s (Infinity where no control applies). */
  speedCapMs: Float64Array;
  /** Held gear per step (step i runs from sample i to i+1), 1-based; 0 where no gear is held. */
  gear: Uint8Array;
}

/**
 * Columns of the controls over a prepared route. A sample is on a stretch when its distance lies in
 * [startM, endM]; a step is on it when its midpoint does. Where stretches overlap, the lowest speed cap and the
 * later control's gear apply.
 * @param route prepared route
 * @param model resolved model (for each gear's speed at the rpm limit)
 * @param controls the controls (validated)
 * @returns the columns, or null when there are no controls
 * @example controlColumns(route, model, [{ startM: 3000, endM: 9000, gear: 2 }])?.gear[400] // 2
 */
export function controlColumns(
  route: PreparedRoute,
  model: ResolvedModel,
  controls: readonly RangeControl[] | undefined,
): ControlColumns | null {
  if (controls === undefined || controls.length === 0) return null;
  const n = route.n;
  const d = route.profile.distanceM;
  const speedCapMs = new Float64Array(n).fill(Infinity);
  const gear = new Uint8Array(n);
  for (const c of controls) {
    let cap = c.speedMs ?? Infinity;
    if (c.gear !== undefined) {
      const gearCap = fixedGearSpeedLimit(model, c.gear);
      if (gearCap < cap) cap = gearCap;
    }
    const first = lowerBound(d, c.startM);
    for (let i = first; i < n && (d[i] as number) <= c.endM; i++) {
      if (cap < (speedCapMs[i] as number)) speedCapMs[i] = cap;
    }
    if (c.gear === undefined) continue;
    for (let i = first > 0 ? first - 1 : 0; i + 1 < n; i++) {
      const mid = 0.5 * ((d[i] as number) + (d[i + 1] as number));
      if (mid > c.endM) break;
      if (mid >= c.startM) gear[i] = c.gear;
    }
  }
  return { speedCapMs, gear };
}

/** @private First index whose distance is ≥ x (binary search on a non-decreasing array). */
function lowerBound(d: Float64Array, x: number): number {
  let lo = 0;
  let hi = d.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((d[mid] as number) < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
