/**
 * The grade palette: classes that tile the whole grade line, and colours that cannot be mistaken for the
 * brake-heat classes. Colour difference is CIE76 ΔE*ab in CIELAB (CIE 15:2004) from sRGB with the D65 white
 * (IEC 61966-2-1); ΔE ≈ 2.3 is a just-noticeable difference (Sharma, "Digital Color Imaging Handbook", 2003).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { GRADE_BANDS, gradeBand, gradeColour, gradeColouring, ROUTE_INK } from "@/components/route-map/grade-colours";

function lab(hex: string): [number, number, number] {
  const lin = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  const [r, g, b] = lin;
  const xyz = [
    (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047,
    0.2126 * r + 0.7152 * g + 0.0722 * b,
    (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883,
  ].map((t) => (t > 216 / 24389 ? Math.cbrt(t) : (24389 / 27 * t + 16) / 116)) as [number, number, number];
  return [116 * xyz[1] - 16, 500 * (xyz[0] - xyz[1]), 200 * (xyz[1] - xyz[2])];
}
const deltaE = (a: string, b: string) => Math.hypot(...lab(a).map((v, i) => v - lab(b)[i]!));

describe("grade classes", () => {
  it("tile the grade line from −∞ to +∞ without gaps or overlaps", () => {
    expect(GRADE_BANDS[0]!.below).toBe(-Infinity);
    expect(GRADE_BANDS.at(-1)!.atMost).toBe(Infinity);
    for (let i = 1; i < GRADE_BANDS.length; i++) expect(GRADE_BANDS[i]!.below).toBe(GRADE_BANDS[i - 1]!.atMost);
  });

  it("put each threshold in the gentler class's upper end, as the labels say", () => {
    expect(gradeBand(-0.1).id).toBe("down-10"); // "10 % down or steeper" includes 10 %
    expect(gradeBand(-0.0999).id).toBe("down-7");
    expect(gradeBand(-0.07).id).toBe("down-7");
    expect(gradeBand(-0.05).id).toBe("down-4");
    expect(gradeBand(-0.03).id).toBe("down-2");
    expect(gradeBand(0).id).toBe("level");
    expect(gradeBand(0.02).id).toBe("level");
    expect(gradeBand(0.05).id).toBe("up-2");
    expect(gradeBand(0.2).id).toBe("up-6");
    expect(gradeBand(Number.NaN).id).toBe("level");
  });

  it("get darker as a descent gets steeper (CIELAB lightness falls)", () => {
    const down = ["down-2", "down-4", "down-7", "down-10"].map((id) => GRADE_BANDS.find((b) => b.id === id)!.colour);
    const L = down.map((c) => lab(c)[0]);
    for (let i = 1; i < L.length; i++) expect(L[i]!).toBeLessThan(L[i - 1]! - 8);
  });

  it("are far from every brake-heat class colour in app/globals.css (ΔE76 > 20, several times a just-noticeable difference) and from each other (> 12)", () => {
    const css = readFileSync("app/globals.css", "utf8");
    const heat = [...css.matchAll(/--color-heat-[a-z]+:\s*(#[0-9a-f]{6})/gi)].map((m) => m[1]!);
    expect(heat).toHaveLength(5);
    for (const band of GRADE_BANDS) for (const h of heat) expect(deltaE(band.colour, h), `${band.id} vs ${h}`).toBeGreaterThan(20);
    for (const a of GRADE_BANDS) for (const b of GRADE_BANDS) if (a !== b) expect(deltaE(a.colour, b.colour)).toBeGreaterThan(12);
  });

  it("keep the descent highlight distinct from the steepest class, so pixel counts stay unambiguous", () => {
    expect(deltaE(ROUTE_INK.descent, gradeColour(-0.2))).toBeGreaterThan(4);
  });
});

describe("gradeColouring", () => {
  it("colours a stretch by its grade and lists one legend row per class", () => {
    expect(gradeColouring.colourOf({ fromM: 0, toM: 100, grade: -0.08 })).toBe(gradeColour(-0.08));
    expect(gradeColouring.legend.map((l) => l.id)).toEqual(GRADE_BANDS.map((b) => b.id));
  });
});
