/**
 * Convoy advice: every rig advised on the same route, a descents × rigs matrix with one cell per
 * rig per descent, the worst rig on each descent (the highest step class as planned), and the overall verdict
 * judged by the weakest rig. The cells are checked against independent heat runs (runHeatRun) of each rig, and
 * the physics is ordinary: a heavier rig on smaller brakes runs hotter on the same descent (docs/model.md
 * §3: E = m·g·Δh into less thermal mass).
 */

import { describe, expect, it } from "vitest";
import { adviseConvoy, adviseRig, outcomeOf, renderConvoy, VERDICTS, worstVerdict } from "@/lib/advice";
import { runHeatRun, STEP_CLASSES } from "@/lib/thermal";
import { SILLY_RIG, SOLO_UTE, twoDescents, UTE_VAN } from "./scenarios";

const route = twoDescents();
const members = [
  { label: "Ute alone", rig: SOLO_UTE },
  { label: "Ute and van", rig: UTE_VAN },
  { label: "Heavy on tiny brakes", rig: SILLY_RIG },
];
const convoy = adviseConvoy({ route: route.profile, descents: route.descents, members });
const rank = (c: (typeof STEP_CLASSES)[number]) => STEP_CLASSES.indexOf(c);

describe("convoy matrix", () => {
  it("has one row per descent and one cell per rig, in convoy order", () => {
    expect(convoy.descents).toHaveLength(route.descents.length);
    convoy.descents.forEach((row, i) => {
      expect(row.descentIndex).toBe(i);
      expect(row.descent).toBe(route.descents[i]);
      expect(row.cells.map((c) => c.rigIndex)).toEqual([0, 1, 2]);
      expect(row.cells.map((c) => c.label)).toEqual(members.map((m) => m.label));
    });
    expect(convoy.rigs.map((r) => r.label)).toEqual(members.map((m) => m.label));
  });

  it("holds each rig's own heat run as planned (independent run of the whole route)", () => {
    members.forEach((m, r) => {
      const run = runHeatRun(route.profile, m.rig);
      route.descents.forEach((d, i) => {
        const own = outcomeOf(run, d.startDistanceM, d.endDistanceM);
        const cell = convoy.descents[i]!.cells[r]!;
        expect(cell.asPlanned.worstClass).toBe(own.worstClass);
        cell.asPlanned.positions.forEach((p, j) => expect(p.peakC).toBeCloseTo(own.positions[j]!.peakC, 6));
      });
    });
  });

  it("holds each rig's proof with its advice applied", () => {
    convoy.rigs.forEach((r, k) => {
      convoy.descents.forEach((row, i) => expect(row.cells[k]!.withAdvice).toEqual(r.advice.proof[i]!.withAdvice));
    });
  });

  it("names as worst rig on each descent the one with the highest class as planned", () => {
    for (const row of convoy.descents) {
      const worst = row.cells[row.worstRigIndex]!;
      for (const c of row.cells) expect(rank(worst.asPlanned.worstClass)).toBeGreaterThanOrEqual(rank(c.asPlanned.worstClass));
      // physics: 4.5 t on 4 kg discs and 3 kg drums is hotter than either rig on the preset's brakes
      expect(row.worstRigIndex).toBe(2);
      expect(row.cells[0]!.asPlanned.positions[0]!.peakC).toBeLessThan(row.cells[2]!.asPlanned.positions[0]!.peakC);
    }
  });

  it("breaks a tie in class by the smallest margin to the hot line", () => {
    const pair = adviseConvoy({
      route: route.profile,
      descents: route.descents,
      members: [
        { label: "Van", rig: UTE_VAN },
        { label: "Heavier van", rig: { ...UTE_VAN, load: { ...UTE_VAN.load, trailerLoadKg: UTE_VAN.load.trailerLoadKg + 200 } } },
      ],
    });
    let ties = 0;
    for (const row of pair.descents) {
      const [a, b] = row.cells as [(typeof row.cells)[0], (typeof row.cells)[0]];
      if (a.asPlanned.worstClass !== b.asPlanned.worstClass) continue;
      ties++;
      // 200 kg more in the van: more potential energy on the same drop, so less margin, and it is the worst
      expect(b.asPlanned.marginToHotK).toBeLessThan(a.asPlanned.marginToHotK);
      expect(row.worstRigIndex).toBe(1);
    }
    expect(ties).toBeGreaterThan(0);
  });
});

describe("convoy verdict", () => {
  it("is the weakest rig's verdict, and names the weakest rigs", () => {
    const verdicts = convoy.rigs.map((r) => r.advice.verdict);
    expect(convoy.verdict).toBe(worstVerdict(verdicts));
    for (const v of verdicts) expect(VERDICTS.indexOf(convoy.verdict)).toBeGreaterThanOrEqual(VERDICTS.indexOf(v));
    expect(convoy.verdict).toBe("not advised");
    expect(convoy.weakestRigIndices).toEqual([2]);
    expect(renderConvoy(convoy, "metric")[0]).toBe("Convoy verdict: not advised (weakest: Heavy on tiny brakes).");
  });

  it("changes when the weakest rig leaves: the two preset rigs are clear with advice", () => {
    const two = adviseConvoy({ route: route.profile, descents: route.descents, members: members.slice(0, 2) });
    expect(two.verdict).toBe("clear with advice");
    expect(two.weakestRigIndices.length).toBeGreaterThan(0);
    for (const i of two.weakestRigIndices) expect(two.rigs[i]!.advice.verdict).toBe("clear with advice");
  });

  it("advises each rig as it would be advised alone (rigs do not affect one another)", () => {
    const alone = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN });
    const inConvoy = convoy.rigs[1]!.advice;
    expect(inConvoy.verdict).toBe(alone.verdict);
    expect(inConvoy.descents.map((d) => d.plan.plan)).toEqual(alone.descents.map((d) => d.plan.plan));
    expect(inConvoy.proof).toEqual(alone.proof);
  });

  it("refuses an empty convoy", () => {
    expect(() => adviseConvoy({ route: route.profile, descents: route.descents, members: [] })).toThrow(RangeError);
  });
});
