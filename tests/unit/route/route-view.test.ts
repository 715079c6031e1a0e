/**
 * The browser's view of a route: Ramer–Douglas–Peucker simplification (Douglas & Peucker 1973, Canadian
 * Cartographer 10(2)) checked on plain geometry — a straight line needs only its ends, a circle keeps every
 * vertex that stands more than the tolerance off a chord — and the profile keeps each bucket's extremes.
 */
import { describe, expect, it } from "vitest";
import { buildRouteView, computeRouteStats, findDescents } from "@/lib/route";
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
});
