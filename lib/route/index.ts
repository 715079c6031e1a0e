/**
 * lib/route: GPX text → a route profile with its descents and stats. Pure and isomorphic (no I/O, no DOM,
 * no Node-only API); SI units throughout (m, s, degrees for positions, dimensionless grades).
 */
export type { BuildProfileOptions } from "./build-profile";
export { buildRouteProfile } from "./build-profile";
export type { CleanSegment, CleanTrack, CleanTrackOptions, CleanTrackResult } from "./clean-track";
export { cleanTrack } from "./clean-track";
export { climbTotals } from "./climb-totals";
export { computeGrade } from "./compute-grade";
export type { CurveRadiusOptions } from "./curve-radius";
export { computeCurveRadius } from "./curve-radius";
export { ELEVATION_ADVICE } from "./elevation-problems";
export type { Descent, FindDescentsOptions } from "./find-descents";
export { findDescents } from "./find-descents";
export { geodesicDistance } from "./geodesic-distance";
export type { GpxLimits } from "./gpx-limits";
export { DEFAULT_GPX_LIMITS } from "./gpx-limits";
export type { GpxDocument, GpxPoint, GpxTrack, GpxWaypoint } from "./gpx-types";
export { GPX_1_0_NS, GPX_1_1_NS } from "./gpx-types";
export type { TrackSummary } from "./list-tracks";
export { listTracks } from "./list-tracks";
export type { ParseGpxOptions, ParseGpxResult } from "./parse-gpx";
export { parseGpx } from "./parse-gpx";
export type { ProblemLocation, RouteProblem, RouteProblemCode } from "./problems";
export type { ProcessedRoute, ProcessGpxOptions, ProcessGpxResult } from "./process-gpx";
export { processGpx } from "./process-gpx";
export type { ResampledTrack } from "./resample-track";
export { MAX_STEP_M, MIN_STEP_M, resampleTrack } from "./resample-track";
export type { RouteStats, RouteStatsOptions } from "./route-stats";
export { computeRouteStats } from "./route-stats";
export type { SelectTrackResult } from "./select-track";
export { selectTrack } from "./select-track";
export type { SmoothElevationOptions } from "./smooth-elevation";
export { smoothElevation } from "./smooth-elevation";
export type { RouteView, RouteViewOptions } from "./route-view";
export { buildRouteView } from "./route-view";
export type { PlacedWaypoint } from "./place-waypoints";
export { placeWaypoints } from "./place-waypoints";
export type { RouteProfile } from "./types";
export type { Ellipsoid } from "./wgs84";
export { WGS84 } from "./wgs84";
