/**
 * Settings of the advice engine. Defaults are our own choices [E], stated so that a reader can follow every
 * rule; SI units.
 */

/** Settings of the advice engine. */
export interface AdviceSettings {
  /**
   * Descents at least this steep over their steepest 1 km (dimensionless, positive) are where 4x4 drivers
   * reach for low range before accepting the caution band in high range; on gentler descents low range is
   * the last resort (common practice, no published source).
   */
  lowRangeFromGrade: number;
  /**
   * Longest total stop time added to a plan that already keeps every brake below the fade-likely line, only to
   * bring them below the caution line, s: a short breather is worth it, half an hour before a short descent is
   * not (a plan may leave the brakes in the caution band; common practice, no published source).
   */
  cautionStopMaxS: number;
  /**
   * Band spread per descent index (dimensionless): the band's upper edge above the peak, over the peak's rise
   * above ambient, k = (high − peak)/(peak − ambient). Set when a first pass's band reached the fade line with
   * the advice applied: the second pass then takes a plan as below a line only when its estimated upper edge,
   * peak + k·(peak − ambient), is (band.ts). Empty: none.
   */
  bandSpreads: Readonly<Record<number, number>>;
  /** Distance before the crest from which a descent is re-run (the slowing for the crest happens here), m. */
  leadInM: number;
  /** Model step of the searches, m: the route is coarsened to about this step (docs/model.md §7: 5, 20 and 100 m steps agree within 0.5 K). */
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
  /**
   * Shortest and longest cool-down stop we suggest, s (whole minutes). 10–20 minutes is the usual stop; half an
   * hour is as long as a convoy will stand (common practice, no published source).
   */
  minStopS: number;
  maxStopS: number;
  /** Most cool-down stops on one descent: a driver makes one, two at most (common practice, no published source). */
  maxStops: number;
  /**
   * Steepest grade a rig may be parked on for a cool-down stop (either way, rise over run): a stop is made at
   * the crest, a lookout, a rest area or a flat pull-off, never on the downgrade (common practice, no published
   * source). Named waypoints are taken as such places whatever the road's grade beside them.
   */
  maxStopGrade: number;
  /** Length of road over which a stop place's grade is measured, centred on it: room to park a rig, m. */
  parkingStretchM: number;
  /** A stop is placed at least this far before the point where the line would be crossed, m. */
  stopBackoffM: number;
  /** The rig must arrive at a stop at least this far below the line (slowing heats the brakes), K. */
  stopArrivalMarginK: number;
  /** A named waypoint this close to the chosen place is used instead, m ("a few hundred metres"). */
  waypointSnapM: number;
  /** Least distance between two stops on one descent, m. */
  minStopSpacingM: number;
}

/** The defaults [E]. */
export const DEFAULT_ADVICE_SETTINGS: Readonly<AdviceSettings> = {
  lowRangeFromGrade: 0.12,
  cautionStopMaxS: 600,
  bandSpreads: {},
  leadInM: 500,
  searchStepM: 50,
  doubtK: 5,
  verifyAtRouteStep: true,
  speedStepMs: 5 / 3.6,
  walkingPaceMs: 10 / 3.6,
  stopMarginK: 50,
  minStopS: 300,
  maxStopS: 1800,
  maxStops: 2,
  maxStopGrade: 0.04,
  parkingStretchM: 100,
  stopBackoffM: 150,
  stopArrivalMarginK: 10,
  waypointSnapM: 400,
  minStopSpacingM: 500,
};
