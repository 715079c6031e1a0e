import { describe, expect, it } from "vitest";
import { cleanTrack, computeRouteStats, findDescents, resampleTrack } from "@/lib/route";
import { profileOf, trackOf } from "./profile-helpers";
import { enuToLatLon, gaussian, mulberry32, pathPoints, recordedPoints, rollingRoad, straightXY } from "./synthetic";

function clean(...segments: Parameters<typeof trackOf>) {
  const r = cleanTrack(trackOf(...segments));
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.track;
}

describe("resampleTrack", () => {
  it("samples every step along the geodesic length, ending exactly at the last point", () => {
    const t = clean(pathPoints(straightXY(11, 100), (d) => 500 - d / 10)); // 1 km, points 100 m apart
    const r = resampleTrack(t, 10);
    expect(r.distanceM.length).toBe(101);
    for (let i = 1; i < r.distanceM.length; i++) {
      expect((r.distanceM[i] as number) - (r.distanceM[i - 1] as number)).toBeCloseTo(t.lengthM / 100, 9);
    }
    expect(r.distanceM[100]).toBe(t.lengthM);
    expect(r.elevationM[50]).toBeCloseTo(500 - t.lengthM / 20, 9); // linear in distance
  });

  it("cuts a segment into equal steps no longer than the step (no sliver at the end)", () => {
    const r = resampleTrack(clean(pathPoints(straightXY(2, 1005), () => 0)), 10);
    expect(r.distanceM.length).toBe(102); // ⌈1005 / 10⌉ = 101 steps of 9.95 m
    expect((r.distanceM[1] as number) - (r.distanceM[0] as number)).toBeCloseTo(1005 / 101, 3);
  });

  it("C22: a gap between segments adds no distance and is marked in gapAfter", () => {
    const a = pathPoints(straightXY(31, 10), () => 800);
    const b = pathPoints(straightXY(31, 10, 20_000), () => 700);
    const r = resampleTrack(clean(a, b), 10);
    const last = 30;
    expect(r.gapAfter[last]).toBe(1);
    expect(Array.from(r.gapAfter).filter((g) => g === 1)).toHaveLength(1);
    expect(r.distanceM[last + 1]).toBe(r.distanceM[last]);
    expect(r.distanceM[r.distanceM.length - 1]).toBeCloseTo(600, 3);
  });

  it("interpolates long legs along the great circle (plain spherical geometry)", () => {
    // Two points at 45° N, 2° of longitude apart. The great circle through them has its vertex midway, at
    // tan φv = tan 45° / cos 1°, and tan φ = tan φv · cos(λ − 11°) along it (Napier's rules for the right
    // spherical triangle pole–vertex–point); a straight line in degrees would stay at 45°.
    const t = clean([
      { lat: 45, lon: 10, eleM: 0, timeS: null, line: 1 },
      { lat: 45, lon: 12, eleM: 0, timeS: null, line: 2 },
    ]);
    const r = resampleTrack(t, 50);
    const rad = Math.PI / 180;
    const tanVertex = 1 / Math.cos(1 * rad);
    for (const i of [Math.floor(r.lat.length / 4), Math.floor(r.lat.length / 2)]) {
      const lon = r.lon[i] as number;
      const expected = Math.atan(tanVertex * Math.cos((lon - 11) * rad)) / rad;
      expect(Math.abs((r.lat[i] as number) - expected)).toBeLessThan(1e-9);
    }
    expect(r.lat[Math.floor(r.lat.length / 2)]).toBeGreaterThan(45.004);
  });

  it("refuses a step outside 5–50 m", () => {
    const t = clean(pathPoints(straightXY(31, 10), () => 0));
    expect(() => resampleTrack(t, 4)).toThrow(new RangeError("stepM must be between 5 and 50 m"));
    expect(() => resampleTrack(t, 51)).toThrow(new RangeError("stepM must be between 5 and 50 m"));
  });
});

