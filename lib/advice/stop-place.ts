/**
 * Where to make a cool-down stop: somewhere a rig can stand, before the point where the brakes would cross the
 * line. A rig is stopped at the crest, a lookout, a rest area or a flat pull-off, never on the downgrade
 * (common practice, no published source). So the places are: a named waypoint (the GPX file's own lookouts and
 * rest areas), or road no steeper than `maxStopGrade` either way over a stretch long enough to park a rig
 * (`parkingStretchM`, centred on the place); the crest is such a place when the road there is that flat. Of
 * these, the latest before the crossing is chosen (the brakes are hottest there, so the stop cools the most),
 * and a named waypoint within a few hundred metres of it is used instead. When the only such places are far
 * back (the crest, say), the stop goes there; when no such place would cool anything, there is no stop. Only
 * places where some brake is clearly above its stop target qualify: a stop there cools something.
 */

import type { PlacedWaypoint } from "@/lib/route";
import { nearestIndex, type HeatRunResult, type PreparedRoute } from "@/lib/thermal";
import type { AdviceSettings } from "./settings";
import type { AdviceLine, StopPlace } from "./types";

/** A chosen stop place. */
export interface StopSpot {
  /** Where, m along the route (exactly a sample of the route, or a waypoint's distance). */
  atM: number;
  /** How it was chosen. */
  place: StopPlace;
}

/** A brake must be at least this far above its stop target for a place to qualify, K. */
const USEFUL_EXCESS_K = 5;
/** A place this close to the crest is "at the crest", m. */
const CREST_M = 100;

/**
 * First sample on [startM, endM] where a brake reaches the line or a fluid its boiling point.
 * @param result a run
 * @param startM crest, m
 * @param endM bottom, m
 * @param line warm or hot
 * @param bandSpread band spread k of the descent (0: the lines themselves; descent-runner withBandSpread)
 * @returns index into the run's trace, or −1
 * @example firstCrossing(result, 31_640, 41_020, "hot")
 */
export function firstCrossing(result: HeatRunResult, startM: number, endM: number, line: AdviceLine, bandSpread = 0): number {
  const t = result.trace;
  const P = result.positions.length;
  const ambient = result.model.params.ambientC;
  // With a band spread k, a brake crosses where its estimated upper edge does: peak + k·(peak − ambient).
  const limits = result.positions.map((spec) => {
    const line0 = line === "warm" ? spec.thresholds.warmC : spec.thresholds.hotC;
    return ambient + (line0 - ambient) / (1 + (bandSpread > 0 ? bandSpread : 0));
  });
  for (let k = 0; k < t.length; k++) {
    const d = t.distanceM[k] as number;
    if (d < startM) continue;
    if (d > endM) break;
    for (let j = 0; j < P; j++) {
      const spec = result.positions[j]!;
      if ((t.rotorC[j]![k] as number) >= (limits[j] as number)) return k;
      if (spec.fluid && (t.fluidC[j]![k] as number) >= spec.fluid.boilC) return k;
    }
  }
  return -1;
}

/**
 * Choose a stop place before a crossing (rule in the module comment).
 * @param route the whole prepared route (for the grade of a place)
 * @param result the run in which the crossing happens
 * @param crossing trace index of the crossing
 * @param window earliest distance allowed, m (after the lead-in start or the previous stop), the crest, m, and
 *   optionally a latest distance, m (to move a stop earlier when its arrival is too close to the line)
 * @param targetC stop target per position, °C
 * @param waypoints placed waypoints
 * @param settings settings
 * @returns the place, or null when no place a rig can stand on before the crossing would cool anything
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
  const fromM = window.fromM;
  const useful = (k: number) =>
    result.positions.some((_, j) => (t.rotorC[j]![k] as number) > (targetC[j] as number) + USEFUL_EXCESS_K);
  const usefulAt = (m: number) => useful(nearestIndex(t.distanceM, m));
  let flat: { atM: number; grade: number } | null = null;
  for (let k = crossing - 1; k >= 0 && flat === null; k--) {
    const d = t.distanceM[k] as number;
    if (d > toM) continue;
    if (d < fromM) break;
    if (!useful(k)) continue;
    const grade = localGrade(route, d, settings.parkingStretchM / 2);
    if (Math.abs(grade) <= settings.maxStopGrade) flat = { atM: d, grade };
  }
  const named = namedBetween(waypoints, fromM, toM).filter((w) => usefulAt(w.distanceM as number));
  const lastNamed = named.at(-1) ?? null;
  if (flat === null) return lastNamed === null ? null : waypointSpot(lastNamed);
  if (lastNamed !== null && (lastNamed.distanceM as number) > flat.atM) return waypointSpot(lastNamed);
  const snapped = nearestWaypoint(named, flat.atM, settings.waypointSnapM);
  if (snapped !== null) return waypointSpot(snapped);
  if (Math.abs(flat.atM - window.crestM) <= CREST_M) return { atM: flat.atM, place: { kind: "crest" } };
  return { atM: flat.atM, place: { kind: "flat", grade: flat.grade } };
}

/**
 * Mean grade over ±halfWidthM around a distance (rise over run, negative downhill).
 * @param route prepared route
 * @param atM distance, m
 * @param halfWidthM half the stretch, m (default 50: a 100 m stretch)
 * @returns grade (dimensionless)
 * @example localGrade(route, 35_000) // −0.02
 */
export function localGrade(route: PreparedRoute, atM: number, halfWidthM = 50): number {
  const d = route.profile.distanceM;
  const e = route.profile.elevationM;
  const a = nearestIndex(d, atM - halfWidthM);
  const b = nearestIndex(d, atM + halfWidthM);
  const run = (d[b] as number) - (d[a] as number);
  return run > 0 ? ((e[b] as number) - (e[a] as number)) / run : 0;
}

/** @private A waypoint as a stop place. */
function waypointSpot(w: PlacedWaypoint): StopSpot {
  return { atM: w.distanceM as number, place: { kind: "waypoint", name: w.name as string } };
}

/** @private Named, placed waypoints within [fromM, toM], in route order. */
function namedBetween(waypoints: readonly PlacedWaypoint[], fromM: number, toM: number): PlacedWaypoint[] {
  return waypoints
    .filter((w) => w.name !== null && w.name.trim() !== "" && w.distanceM !== null && w.distanceM >= fromM && w.distanceM <= toM)
    .sort((a, b) => (a.distanceM as number) - (b.distanceM as number));
}

/** @private Nearest of some waypoints to a distance, within `snapM`. */
function nearestWaypoint(waypoints: readonly PlacedWaypoint[], atM: number, snapM: number): PlacedWaypoint | null {
  let best: PlacedWaypoint | null = null;
  for (const w of waypoints) {
    if (Math.abs((w.distanceM as number) - atM) > snapM) continue;
    if (best === null || Math.abs((w.distanceM as number) - atM) < Math.abs((best.distanceM as number) - atM)) best = w;
  }
  return best;
}

/** The sample nearest a distance (lib/thermal), re-exported for the advice modules that place stops. */
export { nearestIndex };
