import { describe, expect, it } from "vitest";
import { cleanTrack, type GpxPoint, type GpxTrack, parseGpx, type RouteProblem, selectTrack } from "@/lib/route";
import { fixture } from "./gpx-fixtures";
import { pathPoints, straightXY } from "./synthetic";

const ADVICE =
  "Re-export it from your planner or device with elevation (altitude) included, or add elevation with a " +
  "planner that fills it in from a terrain model.";

function track(...segments: GpxPoint[][]): GpxTrack {
  return { id: "track:0", kind: "track", index: 0, name: null, description: null, segments, timesOrdered: null };
}

function failure(t: GpxTrack): RouteProblem[] {
  const r = cleanTrack(t);
  if (r.ok) throw new Error("expected cleaning to fail");
  return r.problems;
}

/** A straight line of `n` points `spacing` m apart descending at 5 %. */
function line(n: number, spacing: number, startEast = 0, ele: (d: number) => number | null = (d) => 1000 - 0.05 * d) {
  return pathPoints(straightXY(n, spacing, startEast), ele);
}

describe("selectTrack", () => {
  it("C24: a file with only waypoints is refused with a message that says so", () => {
    const r = parseGpx(fixture("hostile/c24-waypoints-only.gpx"));
    if (!r.ok) throw new Error("parse failed");
    expect(selectTrack(r.gpx)).toEqual({
      ok: false,
      problem: {
        code: "no-track",
        severity: "error",
        message:
          "The file has only waypoints (2) and no track or route, so there is no line to model. " +
          "Export the track or route itself from your planner or device.",
      },
    });
  });

  it("picks a track or route by id, and says when the id does not exist", () => {
    const r = parseGpx(fixture("kestrel-gap-1-1.gpx"));
    if (!r.ok) throw new Error("parse failed");
    const picked = selectTrack(r.gpx, "track:1");
    expect(picked.ok && picked.track.segments[0]?.length).toBe(21);
    expect(selectTrack(r.gpx, "route:4")).toMatchObject({
      ok: false,
      problem: { code: "unknown-track", message: 'The file has no track or route with the id "route:4".' },
    });
  });
});

describe("cleanTrack: points and length (docs/security.md C21)", () => {
  it("one point: 'fewer than two distinct points', no NaN anywhere", () => {
    expect(failure(track(line(1, 10)))).toEqual([
      {
        code: "too-few-points",
        severity: "error",
        message: "The track has fewer than two distinct points, so it has no length or slope to model.",
      },
    ]);
  });

  it("zero points (<trk><trkseg/></trk>) and identical points give the same message", () => {
    expect(failure(track([]))[0]?.code).toBe("too-few-points");
    const p = line(1, 10)[0] as GpxPoint;
    expect(failure(track([p, { ...p }, { ...p }]))[0]?.code).toBe("too-few-points");
  });

  it("consecutive duplicates are merged, so no step has zero length", () => {
    const pts = line(40, 10);
    const doubled = pts.flatMap((p) => [p, { ...p, eleM: null }]);
    const r = cleanTrack(track(doubled));
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    const d = r.track.segments[0]?.distanceM as Float64Array;
    expect(d.length).toBe(40);
    for (let i = 1; i < d.length; i++) expect((d[i] as number) - (d[i - 1] as number)).toBeGreaterThan(9.99);
    expect(r.warnings[0]?.message).toBe("40 repeated point(s) (the same position twice in a row) were merged.");
  });

  it("a track under 200 m is refused with its length", () => {
    expect(failure(track(line(19, 10)))[0]?.message).toBe(
      "The track is only 180 m long; Fadeline needs at least 200 m to model it.",
    );
  });

  it("C22: the length of several segments excludes the gaps between them", () => {
    const r = cleanTrack(track(line(51, 10), line(51, 10, 5000)));
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.track.lengthM).toBeCloseTo(1000, 3);
    expect(r.track.segments).toHaveLength(2);
  });

  it("segments left with fewer than two distinct points are dropped, with a note", () => {
    const r = cleanTrack(track(line(51, 10), [], line(1, 10, 900)));
    expect(r.ok && r.warnings.map((w) => w.message)).toEqual([
      "2 segment(s) with fewer than two distinct points were left out (segment 2, 3).",
    ]);
  });

  it("a stray point far away is reported as a jump", () => {
    const pts = line(40, 10);
    const stray = { ...(pts[20] as GpxPoint), lat: (pts[20] as GpxPoint).lat + 0.2 };
    const r = cleanTrack(track([...pts.slice(0, 20), stray, ...pts.slice(21)]));
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]?.message).toMatch(
      /^Segment 1 of the track jumps 22\.\d km between two consecutive points \(points 2[01] and 2[12]\)\. Check the file for a stray point\.$/,
    );
  });
});

describe("cleanTrack: elevation (docs/security.md C20)", () => {
  it("no elevation at all: says so and how to export one that has it", () => {
    expect(failure(track(line(60, 10, 0, () => null)))).toEqual([
      {
        code: "no-elevation",
        severity: "error",
        message: `The file has no elevation data, so Fadeline cannot find descents. ${ADVICE}`,
      },
    ]);
  });

  it("small gaps (≤ 500 m inside, ≤ 100 m at the ends) are interpolated linearly by distance", () => {
    const pts = line(101, 10, 0, (d) => (d > 105 && d < 495 ? null : d < 45 ? null : 1000 - 0.05 * d));
    const r = cleanTrack(track(pts));
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    const e = r.track.segments[0]?.eleM as Float64Array;
    expect(e[30]).toBeCloseTo(1000 - 0.05 * 300, 6); // interpolated inside the gap
    expect(e[0]).toBeCloseTo(1000 - 0.05 * 50, 6); // held at the start
    expect(r.warnings[0]?.message).toBe(
      "Elevation was missing on 44 of 101 points and was filled in from the points around them (gaps of up to 500 m).",
    );
  });

  it("a gap longer than 500 m is refused with where it is", () => {
    const pts = line(201, 10, 0, (d) => (d > 405 && d < 1095 ? null : 1000));
    expect(failure(track(pts))[0]?.message).toBe(
      "Elevation is missing for 700 m of the 2.0 km track (the longest gap is 700 m, from 400 m). " +
        `Gaps of up to 500 m are filled in; longer ones cannot be. ${ADVICE}`,
    );
  });

  it("all elevations 0 is valid (sea level) but flagged as probably not real", () => {
    const r = cleanTrack(track(line(60, 10, 0, () => 0)));
    expect(r.ok && r.warnings.map((w) => w.message)).toEqual([
      `Every point of the track has the same elevation (0 m). If the track is not flat, the file has no real elevation data. ${ADVICE}`,
    ]);
  });
});
