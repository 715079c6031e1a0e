import { GpxAbort } from "./gpx-sax";
import { formatCount, routeError } from "./problems";

/** Unicode bidirectional controls (U+202A–U+202E, U+2066–U+2069): they can make text display reversed. */
const BIDI_CONTROLS = /[\u202A-\u202E\u2066-\u2069]/g;

/**
 * Normalises a GPX name or description to plain text: the XML parser has already decoded entities and
 * CDATA, so `&lt;b&gt;` and `<![CDATA[<b>]]>` both arrive as the literal characters "<b>" and are kept as
 * such (never interpreted as HTML). Bidi controls are removed; a name is collapsed to one line.
 *
 * @param raw decoded text content
 * @param what label for the length message, e.g. "track name"
 * @param max longest accepted length after normalising, characters
 * @param singleLine collapse all white space runs to one space (names) or only trim (descriptions)
 * @param line source line for the message
 * @returns the text, or `null` when empty; throws {@link GpxAbort} when too long
 */
export function plainText(raw: string, what: string, max: number, singleLine: boolean, line: number): string | null {
  if (raw.length > 4 * max + 4096) tooLong(what, raw.length, max, line); // hopeless before any work
  const cleaned = raw.replace(BIDI_CONTROLS, "");
  const text = singleLine ? cleaned.replace(/\s+/g, " ").trim() : cleaned.trim();
  if (text.length > max) tooLong(what, text.length, max, line);
  return text === "" ? null : text;
}

function tooLong(what: string, length: number, max: number, line: number): never {
  throw new GpxAbort(
    routeError(
      "text-too-long",
      `Line ${line}: a ${what} is ${formatCount(length)} characters long; Fadeline accepts up to ` +
        `${formatCount(max)}. Shorten it in your planner and export again.`,
      { line },
    ),
  );
}
