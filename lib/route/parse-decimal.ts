/**
 * The lexical form of xsd:decimal (W3C XML Schema 1.0 Part 2, §3.2.3.1): an optional sign, digits with an
 * optional fraction, no exponent, no hexadecimal, no "NaN" or "Infinity". GPX 1.1 types latitude,
 * longitude and elevation as xsd:decimal. Its whiteSpace facet is "collapse", so surrounding XML white
 * space is allowed and stripped first; any other character is an error.
 */
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/;
const XML_SPACE = /^[ \t\r\n]+|[ \t\r\n]+$/g;

/** Result of {@link parseDecimal}. */
export type DecimalResult = { ok: true; value: number } | { ok: false; reason: "empty" | "syntax" | "too-long" };

/**
 * Strictly parses an xsd:decimal. Unlike `parseFloat`, "0x10", " 12abc", "1e400", "NaN" and "" are
 * errors rather than 0, 12, Infinity or NaN.
 *
 * @param text the attribute value or element text
 * @param maxChars longest accepted value after trimming, characters
 * @returns the finite number, or why it is not one
 * @example
 * parseDecimal("-33.8651", 64); // { ok: true, value: -33.8651 }
 * parseDecimal("0x10", 64); // { ok: false, reason: "syntax" }
 */
export function parseDecimal(text: string, maxChars: number): DecimalResult {
  const s = text.replace(XML_SPACE, "");
  if (s === "") return { ok: false, reason: "empty" };
  if (s.length > maxChars) return { ok: false, reason: "too-long" };
  if (!DECIMAL.test(s)) return { ok: false, reason: "syntax" };
  const value = Number(s);
  // With at most maxChars digits and no exponent the value is finite; the check is a safety net.
  if (!Number.isFinite(value)) return { ok: false, reason: "syntax" };
  return { ok: true, value: value === 0 ? 0 : value }; // no −0
}
