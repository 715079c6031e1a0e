/**
 * The speed the driver holds at each sample: the lowest of the cruise cap, the towing speed limit, the curve
 * speed √(a_lat·R), the descent speed policy (one speed per descent, by its steepest 1 km grade: the driver
 * picks a speed for the descent and keeps it, and a short dip that is not a descent does not slow the rig;
 * PreparedRoute.descentGrade), a fixed descent gear's rpm limit, the caps of any stretch controls
 * (range-controls.ts), and 0 at a cool-down stop; then
 * a forward pass (acceleration limit) and a backward pass (deceleration limit), v² changing by at most 2·a·Δs per
 * step. On constant-speed stretches there is no kinetic term, as in the FHWA grade severity rating system's
 * constant descent speed (docs/model.md §4).
 */

import { STANDARD_GRAVITY } from "./constants";
import { chooseDescentGear, engineRpm } from "./engine";
import type { PreparedRoute } from "./prepare-route";
import type { ControlColumns } from "./range-controls";
import type { ResolvedModel } from "./resolve";

/**
 * Least coasting deceleration at which a driver slowing down lifts off and coasts instead of braking, m/s²
 * [E]: about a 4 % climb with a heavy rig's rolling resistance. On flatter road the rig brakes at decelMs2.
 */
export const COAST_MIN_DECEL_MS2 = 0.5;

/** Slack on the tier grades (dimensionless): a grade built as exactly 7 % must reach the 7 % tier. */
export const GRADE_SLACK = 1e-9;

/**
 * Whether a sample lies on a descent the speed policy applies to (its descent grade at least as steep as the
 * gentlest tier).
 * @param grade the sample's descent grade (PreparedRoute.descentGrade), rise over run (negative downhill)
 * @param model resolved model
 * @returns true on a descent step
 * @example isDescentStep(-0.08, model) // true with the default tiers
 */
export function isDescentStep(grade: number, model: ResolvedModel): boolean {
  let gentlest = Infinity;
  for (const tier of model.params.descentSpeeds) {
    if (tier.minDescentGrade < gentlest) gentlest = tier.minDescentGrade;
  }
  return -grade >= gentlest - GRADE_SLACK;
}

/**
 * Target (held) speed at each sample before the acceleration limits.
 * @param route prepared route
 * @param model resolved model
 * @param stopS stop duration at each sample, s (> 0 marks a cool-down stop)
 * @param controls columns of the run's stretch controls, or null (default)
 * @returns target speed per sample, m/s
 * @example targetSpeeds(route, model, new Float64Array(route.n))
 */
export function targetSpeeds(
  route: PreparedRoute,
  model: ResolvedModel,
  stopS: Float64Array,
  controls: ControlColumns | null = null,
): Float64Array {
  const { params } = model;
  const n = route.n;
  const out = new Float64Array(n);
  let cap = params.cruiseSpeedMs;
  if (model.trailerKg > 0 && params.towingSpeedLimitMs < cap) cap = params.towingSpeedLimitMs;
  const tiers = params.descentSpeeds;
  const fixedGearCap =
    params.gearPolicy.kind === "fixed" ? fixedGearSpeedLimit(model, params.gearPolicy.gear) : Infinity;
  const radius = route.profile.curveRadiusM;
  const grade = route.descentGrade;
  const controlCap = controls === null ? null : controls.speedCapMs;
  for (let i = 0; i < n; i++) {
    let v = cap;
    const curve = Math.sqrt(params.lateralAccelMs2 * (radius[i] as number));
    if (curve < v) v = curve;
    const down = -(grade[i] as number);
    let descent = false;
    for (let t = 0; t < tiers.length; t++) {
      const tier = tiers[t];
      if (tier !== undefined && down >= tier.minDescentGrade - GRADE_SLACK) {
        descent = true;
        if (tier.speedMs < v) v = tier.speedMs;
      }
    }
    if (descent && fixedGearCap < v) v = fixedGearCap;
    if (controlCap !== null && (controlCap[i] as number) < v) v = controlCap[i] as number;
    if ((stopS[i] as number) > 0) v = 0;
    out[i] = v;
  }
  return out;
}

/**
 * Held speed at each sample: targets limited by a forward (acceleration) and a backward (deceleration) pass.
 * Gap steps carry no constraint.
 * @param route prepared route
 * @param model resolved model
 * @param stopS stop duration at each sample, s
 * @param controls columns of the run's stretch controls, or null (default)
 * @returns held speed per sample, m/s
 * @example heldSpeeds(route, model, new Float64Array(route.n))
 */
