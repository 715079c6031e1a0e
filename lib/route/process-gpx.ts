import { type BuildProfileOptions, buildRouteProfile } from "./build-profile";
import { type CleanTrackOptions, cleanTrack } from "./clean-track";
import { type Descent, type FindDescentsOptions, findDescents } from "./find-descents";
import type { GpxDocument } from "./gpx-types";
import { listTracks, type TrackSummary } from "./list-tracks";
import { type ParseGpxOptions, parseGpx } from "./parse-gpx";
import type { RouteProblem } from "./problems";
import { computeRouteStats, type RouteStats, type RouteStatsOptions } from "./route-stats";
import { selectTrack } from "./select-track";
import type { RouteProfile } from "./types";

/** Options of {@link processGpx}, one group per stage. */
export interface ProcessGpxOptions {
  parse?: ParseGpxOptions;
  /** Which track or route to model ("track:0", "route:1", … from `tracks`); default: see {@link selectTrack}. */
  trackId?: string;
  clean?: CleanTrackOptions;
  profile?: BuildProfileOptions;
  descents?: FindDescentsOptions;
  stats?: RouteStatsOptions;
}

/** A modelled route. */
export interface ProcessedRoute {
  gpx: GpxDocument;
  /** Every track and route of the file, to let the user choose another. */
  tracks: TrackSummary[];
  /** Id of the track or route that was modelled. */
  trackId: string;
  profile: RouteProfile;
  descents: Descent[];
  stats: RouteStats;
  /** Warnings of every stage. */
  warnings: RouteProblem[];
}

/** Result of {@link processGpx}. `tracks` is present on failure once the file itself was readable. */
export type ProcessGpxResult =
  | ({ ok: true } & ProcessedRoute)
  | { ok: false; problems: RouteProblem[]; tracks?: TrackSummary[] };

/**
 * The whole pipeline from GPX text to a modelled route: {@link parseGpx} → {@link selectTrack} →
 * {@link cleanTrack} → {@link buildRouteProfile} (resample, smooth, grade, curve radius) →
 * {@link findDescents} and {@link computeRouteStats}. Every stage's problems are reported, never thrown.
 *
 * @param text the GPX file's text
 * @param options per-stage options (units as in each stage: m, dimensionless grades)
 * @returns the route, or the problems that stopped it
 * @example
 * const r = processGpx(text, { trackId: "track:1", profile: { stepM: 10 } });
 * if (r.ok) console.log(r.stats.totalDescentM, r.descents.length);
 */
export function processGpx(text: string, options: ProcessGpxOptions = {}): ProcessGpxResult {
  const parsed = parseGpx(text, options.parse);
  if (!parsed.ok) return { ok: false, problems: parsed.problems };
  const { gpx } = parsed;
  const tracks = listTracks(gpx);
  const chosen = selectTrack(gpx, options.trackId);
  if (!chosen.ok) return { ok: false, problems: [...parsed.warnings, chosen.problem], tracks };
  const clean = cleanTrack(chosen.track, options.clean);
  if (!clean.ok) return { ok: false, problems: [...parsed.warnings, ...clean.problems], tracks };
  const profile = buildRouteProfile(clean.track, options.profile);
  return {
    ok: true,
    gpx,
    tracks,
    trackId: chosen.track.id,
    profile,
    descents: findDescents(profile, options.descents),
    stats: computeRouteStats(profile, options.stats),
    warnings: [...parsed.warnings, ...clean.warnings],
  };
}
