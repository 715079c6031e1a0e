/**
 * Writes demo GPX 1.1 documents (Topografix GPX 1.1 schema, http://www.topografix.com/GPX/1/1/gpx.xsd):
 * `metadata`, then `wpt`, then one `trk` with its `trkseg`s, each element's children in schema order.
 */
import type { Fix } from "./gps-recorder";

/** Creator written into every demo file. */
export const GPX_CREATOR = "Fadeline demo generator";

/** A named point of interest (`wpt`). */
export interface DemoWaypoint {
  lon: number;
  lat: number;
  eleM: number;
  name: string;
  description: string;
  /** GPX `sym`, a free-text symbol name. */
  symbol: string;
  /** GPX `type`, free text (the place kind). */
  type: string;
}

/** What goes into one file. */
export interface GpxContent {
  name: string;
  description: string;
  /** Recording start, ms since 1970-01-01T00:00:00Z (fix times are seconds after it). */
  startMs: number;
  waypoints: readonly DemoWaypoint[];
  /** One track; each entry is a `trkseg`. */
  segments: readonly (readonly Fix[])[];
}

function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function isoTime(ms: number): string {
  return new Date(ms).toISOString().replace(".000Z", "Z");
}

/**
 * Serialises one demo file.
 * @returns GPX 1.1 text (UTF-8, LF line ends), positions to 7 decimals (about 1 cm), elevations to 0.1 m
 */
export function formatGpx(c: GpxContent): string {
  const out: string[] = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    "<!-- Invented route on an invented island (Tallow Island); synthetic data made by Fadeline's demo generator. No real road or place. -->",
    `<gpx xmlns="http://www.topografix.com/GPX/1/1" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://www.topografix.com/GPX/1/1 http://www.topografix.com/GPX/1/1/gpx.xsd" version="1.1" creator="${GPX_CREATOR}">`,
    "  <metadata>",
    `    <name>${escapeXml(c.name)}</name>`,
    `    <desc>${escapeXml(c.description)}</desc>`,
    `    <time>${isoTime(c.startMs)}</time>`,
    "  </metadata>",
  ];
  for (const w of c.waypoints) {
    out.push(
      `  <wpt lat="${w.lat.toFixed(7)}" lon="${w.lon.toFixed(7)}">`,
      `    <ele>${w.eleM.toFixed(1)}</ele>`,
      `    <name>${escapeXml(w.name)}</name>`,
      `    <desc>${escapeXml(w.description)}</desc>`,
      `    <sym>${escapeXml(w.symbol)}</sym>`,
      `    <type>${escapeXml(w.type)}</type>`,
      "  </wpt>",
    );
  }
  out.push("  <trk>", `    <name>${escapeXml(c.name)}</name>`, `    <desc>${escapeXml(c.description)}</desc>`, "    <type>road</type>");
  for (const seg of c.segments) {
    out.push("    <trkseg>");
    for (const f of seg) {
      out.push(
        `      <trkpt lat="${f.lat.toFixed(7)}" lon="${f.lon.toFixed(7)}"><ele>${f.eleM.toFixed(1)}</ele><time>${isoTime(c.startMs + f.t * 1000)}</time></trkpt>`,
      );
    }
    out.push("    </trkseg>");
  }
  out.push("  </trk>", "</gpx>", "");
  return out.join("\n");
}
