/**
 * Brake-setup comparison: the same rig with other brakes (rotor or drum mass, vented or solid,
 * pad family, fluid class and age) on the same route and conditions, side by side per descent: peak
 * temperature per position, driving time at or above the warm (caution) line, and the hot stopping distance at
 * the bottom beside the cold one. Estimates, like everything the model gives.
 */

import type { Descent, RouteProfile } from "@/lib/route";
import { hotColdStops, type HotColdStop } from "@/lib/stopping";
import {
  prepareRoute,
  runPrepared,
  validateRouteProfile,
  type BrakeFluid,
  type BrakePosition,
  type HeatRunOptions,
  type PadFamily,
  type PreparedRoute,
  type Rig,
  type WheelBrake,
} from "@/lib/thermal";
import { outcomeOf } from "./outcome";

/** Other brakes for a rig: any subset; unnamed parts stay as they are. */
export interface BrakeSetup {
  /** Front brakes (each wheel). */
  front?: Partial<WheelBrake>;
  /** Rear brakes (each wheel). */
  rear?: Partial<WheelBrake>;
  /** Trailer brakes (each braked wheel; ignored without trailer brakes). */
  trailer?: Partial<WheelBrake>;
  /** Pad family of the tow vehicle's discs. */
  padFamily?: PadFamily;
  /** Brake fluid of the tow vehicle. */
  brakeFluid?: Partial<BrakeFluid>;
}

/** One setup on one descent. */
export interface SetupFigures {
  /** Peak temperature per position and the brake's validity ceiling (docs/model.md, "Validity ceiling"), °C. */
  peaks: { position: BrakePosition; peakC: number; ceilingC: number }[];
  /** Driving time at or above the warm line per position, s. */
  timeWarmOrAboveS: { position: BrakePosition; seconds: number }[];
  /** Stopping distance at the bottom, hot beside cold, from 80 km/h and 50 mph. */
  stopping: HotColdStop[];
}

/** The comparison on one descent. */
export interface BrakeComparisonRow {
  /** Index into the route's descents, and the descent. */
  descentIndex: number;
  descent: Descent;
  /** The rig as it is, and with the other brakes. */
  base: SetupFigures;
  variant: SetupFigures;
}

/**
 * The rig with other brakes.
 * @param rig the rig
 * @param setup the other brakes
 * @returns a new rig (the input is not changed)
 * @example withBrakeSetup(rig, { front: { massKg: 13 }, padFamily: "semi-metallic" })
 */
export function withBrakeSetup(rig: Rig, setup: BrakeSetup): Rig {
  const v = rig.vehicle;
  const vehicle = {
    ...v,
    frontBrakes: { ...v.frontBrakes, ...setup.front },
    rearBrakes: { ...v.rearBrakes, ...setup.rear },
    padFamily: setup.padFamily ?? v.padFamily,
    brakeFluid: { ...v.brakeFluid, ...setup.brakeFluid },
  };
  const t = rig.trailer;
  const trailer = t && t.brakes && setup.trailer ? { ...t, brakes: { ...t.brakes, ...setup.trailer } } : t;
  return { ...rig, vehicle, ...(trailer ? { trailer } : {}) };
}

/**
 * Compare a rig with a variant on the same route and conditions.
 * @param input route, descents, the rig, the variant (a rig, or other brakes for the rig), conditions
 * @returns one row per descent
 * @example compareBrakeSetups({ route: profile, descents, rig, variant: { front: { massKg: 13 } } })[0].variant.peaks
 */
export function compareBrakeSetups(input: {
  route: RouteProfile | PreparedRoute;
  descents: readonly Descent[];
  rig: Rig;
  variant: Rig | BrakeSetup;
  options?: HeatRunOptions;
}): BrakeComparisonRow[] {
  const route = "pathM" in input.route ? input.route : prepareRoute(validateRouteProfile(input.route));
  const variantRig = "vehicle" in input.variant ? input.variant : withBrakeSetup(input.rig, input.variant);
  const figures = (rig: Rig) => {
    const result = runPrepared(route, rig, input.options ?? {});
    return input.descents.map((d): SetupFigures => {
      const o = outcomeOf(result, d.startDistanceM, d.endDistanceM);
      return {
        peaks: o.positions.map((p) => ({ position: p.position, peakC: p.peakC, ceilingC: p.ceilingC })),
        timeWarmOrAboveS: o.positions.map((p) => ({ position: p.position, seconds: p.timeWarmOrAboveS })),
        stopping: hotColdStops(result.model, o.positions.map((p) => p.endC)),
      };
    });
  };
  const base = figures(input.rig);
  const variant = figures(variantRig);
  return input.descents.map((descent, i) => ({ descentIndex: i, descent, base: base[i]!, variant: variant[i]! }));
}
