/**
 * The runaway class (lib/thermal STEP_CLASSES: past the model's valid range, or the brakes no longer holding
 * the speed) is worse than brake-fluid boil risk everywhere in the advice: an outcome that runs away is below
 * no line whatever its temperatures, a rig whose advised route runs away is "not advised", and a descent that
 * runs away as planned is never "clear" (docs/model.md, "Validity ceiling").
 */

import { describe, expect, it } from "vitest";
import { adviseRig, CLASS_WORDS, isBelow, renderDescentAdvice, rigVerdict, type RunOutcome } from "@/lib/advice";
import { classRank } from "@/lib/advice/outcome";
import { STEP_CLASSES } from "@/lib/thermal";
import { benchDescent, oneDescent, SILLY_RIG, SOLO_UTE, UTE_VAN } from "./scenarios";

const bench = benchDescent();
const fine = adviseRig({ route: bench.profile, descents: bench.descents, rig: UTE_VAN });

describe("runaway", () => {
  it("ranks worst of all five classes", () => {
    expect(STEP_CLASSES.map(classRank)).toEqual([0, 1, 2, 3, 4]);
    expect(classRank("runaway")).toBeGreaterThan(classRank("boil-risk"));
    expect(CLASS_WORDS.runaway).toContain("the brakes may fail");
  });

  it("keeps an outcome below no line, even with every temperature below it", () => {
    const cool: RunOutcome = { ...fine.descents[0]!.plan.outcome, worstClass: "cool", marginToWarmK: 10, marginToHotK: 60 };
    expect(isBelow(cool, "warm")).toBe(true); // the control: the same figures with a cool class
    const runaway = { ...cool, worstClass: "runaway" as const };
    expect(isBelow(runaway, "warm")).toBe(false);
    expect(isBelow(runaway, "hot")).toBe(false);
    expect(isBelow({ ...cool, worstClass: "boil-risk" }, "hot")).toBe(false);
  });

  it("makes a rig 'not advised' when the whole route with its advice runs away, and never 'clear'", () => {
    expect(fine.verdict).toBe("clear with advice");
    expect(rigVerdict(fine.descents, true, fine.worstClass.withAdvice)).toBe("clear with advice");
    expect(rigVerdict(fine.descents, true, "runaway")).toBe("not advised");
    expect(rigVerdict([], false, "runaway")).not.toBe("clear");
    expect(rigVerdict([], false, "cool")).toBe("clear");
  });

  it("is reported, and the rig not advised, for a 4.5 t rig on tiny brakes down 12 % for 8 km", () => {
    const route = oneDescent(-0.12, 8000);
    const advice = adviseRig({ route: route.profile, descents: route.descents, rig: SILLY_RIG });
    expect(advice.worstClass.asPlanned).toBe("runaway");
    expect(advice.descents[0]!.baseline.worstClass).toBe("runaway");
    expect(advice.verdict).toBe("not advised");
  });

  it("as planned, is never 'clear', and the advice says the brakes may fail there even when the plan saves it", () => {
    const route = oneDescent(-0.12, 8000);
    const advice = adviseRig({ route: route.profile, descents: route.descents, rig: SOLO_UTE });
    const a = advice.descents[0]!;
    expect(a.baseline.worstClass).toBe("runaway");
    expect(a.plan.status).not.toBe("above-hot"); // the plan keeps the brakes below the fade-likely line
    expect(advice.verdict).toBe("clear with advice");
    const [plan, asPlanned] = renderDescentAdvice(a, "metric").lines;
    expect(plan).toContain("As planned, the brakes may fail on this descent");
    expect(asPlanned).toContain(CLASS_WORDS.runaway);
  });
});
