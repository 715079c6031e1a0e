/**
 * The uncertainty note in words (lib/advice/render.ts bandNoteText): a band's upper edge at or past the brake's
 * validity ceiling is never printed as a number (docs/model.md, "Validity ceiling").
 */
import { describe, expect, it } from "vitest";
import { bandNoteText } from "@/lib/advice/render";
import type { BandNote } from "@/lib/advice";

const note: BandNote = {
  descentIndex: 1,
  line: "hot",
  hits: [
    { position: "front", peakC: 330, highC: 372, limitC: 350 },
    { position: "trailer", peakC: 300, highC: 640, limitC: 320 },
  ],
};

describe("bandNoteText", () => {
  it("names the descent, the line and each brake's upper edge", () => {
    const text = bandNoteText(note, "metric", "caravan");
    expect(text).toMatch(/^Could reach fade on descent 2 within the model's uncertainty: front up to about 370 °C \(its line is 350 °C\)/);
  });
  it("says beyond Fadeline's range for an upper edge at or past the ceiling, with no number for it", () => {
    const text = bandNoteText(note, "metric", "caravan", { front: 600, trailer: 590 });
    expect(text).toContain("caravan could go beyond Fadeline's range (its line is 320 °C)");
    expect(text).not.toMatch(/6[0-9]0 °C/);
    expect(text).toContain("front up to about 370 °C");
  });
  it("follows the unit system", () => {
    expect(bandNoteText(note, "imperial", "camper", { front: 600, trailer: 590 })).toContain("front up to about 700 °F (its line is 662 °F)");
  });
});
