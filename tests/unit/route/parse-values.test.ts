import { describe, expect, it } from "vitest";
import { findEntityError } from "@/lib/route/find-entity-error";
import { parseDecimal } from "@/lib/route/parse-decimal";
import { parseGpxTime } from "@/lib/route/parse-time";

// W3C XML Schema 1.0 Part 2 (Datatypes), §3.2.3.1 decimal: "a finite-length sequence of decimal digits
// separated by a period as a decimal indicator. An optional leading sign is allowed"; §4.3.6 whiteSpace
// "collapse" for decimal. No exponent (that is xsd:double), no NaN/INF.
describe("parseDecimal (xsd:decimal lexical space)", () => {
  it.each([
    ["0", 0],
    ["-0", 0],
    ["+1.5", 1.5],
    ["12.", 12],
    [".25", 0.25],
    ["  -33.8651\n", -33.8651],
    ["0012.50", 12.5],
  ])("accepts %j", (text, value) => expect(parseDecimal(text, 64)).toEqual({ ok: true, value }));

  it.each([
    ["", "empty"],
    ["   ", "empty"],
    ["1e3", "syntax"],
    ["1E-3", "syntax"],
    ["0x10", "syntax"],
    ["INF", "syntax"],
    ["NaN", "syntax"],
    ["1,5", "syntax"],
    ["1.2.3", "syntax"],
    ["12abc", "syntax"],
    ["+", "syntax"],
    [`1${"0".repeat(64)}`, "too-long"],
  ])("refuses %j (%s)", (text, reason) => expect(parseDecimal(text, 64)).toEqual({ ok: false, reason }));
});

// W3C XML Schema 1.0 Part 2, §3.2.7 dateTime: '-'? yyyy '-' mm '-' dd 'T' hh ':' mm ':' ss ('.' s+)?
// (zzzzzz)?, where 24:00:00 is the end of the day and the zone is Z or ±hh:mm (|offset| ≤ 14:00).
// Expected epoch seconds computed by hand: 2024-05-01 is day 19 844 after 1970-01-01
// (54 × 365 + 13 leap days + 121 days of 2024), so 06:30:00Z is 19 844 × 86 400 + 23 400 = 1 714 545 000 s.
describe("parseGpxTime (xsd:dateTime)", () => {
  it("reads UTC, offsets and fractions to seconds since the epoch", () => {
    expect(parseGpxTime("2024-05-01T06:30:00Z")).toEqual({ ok: true, timeS: 1_714_545_000, hasZone: true });
    expect(parseGpxTime("2024-05-01T16:30:00+10:00")).toEqual({ ok: true, timeS: 1_714_545_000, hasZone: true });
    expect(parseGpxTime(" 2024-05-01T06:30:00.250Z ")).toEqual({ ok: true, timeS: 1_714_545_000.25, hasZone: true });
    expect(parseGpxTime("2024-04-30T24:00:00Z")).toEqual({ ok: true, timeS: 1_714_521_600, hasZone: true });
  });

  it("reads a zone-less time as UTC and says so", () => {
    expect(parseGpxTime("2024-05-01T06:30:00")).toEqual({ ok: true, timeS: 1_714_545_000, hasZone: false });
  });

  it.each(["garbage", "", "2024-02-30T00:00:00Z", "2023-02-29T00:00:00Z", "2024-13-01T00:00:00Z", "2024-05-01 06:30:00Z", "2024-05-01T24:00:01Z", "2024-05-01T06:30:00+15:00", "1714545000"])(
    "refuses %j",
    (text) => expect(parseGpxTime(text)).toEqual({ ok: false }),
  );
});

// XML 1.0 (Fifth Edition), §4.1 (references) and §4.6 (the five predefined entities); §2.7 CDATA sections,
// §2.5 comments and §2.6 processing instructions hold '&' literally.
describe("findEntityError", () => {
  it("accepts the predefined entities and character references", () => {
    expect(findEntityError("<a>&amp;&lt;&gt;&quot;&apos;&#38;&#x26;</a>")).toBeNull();
  });

  it("ignores & inside CDATA, comments and processing instructions", () => {
    expect(findEntityError("<?pi a&b?><!-- x & y --><a><![CDATA[ & ]]></a>")).toBeNull();
  });

  it("finds a bare & and an undefined entity, with their positions", () => {
    expect(findEntityError("<a>x & y</a>")).toEqual({ index: 5, name: null });
    expect(findEntityError("<a t='&bogus;'/>")).toEqual({ index: 6, name: "bogus" });
    expect(findEntityError("<a><![CDATA[&]]>&#xZZ;</a>")).toEqual({ index: 16, name: null });
  });
});