describe("grades and drops on synthetic constant-grade lines (plain geometry)", () => {
  it("a line built at exactly −8 % gives −8 % back on every step, within 1e-9", () => {
    const p = profileOf([pathPoints(straightXY(301, 10), (d) => 1000 - 0.08 * d)]);
    for (const g of p.grade) expect(Math.abs(g + 0.08)).toBeLessThan(1e-9);
  });

  it("a +3 % line at a 25 m step gives +3 %", () => {
    const p = profileOf([pathPoints(straightXY(81, 25), (d) => 200 + 0.03 * d)], { stepM: 25 });
    for (const g of p.grade) expect(g).toBeCloseTo(0.03, 9);
  });

  it("a real 600 m drop (7.5 km at 8 % between plateaus) stays 600 m ± 1 m after smoothing", () => {
    const e = (d: number) => (d < 2000 ? 1600 : d < 9500 ? 1600 - 0.08 * (d - 2000) : 1000);
    const p = profileOf([pathPoints(straightXY(1151, 10), e)]);
    const [descent, ...others] = findDescents(p);
    expect(others).toHaveLength(0);
    expect(Math.abs((descent?.dropM ?? 0) - 600)).toBeLessThan(1);
    expect(descent?.steepest1kmGrade).toBeCloseTo(-0.08, 6);
    expect(p.elevationM[0]).toBeCloseTo(1600, 6);
    expect(p.elevationM[p.elevationM.length - 1]).toBeCloseTo(1000, 6);
  });

  it("the same 600 m drop with GPS-like noise (σ = 3 m per point, seeded) stays 600 m ± 3 m", () => {
    const e = (d: number) => (d < 2000 ? 1600 : d < 9500 ? 1600 - 0.08 * (d - 2000) : 1000);
    for (const seed of [1, 2, 3]) {
      const noise = gaussian(mulberry32(seed));
      const p = profileOf([pathPoints(straightXY(1151, 10), (d) => e(d) + 3 * noise())]);
      const found = findDescents(p);
      expect(found).toHaveLength(1);
      expect(Math.abs((found[0]?.dropM ?? 0) - 600)).toBeLessThan(3);
    }
  });

  it("a sharp V valley at 8 % loses at most 3 m of its depth to the rounding (≈ 0.8·g·σ = 2.6 m)", () => {
    const v = (d: number) => 1000 - 0.08 * Math.min(d, 3000) + 0.08 * Math.max(0, d - 3000);
    const p = profileOf([pathPoints(straightXY(601, 10), v)]);
    expect(Math.min(...p.elevationM) - 760).toBeLessThan(3);
  });

  it("a spike of two recorded points (±40 m, points 10 m apart) leaves under 1 m at 5, 10 and 20 m steps", () => {
    // Interpolated, two raised points cover up to three point spacings (30 m): at a 20 m step that is two
    // samples, which a three-sample median keeps. Several placements, so some straddle two samples.
    for (const sign of [1, -1]) {
      const pts = pathPoints(straightXY(402, 10), () => 500);
      for (const at of [50, 101, 152, 203, 254, 305]) {
        for (const k of [at, at + 1]) (pts[k] as { eleM: number }).eleM = 500 + sign * 40;
      }
      for (const stepM of [5, 10, 20]) {
        for (const e of profileOf([pts], { stepM }).elevationM) expect(Math.abs(e - 500)).toBeLessThan(1);
      }
    }
  });

  it("an isolated spike of one or two points (+40 m) is removed completely by the median", () => {
    for (const width of [1, 2]) {
      const pts = pathPoints(straightXY(201, 10), () => 500);
      for (let k = 0; k < width; k++) (pts[100 + k] as { eleM: number }).eleM = 540;
      expect(Math.max(...profileOf([pts]).elevationM)).toBeCloseTo(500, 6);
    }
  });
});

describe("total ascent with and without noise (seeded PRNG)", () => {
  // 60 km of invented rolling road, points every 10 m; white noise σ = 3 m added to every point's elevation.
  const xy = straightXY(6001, 10);
  const cleanPoints = pathPoints(xy, rollingRoad);
  const base = computeRouteStats(profileOf([cleanPoints])).totalAscentM;

  it("noise inflates the total ascent by less than 2 % (without smoothing it would be several times too high)", () => {
    for (const seed of [1, 2, 3, 4, 5]) {
      const noise = gaussian(mulberry32(seed));
      const noisy = cleanPoints.map((p) => ({ ...p, eleM: (p.eleM as number) + 3 * noise() }));
      const ascent = computeRouteStats(profileOf([noisy])).totalAscentM;
      expect(Math.abs(ascent / base - 1)).toBeLessThan(0.02);
      let raw = 0;
      for (let i = 1; i < noisy.length; i++) raw += Math.max(0, (noisy[i]?.eleM as number) - (noisy[i - 1]?.eleM as number));
      expect(raw / base).toBeGreaterThan(3);
    }
  });
});

