/**
 * Trailer-brake rules by region (docs/trade-facts.md §2.2), each with its sources and last-checked date. A rule maps
 * a trailer mass (and, where the rule says so, the towing vehicle's mass) to what it requires.
 */

import { lbToKg } from "@/lib/thermal";
import { RULES_CHECKED_AGAINST, RULES_LAST_CHECKED } from "./sources";
import type { BrakeRequirement, BrakeRule, Region, RuleSource } from "./types";

/** A rule with its requirement function. */
export interface RegionRule extends BrakeRule {
  /**
   * What the rule requires of a trailer of `massKg` behind a vehicle of `vehicleKg` (kerb mass for the UK rule,
   * licensed or unladen weight for BC and Alberta), kg; null outside the rule's scope.
   */
  requirementAt: (massKg: number, vehicleKg: number) => BrakeRequirement | null;
}

const NONE: BrakeRequirement = {
  brakesRequired: false, allWheels: false, minBrakedAxles: 0, overrideAllowed: true, driverOperable: false,
  breakawayRequired: false, text: "No brakes required.",
};
const req = (r: Partial<BrakeRequirement> & { text: string }): BrakeRequirement => ({
  ...NONE, brakesRequired: true, minBrakedAxles: 1, ...r,
});
const checked = { date: RULES_LAST_CHECKED, against: RULES_CHECKED_AGAINST };
const src = (title: string, url: string | null, tag: RuleSource["tag"] = "2nd"): RuleSource => ({ title, url, tag });

/** @private The first band whose upper bound (inclusive, kg) the mass does not exceed. */
function band(massKg: number, bands: readonly (readonly [number, BrakeRequirement | null])[]): BrakeRequirement | null {
  for (const [upTo, requirement] of bands) if (massKg <= upTo) return requirement;
  return null;
}

const AU_HEAVY = req({
  allWheels: true, overrideAllowed: false, driverOperable: true, breakawayRequired: true,
  text: "Brakes on all wheels, operable from the driver's seat; override brakes not permitted; a breakaway system that stays applied for at least 15 minutes.",
});
const BC_HEAVY = req({
  allWheels: true, overrideAllowed: false, driverOperable: true, breakawayRequired: true,
  text: "Brakes on all axles that the driver can apply independently (a surge brake does not meet this) and a breakaway brake.",
});

