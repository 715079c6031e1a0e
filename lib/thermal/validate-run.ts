/** Guard clauses for the route profile and the heat-run options (exact messages; tests assert them). */

import type { RouteProfile } from "@/lib/route/types";
import {
  requireBetween,
  requireBoolean,
  requireFinite,
  requireInteger,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "./guards";
import type { HeatRunOptions } from "./heat-run";
import { GENERIC_TRANSMISSIONS } from "./presets";
import type { Rig } from "./rig";

const FLOAT_COLUMNS = ["distanceM", "lat", "lon", "elevationM", "grade", "curveRadiusM"] as const;

/**
 * Check a route profile: typed columns of one length n ≥ 2, finite values, non-decreasing distance, curve radii
 * > 0 (Infinity on straights).
 * @param profile the profile (unknown input)
 * @returns the profile, typed
 * @throws {TypeError} e.g. "profile.grade must be a Float64Array"
 * @throws {RangeError} e.g. "profile.distanceM must be non-decreasing (sample 5)"
 * @example validateRouteProfile(profile)
 */
export function validateRouteProfile(profile: unknown): RouteProfile {
  const p = requireObject(profile, "profile");
  requirePositive(p.stepM, "profile.stepM");
  for (const name of FLOAT_COLUMNS) {
    if (!(p[name] instanceof Float64Array)) throw new TypeError(`profile.${name} must be a Float64Array`);
  }
  if (!(p.gapAfter instanceof Uint8Array)) throw new TypeError("profile.gapAfter must be a Uint8Array");
  const r = profile as RouteProfile;
  const n = r.distanceM.length;
  if (n < 2) throw new RangeError("profile must have at least 2 samples");
  for (const name of [...FLOAT_COLUMNS, "gapAfter"] as const) {
    if (r[name].length !== n) throw new RangeError(`profile.${name} must have the same length as profile.distanceM`);
  }
  const { distanceM: d, elevationM: e, grade: g, curveRadiusM: c } = r;
  for (let i = 0; i < n; i++) {
    const di = d[i] as number;
    if (!Number.isFinite(di)) throw new RangeError(`profile.distanceM must be finite (sample ${i})`);
    if (i > 0 && di < (d[i - 1] as number)) throw new RangeError(`profile.distanceM must be non-decreasing (sample ${i})`);
    if (!Number.isFinite(e[i] as number)) throw new RangeError(`profile.elevationM must be finite (sample ${i})`);
    if (!Number.isFinite(g[i] as number)) throw new RangeError(`profile.grade must be finite (sample ${i})`);
    if (!((c[i] as number) > 0)) throw new RangeError(`profile.curveRadiusM must be greater than 0 (sample ${i})`);
  }
  return r;
}

/**
 * Check heat-run options against a (validated) rig.
 * @param options the options (unknown input)
 * @param rig the rig (for the fixed-gear range)
 * @returns the options, typed
 * @throws {TypeError|RangeError} e.g. "options.params.frontShare must be between 0 and 1"
 * @example validateHeatRunOptions({ params: { ambientC: 35 } }, rig)
 */
export function validateHeatRunOptions(options: unknown, rig: Rig): HeatRunOptions {
  const o = requireObject(options, "options");
  if (o.params !== undefined) validateParams(requireObject(o.params, "options.params"), rig);
  if (o.stops !== undefined) {
    if (!Array.isArray(o.stops)) throw new TypeError("options.stops must be an array");
    o.stops.forEach((s: unknown, i: number) => {
      const stop = requireObject(s, `options.stops[${i}]`);
      requireFinite(stop.atM, `options.stops[${i}].atM`);
      requireNonNegative(stop.durationS, `options.stops[${i}].durationS`);
    });
  }
  if (o.controls !== undefined) validateControls(o.controls, rig);
  if (o.startState !== undefined) {
    const s = requireObject(o.startState, "options.startState");
    if (!Array.isArray(s.rotorC) || !Array.isArray(s.fluidC)) {
      throw new TypeError("options.startState.rotorC and options.startState.fluidC must be arrays");
    }
    s.rotorC.forEach((t: unknown, i: number) => requireBetween(t, `options.startState.rotorC[${i}]`, -60, 1200));
  }
  return options as HeatRunOptions;
}

/** @private Stretch controls: a finite stretch, a positive speed cap, a gear of the rig's transmission. */
function validateControls(controls: unknown, rig: Rig): void {
  if (!Array.isArray(controls)) throw new TypeError("options.controls must be an array");
  controls.forEach((c: unknown, i: number) => {
    const name = `options.controls[${i}]`;
    const control = requireObject(c, name);
    const startM = requireFinite(control.startM, `${name}.startM`);
    if (requireFinite(control.endM, `${name}.endM`) <= startM) {
      throw new RangeError(`${name}.endM must be greater than ${name}.startM`);
    }
    if (control.speedMs !== undefined) requirePositive(control.speedMs, `${name}.speedMs`);
    if (control.gear !== undefined) requireInteger(control.gear, `${name}.gear`, 1, gearCount(rig));
  });
}

/** @private Ranges of the numeric parameters: [min, max] (inclusive). */
const RANGES: Readonly<Record<string, readonly [number, number]>> = {
  ambientC: [-50, 60],
  startTempC: [-50, 1000],
  coolingFactor: [0, 10],
  frontShare: [0, 1],
  trailerGain: [0, 2],
  rotorPartition: [0, 1],
  brakeMassScale: [0.1, 5],
  towBrakeCapacityMs2: [0.5, 15],
  trailerBrakeCapacityMs2: [0.5, 15],
  ceilingDiscC: [100, 1200],
  ceilingDrumC: [100, 1200],
  cdaM2: [0, 20],
  rollingResistance: [0, 0.1],
  engineBrakingScale: [0, 10],
  engineBrakingPowerW: [0, 1e6],
  exhaustBrakeFactor: [0, 5],
  converterUnlockedFactor: [0, 1],
  drivelineEfficiency: [0.01, 1],
  rotatingMassFactor: [0, 0.5],
  emissivity: [0, 1],
  standstillFactor: [0, 1],
  specificHeatSlope: [0, 5],
  fluidGain: [0, 1],
  waterUptakePctPerYear: [0, 20],
};

/** @private Parameters that must be > 0. */
const POSITIVE = [
  "specificHeat", "lateralAccelMs2", "decelMs2", "accelMs2", "cruiseSpeedMs", "towingSpeedLimitMs", "maxRpm",
  "fluidTimeConstantS", "lowRangeMaxSpeedMs",
] as const;

/** @private */
function validateParams(p: Record<string, unknown>, rig: Rig): void {
  const at = (k: string): string => `options.params.${k}`;
  for (const [k, [min, max]] of Object.entries(RANGES)) {
    if (p[k] !== undefined && p[k] !== null) requireBetween(p[k], at(k), min, max);
  }
  for (const k of POSITIVE) if (p[k] !== undefined && p[k] !== null) requirePositive(p[k], at(k));
  for (const k of ["variableSpecificHeat", "startFromRest", "endAtRest", "fadeFeedback"]) {
    if (p[k] !== undefined) requireBoolean(p[k], at(k));
  }
  if (p.descentSpeeds !== undefined) {
    if (!Array.isArray(p.descentSpeeds)) throw new TypeError(`${at("descentSpeeds")} must be an array`);
    p.descentSpeeds.forEach((t: unknown, i: number) => {
      const tier = requireObject(t, `${at("descentSpeeds")}[${i}]`);
      requireBetween(tier.minDescentGrade, `${at("descentSpeeds")}[${i}].minDescentGrade`, 0, 1);
      requirePositive(tier.speedMs, `${at("descentSpeeds")}[${i}].speedMs`);
    });
  }
  if (p.gearPolicy !== undefined) {
    const g = requireObject(p.gearPolicy, at("gearPolicy"));
    if (requireOneOf(g.kind, `${at("gearPolicy")}.kind`, ["rpm-band", "fixed"]) === "fixed") {
      requireInteger(g.gear, `${at("gearPolicy")}.gear`, 1, gearCount(rig));
    }
  }
  if (p.padThresholds !== undefined) validateThresholds(requireObject(p.padThresholds, at("padThresholds")));
}

/** @private */
function validateThresholds(t: Record<string, unknown>): void {
  for (const [family, value] of Object.entries(t)) {
    const name = `options.params.padThresholds.${family}`;
    requireOneOf(family, name, ["organic", "ceramic", "semi-metallic", "drum-lining"]);
    const th = requireObject(value, name);
    const warm = requireBetween(th.warmC, `${name}.warmC`, 0, 1200);
    if (requireBetween(th.hotC, `${name}.hotC`, 0, 1200) < warm) {
      throw new RangeError(`${name}.hotC must not be less than ${name}.warmC`);
    }
  }
}

/** @private Number of gears of the rig's transmission. */
function gearCount(rig: Rig): number {
  const t = rig.vehicle.transmission;
  const high = "preset" in t ? GENERIC_TRANSMISSIONS[t.preset].gearRatios.length : t.gearRatios.length;
  return t.lowRangeRatio === undefined ? high : 2 * high;
}

