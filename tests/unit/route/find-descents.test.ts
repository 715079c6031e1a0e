import { describe, expect, it } from "vitest";
import { climbTotals, computeRouteStats, findDescents } from "@/lib/route";
import { legs, profileOf, rawProfile } from "./profile-helpers";
import { pathPoints, straightXY } from "./synthetic";

// Synthetic profiles written directly (10 m samples, no smoothing), so each rule is tested exactly.
const FLAT: [number, number] = [1000, 0];

describe("findDescents: the documented rules", () => {
  it("a 60 m drop over 1 km (6 %) is found, with its figures", () => {
    const p = rawProfile([3000], legs(1000, [FLAT, [1000, -0.06], FLAT]));
    expect(findDescents(p)).toEqual([
      {
        startIndex: 100,
        endIndex: 200,
        startDistanceM: 1000,
        endDistanceM: 2000,
        startElevationM: 1000,
        endElevationM: expect.closeTo(940, 9),
        dropM: expect.closeTo(60, 9),
        lengthM: 1000,
        meanGrade: expect.closeTo(-0.06, 9),
        steepest200mGrade: expect.closeTo(-0.06, 9),
        steepest1kmGrade: expect.closeTo(-0.06, 9),
      },
    ]);
  });

  it("a 45 m drop over 1 km is not a descent; 50 m is (the least drop is 50 m)", () => {
    expect(findDescents(rawProfile([3000], legs(1000, [FLAT, [1000, -0.045], FLAT])))).toEqual([]);
    expect(findDescents(rawProfile([3000], legs(1000, [FLAT, [1000, -0.05], FLAT])))).toHaveLength(1);
  });

  it("a short steep pitch is a descent: 500 m at 20 % (100 m) and 400 m at 15 % (60 m)", () => {
    const pitch = findDescents(rawProfile([3000], legs(1000, [FLAT, [500, -0.2], FLAT])));
    expect(pitch).toMatchObject([{ startDistanceM: 1000, endDistanceM: 1500, dropM: expect.closeTo(100, 9) }]);
    const shorter = findDescents(rawProfile([3000], legs(1000, [FLAT, [400, -0.15], FLAT])));
    expect(shorter).toMatchObject([{ startDistanceM: 1000, endDistanceM: 1400, dropM: expect.closeTo(60, 9) }]);
  });

  it("a long gentle slope is not a descent: 1 km at 3 % loses only 30 m", () => {
    expect(findDescents(rawProfile([3000], legs(1000, [FLAT, [1000, -0.03], FLAT])))).toEqual([]);
  });

  it("the least length is 250 m: 70 m lost over 240 m (29 %) does not count, over 250 m (28 %) it does", () => {
    expect(findDescents(rawProfile([3000], legs(1000, [FLAT, [240, -70 / 240], FLAT])))).toEqual([]);
    expect(findDescents(rawProfile([3000], legs(1000, [FLAT, [250, -70 / 250], FLAT])))).toHaveLength(1);
  });

  it("tolerates a short rise (8 m over 100 m) inside a descent", () => {
    const e = legs(1000, [FLAT, [700, -0.06], [100, 0.08], [700, -0.06], FLAT]);
    const found = findDescents(rawProfile([4000], e));
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ startDistanceM: 1000, endDistanceM: 2500, dropM: expect.closeTo(76, 9) });
  });

  it("a rise of more than 10 m ends the descent", () => {
    const e = legs(1000, [FLAT, [1200, -0.06], [150, 0.08], [1200, -0.06], FLAT]);
    expect(findDescents(rawProfile([5000], e)).map((d) => d.startDistanceM)).toEqual([1000, 2350]);
  });

  it("a flat of more than 300 m ends the descent, one of 250 m does not", () => {
    const split = legs(1000, [FLAT, [1200, -0.06], [400, 0], [1200, -0.06], FLAT]);
    expect(findDescents(rawProfile([5000], split))).toHaveLength(2);
    const kept = legs(1000, [FLAT, [1200, -0.06], [250, 0], [1200, -0.06], FLAT]);
    expect(findDescents(rawProfile([5000], kept))).toHaveLength(1);
  });

  it("a gentle run-out (0.5 %, where a rig coasts) is not counted as part of the descent", () => {
    const e = legs(1000, [FLAT, [1000, -0.07], [2000, -0.005], FLAT]);
    const [d] = findDescents(rawProfile([5000], e));
    expect(d).toMatchObject({ startDistanceM: 1000, endDistanceM: 2000, dropM: expect.closeTo(70, 9) });
  });

  it("no descent spans a gap between segments", () => {
    // Segment 1 ends with 40 m down over 700 m; segment 2 starts 5 m lower with another 40 m over 700 m.
    // Joined, they would be one 85 m descent over 1.4 km.
    const second = legs(955, [[1700, 0], [700, -40 / 700], FLAT]);
    const p = rawProfile([1700, 1700], (d, s) => (s === 0 ? legs(1000, [FLAT, [700, -40 / 700]])(d) : second(d)));
    expect(findDescents(p)).toEqual([]);
    expect(findDescents(p, { minDropM: 30, minLengthM: 500 })).toHaveLength(2);
  });

  it("steepest sustained grades: 300 m at 12 % inside 3 km at 6 %", () => {
    const e = legs(1000, [FLAT, [1500, -0.06], [300, -0.12], [1200, -0.06], FLAT]);
    const [d] = findDescents(rawProfile([5000], e));
    expect(d?.steepest200mGrade).toBeCloseTo(-0.12, 9);
    expect(d?.steepest1kmGrade).toBeCloseTo(-(0.12 * 300 + 0.06 * 700) / 1000, 9);
    // Rule 3 places the ends on the straight line through the 10 m bands below the top and above the
    // bottom, whose grade is the body's mean (178 m over 2666.7 m, 6.675 %), not the 6 % at the ends: each
    // end reads 16.9 m inside the corner. The drop stays exact.
    const along = (3000 - 2 * (10 / 0.06)) / (198 - 20);
    expect(d?.startDistanceM).toBeCloseTo(1000 + 10 / 0.06 - 10 * along, 9);
    expect(d?.endDistanceM).toBeCloseTo(4000 - 10 / 0.06 + 10 * along, 9);
    expect(d?.dropM).toBeCloseTo(198, 9);
    expect(d?.meanGrade).toBeCloseTo(-198 / (3000 - 2 * (10 / 0.06 - 10 * along)), 9);
  });

  it("ends are interpolated between samples: a 500 m pitch at 20 % reads 20 % at 10 and 20 m steps", () => {
    // The pitch starts 5 m past a sample at both steps; its ends and grade do not snap to the samples.
    for (const stepM of [10, 20]) {
      const [d] = findDescents(rawProfile([3000], legs(1000, [[1005, 0], [500, -0.2], FLAT]), stepM));
      expect(d?.startDistanceM).toBeCloseTo(1005, 9);
      expect(d?.endDistanceM).toBeCloseTo(1505, 9);
      expect(d?.meanGrade).toBeCloseTo(-0.2, 9);
      expect(d?.steepest1kmGrade).toBeCloseTo(-0.2, 9);
      expect(d?.startIndex).toBe(Math.floor(1005 / stepM));
      expect(d?.endIndex).toBe(Math.ceil(1505 / stepM));
    }
  });

  it("the same rules hold on a smoothed GPS-style profile: one descent per real descent", () => {
    // 240 m down, a 4 m rise over 100 m, 210 m down (one descent of 446 m); 800 m flat; 75 m down.
    const e = legs(1200, [FLAT, [3000, -0.08], [100, 0.04], [3000, -0.07], [800, 0], [1500, -0.05], FLAT]);
    const found = findDescents(profileOf([pathPoints(straightXY(1041, 10), e)]));
    expect(found).toHaveLength(2);
    expect(Math.abs((found[0]?.dropM ?? 0) - 446)).toBeLessThan(2);
    expect(Math.abs((found[1]?.dropM ?? 0) - 75)).toBeLessThan(2);
  });

  it("refuses impossible thresholds", () => {
    const p = rawProfile([1000], () => 0);
    expect(() => findDescents(p, { minDropM: 0 })).toThrow(new RangeError("minDropM and minLengthM must be > 0"));
    expect(() => findDescents(p, { maxRiseM: -1 })).toThrow(
      new RangeError("maxRiseM, maxInterruptionM and minGrade must be ≥ 0"),
    );
  });
});

