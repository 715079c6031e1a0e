/**
 * The lexical form of xsd:decimal (W3C XML Schema 1.0 Part 2, §3.2.3.1): an optional sign, digits with an
 * optional fraction, no exponent, no hexadecimal, no "NaN" or "Infinity" — `[+-]?(\d+(\.\d*)?|\.\d+)`.
 * GPX 1.1 types latitude, longitude and elevation as xsd:decimal. Its whiteSpace facet is "collapse", so
 * surrounding XML white space is allowed and stripped first; any other character is an error.
 *
 * The scanner below reads character codes instead of running regular expressions: it is called three
 * times per point, 300,000 times for a large file.
 */

/** Result of {@link parseDecimal}. */
export type DecimalResult = { ok: true; value: number } | { ok: false; reason: DecimalError };

/** Why a text is not an xsd:decimal. */
export type DecimalError = "empty" | "syntax" | "too-long";

const PLUS = 0x2b;
const MINUS = 0x2d;
const DOT = 0x2e;
const ZERO = 0x30;
const NINE = 0x39;

/** XML white space (XML 1.0 §2.3 production [3]): space, tab, CR, LF. */
function isXmlSpace(c: number): boolean {
  return c === 0x20 || c === 0x0a || c === 0x0d || c === 0x09;
}

/**
 * Checks `text` against the xsd:decimal lexical form, allowing surrounding XML white space.
 *
 * @param text the attribute value or element text
 * @param maxChars longest accepted value after trimming, characters
 * @returns `null` when it is a decimal, else why not ("empty" before "too-long" before "syntax")
 */
export function decimalError(text: string, maxChars: number): DecimalError | null {
  let start = 0;
  let end = text.length;
  while (start < end && isXmlSpace(text.charCodeAt(start))) start++;
  while (end > start && isXmlSpace(text.charCodeAt(end - 1))) end--;
  if (start === end) return "empty";
  if (end - start > maxChars) return "too-long";
  let i = start;
  const first = text.charCodeAt(i);
  if (first === PLUS || first === MINUS) i++;
  let digits = 0;
  for (let c = text.charCodeAt(i); i < end && c >= ZERO && c <= NINE; c = text.charCodeAt(++i)) digits++;
  if (i < end && text.charCodeAt(i) === DOT) {
    i++;
    for (let c = text.charCodeAt(i); i < end && c >= ZERO && c <= NINE; c = text.charCodeAt(++i)) digits++;
  }
  return i === end && digits > 0 ? null : "syntax";
}

/**
 * The value of an xsd:decimal, or `NaN` when `text` is not one: the allocation-free form of
 * {@link parseDecimal} for the parser's hot path (ask {@link decimalError} why when it is `NaN`).
 *
 * @param text the attribute value or element text
 * @param maxChars longest accepted value after trimming, characters
 * @returns the finite number (never −0), or `NaN`
 */
export function decimalValue(text: string, maxChars: number): number {
  const fast = text.length <= maxChars ? plainDecimal(text) : Number.NaN;
  if (!Number.isNaN(fast)) return fast;
  if (decimalError(text, maxChars) !== null) return Number.NaN;
  // `Number` skips white space (a superset of XML's) and reads exactly this grammar, correctly rounded.
  const value = Number(text);
  // With at most maxChars digits and no exponent the value is finite; the check is a safety net.
  if (!Number.isFinite(value)) return Number.NaN;
  return value === 0 ? 0 : value; // no −0
}

/** 10^k for k = 0…15, all exact in binary64. */
const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * The common case without a call into the runtime: `[+-]?digits(.digits)?` with no white space and at most
 * 15 digits. The digits then form an integer below 2^53 and 10^k is exact, so one division, correctly
 * rounded, gives exactly the value `Number(text)` gives (W. D. Clinger, "How to read floating point numbers
 * accurately", PLDI 1990, the fast path). Anything else returns `NaN` and takes the general path.
 */
function plainDecimal(text: string): number {
  const n = text.length;
  let i = 0;
  const first = text.charCodeAt(0);
  if (first === PLUS || first === MINUS) i++;
  let mantissa = 0;
  let digits = 0;
  let fraction = -1; // digits after the point, −1 without a point
  for (; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c >= ZERO && c <= NINE) {
      mantissa = mantissa * 10 + (c - ZERO);
      digits++;
      if (fraction >= 0) fraction++;
    } else if (c === DOT && fraction < 0) fraction = 0;
    else return Number.NaN;
  }
  if (digits === 0 || digits > 15) return Number.NaN;
  const value = fraction > 0 ? mantissa / POW10[fraction]! : mantissa;
  return first === MINUS && value !== 0 ? -value : value; // no −0
}

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
  const reason = decimalError(text, maxChars);
  if (reason !== null) return { ok: false, reason };
  const value = decimalValue(text, maxChars);
  return Number.isNaN(value) ? { ok: false, reason: "syntax" } : { ok: true, value };
}
