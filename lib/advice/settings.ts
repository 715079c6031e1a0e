/**
 * Settings of the advice engine. Defaults are our own choices [E], stated so that a reader can follow every
 * rule; SI units.
 */

/** Settings of the advice engine. */
export interface AdviceSettings {
  /** Distance before the crest from which a descent is re-run (the slowing for the crest happens here), m. */
  leadInM: number;
  /** Model step of the searches, m: the route is coarsened to about this step (thermal-model.md §1.1: ≤ 50–100 m). */
  searchStepM: number;
  /** A search result this close to its line (K) is re-run at the route's own step before it is trusted. */
  doubtK: number;
  /** Re-run every chosen piece of advice at the route's own step (its reported result). */
  verifyAtRouteStep: boolean;
  /** Step of the speed search, m/s (5 km/h). */
  speedStepMs: number;
  /** Walking pace, the slowest speed we suggest, m/s (10 km/h). */
  walkingPaceMs: number;
  /** Target of a cool-down stop: this far below each brake's warm line, K. */
  stopMarginK: number;
  /** Shortest and longest cool-down stop we suggest, s. */
  minStopS: number;
  maxStopS: number;
  /** Most cool-down stops on one descent. */
  maxStops: number;
  /** A stop is placed at least this far before the point where the line would be crossed, m. */
  stopBackoffM: number;
  /** The rig must arrive at a stop at least this far below the line (slowing heats the brakes), K. */
  stopArrivalMarginK: number;
  /** Search a stop place at most this far before that point, m. */
  stopSearchM: number;
  /** Flatness slack: places within this grade of the flattest are as good, and the latest of them is chosen. */
  flatSlackGrade: number;
  /** A named waypoint this close to the chosen place is used instead, m ("a few hundred metres"). */
  waypointSnapM: number;
  /** Least distance between two stops on one descent, m. */
  minStopSpacingM: number;
}

/** The defaults [E]. */
export const DEFAULT_ADVICE_SETTINGS: Readonly<AdviceSettings> = {
  leadInM: 500,
  searchStepM: 50,
  doubtK: 5,
  verifyAtRouteStep: true,
  speedStepMs: 5 / 3.6,
  walkingPaceMs: 10 / 3.6,
  stopMarginK: 50,
  minStopS: 300,
  maxStopS: 3600,
  maxStops: 3,
  stopBackoffM: 150,
  stopArrivalMarginK: 10,
  stopSearchM: 3000,
  flatSlackGrade: 0.01,
  waypointSnapM: 400,
  minStopSpacingM: 500,
};
