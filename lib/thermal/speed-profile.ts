/**
 * The speed the driver holds at each sample: the lowest of the cruise cap, the towing speed limit, the curve
 * speed √(a_lat·R), the descent speed policy, a fixed descent gear's rpm limit, the caps of any stretch controls
 * (range-controls.ts), and 0 at a cool-down stop; then
 * a forward pass (acceleration limit) and a backward pass (deceleration limit), v² changing by at most 2·a·Δs per
 * step. On constant-speed stretches there is no kinetic term, as in the FHWA grade severity rating system's
 * constant descent speed (thermal-model.md §1.2).
 */

import { engineRpm } from "./engine";
import type { PreparedRoute } from "./prepare-route";
import type { ControlColumns } from "./range-controls";
import type { ResolvedModel } from "./resolve";

/**
 * Whether a step is a descent step of the speed policy (at least as steep as its gentlest tier).
 * @param grade step grade, rise over run (negative downhill)
 * @param model resolved model
 * @returns true on a descent step
 * @example isDescentStep(-0.08, model) // true with the default tiers
 */
export function isDescentStep(grade: number, model: ResolvedModel): boolean {
  let gentlest = Infinity;
  for (const tier of model.params.descentSpeeds) {
    if (tier.minDescentGrade < gentlest) gentlest = tier.minDescentGrade;
  }
  return -grade >= gentlest;
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
  const grade = route.profile.grade;
  const controlCap = controls === null ? null : controls.speedCapMs;
  for (let i = 0; i < n; i++) {
    let v = cap;
    const curve = Math.sqrt(params.lateralAccelMs2 * (radius[i] as number));
    if (curve < v) v = curve;
    const down = -(grade[i] as number);
    let descent = false;
    for (let t = 0; t < tiers.length; t++) {
      const tier = tiers[t];
      if (tier !== undefined && down >= tier.minDescentGrade) {
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
  for (let i = n - 2; i >= 0; i--) {
    if (gap[i] === 1) continue;
    const vn = v[i + 1] as number;
    const reach = Math.sqrt(vn * vn + twoD * (route.pathM[i] as number));
    if (reach < (v[i] as number)) v[i] = reach;
  }
  return v;
}

/**
 * Highest road speed in a fixed gear at the descent rpm limit.
 * @param model resolved model
 * @param gear 1-based gear
 * @returns speed, m/s
 * @example fixedGearSpeedLimit(model, 2) // ≈ 18.4 for the generic automatic at 3,800 rpm
 */
export function fixedGearSpeedLimit(model: ResolvedModel, gear: number): number {
  const ratio = model.overallRatios[gear - 1] ?? 1;
  return (model.params.maxRpm ?? 0) / engineRpm(1, ratio, model.tyreDiameterM);
}
