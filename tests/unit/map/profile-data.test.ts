/**
 * Elevation-profile data: grades over a ≥ 100 m window (never across a gap), readings at a distance by linear
 * interpolation, colour stops along x, and "nice" axis ticks (Heckbert, "Nice numbers for graph labels",
 * Graphics Gems, 1990: steps of 1, 2 or 5 × 10ⁿ).
 */
import { describe, expect, it } from "vitest";
import { chartPoints, gradeInWords, gradientStops, niceScale, profileAt, profileSummary, stretchGrades } from "@/components/elevation-profile/profile-data";
import { gradeColour, gradeColouring } from "@/components/route-map/grade-colours";
import { kestrelView } from "./line-fixtures";

/** A profile every 10 m with the given elevation function. */
function profile(lengthM: number, elevation: (d: number) => number, stepM = 10) {
  const distanceM = Array.from({ length: lengthM / stepM + 1 }, (_, i) => i * stepM);
  return { distanceM, elevationM: distanceM.map(elevation), grade: distanceM.map(() => 0) };
}

describe("stretchGrades", () => {
  it("gives the exact grade of a constant 8 % descent", () => {
    for (const g of stretchGrades(profile(1000, (d) => 900 - 0.08 * d))) expect(g).toBeCloseTo(-0.08, 12);
  });

  it("averages over 100 m, so 0.1 m rounding noise moves a grade by at most 0.1 %", () => {
    const noisy = profile(2000, (d) => Math.round((900 - 0.06 * d + (Math.floor(d / 10) % 2 ? 0.05 : -0.05)) * 10) / 10);
    for (const g of stretchGrades(noisy).slice(5, -5)) expect(Math.abs(g + 0.06)).toBeLessThanOrEqual(0.0011);
  });

  it("never measures across a gap between segments", () => {
    // 500 m at 5 % down, a gap (same distance, 40 m lower), 500 m level.
    const distanceM = [...Array.from({ length: 51 }, (_, i) => i * 10), ...Array.from({ length: 51 }, (_, i) => 500 + i * 10)];
    const elevationM = distanceM.map((d, i) => (i <= 50 ? 800 - 0.05 * d : 735));
    const grades = stretchGrades({ distanceM, elevationM, grade: distanceM.map(() => 0) }, [500]);
    expect(grades[49]).toBeCloseTo(-0.05, 12);
    expect(grades[50]).toBe(0); // the gap itself
    expect(grades[51]).toBeCloseTo(0, 12);
  });
});

describe("profileAt", () => {
  const p = profile(1000, (d) => 900 - 0.08 * d);
  const g = stretchGrades(p);

  it("interpolates elevation and clamps to the route", () => {
    expect(profileAt(p, g, 255)).toEqual({ distanceM: 255, elevationM: 900 - 0.08 * 255, grade: g[25] });
    expect(profileAt(p, g, -10)!.distanceM).toBe(0);
    expect(profileAt(p, g, 5000)!.elevationM).toBeCloseTo(820, 9);
    expect(profileAt(p, g, Number.NaN)).toBeNull();
  });
});

describe("gradientStops", () => {
  it("has one hard-edged pair of stops per colour change, in route fractions", () => {
    const p = profile(1000, (d) => (d < 500 ? 900 - 0.08 * d : 860));
    const stops = gradientStops(p, stretchGrades(p), gradeColouring);
    expect(stops[0]).toEqual({ offset: 0, colour: gradeColour(-0.08) });
    expect(stops.at(-1)).toEqual({ offset: 1, colour: gradeColour(0) });
    for (let i = 1; i < stops.length - 1; i += 2) expect(stops[i]!.offset).toBe(stops[i + 1]!.offset);
    // The 100 m window blurs the corner at 500 m over at most ±50 m.
    const change = stops.find((s) => s.colour === gradeColour(0))!.offset;
    expect(change).toBeGreaterThan(0.44);
    expect(change).toBeLessThan(0.56);
  });
});

describe("niceScale", () => {
  it("rounds the domain out to steps of 1, 2 or 5 × 10ⁿ", () => {
    expect(niceScale(634, 1860, 6)).toEqual({ domain: [500, 2000], ticks: [500, 1000, 1500, 2000], step: 500 });
    expect(niceScale(0, 23.7, 7).ticks).toEqual([0, 5, 10, 15, 20, 25]);
    expect(niceScale(0, 2.8, 7).ticks).toEqual([0, 0.5, 1, 1.5, 2, 2.5, 3]);
    expect(niceScale(0, 23.7, 10, true).step).toBe(2); // nearest: 2.6 rounds to 2, not up to 5
    expect(niceScale(100, 100, 5).domain[0]).toBeLessThan(niceScale(100, 100, 5).domain[1]); // flat route
  });
});

describe("display", () => {
  it("converts points to km and ft", () => {
    expect(chartPoints({ distanceM: [1609.344], elevationM: [304.8], grade: [0] }, "imperial")).toEqual([{ x: 1, y: 1000 }]);
  });

  it("words grades for the reading", () => {
    expect(gradeInWords(-0.081)).toBe("8.1 % down");
    expect(gradeInWords(0.03)).toBe("3.0 % up");
    expect(gradeInWords(0.0001)).toBe("level");
  });

  it("summarises the profile as text, every descent included", () => {
    const text = profileSummary(kestrelView(), "metric");
    expect(text).toMatch(/^Elevation profile over 4\.5 km: starts at 1,200 m/);
    expect(text).toContain("descent 1 from 0.0 km to 3.0 km");
    expect(text).toContain("descent 2 from");
  });
});