describe("curve radius (plain geometry: circles of known radius, straights with seeded noise)", () => {
  /**
   * 120 m of straight heading east, a left-hand circular arc of `degrees`, then 120 m of straight on the
   * new heading; points every 2 m along the straights and every `stepM` along the arc.
   */
  function arc(radiusM: number, degrees: number, stepM: number): Array<[number, number]> {
    const n = Math.round(((degrees / 180) * Math.PI * radiusM) / stepM);
    const lead = straightXY(61, 2, -120).slice(0, 60);
    const bend = Array.from({ length: n + 1 }, (_, i) => {
      const a = (i * stepM) / radiusM - Math.PI / 2;
      return [radiusM * Math.cos(a), radiusM + radiusM * Math.sin(a)] as [number, number];
    });
    const [e1, n1] = bend[n] as [number, number];
    const heading = ((n * stepM) / radiusM) % (2 * Math.PI);
    const tail = Array.from({ length: 60 }, (_, i) => [e1 + 2 * (i + 1) * Math.cos(heading), n1 + 2 * (i + 1) * Math.sin(heading)] as [number, number]);
    return [...lead, ...bend, ...tail];
  }
  /** Index of the sample nearest the middle of the arc (120 m of lead plus half of a 180° hairpin). */
  const middle = (distanceM: Float64Array, radiusM: number) => {
    const target = 120 + (Math.PI * radiusM * 90) / 180;
    return distanceM.findIndex((d) => d >= target);
  };

  it("a 400 m bend reads 400 m ± 1 % and a 100 m bend 100 m ± 10 % in its middle (smoothing shrinks arcs a little)", () => {
    for (const [R, tolerance] of [[400, 0.01], [100, 0.1]] as const) {
      const p = profileOf([pathPoints(arc(R, 180, 2), () => 0)], { stepM: 5 });
      const mid = middle(p.distanceM, R);
      expect(Math.abs((p.curveRadiusM[mid] as number) / R - 1)).toBeLessThan(tolerance);
    }
  });

  it("a 20 m hairpin still reads tighter than 40 m at every step (5, 10, 20 m)", () => {
    for (const stepM of [5, 10, 20]) {
      const p = profileOf([pathPoints(arc(20, 180, 2), () => 0)], { stepM });
      expect(Math.min(...p.curveRadiusM)).toBeLessThan(40);
    }
  });

  it("a noisy straight (σ = 3 m, drifting or independent) reads no radius below 300 m (no invented bends)", () => {
    // 5 km heading east, points every 10 m; curve speed √(2 m/s² × 300 m) = 88 km/h, above towing cruise.
    const xy = straightXY(501, 10);
    for (const correlationM of [200, 0]) {
      for (const seed of [1, 2, 3]) {
        const noisy = recordedPoints(xy, 10, () => 100, { seed, horizontalM: 3, horizontalCorrelationM: correlationM, elevationM: 0 });
        for (const stepM of [5, 10, 20]) expect(Math.min(...profileOf([noisy], { stepM }).curveRadiusM)).toBeGreaterThan(300);
      }
    }
  });

  it("a straight reads Infinity everywhere, and the ends of a segment too", () => {
    const p = profileOf([pathPoints(straightXY(101, 10), () => 0)]);
    expect(Array.from(p.curveRadiusM).every((r) => r === Infinity)).toBe(true);
  });

  it("positions far from the equator still give the right radius (local plane uses WGS 84 radii)", () => {
    const origin: [number, number] = [-62, 170];
    const xy = arc(100, 180, 2);
    const pts = xy.map(([e, n], i) => {
      const [lat, lon] = enuToLatLon(origin[0], origin[1], e, n);
      return { lat, lon, eleM: 0, timeS: null, line: i + 1 };
    });
    const p = profileOf([pts], { stepM: 5 });
    const mid = middle(p.distanceM, 100);
    expect(Math.abs((p.curveRadiusM[mid] as number) / 100 - 1)).toBeLessThan(0.1);
  });
});
