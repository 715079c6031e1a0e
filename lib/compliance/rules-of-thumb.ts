/**
 * Rules of thumb: common practice, labelled so, never law.
 */

import { rigMasses, type Rig } from "@/lib/thermal";
import { approximateKerbKg } from "./trailer-brakes";
import type { Region, RuleOfThumb, RuleSource } from "./types";

const LABEL = "common practice, not law" as const;

/** Tow-ball share guidelines by region, as repeated in the trade (ratios). */
const BALL_GUIDELINES: Record<"AU-NZ" | "US-CA" | "UK-EU", { range: [number, number]; text: string; sources: RuleSource[] }> = {
  "AU-NZ": {
    range: [0.08, 0.1],
    text: "about 10 % of the trailer's mass (a caravan magazine gives 8–10 %)",
    sources: [{ title: "Repeated across Australian towing guides; common practice, no published source", url: null, tag: "2nd" }],
  },
  "US-CA": {
    range: [0.1, 0.15],
    text: "10–15 % of the trailer's weight for ball-coupled trailers",
    sources: [{ title: "Repeated in owner's manuals and reference wikis; common practice", url: null, tag: "2nd" }],
  },
  "UK-EU": {
    range: [0.07, 0.07],
    text: "about 7 % of the trailer's mass, an old guideline; the law asks only that it is positive and within the car's and the hitch's limits",
    sources: [{ title: "A caravan forum, which calls it an old guideline; common practice, no source", url: null, tag: "2nd" }],
  },
};

/**
 * The rules of thumb that apply to a rig in a region.
 * @param rig the rig (validated)
 * @param region the user's region
 * @returns rules of thumb, each labelled "common practice, not law"
 * @example rulesOfThumb(UTE_AND_CARAVAN, "AU").map((r) => r.id) // ["tow-ball-share", "caravan-to-kerb"]
 */
export function rulesOfThumb(rig: Rig, region: Region): RuleOfThumb[] {
  const trailer = rig.trailer;
  if (!trailer) return [];
  const m = rigMasses(rig);
  const out: RuleOfThumb[] = [];
  const group = region === "AU" || region === "NZ" ? "AU-NZ" : region === "UK" || region === "EU" ? "UK-EU" : "US-CA";
  const g = BALL_GUIDELINES[group];
  const share = m.towBallKg / m.trailerKg;
  const estimated = m.towBallSource !== "measured";
  out.push({
    id: "tow-ball-share", label: LABEL, title: "Tow-ball mass as a share of the trailer's mass", value: share, guideline: g.range,
    withinGuideline: group === "UK-EU" || estimated ? null : share >= g.range[0] - 1e-9 && share <= g.range[1] + 1e-9,
    explanation: `Your tow ball carries ${pct(share)} of the trailer${estimated ? " (an estimate: weigh it)" : ""}. Common practice is ${g.text}. This is a guideline, not law.`,
    sources: g.sources,
  });
  const kerb = approximateKerbKg(rig.vehicle);
  const ratio = m.trailerKg / kerb;
  out.push({
    id: "caravan-to-kerb", label: LABEL, title: "Loaded caravan against the tow vehicle's kerb mass (the 85 % guideline)", value: ratio,
    guideline: [0, 0.85], withinGuideline: ratio <= 0.85,
    explanation: `The loaded trailer is ${pct(ratio)} of the tow vehicle's kerb mass. A caravan-club recommendation suggests at most 85 % for newer towers and up to 100 % for experienced ones. It is a recommendation, not law.`,
    sources: [{ title: "UK caravan-club recommendation, discussed as not law", url: null, tag: "2nd" }],
  });
  if (region === "NZ" && trailer.brakeType === "none") {
    const unbraked = m.trailerKg / rig.vehicle.emptyMassKg;
    out.push({
      id: "nz-unbraked-three-quarters", label: LABEL, title: "Unbraked laden trailer at most ¾ of the tow vehicle's unladen weight", value: unbraked,
      guideline: [0, 0.75], withinGuideline: unbraked <= 0.75,
      explanation: `The unbraked trailer is ${pct(unbraked)} of the tow vehicle's unladen weight; the transport agency recommends at most 75 %. A recommendation, not law.`,
      sources: [{ title: "Transport agency recommendation, quoted by trailer repair pages", url: null, tag: "2nd" }],
    });
  }
  if (region === "AU" && (trailer.brakeType === "none" || trailer.brakeType === "override")) {
    const half = m.trailerKg / m.vehicleKg;
    out.push({
      id: "electric-brakes-over-half", label: LABEL, title: "Electric brakes once the trailer exceeds about half the vehicle's weight", value: half,
      guideline: [0, 0.5], withinGuideline: half <= 0.5,
      explanation: `The trailer weighs ${pct(half)} of the tow vehicle. A towing writer advises electric brakes above about 50 %, even where the law does not require them. Common practice, no published source.`,
      sources: [{ title: "A towing writer's opinion; common practice, no source", url: null, tag: "2nd" }],
    });
  }
  return out;
}

/** @private */
function pct(ratio: number): string {
  return `${(ratio * 100).toFixed(1)} %`;
}
