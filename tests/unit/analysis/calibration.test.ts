/**
 * A rig's stored calibration as the app uses it (lib/analysis/calibration.ts, docs/model.md §11): the fitted
 * factors become the model parameters of its heat runs, under any parameter a run sets itself, and the
 * plan run says where they came from; the worker job refers to every reading by its index.
 */
import { describe, expect, it } from "vitest";
import { calibrationNote, calibrationUse, runCalibrationJob, withCalibration } from "@/lib/analysis/calibration";
import { conditionsToOptions } from "@/lib/analysis/conditions";
import { runPlanJob } from "@/lib/analysis/plan-run";
import { findDescents } from "@/lib/route";
import { prepareRoute, runPrepared, UTE_AND_CARAVAN } from "@/lib/thermal";
import { storedCalibrationSchema, type StoredCalibration } from "@/lib/validation/calibration";
import { stretchesProfile } from "../thermal/route-helpers";

const profile = stretchesProfile([
  { lengthM: 1000, grade: 0 },
  { lengthM: 4000, grade: -0.08 },
  { lengthM: 2000, grade: 0 },
]);
const ROUTE_ID = "6f1c2b1e-0000-4000-8000-000000000001";
const USER_ID = "6f1c2b1e-0000-4000-8000-0000000000aa";

function stored(over: Partial<StoredCalibration> = {}): StoredCalibration {
  return storedCalibrationSchema.parse({
    routeId: ROUTE_ID,
    fitted: { coolingFactor: 1.6, engineBrakingScale: 0.7 },
    fittedParameters: ["coolingFactor", "engineBrakingScale"],
    readings: [
      { routeId: ROUTE_ID, position: "front", atM: 5000, tempC: 260, minutesAfterStop: 0 },
      { routeId: ROUTE_ID, position: "trailer", atM: 5000, tempC: 330, minutesAfterStop: 2 },
    ],
    results: [
      { reading: 0, modelBeforeC: 280, modelAfterC: 262, residualK: -2 },
      { reading: 1, modelBeforeC: 350, modelAfterC: 328, residualK: 2 },
    ],
    flagged: [],
    rmsBeforeK: 20,
    rmsAfterK: 2,
    notes: [],
    modelVersion: "test",
    fittedAt: "2026-12-04T03:00:00.000Z",
    fittedBy: USER_ID,
    ...over,
  });
}

describe("a stored calibration applied to a heat run", () => {
  it("sets the fitted factors as model parameters, and the run resolves them", () => {
    const options = withCalibration(conditionsToOptions({ ambientC: 30, startTempC: null, speedPolicy: "standard", speedCapMs: null, drivingStyle: "steady" }), stored());
    expect(options.params).toMatchObject({ coolingFactor: 1.6, engineBrakingScale: 0.7, ambientC: 30 });
    const route = prepareRoute(profile);
    const calibrated = runPrepared(route, UTE_AND_CARAVAN, options);
    expect(calibrated.model.params.coolingFactor).toBe(1.6);
    expect(calibrated.model.params.engineBrakingScale).toBe(0.7);
    // Less engine braking puts more heat into the brakes: the calibrated run is not the default one.
    const plain = runPrepared(route, UTE_AND_CARAVAN, { params: { ambientC: 30 } });
    expect(plain.model.params.coolingFactor).toBe(1);
    const peak = (r: typeof plain) => Math.max(...r.trace.rotorC[0]!);
    expect(Math.abs(peak(calibrated) - peak(plain))).toBeGreaterThan(1);
  });

  it("applies only the fitted factors, and a parameter the run sets itself wins", () => {
    const one = stored({ fittedParameters: ["coolingFactor"], fitted: { coolingFactor: 0.8, engineBrakingScale: 1 } });
    expect(withCalibration({}, one).params).toEqual({ coolingFactor: 0.8 });
    const own = { params: { coolingFactor: 2 } };
    expect(withCalibration(own, stored()).params).toEqual({ coolingFactor: 2, engineBrakingScale: 0.7 });
    expect(calibrationUse(own, stored())?.applied).toEqual({ engineBrakingScale: 0.7 });
    expect(calibrationUse({ params: { coolingFactor: 2, engineBrakingScale: 1 } }, stored())).toBeNull();
    expect(withCalibration(own, null)).toBe(own);
  });

  it("a plan run carries the note with the date and the number of readings", () => {
    const cal = stored();
    const use = calibrationUse({}, cal)!;
    const note = calibrationNote(use);
    expect(note).toBe("Cooling factor 1.60 and engine-braking scale 0.70 from the rig's calibration of 2026-12-04 (2 readings).");
    const [run] = runPlanJob({ kind: "plan", profile, descents: findDescents(profile), waypoints: [], members: [{ rig: UTE_AND_CARAVAN, options: withCalibration({}, cal), notes: [note] }] });
    expect(run!.result.analysis.notes).toContain(note);
    expect(run!.result.analysis.model.params.coolingFactor).toBe(1.6);
  });
});

describe("the calibration job", () => {
  it("refers to used and flagged readings by their index", () => {
    const result = runCalibrationJob({
      kind: "calibration",
      profile,
      rig: UTE_AND_CARAVAN,
      readings: [
        { position: "front", atM: 5000, tempC: 250 },
        { position: "rear", atM: 5000, tempC: 880 },
        { position: "trailer", atM: 5000, tempC: 300 },
      ],
      options: {},
    });
    expect(result.flagged.map((f) => f.reading)).toEqual([1]);
    expect(result.flagged[0]!.reason).toMatch(/hotter than any heat run/);
    expect(result.results.map((r) => r.reading)).toEqual([0, 2]);
    expect(result.fittedParameters).toEqual(["coolingFactor", "engineBrakingScale"]);
  });
});
