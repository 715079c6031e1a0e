/** Rules of thumb: always labelled common practice, never law (docs/trade-facts.md §1.5). */

import { describe, expect, it } from "vitest";
import { rulesOfThumb } from "@/lib/compliance";
import { UTE_AND_CARAVAN } from "@/lib/thermal";
import { rigWithTrailer } from "./rig-fixtures";

describe("rules of thumb", () => {
  it("are all labelled common practice, not law, and never claim to be law", () => {
    for (const region of ["AU", "NZ", "UK", "US-TX"] as const) {
      for (const r of rulesOfThumb(rigWithTrailer(1800, { brakeType: "none", brakedAxles: 0, breakaway: "none" }), region)) {
        expect(r.label).toBe("common practice, not law");
        expect(r.explanation).toMatch(/not law|no published source|guideline/);
      }
    }
  });

  it("tow ball ≈ 10 % of the trailer in Australia (common practice, no source): a weighed 10 % is within it", () => {
    const [ball] = rulesOfThumb(rigWithTrailer(2500), "AU");
    expect(ball).toMatchObject({ id: "tow-ball-share", value: 0.1, withinGuideline: true });
  });

  it("an estimated tow ball is not judged against the guideline", () => {
    const [ball] = rulesOfThumb(UTE_AND_CARAVAN, "AU");
    expect(ball!.withinGuideline).toBeNull();
    expect(ball!.explanation).toContain("an estimate: weigh it");
  });

  it("85 % caravan-to-kerb guideline (UK caravan-club recommendation, not law)", () => {
    const heavy = rulesOfThumb(UTE_AND_CARAVAN, "UK").find((r) => r.id === "caravan-to-kerb")!;
    expect(heavy.value).toBeCloseTo(2800 / 2150, 10);
    expect(heavy.withinGuideline).toBe(false);
    const light = rulesOfThumb(rigWithTrailer(1700), "UK").find((r) => r.id === "caravan-to-kerb")!;
    expect(light.withinGuideline).toBe(true);
  });

  it("NZ ¾ unbraked recommendation and the AU electric-brakes-over-half opinion appear only where they apply", () => {
    const unbraked = rigWithTrailer(1200, { brakeType: "none", brakedAxles: 0, breakaway: "none" });
    expect(rulesOfThumb(unbraked, "NZ").map((r) => r.id)).toContain("nz-unbraked-three-quarters");
    expect(rulesOfThumb(unbraked, "AU").map((r) => r.id)).toContain("electric-brakes-over-half");
    expect(rulesOfThumb(UTE_AND_CARAVAN, "AU").map((r) => r.id)).toEqual(["tow-ball-share", "caravan-to-kerb"]);
  });
});
