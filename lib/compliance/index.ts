/**
 * lib/compliance — pure mass-compliance checks of a rig (docs/trade-facts.md §1–2). The single public import point:
 * `import { checkRigCompliance } from "@/lib/compliance"`. Masses in kg.
 */

export type * from "./types";
export { checkRigCompliance, REGIONS } from "./check-rig";
export { checkMasses } from "./mass-checks";
export { checkTrailerBrakes, approximateKerbKg } from "./trailer-brakes";
export { BRAKE_RULES, type RegionRule } from "./brake-rules";
export { rulesOfThumb } from "./rules-of-thumb";
export { payloadTrap } from "./payload-trap";
export { MASS_TERM_SOURCES, RULES_CHECKED_AGAINST, RULES_LAST_CHECKED } from "./sources";
