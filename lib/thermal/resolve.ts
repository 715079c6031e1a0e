/**
 * Resolve a rig and parameter overrides into the concrete numbers a heat run uses: "every parameter used",
 * returned with each result so a run can be reproduced and audited.
 */

import { brakeConductanceScale, radiatingAreaM2 } from "./cooling";
import { REFERENCE_HA0_W_PER_K, REFERENCE_HA_SLOPE } from "./constants";
import { rigMasses } from "./masses";
import {
  DEFAULT_FRONT_SHARE,
  DEFAULT_IDLE_RPM,
  DEFAULT_MAX_RPM,
  DEFAULT_TRAILER_GAIN,
  mergeParams,
  type ModelParams,
  type ModelParamsInput,
} from "./params";
import { BODY_CLASS_DEFAULTS, GENERIC_TRANSMISSIONS } from "./presets";
import type { BrakeFluid, FluidClass, PadFamily, Rig, Transmission, TrailerBrakeType, WheelBrake } from "./rig";
import { FMVSS_116_BOILING_POINTS, fluidBoilingPointC, fluidWaterContentPct, type PadThresholds } from "./thresholds";

/** A braked wheel position. One representative wheel stands for all wheels at the position. */
export type BrakePosition = "front" | "rear" | "trailer";

/** Brake fluid at a position, with its boiling points. */
export interface FluidSpec {
  /** Fluid class. */
  fluidClass: FluidClass;
  /** Years since change, years. */
  yearsSinceChange: number;
  /** FMVSS No. 116 dry minimum, °C. */
  dryC: number;
  /** FMVSS No. 116 wet minimum, °C. */
  wetC: number;
  /** Estimated water content, % by weight [E]. */
  waterPct: number;
  /** Estimated boiling point for the fluid's age, °C [E]. */
  boilC: number;
}

/** The resolved thermal description of one brake position. */
export interface BrakePositionSpec {
  /** Which position. */
  position: BrakePosition;
  /** Braked wheels at the position. */
  wheels: number;
  /** Brake hardware. */
  kind: WheelBrake["kind"];
  /** Outer diameter, m. */
  diameterM: number;
  /** Mass of one rotor or drum, kg. */
  massKg: number;
  /** Friction family. */
  padFamily: PadFamily;
  /** Convective conductance at standstill hA_0 (cooling factor applied), W/K. */
  standstillConductanceWK: number;
  /** Convective speed coefficient a (cooling factor applied), W/K per (m/s)^0.8. */
  conductanceSlopeWK: number;
  /** Radiating area, m². */
  radiatingAreaM2: number;
  /** Emissivity (dimensionless). */
  emissivity: number;
  /** Enclosure factor on standstill cooling (dimensionless). */
  standstillFactor: number;
  /** Specific heat at 20 °C, J/(kg·K). */
  specificHeat: number;
  /** Rise of the specific heat per K, J/(kg·K²); 0 = constant. */
  specificHeatSlope: number;
  /** Share of the friction heat entering the rotor or drum (dimensionless). */
  rotorPartition: number;
  /** Warm/hot thresholds, °C (estimates). */
  thresholds: PadThresholds;
  /** Validity ceiling of the bulk temperature, °C: at or above it the step is `runaway` (docs/model.md). */
  validityCeilingC: number;
  /** Hydraulic fluid at this position, or null (electric drums, mechanical override). */
  fluid: FluidSpec | null;
}

