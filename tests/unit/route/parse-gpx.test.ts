import { describe, expect, it } from "vitest";
import { type GpxDocument, listTracks, parseGpx, type RouteProblem } from "@/lib/route";
import { fixture, gpx11, trackOf } from "./gpx-fixtures";

function ok(text: string): GpxDocument {
  const r = parseGpx(text);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.gpx;
}

function problems(text: string, options?: Parameters<typeof parseGpx>[1]): RouteProblem[] {
  const r = parseGpx(text, options);
  if (r.ok) throw new Error("expected the parse to fail");
  return r.problems;
}

describe("parseGpx: GPX 1.1 file (tests/fixtures/gpx/kestrel-gap-1-1.gpx)", () => {
  const gpx = ok(fixture("kestrel-gap-1-1.gpx"));

  it("reads the version from the namespace and the document name from metadata", () => {
    expect(gpx.version).toBe("1.1");
    expect(gpx.name).toBe("Kestrel Gap & Arbel Spur");
    expect(gpx.description).toBe("Two invented descents for tests.");
  });

  it("keeps each track with its own segments (a gap between segments is not merged away)", () => {
    expect(gpx.tracks.map((t) => t.segments.map((s) => s.length))).toEqual([[121, 61], [21]]);
    expect(gpx.tracks[0]?.name).toBe("Kestrel Gap descent");
    expect(gpx.tracks[0]?.timesOrdered).toBe(true);
  });

  it("reads points as numbers with elevation and time, and waypoints with their names", () => {
    const p = gpx.tracks[0]?.segments[0]?.[0];
    expect(p).toEqual({ lat: -44.8, lon: 161.3, eleM: 1200.1, timeS: Date.UTC(2024, 4, 1, 6) / 1000, line: 23 });
    expect(gpx.waypoints).toHaveLength(1);
    expect(gpx.waypoints[0]?.name).toBe("Mount Arbel Lookout");
  });

  it("ignores extensions in other namespaces and GPX elements it does not model (link, sym, type)", () => {
    expect(JSON.stringify(gpx)).not.toMatch(/heart|javascript|Summit|road/);
  });
});

describe("parseGpx: GPX 1.0 file with a route (tests/fixtures/gpx/tarnwick-saddle-1-0.gpx)", () => {
  const gpx = ok(fixture("tarnwick-saddle-1-0.gpx"));

  it("accepts the GPX 1.0 namespace, with name directly under <gpx> as GPX 1.0's schema has it", () => {
    expect(gpx.version).toBe("1.0");
    expect(gpx.name).toBe("Tarnwick Saddle plan");
  });

  it("reads rte/rtept as a route, not as an empty file (docs/security.md C23)", () => {
    expect(gpx.tracks).toHaveLength(0);
    expect(gpx.routes).toHaveLength(1);
    expect(gpx.routes[0]?.id).toBe("route:0");
    expect(gpx.routes[0]?.segments[0]).toHaveLength(31);
  });

  it("keeps a waypoint without elevation as missing, not 0", () => {
    expect(gpx.waypoints.map((w) => w.eleM)).toEqual([900, null]);
  });
});

