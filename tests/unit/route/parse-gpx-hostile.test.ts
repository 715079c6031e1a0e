/**
 * Hostile and malformed inputs from docs/security.md §C (the cases a pure parser can
 * answer: C1, C3–C7, C10–C15, C18–C25). Each gives its own clear message; none gives a partial result.
 */
import { describe, expect, it } from "vitest";
import { parseGpx, type RouteProblem } from "@/lib/route";
import { fixture, gpx11, trackOf } from "./gpx-fixtures";

const DOCTYPE_TAIL =
  "the file contains a DOCTYPE declaration. GPX files never need one, and Fadeline refuses them because " +
  "they can carry entity tricks (external files, entity expansion). Export the file again from your planner or device.";

function only(text: string): RouteProblem {
  const r = parseGpx(text);
  if (r.ok) throw new Error("expected the parse to fail");
  expect(r.problems).toHaveLength(1);
  return r.problems[0] as RouteProblem;
}

function timed<T>(f: () => T): { value: T; ms: number } {
  const t0 = performance.now();
  const value = f();
  return { value, ms: performance.now() - t0 };
}

describe("C1, C3–C5: DOCTYPE and entities are refused before any entity is used", () => {
  it("C1 XXE with a file:// entity: refused, no file content anywhere", () => {
    const p = only(fixture("hostile/c01-xxe-file.gpx"));
    expect(p).toEqual({ code: "doctype", severity: "error", message: `Line 2: ${DOCTYPE_TAIL}`, where: { line: 2 } });
    expect(JSON.stringify(p)).not.toContain("root:");
  });

  it("C2-style XXE over http:// is refused the same way (nothing is ever fetched: the parser has no I/O)", () => {
    expect(only(fixture("hostile/c02-xxe-http.gpx")).code).toBe("doctype");
  });

  it("C3 billion laughs: refused at the end of the DOCTYPE, nothing expanded", () => {
    expect(only(fixture("hostile/c03-billion-laughs.gpx")).message).toBe(`Line 13: ${DOCTYPE_TAIL}`);
  });

  it("C4 quadratic blow-up (one 10 KB entity referenced 10,000 times, 50 KB+): refused in well under a second", () => {
    const text = `<!DOCTYPE gpx [<!ENTITY a "${"A".repeat(10_000)}">]>${gpx11(`<trk><name>${"&a;".repeat(10_000)}</name></trk>`)}`;
    const { value, ms } = timed(() => only(text));
    expect(value.message).toBe(`Line 1: ${DOCTYPE_TAIL}`);
    expect(ms).toBeLessThan(1000);
  });

  it("C5 any DOCTYPE, even an empty one, is refused", () => {
    expect(only(fixture("hostile/c05-doctype-plain.gpx")).message).toBe(`Line 2: ${DOCTYPE_TAIL}`);
  });

  it("an entity that was never declared is named, with where it is", () => {
    expect(only(gpx11("<trk><name>a &x; b</name></trk>"))).toEqual({
      code: "undefined-entity",
      severity: "error",
      message:
        'Line 2, column 86: the entity "&x;" is not defined. Fadeline accepts only the XML built-in entities ' +
        "(&amp; &lt; &gt; &quot; &apos;) and numeric character references.",
      where: { line: 2, column: 86 },
    });
  });

  it("a huge DOCTYPE is cut off at the prolog limit instead of being read to its end", () => {
    const text = `<!DOCTYPE gpx [${"<!-- x -->".repeat(20_000)}]>${gpx11("")}`;
    expect(only(text).message).toBe(
      "The file does not start its <gpx> element within the first 65,536 characters, so it is not a GPX file Fadeline can read.",
    );
  });
});

