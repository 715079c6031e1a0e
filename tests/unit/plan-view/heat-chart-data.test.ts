/**
 * The heat chart's rows and axis (components/plan-view/heat-chart-data.ts): every temperature capped at its
 * brake's validity ceiling, the band around each line, and an axis that ends at the highest ceiling and
 * labels no temperature at or past the lowest one (docs/model.md, "Validity ceiling").
 */
import { describe, expect, it } from "vitest";
import { chartRows, MAX_POINTS, yAxis } from "@/components/plan-view/heat-chart-data";
import { peakWithBand, worstPosition } from "@/components/plan-view/heat-text";

const n = 3000;
const distanceM = Array.from({ length: n }, (_, i) => i * 10);
const front = distanceM.map((d) => 40 + d / 100); // 40 … 339.9 °C
const trailer = distanceM.map((d) => (d > 20_000 ? 1400 : 60 + d / 50)); // past its 590 °C ceiling after 20 km
const trace = { distanceM, rotorC: [front, trailer] };
const band = { lowC: [front.map((c) => c - 20), trailer.map((c) => c - 30)], highC: [front.map((c) => c + 40), trailer.map((c) => c + 50)] };
const ceilings = [600, 590];

describe("chartRows", () => {
  const rows = chartRows(trace, band, null, null, ceilings, "metric");
  it("keeps at most MAX_POINTS rows and every bucket's maximum", () => {
    expect(rows.length).toBeLessThanOrEqual(MAX_POINTS);
    expect(Math.max(...rows.map((r) => r.p0 as number))).toBe(Math.round(Math.max(...front)));
  });
  it("caps temperatures and band edges at the ceiling", () => {
    for (const r of rows) {
      expect(r.c1 as number).toBeLessThanOrEqual(590);
      expect((r.e1 as [number, number])[1]).toBeLessThanOrEqual(590);
      expect((r.e0 as [number, number])[1]).toBeLessThanOrEqual(600);
    }
    expect(rows.at(-1)!.c1).toBe(590);
  });
  it("draws the band around the line", () => {
    for (const r of rows) {
      const [lo, hi] = r.b0 as [number, number];
      expect(lo).toBeLessThanOrEqual(r.p0 as number);
      expect(hi).toBeGreaterThan(r.p0 as number);
    }
  });
  it("buckets a what-if of another sampling on the plan's distances, capped", () => {
    const coarse = { distanceM: distanceM.filter((_, i) => i % 5 === 0), rotorC: [front.filter((_, i) => i % 5 === 0).map((c) => c + 100), trailer.filter((_, i) => i % 5 === 0)] };
    const withWhatIf = chartRows(trace, band, coarse, null, ceilings, "metric");
    expect(withWhatIf.every((r) => typeof r.w0 === "number")).toBe(true);
    expect(Math.max(...withWhatIf.map((r) => r.wc1 as number))).toBe(590);
    expect(withWhatIf.some((r) => "wb0" in r)).toBe(false);
  });
  it("converts to °F for imperial users", () => {
    const imperial = chartRows(trace, band, null, null, ceilings, "imperial");
    expect(imperial[0]!.p0).toBe(104);
  });
});

describe("yAxis", () => {
  it("ends at the highest ceiling and labels nothing at or past the lowest", () => {
    const rows = chartRows(trace, band, null, null, ceilings, "metric");
    const axis = yAxis(rows, ceilings, "metric");
    expect(axis.domain).toEqual([0, 600]);
    expect(axis.ticks).toEqual([0, 100, 200, 300, 400, 500]);
    const imperial = yAxis(chartRows(trace, band, null, null, ceilings, "imperial"), ceilings, "imperial");
    expect(imperial.domain[1]).toBe(1112);
    expect(Math.max(...imperial.ticks)).toBeLessThan(1094);
  });
  it("goes below zero on a freezing day", () => {
    const cold = { distanceM: [0, 10], rotorC: [[-25, -20]] };
    expect(yAxis(chartRows(cold, null, null, null, [600], "metric"), [600], "metric").domain[0]).toBe(-100);
  });
});

describe("peak text", () => {
  it("gives a peak with its band, and no number at or past the ceiling", () => {
    expect(peakWithBand(243, 600, { lowC: 212, highC: 288 }, "metric")).toBe("about 240 °C (210–290)");
    expect(peakWithBand(590, 590, { lowC: 560, highC: 590 }, "metric")).toBe("beyond Fadeline's range");
    expect(peakWithBand(243, 600, undefined, "metric")).toBe("243 °C");
  });
  it("lets a brake past its ceiling speak for the run", () => {
    expect(worstPosition([{ peakC: 599, ceilingC: 600 }, { peakC: 590, ceilingC: 590 }])).toBe(1);
    expect(worstPosition([{ peakC: 300, ceilingC: 600 }, { peakC: 200, ceilingC: 590 }])).toBe(0);
  });
});
