/** The whole mass-compliance report of a rig for a region. */

import { rigMasses, validateRig } from "@/lib/thermal";
import { checkMasses } from "./mass-checks";
import { payloadTrap } from "./payload-trap";
import { rulesOfThumb } from "./rules-of-thumb";
import { MASS_TERM_SOURCES } from "./sources";
import { checkTrailerBrakes } from "./trailer-brakes";
import type { ComplianceReport, Region } from "./types";

/** Regions with rules on file. */
export const REGIONS: readonly Region[] = ["AU", "NZ", "UK", "EU", "US-TX", "US-CA", "CA-BC", "CA-AB"];

/**
 * Check a rig's masses against its ratings and its trailer's brakes against the region's rule, with rules of
 * thumb (common practice) and the payload-at-full-tow trap.
 * @param rig the rig (validated here; throws TypeError/RangeError with exact messages)
 * @param region the user's region
 * @returns the report; masses in kg
 * @throws {TypeError} "region must be one of: AU, NZ, UK, EU, US-TX, US-CA, CA-BC, CA-AB"
 * @example checkRigCompliance(UTE_AND_CARAVAN, "AU").payloadTrap.applies // true
 */
export function checkRigCompliance(rig: unknown, region: Region): ComplianceReport {
  const valid = validateRig(rig);
  if (!REGIONS.includes(region)) throw new TypeError(`region must be one of: ${REGIONS.join(", ")}`);
  return {
    region,
    masses: rigMasses(valid),
    checks: checkMasses(valid),
    trailerBrakes: checkTrailerBrakes(valid, region),
    rulesOfThumb: rulesOfThumb(valid, region),
    payloadTrap: payloadTrap(valid),
    sources: MASS_TERM_SOURCES,
  };
}
