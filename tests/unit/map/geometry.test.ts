/**
 * Plain geometry of the route line: positions by linear interpolation between vertices, the nearest point by
 * the clamped vector projection t = (p − a)·(b − a)/|b − a|² on a local plane, and the spherical arc
 * s = R·Δθ for expected distances (see line-fixtures.ts).
 */
import { describe, expect, it } from "vitest";
import {
  colourRuns,
  distanceMarkers,
  markerStep,
  nearestOnLine,
  positionAtDistance,
  sliceLine,
  stepIndexAt,
} from "@/components/route-map/geometry";
import { equatorLine, M_PER_DEG } from "./line-fixtures";

describe("stepIndexAt", () => {
  it("finds the step holding a distance, clamping outside the line", () => {
    const d = [0, 10, 20, 20, 35];
    expect(stepIndexAt(d, -5)).toBe(0);
    expect(stepIndexAt(d, 0)).toBe(0);
    expect(stepIndexAt(d, 15)).toBe(1);
    expect(stepIndexAt(d, 20)).toBe(3); // a gap: two vertices at 20 m, the later one's step
    expect(stepIndexAt(d, 99)).toBe(3);
    expect(stepIndexAt(d, Number.NaN)).toBe(0);
  });
});

describe("positionAtDistance", () => {
  const line = equatorLine([0, 0, 0, 0]); // 0.04° of equator

  it("interpolates linearly between vertices", () => {
    const [lon, lat] = positionAtDistance(line, 1.5 * 0.01 * M_PER_DEG)!;
    expect(lon).toBeCloseTo(0.015, 12);
    expect(lat).toBe(0);
  });

  it("clamps to the ends and rejects non-finite distances", () => {
    expect(positionAtDistance(line, -100)).toEqual([0, 0]);
    expect(positionAtDistance(line, 1e9)![0]).toBeCloseTo(0.04, 12);
    expect(positionAtDistance(line, Number.NaN)).toBeNull();
  });

  it("puts a distance at a gap on the start of the next segment", () => {
    const gapped = {
      lat: [0, 0, 0.01, 0.01],
      lon: [0, 0.01, 0.05, 0.06],
      distanceM: [0, 1000, 1000, 2000],
      grade: [0, 0, 0, 0],
      gapAfter: [0, 1, 0, 0],
    };
    expect(positionAtDistance(gapped, 1000)).toEqual([0.05, 0.01]);
    expect(positionAtDistance(gapped, 1500)).toEqual([0.055, 0.01]);
  });
});

describe("nearestOnLine", () => {
  const line = equatorLine([0, 0, 0, 0]);

  it("drops a perpendicular onto the line: 0.001° north of the equator is an arc of R·0.001° ≈ 111.2 m", () => {
    const near = nearestOnLine(line, 0.001, 0.025)!;
    expect(near.distanceM).toBeCloseTo(0.025 * M_PER_DEG, 3);
    expect(near.position[0]).toBeCloseTo(0.025, 12);
    expect(near.offsetM).toBeCloseTo(0.001 * M_PER_DEG, 3);
  });

  it("clamps to an end vertex beyond the line", () => {
    const near = nearestOnLine(line, 0, -0.01)!;
    expect(near.distanceM).toBe(0);
    expect(near.offsetM).toBeCloseTo(0.01 * M_PER_DEG, 3);
  });

  it("inverts positionAtDistance (round trip within a millimetre)", () => {
    for (const d of [0, 123.4, 1111.1, 2500, 4447.8]) {
      const [lon, lat] = positionAtDistance(line, d)!;
      expect(nearestOnLine(line, lat, lon)!.distanceM).toBeCloseTo(d, 3);
    }
  });

  it("never snaps onto the straight chord across a gap", () => {
    // Two segments side by side, the gap jumping back west: the query sits on the gap's chord.
    const gapped = {
      lat: [0, 0, 0.02, 0.02],
      lon: [0, 0.04, 0, 0.04],
      distanceM: [0, 4000, 4000, 8000],
      grade: [0, 0, 0, 0],
      gapAfter: [0, 1, 0, 0],
    };
    const near = nearestOnLine(gapped, 0.01, 0.02)!;
    expect(near.offsetM).toBeCloseTo(0.01 * M_PER_DEG, 0); // to a segment, not ~0 m to the chord
  });

  it("finds the right leg of a switchback", () => {
    const hairpin = {
      lat: [0, 0, 0.002, 0.002],
      lon: [0, 0.01, 0.01, 0],
      distanceM: [0, 1112, 1334, 2446],
      grade: [-0.08, -0.08, -0.08, -0.08],
      gapAfter: [0, 0, 0, 0],
    };
    expect(nearestOnLine(hairpin, 0.0019, 0.005)!.distanceM).toBeGreaterThan(1334); // upper leg
    expect(nearestOnLine(hairpin, 0.0001, 0.005)!.distanceM).toBeLessThan(1112); // lower leg
  });
});

