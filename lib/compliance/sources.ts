/**
 * Sources and dates of the compliance rules, as listed in docs/trade-facts.md §1–2.
 * No rule here has been checked against the regulator's own text since they were gathered: each says so.
 */

import type { RuleSource } from "./types";

/** Date the rules were gathered and last checked (ISO 8601). */
export const RULES_LAST_CHECKED = "2026-12-01";

/** What the rules were checked against. */
export const RULES_CHECKED_AGAINST =
  "secondary sources gathered for Fadeline (industry guides, motoring clubs, quoted regulations); verify with the regulator before relying on a rule";

/** Sources of the mass terms (docs/trade-facts.md §1.1) and of the owner's checklist. */
export const MASS_TERM_SOURCES: RuleSource[] = [
  {
    title: "ADR definitions (GVM, GCM, ATM, GTM), Vehicle Standard (ADR – Definitions and Vehicle Categories) 2005",
    url: null,
    tag: "src",
  },
  {
    title: "State road-safety caravan checklist: loaded mass must not exceed the towbar rating, towing capacity/GCM, ATM or tyre ratings",
    url: "https://roadsafety.transport.nsw.gov.au/stayingsafe/drivers/caravan-safety/checklist.html",
    tag: "src",
  },
  {
    title: "Motoring-club guide: GVM includes occupants, accessories, cargo and tow-ball mass; payload = GVM − kerb",
    url: "https://thehub.nrma.com.au/drive/how-much-your-vehicle-designed-carry-or-tow",
    tag: "2nd",
  },
];
