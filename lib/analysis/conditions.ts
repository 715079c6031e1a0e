import type { HeatRunOptions, ModelParamsInput } from "@/lib/thermal";
import { DEFAULT_PARAMS } from "@/lib/thermal";

/** A plan's conditions, as stored (SI units, °C). */
export interface PlanConditions {
  ambientC: number;
  /** Brake temperature at the start, °C; null = ambient. */
  startTempC: number | null;
  speedPolicy: "standard" | "cautious" | "cap";
  /** The one descent speed with the "cap" policy, m/s. */
  speedCapMs: number | null;
  drivingStyle: "steady" | "snub";
}

/** The "cautious" policy holds each of the standard descent tiers this much slower, m/s (10 km/h). */
export const CAUTIOUS_REDUCTION_MS = 10 / 3.6;
/**
 * Snub braking (CDL manual §2.16: brake to about 8 km/h below the chosen speed, release, repeat) rides a band
 * from the target down by 8 km/h, so its mean speed is taken 4 km/h below the target, m/s. The model's bulk
 * rotor temperature hardly depends on the style otherwise: the benefit of snub braking, the pad surface
 * recovering between applications, is finer than a lumped model resolves.
 */
export const SNUB_MEAN_REDUCTION_MS = 4 / 3.6;
const MIN_DESCENT_SPEED_MS = 10 / 3.6;

function descentTiers(c: PlanConditions) {
  const tiers = c.speedPolicy === "cap" && c.speedCapMs !== null
    ? DEFAULT_PARAMS.descentSpeeds.map((t) => ({ ...t, speedMs: Math.min(t.speedMs, c.speedCapMs!) })).concat([{ minDescentGrade: 0.02, speedMs: c.speedCapMs }])
    : DEFAULT_PARAMS.descentSpeeds.map((t) => ({ ...t, speedMs: t.speedMs - (c.speedPolicy === "cautious" ? CAUTIOUS_REDUCTION_MS : 0) }));
  const snub = c.drivingStyle === "snub" ? SNUB_MEAN_REDUCTION_MS : 0;
  return tiers.map((t) => ({ ...t, speedMs: Math.max(MIN_DESCENT_SPEED_MS, t.speedMs - snub) }));
}

/**
 * Turns a plan's conditions into the model's options; `extra` parameters (a what-if) override them.
 * @param conditions the plan's conditions
 * @param extra further parameter overrides
 * @returns heat-run options for lib/thermal
 * @example conditionsToOptions({ ambientC: 32, startTempC: null, speedPolicy: "standard", speedCapMs: null, drivingStyle: "steady" })
 */
export function conditionsToOptions(conditions: PlanConditions, extra: ModelParamsInput = {}): HeatRunOptions {
  return {
    params: {
      ambientC: conditions.ambientC,
      startTempC: conditions.startTempC,
      descentSpeeds: descentTiers(conditions),
      ...extra,
    },
  };
}
