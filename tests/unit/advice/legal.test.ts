/**
 * The law before the heat (docs/model.md, "Verdict"): a rig that exceeds a mass rating or fails its region's
 * trailer-brake rule is not advised whatever its brake temperatures, with that reason first. Rules: ADR 38/05
 * (Australia: up to 750 kg ATM no brakes required, above it brakes required; legislation.gov.au F2018L00692)
 * and the vehicle's own ratings (GVM).
 */

import { describe, expect, it } from "vitest";
import { adviseRig, renderRigAdvice } from "@/lib/advice";
import { UTE_AND_CARAVAN, type Rig } from "@/lib/thermal";
import { rigWithTrailer } from "../compliance/rig-fixtures";
import { oneDescent } from "./scenarios";

/** A gentle descent (4 % for 2 km) on which nothing gets warm: only the law can make these rigs not advised. */
const gentle = oneDescent(-0.04, 2000);
const advise = (rig: Rig, region: "AU" | null = "AU") =>
  adviseRig({ route: gentle.profile, descents: gentle.descents, rig, region });

describe("the law before the heat", () => {
  it("an unbraked 2.8 t van is not advised in Australia (ADR 38/05: brakes above 750 kg ATM), reason first", () => {
    const van = rigWithTrailer(2800, { brakeType: "none", brakedAxles: 0, breakaway: "none", brakes: undefined });
    const a = advise(van);
    expect(a.verdict).toBe("not advised");
    expect(a.legalReasons[0]).toMatch(/^Trailer brakes at 2800 kg: Brakes are required at this mass and the trailer has none\./);
    const text = renderRigAdvice(a, "metric");
    expect(text[0]).toBe("Verdict: not advised.");
    expect(text[1]).toContain("Brakes are required at this mass and the trailer has none.");
  });

  it("a rig over its GVM is not advised, and says by how much", () => {
    const heavy: Rig = { ...UTE_AND_CARAVAN, load: { ...UTE_AND_CARAVAN.load, vehiclePayloadKg: 1200 } };
    const a = advise(heavy);
    expect(a.verdict).toBe("not advised");
    expect(a.legalReasons.some((r) => /GVM/.test(r) && /over the rating/.test(r))).toBe(true);
  });

  it("the preset rig within its ratings and with braked trailer is judged on the heat alone", () => {
    const a = advise(UTE_AND_CARAVAN);
    expect(a.legalReasons).toEqual([]);
    expect(a.verdict).toBe("clear");
  });

  it("without a region only the ratings are checked", () => {
    const van = rigWithTrailer(2800, { brakeType: "none", brakedAxles: 0, breakaway: "none", brakes: undefined });
    expect(advise(van, null).legalReasons).toEqual([]);
  });
});
