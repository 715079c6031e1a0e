/**
 * lib/stopping: stopping distance with hot brakes versus cold (checked in docs/validation.md §5). Pure and isomorphic, SI inside
 * (m, s, kg, m/s; temperatures in °C). Every figure is an ESTIMATE: the fade curve is our own, and the pedal-
 * limited model is calibrated on check values from practice (common practice, no published source).
 */

export * from "./fade-curve";
export * from "./calibration";
export * from "./stopping-distance";
export * from "./hot-cold";
