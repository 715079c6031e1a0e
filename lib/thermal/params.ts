/**
 * Model parameters: every one can be overridden per heat run, and set to zero where the physics allows
 * (docs/model.md §13.1). Defaults are tagged as in docs/model.md (the provenance tags at its top).
 */

import type { PadFamily } from "./rig";
import {
  DEFAULT_PAD_THRESHOLDS,
  DEFAULT_VALIDITY_CEILINGS_C,
  DEFAULT_WATER_UPTAKE_PCT_PER_YEAR,
  type PadThresholds,
} from "./thresholds";
import { CAST_IRON_SPECIFIC_HEAT, CAST_IRON_SPECIFIC_HEAT_SLOPE, DEFAULT_EMISSIVITY } from "./constants";

/** Descent speed policy tier: on steps at least this steep downhill the driver holds at most this speed. */
export interface DescentSpeedTier {
  /** Descent grade magnitude from which the tier applies (dimensionless; 0.07 = 7 %). */
  minDescentGrade: number;
  /** Speed held on such steps, m/s. */
  speedMs: number;
}

/** How the descent gear is chosen. */
export type GearPolicy =
  /** Lowest gear that keeps the engine at or below the descent rpm limit at the held speed. */
  | { kind: "rpm-band" }
  /** A gear the user fixes for descents (1 = first gear); the held speed is capped at the rpm limit in it. */
  | { kind: "fixed"; gear: number };

