/**
 * How sure the advice is (docs/model.md, "Uncertainty band" and "Verdict"): every descent's peaks carry the
 * ensemble band as planned and with the advice, the band contains the number shown, the verdict is judged on
 * the band's upper edge, and the advice says when a band straddles the fade line. Design rules of our own.
 */

import { describe, expect, it } from "vitest";
import { adviseRig, adviseWithBands, judgeOnBand, renderRigAdvice, type RigAdvice } from "@/lib/advice";
import { bandNotesText } from "@/lib/advice/render";
import { oneDescent, UTE_VAN } from "./scenarios";

const route = oneDescent(-0.08, 3000);
const banded = adviseWithBands({ route: route.profile, descents: route.descents, rig: UTE_VAN });

describe("bands on the advice", () => {
  it("every descent carries a band as planned and with the advice, around the number shown", () => {
    for (const p of banded.advice.proof) {
      expect(p.band).toBeDefined();
      p.asPlanned.positions.forEach((pos, j) => {
        expect(p.band!.asPlanned[j]!.lowC).toBeLessThanOrEqual(pos.peakC);
        expect(p.band!.asPlanned[j]!.highC).toBeGreaterThanOrEqual(pos.peakC);
        expect(p.band!.asPlanned[j]!.highC).toBeGreaterThan(p.band!.asPlanned[j]!.lowC);
      });
      p.withAdvice.positions.forEach((pos, j) => {
        expect(p.band!.withAdvice[j]!.lowC).toBeLessThanOrEqual(pos.peakC);
        expect(p.band!.withAdvice[j]!.highC).toBeGreaterThanOrEqual(pos.peakC);
      });
    }
  });

  it("the advice text gives peaks as 'about … (low–high)'", () => {
    const text = renderRigAdvice(banded.advice, "metric").join("\n");
    expect(text).toMatch(/about \d+ °C \(\d+–\d+\)/);
  });

  it("the band of the run as planned is the analysis' band (same nominal run)", () => {
    expect(banded.plannedBand.nominal.trace.rotorC[0]!.length).toBe(route.profile.distanceM.length);
  });
});

describe("the verdict on the band's upper edge", () => {
  const plain: RigAdvice = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN });
  const proofWith = (highC: number) =>
    plain.proof.map((p) => ({
      ...p,
      band: {
        asPlanned: p.asPlanned.positions.map((q) => ({ lowC: q.peakC, highC: q.peakC })),
        withAdvice: p.withAdvice.positions.map((q) => ({ lowC: q.peakC, highC: Math.max(q.peakC, highC) })),
      },
    }));

  it("a plan whose nominal stays below the fade-likely line but whose upper edge reaches it is not advised, and says so", () => {
    expect(plain.verdict).toBe("clear with advice");
    const judged = judgeOnBand(plain.verdict, proofWith(400), false);
    expect(judged.verdict).toBe("not advised");
    expect(judged.notes[0]!.line).toBe("hot");
    expect(judged.notes[0]!.descentIndex).toBe(0);
    const text = renderRigAdvice({ ...plain, verdict: judged.verdict, uncertainty: judged.notes }, "metric").join("\n");
    expect(text).toContain("Could reach fade on descent 1 within the model's uncertainty");
  });

  it("a band that stays below every line leaves the verdict alone", () => {
    expect(judgeOnBand(plain.verdict, proofWith(-Infinity), false)).toEqual({ verdict: plain.verdict, notes: [] });
  });

  it("a 'clear' whose band reaches the caution line becomes 'clear with advice', with a note", () => {
    const judged = judgeOnBand("clear", proofWith(plain.proof[0]!.withAdvice.positions[0]!.warmC + 1), false);
    expect(judged.verdict).toBe("clear with advice");
    expect(judged.notes.map((n) => n.line)).toContain("warm");
  });
});

describe("band notes in words", () => {
  it("one sentence per line, listing its descents, with each brake's highest upper edge", () => {
    const hit = (highC: number) => ({ position: "trailer" as const, peakC: 240, highC, limitC: 260 });
    const notes = [
      { descentIndex: 0, line: "hot" as const, hits: [hit(270)] },
      { descentIndex: 2, line: "hot" as const, hits: [hit(320)] },
      { descentIndex: 5, line: "hot" as const, hits: [hit(290)] },
    ];
    const [text, ...rest] = bandNotesText(notes, "metric", "camper");
    expect(rest).toEqual([]);
    expect(text).toBe(
      "Could reach fade on descents 1, 3 and 6 within the model's uncertainty: camper up to about 320 °C (its line is 260 °C). " +
        "What would change it: carry less load, have a brake upgrade assessed by a licensed mechanic or choose another route.",
    );
  });
});
