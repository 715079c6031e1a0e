/**
 * The browser's view of a route: Ramer–Douglas–Peucker simplification (Douglas & Peucker 1973, Canadian
 * Cartographer 10(2)) checked on plain geometry — a straight line needs only its ends, a circle keeps every
 * vertex that stands more than the tolerance off a chord — and the profile keeps each bucket's extremes.
 */
import { describe, expect, it } from "vitest";
import { buildRouteView, computeRouteStats, type Descent, findDescents } from "@/lib/route";
import type { RouteProfile } from "@/lib/route/types";
import { enuToLatLon, pathPoints, straightXY } from "./synthetic";
import { profileOf } from "./profile-helpers";

describe("buildRouteView", () => {
  it("reduces a straight 5 km line to its two ends", () => {
    const profile = profileOf([pathPoints(straightXY(501, 10), (d) => 800 - 0.05 * d)]);
    const view = buildRouteView(profile, [], computeRouteStats(profile));
    expect(view.line.lat).toHaveLength(2);
    expect(view.line.distanceM.at(-1)).toBeCloseTo(5000, 0);
    expect(view.line.grade[0]).toBeCloseTo(-0.05, 3); // 5 % down, by construction
  });

  it("keeps a 200 m circle within the tolerance and under the vertex limit", () => {
    const xy = Array.from({ length: 1257 }, (_, i) => [200 * Math.sin(i / 200), 200 - 200 * Math.cos(i / 200)] as [number, number]);
    const profile = profileOf([pathPoints(xy, () => 500)]);
    const view = buildRouteView(profile, [], computeRouteStats(profile), { maxLinePoints: 400 });
    expect(view.line.lat.length).toBeLessThanOrEqual(400);
    // Sagitta of a chord c on radius r is r − √(r² − c²/4): with ≥ 2 m tolerance the chord is ≥ 2·√(2·2·200) ≈ 57 m.
    expect(view.line.lat.length).toBeGreaterThan(10);
    expect(view.line.lat.length).toBeLessThan(60);
  });

  it("fits a 300 km wiggly route into the limits and keeps its highest and lowest point", () => {
    const xy = Array.from({ length: 30_001 }, (_, i) => [i * 10, 80 * Math.sin(i / 37)] as [number, number]);
    const profile = profileOf([pathPoints(xy, (d) => 1200 + 600 * Math.sin(d / 9000) + 40 * Math.sin(d / 350))]);
    const stats = computeRouteStats(profile);
    const view = buildRouteView(profile, findDescents(profile), stats, { maxLinePoints: 4000, maxProfilePoints: 1500 });
    expect(view.line.lat.length).toBeLessThanOrEqual(4000);
    expect(view.profile.elevationM.length).toBeLessThanOrEqual(1502);
    expect(Math.max(...view.profile.elevationM)).toBeCloseTo(stats.highestM, 0);
    expect(Math.min(...view.profile.elevationM)).toBeCloseTo(stats.lowestM, 0);
    expect(JSON.stringify(view).length).toBeLessThan(2_000_000); // the 2 MB ceiling for the page's data
  });

  it("never draws across a gap between segments", () => {
    const a = pathPoints(straightXY(101, 10), () => 300);
    const [lat, lon] = enuToLatLon(-44.5, 160.5, 3000, 0);
    const b = pathPoints(straightXY(101, 10), () => 300, [lat, lon]);
    const profile = profileOf([a, b]);
    const view = buildRouteView(profile, [], computeRouteStats(profile));
    const gapAt = view.line.gapAfter.indexOf(1);
    expect(gapAt).toBeGreaterThanOrEqual(0);
    expect(view.line.distanceM[gapAt + 1]).toBeCloseTo(view.line.distanceM[gapAt]!, 0); // a gap carries no distance
    expect(view.line.grade[gapAt]).toBe(0);
  });

  it("drops only samples within 2 m of the line when the line fits: exactly RDP at 2 m", () => {
    const { profile, descents, stats } = wiggly(3_001);
    const view = buildRouteView(profile, descents, stats, { maxLinePoints: 100_000 });
    const kept = keptIndices(profile, view.line.distanceM);
    const drift = worstDrift(profile, kept);
    expect(drift).toBeLessThanOrEqual(2);
    expect(kept).toEqual(referenceRdp(profile, anchorsOf(profile, descents), 2));
  });

  it("under a tight vertex limit, is exactly RDP at the smallest tolerance that fits", () => {
    const { profile, descents, stats } = wiggly(3_001); // 574 vertices at 2 m
    for (const max of [40, 150, 400, 570]) {
      const view = buildRouteView(profile, descents, stats, { maxLinePoints: max });
      const kept = keptIndices(profile, view.line.distanceM);
      expect(kept.length).toBeLessThanOrEqual(max);
      // The tolerance used is the largest distance of a dropped sample from the drawn line (RDP's guarantee) …
      const tolerance = worstDrift(profile, kept);
      expect(tolerance).toBeGreaterThan(2);
      const anchors = anchorsOf(profile, descents);
      expect(kept).toEqual(referenceRdp(profile, anchors, tolerance));
      // … and no smaller tolerance would have fitted.
      expect(referenceRdp(profile, anchors, tolerance * (1 - 1e-9)).length).toBeGreaterThan(max);
    }
  });
});

