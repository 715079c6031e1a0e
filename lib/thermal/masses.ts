/**
 * Actual masses of a rig from its empty masses and load (docs/trade-facts.md §1.1, §1.3: GVM includes the tow-ball mass;
 * GCM covers the vehicle plus the trailer's axle loads; TBM ≈ ATM − GTM in practice).
 */

import { RUNNING_ORDER_DRIVER_KG } from "./constants";
import type { Rig } from "./rig";

/** Share of the trailer's mass assumed on the tow ball when it was not weighed. Common practice, no source. */
export const TOW_BALL_ESTIMATE_SHARE = 0.1;

/** Actual masses of a rig, kg. */
export interface RigMasses {
  /** Tow vehicle as loaded, including the tow-ball mass, kg (compare with GVM). */
  vehicleKg: number;
  /** Tow vehicle as loaded without the tow-ball mass, kg. */
  vehicleWithoutBallKg: number;
  /** Trailer as loaded (tare + load), kg (compare with ATM); 0 without a trailer. */
  trailerKg: number;
  /** Trailer mass on its own axles (trailer − tow ball), kg (compare with GTM). */
  trailerAxlesKg: number;
  /** Tow-ball mass, kg. */
  towBallKg: number;
  /** How the tow-ball mass was obtained. */
  towBallSource: "measured" | "estimate" | "none";
  /** Whole combination, kg (compare with GCM). */
  combinationKg: number;
  /** Plain-words notes on how the masses were derived. */
  notes: string[];
}

/**
 * Actual masses of the rig. A running-order empty mass already includes a 75 kg driver [M, Reg (EU) 1230/2012],
 * so that much is taken back off the occupants; a tare mass holds only 10 L of fuel (docs/trade-facts.md §1.2).
 * Without a weighed tow-ball mass, 10 % of the trailer's mass is assumed (common practice, no published source).
 * @param rig the rig
 * @returns masses in kg with notes
 * @example rigMasses(UTE_AND_CARAVAN).combinationKg // 5360
 */
export function rigMasses(rig: Rig): RigMasses {
  const { vehicle, trailer, load } = rig;
  const notes: string[] = [];
  let vehicleWithoutBallKg = vehicle.emptyMassKg + load.occupantsKg + load.vehiclePayloadKg;
  if (vehicle.emptyMassDefinition === "running-order") {
    vehicleWithoutBallKg -= RUNNING_ORDER_DRIVER_KG;
    notes.push("The empty mass is in running order, which already counts a 75 kg driver.");
  } else if (vehicle.emptyMassDefinition === "tare") {
    notes.push("The empty mass is a tare mass with only 10 L of fuel: count the rest of the fuel in the payload.");
  }
  if (trailer === undefined) {
    return {
      vehicleKg: vehicleWithoutBallKg,
      vehicleWithoutBallKg,
      trailerKg: 0,
      trailerAxlesKg: 0,
      towBallKg: 0,
      towBallSource: "none",
      combinationKg: vehicleWithoutBallKg,
      notes,
    };
  }
  const trailerKg = trailer.tareKg + load.trailerLoadKg;
  const measured = load.towBall;
  const towBallKg = measured ? measured.massKg : TOW_BALL_ESTIMATE_SHARE * trailerKg;
  if (!measured) {
    notes.push("Tow-ball mass estimated as 10 % of the trailer's mass (common practice): weigh it.");
  } else if (measured.source === "estimate") {
    notes.push("Tow-ball mass is the user's estimate, not a weighed figure.");
  }
  return {
    vehicleKg: vehicleWithoutBallKg + towBallKg,
    vehicleWithoutBallKg,
    trailerKg,
    trailerAxlesKg: trailerKg - towBallKg,
    towBallKg,
    towBallSource: measured ? measured.source : "estimate",
    combinationKg: vehicleWithoutBallKg + trailerKg,
    notes,
  };
}
