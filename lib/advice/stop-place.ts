/**
 * Where to make a cool-down stop: before the point where the brakes would cross the line, on the flattest
 * stretch there (the latest of the nearly flattest places, where the brakes are hottest and cool fastest),
 * at a named waypoint when one lies within a few hundred metres, or at the crest. Only places where some brake
 * is clearly above its stop target qualify: a stop there cools something.
 */

import type { PlacedWaypoint } from "@/lib/route";
import type { HeatRunResult, PreparedRoute } from "@/lib/thermal";
import type { AdviceSettings } from "./settings";
import type { AdviceLine, StopPlace } from "./types";

/** A chosen stop place. */
export interface StopSpot {
  /** Where, m along the route (exactly a sample of the route). */
  atM: number;
  /** How it was chosen. */
  place: StopPlace;
}

/** A brake must be at least this far above its stop target for a place to qualify, K. */
const USEFUL_EXCESS_K = 5;
/** Half-width of the stretch over which flatness is measured, m. */
const FLAT_HALF_WIDTH_M = 50;
/** A place this close to the crest is "at the crest", m. */
const CREST_M = 100;

/**
 * First sample on [startM, endM] where a brake reaches the line or a fluid its boiling point.
 * @param result a run
 * @param startM crest, m
 * @param endM bottom, m
 * @param line warm or hot
 * @returns index into the run's trace, or −1
 * @example firstCrossing(result, 31_640, 41_020, "hot")
 */
export function firstCrossing(result: HeatRunResult, startM: number, endM: number, line: AdviceLine): number {
  const t = result.trace;
  const P = result.positions.length;
  for (let k = 0; k < t.length; k++) {
    const d = t.distanceM[k] as number;
    if (d < startM) continue;
    if (d > endM) break;
    for (let j = 0; j < P; j++) {
      const spec = result.positions[j]!;
      const limit = line === "warm" ? spec.thresholds.warmC : spec.thresholds.hotC;
      if ((t.rotorC[j]![k] as number) >= limit) return k;
      if (spec.fluid && (t.fluidC[j]![k] as number) >= spec.fluid.boilC) return k;
    }
  }
  return -1;
}

/**
 * Choose a stop place before a crossing.
 * @param route the whole prepared route (for flatness)
 * @param result the run in which the crossing happens (at the route's step)
 * @param crossing trace index of the crossing
 * @param window earliest distance allowed, m (after the lead-in start or the previous stop), the crest, m, and
 *   optionally a latest distance, m (to move a stop earlier when its arrival is too close to the line)
 * @param targetC stop target per position, °C
 * @param waypoints placed waypoints
 * @param settings settings
 * @returns the place, or null when no place before the crossing would cool anything
 * @example chooseStopSpot(route, run.result, k, { fromM: 30_800, crestM: 31_640 }, [200, 200, 150], wps, settings)
 */
export function chooseStopSpot(
  route: PreparedRoute,
  result: HeatRunResult,
  crossing: number,
  window: { fromM: number; crestM: number; latestM?: number },
  targetC: readonly number[],
  waypoints: readonly PlacedWaypoint[],
  settings: AdviceSettings,
): StopSpot | null {
  const t = result.trace;
  const toM = Math.min((t.distanceM[crossing] as number) - settings.stopBackoffM, window.latestM ?? Infinity);
  const fromM = Math.max(window.fromM, toM - settings.stopSearchM);
  const useful = (k: number) =>
    result.positions.some((_, j) => (t.rotorC[j]![k] as number) > (targetC[j] as number) + USEFUL_EXCESS_K);
  const candidates: { k: number; grade: number }[] = [];
  for (let k = 0; k < crossing; k++) {
    const d = t.distanceM[k] as number;
    if (d >= fromM && d <= toM && useful(k)) candidates.push({ k, grade: localGrade(route, d) });
  }
  if (candidates.length === 0) return null;
  const flattest = Math.min(...candidates.map((c) => Math.abs(c.grade)));
  const chosen = candidates.filter((c) => Math.abs(c.grade) <= flattest + settings.flatSlackGrade).at(-1)!;
  const chosenM = t.distanceM[chosen.k] as number;
  const named = nearestWaypoint(waypoints, chosenM, fromM, toM, settings.waypointSnapM);
  if (named !== null && useful(nearestIndex(t.distanceM, named.distanceM as number))) {
    return { atM: named.distanceM as number, place: { kind: "waypoint", name: named.name as string } };
  }
  if (Math.abs(chosenM - window.crestM) <= CREST_M) return { atM: chosenM, place: { kind: "crest" } };
  return { atM: chosenM, place: { kind: "flat", grade: chosen.grade } };
}

/**
 * Mean grade over ±50 m around a distance (rise over run, negative downhill).
 * @param route prepared route
 * @param atM distance, m
 * @returns grade (dimensionless)
 * @example localGrade(route, 35_000) // −0.02
 */
export function localGrade(route: PreparedRoute, atM: number): number {
  const d = route.profile.distanceM;
  const e = route.profile.elevationM;
  const a = nearestIndex(d, atM - FLAT_HALF_WIDTH_M);
  const b = nearestIndex(d, atM + FLAT_HALF_WIDTH_M);
  const run = (d[b] as number) - (d[a] as number);
  return run > 0 ? ((e[b] as number) - (e[a] as number)) / run : 0;
}

/** @private Nearest named, placed waypoint to a distance within [fromM, toM] and `snapM`. */
function nearestWaypoint(
  waypoints: readonly PlacedWaypoint[],
  atM: number,
  fromM: number,
  toM: number,
  snapM: number,
): PlacedWaypoint | null {
  let best: PlacedWaypoint | null = null;
  for (const w of waypoints) {
    if (w.name === null || w.name.trim() === "" || w.distanceM === null) continue;
    if (w.distanceM < fromM || w.distanceM > toM || Math.abs(w.distanceM - atM) > snapM) continue;
    if (best === null || Math.abs(w.distanceM - atM) < Math.abs((best.distanceM as number) - atM)) best = w;
  }
  return best;
}

/**
 * Index of the sample nearest a distance (binary search).
 * @param d distances, m (non-decreasing)
 * @param atM distance, m
 * @returns index
 * @example nearestIndex(Float64Array.from([0, 10, 20]), 12) // 1
 */
export function nearestIndex(d: Float64Array, atM: number): number {
  let lo = 0;
  let hi = d.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((d[mid] as number) <= atM) lo = mid;
    else hi = mid;
  }
  return Math.abs((d[hi] as number) - atM) < Math.abs((d[lo] as number) - atM) ? hi : lo;
}