/** Everything a heat run uses, concrete. */
export interface ResolvedModel {
  /** The parameters, with every null default resolved. */
  params: ModelParams;
  /** Combination mass, kg. */
  massKg: number;
  /** Trailer mass, kg (0 without a trailer). */
  trailerKg: number;
  /** Trailer mass / combination mass (dimensionless). */
  trailerMassShare: number;
  /** Effective mass for kinetic energy m·(1 + δ), kg. */
  effectiveMassKg: number;
  /** Trailer brake type ("none" without a trailer). */
  trailerBrakeType: TrailerBrakeType;
  /** Transmission used. */
  transmission: Transmission;
  /**
   * Gear × final-drive ratio per gear: the high-range gears, lowest first, then (with a low range) the same
   * gears in low range (× the low-range ratio). Gear g (1-based) above {@link highRangeGears} is low range,
   * gear g − highRangeGears (gearName in lib/thermal names it).
   */
  overallRatios: number[];
  /** Number of high-range gears (the first entries of {@link overallRatios}). */
  highRangeGears: number;
  /** Low-range ratio of the transfer case, or null without a low range. */
  lowRangeRatio: number | null;
  /** Tyre outer diameter, m. */
  tyreDiameterM: number;
  /** Engine swept volume, m³. */
  displacementM3: number;
  /** Idle speed, rev/min. */
  idleRpm: number;
  /** Exhaust-brake × converter × user multiplier on motoring power (dimensionless). */
  engineFactor: number;
  /**
   * The same multiplier with the converter locked (a gear held in manual mode; range-controls.ts): exhaust-brake
   * × user multiplier (dimensionless). Equals {@link engineFactor} for a manual or an already locked automatic.
   */
  lockedEngineFactor: number;
  /** Braked positions: front, rear, and trailer when it has brakes. */
  positions: BrakePositionSpec[];
}

/**
 * Resolve a rig and overrides into a {@link ResolvedModel}. Assumes a validated rig.
 * @param rig the rig
 * @param input parameter overrides
 * @returns the resolved model
 * @example resolveModel(UTE_AND_CARAVAN).massKg // 5360
 */
export function resolveModel(rig: Rig, input: ModelParamsInput = {}): ResolvedModel {
  const merged = mergeParams(input);
  const { vehicle, trailer } = rig;
  const masses = rigMasses(rig);
  const classDefaults = BODY_CLASS_DEFAULTS[vehicle.bodyClass];
  const trailerBrakeType: TrailerBrakeType = trailer ? trailer.brakeType : "none";
  const transmission = resolveTransmission(rig);
  const params: ModelParams = {
    ...merged,
    startTempC: merged.startTempC ?? merged.ambientC,
    frontShare: merged.frontShare ?? vehicle.frontBrakeShare ?? DEFAULT_FRONT_SHARE,
    trailerGain: merged.trailerGain ?? trailer?.controllerGain ?? DEFAULT_TRAILER_GAIN[trailerBrakeType],
    cdaM2: merged.cdaM2 ?? (vehicle.cdaM2 ?? classDefaults.cdaM2) + (trailer?.addedCdaM2 ?? 0),
    rollingResistance: merged.rollingResistance ?? vehicle.rollingResistance ?? classDefaults.rollingResistance,
    maxRpm: merged.maxRpm ?? vehicle.engine.maxRpm ?? DEFAULT_MAX_RPM[vehicle.engine.fuel],
  };
  const unlocked = transmission.kind === "automatic" && transmission.converterLocked !== true;
  const lockedEngineFactor =
    params.engineBrakingScale * (vehicle.engine.brakeMode === "exhaust-brake" ? params.exhaustBrakeFactor : 1);
  const engineFactor = lockedEngineFactor * (unlocked ? params.converterUnlockedFactor : 1);
  const positions: BrakePositionSpec[] = [
    positionSpec("front", 2, vehicle.frontBrakes, vehicle.padFamily, vehicle.brakeFluid, params),
    positionSpec("rear", 2, vehicle.rearBrakes, vehicle.padFamily, vehicle.brakeFluid, params),
  ];
  if (trailer && trailer.brakeType !== "none" && trailer.brakes && trailer.brakedAxles > 0) {
    const fluid =
      trailer.brakeType === "electric-over-hydraulic"
        ? (trailer.brakeFluid ?? { fluidClass: "DOT 3", yearsSinceChange: 2 })
        : null;
    positions.push(positionSpec("trailer", 2 * trailer.brakedAxles, trailer.brakes, "organic", fluid, params));
  }
  return {
    params,
    massKg: masses.combinationKg,
    trailerKg: masses.trailerKg,
    trailerMassShare: masses.trailerKg / masses.combinationKg,
    effectiveMassKg: masses.combinationKg * (1 + params.rotatingMassFactor),
    trailerBrakeType,
    transmission,
    overallRatios: overallRatiosOf(transmission),
    highRangeGears: transmission.gearRatios.length,
    lowRangeRatio: transmission.lowRangeRatio ?? null,
    tyreDiameterM: vehicle.tyreDiameterM,
    displacementM3: vehicle.engine.displacementM3,
    idleRpm: vehicle.engine.idleRpm ?? DEFAULT_IDLE_RPM,
    engineFactor,
    lockedEngineFactor,
    positions,
  };
}

