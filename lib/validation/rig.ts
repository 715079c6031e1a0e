import { z } from "zod";
import { REGIONS } from "@/lib/compliance";
import type { Rig } from "@/lib/thermal";
import { singleLine } from "./text";

/**
 * The rig JSON schema: one definition for the API, the command line and the forms. SI units (kg, m, m³);
 * the forms convert from the user's units before validating. Ranges are wide plausibility bounds for light
 * tow vehicles and trailers, so a typing slip (a mass in tonnes, a diameter in mm) is caught with a message.
 */
const num = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ error: (issue) => (issue.input === undefined || issue.input === null ? `Enter the ${label}.` : `Enter the ${label} as a number.`) })
    .refine(Number.isFinite, `Enter the ${label} as a number.`)
    .refine((v) => v >= min && v <= max, `The ${label} must be between ${min} and ${max} ${unit}.`);
const optionalNum = (label: string, min: number, max: number, unit: string) => num(label, min, max, unit).optional();

export const padFamilySchema = z.enum(["organic", "ceramic", "semi-metallic", "drum-lining"], { error: "Choose a pad family." });
export const fluidClassSchema = z.enum(["DOT 3", "DOT 4", "DOT 5.1", "DOT 5"], { error: "Choose a brake-fluid class." });

export const wheelBrakeSchema = z.strictObject({
  kind: z.enum(["vented-disc", "solid-disc", "drum"], { error: "Choose vented disc, solid disc or drum." }),
  diameterM: num("brake diameter", 0.15, 0.6, "m"),
  massKg: num("rotor or drum mass", 1, 60, "kg"),
  padFamily: padFamilySchema.optional(),
});

export const brakeFluidSchema = z.strictObject({
  fluidClass: fluidClassSchema,
  yearsSinceChange: num("years since the fluid was changed", 0, 30, "years"),
});

const explicitTransmission = z
  .strictObject({
    kind: z.enum(["manual", "automatic"], { error: "Choose manual or automatic." }),
    gearRatios: z.array(num("gear ratio", 0.3, 8, "(ratio)")).min(1, "Enter at least one gear ratio.").max(12, "Enter at most 12 gears."),
    finalDrive: num("final-drive ratio", 1.5, 8, "(ratio)"),
    converterLocked: z.boolean().optional(),
    lowRangeRatio: num("low-range ratio", 1.2, 5, "(ratio)").optional(),
  })
  .refine((t) => t.gearRatios.every((r, i) => i === 0 || r < t.gearRatios[i - 1]!), {
    message: "List the gear ratios from the lowest gear (largest ratio) to the highest.",
    path: ["gearRatios"],
  });
const presetTransmission = z.strictObject({
  preset: z.enum(["generic-6-speed-automatic", "generic-6-speed-manual"], { error: "Choose a generic transmission." }),
  converterLocked: z.boolean().optional(),
  lowRangeRatio: num("low-range ratio", 1.2, 5, "(ratio)").optional(),
});

export const towVehicleSchema = z
  .strictObject({
    name: singleLine({ empty: "Name the tow vehicle.", max: 80 }),
    bodyClass: z.enum(["ute", "wagon"], { error: "Choose ute or wagon." }),
    emptyMassKg: num("empty mass", 500, 10_000, "kg"),
    emptyMassDefinition: z.enum(["tare", "kerb", "running-order"], { error: "Say which definition the empty mass follows." }),
    gvmKg: num("GVM", 500, 12_000, "kg"),
    gcmKg: num("GCM", 500, 25_000, "kg"),
    frontAxleRatingKg: optionalNum("front axle rating", 100, 8_000, "kg"),
    rearAxleRatingKg: optionalNum("rear axle rating", 100, 10_000, "kg"),
    towingCapacityKg: num("rated towing capacity", 0, 12_000, "kg"),
    towBallLimitKg: num("tow-ball limit", 0, 1_500, "kg"),
    frontBrakes: wheelBrakeSchema,
    rearBrakes: wheelBrakeSchema,
    padFamily: padFamilySchema,
    brakeFluid: brakeFluidSchema,
    tyreDiameterM: num("tyre diameter", 0.45, 1.3, "m"),
    engine: z.strictObject({
      displacementM3: num("engine displacement", 0.0005, 0.015, "m³"),
      fuel: z.enum(["diesel", "petrol"], { error: "Choose diesel or petrol." }),
      brakeMode: z.enum(["motoring", "exhaust-brake"], { error: "Choose plain engine braking or an exhaust brake." }),
      maxRpm: optionalNum("highest descent rpm", 1500, 8000, "rpm"),
      idleRpm: optionalNum("idle speed", 400, 1500, "rpm"),
    }),
    transmission: z.union([explicitTransmission, presetTransmission], { error: "Give gear ratios or choose a generic transmission." }),
    cdaM2: optionalNum("drag area", 0, 5, "m²"),
    rollingResistance: optionalNum("rolling-resistance coefficient", 0, 0.05, ""),
    frontBrakeShare: optionalNum("front brake share", 0, 1, ""),
  })
  .refine((v) => v.gvmKg >= v.emptyMassKg, { message: "The GVM must be at least the empty mass.", path: ["gvmKg"] })
  .refine((v) => v.gcmKg >= v.gvmKg, { message: "The GCM must be at least the GVM.", path: ["gcmKg"] });

