/**
 * The what-if's cooling and heat-split controls (lib/analysis/what-if.ts): they reach the model's parameters,
 * change the heat run the way the physics says, and scenarios saved before they existed still load.
 */
import { describe, expect, it } from "vitest";
import { changesAnything, emptyWhatIf, normalizeWhatIf, whatIfOptions, type WhatIfSettings } from "@/lib/analysis/what-if";
import { runWhatIf } from "@/lib/analysis/what-if";
import { prepareRoute, validateRouteProfile } from "@/lib/thermal";
import { whatIfSettingsSchema } from "@/lib/validation/plan";
import { oneDescent, UTE_VAN } from "../advice/scenarios";

const id = "6f1d3c2a-0b7e-4c1a-9d55-3a1e0c7b9d01";

describe("what-if cooling and front share", () => {
  it("are changes, and reach the model's parameters", () => {
    expect(changesAnything(emptyWhatIf(id))).toBe(false);
    expect(changesAnything({ ...emptyWhatIf(id), coolingFactor: 0.7 })).toBe(true);
    expect(changesAnything({ ...emptyWhatIf(id), frontShare: 0.6 })).toBe(true);
    const o = whatIfOptions({ params: { ambientC: 30, coolingFactor: 1.2 } }, [], null, { ...emptyWhatIf(id), coolingFactor: 0.7, frontShare: 0.6 });
    expect(o.params).toMatchObject({ ambientC: 30, coolingFactor: 0.7, frontShare: 0.6 });
    const unchanged = whatIfOptions({ params: { coolingFactor: 1.2 } }, [], null, emptyWhatIf(id));
    expect(unchanged.params).toEqual({ coolingFactor: 1.2 });
  });
  it("accepts an old scenario without them, and refuses values out of range", () => {
    const old = { planRigId: id, applyAdvice: true, descentSpeedMs: null, gear: null, ambientC: null, trailerGain: null, vehiclePayloadKg: null, trailerLoadKg: null, padFamily: null };
    expect(whatIfSettingsSchema.safeParse(old).success).toBe(true);
    expect(normalizeWhatIf(old as WhatIfSettings)).toMatchObject({ coolingFactor: null, frontShare: null, applyAdvice: true });
    expect(whatIfSettingsSchema.safeParse({ ...old, coolingFactor: 1.5, frontShare: 0.5 }).success).toBe(true);
    expect(whatIfSettingsSchema.safeParse({ ...old, coolingFactor: 2 }).success).toBe(false);
    expect(whatIfSettingsSchema.safeParse({ ...old, frontShare: 0.9 }).success).toBe(false);
  });
  it("less cooling gives hotter brakes, a larger front share hotter fronts and cooler rears", () => {
    const { profile, descents } = oneDescent(-0.08, 6000);
    const route = prepareRoute(validateRouteProfile(profile), descents);
    const peak = (s: WhatIfSettings, j: number) => runWhatIf(route, descents, UTE_VAN, {}, null, s).descents[0]!.positions[j]!.peakC;
    const base = emptyWhatIf(id);
    expect(peak({ ...base, coolingFactor: 0.5 }, 0)).toBeGreaterThan(peak({ ...base, coolingFactor: 1.5 }, 0));
    expect(peak({ ...base, frontShare: 0.8 }, 0)).toBeGreaterThan(peak({ ...base, frontShare: 0.5 }, 0));
    expect(peak({ ...base, frontShare: 0.8 }, 1)).toBeLessThan(peak({ ...base, frontShare: 0.5 }, 1));
  });
});
