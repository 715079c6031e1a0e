import { z } from "zod";
import { rigSchema } from "./rig";

const uuid = z.uuid("Not a valid id.");

/**
 * Model options at the boundary: parameter overrides are passed to the model, whose own guard clauses check
 * each name and value and answer with an exact message (lib/thermal validate-run.ts).
 */
export const heatRunOptionsSchema = z.strictObject({
  params: z.record(z.string(), z.union([z.number(), z.boolean(), z.null(), z.record(z.string(), z.record(z.string(), z.number()))])).optional(),
  stops: z
    .array(z.strictObject({ atM: z.number().min(0, "A stop lies on the route (≥ 0 m)."), durationS: z.number().min(0).max(6 * 3600, "A stop lasts at most 6 hours.") }))
    .max(50, "At most 50 stops.")
    .optional(),
});

export const analysisRequestSchema = z
  .strictObject({
    routeId: uuid.optional(),
    /** GPX text, read for this analysis only. */
    gpx: z.string().max(20 * 1024 * 1024, "The GPX is larger than 20 MB.").optional(),
    rigId: uuid.optional(),
    rig: rigSchema.optional(),
    options: heatRunOptionsSchema.optional(),
    detail: z.enum(["none", "sampled", "full"]).optional(),
    /** A saved rig's calibration: applied (the default) or ignored, for the uncalibrated forecast beside it. */
    calibration: z.enum(["apply", "ignore"], "calibration: apply or ignore.").optional(),
  })
  .refine((r) => (r.routeId === undefined) !== (r.gpx === undefined), { message: "Give either routeId or gpx.", path: ["routeId"] })
  .refine((r) => (r.rigId === undefined) !== (r.rig === undefined), { message: "Give either rigId or rig.", path: ["rigId"] });
