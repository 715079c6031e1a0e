/** The five entities every XML processor knows (XML 1.0, 5th ed., §4.6). */
const BUILT_IN = new Set(["amp", "lt", "gt", "quot", "apos"]);
/** An entity or character reference starting at the `&` (XML 1.0 §4.1, productions [66]–[68]). */
const REFERENCE = /&(?:([A-Za-z_:][A-Za-z0-9._:-]{0,63});|#[0-9]{1,8};|#x[0-9A-Fa-f]{1,8};)/y;

/** A misused `&`: `name` is the undefined entity's name, or `null` for a bare `&`. */
export interface EntityError {
  /** Index of the `&` in the text, UTF-16 code units. */
  index: number;
  name: string | null;
}

/**
 * Finds the first `&` in markup or character data that is not a built-in entity or a character
 * reference, skipping CDATA sections, comments and processing instructions (where `&` is literal).
 * Used after a failed parse to say precisely what is wrong: the XML parser reports a bare `&` only
 * indirectly (often as an unclosed tag at the end of the file). Linear time: each `indexOf` moves forward.
 *
 * @param text the whole document
 * @returns the first misused `&`, or `null`
 * @example
 * findEntityError("<gpx>a & b</gpx>"); // { index: 7, name: null }
 */
export function findEntityError(text: string): EntityError | null {
  let i = 0;
  let nextOpen = text.indexOf("<", 0);
  for (;;) {
    const amp = text.indexOf("&", i);
    if (amp < 0) return null;
    while (nextOpen >= 0 && nextOpen < amp) {
      const skipTo = endOfLiteralSection(text, nextOpen);
      if (skipTo < 0) return null; // unterminated section: the parser's own message is the right one
      i = Math.max(i, skipTo);
      nextOpen = text.indexOf("<", Math.max(skipTo, nextOpen + 1));
    }
    if (amp < i) continue; // the & was inside a skipped section
    REFERENCE.lastIndex = amp;
    const m = REFERENCE.exec(text);
    if (m === null) return { index: amp, name: null };
    const name = m[1];
    if (name !== undefined && !BUILT_IN.has(name)) return { index: amp, name };
    i = amp + m[0].length;
  }
}

/** If a CDATA section, comment or PI starts at `at`, the index just after its end (−1 if unterminated). */
function endOfLiteralSection(text: string, at: number): number {
  const close = text.startsWith("<![CDATA[", at)
    ? "]]>"
    : text.startsWith("<!--", at)
      ? "-->"
      : text.startsWith("<?", at)
        ? "?>"
        : null;
  if (close === null) return at + 1;
  const end = text.indexOf(close, at + 2);
  return end < 0 ? -1 : end + close.length;
}
