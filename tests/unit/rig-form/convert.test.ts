/**
 * The rig form's units. Exact factors (1959 agreement; NIST SP 811 App. B): 1 lb = 0.45359237 kg,
 * 1 in = 25.4 mm, 1 cu in = 16.387064 cm³.
 */
import { describe, expect, it } from "vitest";
import { formToRig, rigToForm } from "@/lib/rig-form/convert";
import { fromField, toField } from "@/lib/rig-form/quantities";
import { UTE_AND_CARAVAN, MID_SIZE_UTE, UTE_LOAD } from "@/lib/thermal";
import { rigSchema } from "@/lib/validation/rig";

describe("rig form units", () => {
  it("converts with the exact definitions", () => {
    expect(fromField("1000", "mass", "imperial")).toBeCloseTo(453.59237, 6);
    expect(fromField("12", "diameter", "imperial")).toBeCloseTo(0.3048, 9);
    expect(fromField("170", "displacement", "imperial")).toBeCloseTo(170 * 16.387064e-6, 12);
    expect(toField(0.0028, "displacement", "metric")).toBe("2.8");
    expect(toField(0.32, "diameter", "metric")).toBe("320");
    expect(fromField("", "mass", "metric")).toBeUndefined();
    expect(fromField("12abc", "mass", "metric")).toBeNaN();
  });

  it("a preset goes to the form and back unchanged, in both unit systems", () => {
    for (const units of ["metric", "imperial"] as const) {
      const back = formToRig(rigToForm(UTE_AND_CARAVAN, "Van", "AU", units), units);
      const parsed = rigSchema.parse(back.rig);
      expect(parsed.vehicle.gvmKg).toBeCloseTo(UTE_AND_CARAVAN.vehicle.gvmKg, units === "metric" ? 6 : 0);
      expect(parsed.trailer?.atmKg).toBeCloseTo(UTE_AND_CARAVAN.trailer!.atmKg, units === "metric" ? 6 : 0);
      expect(parsed.vehicle.frontBrakes.diameterM).toBeCloseTo(0.32, 2);
    }
  });

  it("leaves the trailer out when switched off, and names a field typed wrong", () => {
    const form = rigToForm({ vehicle: MID_SIZE_UTE, load: UTE_LOAD }, "Solo", "AU", "metric");
    expect(form.hasTrailer).toBe(false);
    form.values["vehicle__gvmKg"] = "heavy";
    const result = rigSchema.safeParse(formToRig(form, "metric").rig);
    expect(result.error?.issues.map((i) => i.path.join("."))).toContain("vehicle.gvmKg");
  });
});
