/**
 * How a route is coloured, shared by the map and the elevation profile. Pure data and functions (no React,
 * no MapLibre), so both views and the tests agree on every colour.
 *
 * The grade palette is our own: descents run from a pale lilac to a deep indigo (the steeper, the darker),
 * level road is a neutral stone, climbs are slate greys. None of it touches the heat-class colours in
 * app/globals.css (cool blue, amber, orange, plum), which are kept for brake temperature: a later issue plugs
 * a temperature colouring into the same {@link RouteColouring} slot.
 */

/** A stretch of the route to colour: from one map vertex (or profile sample) to the next. */
export interface RouteStretch {
  /** Distance along the route where the stretch starts and ends, m. */
  fromM: number;
  toM: number;
  /** Mean grade over the stretch (rise over run, dimensionless, negative downhill). */
  grade: number;
}

/** One row of a colour legend. */
export interface LegendEntry {
  /** Stable key (for React lists and tests). */
  id: string;
  /** CSS colour of the swatch. */
  colour: string;
  /** Plain-English label, e.g. "7–10 % down". */
  label: string;
}

/**
 * A "colour by" rule: the route map and the profile ask it for the colour of each stretch and show its
 * legend. Grade now; brake temperature class later, without touching either view.
 */
export interface RouteColouring {
  /** Stable id, e.g. "grade". */
  id: string;
  /** Legend heading, e.g. "Grade". */
  title: string;
  /** CSS hex colour of a stretch. Must be pure: the views cache its results. */
  colourOf: (stretch: RouteStretch) => string;
  /** Legend rows, in reading order. */
  legend: readonly LegendEntry[];
}

/** A grade class: every grade g with `below < g ≤ atMost` (dimensionless) gets `colour`. */
export interface GradeBand extends LegendEntry {
  /** Exclusive lower bound (−Infinity for the steepest descent band). */
  below: number;
  /** Inclusive upper bound (Infinity for the steepest climb band). */
  atMost: number;
}

/**
 * Grade classes from steepest descent to steepest climb. Thresholds are in whole percent that a driver reads
 * off a road sign; 7 % and 10 % are where a loaded rig's brakes start to need care and real technique.
 */
export const GRADE_BANDS: readonly GradeBand[] = [
  { id: "down-10", below: -Infinity, atMost: -0.1, colour: "#24125a", label: "10 % down or steeper" },
  { id: "down-7", below: -0.1, atMost: -0.07, colour: "#4a33a3", label: "7–10 % down" },
  { id: "down-4", below: -0.07, atMost: -0.04, colour: "#7a68cb", label: "4–7 % down" },
  { id: "down-2", below: -0.04, atMost: -0.02, colour: "#b0a6e3", label: "2–4 % down" },
  { id: "level", below: -0.02, atMost: 0.02, colour: "#d6cfbf", label: "Within 2 % of level" },
  { id: "up-2", below: 0.02, atMost: 0.06, colour: "#949ca2", label: "2–6 % up" },
  { id: "up-6", below: 0.06, atMost: Infinity, colour: "#4f5a61", label: "6 % up or steeper" },
];

const LEVEL_BAND = GRADE_BANDS[4]!;

/**
 * The grade class of a grade.
 * @param grade rise over run (dimensionless, −0.08 is 8 % down); a non-finite grade counts as level
 */
export function gradeBand(grade: number): GradeBand {
  if (!Number.isFinite(grade)) return LEVEL_BAND;
  return GRADE_BANDS.find((b) => grade > b.below && grade <= b.atMost) ?? LEVEL_BAND;
}

/**
 * Colour of a grade (CSS hex).
 * @param grade rise over run (dimensionless)
 */
export function gradeColour(grade: number): string {
  return gradeBand(grade).colour;
}

/** Colours the route by its grade: the default {@link RouteColouring}. */
export const gradeColouring: RouteColouring = {
  id: "grade",
  title: "Grade",
  colourOf: (stretch) => gradeColour(stretch.grade),
  legend: GRADE_BANDS.map(({ id, colour, label }) => ({ id, colour, label })),
};

/** Colours of the route's furniture, shared by the map, the profile and the legend. */
export const ROUTE_INK = {
  /** Dark casing under the coloured line, so light classes stay visible on pale land. */
  casing: "#16232a",
  /** Soft band under descent stretches, descent badges and the shaded descent areas on the profile (close to,
   * but on purpose not equal to, the steepest class, so pixel counts of the classes stay unambiguous). */
  descent: "#33206e",
  /** Start marker (the app's working pine). */
  start: "#1f5a4f",
  /** End marker. */
  end: "#16232a",
  /** Linked hover marker and cursor (ink with a white ring: neutral, so it never reads as a class). */
  hover: "#16232a",
} as const;
