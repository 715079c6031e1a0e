/**
 * Reads a route profile packed as the server stores it (six little-endian Float64 columns: distance, latitude,
 * longitude, elevation, grade, curve radius; then one byte per sample for the gap flags). Isomorphic: the
 * browser uses it for what-if runs; Infinity (a straight's curve radius) survives the packing.
 */
import type { RouteProfile } from "./types";

/**
 * @param bytes the packed profile
 * @param sampleCount number of samples
 * @param stepM the profile's nominal step, m
 * @returns the profile
 * @throws {RangeError} "packed profile has the wrong size"
 * @example profileFromBytes(new Uint8Array(await response.arrayBuffer()), 7300, 10)
 */
export function profileFromBytes(bytes: Uint8Array, sampleCount: number, stepM: number): RouteProfile {
  const n = sampleCount;
  if (bytes.byteLength !== n * 49) throw new RangeError("packed profile has the wrong size");
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const column = (c: number) => {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = view.getFloat64((c * n + i) * 8, true);
    return out;
  };
  return {
    stepM,
    distanceM: column(0),
    lat: column(1),
    lon: column(2),
    elevationM: column(3),
    grade: column(4),
    curveRadiusM: column(5),
    gapAfter: bytes.slice(n * 48, n * 49),
  };
}