/** The rules on file. */
export const BRAKE_RULES: Readonly<Record<Region, RegionRule>> = {
  AU: {
    region: "AU",
    title: "Australia: ADR 38 / VSB 1 trailer brakes (states add extras)",
    summary: "Up to 750 kg no brakes; 751–2,000 kg brakes on one axle, override allowed; over 2,000 kg brakes on all wheels operable from the driver's seat, no override, breakaway holding ≥ 15 min (to 4,500 kg ATM).",
    massBasis: "ATM (ADR 38/05 sets its trailer classes by aggregate trailer mass)",
    sources: [
      src("ADR 38/05 – Trailer Brake Systems (legislation.gov.au F2018L00692)", null, "src"),
      src("National towing guide, braking systems (industry association)", "https://caravantowingguide.com.au/braking-systems/"),
      src("ADR 38/02 breakaway wording, quoted by a service centre", "https://rvservicecentre.com.au/blog/article?cHash=6f6ef133aa6ba3ff0f5299a535ba00c2&tx_news_pi1%5Bnews%5D=405"),
    ],
    lastChecked: checked,
    requirementAt: (m) => band(m, [
      [750, NONE],
      [2000, req({ text: "Brakes on the wheels of at least one axle; override brakes permitted." })],
      [4500, AU_HEAVY],
    ]),
  },
  NZ: {
    region: "NZ",
    title: "New Zealand: Land Transport Rule: Light-vehicle Brakes 2002",
    summary: "Under 2,000 kg no brakes required (the combination must stop within 7 m from 30 km/h); 2,000–2,500 kg brakes on one axle, override allowed, crossed chains or an electric breakaway; over 2,500 kg a direct brake controlled by the driver (or an ECE R13 override system).",
    massBasis: "laden weight of the trailer",
    sources: [
      src("Motoring association summary quoting the Rule", "http://www.aa.co.nz/cars/maintenance/towing/driving-with-trailer/"),
      src("Trailer regulations update (R13 override amendment)", "https://www.treadway.co.nz/Trailer+FAQ++Resources/Articles/Trailer+Regulations+Update.html"),
    ],
    lastChecked: checked,
    requirementAt: (m) => (m < 2000
      ? { ...NONE, text: "No brakes required, but any brakes fitted must work; stop within 7 m from 30 km/h." }
      : band(m, [
        [2500, req({ breakawayRequired: true, text: "Brakes on at least one axle; override (indirect) brakes allowed; crossed, bolted safety chains or an electric breakaway system." })],
        [Infinity, req({ overrideAllowed: false, driverOperable: true, text: "A direct brake system controlled by the driver (or an ECE R13 override system, per later amendments)." })],
      ])),
  },
  UK: {
    region: "UK",
    title: "United Kingdom: light trailer brakes",
    summary: "Unbraked only up to 750 kg gross or half the towing vehicle's kerb weight, whichever is less; braked trailers need a damped override coupling with auto-reverse brakes on all wheels and a breakaway cable; overrun-braked maximum 3,500 kg.",
    massBasis: "trailer gross mass (MAM), or its loaded mass if higher",
    sources: [src("Trailer trade association summary of the law", "https://www.ntta.co.uk/law/trailers/brakes")],
    lastChecked: checked,
    requirementAt: (m, kerbKg) => band(m, [
      [Math.min(750, kerbKg / 2), NONE],
      [3500, req({ allWheels: true, breakawayRequired: true, text: "Damped override coupling with auto-reverse brakes on all wheels and a breakaway cable (not looped over the ball)." })],
    ]),
  },
  EU: {
    region: "EU",
    title: "EU pattern (example: Ireland's light-trailer rules)",
    summary: "Over 750 kg a service brake, a parking brake and a breakaway brake; tandem O2 trailers (built after June 2011) braked on both axles. Heavier than 3,500 kg is outside this rule.",
    massBasis: "design gross vehicle weight (ATM), or its loaded mass if higher",
    sources: [
      src("Road safety authority, braking requirements for light trailers", "http://rsa.ie/road-safety/road-users/professional-drivers/vehicle-safety-legislation/light-trailers/braking-requirements-for-light-trailers", "src"),
      src("O2 trailer category ends at 3,500 kg", null, "from memory"),
    ],
    lastChecked: checked,
    requirementAt: (m) => band(m, [
      [750, NONE],
      [3500, req({ allWheels: true, breakawayRequired: true, text: "A service brake on every axle, a parking brake and a breakaway brake." })],
    ]),
  },
  "US-TX": {
    region: "US-TX",
    title: "Texas: trailer brakes",
    summary: "No brakes required up to 4,500 lb gross; above that, brakes are required (see the state page for details).",
    massBasis: "gross weight",
    sources: [src("State department of public safety, brakes", "http://www.dps.texas.gov/cve/brakes.htm", "src")],
    lastChecked: checked,
    requirementAt: (m) => band(m, [
      [lbToKg(4500), NONE],
      [Infinity, req({ text: "Brakes required above 4,500 lb gross; check the state page for which wheels and for breakaway." })],
    ]),
  },
  "US-CA": {
    region: "US-CA",
    title: "California: trailer coaches and camp trailers",
    summary: "Trailer coaches and camp trailers of 1,500 lb gross or more need brakes on at least two wheels.",
    massBasis: "gross vehicle weight",
    sources: [
      src("State list quoted in an owners' forum", "https://community.goodsam.com/discussions/rvnewbiesforum-board/opinion-on-trailer-brakes/1645351/replies/1645358"),
      src("Highway patrol officer's newspaper column", "https://www.pasadenastarnews.com/2010/07/12/ask-a-cop-make-sure-safety-comes-in-tow-this-summer/"),
    ],
    lastChecked: checked,
    requirementAt: (m) => (m < lbToKg(1500) ? NONE : req({ text: "Brakes on at least two wheels (trailer coaches and camp trailers)." })),
  },
  "CA-BC": {
    region: "CA-BC",
    title: "British Columbia: trailer brakes",
    summary: "Up to 1,400 kg brakes only if the trailer exceeds half the towing vehicle's licensed weight; 1,401–2,800 kg brakes and a breakaway brake; over 2,800 kg brakes on all axles the driver can apply independently (a surge brake does not meet this) and a breakaway brake.",
    massBasis: "trailer gross weight",
    sources: [src("RV dealers' association summary", "https://www.rvda.ca/content.asp?contentid=161")],
    lastChecked: checked,
    requirementAt: (m, vehicleKg) => {
      if (m <= 1400) {
        return m > vehicleKg / 2 ? req({ text: "Brakes: the trailer is more than half the towing vehicle's licensed weight." }) : NONE;
      }
      return m <= 2800 ? req({ breakawayRequired: true, text: "Brakes and a breakaway brake." }) : BC_HEAVY;
    },
  },
  "CA-AB": {
    region: "CA-AB",
    title: "Alberta: trailer brakes",
    summary: "From 909 kg, or over half the towing unit's weight, an independent brake; a breakaway brake over 907 kg.",
    massBasis: "trailer gross weight",
    sources: [src("Provincial list quoted in an owners' forum", "https://community.goodsam.com/discussions/traveltrailerforum-board/unbraked-trailer-towing-limitations/3585046/replies/3585154")],
    lastChecked: checked,
    requirementAt: (m, vehicleKg) => {
      const breakaway = m > 907;
      if (m >= 909 || m > vehicleKg / 2) {
        return req({ driverOperable: true, breakawayRequired: breakaway, text: "An independent brake (verify whether surge brakes count)" + (breakaway ? " and a breakaway brake." : ".") });
      }
      return breakaway ? { ...NONE, breakawayRequired: true, text: "A breakaway brake (over 907 kg)." } : NONE;
    },
  },
};
