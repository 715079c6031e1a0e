/**
 * Guards the parser's speed against a V8 pitfall rather than timing it (timings are noisy on shared CI):
 * saxes 6 stores each event handler with a computed key, and V8 turns an object that gains too many
 * properties that way into a dictionary-mode object, whose every field read is a hash lookup. With seven
 * handlers the parser object went that way and a 100,000-point file took ~0.4 s longer to read.
 */
import { setFlagsFromString } from "node:v8";
import { SaxesParser } from "saxes";
import { afterEach, describe, expect, it, vi } from "vitest";
import { parseGpx } from "@/lib/route";
import { gpx11 } from "./gpx-fixtures";

setFlagsFromString("--allow-natives-syntax");
// Compiled after the flag is set, so it may use V8's intrinsic.
const hasFastProperties = new Function("o", "return %HasFastProperties(o)") as (o: object) => boolean;

describe("parseGpx's saxes parser", () => {
  afterEach(() => vi.restoreAllMocks());

  it("keeps fast (non-dictionary) properties with all its handlers attached", () => {
    const write = vi.spyOn(SaxesParser.prototype, "write");
    expect(parseGpx(gpx11('<trk><trkseg><trkpt lat="1" lon="2"><ele>3</ele></trkpt></trkseg></trk>')).ok).toBe(true);
    const parser = write.mock.contexts[0] as object;
    expect(parser).toBeInstanceOf(SaxesParser);
    expect(hasFastProperties(parser)).toBe(true);
  });

  it("the check itself detects a parser with one handler too many", () => {
    const parser = new SaxesParser({ xmlns: true, position: true });
    for (const name of ["doctype", "attribute", "opentag", "closetag", "text", "cdata"] as const) parser.on(name, () => {});
    expect(hasFastProperties(parser)).toBe(true);
    parser.on("opentagstart", () => {});
    expect(hasFastProperties(parser)).toBe(false);
  });
});
