/**
 * The law before the heat: a rig that fails a mass rating or its region's trailer-brake rule is not advised,
 * whatever its brakes' temperatures, and that reason comes first (docs/model.md, "Verdict").
 */

import { checkMasses, checkTrailerBrakes, type Region } from "@/lib/compliance";
import type { Rig } from "@/lib/thermal";

/**
 * Reasons, in plain words, why a rig may not be driven as described: every mass rating it exceeds, and its
 * trailer's brakes where they do not meet the region's rule (judged on the mass the rule names).
 * @param rig the rig (validated)
 * @param region the rig's region, or null to check the ratings only
 * @returns the reasons (empty when none)
 * @example legalReasons(unbrakedVan, "AU")[0] // "Trailer brakes: Brakes are required at this mass and the trailer has none."
 */
export function legalReasons(rig: Rig, region: Region | null): string[] {
  const reasons: string[] = [];
  for (const check of checkMasses(rig)) {
    if (check.status !== "over" || check.actualKg === null || check.limitKg === null) continue;
    reasons.push(`${check.label}: ${Math.round(check.actualKg)} kg is over the rating of ${Math.round(check.limitKg)} kg.`);
  }
  const brakes = region === null ? null : checkTrailerBrakes(rig, region);
  if (brakes !== null && brakes.verdict === "does-not-meet") {
    reasons.unshift(`Trailer brakes at ${Math.round(brakes.massKg)} kg: ${brakes.problems.join(" ")}`);
  }
  return reasons;
}