/** Every model parameter of a heat run. */
export interface ModelParams {
  /** Ambient air temperature, °C. Default 25 [E]. */
  ambientC: number;
  /** Brake temperature at the start, °C; null = ambient. */
  startTempC: number | null;
  /** Multiplier on the convective conductance (hA_0 and a), dimensionless ≥ 0. Default 1 [E] (docs/model.md §6.1: ±50 %). */
  coolingFactor: number;
  /** Front share of the tow vehicle's service-brake work φ_f (0–1); null = the vehicle's, else 0.65 [E]. */
  frontShare: number | null;
  /** Trailer controller gain k_c (0–2); null = the trailer's, else by brake type (override 0.75, electric 1) [E]. */
  trailerGain: number | null;
  /**
   * Multiplier on every rotor and drum mass (dimensionless > 0). Default 1. Conduction into the hub and wheel
   * adds effective mass; catalogue masses vary; an uncertain parameter of the band (docs/model.md).
   */
  brakeMassScale: number;
  /** Validity ceiling of a disc's bulk temperature, °C; above it the step is `runaway`. Default 600. */
  ceilingDiscC: number;
  /** Validity ceiling of a drum's bulk temperature, °C; above it the step is `runaway`. Default 590. */
  ceilingDrumC: number;
  /**
   * Fade feedback: friction falls with temperature on the family's fade curve and a fading brake hands work
   * to the others (docs/model.md, "Fade feedback"). Default true; false gives model 1's fixed split.
   */
  fadeFeedback: boolean;
  /**
   * Cold capacity of the tow vehicle's service brakes, as a deceleration of its own mass, m/s². Default 6.43
   * [M] UN R13-H Annex 3 Type-0 laden minimum mean fully developed deceleration (a regulation floor, so a
   * conservative capacity). Past r × this the brakes cannot hold the speed (runaway).
   */
  towBrakeCapacityMs2: number;
  /**
   * Cold capacity of the trailer's brakes, as a deceleration of its own mass, m/s². Default 0.45 g = 4.41
   * [M] UN R13 Annex 4 minimum service braking of semi-trailers (45 % of the load on the wheels).
   */
  trailerBrakeCapacityMs2: number;
  /** Share of the friction heat entering the rotor or drum γ (0–1). Default 0.9 [M] *Brake Design and Safety* (SAE, 1999) ch. 3 (docs/model.md §5.5). */
  rotorPartition: number;
  /** Drag area of the whole combination, m²; null = vehicle CdA + trailer added CdA. */
  cdaM2: number | null;
  /** Rolling-resistance coefficient; null = the vehicle's or its class default. */
  rollingResistance: number | null;
  /** Multiplier on the modelled engine braking, dimensionless ≥ 0. Default 1. */
  engineBrakingScale: number;
  /** Fixed engine retarding power at the wheels when moving, W; null = the motoring model. */
  engineBrakingPowerW: number | null;
  /** Motoring-power multiplier with an exhaust brake. Default 1.5 [E] (docs/model.md §3: adds ≈ 50–100 %). */
  exhaustBrakeFactor: number;
  /** Engine-braking multiplier of an automatic with the converter unlocked. Default 0.35 [E]. */
  converterUnlockedFactor: number;
  /** Driveline efficiency (0–1]; retarding power at the wheels = engine power / efficiency. Default 0.92 [M]. */
  drivelineEfficiency: number;
  /** Rotating-inertia factor δ, m_eff = m·(1 + δ). Default 0.04 [M] vehicle-dynamics textbooks (0.03–0.05). */
  rotatingMassFactor: number;
  /** Emissivity of the brake surfaces (0–1). Default 0.55 [M] docs/model.md §6.2. */
  emissivity: number;
  /** Wheel-and-arch enclosure factor on standstill cooling (0–1). Default 0.85 [E] docs/model.md §6.3 (0.7–1.0). */
  standstillFactor: number;
  /** Specific heat of the rotors and drums at 20 °C, J/(kg·K). Default 460 [M] docs/model.md §6.4. */
  specificHeat: number;
  /** Rise of the specific heat per K, J/(kg·K²), used when {@link variableSpecificHeat}. Default 0.4 [M] docs/model.md §6.4. */
  specificHeatSlope: number;
  /** Use c(T) instead of a constant c (a constant c is conservative). Default false. */
  variableSpecificHeat: boolean;
  /** Lateral acceleration the driver accepts in curves, m/s²: v = √(a·R). Default 2.0 [E]. */
  lateralAccelMs2: number;
  /** Deceleration when slowing for curves, descents and stops, m/s². Default 1.5 [E]. */
  decelMs2: number;
  /** Acceleration when speeding up, m/s². Default 0.5 [E] (a heavy rig). */
  accelMs2: number;
  /** The driver's cruise cap, m/s. Default 90 km/h [E]. */
  cruiseSpeedMs: number;
  /** Towing speed limit, m/s (only with a trailer). Default 100 km/h [src-ish] docs/trade-facts.md §4.1 (WA, NSW > 4.5 t). */
  towingSpeedLimitMs: number;
  /** Descent speed policy, tiers in any order. Default 4 % → 70, 7 % → 55, 10 % → 45 km/h [E]. */
  descentSpeeds: readonly DescentSpeedTier[];
  /**
   * Fastest speed held in low range, m/s: a low-range gear caps the held speed here. Default 40 km/h (low
   * range is for slow, steep going; common practice, no published source).
   */
  lowRangeMaxSpeedMs: number;
  /** Descent gear policy. Default rpm band. */
  gearPolicy: GearPolicy;
  /** Descent rpm limit, rev/min; null = by fuel (diesel 3,800, petrol 4,500 [E]) unless the engine gives one. */
  maxRpm: number | null;
  /** Fluid-proxy gain k_f (0–1). Default 0.4 [E] docs/model.md §8 (0.3–0.5). Unvalidated. */
  fluidGain: number;
  /** Fluid-proxy time constant τ_f, s. Default 600 [E] docs/model.md §8 (5–15 min). Unvalidated. */
  fluidTimeConstantS: number;
  /** Water uptake of glycol fluids, %/year. Default 2 [2nd] docs/trade-facts.md §3.2. */
  waterUptakePctPerYear: number;
  /** Warm/hot thresholds per friction family, °C (estimates). */
  padThresholds: Readonly<Record<PadFamily, PadThresholds>>;
  /** Start the route from standstill. Default false (arrive at the first sample at the held speed). */
  startFromRest: boolean;
  /** End the route at standstill. Default false. */
  endAtRest: boolean;
}

