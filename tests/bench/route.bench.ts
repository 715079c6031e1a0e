/**
 * lib/route benchmarks (vitest bench): the hot path resample + smooth + grade/curve + descents + stats on
 * a synthetic 300 km route, each stage alone, and parsing / processing a 100,000-point GPX file (≈ 7 MB,
 * the size the upload benchmark budgets for) through to the browser's view, as the upload worker does. Synthetic data only: an invented winding mountain road with seeded
 * GPS-like noise. Run: npx vitest bench --run tests/bench/route.bench.ts
 */
import { bench, describe } from "vitest";
import {
  buildRouteProfile,
  buildRouteView,
  type CleanTrack,
  cleanTrack,
  computeRouteStats,
  findDescents,
  type GpxPoint,
  parseGpx,
  placeWaypoints,
  processGpx,
  resampleTrack,
  smoothElevation,
} from "@/lib/route";
import { gaussian, mulberry32, pathPoints, rollingRoad, toGpx } from "../unit/route/synthetic";

/** A winding road of `km` kilometres with points every `spacingM`, elevation noise σ = 2 m. */
function road(km: number, spacingM: number): GpxPoint[] {
  const n = Math.round((km * 1000) / spacingM) + 1;
  const xy = Array.from({ length: n }, (_, i) => {
    const s = i * spacingM;
    return [s, 400 * Math.sin(s / 2500) + 60 * Math.sin(s / 300)] as [number, number];
  });
  const noise = gaussian(mulberry32(2024));
  return pathPoints(xy, (d) => rollingRoad(d) + 2 * noise());
}

function cleaned(points: GpxPoint[]): CleanTrack {
  const r = cleanTrack({ id: "track:0", kind: "track", index: 0, name: null, description: null, segments: [points], timesOrdered: null });
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.track;
}

const track300 = cleaned(road(300, 15)); // 20,001 points, about 300 km along the winding line
const resampled = resampleTrack(track300, 10);
const profile300 = buildRouteProfile(track300);
const gpx100k = toGpx([road(1500, 15).slice(0, 100_000)]);

console.log(
  `route: ${(track300.lengthM / 1000).toFixed(1)} km, ${profile300.distanceM.length} samples at 10 m, ` +
    `${findDescents(profile300).length} descents; GPX: 100,000 points, ${(gpx100k.length / 1e6).toFixed(1)} MB`,
);

describe("300 km route, 10 m step", () => {
  bench("resample + smooth + grade + curve + descents + stats", () => {
    const p = buildRouteProfile(track300, { stepM: 10 });
    findDescents(p);
    computeRouteStats(p);
  });
  bench("resample only", () => {
    resampleTrack(track300, 10);
  });
  bench("smooth only (median + Gaussian)", () => {
    smoothElevation(resampled.distanceM, resampled.elevationM, resampled.gapAfter);
  });
  bench("descents + stats only", () => {
    findDescents(profile300);
    computeRouteStats(profile300);
  });
});

const processed100k = processGpx(gpx100k);
if (!processed100k.ok) throw new Error("process failed");

describe("100,000-point GPX (≈ 7 MB)", () => {
  bench("parseGpx", () => {
    if (!parseGpx(gpx100k).ok) throw new Error("parse failed");
  }, { iterations: 5, time: 0 });
  bench("processGpx (parse → clean → profile → descents → stats)", () => {
    if (!processGpx(gpx100k).ok) throw new Error("process failed");
  }, { iterations: 5, time: 0 });
  bench("buildRouteView + placeWaypoints (one-pass RDP to 4000 vertices)", () => {
    const { profile, descents, stats, gpx } = processed100k;
    buildRouteView(profile, descents, stats);
    placeWaypoints(profile, gpx.waypoints);
  }, { iterations: 10, time: 0 });
});
