/**
 * lib/thermal — the pure, isomorphic brake-heat model of Fadeline (docs/model.md). The single public import
 * point: `import { runHeatRun } from "@/lib/thermal"`. SI inside; temperatures in °C (names ending in C).
 */

export * from "./constants";
export * from "./units";
export type * from "./rig";
export * from "./presets";
export * from "./masses";
export { isaAirDensity } from "./air";
export { aeroDragForce, rollingResistanceForce, gradeForce } from "./road-load";
export {
  DYNAMIC_RADIUS_FACTOR,
  motoringFmepPa,
  motoringPowerW,
  engineRpm,
  chooseDescentGear,
  engineBrakingWheelPowerW,
} from "./engine";
export {
  convectiveConductance,
  radiationCoefficient,
  specificHeat,
  brakeConductanceScale,
  radiatingAreaM2,
} from "./cooling";
export { exactStepC, timeToReachC } from "./exact-step";
export { nearestIndex } from "./nearest-index";
export { heatPartitionRotor, splitRetardingWork, type MaterialProperties } from "./partition";
export { FLUID_PROXY_LABEL, fluidProxyStepC } from "./fluid";
export * from "./thresholds";
export { FADE_CURVE_LABEL, FADE_SHAPES, fadeCurveFor, frictionRatio, type FadeCurve, type FadeShape } from "./fade";
export * from "./params";
export { resolveModel, gearName, type BrakePosition, type BrakePositionSpec, type FluidSpec, type ResolvedModel } from "./resolve";
export {
  standstillConductanceWK,
  coolBrakeAtStandstill,
  timeToCoolAtStandstillS,
  coolStateAtStandstill,
  standstillTimeToReach,
  type ThermalState,
} from "./standstill";
export { prepareRoute, type PreparedRoute } from "./prepare-route";
export { sliceRoute, coarsenRoute } from "./route-pieces";
export { controlColumns, type ControlColumns, type RangeControl } from "./range-controls";
export { targetSpeeds, heldSpeeds, isDescentStep, fixedGearSpeedLimit, descentGear, GRADE_SLACK } from "./speed-profile";
export type { HeatTrace, StepEnergies } from "./trace";
export {
  runHeatRun,
  runConvoyHeatRuns,
  runPrepared,
  initialState,
  stopDurations,
  type CoolDownStop,
  type HeatRunOptions,
  type HeatRunResult,
} from "./heat-run";
export {
  summarizeDescents,
  type DescentRange,
  type DescentSummary,
  type EnergyAccount,
  type PositionSummary,
} from "./summary";
export { validateRig } from "./validate-rig";
export { validateRouteProfile, validateHeatRunOptions } from "./validate-run";
export {
  BAND_BRAKE_MASS,
  BAND_COOLING_FACTOR,
  BAND_ENGINE_BRAKING,
  BAND_FRONT_SHARE,
  BAND_RANGES,
  BAND_ROTOR_PARTITION,
  BAND_TRAILER_GAIN,
  DEFAULT_BAND_SETTINGS,
  bandMemberParams,
  latinHypercube,
  peakBand,
  runBand,
  type BandParameter,
  type BandRange,
  type BandSettings,
  type HeatBand,
  type PeakBand,
} from "./ensemble";
export {
  calibrate,
  DEFAULT_CALIBRATION_SETTINGS,
  type BrakeReading,
  type CalibratedParameter,
  type CalibratedReading,
  type CalibrationResult,
  type CalibrationSettings,
  type FlaggedReading,
} from "./calibrate";
