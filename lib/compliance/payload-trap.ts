/**
 * The "payload left at full tow" trap (docs/trade-facts.md §1.4): a ute sold as able to tow 3,500 kg often has a GCM
 * of about 5,850–6,000 kg, so at a full 3,500 kg tow only a few hundred kilograms of payload are legally left.
 * Arithmetic on the definitions: the vehicle without the ball must stay within GCM − trailer, and with the ball
 * within GVM.
 */

import { RUNNING_ORDER_DRIVER_KG, rigMasses, TOW_BALL_ESTIMATE_SHARE, type Rig } from "@/lib/thermal";
import type { PayloadTrap } from "./types";

/**
 * Work out the payload left at full rated tow and explain the trap in plain words when it applies.
 * @param rig the rig (validated)
 * @returns the trap figures (kg) and explanation
 * @example payloadTrap(UTE_AND_CARAVAN).payloadAtFullTowKg // 300
 */
export function payloadTrap(rig: Rig): PayloadTrap {
  const v = rig.vehicle;
  const m = rigMasses(rig);
  // Payload counts people and everything added to the empty mass (a running-order mass already holds the driver).
  const driverIncluded = v.emptyMassDefinition === "running-order" ? RUNNING_ORDER_DRIVER_KG : 0;
  const empty = v.emptyMassKg - driverIncluded;
  const fullBall = v.towBallLimitKg > 0 ? Math.min(v.towBallLimitKg, TOW_BALL_ESTIMATE_SHARE * v.towingCapacityKg) : TOW_BALL_ESTIMATE_SHARE * v.towingCapacityKg;
  const byGcm = v.gcmKg - v.towingCapacityKg - empty;
  const payloadByGvmKg = v.gvmKg - empty - fullBall;
  const payloadAtFullTowKg = Math.min(byGcm, payloadByGvmKg);
  const payloadNowKg = m.vehicleWithoutBallKg - empty;
  const payloadWithThisTrailerKg = Math.min(v.gcmKg - m.trailerKg - empty, v.gvmKg - empty - m.towBallKg);
  const maxTrailerNowKg = Math.max(0, Math.min(v.towingCapacityKg, v.gcmKg - m.vehicleWithoutBallKg));
  const applies = byGcm < payloadByGvmKg;
  const kg = (x: number): string => `${Math.round(x).toLocaleString("en-AU")} kg`;
  const explanation = !applies ? "" : [
    `This vehicle is rated to tow ${kg(v.towingCapacityKg)} and to weigh up to ${kg(v.gvmKg)} (GVM),`,
    `but the two together may weigh only ${kg(v.gcmKg)} (GCM).`,
    `Towing the full ${kg(v.towingCapacityKg)} leaves ${kg(v.gcmKg - v.towingCapacityKg)} for the vehicle itself;`,
    `it weighs ${kg(empty)} empty, so only ${kg(Math.max(0, payloadAtFullTowKg))} is left for people, fuel, accessories`,
    `and luggage — not the ${kg(payloadByGvmKg)} the GVM alone suggests once the tow ball takes its share.`,
    rig.trailer
      ? `With this trailer as loaded (${kg(m.trailerKg)}) you may carry up to ${kg(Math.max(0, payloadWithThisTrailerKg))}; you carry ${kg(payloadNowKg)}.`
      : "",
  ].filter(Boolean).join(" ");
  return { applies, payloadAtFullTowKg, payloadByGvmKg, payloadWithThisTrailerKg, payloadNowKg, maxTrailerNowKg, explanation };
}
