/**
 * Generic presets of our own: typical values, not a particular product. Values are picked inside the ranges
 * of docs/model.md §13 and docs/trade-facts.md §1 and tagged [E] (engineering estimate). Users should replace them
 * with their own plate and weighbridge figures.
 */

import type { BodyClass, Rig, RigLoad, TowVehicle, Trailer, Transmission, TransmissionPresetRef } from "./rig";

/** Label every preset carries. */
export const PRESET_LABEL = "typical values, not a particular product";

/** Class defaults for drag area (m²) and rolling resistance (dimensionless). */
export const BODY_CLASS_DEFAULTS: Readonly<Record<BodyClass, { cdaM2: number; rollingResistance: number }>> = {
  // Ute Cd 0.40–0.50 × A 2.8–3.2 m² → CdA 1.2–1.5 m² [M/E]; LT all-terrain Crr 0.012–0.015 [M] *Fundamentals of Vehicle Dynamics* ch. 4.
  ute: { cdaM2: 1.35, rollingResistance: 0.013 },
  // Large wagon: a little lower Cd than a ute's open tray [E]; highway/AT tyres Crr 0.010–0.015 [M].
  wagon: { cdaM2: 1.3, rollingResistance: 0.012 },
};

/** Generic transmissions (ratios are rounded typical values [E], lowest gear first). */
export const GENERIC_TRANSMISSIONS: Readonly<Record<TransmissionPresetRef["preset"], Transmission>> = {
  "generic-6-speed-automatic": {
    kind: "automatic",
    gearRatios: [3.5, 2.1, 1.45, 1.0, 0.72, 0.6],
    finalDrive: 3.9,
  },
  "generic-6-speed-manual": {
    kind: "manual",
    gearRatios: [4.4, 2.4, 1.5, 1.0, 0.8, 0.68],
    finalDrive: 3.7,
  },
};

/** A laden mid-size 4x4 dual-cab ute (vehicle only; its load is {@link UTE_LOAD}). [E] */
export const MID_SIZE_UTE: TowVehicle = {
  name: `Mid-size 4x4 dual-cab ute (${PRESET_LABEL})`,
  bodyClass: "ute",
  emptyMassKg: 2150,
  emptyMassDefinition: "kerb",
  gvmKg: 3150,
  gcmKg: 5950, // "about 5,850–6,000 kg" for a 3,500 kg-rated dual-cab [2nd] docs/trade-facts.md §1.4
  frontAxleRatingKg: 1350,
  rearAxleRatingKg: 1900,
  towingCapacityKg: 3500,
  towBallLimitKg: 350,
  frontBrakes: { kind: "vented-disc", diameterM: 0.32, massKg: 10 }, // Ø 300–345 mm, 8–13 kg [E/M]
  rearBrakes: { kind: "drum", diameterM: 0.295, massKg: 8 }, // Ø 295 mm, 6–10 kg [E/M]
  padFamily: "organic",
  brakeFluid: { fluidClass: "DOT 4", yearsSinceChange: 2 },
  tyreDiameterM: 0.78, // light-truck tyre, docs/model.md §6.1
  engine: { displacementM3: 0.0028, fuel: "diesel", brakeMode: "motoring" },
  // Part-time 4WD transfer case: low range about 2.5–2.7:1 is common (from memory) [E].
  transmission: { preset: "generic-6-speed-automatic", lowRangeRatio: 2.48 },
};

/** A large 4x4 wagon. [E] */
export const LARGE_WAGON: TowVehicle = {
  name: `Large 4x4 wagon (${PRESET_LABEL})`,
  bodyClass: "wagon",
  emptyMassKg: 2700,
  emptyMassDefinition: "kerb",
  gvmKg: 3350,
  gcmKg: 6850,
  frontAxleRatingKg: 1500,
  rearAxleRatingKg: 2000,
  towingCapacityKg: 3500,
  towBallLimitKg: 350,
  frontBrakes: { kind: "vented-disc", diameterM: 0.34, massKg: 12 },
  rearBrakes: { kind: "vented-disc", diameterM: 0.33, massKg: 8.5 }, // rear disc Ø 300–330 mm, 6–9 kg [E/M]
  padFamily: "ceramic",
  brakeFluid: { fluidClass: "DOT 4", yearsSinceChange: 2 },
  tyreDiameterM: 0.8,
  engine: { displacementM3: 0.0033, fuel: "diesel", brakeMode: "motoring" },
  transmission: { preset: "generic-6-speed-automatic", lowRangeRatio: 2.6 }, // low range [E], as above
};

/** A single-axle camper trailer. [E] */
export const SINGLE_AXLE_CAMPER: Trailer = {
  name: `Single-axle camper trailer (${PRESET_LABEL})`,
  kind: "camper",
  tareKg: 1300,
  atmKg: 2000,
  gtmKg: 1850,
  axles: 1,
  brakeType: "electric",
  brakedAxles: 1,
  brakes: { kind: "drum", diameterM: 0.254, massKg: 6 }, // 10 in electric drums, 5–9 kg [E/M]
  controllerGain: 1,
  breakaway: "electric",
  addedCdaM2: 0.5,
};

/** A tandem-axle touring caravan. [E] */
export const TANDEM_AXLE_CARAVAN: Trailer = {
  name: `Tandem-axle touring caravan (${PRESET_LABEL})`,
  kind: "caravan",
  tareKg: 2400,
  atmKg: 3100,
  gtmKg: 2850,
  axles: 2,
  brakeType: "electric",
  brakedAxles: 2,
  brakes: { kind: "drum", diameterM: 0.305, massKg: 8 }, // 12 in electric drums, 5–9 kg [E/M]
  controllerGain: 1,
  breakaway: "electric",
  addedCdaM2: 1.15, // ute + caravan CdA 2.0–3.5 m², default 2.5 [E] docs/model.md §13.1
};

/** A typical touring load for the ute and caravan: two adults, accessories, water and gear. [E] */
export const UTE_LOAD: RigLoad = {
  occupantsKg: 160,
  vehiclePayloadKg: 250,
  trailerLoadKg: 400,
};

/** The mid-size ute towing the tandem caravan with {@link UTE_LOAD}. [E] */
export const UTE_AND_CARAVAN: Rig = { vehicle: MID_SIZE_UTE, trailer: TANDEM_AXLE_CARAVAN, load: UTE_LOAD };

/** The large wagon towing the single-axle camper. [E] */
export const WAGON_AND_CAMPER: Rig = {
  vehicle: LARGE_WAGON,
  trailer: SINGLE_AXLE_CAMPER,
  load: { occupantsKg: 240, vehiclePayloadKg: 200, trailerLoadKg: 300 },
};