/** @private High-range overall ratios, then the low-range ones when there is a low range. */
function overallRatiosOf(t: Transmission): number[] {
  const high = t.gearRatios.map((r) => r * t.finalDrive);
  return t.lowRangeRatio === undefined ? high : [...high, ...high.map((r) => r * (t.lowRangeRatio as number))];
}

/**
 * A gear's name in plain words: "2nd", or "low range, 2nd".
 * @param model resolved model
 * @param gear 1-based gear index into overallRatios
 * @returns the name
 * @example gearName(model, 8) // "low range, 2nd" for a 6-speed with a low range
 */
export function gearName(model: Pick<ResolvedModel, "highRangeGears">, gear: number): string {
  const low = gear > model.highRangeGears;
  const n = low ? gear - model.highRangeGears : gear;
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? "th" : n % 10 === 1 ? "st" : n % 10 === 2 ? "nd" : n % 10 === 3 ? "rd" : "th";
  return `${low ? "low range, " : ""}${n}${suffix}`;
}

/** @private The explicit transmission of a rig (a preset reference expanded). */
function resolveTransmission(rig: Rig): Transmission {
  const t = rig.vehicle.transmission;
  if ("preset" in t) {
    const base = GENERIC_TRANSMISSIONS[t.preset];
    const out: Transmission = { ...base, gearRatios: [...base.gearRatios], converterLocked: t.converterLocked ?? false };
    if (t.lowRangeRatio !== undefined) out.lowRangeRatio = t.lowRangeRatio;
    return out;
  }
  return { ...t, gearRatios: [...t.gearRatios], converterLocked: t.converterLocked ?? false };
}

/** @private One position's resolved spec. */
function positionSpec(
  position: BrakePosition,
  wheels: number,
  brake: WheelBrake,
  discPadFamily: PadFamily,
  fluid: BrakeFluid | null,
  params: ModelParams,
): BrakePositionSpec {
  const padFamily = brake.padFamily ?? (brake.kind === "drum" ? "drum-lining" : discPadFamily);
  const scale = brakeConductanceScale(brake.kind, brake.diameterM) * params.coolingFactor;
  return {
    position,
    wheels,
    kind: brake.kind,
    diameterM: brake.diameterM,
    massKg: brake.massKg * params.brakeMassScale,
    padFamily,
    standstillConductanceWK: REFERENCE_HA0_W_PER_K * scale,
    conductanceSlopeWK: REFERENCE_HA_SLOPE * scale,
    radiatingAreaM2: radiatingAreaM2(brake.kind, brake.diameterM),
    emissivity: params.emissivity,
    standstillFactor: params.standstillFactor,
    specificHeat: params.specificHeat,
    specificHeatSlope: params.variableSpecificHeat ? params.specificHeatSlope : 0,
    rotorPartition: params.rotorPartition,
    thresholds: { ...params.padThresholds[padFamily] },
    validityCeilingC: brake.kind === "drum" ? params.ceilingDrumC : params.ceilingDiscC,
    fluid: fluid ? fluidSpec(fluid, params.waterUptakePctPerYear) : null,
  };
}

/** @private A fluid with its boiling points. */
function fluidSpec(fluid: BrakeFluid, uptakePctPerYear: number): FluidSpec {
  const { dryC, wetC } = FMVSS_116_BOILING_POINTS[fluid.fluidClass];
  return {
    fluidClass: fluid.fluidClass,
    yearsSinceChange: fluid.yearsSinceChange,
    dryC,
    wetC,
    waterPct: fluidWaterContentPct(fluid.fluidClass, fluid.yearsSinceChange, uptakePctPerYear),
    boilC: fluidBoilingPointC(fluid.fluidClass, fluid.yearsSinceChange, uptakePctPerYear),
  };
}
