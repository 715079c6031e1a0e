/**
 * Turns spherical (d3 / world-atlas) geometry into geometry a planar tiler draws correctly.
 *
 * world-atlas is "stitched" for spherical rendering: a ring that crosses the antimeridian simply steps from
 * longitude +179.9 to −179.9, and Antarctica is one ring around the south pole with no edge along ±180 or −90.
 * A planar tiler reads each such step as an edge spanning the whole world. In Natural Earth 10m land this
 * happens 11 times (Antarctica, Chukotka, Wrangel Island, three Fiji islands), and the resulting world-wide
 * edges at about 65°N and 69°N flip land and water in a band between them: land-coloured streaks over the
 * sea and a missing strip of Arctic land. The functions here remove every such step.
 *
 * Longitudes are unwrapped (a step of more than 180° becomes a step of less than 180° by adding ±360°), so a
 * crossing ring leaves [−180, 180] by a few degrees; geojson-vt's `wrap` then cuts it and copies the overhang
 * to the other side. A ring whose unwrapped end lies 360° from its start circles a pole; it is closed along
 * the pole (latitude ±90, which web mercator clamps to its top or bottom edge).
 */

/** A position as [longitude, latitude] in degrees. */
export type Position = [number, number];
/** A closed ring of positions (first equals last). */
export type Ring = Position[];

/**
 * Unwraps the longitudes of a path so that no step between neighbours exceeds 180°.
 * @param path positions in degrees; not modified
 * @returns a new path whose longitudes may leave [−180, 180]
 */
export function unwrapPath(path: readonly Position[]): Position[] {
  const out: Position[] = [];
  let shift = 0;
  let previous: number | undefined;
  for (const [lon, lat] of path) {
    if (previous !== undefined) {
      const step = lon + shift - previous;
      if (step > 180) shift -= 360;
      else if (step < -180) shift += 360;
    }
    const x = lon + shift;
    out.push([x, lat]);
    previous = x;
  }
  return out;
}

/**
 * Unwraps one polygon ring and closes it along the pole when it circles one.
 * @param ring closed ring in degrees
 * @returns a closed ring whose longitudes may leave [−180, 180]
 */
export function planarRing(ring: readonly Position[]): Ring {
  const out = unwrapPath(ring);
  const first = out[0];
  const last = out[out.length - 1];
  if (!first || !last) return out;
  const lap = Math.round((last[0] - first[0]) / 360);
  if (lap === 0) return out;
  // The ring circles a pole: run along the meridian of its end to the pole, back along the pole to the
  // meridian of its start, and up again. The side of the pole is the side the ring lies on.
  const meanLat = out.reduce((sum, p) => sum + p[1], 0) / out.length;
  const pole = meanLat < 0 ? -90 : 90;
  // After unwrapping, the closing position sits a whole lap (360°) away from the first one.
  out.push([last[0], pole], [first[0], pole], [first[0], first[1]]);
  return out;
}

function span(path: readonly Position[]): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const [x] of path) {
    min = Math.min(min, x);
    max = Math.max(max, x);
  }
  return { min, max };
}

function shiftPath(path: Position[], degrees: number): Position[] {
  return degrees === 0 ? path : path.map(([x, y]) => [x + degrees, y] as Position);
}

/** Shifts a path by whole turns so that the middle of its longitude span lies in [−180, 180). */
function centre(path: Position[]): Position[] {
  const { min, max } = span(path);
  return shiftPath(path, -360 * Math.floor(((min + max) / 2 + 180) / 360));
}

/**
 * Makes one polygon planar: every ring unwrapped, the exterior shifted by whole turns into [−180, 180) (by
 * the middle of its span), and every hole shifted by whole turns to lie closest to the exterior. Without the
 * last step a hole can end up a full turn away from its exterior: the Afro-Eurasian ring starts on the
 * Chukotka side of ±180 and unwraps to [−378°, −180°], while its Caspian hole stays near +50°.
 * @param rings exterior ring first, then holes, in degrees
 */
export function planarPolygon(rings: readonly (readonly Position[])[]): Ring[] {
  const [outerRing, ...holeRings] = rings;
  if (!outerRing) return [];
  const outer = centre(planarRing(outerRing));
  const { min, max } = span(outer);
  const mid = (min + max) / 2;
  const holes = holeRings.map((hole) => {
    const ring = unwrapPath(hole);
    const h = span(ring);
    return shiftPath(ring, 360 * Math.round((mid - (h.min + h.max) / 2) / 360));
  });
  return [outer, ...holes];
}

/**
 * Converts a spherical Polygon or MultiPolygon into planar polygons that a tiler can cut correctly.
 * @param geometry GeoJSON geometry in degrees (other types yield no polygons)
 * @returns polygon coordinate arrays, exterior ring first
 */
export function planarPolygons(geometry: GeoJSON.Geometry | null): Ring[][] {
  if (!geometry) return [];
  const polygons =
    geometry.type === "Polygon" ? [geometry.coordinates] : geometry.type === "MultiPolygon" ? geometry.coordinates : [];
  return polygons.map((rings) => planarPolygon(rings as Position[][]));
}

/**
 * Converts spherical LineString / MultiLineString geometry into unwrapped planar lines.
 * @param geometry GeoJSON geometry in degrees (other types yield no lines)
 * @returns lines whose longitudes may leave [−180, 180] by less than half a turn
 */
export function planarLines(geometry: GeoJSON.Geometry | null): Position[][] {
  if (!geometry) return [];
  const lines =
    geometry.type === "LineString"
      ? [geometry.coordinates]
      : geometry.type === "MultiLineString"
        ? geometry.coordinates
        : [];
  return lines.map((line) => centre(unwrapPath(line as Position[])));
}

/**
 * Counts the steps of more than 180° in longitude between neighbouring positions (0 for planar-safe data).
 * An edge along a pole (both ends at latitude ±90) is planar by construction and not counted.
 * @param paths rings or lines in degrees
 */
export function countAntimeridianSteps(paths: readonly (readonly Position[])[]): number {
  let steps = 0;
  for (const path of paths) {
    for (let i = 1; i < path.length; i++) {
      const a = path[i - 1];
      const b = path[i];
      const alongPole = a && b && Math.abs(a[1]) === 90 && a[1] === b[1];
      if (a && b && !alongPole && Math.abs(b[0] - a[0]) > 180) steps++;
    }
  }
  return steps;
}
