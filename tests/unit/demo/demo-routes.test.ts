/**
 * The demo routes (db/demo/generate-routes.ts) measured by our own route library (lib/route) and by plain
 * geometry: each feature the demo promises is there, on the invented island, every run the same.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { demoRoutes } from "@/db/demo/generate-routes";
import { coastlineRing, lakes } from "@/db/demo/region";
import { geodesicDistance, GPX_1_1_NS, parseGpx, type ProcessedRoute } from "@/lib/route";
import { demo, haversineM, inRing, swings } from "./demo-helpers";

const get = (slug: string): ProcessedRoute => {
  const r = demo().processed.get(slug);
  if (!r) throw new Error(`no demo route ${slug}`);
  return r;
};
const pct = (g: number) => g * 100;

describe("demo GPX files", () => {
  it("are GPX 1.1 by the Fadeline demo generator that our parser reads without a problem or warning", () => {
    const { routes } = demo();
    expect(routes.map((r) => r.slug)).toEqual(["tallowmere-to-kestrel-gap", "cinder-flats-loop", "marrow-creek-track"]);
    for (const r of routes) {
      // Topografix GPX 1.1 schema: root `gpx` in the 1.1 namespace with `version` and `creator` attributes.
      expect(r.gpx).toContain(`<gpx xmlns="${GPX_1_1_NS}"`);
      expect(r.gpx).toMatch(/ version="1\.1" creator="Fadeline demo generator">/);
      const parsed = parseGpx(r.gpx);
      expect(parsed.ok).toBe(true);
      if (parsed.ok) expect(parsed.warnings).toEqual([]);
      expect(get(r.slug).warnings).toEqual([]);
      expect(get(r.slug).gpx.name).toBe(r.name);
    }
  });

  it("are deterministic and match the files in tests/fixtures/gpx/demo (rerun db/demo/write-demo-gpx.ts if not)", () => {
    const again = demoRoutes();
    expect(again.map((r) => r.gpx)).toEqual(demo().routes.map((r) => r.gpx));
    for (const r of again) {
      const file = readFileSync(new URL(`../../fixtures/gpx/demo/${r.slug}.gpx`, import.meta.url), "utf8");
      expect(file === r.gpx, `${r.slug}.gpx is stale`).toBe(true);
    }
  });

  it("lie on the invented island and never on its lake (point in polygon)", () => {
    const coast = coastlineRing();
    const lake = lakes()[0]?.ring ?? [];
    for (const slug of demo().processed.keys()) {
      const { gpx } = get(slug);
      const points = [...gpx.tracks.flatMap((t) => t.segments.flat()), ...gpx.waypoints];
      expect(points.length).toBeGreaterThan(1000);
      const off = points.filter((p) => !inRing(p.lon, p.lat, coast) || inRing(p.lon, p.lat, lake));
      expect(off, slug).toEqual([]);
    }
  });

  it("are recorded like a towing rig: a fix about every 5–15 m, times increasing, plausible speeds", () => {
    for (const slug of demo().processed.keys()) {
      for (const seg of get(slug).gpx.tracks[0]?.segments ?? []) {
        const steps = seg.slice(1).map((p, i) => {
          const q = seg[i];
          if (!q || p.timeS === null || q.timeS === null) throw new Error("missing time");
          return { m: geodesicDistance(q.lat, q.lon, p.lat, p.lon), s: p.timeS - q.timeS };
        });
        const metres = steps.map((s) => s.m).sort((a, b) => a - b);
        const median = metres[Math.floor(metres.length / 2)] as number;
        expect(median).toBeGreaterThan(5);
        expect(median).toBeLessThan(15);
        expect(metres[Math.floor(metres.length * 0.98)]).toBeLessThan(17);
        expect(steps.every((s) => s.s >= 1)).toBe(true);
        expect(Math.max(...steps.map((s) => s.m / s.s))).toBeLessThan(17); // < 61 km/h
      }
    }
  });
});

describe("Tallowmere to Kestrel Gap", () => {
  it("is 60–90 km long", () => {
    const { lengthM } = get("tallowmere-to-kestrel-gap").stats;
    expect(lengthM).toBeGreaterThan(60_000);
    expect(lengthM).toBeLessThan(90_000);
  });

  it("has one long descent of ≥ 8 km whose mean and steepest-1-km grades lie in the 8–10 % band", () => {
    const long = get("tallowmere-to-kestrel-gap").descents.filter((d) => d.lengthM >= 8000);
    expect(long).toHaveLength(1);
    const d = long[0];
    if (!d) return;
    expect(pct(d.meanGrade)).toBeLessThanOrEqual(-8);
    expect(pct(d.meanGrade)).toBeGreaterThanOrEqual(-10);
    expect(pct(d.steepest1kmGrade)).toBeLessThanOrEqual(-8);
    expect(pct(d.steepest1kmGrade)).toBeGreaterThanOrEqual(-10);
    expect(d.dropM).toBeGreaterThan(700);
  });

  it("climbs to the pass on hairpins: curve radius under 35 m at several separate bends before the crest", () => {
    const r = get("tallowmere-to-kestrel-gap");
    const crest = r.descents.find((d) => d.lengthM >= 8000)?.startIndex ?? 0;
    let bends = 0;
    for (let i = 1; i < crest; i++) if ((r.profile.curveRadiusM[i] as number) < 35 && !((r.profile.curveRadiusM[i - 1] as number) < 35)) bends++;
    expect(bends).toBeGreaterThanOrEqual(6);
  });

  it("has a lookout at the crest and a camp part-way down the long descent (waypoints)", () => {
    const r = get("tallowmere-to-kestrel-gap");
    const d = r.descents.find((x) => x.lengthM >= 8000);
    if (!d) throw new Error("no long descent");
    const nearest = (lat: number, lon: number) => {
      let best = { m: Infinity, atM: 0 };
      for (let i = 0; i < r.profile.lat.length; i++) {
        const m = haversineM(lat, lon, r.profile.lat[i] as number, r.profile.lon[i] as number);
        if (m < best.m) best = { m, atM: r.profile.distanceM[i] as number };
      }
      return best;
    };
    const wpt = (name: string) => r.gpx.waypoints.find((w) => w.name === name);
    const lookout = wpt("Greyvane Lookout");
    const camp = wpt("Fernhollow Camp");
    if (!lookout || !camp) throw new Error("waypoints missing");
    const l = nearest(lookout.lat, lookout.lon);
    expect(l.m).toBeLessThan(200);
    expect(Math.abs(l.atM - d.startDistanceM)).toBeLessThan(500);
    const c = nearest(camp.lat, camp.lon);
    expect(c.m).toBeLessThan(100);
    expect(c.atM).toBeGreaterThan(d.startDistanceM + 0.2 * d.lengthM);
    expect(c.atM).toBeLessThan(d.endDistanceM - 0.2 * d.lengthM);
  });
});

describe("Cinder Flats loop", () => {
  it("is a 30–50 km loop that ends where it starts", () => {
    const r = get("cinder-flats-loop");
    expect(r.stats.lengthM).toBeGreaterThan(30_000);
    expect(r.stats.lengthM).toBeLessThan(50_000);
    const n = r.profile.lat.length - 1;
    expect(haversineM(r.profile.lat[0] as number, r.profile.lon[0] as number, r.profile.lat[n] as number, r.profile.lon[n] as number)).toBeLessThan(100);
  });

  it("rolls: at least eight climbs and dips of 20–60 m", () => {
    const r = get("cinder-flats-loop");
    const s = swings(r.profile.elevationM, 0, r.profile.elevationM.length - 1, 20);
    expect(s.filter((h) => h >= 20 && h <= 60).length).toBeGreaterThanOrEqual(8);
  });

  it("has a short, very steep pitch: steeper than 15 % over 200 m down, and up, for 200–400 m", () => {
    const r = get("cinder-flats-loop");
    const steep = r.descents.filter((d) => d.steepest200mGrade <= -0.15);
    expect(steep).toHaveLength(1);
    const { distanceM: d, elevationM: e } = r.profile;
    const n = d.length;
    // Longest stretch whose mean grade is at least 15 % (down or up), plain arithmetic on the profile.
    const longest = (sign: 1 | -1) => {
      let best = 0;
      for (let i = 0; i < n; i++) {
        for (let j = i + 1; j < n && (d[j] as number) - (d[i] as number) < 1000; j++) {
          const run = (d[j] as number) - (d[i] as number);
          if (sign * ((e[j] as number) - (e[i] as number)) >= 0.15 * run) best = Math.max(best, run);
        }
      }
      return best;
    };
    for (const sign of [-1, 1] as const) {
      expect(longest(sign)).toBeGreaterThanOrEqual(200);
      expect(longest(sign)).toBeLessThanOrEqual(400);
    }
  });
});

describe("Marrow Creek track (two segments)", () => {
  it("has two segments; the ferry gap of 1–3 km is not counted as distance", () => {
    const r = get("marrow-creek-track");
    const segments = r.gpx.tracks[0]?.segments ?? [];
    expect(segments).toHaveLength(2);
    expect(r.stats.segmentCount).toBe(2);
    expect(Array.from(r.profile.gapAfter).filter((g) => g === 1)).toHaveLength(1);
    const [one, two] = segments as [typeof segments[number], typeof segments[number]];
    const end = one[one.length - 1];
    const start = two[0];
    if (!end || !start) throw new Error("empty segment");
    const gapM = haversineM(end.lat, end.lon, start.lat, start.lon);
    expect(gapM).toBeGreaterThan(1000);
    expect(gapM).toBeLessThan(3000);
    // Driven length = sum of the segments' own lengths (point to point, haversine); the gap adds nothing.
    const driven = [one, two].reduce((sum, seg) => sum + seg.slice(1).reduce((s, p, i) => s + haversineM(seg[i]?.lat ?? 0, seg[i]?.lon ?? 0, p.lat, p.lon), 0), 0);
    expect(Math.abs(r.stats.lengthM - driven) / driven).toBeLessThan(0.02);
  });

  it("has a moderate descent in each segment and none across the gap", () => {
    const r = get("marrow-creek-track");
    const gapAt = r.profile.distanceM[Array.from(r.profile.gapAfter).indexOf(1)] as number;
    const before = r.descents.filter((d) => d.endDistanceM <= gapAt);
    const after = r.descents.filter((d) => d.startDistanceM > gapAt);
    expect(before.length + after.length).toBe(r.descents.length);
    for (const part of [before, after]) {
      const main = part.reduce((a, b) => (b.dropM > a.dropM ? b : a));
      expect(main.dropM).toBeGreaterThan(150);
      expect(pct(main.meanGrade)).toBeGreaterThan(-7.5);
      expect(pct(main.meanGrade)).toBeLessThan(-4);
    }
  });
});
