/**
 * Trailer-brake rules by region, checked against docs/trade-facts.md §2.2 (sources named per block; all [2nd] unless
 * marked [src]). Masses in kg.
 */

import { describe, expect, it } from "vitest";
import { BRAKE_RULES, checkTrailerBrakes, REGIONS, type Region } from "@/lib/compliance";
import { lbToKg, type Trailer, type TowVehicle } from "@/lib/thermal";
import { rigWithTrailer } from "./rig-fixtures";

const unbraked: Partial<Trailer> = { brakeType: "none", brakedAxles: 0, breakaway: "none", axles: 1 };
const override1: Partial<Trailer> = { brakeType: "override", brakedAxles: 1, axles: 1, breakaway: "cable" };
const electric2: Partial<Trailer> = { brakeType: "electric", brakedAxles: 2, axles: 2, breakaway: "electric" };
const verdict = (kg: number, t: Partial<Trailer>, region: Region, v: Partial<TowVehicle> = {}) =>
  checkTrailerBrakes(rigWithTrailer(kg, t, v), region)!.verdict;

describe("every rule carries its sources and a last-checked date", () => {
  for (const region of REGIONS) {
    it(region, () => {
      const rule = BRAKE_RULES[region];
      expect(rule.sources.length).toBeGreaterThan(0);
      expect(rule.lastChecked.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
      expect(rule.lastChecked.against).toContain("verify");
    });
  }
});

describe("Australia: ADR 38 / VSB 1 (ADR 38/05 [src]; national towing guide [2nd])", () => {
  it("≤ 750 kg: no brakes required", () => expect(verdict(750, unbraked, "AU")).toBe("meets"));
  it("751–2,000 kg: brakes on one axle, override permitted", () => {
    expect(verdict(800, unbraked, "AU")).toBe("does-not-meet");
    expect(verdict(1800, override1, "AU")).toBe("meets");
  });
  it("> 2,000 kg: all wheels, from the driver's seat, no override, breakaway", () => {
    expect(verdict(2500, { ...override1, axles: 2, brakedAxles: 2 }, "AU")).toBe("does-not-meet");
    expect(verdict(2500, { ...electric2, brakedAxles: 1 }, "AU")).toBe("does-not-meet");
    expect(verdict(2500, { ...electric2, breakaway: "none" }, "AU")).toBe("does-not-meet");
    expect(verdict(2500, electric2, "AU")).toBe("meets");
  });
  it("over 4,500 kg ATM is outside the light-trailer rules", () => {
    expect(verdict(4600, electric2, "AU")).toBe("outside-rule");
  });
  it("is judged on the ATM, the mass ADR 38/05 names, not the GTM: a 2,100 kg ATM override van fails at 1,950 kg GTM", () => {
    const check = checkTrailerBrakes(rigWithTrailer(2100, { ...override1, gtmKg: 1950 }), "AU")!;
    expect(check.massKg).toBe(2100);
    expect(check.verdict).toBe("does-not-meet");
    expect(check.problems).toContain("Override (surge) brakes do not meet this rule: brakes the driver can operate are required.");
  });
});

describe("New Zealand: Light-vehicle Brakes Rule 2002 (motoring association quoting the Rule [2nd])", () => {
  it("< 2,000 kg laden: no brakes required", () => expect(verdict(1950, unbraked, "NZ")).toBe("meets"));
  it("2,000–2,500 kg: one braked axle, override allowed, chains or electric breakaway", () => {
    expect(verdict(2200, { ...override1, breakaway: "none" }, "NZ")).toBe("unclear");
    expect(verdict(2200, { ...override1, breakaway: "electric" }, "NZ")).toBe("meets");
  });
  it("> 2,500 kg: a direct brake controlled by the driver (override only if ECE R13)", () => {
    expect(verdict(2700, { ...override1, axles: 2, brakedAxles: 2 }, "NZ")).toBe("unclear");
    expect(verdict(2700, electric2, "NZ")).toBe("meets");
  });
});

describe("United Kingdom (trailer trade association summary [2nd])", () => {
  const smallCar: Partial<TowVehicle> = { emptyMassKg: 1200, gvmKg: 1800, gcmKg: 3300 };
  it("unbraked only up to the lesser of 750 kg and half the kerb weight", () => {
    expect(verdict(600, unbraked, "UK", smallCar)).toBe("meets");
    expect(verdict(700, unbraked, "UK", smallCar)).toBe("does-not-meet");
  });
  it("braked: override on all wheels with a breakaway cable, up to 3,500 kg", () => {
    expect(verdict(1500, override1, "UK")).toBe("meets");
    expect(verdict(1500, { ...override1, breakaway: "none" }, "UK")).toBe("does-not-meet");
    expect(verdict(1500, electric2, "UK")).toBe("unclear");
    expect(verdict(3600, override1, "UK")).toBe("outside-rule");
  });
});

describe("EU pattern (road safety authority, light trailers [src])", () => {
  it("over 750 kg: service brake on every axle and a breakaway brake", () => {
    expect(verdict(800, unbraked, "EU")).toBe("does-not-meet");
    expect(verdict(1500, override1, "EU")).toBe("meets");
    expect(verdict(1500, { ...override1, axles: 2 }, "EU")).toBe("does-not-meet");
  });
});

describe("US states", () => {
  it("Texas: none required up to 4,500 lb gross (state public safety department [src])", () => {
    expect(verdict(lbToKg(4500), unbraked, "US-TX")).toBe("meets");
    expect(verdict(lbToKg(4600), unbraked, "US-TX")).toBe("does-not-meet");
  });
  it("California: camp trailers of 1,500 lb or more need brakes on two wheels (state list [2nd])", () => {
    expect(verdict(lbToKg(1450), { ...unbraked, kind: "camper" }, "US-CA")).toBe("meets");
    expect(verdict(lbToKg(1500), { ...unbraked, kind: "camper" }, "US-CA")).toBe("does-not-meet");
    expect(verdict(1500, { ...electric2, kind: "other" }, "US-CA")).toBe("unclear");
  });
});

describe("Canadian provinces (dealers' association; provincial list quoted in a forum [2nd])", () => {
  it("BC: ≤ 1,400 kg brakes only above half the licensed weight; to 2,800 kg brakes + breakaway; above, no surge", () => {
    const light: Partial<TowVehicle> = { emptyMassKg: 2000, gvmKg: 2600, gcmKg: 5000 };
    expect(verdict(900, unbraked, "CA-BC", light)).toBe("meets");
    expect(verdict(1300, unbraked, "CA-BC", light)).toBe("does-not-meet");
    expect(verdict(2000, { ...electric2, breakaway: "none" }, "CA-BC")).toBe("does-not-meet");
    expect(verdict(3000, { ...override1, axles: 2, brakedAxles: 2, breakaway: "electric" }, "CA-BC")).toBe("does-not-meet");
    expect(verdict(3000, electric2, "CA-BC")).toBe("meets");
  });
  it("Alberta: from 909 kg an independent brake (surge unclear) and breakaway over 907 kg", () => {
    expect(verdict(900, unbraked, "CA-AB")).toBe("meets");
    expect(verdict(950, { ...electric2 }, "CA-AB")).toBe("meets");
    expect(verdict(950, { ...override1, breakaway: "electric" }, "CA-AB")).toBe("unclear");
    expect(verdict(950, unbraked, "CA-AB")).toBe("does-not-meet");
  });
});
