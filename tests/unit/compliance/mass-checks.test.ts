/**
 * Mass checks against ratings. Definitions: docs/trade-facts.md §1.1 — GVM includes the tow-ball mass [2nd motoring
 * club; ADR definitions]; GCM is the loaded vehicle plus the trailer's axle loads [2nd, ADR wording]; loaded mass
 * must not exceed any rating [src state road-safety caravan checklist].
 */

import { describe, expect, it } from "vitest";
import { checkMasses, checkRigCompliance, payloadTrap } from "@/lib/compliance";
import { MID_SIZE_UTE, UTE_AND_CARAVAN, type Rig } from "@/lib/thermal";

const byId = (rig: Rig, id: string) => checkMasses(rig).find((c) => c.id === id)!;

describe("ratings against actual masses", () => {
  it("the preset ute and caravan is within every rating", () => {
    const checks = checkMasses(UTE_AND_CARAVAN);
    const values = Object.fromEntries(checks.map((c) => [c.id, [c.actualKg, c.limitKg, c.status]]));
    expect(values).toEqual({
      gvm: [2840, 3150, "ok"], // 2,150 kerb + 160 people + 250 payload + 280 tow ball (GVM includes the ball)
      gcm: [5360, 5950, "ok"],
      "towing-capacity": [2800, 3500, "ok"],
      "tow-ball": [280, 350, "ok"],
      atm: [2800, 3100, "ok"],
      gtm: [2520, 2850, "ok"], // trailer minus ball on its own axles (TBM ≈ ATM − GTM in practice)
      "front-axle": [null, 1350, "not-checked"],
      "rear-axle": [null, 1900, "not-checked"],
    });
    expect(byId(UTE_AND_CARAVAN, "gvm").note).toBe("Includes a tow-ball mass estimated at 10 % of the trailer (common practice): weigh it.");
  });

  it("flags GVM over with the margin in kg when the payload grows", () => {
    const rig = { ...UTE_AND_CARAVAN, load: { ...UTE_AND_CARAVAN.load, vehiclePayloadKg: 600 } };
    expect(byId(rig, "gvm")).toMatchObject({ status: "over", marginKg: 3150 - 3190 });
  });

  it("checks weighed axle masses against the axle ratings", () => {
    const rig = { ...UTE_AND_CARAVAN, load: { ...UTE_AND_CARAVAN.load, measuredAxleKg: { front: 1200, rear: 1950 } } };
    expect(byId(rig, "front-axle")).toMatchObject({ status: "ok", marginKg: 150 });
    expect(byId(rig, "rear-axle")).toMatchObject({ status: "over", marginKg: -50 });
  });

  it("a solo vehicle gets only the vehicle checks", () => {
    const solo: Rig = { vehicle: MID_SIZE_UTE, load: { occupantsKg: 80, vehiclePayloadKg: 0, trailerLoadKg: 0 } };
    expect(checkMasses(solo).map((c) => c.id)).toEqual(["gvm", "gcm", "front-axle", "rear-axle"]);
  });
});

describe("payload left at full tow (docs/trade-facts.md §1.4: GCM ≈ 5,850–6,000 kg for a 3,500 kg-rated dual-cab [2nd])", () => {
  it("5,950 kg GCM − 3,500 kg tow − 2,150 kg kerb leaves 300 kg, not the 650 kg the GVM suggests", () => {
    const trap = payloadTrap(UTE_AND_CARAVAN);
    expect(trap.applies).toBe(true);
    expect(trap.payloadAtFullTowKg).toBe(300);
    expect(trap.payloadByGvmKg).toBe(650);
    expect(trap.payloadNowKg).toBe(410);
    expect(trap.maxTrailerNowKg).toBe(3390);
    expect(trap.explanation).toContain("only 300 kg is left for people, fuel, accessories");
  });
  it("does not apply when the GCM covers GVM plus the full tow", () => {
    const roomy = { ...UTE_AND_CARAVAN, vehicle: { ...MID_SIZE_UTE, gcmKg: 6700 } };
    expect(payloadTrap(roomy)).toMatchObject({ applies: false, explanation: "" });
  });
});

describe("report", () => {
  it("bundles the checks, with sources for the mass terms", () => {
    const report = checkRigCompliance(UTE_AND_CARAVAN, "AU");
    expect(report.sources.length).toBeGreaterThan(0);
    expect(report.trailerBrakes?.verdict).toBe("meets");
  });
  it("rejects an unknown region with an exact message", () => {
    expect(() => checkRigCompliance(UTE_AND_CARAVAN, "XX" as never)).toThrow(
      new TypeError("region must be one of: AU, NZ, UK, EU, US-TX, US-CA, CA-BC, CA-AB"),
    );
  });
  it("validates the rig first", () => {
    expect(() => checkRigCompliance({ vehicle: null }, "AU")).toThrow(new TypeError("rig.vehicle must be an object"));
  });
});
