/**
 * Colouring the route by brake temperature: each stretch of the map and the profile takes the colour of the
 * worst step class a rig's heat trace reaches on it. The four class colours are the design tokens of
 * app/globals.css (--color-heat-*), used for nothing else, so a colour always means the same class.
 */

import type { LegendEntry, RouteColouring } from "@/components/route-map/grade-colours";
import type { StepClass } from "@/lib/thermal";
import { formatTemperature, type UnitSystem } from "@/lib/units";

/** Class colours (the --color-heat-* tokens). */
export const HEAT_COLOURS: Readonly<Record<StepClass, string>> = {
  cool: "#3b7ea1",
  warm: "#d99a1e",
  hot: "#d4561c",
  "boil-risk": "#8e2a7a",
  runaway: "#1c1c1c",
};

/** Our words for the classes. */
export const CLASS_LABELS: Readonly<Record<StepClass, string>> = {
  cool: "Cool",
  warm: "Warm (caution)",
  hot: "Hot (fade likely)",
  "boil-risk": "Boil risk (brake fluid)",
  runaway: "Runaway (brakes may fail)",
};

const ORDER: readonly StepClass[] = ["cool", "warm", "hot", "boil-risk", "runaway"];

/** A heat trace reduced to what colouring needs: distances (ascending) and the worst class at each. */
export interface ClassTrace {
  distanceM: ArrayLike<number>;
  worstClass: ArrayLike<StepClass | number>;
}

/** Brake thresholds of one position, for the legend. */
export interface PositionThresholds {
  label: string;
  warmC: number;
  hotC: number;
}

function classIndex(c: StepClass | number): number {
  return typeof c === "number" ? c : ORDER.indexOf(c);
}

/** First sample at or after `m` (binary search). */
export function lowerBound(d: ArrayLike<number>, m: number): number {
  let lo = 0;
  let hi = d.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((d[mid] as number) < m) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * The worst class a trace reaches on [fromM, toM] (the sample at or after toM included, so a short stretch
 * between two samples still gets the class of the step that covers it).
 * @param trace distances and classes
 * @param fromM start of the stretch, m
 * @param toM end of the stretch, m
 * @returns the worst class
 * @example worstClassOn(trace, 1200, 1300) // "warm"
 */
export function worstClassOn(trace: ClassTrace, fromM: number, toM: number): StepClass {
  const n = trace.distanceM.length;
  if (n === 0) return "cool";
  let i = Math.min(lowerBound(trace.distanceM, fromM), n - 1);
  let worst = 0;
  for (; i < n; i++) {
    worst = Math.max(worst, classIndex(trace.worstClass[i] as StepClass | number));
    if ((trace.distanceM[i] as number) >= toM) break;
  }
  return ORDER[worst] ?? "cool";
}

/** Legend rows: each class with the temperatures it starts at, per brake position, in the user's units. */
export function heatLegend(positions: readonly PositionThresholds[], system: UnitSystem): LegendEntry[] {
  const at = (pick: (p: PositionThresholds) => number) => {
    const groups = new Map<number, string[]>();
    for (const p of positions) groups.set(pick(p), [...(groups.get(pick(p)) ?? []), p.label]);
    return [...groups.entries()].map(([c, labels]) => `${formatTemperature(c, system)} ${positions.length > 1 ? `(${labels.join(", ")})` : ""}`.trim()).join("; ");
  };
  return [
    { id: "cool", colour: HEAT_COLOURS.cool, label: `${CLASS_LABELS.cool}: below ${at((p) => p.warmC)}` },
    { id: "warm", colour: HEAT_COLOURS.warm, label: `${CLASS_LABELS.warm}: from ${at((p) => p.warmC)}` },
    { id: "hot", colour: HEAT_COLOURS.hot, label: `${CLASS_LABELS.hot}: from ${at((p) => p.hotC)}` },
    { id: "boil-risk", colour: HEAT_COLOURS["boil-risk"], label: `${CLASS_LABELS["boil-risk"]}: fluid near its estimated boiling point` },
    { id: "runaway", colour: HEAT_COLOURS.runaway, label: `${CLASS_LABELS.runaway}: beyond Fadeline's range, or the brakes cannot hold the speed` },
  ];
}

/**
 * A {@link RouteColouring} by brake temperature class for the map and the profile.
 * @param id unique per trace (the views cache colours by colouring)
 * @param trace the heat trace's distances and classes
 * @param positions thresholds for the legend
 * @param system the legend's units
 */
export function heatColouring(id: string, trace: ClassTrace, positions: readonly PositionThresholds[], system: UnitSystem): RouteColouring {
  return {
    id: `heat-${id}`,
    title: "Brake temperature",
    colourOf: (stretch) => HEAT_COLOURS[worstClassOn(trace, stretch.fromM, stretch.toM)],
    legend: heatLegend(positions, system),
  };
}