describe("C6, C7, C10: nesting, attribute and text-length caps", () => {
  for (const depth of [10_000, 100_000]) {
    it(`C6 ${depth.toLocaleString("en")} nested elements in <extensions>: refused in under a second`, () => {
      const text = gpx11(`<extensions>${"<x>".repeat(depth)}${"</x>".repeat(depth)}</extensions>`);
      const { value, ms } = timed(() => only(text));
      expect(value.code).toBe("too-deep");
      expect(value.message).toBe(
        "Line 2: elements are nested more than 64 levels deep. A GPX file needs fewer than ten; the file was refused.",
      );
      expect(ms).toBeLessThan(1000);
    });
  }

  it("C7 one element with 50,000 attributes: refused in under a second", () => {
    const attrs = Array.from({ length: 50_000 }, (_, i) => `a${i}="1"`).join(" ");
    const { value, ms } = timed(() => only(trackOf(`<trkpt lat="1" lon="1" ${attrs}/>`)));
    expect(value.message).toBe(
      "Line 2: an element has more than 50 attributes. A GPX element needs a handful; the file was refused.",
    );
    expect(ms).toBeLessThan(1000);
  });

  it("C10 a 20 MB <name>: refused with the length, no crash", () => {
    const p = only(gpx11(`<trk><name>${"N".repeat(20_000_000)}</name></trk>`));
    expect(p.message).toBe(
      "Line 2: a track name is 20,000,000 characters long; Fadeline accepts up to 200. Shorten it in your planner and export again.",
    );
  });

  it("a 2,001-character description is refused; 2,000 is fine", () => {
    expect(parseGpx(gpx11(`<trk><desc>${"d".repeat(2000)}</desc></trk>`)).ok).toBe(true);
    expect(only(gpx11(`<trk><desc>${"d".repeat(2001)}</desc></trk>`)).message).toBe(
      "Line 2: a track description is 2,001 characters long; Fadeline accepts up to 2,000. Shorten it in your planner and export again.",
    );
  });

  it("more than 200,000 points are refused with a clear limit", () => {
    const text = trackOf('<trkpt lat="1" lon="1"/>'.repeat(200_001));
    expect(only(text).message).toBe(
      "The file has more than 200,000 points (tracks, routes and waypoints together); Fadeline accepts at most 200,000. " +
        "Simplify the track in your planner or split it into several files.",
    );
  });
});

describe("C11: malformed XML is an error, never '0 tracks'", () => {
  const tail = "It may be damaged or cut short; export it again.";
  const cases: Array<[string, string]> = [
    [
      "c11-unclosed-trkpt.gpx",
      `The file is not well-formed XML (line 4, column 9: unexpected close tag; <trkpt> opened on line 3 was never closed). ${tail}`,
    ],
    [
      "c11-mismatched-tags.gpx",
      `The file is not well-formed XML (line 2, column 117: unexpected close tag; <name> opened on line 2 was never closed). ${tail}`,
    ],
    ["c11-two-roots.gpx", `The file is not well-formed XML (line 3, column 5: documents may contain only one root). ${tail}`],
    ["c11-truncated.gpx", `The file is not well-formed XML (line 2, column 138: unclosed tag: ele). ${tail}`],
    [
      "c11-stray-ampersand.gpx",
      'Line 3, column 18: a bare "&" is not allowed in XML (it must be written "&amp;"). The file is not well-formed XML; export it again.',
    ],
  ];
  for (const [file, message] of cases) {
    it(file, () => expect(only(fixture(`hostile/${file}`)).message).toBe(message));
  }
});

describe("C12, C13: not XML, or XML that is not GPX", () => {
  const binary =
    "it looks like a binary file, such as an image or an archive, or text in an encoding other than UTF-8. Upload the .gpx file itself.";
  it("an empty file", () => expect(only(fixture("hostile/c12-empty.gpx")).message).toBe("The file is empty."));
  it("white space only", () => expect(only(" \n\t ").code).toBe("file-empty"));
  it("plain text", () =>
    expect(only(fixture("hostile/c12-hello.gpx")).message).toBe(
      "The file is not well-formed XML (line 2, column 0: text data outside of root node). It may be damaged or cut short; export it again.",
    ));
  it("a PNG renamed .gpx", () =>
    expect(only(fixture("hostile/c12-png-renamed.gpx")).message).toBe(
      `The file is not GPX text (line 2, column 1: disallowed character): ${binary}`,
    ));
  it("UTF-16 without a byte-order mark, read as UTF-8", () =>
    expect(only(fixture("hostile/c12-utf16le-no-bom.gpx")).message).toBe(
      `The file is not GPX text (line 1, column 2: disallowed character): ${binary}`,
    ));
  it("UTF-16 with a byte-order mark, decoded by its BOM, is read normally", () => {
    const r = parseGpx(fixture("hostile/c12-utf16le-bom.gpx"));
    expect(r.ok && r.gpx.tracks[0]?.segments[0]?.length).toBe(2);
  });
  it("a leading U+FEFF in the text is ignored", () => expect(parseGpx(`\uFEFF${gpx11("")}`).ok).toBe(true));
  it("HTML", () =>
    expect(only(fixture("hostile/c13-html.gpx")).message).toBe(
      "The file is XML but not GPX: its root element is <html>, and a GPX file starts with <gpx>.",
    ));
  it("KML", () => expect(only(fixture("hostile/c13-kml.gpx")).code).toBe("not-gpx"));
  it("<gpx> in a wrong namespace", () =>
    expect(only(fixture("hostile/c13-wrong-namespace.gpx")).message).toBe(
      'The <gpx> element is in the namespace "http://example.com/not-gpx", which is neither GPX 1.0 ' +
        "(http://www.topografix.com/GPX/1/0) nor GPX 1.1 (http://www.topografix.com/GPX/1/1).",
    ));
  it("<gpx> with no namespace is read as GPX 1.1, with a warning", () => {
    const r = parseGpx(fixture("hostile/c13-no-namespace.gpx"));
    if (!r.ok) throw new Error("expected ok");
    expect(r.gpx.version).toBeNull();
    expect(r.gpx.tracks[0]?.segments[0]).toHaveLength(2);
    expect(r.warnings.map((w) => w.message)).toEqual([
      "The <gpx> element declares no namespace; it was read as GPX 1.1 (http://www.topografix.com/GPX/1/1).",
    ]);
  });
});