/** User overrides: any subset of {@link ModelParams}; pad thresholds per family. */
export type ModelParamsInput = Partial<Omit<ModelParams, "padThresholds">> & {
  padThresholds?: Partial<Record<PadFamily, PadThresholds>>;
};

/** Default front share of the service-brake work φ_f. [E] docs/model.md §5.2 (0.55–0.75). */
export const DEFAULT_FRONT_SHARE = 0.65;

/** Default controller gain by trailer brake type. [E] docs/model.md §13.1 (override 0.5–1, uncertain). */
export const DEFAULT_TRAILER_GAIN = { none: 0, override: 0.75, electric: 1, "electric-over-hydraulic": 1 } as const;

/** Default descent rpm limit by fuel, rev/min. [E] docs/model.md §13.1 ("3,500–4,000") for diesels. */
export const DEFAULT_MAX_RPM = { diesel: 3800, petrol: 4500 } as const;

/** Default idle speed, rev/min. [E] */
export const DEFAULT_IDLE_RPM = 800;

/** The defaults of every model parameter. */
export const DEFAULT_PARAMS: Readonly<ModelParams> = {
  ambientC: 25,
  startTempC: null,
  coolingFactor: 1,
  frontShare: null,
  trailerGain: null,
  rotorPartition: 0.9,
  brakeMassScale: 1,
  fadeFeedback: true,
  towBrakeCapacityMs2: 6.43,
  trailerBrakeCapacityMs2: 0.45 * 9.80665,
  ceilingDiscC: DEFAULT_VALIDITY_CEILINGS_C.disc,
  ceilingDrumC: DEFAULT_VALIDITY_CEILINGS_C.drum,
  cdaM2: null,
  rollingResistance: null,
  engineBrakingScale: 1,
  engineBrakingPowerW: null,
  exhaustBrakeFactor: 1.5,
  converterUnlockedFactor: 0.35,
  drivelineEfficiency: 0.92,
  rotatingMassFactor: 0.04,
  emissivity: DEFAULT_EMISSIVITY,
  standstillFactor: 0.85,
  specificHeat: CAST_IRON_SPECIFIC_HEAT,
  specificHeatSlope: CAST_IRON_SPECIFIC_HEAT_SLOPE,
  variableSpecificHeat: false,
  lateralAccelMs2: 2,
  decelMs2: 1.5,
  accelMs2: 0.5,
  cruiseSpeedMs: 90 / 3.6,
  towingSpeedLimitMs: 100 / 3.6,
  descentSpeeds: [
    { minDescentGrade: 0.04, speedMs: 70 / 3.6 },
    { minDescentGrade: 0.07, speedMs: 55 / 3.6 },
    { minDescentGrade: 0.1, speedMs: 45 / 3.6 },
  ],
  lowRangeMaxSpeedMs: 40 / 3.6,
  gearPolicy: { kind: "rpm-band" },
  maxRpm: null,
  fluidGain: 0.4,
  fluidTimeConstantS: 600,
  waterUptakePctPerYear: DEFAULT_WATER_UPTAKE_PCT_PER_YEAR,
  padThresholds: DEFAULT_PAD_THRESHOLDS,
  startFromRest: false,
  endAtRest: false,
};

/**
 * Merge user overrides over the defaults (pad thresholds merged per family).
 * @param input overrides
 * @returns a full parameter set
 * @example mergeParams({ ambientC: 35 }).ambientC // 35
 */
export function mergeParams(input: ModelParamsInput = {}): ModelParams {
  const defined = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
  return {
    ...DEFAULT_PARAMS,
    ...defined,
    padThresholds: { ...DEFAULT_PAD_THRESHOLDS, ...(input.padThresholds ?? {}) },
  } as ModelParams;
}
