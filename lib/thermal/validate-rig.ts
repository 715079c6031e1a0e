/** Guard clauses for a {@link Rig} at the model entry (exact messages; tests assert them). */

import {
  requireBetween,
  requireInteger,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "./guards";
import type { Rig } from "./rig";

const BRAKE_KINDS = ["vented-disc", "solid-disc", "drum"] as const;
const PAD_FAMILIES = ["organic", "ceramic", "semi-metallic", "drum-lining"] as const;
const FLUID_CLASSES = ["DOT 3", "DOT 4", "DOT 5.1", "DOT 5"] as const;
const PRESETS = ["generic-6-speed-automatic", "generic-6-speed-manual"] as const;

/**
 * Check a rig; throw TypeError or RangeError with an exact message on the first problem.
 * @param rig the rig to check (unknown input)
 * @returns the rig, typed
 * @throws {TypeError} a field has the wrong type, e.g. "rig.vehicle must be an object"
 * @throws {RangeError} a value is impossible, e.g. "rig.vehicle.gvmKg must be greater than 0"
 * @example validateRig(UTE_AND_CARAVAN)
 */
export function validateRig(rig: unknown): Rig {
  const r = requireObject(rig, "rig");
  validateVehicle(requireObject(r.vehicle, "rig.vehicle"));
  if (r.trailer !== undefined) validateTrailer(requireObject(r.trailer, "rig.trailer"));
  validateLoad(requireObject(r.load, "rig.load"));
  return rig as Rig;
}

/** @private */
function validateVehicle(v: Record<string, unknown>): void {
  const p = "rig.vehicle";
  requireOneOf(v.bodyClass, `${p}.bodyClass`, ["ute", "wagon"]);
  const empty = requirePositive(v.emptyMassKg, `${p}.emptyMassKg`);
  requireOneOf(v.emptyMassDefinition, `${p}.emptyMassDefinition`, ["tare", "kerb", "running-order"]);
  const gvm = requirePositive(v.gvmKg, `${p}.gvmKg`);
  if (gvm <= empty) throw new RangeError(`${p}.gvmKg must be greater than ${p}.emptyMassKg`);
  if (requirePositive(v.gcmKg, `${p}.gcmKg`) < gvm) throw new RangeError(`${p}.gcmKg must not be less than ${p}.gvmKg`);
  if (v.frontAxleRatingKg !== undefined) requirePositive(v.frontAxleRatingKg, `${p}.frontAxleRatingKg`);
  if (v.rearAxleRatingKg !== undefined) requirePositive(v.rearAxleRatingKg, `${p}.rearAxleRatingKg`);
  requireNonNegative(v.towingCapacityKg, `${p}.towingCapacityKg`);
  requireNonNegative(v.towBallLimitKg, `${p}.towBallLimitKg`);
  validateWheelBrake(v.frontBrakes, `${p}.frontBrakes`);
  validateWheelBrake(v.rearBrakes, `${p}.rearBrakes`);
  requireOneOf(v.padFamily, `${p}.padFamily`, PAD_FAMILIES);
  validateFluid(v.brakeFluid, `${p}.brakeFluid`);
  requireBetween(v.tyreDiameterM, `${p}.tyreDiameterM`, 0.4, 1.5);
  validateEngine(requireObject(v.engine, `${p}.engine`));
  validateTransmission(requireObject(v.transmission, `${p}.transmission`));
  if (v.cdaM2 !== undefined) requireBetween(v.cdaM2, `${p}.cdaM2`, 0, 10);
  if (v.rollingResistance !== undefined) requireBetween(v.rollingResistance, `${p}.rollingResistance`, 0, 0.1);
  if (v.frontBrakeShare !== undefined) requireBetween(v.frontBrakeShare, `${p}.frontBrakeShare`, 0, 1);
}

/** @private */
function validateWheelBrake(value: unknown, p: string): void {
  const b = requireObject(value, p);
  requireOneOf(b.kind, `${p}.kind`, BRAKE_KINDS);
  requireBetween(b.diameterM, `${p}.diameterM`, 0.1, 0.6);
  requirePositive(b.massKg, `${p}.massKg`);
  if (b.padFamily !== undefined) requireOneOf(b.padFamily, `${p}.padFamily`, PAD_FAMILIES);
}

/** @private */
function validateFluid(value: unknown, p: string): void {
  const f = requireObject(value, p);
  requireOneOf(f.fluidClass, `${p}.fluidClass`, FLUID_CLASSES);
  requireBetween(f.yearsSinceChange, `${p}.yearsSinceChange`, 0, 50);
}

/** @private */
function validateEngine(e: Record<string, unknown>): void {
  const p = "rig.vehicle.engine";
  if (requirePositive(e.displacementM3, `${p}.displacementM3`) > 0.02) {
    throw new RangeError(`${p}.displacementM3 must be at most 0.02 (cubic metres: 2.8 L is 0.0028)`);
  }
  requireOneOf(e.fuel, `${p}.fuel`, ["diesel", "petrol"]);
  requireOneOf(e.brakeMode, `${p}.brakeMode`, ["motoring", "exhaust-brake"]);
  const max = e.maxRpm === undefined ? Infinity : requirePositive(e.maxRpm, `${p}.maxRpm`);
  if (e.idleRpm !== undefined && requirePositive(e.idleRpm, `${p}.idleRpm`) >= max) {
    throw new RangeError(`${p}.idleRpm must be less than ${p}.maxRpm`);
  }
}

/** @private */
function validateTransmission(t: Record<string, unknown>): void {
  const p = "rig.vehicle.transmission";
  if (t.lowRangeRatio !== undefined) requireBetween(t.lowRangeRatio, `${p}.lowRangeRatio`, 1.2, 5);
  if (t.preset !== undefined) {
    requireOneOf(t.preset, `${p}.preset`, PRESETS);
    return;
  }
  requireOneOf(t.kind, `${p}.kind`, ["manual", "automatic"]);
  const ratios = t.gearRatios;
  if (!Array.isArray(ratios) || ratios.length === 0) {
    throw new TypeError(`${p}.gearRatios must be a non-empty array`);
  }
  ratios.forEach((r, i) => requirePositive(r, `${p}.gearRatios[${i}]`));
  requirePositive(t.finalDrive, `${p}.finalDrive`);
}

/** @private */
function validateTrailer(t: Record<string, unknown>): void {
  const p = "rig.trailer";
  requireOneOf(t.kind, `${p}.kind`, ["caravan", "camper", "other"]);
  const tare = requirePositive(t.tareKg, `${p}.tareKg`);
  const atm = requirePositive(t.atmKg, `${p}.atmKg`);
  if (atm < tare) throw new RangeError(`${p}.atmKg must not be less than ${p}.tareKg`);
  if (t.gtmKg !== undefined && requirePositive(t.gtmKg, `${p}.gtmKg`) > atm) {
    throw new RangeError(`${p}.gtmKg must not be more than ${p}.atmKg`);
  }
  const axles = requireInteger(t.axles, `${p}.axles`, 1, 4);
  const type = requireOneOf(t.brakeType, `${p}.brakeType`, ["none", "override", "electric", "electric-over-hydraulic"]);
  const braked = requireInteger(t.brakedAxles, `${p}.brakedAxles`, 0, axles);
  if (type === "none" && braked !== 0) throw new RangeError(`${p}.brakedAxles must be 0 when ${p}.brakeType is none`);
  if (type !== "none") {
    if (braked === 0) throw new RangeError(`${p}.brakedAxles must be at least 1 when the trailer has brakes`);
    if (t.brakes === undefined) throw new TypeError(`${p}.brakes is required when the trailer has brakes`);
    validateWheelBrake(t.brakes, `${p}.brakes`);
  }
  if (t.controllerGain !== undefined) requireBetween(t.controllerGain, `${p}.controllerGain`, 0, 2);
  requireOneOf(t.breakaway, `${p}.breakaway`, ["none", "electric", "cable"]);
  requireBetween(t.addedCdaM2, `${p}.addedCdaM2`, 0, 10);
  if (t.brakeFluid !== undefined) validateFluid(t.brakeFluid, `${p}.brakeFluid`);
}

/** @private */
function validateLoad(l: Record<string, unknown>): void {
  const p = "rig.load";
  requireNonNegative(l.occupantsKg, `${p}.occupantsKg`);
  requireNonNegative(l.vehiclePayloadKg, `${p}.vehiclePayloadKg`);
  requireNonNegative(l.trailerLoadKg, `${p}.trailerLoadKg`);
  if (l.towBall !== undefined) {
    const b = requireObject(l.towBall, `${p}.towBall`);
    requireNonNegative(b.massKg, `${p}.towBall.massKg`);
    requireOneOf(b.source, `${p}.towBall.source`, ["measured", "estimate"]);
  }
  if (l.measuredAxleKg !== undefined) {
    const a = requireObject(l.measuredAxleKg, `${p}.measuredAxleKg`);
    requirePositive(a.front, `${p}.measuredAxleKg.front`);
    requirePositive(a.rear, `${p}.measuredAxleKg.rear`);
  }
}