describe("colourRuns", () => {
  const byGrade = (s: { grade: number }) => (s.grade < -0.05 ? "steep" : "gentle");

  it("merges steps of one colour and splits where the colour changes", () => {
    const runs = colourRuns(equatorLine([-0.01, -0.02, -0.08, -0.09, -0.01]), byGrade);
    expect(runs.map((r) => [r.colour, r.coordinates.length])).toEqual([
      ["gentle", 3],
      ["steep", 3],
      ["gentle", 2],
    ]);
    expect(runs[1]!.fromM).toBeCloseTo(0.02 * M_PER_DEG, 6);
    expect(runs[1]!.coordinates[0]).toEqual(runs[0]!.coordinates.at(-1)); // runs join without a hole
  });

  it("draws nothing across a gap", () => {
    const runs = colourRuns(equatorLine([0, 0, 0, 0], 0.01, [0, 1]), byGrade);
    expect(runs).toHaveLength(2);
    expect(runs[0]!.coordinates.at(-1)).toEqual([0.01, 0]);
    expect(runs[1]!.coordinates[0]).toEqual([0.02, 0]);
  });

  it("splits at descent ends and flags the runs inside", () => {
    const line = equatorLine([0, 0, 0, 0]);
    const runs = colourRuns(line, () => "x", [{ startDistanceM: line.distanceM[1]!, endDistanceM: line.distanceM[3]! }]);
    expect(runs.map((r) => [r.inDescent, r.coordinates.length])).toEqual([
      [false, 2],
      [true, 3],
      [false, 2],
    ]);
  });
});

describe("sliceLine", () => {
  it("cuts at interpolated ends and splits at gaps", () => {
    const line = equatorLine([0, 0, 0, 0], 0.01, [0, 0, 1]); // the step 0.02° → 0.03° is a gap
    const parts = sliceLine(line, 0.005 * M_PER_DEG, 0.035 * M_PER_DEG);
    expect(parts).toHaveLength(2);
    expect(parts[0]![0]![0]).toBeCloseTo(0.005, 12);
    expect(parts[0]!.at(-1)![0]).toBeCloseTo(0.02, 12);
    expect(parts[1]![0]![0]).toBeCloseTo(0.03, 12);
    expect(parts[1]!.at(-1)![0]).toBeCloseTo(0.035, 12);
  });

  it("is empty outside the line", () => {
    expect(sliceLine(equatorLine([0, 0]), 1e6, 2e6)).toEqual([]);
  });
});

describe("distance markers", () => {
  it("chooses 1, 2, 5, 10 … so that at most 60 markers are needed", () => {
    expect(markerStep(4.5)).toBe(1);
    expect(markerStep(60)).toBe(1);
    expect(markerStep(61)).toBe(2);
    expect(markerStep(250)).toBe(5);
    expect(markerStep(1000)).toBe(20);
  });

  it("puts a marker at every whole km from the first, none at the start or in the last quarter step", () => {
    const line = equatorLine(Array(10).fill(0), 0.01); // 10 × 1,111.95 m = 11.12 km
    const markers = distanceMarkers(line, 1000, 1);
    // 11 km is only 0.12 km before the end (inside the last quarter step, where the end marker sits).
    expect(markers.map((m) => m.value)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(markers[0]!.position[0]).toBeCloseTo(1000 / M_PER_DEG, 10);
    expect(markers.map((m) => m.rank)).toEqual([3, 2, 3, 2, 1, 2, 3, 2, 3, 0]);
    const longer = equatorLine(Array(11).fill(0), 0.01); // 12.23 km: 12 km is 0.23 km before the end
    expect(distanceMarkers(longer, 1000, 1).at(-1)!.value).toBe(11);
  });

  it("uses the mile in imperial units (1 mi = 1,609.344 m, NIST SP 811)", () => {
    const line = equatorLine(Array(10).fill(0), 0.01);
    const markers = distanceMarkers(line, 1609.344, 1);
    expect(markers.map((m) => m.value)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(markers[5]!.distanceM).toBeCloseTo(9656.064, 6);
  });
});
