/** Rigs and parameter sets for the thermal tests, with every value explicit. */

import type { ModelParamsInput, Rig, TowVehicle, Trailer } from "@/lib/thermal";
import { MID_SIZE_UTE, TANDEM_AXLE_CARAVAN } from "@/lib/thermal";

/**
 * Parameters that switch off everything except the brakes: no drag, no rolling resistance, no engine braking,
 * no rotating inertia, no cooling, and the fixed heat split of model 1 (no fade feedback, which makes the split
 * depend on temperature). The brakes then absorb exactly the mechanical energy released.
 */
export const BARE: ModelParamsInput = {
  fadeFeedback: false,
  cdaM2: 0,
  rollingResistance: 0,
  engineBrakingPowerW: 0,
  rotatingMassFactor: 0,
  coolingFactor: 0,
  emissivity: 0,
  ambientC: 25,
};

/** A solo tow vehicle of a given total mass (kerb definition, no load), 10 kg front rotors, 8 kg rear drums. */
export function soloRig(massKg: number, vehicle: Partial<TowVehicle> = {}): Rig {
  return {
    vehicle: { ...MID_SIZE_UTE, emptyMassKg: massKg, gvmKg: massKg + 1000, gcmKg: massKg + 5000, ...vehicle },
    load: { occupantsKg: 0, vehiclePayloadKg: 0, trailerLoadKg: 0 },
  };
}

/**
 * A ute and caravan of a given combination mass: vehicle 3,100 kg laden, caravan the rest (tare + load).
 * Electric drums on both caravan axles unless overridden.
 */
export function uteCaravanRig(totalKg: number, trailer: Partial<Trailer> = {}, vehicle: Partial<TowVehicle> = {}): Rig {
  const vehicleKg = 3100;
  const caravanKg = totalKg - vehicleKg;
  return {
    vehicle: { ...MID_SIZE_UTE, gvmKg: 3300, gcmKg: 6500, ...vehicle },
    trailer: { ...TANDEM_AXLE_CARAVAN, tareKg: caravanKg - 300, atmKg: caravanKg + 200, gtmKg: undefined, ...trailer },
    load: {
      occupantsKg: 160,
      vehiclePayloadKg: vehicleKg - MID_SIZE_UTE.emptyMassKg - 160,
      trailerLoadKg: 300,
      towBall: { massKg: 0.1 * caravanKg, source: "measured" },
    },
  };
}

/**
 * The same rig without a low range (a two-wheel-drive tow vehicle): where stops are the subject, low range
 * would otherwise hold most steep descents without one.
 */
export function twoWheelDrive(rig: Rig): Rig {
  const t = rig.vehicle.transmission;
  const { lowRangeRatio: _dropped, ...transmission } = t;
  return { ...rig, vehicle: { ...rig.vehicle, transmission } };
}
