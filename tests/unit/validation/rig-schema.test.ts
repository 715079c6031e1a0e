/** The rig JSON schema accepts the generic presets and catches typing slips with a field-level message. */
import { describe, expect, it } from "vitest";
import { UTE_AND_CARAVAN, WAGON_AND_CAMPER } from "@/lib/thermal";
import { rigSchema, savedRigInputSchema } from "@/lib/validation/rig";

const clone = <T>(x: T): T => structuredClone(x);

describe("rig schema", () => {
  it("accepts the generic presets", () => {
    expect(rigSchema.safeParse(UTE_AND_CARAVAN).success).toBe(true);
    expect(rigSchema.safeParse(WAGON_AND_CAMPER).success).toBe(true);
  });
  it("catches a mass typed in tonnes and a diameter in millimetres", () => {
    const rig = clone(UTE_AND_CARAVAN);
    rig.vehicle.gvmKg = 3.15;
    (rig.vehicle.frontBrakes as { diameterM: number }).diameterM = 320;
    const issues = rigSchema.safeParse(rig).error!.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    expect(issues).toContain("vehicle.gvmKg: The GVM must be between 500 and 12000 kg.");
    expect(issues).toContain("vehicle.frontBrakes.diameterM: The brake diameter must be between 0.15 and 0.6 m.");
  });
  it("checks ratings against each other and the gears' order", () => {
    const rig = clone(UTE_AND_CARAVAN);
    rig.trailer!.atmKg = rig.trailer!.tareKg - 1;
    rig.vehicle.transmission = { kind: "manual", gearRatios: [1, 2, 3], finalDrive: 3.7 };
    const messages = rigSchema.safeParse(rig).error!.issues.map((i) => i.message);
    expect(messages).toContain("The ATM must be at least the tare.");
    expect(messages).toContain("List the gear ratios from the lowest gear (largest ratio) to the highest.");
  });
  it("refuses unknown fields and unknown regions", () => {
    expect(rigSchema.safeParse({ ...UTE_AND_CARAVAN, colour: "red" }).success).toBe(false);
    expect(savedRigInputSchema.safeParse({ name: "X", region: "Mars", rig: UTE_AND_CARAVAN }).error?.issues[0]?.message).toBe("Choose the region whose rules apply.");
  });
});
