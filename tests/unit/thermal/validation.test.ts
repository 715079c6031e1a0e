/** Guard clauses at the model entry: exact messages and error types (Turf style). */

import { describe, expect, it } from "vitest";
import { runHeatRun, summarizeDescents, validateRig, UTE_AND_CARAVAN, MID_SIZE_UTE, TANDEM_AXLE_CARAVAN } from "@/lib/thermal";
import { constantGradeProfile } from "./route-helpers";

const profile = constantGradeProfile(500, -0.05);
const withVehicle = (patch: Record<string, unknown>): unknown => ({ ...UTE_AND_CARAVAN, vehicle: { ...MID_SIZE_UTE, ...patch } });
const withTrailer = (patch: Record<string, unknown>): unknown => ({ ...UTE_AND_CARAVAN, trailer: { ...TANDEM_AXLE_CARAVAN, ...patch } });

describe("validateRig", () => {
  const cases: [string, unknown, ErrorConstructor, string][] = [
    ["no rig", null, TypeError, "rig must be an object"],
    ["no vehicle", { load: {} }, TypeError, "rig.vehicle must be an object"],
    ["mass as text", withVehicle({ emptyMassKg: "2150" }), TypeError, "rig.vehicle.emptyMassKg must be a number"],
    ["NaN mass", withVehicle({ emptyMassKg: Number.NaN }), RangeError, "rig.vehicle.emptyMassKg must be finite"],
    ["zero mass", withVehicle({ emptyMassKg: 0 }), RangeError, "rig.vehicle.emptyMassKg must be greater than 0"],
    ["GVM below empty", withVehicle({ gvmKg: 2000 }), RangeError, "rig.vehicle.gvmKg must be greater than rig.vehicle.emptyMassKg"],
    ["GCM below GVM", withVehicle({ gcmKg: 3000 }), RangeError, "rig.vehicle.gcmKg must not be less than rig.vehicle.gvmKg"],
    ["bad definition", withVehicle({ emptyMassDefinition: "dry" }), TypeError, "rig.vehicle.emptyMassDefinition must be one of: tare, kerb, running-order"],
    ["rotor in mm", withVehicle({ frontBrakes: { kind: "vented-disc", diameterM: 320, massKg: 10 } }), RangeError, "rig.vehicle.frontBrakes.diameterM must be between 0.1 and 0.6"],
    ["litres", withVehicle({ engine: { displacementM3: 2.8, fuel: "diesel", brakeMode: "motoring" } }), RangeError, "rig.vehicle.engine.displacementM3 must be at most 0.02 (cubic metres: 2.8 L is 0.0028)"],
    ["no gears", withVehicle({ transmission: { kind: "manual", gearRatios: [], finalDrive: 3.9 } }), TypeError, "rig.vehicle.transmission.gearRatios must be a non-empty array"],
    ["ATM below tare", withTrailer({ atmKg: 2000 }), RangeError, "rig.trailer.atmKg must not be less than rig.trailer.tareKg"],
    ["braked axles > axles", withTrailer({ brakedAxles: 3 }), RangeError, "rig.trailer.brakedAxles must be a whole number from 0 to 2"],
    ["unbraked with braked axles", withTrailer({ brakeType: "none" }), RangeError, "rig.trailer.brakedAxles must be 0 when rig.trailer.brakeType is none"],
    ["brakes missing", withTrailer({ brakes: undefined }), TypeError, "rig.trailer.brakes is required when the trailer has brakes"],
    ["gain too high", withTrailer({ controllerGain: 3 }), RangeError, "rig.trailer.controllerGain must be between 0 and 2"],
    ["negative load", { ...UTE_AND_CARAVAN, load: { ...UTE_AND_CARAVAN.load, trailerLoadKg: -1 } }, RangeError, "rig.load.trailerLoadKg must be 0 or more"],
  ];
  for (const [label, rig, type, message] of cases) {
    it(`${label}: ${type.name} "${message}"`, () => {
      expect(() => validateRig(rig)).toThrow(type);
      expect(() => validateRig(rig)).toThrow(message);
      expect(() => validateRig(rig)).toThrowError(new RegExp(`^${message.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}$`));
    });
  }
  it("accepts the presets", () => expect(validateRig(UTE_AND_CARAVAN)).toBe(UTE_AND_CARAVAN));
});

describe("route profile and options", () => {
  it("rejects a profile with a plain array column", () => {
    expect(() => runHeatRun({ ...profile, grade: [0, 0] } as never, UTE_AND_CARAVAN)).toThrow(
      new TypeError("profile.grade must be a Float64Array"),
    );
  });
  it("rejects columns of different lengths, a single sample, and decreasing distance", () => {
    expect(() => runHeatRun({ ...profile, lat: new Float64Array(3) }, UTE_AND_CARAVAN)).toThrow(
      new RangeError("profile.lat must have the same length as profile.distanceM"),
    );
    const one = constantGradeProfile(5, 0, 10);
    const single = { ...one, distanceM: one.distanceM.slice(0, 1), lat: one.lat.slice(0, 1), lon: one.lon.slice(0, 1),
      elevationM: one.elevationM.slice(0, 1), grade: one.grade.slice(0, 1), curveRadiusM: one.curveRadiusM.slice(0, 1),
      gapAfter: one.gapAfter.slice(0, 1) };
    expect(() => runHeatRun(single, UTE_AND_CARAVAN)).toThrow(new RangeError("profile must have at least 2 samples"));
    const back = constantGradeProfile(50, 0);
    back.distanceM[3] = 1;
    expect(() => runHeatRun(back, UTE_AND_CARAVAN)).toThrow(new RangeError("profile.distanceM must be non-decreasing (sample 3)"));
  });
  it("rejects out-of-range parameters with the parameter's path", () => {
    expect(() => runHeatRun(profile, UTE_AND_CARAVAN, { params: { frontShare: 1.2 } })).toThrow(
      new RangeError("options.params.frontShare must be between 0 and 1"),
    );
    expect(() => runHeatRun(profile, UTE_AND_CARAVAN, { params: { gearPolicy: { kind: "fixed", gear: 13 } } })).toThrow(
      // six gears in high range and six in low range
      new RangeError("options.params.gearPolicy.gear must be a whole number from 1 to 12"),
    );
    expect(() => runHeatRun(profile, UTE_AND_CARAVAN, { params: { padThresholds: { organic: { warmC: 300, hotC: 250 } } } })).toThrow(
      new RangeError("options.params.padThresholds.organic.hotC must not be less than options.params.padThresholds.organic.warmC"),
    );
    expect(() => runHeatRun(profile, UTE_AND_CARAVAN, { stops: [{ atM: 10, durationS: -5 }] })).toThrow(
      new RangeError("options.stops[0].durationS must be 0 or more"),
    );
  });
  it("accepts zero where the physics allows it", () => {
    const zeros = { coolingFactor: 0, emissivity: 0, cdaM2: 0, rollingResistance: 0, engineBrakingScale: 0, trailerGain: 0, rotorPartition: 0 };
    expect(() => runHeatRun(profile, UTE_AND_CARAVAN, { params: zeros })).not.toThrow();
  });
  it("rejects a summary range that ends before it starts or covers no step", () => {
    const r = runHeatRun(profile, UTE_AND_CARAVAN);
    expect(() => summarizeDescents(r, [{ startM: 100, endM: 50 }])).toThrow(
      new RangeError("ranges[0].endM must be greater than ranges[0].startM"),
    );
    expect(() => summarizeDescents(r, [{ startM: 101, endM: 102 }])).toThrow(
      new RangeError("ranges[0] must cover at least one step of the route"),
    );
  });
});