/** A 30 km single-segment wiggly route (one sample per 10 m: distances identify samples). */
function wiggly(points: number) {
  const xy = Array.from({ length: points }, (_, i) => [i * 10, 80 * Math.sin(i / 37) + 15 * Math.sin(i / 5)] as [number, number]);
  const profile = profileOf([pathPoints(xy, (d) => 900 + 300 * Math.sin(d / 4000))]);
  return { profile, descents: findDescents(profile), stats: computeRouteStats(profile) };
}

/** Indices of the profile samples the view's line kept, found by their distance along the route. */
function keptIndices(profile: RouteProfile, distanceM: number[]): number[] {
  const byDistance = new Map<number, number>();
  profile.distanceM.forEach((d, i) => byDistance.set(Math.round(d * 10), i));
  return distanceM.map((d) => byDistance.get(Math.round(d * 10)) ?? -1);
}

/** The same local equirectangular projection as the view, m. */
function project(profile: RouteProfile): { x: number[]; y: number[] } {
  const R = 6_371_008.8;
  const k = Math.PI / 180;
  const cos0 = Math.cos(profile.lat[0]! * k);
  return { x: Array.from(profile.lon, (lon) => lon * k * cos0 * R), y: Array.from(profile.lat, (lat) => lat * k * R) };
}

/** Distance from sample i to the segment from a to b, m. */
function offChord(p: { x: number[]; y: number[] }, i: number, a: number, b: number): number {
  const dx = p.x[b]! - p.x[a]!;
  const dy = p.y[b]! - p.y[a]!;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.max(0, Math.min(1, ((p.x[i]! - p.x[a]!) * dx + (p.y[i]! - p.y[a]!) * dy) / len2)) : 0;
  return Math.hypot(p.x[i]! - p.x[a]! - t * dx, p.y[i]! - p.y[a]! - t * dy);
}

/** Largest distance of a dropped sample from the chord of the line that replaces it, m. */
function worstDrift(profile: RouteProfile, kept: number[]): number {
  const p = project(profile);
  let worst = 0;
  for (let k = 0; k + 1 < kept.length; k++) {
    for (let i = kept[k]! + 1; i < kept[k + 1]!; i++) worst = Math.max(worst, offChord(p, i, kept[k]!, kept[k + 1]!));
  }
  return worst;
}

function anchorsOf(profile: RouteProfile, descents: Descent[]): number[] {
  const set = new Set([0, profile.distanceM.length - 1, ...descents.flatMap((d) => [d.startIndex, d.endIndex])]);
  return [...set].sort((a, b) => a - b);
}

/** Textbook recursive Ramer–Douglas–Peucker between consecutive anchors, independent of lib/route. */
function referenceRdp(profile: RouteProfile, anchors: number[], tolerance: number): number[] {
  const p = project(profile);
  const kept = new Set(anchors);
  const split = (a: number, b: number): void => {
    let worst = -1;
    let worstD = tolerance;
    for (let i = a + 1; i < b; i++) {
      const d = offChord(p, i, a, b);
      if (d > worstD) [worst, worstD] = [i, d];
    }
    if (worst < 0) return;
    kept.add(worst);
    split(a, worst);
    split(worst, b);
  };
  for (let k = 0; k + 1 < anchors.length; k++) split(anchors[k]!, anchors[k + 1]!);
  return [...kept].sort((a, b) => a - b);
}
