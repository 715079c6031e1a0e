import type { GpxWaypoint } from "./gpx-types";
import type { RouteProfile } from "./types";

/** A GPX waypoint tied to the route: where along it the waypoint lies, when it lies near it. */
export interface PlacedWaypoint {
  name: string | null;
  lat: number;
  lon: number;
  /** Distance along the route of the nearest sample, m; null when farther than the limit from the route. */
  distanceM: number | null;
  /** Distance from the waypoint to that sample, m. */
  offsetM: number;
}

const R = 6_371_008.8; // IUGG mean Earth radius, m; the local equirectangular approximation is < 0.1 % off over 1 km

/**
 * Places each waypoint on the route at its nearest sample (local equirectangular distance), so that advice
 * can say "stop at the lookout at 7.8 km". Waypoints more than `maxOffsetM` away keep `distanceM: null`.
 *
 * @param profile the route, SI units
 * @param waypoints the file's waypoints
 * @param maxOffsetM furthest a waypoint may be from the route to be placed on it, m (default 300)
 * @returns one entry per waypoint, in file order
 * @example
 * placeWaypoints(profile, gpx.waypoints).filter((w) => w.distanceM !== null);
 */
export function placeWaypoints(profile: RouteProfile, waypoints: GpxWaypoint[], maxOffsetM = 300): PlacedWaypoint[] {
  return waypoints.map((w) => {
    const cosLat = Math.cos((w.lat * Math.PI) / 180);
    let best = Infinity;
    let at = -1;
    for (let i = 0; i < profile.lat.length; i++) {
      const dx = (((profile.lon[i]! - w.lon) * Math.PI) / 180) * cosLat;
      const dy = ((profile.lat[i]! - w.lat) * Math.PI) / 180;
      const d2 = dx * dx + dy * dy;
      if (d2 < best) {
        best = d2;
        at = i;
      }
    }
    const offsetM = Math.sqrt(best) * R;
    return { name: w.name, lat: w.lat, lon: w.lon, offsetM, distanceM: at >= 0 && offsetM <= maxOffsetM ? profile.distanceM[at]! : null };
  });
}