describe("C14, C15, C26: names are plain text, links are never read, nothing leaks into globals", () => {
  it("C14 escaped markup and CDATA come back as the literal characters, never as HTML serialisation", () => {
    const r = parseGpx(fixture("hostile/c14-markup-in-names.gpx"));
    if (!r.ok) throw new Error("expected ok");
    expect(r.gpx.waypoints[0]?.name).toBe("<img src=x onerror=alert(1)>");
    expect(r.gpx.tracks[0]?.name).toBe("<b onmouseover=alert(1)>x</b>");
    expect(r.gpx.tracks[0]?.description).toBe("Before  after"); // the <script> element is skipped
  });

  it("C15 javascript:, data: and vbscript: links are not part of the result at all", () => {
    const r = parseGpx(fixture("hostile/c15-links.gpx"));
    expect(r.ok).toBe(true);
    expect(JSON.stringify(r)).not.toMatch(/javascript|vbscript|data:/);
  });

  it("C26 two <type> children and everything else define no globals", () => {
    parseGpx(gpx11("<trk><type>a</type><type>b</type><trkseg/></trk>"));
    const g = globalThis as Record<string, unknown>;
    expect([g.idx, g.elem, g.window, g.document]).toEqual([undefined, undefined, undefined, undefined]);
  });

  it("bidirectional override characters are removed from names", () => {
    const r = parseGpx(gpx11("<trk><name>\u202Expg.exe Kestrel</name></trk>"));
    expect(r.ok && r.gpx.tracks[0]?.name).toBe("xpg.exe Kestrel");
  });
});

describe("C18, C19: coordinates (the exact messages are in parse-gpx.test.ts)", () => {
  const bad = ['lat="91"', 'lat="-90.0001"', 'lat="999"', 'lat="abc"', 'lat=""', 'lat="NaN"', 'lat="1e308"', 'lat="0x10"'];
  for (const attr of bad) {
    it(`${attr} is an error, never a number`, () => {
      const r = parseGpx(trackOf(`<trkpt ${attr} lon="0"/>`));
      expect(r.ok).toBe(false);
    });
  }
  it('lon="Infinity" and lon=" 12abc" are errors', () => {
    expect(parseGpx(trackOf('<trkpt lat="0" lon="Infinity"/>')).ok).toBe(false);
    expect(parseGpx(trackOf('<trkpt lat="0" lon=" 12abc"/>')).ok).toBe(false);
  });
});

describe("C23–C25: routes only, waypoints only, bad times", () => {
  it("C23 a file with only a route is accepted as a route", () => {
    const r = parseGpx(fixture("hostile/c23-route-only.gpx"));
    expect(r.ok && r.gpx.routes[0]?.segments[0]?.length).toBe(2);
  });

  it("C24 a file with only waypoints parses (its refusal as a route is in select-track.test.ts)", () => {
    const r = parseGpx(fixture("hostile/c24-waypoints-only.gpx"));
    expect(r.ok && r.gpx.waypoints.map((w) => w.name)).toEqual(["Mount Arbel Lookout", "Ostling Creek camp"]);
  });

  it("C25 reversed, duplicate, garbage, zone-less and impossible times never fail the file", () => {
    const r = parseGpx(fixture("hostile/c25-bad-times.gpx"));
    if (!r.ok) throw new Error("expected ok");
    const times = r.gpx.tracks[0]?.segments[0]?.map((p) => p.timeS);
    expect(times).toEqual([1714543210, 1714543205, 1714543205, null, 1714543220, 0, 4102444800, null, null]);
    expect(r.gpx.tracks[0]?.timesOrdered).toBe(false);
    expect(r.warnings.map((w) => w.message)).toEqual([
      "Track 1: times go backwards at segment 1, point 2 (line 4). The times are kept for reference but Fadeline does not rely on them.",
      "2 point time(s) could not be read (first: Track 1, segment 1, point 4 (line 6)); those times are ignored.",
      "1 point time(s) have no time zone (first: Track 1, segment 1, point 5 (line 7)); they were read as UTC.",
    ]);
  });
});
