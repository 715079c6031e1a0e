/** Rigs for the compliance tests, built from the generic presets with explicit changes. */

import { MID_SIZE_UTE, TANDEM_AXLE_CARAVAN, type Rig, type Trailer, type TowVehicle } from "@/lib/thermal";

/**
 * A rig whose trailer weighs `trailerKg` as loaded (tare = trailerKg, no load), with its tow ball weighed at
 * 10 % unless given, rated ATM = GTM + ball = trailerKg unless overridden.
 */
export function rigWithTrailer(trailerKg: number, trailer: Partial<Trailer> = {}, vehicle: Partial<TowVehicle> = {}): Rig {
  return {
    vehicle: { ...MID_SIZE_UTE, ...vehicle },
    trailer: { ...TANDEM_AXLE_CARAVAN, tareKg: trailerKg, atmKg: trailerKg, gtmKg: undefined, ...trailer },
    load: { occupantsKg: 160, vehiclePayloadKg: 100, trailerLoadKg: 0, towBall: { massKg: 0.1 * trailerKg, source: "measured" } },
  };
}