export function heldSpeeds(
  route: PreparedRoute,
  model: ResolvedModel,
  stopS: Float64Array,
  controls: ControlColumns | null = null,
): Float64Array {
  const { params } = model;
  const v = targetSpeeds(route, model, stopS, controls);
  const n = route.n;
  const gap = route.profile.gapAfter;
  const twoA = 2 * params.accelMs2;
  const twoD = 2 * params.decelMs2;
  if (params.startFromRest) v[0] = 0;
  if (params.endAtRest) v[n - 1] = 0;
  for (let i = 0; i + 1 < n; i++) {
    if (gap[i] === 1) continue;
    const vi = v[i] as number;
    const reach = Math.sqrt(vi * vi + twoA * (route.pathM[i] as number));
    if (reach < (v[i + 1] as number)) v[i + 1] = reach;
  }
  // Slowing down, the driver lets the road do what it can: where coasting alone (gravity on a climb, rolling
  // resistance and drag) slows the rig by at least COAST_MIN_DECEL_MS2, the driver lifts off earlier and
  // coasts down to the lower speed instead of braking (docs/model.md, "Held speed"); elsewhere the rig
  // brakes at decelMs2.
  const g = STANDARD_GRAVITY;
  const crrG = (params.rollingResistance ?? 0) * g;
  const dragPerV2 = (0.5 * (params.cdaM2 ?? 0)) / model.effectiveMassKg;
  for (let i = n - 2; i >= 0; i--) {
    if (gap[i] === 1) continue;
    const vn = v[i + 1] as number;
    const path = route.pathM[i] as number;
    let twoA = twoD;
    if (path > 0) {
      const coast = (-g * (route.dropM[i] as number) + crrG * (route.runM[i] as number)) / path +
        dragPerV2 * (route.densityKgM3[i] as number) * vn * vn;
      if (coast >= COAST_MIN_DECEL_MS2 && coast < params.decelMs2) twoA = 2 * coast;
    }
    const reach = Math.sqrt(vn * vn + twoA * path);
    if (reach < (v[i] as number)) v[i] = reach;
  }
  return v;
}

/**
 * Highest road speed in a fixed gear: the descent rpm limit, and in low range also the low-range speed cap.
 * @param model resolved model
 * @param gear 1-based gear (above model.highRangeGears: low range)
 * @returns speed, m/s
 * @example fixedGearSpeedLimit(model, 2) // ≈ 18.4 for the generic automatic at 3,800 rpm
 */
export function fixedGearSpeedLimit(model: ResolvedModel, gear: number): number {
  const ratio = model.overallRatios[gear - 1] ?? 1;
  const atRpm = (model.params.maxRpm ?? 0) / engineRpm(1, ratio, model.tyreDiameterM);
  return gear > model.highRangeGears && model.params.lowRangeMaxSpeedMs < atRpm ? model.params.lowRangeMaxSpeedMs : atRpm;
}

/** A low-range gear is chosen over high range only if its ratio is at least this much larger (dimensionless). */
const LOW_RANGE_GAIN = 1.15;

/**
 * The gear a driver would hold for a speed on a descent: the lowest high-range gear within the rpm limit; at
 * or below the low-range speed cap, a low-range gear instead when it is clearly lower (its overall ratio at
 * least 15 % larger, so it brakes noticeably more; otherwise changing range is not worth it).
 * @param model resolved model
 * @param speedMs held speed, m/s
 * @param lowRange whether a low-range gear may be chosen (default true)
 * @returns 1-based gear (above model.highRangeGears: low range)
 * @example descentGear(model, 10 / 3.6) // 7 (low range, 1st) for a 6-speed with a low range
 */
export function descentGear(model: ResolvedModel, speedMs: number, lowRange = true): number {
  const { overallRatios: ratios, highRangeGears: G, tyreDiameterM: d } = model;
  const maxRpm = model.params.maxRpm ?? 0;
  const high = chooseDescentGear(speedMs, ratios.slice(0, G), d, maxRpm);
  if (!lowRange || ratios.length <= G || speedMs > model.params.lowRangeMaxSpeedMs + 1e-9) return high + 1;
  const low = chooseDescentGear(speedMs, ratios.slice(G), d, maxRpm);
  const lowRatio = ratios[G + low] as number;
  const fits = engineRpm(speedMs, lowRatio, d) <= maxRpm;
  return fits && lowRatio >= LOW_RANGE_GAIN * (ratios[high] as number) ? G + low + 1 : high + 1;
}
