import type { RouteProfile } from "@/lib/route";

const FLOAT_COLUMNS = ["distanceM", "lat", "lon", "elevationM", "grade", "curveRadiusM"] as const;

/**
 * Packs a profile's typed arrays into one buffer for the routes.profile column: six Float64 columns (little
 * endian, IEEE 754, so Infinity survives) then the gap flags as bytes. 30,000 samples take 1.5 MB.
 */
export function encodeProfile(profile: RouteProfile): Buffer {
  const n = profile.distanceM.length;
  const out = Buffer.alloc(n * 8 * FLOAT_COLUMNS.length + n);
  FLOAT_COLUMNS.forEach((column, c) => {
    const values = profile[column];
    for (let i = 0; i < n; i++) out.writeDoubleLE(values[i]!, (c * n + i) * 8);
  });
  out.set(profile.gapAfter, n * 8 * FLOAT_COLUMNS.length);
  return out;
}

/** Unpacks {@link encodeProfile}'s buffer; `sampleCount` and `stepM` come from their own columns. */
export function decodeProfile(buffer: Buffer, sampleCount: number, stepM: number): RouteProfile {
  const n = sampleCount;
  if (buffer.length !== n * 8 * FLOAT_COLUMNS.length + n) throw new RangeError("stored profile has the wrong size");
  const column = (c: number) => {
    const values = new Float64Array(n);
    for (let i = 0; i < n; i++) values[i] = buffer.readDoubleLE((c * n + i) * 8);
    return values;
  };
  return {
    stepM,
    distanceM: column(0),
    lat: column(1),
    lon: column(2),
    elevationM: column(3),
    grade: column(4),
    curveRadiusM: column(5),
    gapAfter: Uint8Array.from(buffer.subarray(n * 8 * FLOAT_COLUMNS.length)),
  };
}
