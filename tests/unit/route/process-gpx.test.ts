import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { type ProcessedRoute, processGpx } from "@/lib/route";
import { fixture, trackOf } from "./gpx-fixtures";

const OUT = fileURLToPath(new URL("../../fixtures/gpx/out/", import.meta.url));
const round = (x: number, digits = 1) => Math.round(x * 10 ** digits) / 10 ** digits;

/** The reviewable summary kept as a golden file (rounded so float noise does not churn it). */
function summary(r: ProcessedRoute) {
  return {
    trackId: r.trackId,
    tracks: r.tracks.map((t) => ({ id: t.id, label: t.label, points: t.pointCount, lengthM: round(t.lengthM) })),
    samples: r.profile.distanceM.length,
    gaps: Array.from(r.profile.gapAfter).reduce((n, g) => n + g, 0),
    stats: Object.fromEntries(Object.entries(r.stats).map(([k, v]) => [k, round(v)])),
    descents: r.descents.map((d) => ({
      fromM: round(d.startDistanceM),
      toM: round(d.endDistanceM),
      dropM: round(d.dropM),
      meanGradePct: round(d.meanGrade * 100, 2),
      steepest200mPct: round(d.steepest200mGrade * 100, 2),
      steepest1kmPct: round(d.steepest1kmGrade * 100, 2),
    })),
    warnings: r.warnings.map((w) => w.code),
  };
}

/**
 * Golden regression: compares with tests/fixtures/gpx/out/<name>.json; `REGEN=1` rewrites the file, so any
 * change of output shows up as a reviewable diff. (A regression check, not an outside reference: the
 * outside references are the constructed values asserted below and in the other test files.)
 */
function golden(name: string, value: unknown): void {
  const file = `${OUT}${name}.json`;
  if (process.env.REGEN === "1" || !existsSync(file)) {
    mkdirSync(OUT, { recursive: true });
    writeFileSync(file, `${JSON.stringify(value, null, 2)}\n`);
  }
  expect(value).toEqual(JSON.parse(readFileSync(file, "utf8")));
}

function processed(text: string, options?: Parameters<typeof processGpx>[1]): ProcessedRoute {
  const r = processGpx(text, options);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r;
}

describe("processGpx on the fixtures", () => {
  it("kestrel-gap-1-1.gpx: two descents, one per segment, none across the stop with the GPS off", () => {
    const r = processed(fixture("kestrel-gap-1-1.gpx"));
    // Constructed as 3 km at −8 % (240 m) and, after a gap, 1.5 km at −6 % (90 m), with 0.8 m noise.
    expect(r.descents).toHaveLength(2);
    expect(Math.abs((r.descents[0]?.dropM ?? 0) - 240)).toBeLessThan(3);
    expect(Math.abs((r.descents[1]?.dropM ?? 0) - 90)).toBeLessThan(3);
    const gapAt = r.profile.gapAfter.indexOf(1);
    expect(r.descents[0]?.endIndex).toBeLessThanOrEqual(gapAt);
    expect(r.descents[1]?.startIndex).toBeGreaterThan(gapAt);
    golden("kestrel-gap-1-1", summary(r));
  });

  it("kestrel-gap-1-1.gpx, second track chosen by id", () => {
    const r = processed(fixture("kestrel-gap-1-1.gpx"), { trackId: "track:1" });
    expect(r.trackId).toBe("track:1");
    expect(r.descents).toEqual([]);
    expect(r.stats.totalAscentM).toBeGreaterThan(25); // constructed as 600 m at +5 % = 30 m
  });

  it("tarnwick-saddle-1-0.gpx: a GPX 1.0 route at a constant 7.5 m per leg keeps its 225 m drop exactly", () => {
    const r = processed(fixture("tarnwick-saddle-1-0.gpx"), { profile: { stepM: 20 } });
    expect(r.trackId).toBe("route:0");
    expect(r.descents).toHaveLength(1);
    expect(r.descents[0]?.dropM).toBeCloseTo(225, 6);
    expect(r.stats.totalDescentM).toBeCloseTo(225, 6);
    golden("tarnwick-saddle-1-0", summary(r));
  });
});

describe("processGpx failures carry the reason and, once the file was read, the track list", () => {
  it("waypoints only", () => {
    const r = processGpx(fixture("hostile/c24-waypoints-only.gpx"));
    expect(r).toMatchObject({ ok: false, tracks: [], problems: [{ code: "no-track" }] });
  });

  it("a track without elevation", () => {
    const pts = Array.from({ length: 30 }, (_, i) => `<trkpt lat="-44.8" lon="${(161.3 + i * 0.0002).toFixed(4)}"/>`);
    const r = processGpx(trackOf(pts.join("")));
    expect(r).toMatchObject({ ok: false, problems: [{ code: "no-elevation" }], tracks: [{ id: "track:0", pointCount: 30 }] });
  });

  it("a hostile file stops at the parser, with no track list", () => {
    const r = processGpx(fixture("hostile/c01-xxe-file.gpx"));
    expect(r.ok).toBe(false);
    expect(r.ok === false && r.tracks).toBeUndefined();
  });
});
