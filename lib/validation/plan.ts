import { z } from "zod";
import { singleLine } from "./text";

/** A plan as the API and the form send it (SI units: °C, m/s). */
export const planInputSchema = z
  .strictObject({
    name: singleLine({ empty: "Name the plan.", max: 120 }),
    routeId: z.uuid("Choose a route."),
    tripDate: z.iso.date({ error: "Enter the date as YYYY-MM-DD." }).nullable().optional(),
    ambientC: z.number({ error: "Enter the air temperature." }).min(-30, "Between −30 and 55 °C.").max(55, "Between −30 and 55 °C."),
    startTempC: z.number().min(-30, "Between −30 and 300 °C.").max(300, "Between −30 and 300 °C.").nullable().optional(),
    speedPolicy: z.enum(["standard", "cautious", "cap"], { error: "Choose a descent speed policy." }),
    speedCapMs: z.number().min(10 / 3.6, "At least 10 km/h.").max(100 / 3.6, "At most 100 km/h.").nullable().optional(),
    drivingStyle: z.enum(["steady", "snub"], { error: "Choose steady or snub braking." }),
    notes: z.string().max(5000, "Notes are at most 5,000 characters.").optional(),
    rigs: z
      .array(z.strictObject({ rigId: z.uuid("Choose a rig."), label: singleLine({ empty: "Name the driver or participant.", max: 80 }) }))
      .min(1, "Add at least one rig.")
      .max(20, "A convoy has at most 20 rigs."),
  })
  .refine((p) => p.speedPolicy !== "cap" || (p.speedCapMs ?? null) !== null, { message: "Enter the descent speed cap.", path: ["speedCapMs"] });
export type PlanInput = z.infer<typeof planInputSchema>;

/** A what-if's settings (lib/analysis/what-if.ts), SI units and °C; null = as in the plan. */
export const whatIfSettingsSchema = z.strictObject({
  planRigId: z.uuid("Choose a rig of the plan."),
  applyAdvice: z.boolean(),
  descentSpeedMs: z.number().min(10 / 3.6, "At least 10 km/h.").max(100 / 3.6, "At most 100 km/h.").nullable(),
  gear: z.number().int("A whole gear number.").min(1, "From 1st gear.").max(12, "At most 12th gear.").nullable(),
  ambientC: z.number().min(-30, "Between −30 and 55 °C.").max(55, "Between −30 and 55 °C.").nullable(),
  trailerGain: z.number().min(0, "Gain between 0 and 2.").max(2, "Gain between 0 and 2.").nullable(),
  vehiclePayloadKg: z.number().min(0, "Payload cannot be negative.").max(5000, "At most 5,000 kg.").nullable(),
  trailerLoadKg: z.number().min(0, "Load cannot be negative.").max(5000, "At most 5,000 kg.").nullable(),
  padFamily: z.enum(["organic", "ceramic", "semi-metallic"], { error: "Choose a pad family." }).nullable(),
  // Optional so that scenarios saved before these existed stay valid (lib/analysis/what-if.ts normalizeWhatIf).
  coolingFactor: z.number().min(0.5, "Cooling between 0.5 and 1.5.").max(1.5, "Cooling between 0.5 and 1.5.").nullable().optional(),
  frontShare: z.number().min(0.5, "Front share between 0.5 and 0.8.").max(0.8, "Front share between 0.5 and 0.8.").nullable().optional(),
});

export const scenarioInputSchema = z.strictObject({
  name: singleLine({ empty: "Name the scenario.", max: 120 }),
  settings: whatIfSettingsSchema,
});
export type ScenarioInput = z.infer<typeof scenarioInputSchema>;
