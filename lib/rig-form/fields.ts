import type { Quantity } from "./quantities";

/** One field of the rig form; `path` is the rig JSON schema's path, so server errors land on the right field. */
export interface NumberField {
  path: string;
  label: string;
  quantity: Quantity;
  hint?: string;
  optional?: boolean;
}
export interface ChoiceField {
  path: string;
  label: string;
  options: readonly (readonly [string, string])[];
  hint?: string;
}

const BRAKE_KINDS = [["vented-disc", "Vented disc"], ["solid-disc", "Solid disc"], ["drum", "Drum"]] as const;
const PADS = [["organic", "Organic (NAO)"], ["ceramic", "Ceramic"], ["semi-metallic", "Semi-metallic"], ["drum-lining", "Drum lining"]] as const;
const FLUIDS = [["DOT 3", "DOT 3"], ["DOT 4", "DOT 4"], ["DOT 5.1", "DOT 5.1"], ["DOT 5", "DOT 5 (silicone)"]] as const;

export const VEHICLE_CHOICES: ChoiceField[] = [
  { path: "vehicle.bodyClass", label: "Body", options: [["ute", "Ute (open tray or tub)"], ["wagon", "Wagon"]] },
  {
    path: "vehicle.emptyMassDefinition",
    label: "The empty mass is",
    options: [["tare", "Tare (fluids, 10 L of fuel)"], ["kerb", "Kerb (full tank)"], ["running-order", "Mass in running order (90 % fuel, driver)"]],
    hint: "Makers and regions define the empty vehicle differently; the checks add what each leaves out.",
  },
  { path: "vehicle.frontBrakes.kind", label: "Front brakes", options: BRAKE_KINDS },
  { path: "vehicle.rearBrakes.kind", label: "Rear brakes", options: BRAKE_KINDS },
  { path: "vehicle.padFamily", label: "Pad family", options: PADS, hint: "Sets the caution and fade temperatures (estimates)." },
  { path: "vehicle.brakeFluid.fluidClass", label: "Brake fluid", options: FLUIDS },
  { path: "vehicle.engine.fuel", label: "Fuel", options: [["diesel", "Diesel"], ["petrol", "Petrol"]] },
  { path: "vehicle.engine.brakeMode", label: "Engine braking", options: [["motoring", "Engine only"], ["exhaust-brake", "With an exhaust brake or engine-brake mode"]] },
];

export const VEHICLE_NUMBERS: NumberField[] = [
  { path: "vehicle.emptyMassKg", label: "Empty mass", quantity: "mass", hint: "From the compliance plate or a weighbridge, per the definition above." },
  { path: "vehicle.gvmKg", label: "GVM", quantity: "mass", hint: "Gross vehicle mass: the most the vehicle may weigh, tow-ball load included." },
  { path: "vehicle.gcmKg", label: "GCM", quantity: "mass", hint: "Gross combination mass: the most vehicle and trailer may weigh together." },
  { path: "vehicle.towingCapacityKg", label: "Rated towing capacity", quantity: "mass" },
  { path: "vehicle.towBallLimitKg", label: "Tow-ball limit", quantity: "mass" },
  { path: "vehicle.frontAxleRatingKg", label: "Front axle rating", quantity: "mass", optional: true },
  { path: "vehicle.rearAxleRatingKg", label: "Rear axle rating", quantity: "mass", optional: true },
  { path: "vehicle.frontBrakes.diameterM", label: "Front rotor or drum diameter", quantity: "diameter" },
  { path: "vehicle.frontBrakes.massKg", label: "Front rotor or drum mass (each)", quantity: "mass" },
  { path: "vehicle.rearBrakes.diameterM", label: "Rear rotor or drum diameter", quantity: "diameter" },
  { path: "vehicle.rearBrakes.massKg", label: "Rear rotor or drum mass (each)", quantity: "mass" },
  { path: "vehicle.brakeFluid.yearsSinceChange", label: "Years since the fluid was changed", quantity: "years", hint: "Glycol fluid takes up water and boils lower as it ages." },
  { path: "vehicle.tyreDiameterM", label: "Tyre outer diameter", quantity: "diameter" },
  { path: "vehicle.engine.displacementM3", label: "Engine displacement", quantity: "displacement" },
  { path: "vehicle.engine.maxRpm", label: "Highest rpm you accept on a descent", quantity: "rpm", optional: true, hint: "Empty: 3,800 for a diesel, 4,500 for a petrol engine." },
  { path: "vehicle.cdaM2", label: "Drag area (Cd·A)", quantity: "area", optional: true, hint: "Empty: the body class's typical value." },
  { path: "vehicle.rollingResistance", label: "Rolling-resistance coefficient", quantity: "plain", optional: true, hint: "Empty: the body class's typical value (about 0.012–0.013)." },
  { path: "vehicle.frontBrakeShare", label: "Front share of braking (0–1)", quantity: "plain", optional: true, hint: "Empty: 0.65." },
];

