/** Helpers to read the GPX fixtures the way an upload arrives: bytes decoded as UTF-8 (or by BOM). */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";

const DIR = fileURLToPath(new URL("../../fixtures/gpx/", import.meta.url));

/** Reads `tests/fixtures/gpx/<name>` as text; UTF-16 with a byte-order mark is decoded by its BOM. */
export function fixture(name: string): string {
  const bytes = readFileSync(DIR + name);
  const utf16le = bytes[0] === 0xff && bytes[1] === 0xfe;
  return new TextDecoder(utf16le ? "utf-16le" : "utf-8").decode(bytes);
}

/** A GPX 1.1 document around `body`. */
export function gpx11(body: string): string {
  return `<?xml version="1.0" encoding="UTF-8"?>\n<gpx xmlns="http://www.topografix.com/GPX/1/1" version="1.1" creator="t">${body}</gpx>`;
}

/** One track with one segment of the given `<trkpt>` markup. */
export function trackOf(points: string): string {
  return gpx11(`<trk><trkseg>${points}</trkseg></trk>`);
}
