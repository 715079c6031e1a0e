/**
 * Brake-setup comparison: the same rig with other brakes on the same route and conditions.
 * Physics: a heavier rotor stores the same heat with a smaller rise (ΔT = Q/(m·c), docs/model.md §7 with
 * hA → 0), and a vented rotor cools better than a solid one of the same mass (docs/model.md §6.1: solid ≈ 0.6 × vented),
 * so both give lower peaks on the same descent; with cooling switched off, venting changes nothing.
 */

import { describe, expect, it } from "vitest";
import { compareBrakeSetups, withBrakeSetup } from "@/lib/advice";
import { UTE_AND_CARAVAN } from "@/lib/thermal";
import { BARE } from "../thermal/rig-helpers";
import { twoDescents, UTE_VAN } from "./scenarios";

const route = twoDescents();
const compare = (variant: Parameters<typeof compareBrakeSetups>[0]["variant"], options = {}) =>
  compareBrakeSetups({ route: route.profile, descents: route.descents, rig: UTE_VAN, variant, options });
const front = (figures: { peaks: { position: string; peakC: number }[] }) => figures.peaks.find((p) => p.position === "front")!.peakC;

describe("compareBrakeSetups", () => {
  it("gives one row per descent, the rig as it is beside the variant", () => {
    const rows = compare({ front: { massKg: 13 } });
    expect(rows.map((r) => r.descentIndex)).toEqual([0, 1]);
    rows.forEach((r, i) => expect(r.descent).toBe(route.descents[i]));
  });

  it("a variant with no changes gives the same figures (a control)", () => {
    for (const row of compare({})) expect(row.variant).toEqual(row.base);
  });

  it("bigger front rotors (13 kg instead of 10 kg) give lower front peaks on every descent", () => {
    for (const row of compare({ front: { massKg: 13 } })) {
      expect(front(row.variant)).toBeLessThan(front(row.base) - 10);
      // the heat split is set by the brake-force distribution, not by the rotor mass: the caravan is unchanged
      const trailer = (f: typeof row.base) => f.peaks.find((p) => p.position === "trailer")!.peakC;
      expect(trailer(row.variant)).toBeCloseTo(trailer(row.base), 6);
      // cooler brakes at the bottom stop no longer than hotter ones from the same speed
      expect(row.variant.stopping[0]!.hot.brakingDistanceM).toBeLessThanOrEqual(row.base.stopping[0]!.hot.brakingDistanceM + 1e-9);
      const warmS = (f: typeof row.base) => f.timeWarmOrAboveS.find((p) => p.position === "front")!.seconds;
      expect(warmS(row.variant)).toBeLessThanOrEqual(warmS(row.base));
    }
  });

  it("with no cooling, the front rise scales as 1/mass exactly (adiabatic, constant c: ΔT = Q/(m·c))", () => {
    const bare = { params: { ...BARE, variableSpecificHeat: false } };
    const rows = compare({ front: { massKg: 13 } }, bare);
    // adiabatic and no road load: the brakes only heat, so the peak over the route is at its end, and the rise
    // from ambient (25 °C) is the whole route's heat divided by m·c
    const last = rows.at(-1)!;
    expect((front(last.variant) - 25) / (front(last.base) - 25)).toBeCloseTo(10 / 13, 6);
  });

  it("vented front rotors peak lower than solid ones of the same mass, and only because they cool better", () => {
    const solid = { front: { kind: "solid-disc" as const } };
    for (const row of compare(solid)) expect(front(row.variant)).toBeGreaterThan(front(row.base) + 5);
    const bare = { params: { ...BARE, variableSpecificHeat: false } };
    for (const row of compare(solid, bare)) expect(front(row.variant)).toBeCloseTo(front(row.base), 6);
  });

  it("accepts a whole rig as the variant, same as the setup applied to the rig", () => {
    const rig = withBrakeSetup(UTE_AND_CARAVAN, { front: { massKg: 13 } });
    expect(rig.vehicle.frontBrakes.massKg).toBe(13);
    expect(UTE_AND_CARAVAN.vehicle.frontBrakes.massKg).toBe(10); // input unchanged
    expect(compare(rig)).toEqual(compare({ front: { massKg: 13 } }));
  });
});