export const TRAILER_CHOICES: ChoiceField[] = [
  { path: "trailer.kind", label: "Kind", options: [["caravan", "Caravan"], ["camper", "Camper trailer"], ["other", "Other trailer"]] },
  {
    path: "trailer.brakeType",
    label: "Brakes",
    options: [["none", "None"], ["override", "Override (surge)"], ["electric", "Electric"], ["electric-over-hydraulic", "Electric over hydraulic"]],
    hint: "Override brakes keep dragging under engine braking; electric brakes act only with the pedal.",
  },
  { path: "trailer.breakaway", label: "Breakaway system", options: [["none", "None"], ["electric", "Electric (battery)"], ["cable", "Cable"]] },
  { path: "trailer.brakes.kind", label: "Brake hardware", options: BRAKE_KINDS },
];

export const TRAILER_NUMBERS: NumberField[] = [
  { path: "trailer.tareKg", label: "Tare", quantity: "mass", hint: "As it left the maker, tanks empty." },
  { path: "trailer.atmKg", label: "ATM", quantity: "mass", hint: "Aggregate trailer mass: the most it may weigh loaded, tow-ball load included." },
  { path: "trailer.gtmKg", label: "GTM", quantity: "mass", optional: true, hint: "Gross trailer mass: the most on its own axles." },
  { path: "trailer.axles", label: "Axles", quantity: "count" },
  { path: "trailer.brakedAxles", label: "Braked axles", quantity: "count" },
  { path: "trailer.brakes.diameterM", label: "Drum or disc diameter", quantity: "diameter", optional: true },
  { path: "trailer.brakes.massKg", label: "Drum or disc mass (each)", quantity: "mass", optional: true },
  { path: "trailer.controllerGain", label: "Controller gain (1 = each unit brakes its own mass)", quantity: "plain", optional: true, hint: "Electric brakes: an under-set controller moves heat into the tow vehicle." },
  { path: "trailer.addedCdaM2", label: "Drag area the trailer adds", quantity: "area" },
];

export const LOAD_NUMBERS: NumberField[] = [
  { path: "load.occupantsKg", label: "Occupants, driver included", quantity: "mass" },
  { path: "load.vehiclePayloadKg", label: "Payload in the vehicle", quantity: "mass", hint: "Accessories, gear, water and fuel beyond the empty mass." },
  { path: "load.trailerLoadKg", label: "Load in the trailer", quantity: "mass", hint: "Water, gas, food and gear beyond its tare." },
  { path: "load.towBall.massKg", label: "Tow-ball mass", quantity: "mass", optional: true, hint: "Weighed, best. Empty: estimated as 10 % of the trailer's mass (common practice)." },
];

export const ALL_NUMBERS = [...VEHICLE_NUMBERS, ...TRAILER_NUMBERS, ...LOAD_NUMBERS];
export const ALL_CHOICES = [...VEHICLE_CHOICES, ...TRAILER_CHOICES];