describe("climbTotals and computeRouteStats", () => {
  it("with a 5 m dead band, 3 m wiggles add nothing and a 20 m climb counts in full", () => {
    const wiggle = Float64Array.from({ length: 200 }, (_, i) => 100 + 1.5 * Math.sin(i / 3));
    expect(climbTotals(wiggle, 0, 199, 5).ascentM).toBeCloseTo(Math.max(0, (wiggle[199] as number) - 100), 9);
    const climb = Float64Array.from({ length: 21 }, (_, i) => 100 + i);
    expect(climbTotals(climb, 0, 20, 5)).toEqual({ ascentM: 20, descentM: 0 });
  });

  it("ascent − descent equals end − start exactly, whatever the dead band", () => {
    const e = Float64Array.from({ length: 500 }, (_, i) => 300 + 40 * Math.sin(i / 17) + 7 * Math.sin(i / 2.3));
    for (const t of [0, 2, 5, 20]) {
      const { ascentM, descentM } = climbTotals(e, 0, 499, t);
      expect(ascentM - descentM).toBeCloseTo((e[499] as number) - (e[0] as number), 9);
    }
  });

  it("stats: length without gaps, ascent and descent per segment, highest and lowest point", () => {
    // Segment 1 climbs 100 m then drops 30 m; segment 2 starts 500 m higher (the gap is not a climb) and drops 50 m.
    const p = rawProfile([2000, 1000], (d, s) =>
      s === 0 ? legs(200, [[1000, 0.1], [1000, -0.03]])(d) : legs(770, [[2000, 0], [1000, -0.05]])(d),
    );
    const s = computeRouteStats(p);
    expect(s).toEqual({
      lengthM: 3000,
      totalAscentM: expect.closeTo(100, 9),
      totalDescentM: expect.closeTo(80, 9),
      highestM: 770,
      highestAtM: 2000,
      lowestM: 200,
      lowestAtM: 0,
      segmentCount: 2,
    });
  });
});