// Topografix GPX 1.1 schema, http://www.topografix.com/GPX/1/1/gpx.xsd: latitudeType is xsd:decimal with
// minInclusive −90.0 and maxInclusive 90.0; longitudeType is xsd:decimal with minInclusive −180.0 and
// maxExclusive 180.0; wptType requires the lat and lon attributes and has optional ele (xsd:decimal) and
// time (xsd:dateTime). xsd:decimal lexical space: W3C XML Schema Part 2, §3.2.3.1 (sign, digits, optional
// fraction; no exponent), with whiteSpace collapse.
describe("parseGpx: gpx.xsd value rules", () => {
  const at = "Track 1, segment 1, point 1 (line 2)";
  const one = (attrs: string, inner = "") => trackOf(`<trkpt ${attrs}>${inner}</trkpt>`);

  it("accepts the inclusive latitude bounds −90 and 90, and longitude −180", () => {
    const gpx = ok(trackOf('<trkpt lat="-90" lon="-180"/><trkpt lat="90.0" lon="179.9999999"/>'));
    expect(gpx.tracks[0]?.segments[0]?.map((p) => [p.lat, p.lon])).toEqual([
      [-90, -180],
      [90, 179.9999999],
    ]);
  });

  it("accepts lon = 180 by default (same meridian as −180) and refuses it when asked, as the xsd's maxExclusive does", () => {
    expect(ok(one('lat="0" lon="180"')).tracks[0]?.segments[0]?.[0]?.lon).toBe(180);
    expect(problems(one('lat="0" lon="180"'), { rejectLongitude180: true })[0]?.message).toBe(
      `${at}: longitude 180 is outside −180 to below 180 degrees.`,
    );
  });

  it("refuses values outside the ranges, naming the point and the value", () => {
    expect(problems(one('lat="91" lon="0"'))[0]?.message).toBe(`${at}: latitude 91 is outside −90 to 90 degrees.`);
    expect(problems(one('lat="-90.0001" lon="0"'))[0]?.code).toBe("latitude-out-of-range");
    expect(problems(one('lat="0" lon="-181"'))[0]?.message).toBe(`${at}: longitude -181 is outside −180 to 180 degrees.`);
    expect(problems(one('lat="0" lon="180.0001"'))[0]?.code).toBe("longitude-out-of-range");
  });

  it("requires both lat and lon", () => {
    expect(problems(one('lon="0"'))[0]?.message).toBe(`${at}: the latitude attribute is missing.`);
    expect(problems(one('lat="0"'))[0]?.message).toBe(`${at}: the longitude attribute is missing.`);
  });

  it("accepts the xsd:decimal forms: sign, leading or trailing point, surrounding white space", () => {
    const gpx = ok(one('lat="+.5" lon=" -12. "', "<ele>\n 0 \n</ele>"));
    expect(gpx.tracks[0]?.segments[0]?.[0]).toMatchObject({ lat: 0.5, lon: -12, eleM: 0 });
  });

  it("refuses what is not an xsd:decimal: exponents, hex, words, trailing junk, empty", () => {
    for (const bad of ["1e1", "0x10", "NaN", "Infinity", "12abc", "1 2", "", "--1", "."]) {
      expect(problems(one(`lat="${bad}" lon="0"`))[0]).toMatchObject({
        code: "invalid-number",
        message: `${at}: latitude ${JSON.stringify(bad)} ${bad === "" ? "is empty" : "is not a plain decimal number"}.`,
        where: { line: 2, kind: "track", index: 0, segment: 0, point: 0 },
      });
    }
  });

  it("only reads the GPX elements of the root's namespace", () => {
    const text = gpx11(
      '<x:trk xmlns:x="urn:other"><x:trkseg><x:trkpt lat="1" lon="1"/></x:trkseg></x:trk>' +
        '<trk><trkseg><trkpt lat="2" lon="2"><x:ele xmlns:x="urn:other">5</x:ele></trkpt></trkseg></trk>',
    );
    const gpx = ok(text);
    expect(gpx.tracks).toHaveLength(1);
    expect(gpx.tracks[0]?.segments[0]?.[0]).toMatchObject({ lat: 2, eleM: null });
  });

  it("ignores unprefixed-looking attributes in another namespace", () => {
    const gpx = ok(trackOf('<trkpt xmlns:o="urn:o" o:lat="5" lat="1" lon="1"/>'));
    expect(gpx.tracks[0]?.segments[0]?.[0]?.lat).toBe(1);
  });

  it("reports every bad point, each with its own position, and fails", () => {
    const list = problems(
      trackOf('<trkpt lat="1" lon="1"/><trkpt lat="x" lon="1"/></trkseg><trkseg><trkpt lat="1" lon="999"/>'),
    );
    expect(list.map((p) => [p.code, p.where?.segment, p.where?.point])).toEqual([
      ["invalid-number", 0, 1],
      ["longitude-out-of-range", 1, 0],
    ]);
  });

  it("names waypoints and route points by their own position in the file", () => {
    const list = problems(
      gpx11('<wpt lat="x" lon="1"/><wpt lat="1" lon="1"/><wpt lat="y" lon="1"/><rte><rtept lat="1" lon="1"/><rtept lat="1"/></rte>'),
    );
    expect(list.map((p) => p.message)).toEqual([
      'Waypoint 1 (line 2): latitude "x" is not a plain decimal number.',
      'Waypoint 3 (line 2): latitude "y" is not a plain decimal number.',
      "Route 1, point 2 (line 2): the longitude attribute is missing.",
    ]);
    expect(list[2]?.where).toEqual({ line: 2, kind: "route", index: 0, point: 1 });
  });

  it("lists at most 50 problems, then says how many more there are", () => {
    const list = problems(trackOf('<trkpt lat="x" lon="1"/>'.repeat(120)));
    expect(list).toHaveLength(51);
    expect(list[50]?.message).toBe("…and 70 more problems not listed. Fix the ones above and try again.");
  });
});

