import { z } from "zod";

/**
 * Calibration of a rig from infrared readings taken at a cool-down stop (docs/model.md §11): the request the
 * API accepts and the calibration stored on the rig. Both are checked here, on the way in and on the way out.
 */

/** Readings one calibration takes. */
export const MAX_READINGS = 20;
/** A reading's temperature range, °C: a little below any air a rig drives in, up to past any brake's ceiling. */
export const READING_MIN_C = -20;
export const READING_MAX_C = 900;
/** The longest wait after stopping that standstill cooling still says much about, minutes. */
export const MAX_MINUTES_AFTER_STOP = 120;

export const BRAKE_POSITIONS = ["front", "rear", "trailer"] as const;
export type ReadingPosition = (typeof BRAKE_POSITIONS)[number];

/** zod 4's number refuses NaN and ±Infinity by itself. */
const finite = (what: string) => z.number(`${what} must be a number.`);

/** One reading as sent: where by `atKm` or `atM` (exactly one). Messages name the reading and the field. */
const readingInputSchema = z
  .strictObject({
    position: z.enum(BRAKE_POSITIONS, "Choose front, rear or trailer."),
    atKm: finite("The distance along the route (atKm)").min(0, "The distance along the route (atKm) is 0 or more.").optional(),
    atM: finite("The distance along the route (atM)").min(0, "The distance along the route (atM) is 0 or more.").optional(),
    tempC: finite("The temperature (tempC)")
      .min(READING_MIN_C, `The temperature (tempC) is at least ${READING_MIN_C} °C.`)
      .max(READING_MAX_C, `The temperature (tempC) is at most ${READING_MAX_C} °C.`),
    minutesAfterStop: finite("The minutes after stopping (minutesAfterStop)")
      .min(0, "The minutes after stopping (minutesAfterStop) are 0 or more.")
      .max(MAX_MINUTES_AFTER_STOP, `The minutes after stopping (minutesAfterStop) are at most ${MAX_MINUTES_AFTER_STOP}.`)
      .optional(),
  })
  .superRefine((r, ctx) => {
    if ((r.atKm === undefined) === (r.atM === undefined)) {
      ctx.addIssue({ code: "custom", path: ["atM"], message: "Give where on the route as atKm or atM (one of them)." });
    }
  });

export const calibrationRequestSchema = z.strictObject({
  routeId: z.uuid("routeId: not a valid route id."),
  readings: z
    .array(readingInputSchema, "readings: a list of readings.")
    .min(1, "readings: give at least one reading.")
    .max(MAX_READINGS, `readings: at most ${MAX_READINGS} readings.`),
});
export type CalibrationRequest = z.infer<typeof calibrationRequestSchema>;

/** A reading as entered, in SI: the route it was taken on, the brake, where (m), °C and minutes after stopping. */
export const storedReadingSchema = z.strictObject({
  routeId: z.uuid(),
  position: z.enum(BRAKE_POSITIONS),
  atM: z.number().min(0),
  tempC: z.number().min(READING_MIN_C).max(READING_MAX_C),
  minutesAfterStop: z.number().min(0).max(MAX_MINUTES_AFTER_STOP),
});
export type StoredReading = z.infer<typeof storedReadingSchema>;

const factor = z.number().positive().max(100);

/** The calibration stored on a rig (rigs.calibration). Readings are referred to by their index in `readings`. */
export const storedCalibrationSchema = z.strictObject({
  routeId: z.uuid(),
  fitted: z.strictObject({ coolingFactor: factor, engineBrakingScale: factor }),
  /** Which factors the fit set (one reading: the cooling factor only). */
  fittedParameters: z.array(z.enum(["coolingFactor", "engineBrakingScale"])).min(1).max(2),
  readings: z.array(storedReadingSchema).min(1).max(MAX_READINGS),
  /** Per reading used in the fit: the model before (model defaults) and after (fitted factors), and reading − after. */
  results: z
    .array(z.strictObject({ reading: z.number().int().min(0), modelBeforeC: z.number(), modelAfterC: z.number(), residualK: z.number() }))
    .max(MAX_READINGS),
  /** Readings no parameter set can explain, left out of the fit, with the reason. */
  flagged: z
    .array(z.strictObject({ reading: z.number().int().min(0), reason: z.string().min(1).max(500), reachableC: z.strictObject({ minC: z.number(), maxC: z.number() }).nullable() }))
    .max(MAX_READINGS),
  rmsBeforeK: z.number().min(0),
  rmsAfterK: z.number().min(0),
  notes: z.array(z.string().max(500)).max(20),
  modelVersion: z.string().min(1).max(100),
  fittedAt: z.iso.datetime(),
  fittedBy: z.uuid(),
}).superRefine((c, ctx) => {
  const n = c.readings.length;
  const seen = new Set<number>();
  for (const r of [...c.results, ...c.flagged]) {
    if (r.reading >= n || seen.has(r.reading)) {
      ctx.addIssue({ code: "custom", path: ["results"], message: "Every reading is either used or flagged, once." });
      return;
    }
    seen.add(r.reading);
  }
  if (seen.size !== n) ctx.addIssue({ code: "custom", path: ["results"], message: "Every reading is either used or flagged, once." });
});
export type StoredCalibration = z.infer<typeof storedCalibrationSchema>;

/**
 * A stored calibration read back from the database, or null when there is none or it does not match the schema
 * (an unreadable calibration is never applied).
 */
export function readStoredCalibration(value: unknown): StoredCalibration | null {
  if (value === null || value === undefined) return null;
  const parsed = storedCalibrationSchema.safeParse(value);
  if (!parsed.success) {
    console.error("[calibration] a stored calibration does not match its schema and is ignored:", parsed.error.issues[0]?.message);
    return null;
  }
  return parsed.data;
}