export const trailerSchema = z
  .strictObject({
    name: singleLine({ empty: "Name the trailer or caravan.", max: 80 }),
    kind: z.enum(["caravan", "camper", "other"], { error: "Choose caravan, camper or other trailer." }),
    tareKg: num("trailer tare", 50, 10_000, "kg"),
    atmKg: num("ATM", 50, 12_000, "kg"),
    gtmKg: optionalNum("GTM", 50, 12_000, "kg"),
    axles: z.number().int("Axles are a whole number.").min(1, "A trailer has at least one axle.").max(4, "At most 4 axles."),
    brakeType: z.enum(["none", "override", "electric", "electric-over-hydraulic"], { error: "Choose the trailer brake type." }),
    brakedAxles: z.number().int("Braked axles are a whole number.").min(0).max(4),
    brakes: wheelBrakeSchema.optional(),
    controllerGain: optionalNum("controller gain", 0, 2, "(1 = ideal)"),
    breakaway: z.enum(["none", "electric", "cable"], { error: "Choose the breakaway system." }),
    addedCdaM2: num("added drag area", 0, 5, "m²"),
    brakeFluid: brakeFluidSchema.optional(),
  })
  .refine((t) => t.atmKg >= t.tareKg, { message: "The ATM must be at least the tare.", path: ["atmKg"] })
  .refine((t) => t.brakedAxles <= t.axles, { message: "More braked axles than axles.", path: ["brakedAxles"] })
  .refine((t) => t.brakeType === "none" || t.brakes !== undefined, { message: "Describe the trailer's brakes.", path: ["brakes"] })
  .refine((t) => t.brakeType === "none" || t.brakedAxles > 0, { message: "A braked trailer has at least one braked axle.", path: ["brakedAxles"] });

export const rigLoadSchema = z.strictObject({
  occupantsKg: num("occupants' mass", 0, 1_000, "kg"),
  vehiclePayloadKg: num("payload in the vehicle", 0, 6_000, "kg"),
  trailerLoadKg: num("load in the trailer", 0, 8_000, "kg"),
  towBall: z.strictObject({ massKg: num("tow-ball mass", 0, 1_500, "kg"), source: z.enum(["measured", "estimate"]) }).optional(),
  measuredAxleKg: z.strictObject({ front: num("front axle mass", 0, 10_000, "kg"), rear: num("rear axle mass", 0, 10_000, "kg") }).optional(),
});

export const rigSchema = z.strictObject({
  vehicle: towVehicleSchema,
  trailer: trailerSchema.optional(),
  load: rigLoadSchema,
}) satisfies z.ZodType<Rig>;

export const regionSchema = z.enum(REGIONS as ["AU", ...typeof REGIONS[number][]], { error: "Choose the region whose rules apply." });

/** A saved rig: its name, the region whose rules it is checked against, and the rig itself. */
export const savedRigInputSchema = z.strictObject({
  name: singleLine({ empty: "Name the rig.", max: 100 }),
  region: regionSchema,
  rig: rigSchema,
});
export type SavedRigInput = z.infer<typeof savedRigInputSchema>;
