/**
 * "When nothing is enough": reported when no gear (held), no speed step from walking pace up (in its lowest
 * gear, held, converter locked) and no cool-down stops keep every brake below the hot line and the fluid below
 * boil risk; and not reported when something is enough. The words say why (which brake, how far past which
 * line) and what would change it. The rig and route are ours: a silly heavy rig on tiny brakes, a long steep
 * descent.
 */

import { describe, expect, it } from "vitest";
import { adviseRig, isBelow, outcomeOf, renderDescentAdvice } from "@/lib/advice";
import { runHeatRun } from "@/lib/thermal";
import { oneDescent, SILLY_RIG, UTE_VAN } from "./scenarios";

describe("nothing is enough", () => {
  const route = oneDescent(-0.12, 8000);
  const advice = adviseRig({ route: route.profile, descents: route.descents, rig: SILLY_RIG });
  const a = advice.descents[0]!;
  const { descent } = route;
  const rerun = (gear: number, speedMs?: number) =>
    outcomeOf(
      runHeatRun(route.profile, SILLY_RIG, {
        controls: [{ startM: descent.startDistanceM, endM: descent.endDistanceM, gear, ...(speedMs ? { speedMs } : {}) }],
      }),
      descent.startDistanceM,
      descent.endDistanceM,
    );

  it("is reported for a 4.5 t rig on tiny brakes down 12 % for 8 km", () => {
    expect(a.nothingIsEnough).toBe(true);
    expect(a.plan.status).toBe("above-hot");
    expect(advice.verdict).toBe("not advised");
    expect(a.gear.gear).toBeNull();
    expect(a.speed.speedMs).toBeNull();
  });

  it("holds up in full re-runs: 1st gear held, at walking pace and at 25 km/h, stays at or above hot", () => {
    expect(isBelow(rerun(1, 10 / 3.6), "hot")).toBe(false);
    expect(isBelow(rerun(1, 25 / 3.6), "hot")).toBe(false);
    expect(isBelow(rerun(1), "hot")).toBe(false);
    expect(isBelow(a.walkingPace, "hot")).toBe(false);
  });

  it("says so plainly, says the brakes may fail, and suggests another route, less load, or a brake upgrade by a licensed mechanic", () => {
    const text = renderDescentAdvice(a, "metric").lines[0]!;
    expect(text).toMatch(/^Plan: not enough\. No gear, held speed or cool-down stop we can suggest keeps these brakes out of the fade range/);
    expect(text).toContain("the brakes may fail");
    for (const option of ["carry less load", "have a brake upgrade assessed by a licensed mechanic", "choose another route"]) expect(text).toContain(option);
    expect(text).not.toMatch(/[Nn]othing is enough/);
  });
});

describe("something is enough", () => {
  it("is not reported for the ute and caravan on 8 % over 3 km (1st gear held is enough)", () => {
    const route = oneDescent(-0.08, 3000);
    const a = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN }).descents[0]!;
    expect(a.nothingIsEnough).toBe(false);
    expect(isBelow(a.walkingPace, "hot")).toBe(true);
  });

  it("is not reported for the ute and caravan on 10 % over 2 km", () => {
    const route = oneDescent(-0.1, 2000);
    const advice = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN });
    const a = advice.descents[0]!;
    expect(a.nothingIsEnough).toBe(false);
    expect(advice.verdict).toBe("clear with advice");
  });
});
