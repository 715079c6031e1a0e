import { geodesicDistance } from "./geodesic-distance";
import type { GpxPoint } from "./gpx-types";

/** A segment with consecutive duplicates merged, as plain columns. */
export interface DedupedSegment {
  lat: number[];
  lon: number[];
  /** Elevation, m, or `null` where the file has none. */
  ele: (number | null)[];
  /** Cumulative geodesic distance from the segment's first point, m. */
  dist: number[];
  /** Longest distance between two consecutive points, m, and the index of the later one. */
  longestLegM: number;
  longestLegAt: number;
  /** Points merged into their predecessor. */
  merged: number;
}

/**
 * Merges consecutive points that are closer than `toleranceM` (a device logging while stopped, or the
 * same coordinates written twice), so that no step has zero length and no slope divides by zero
 * (docs/security.md C21). A merged point keeps the first elevation found among its duplicates.
 *
 * @param points the segment's points in order
 * @param toleranceM points closer than this are duplicates, m
 * @returns the cleaned columns with cumulative distance
 */
export function dedupeSegment(points: readonly GpxPoint[], toleranceM: number): DedupedSegment {
  const out: DedupedSegment = { lat: [], lon: [], ele: [], dist: [], longestLegM: 0, longestLegAt: 0, merged: 0 };
  let total = 0;
  for (const p of points) {
    const last = out.lat.length - 1;
    if (last >= 0) {
      const d = geodesicDistance(out.lat[last] as number, out.lon[last] as number, p.lat, p.lon);
      if (d < toleranceM) {
        out.merged += 1;
        if (out.ele[last] === null) out.ele[last] = p.eleM;
        continue;
      }
      total += d;
      if (d > out.longestLegM) {
        out.longestLegM = d;
        out.longestLegAt = last + 1;
      }
    }
    out.lat.push(p.lat);
    out.lon.push(p.lon);
    out.ele.push(p.eleM);
    out.dist.push(total);
  }
  return out;
}
