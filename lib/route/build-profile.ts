import type { CleanTrack } from "./clean-track";
import { computeGrade } from "./compute-grade";
import { type CurveRadiusOptions, computeCurveRadius } from "./curve-radius";
import { resampleTrack } from "./resample-track";
import { type SmoothElevationOptions, smoothElevation } from "./smooth-elevation";
import type { RouteProfile } from "./types";

/** Options of {@link buildRouteProfile}. */
export interface BuildProfileOptions extends SmoothElevationOptions, CurveRadiusOptions {
  /** Resampling step, m, 5…50. Default 10. */
  stepM?: number;
}

/**
 * Builds the {@link RouteProfile} that lib/thermal consumes: resample at a fixed step
 * ({@link resampleTrack}), smooth the elevation ({@link smoothElevation}), then grade per step
 * ({@link computeGrade}) and curve radius per sample ({@link computeCurveRadius}).
 *
 * @param track from {@link cleanTrack}
 * @param options step (m), smoothing windows (m) and curve-fit base (m)
 * @returns the profile, all columns of equal length, SI units
 * @example
 * const profile = buildRouteProfile(clean.track, { stepM: 10 });
 */
export function buildRouteProfile(track: CleanTrack, options: BuildProfileOptions = {}): RouteProfile {
  const r = resampleTrack(track, options.stepM ?? 10);
  const elevationM = smoothElevation(r.distanceM, r.elevationM, r.gapAfter, options);
  return {
    stepM: r.stepM,
    distanceM: r.distanceM,
    lat: r.lat,
    lon: r.lon,
    elevationM,
    grade: computeGrade(r.distanceM, elevationM, r.gapAfter),
    curveRadiusM: computeCurveRadius(r.lat, r.lon, r.distanceM, r.gapAfter, options),
    gapAfter: r.gapAfter,
  };
}
