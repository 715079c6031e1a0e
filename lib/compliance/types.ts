/**
 * Types of the mass-compliance checks. Masses in kg. Every rule names its sources and a "last checked" date;
 * rules of thumb are labelled common practice, never law.
 */

import type { RigMasses } from "@/lib/thermal";

/** Regions with a trailer-brake rule on file (docs/trade-facts.md §2.2). */
export type Region = "AU" | "NZ" | "UK" | "EU" | "US-TX" | "US-CA" | "CA-BC" | "CA-AB";

/** Outcome of one mass check. */
export type MassCheckStatus = "ok" | "over" | "not-checked";

/** One rating compared with the rig's actual mass. */
export interface MassCheck {
  /** Which rating. */
  id: "gvm" | "gcm" | "atm" | "gtm" | "towing-capacity" | "tow-ball" | "front-axle" | "rear-axle";
  /** Plain-words label. */
  label: string;
  /** Actual mass, kg (null when not known). */
  actualKg: number | null;
  /** Rating, kg (null when not given). */
  limitKg: number | null;
  /** Rating minus actual, kg (negative: over; null when not checked). */
  marginKg: number | null;
  /** Result. */
  status: MassCheckStatus;
  /** Plain-words note (how the actual mass was found, why it was not checked). */
  note: string | null;
}

/** Where a rule or fact comes from (tags as in docs/trade-facts.md, "How sources are named"). */
export interface RuleSource {
  /** What the source is, in plain words. */
  title: string;
  /** Where to read it, when the source has one. */
  url: string | null;
  /** [src] official; [2nd] secondary; [from memory]. */
  tag: "src" | "2nd" | "from memory";
}

/** A trailer-brake rule of one region. */
export interface BrakeRule {
  /** Region. */
  region: Region;
  /** Rule name. */
  title: string;
  /** The rule in plain words. */
  summary: string;
  /** Which trailer mass the rule is keyed to. */
  massBasis: string;
  /** Sources. */
  sources: RuleSource[];
  /** Date the rule was last checked (ISO 8601), and against what. */
  lastChecked: { date: string; against: string };
}

/** What a rule requires of a trailer of a given mass. */
export interface BrakeRequirement {
  /** Service brakes required. */
  brakesRequired: boolean;
  /** Brakes on every wheel. */
  allWheels: boolean;
  /** At least this many braked axles. */
  minBrakedAxles: number;
  /** Override (surge) brakes accepted. */
  overrideAllowed: boolean;
  /** Brakes the driver can operate from the seat. */
  driverOperable: boolean;
  /** Breakaway system required. */
  breakawayRequired: boolean;
  /** The requirement in plain words. */
  text: string;
}

/** Verdict of the trailer-brake check. */
export type BrakeVerdict = "meets" | "does-not-meet" | "unclear" | "outside-rule";

/** The trailer-brake check for one region. */
export interface TrailerBrakeCheck {
  /** The rule applied. */
  rule: BrakeRule;
  /** The mass the rule was applied to, kg. */
  massKg: number;
  /** What the rule asks at that mass (null outside the rule's scope). */
  requirement: BrakeRequirement | null;
  /** Verdict. */
  verdict: BrakeVerdict;
  /** Reasons in plain words (how the mass was taken, then the problems, then the doubts). */
  reasons: string[];
  /** The ways the trailer fails the rule, in plain words (empty unless the verdict is "does-not-meet"). */
  problems: string[];
}

/** A rule of thumb: common practice, not law. */
export interface RuleOfThumb {
  /** Which rule of thumb. */
  id: "tow-ball-share" | "caravan-to-kerb" | "nz-unbraked-three-quarters" | "electric-brakes-over-half";
  /** Always "common practice, not law". */
  label: "common practice, not law";
  /** Name. */
  title: string;
  /** The rig's value (a ratio, dimensionless). */
  value: number;
  /** The guideline range of that ratio [low, high] (dimensionless). */
  guideline: [number, number];
  /** Within the guideline; null where the guideline is informational only. */
  withinGuideline: boolean | null;
  /** Plain words. */
  explanation: string;
  /** Where the rule of thumb is repeated. */
  sources: RuleSource[];
}

/** The "payload left at full tow" trap. */
export interface PayloadTrap {
  /** True when the GCM leaves less payload at full towing capacity than the GVM suggests. */
  applies: boolean;
  /** Payload (people, fuel beyond the empty mass, accessories, cargo) left at full rated tow, kg. */
  payloadAtFullTowKg: number;
  /** Payload the GVM alone would allow with the tow ball at full tow, kg. */
  payloadByGvmKg: number;
  /** Most payload with this trailer as loaded, kg. */
  payloadWithThisTrailerKg: number;
  /** Payload carried now, kg. */
  payloadNowKg: number;
  /** Heaviest trailer with the vehicle as loaded now, kg. */
  maxTrailerNowKg: number;
  /** The explanation in plain words (empty when it does not apply). */
  explanation: string;
}

/** Everything the rig page shows for mass compliance. */
export interface ComplianceReport {
  /** Region the rules were taken for. */
  region: Region;
  /** The rig's actual masses. */
  masses: RigMasses;
  /** Ratings compared with actual masses. */
  checks: MassCheck[];
  /** Trailer-brake rule check (null without a trailer). */
  trailerBrakes: TrailerBrakeCheck | null;
  /** Rules of thumb, labelled common practice. */
  rulesOfThumb: RuleOfThumb[];
  /** The payload-at-full-tow trap. */
  payloadTrap: PayloadTrap;
  /** Sources of the mass terms and checks. */
  sources: RuleSource[];
}