describe("parseGpx: elevation", () => {
  const at = "Track 1, segment 1, point 1 (line 2)";
  it("keeps 0 m as a real value and a missing <ele> as null", () => {
    const gpx = ok(trackOf('<trkpt lat="1" lon="1"><ele>0</ele></trkpt><trkpt lat="1" lon="2"/>'));
    expect(gpx.tracks[0]?.segments[0]?.map((p) => p.eleM)).toEqual([0, null]);
  });

  it("refuses values outside −500…9000 m and non-numbers", () => {
    expect(problems(trackOf('<trkpt lat="1" lon="1"><ele>-99999</ele></trkpt>'))[0]?.message).toBe(
      `${at}: elevation -99999 m is outside the believable range -500 to 9000 m.`,
    );
    expect(problems(trackOf('<trkpt lat="1" lon="1"><ele>1e400</ele></trkpt>'))[0]?.message).toBe(
      `${at}: elevation "1e400" is not a plain decimal number.`,
    );
    expect(problems(trackOf('<trkpt lat="1" lon="1"><ele></ele></trkpt>'))[0]?.message).toBe(
      `${at}: elevation "" is empty.`,
    );
    expect(ok(trackOf('<trkpt lat="1" lon="1"><ele>9000</ele></trkpt>')).tracks[0]?.segments[0]?.[0]?.eleM).toBe(9000);
  });
});

describe("listTracks (choosing one of several tracks, docs/security.md C22)", () => {
  it("lists tracks then routes with points, segments and geodesic length without the gaps", () => {
    const gpx = ok(fixture("kestrel-gap-1-1.gpx"));
    const list = listTracks(gpx);
    expect(list.map((t) => [t.id, t.label, t.pointCount, t.segmentCount, t.elevationCoverage])).toEqual([
      ["track:0", "Kestrel Gap descent", 182, 2, 1],
      ["track:1", "<img src=x onerror=alert(1)> Arbel Spur", 21, 1, 1],
    ]);
    // Segment 1 runs 3 km east with a ±60 m sinuous bend, segment 2 a straight 1.5 km; the 2 km gap is left out.
    expect(list[0]?.lengthM).toBeGreaterThan(4500);
    expect(list[0]?.lengthM).toBeLessThan(4550);
  });

  it("labels unnamed tracks and routes by kind and position", () => {
    const gpx = ok(gpx11('<trk/><rte><rtept lat="1" lon="1"/></rte>'));
    expect(listTracks(gpx).map((t) => [t.label, t.pointCount, t.lengthM, t.elevationCoverage])).toEqual([
      ["Track 1", 0, 0, 0],
      ["Route 1", 1, 0, 0],
    ]);
  });
});
