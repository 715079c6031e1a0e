/**
 * Whether a trailer's brakes meet the rule for its mass in a region (docs/trade-facts.md §2.2). Conservative on the
 * mass: the plated rating or the loaded mass, whichever is higher (NZ: the laden weight).
 */

import { RUNNING_ORDER_DRIVER_KG, rigMasses, type Rig, type TowVehicle } from "@/lib/thermal";
import { BRAKE_RULES, type RegionRule } from "./brake-rules";
import type { BrakeRequirement, BrakeRule, BrakeVerdict, Region, TrailerBrakeCheck } from "./types";

/**
 * Check the trailer's brakes against the region's rule.
 * @param rig the rig (validated)
 * @param region the user's region
 * @returns the check, or null without a trailer
 * @example checkTrailerBrakes(UTE_AND_CARAVAN, "AU")?.verdict // "meets"
 */
export function checkTrailerBrakes(rig: Rig, region: Region): TrailerBrakeCheck | null {
  const trailer = rig.trailer;
  if (!trailer) return null;
  const rule = BRAKE_RULES[region];
  const masses = rigMasses(rig);
  const reasons: string[] = [];
  const vehicleKg = approximateKerbKg(rig.vehicle);
  if (region === "UK") reasons.push(`Half the towing vehicle's kerb weight taken as ${round(vehicleKg / 2)} kg.`);
  if (region === "CA-BC" || region === "CA-AB") {
    reasons.push(`The towing vehicle's licensed weight is taken as its empty mass, ${round(vehicleKg)} kg: check the registration.`);
  }
  const atmBasis = Math.max(trailer.atmKg, masses.trailerKg);
  // Each rule is judged on the mass it names: ADR 38/05 sets its trailer classes by ATM (the rated mass, or
  // the loaded mass if higher), New Zealand's rule by the laden weight.
  const massKg = region === "NZ" ? masses.trailerKg : atmBasis;
  if (region === "AU" && atmBasis > 4500) {
    return outside(rule, atmBasis, reasons, "Over 4,500 kg ATM is outside the light-trailer rules (VSB 1 scope).");
  }
  const requirement = rule.requirementAt(massKg, vehicleKg);
  if (requirement === null) return outside(rule, massKg, reasons, "This trailer is heavier than the rule on file covers.");
  const problems: string[] = [];
  const doubts: string[] = [];
  judge(rig, region, requirement, problems, doubts);
  const verdict: BrakeVerdict = problems.length > 0 ? "does-not-meet" : doubts.length > 0 ? "unclear" : "meets";
  return { rule: publicRule(rule), massKg, requirement, verdict, reasons: [...reasons, ...problems, ...doubts], problems };
}

/** @private Compare the trailer with a requirement; push problems (fails) and doubts (cannot tell). */
function judge(rig: Rig, region: Region, r: BrakeRequirement, problems: string[], doubts: string[]): void {
  const t = rig.trailer!;
  if (!r.brakesRequired) return;
  if (t.brakeType === "none") {
    problems.push("Brakes are required at this mass and the trailer has none.");
    return;
  }
  if (t.brakedAxles < r.minBrakedAxles) problems.push(`At least ${r.minBrakedAxles} braked axle(s) are required.`);
  if (r.allWheels && t.brakedAxles < t.axles) problems.push("Brakes are required on all wheels.");
  if (t.brakeType === "override" && (!r.overrideAllowed || r.driverOperable)) {
    if (region === "CA-AB") doubts.push("An independent brake is required: check whether override (surge) brakes count.");
    else if (region === "NZ") doubts.push("Override brakes qualify only if they are an ECE R13 override system.");
    else problems.push("Override (surge) brakes do not meet this rule: brakes the driver can operate are required.");
  }
  if (region === "UK" && t.brakeType !== "override") {
    doubts.push("The UK rules on file describe override couplings; check how other systems are approved.");
  }
  if (region === "US-CA" && t.kind === "other") doubts.push("The rule on file covers trailer coaches and camp trailers.");
  if (r.breakawayRequired) {
    if (t.breakaway === "none") {
      if (region === "NZ") doubts.push("Needs crossed, bolted safety chains or an electric breakaway system.");
      else problems.push("A breakaway system is required and none is fitted.");
    } else if (region === "AU" && t.breakaway === "cable") {
      doubts.push("The breakaway brakes must stay on for at least 15 minutes: check the cable system does.");
    }
  }
}

/** @private */
function outside(rule: RegionRule, massKg: number, reasons: string[], why: string): TrailerBrakeCheck {
  return { rule: publicRule(rule), massKg, requirement: null, verdict: "outside-rule", reasons: [...reasons, why], problems: [] };
}

/** @private The rule without its function (plain data for JSON). */
function publicRule(rule: RegionRule): BrakeRule {
  const { requirementAt: _unused, ...data } = rule;
  return data;
}

/**
 * The vehicle's kerb mass as near as the data allows: a running-order mass less its 75 kg driver [M, Reg (EU)
 * 1230/2012]; a tare mass as given (it lacks most of the fuel, which makes half-kerb limits stricter).
 * @param vehicle the tow vehicle
 * @returns approximate kerb mass, kg
 * @example approximateKerbKg(MID_SIZE_UTE) // 2150
 */
export function approximateKerbKg(vehicle: TowVehicle): number {
  return vehicle.emptyMassDefinition === "running-order"
    ? vehicle.emptyMassKg - RUNNING_ORDER_DRIVER_KG
    : vehicle.emptyMassKg;
}

/** @private */
function round(kg: number): number {
  return Math.round(kg);
}
