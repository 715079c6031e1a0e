/**
 * xsd:dateTime (W3C XML Schema 1.0 Part 2, §3.2.7): YYYY-MM-DDThh:mm:ss(.s+)?(Z|±hh:mm)?, the type of GPX
 * `<time>`. GPX 1.1 asks for UTC ("Z"); a missing zone is read as UTC and reported by the caller. Read with
 * character codes rather than a regular expression: a recorded track has one time per point.
 */

/** Result of {@link parseGpxTime}. */
export type TimeResult = { ok: true; timeS: number; hasZone: boolean } | { ok: false };

/**
 * Parses a GPX time strictly (no `Date.parse` leniency, so "garbage" or "2024-02-30T…" never becomes a
 * date), to seconds since the Unix epoch.
 *
 * @param text element text, surrounding white space allowed
 * @returns time in s since 1970-01-01T00:00:00Z and whether a zone was given, or `{ ok: false }`
 * @example
 * parseGpxTime("2024-05-01T06:30:00Z"); // { ok: true, timeS: 1714545000, hasZone: true }
 */
export function parseGpxTime(text: string): TimeResult {
  const s = text.trim();
  const n = s.length;
  if (n < 19 || !punctuated(s)) return { ok: false };
  const year = digits(s, 0, 4);
  const month = digits(s, 5, 2);
  const day = digits(s, 8, 2);
  const hour = digits(s, 11, 2);
  const minute = digits(s, 14, 2);
  const second = digits(s, 17, 2);
  if (year < 0 || month < 0 || day < 0 || hour < 0 || minute < 0 || second < 0) return { ok: false };
  let i = 19;
  let fraction = 0;
  if (s.charCodeAt(i) === 0x2e) {
    let j = i + 1;
    while (j < n && isDigit(s.charCodeAt(j))) j++;
    if (j === i + 1) return { ok: false };
    fraction = Number(s.slice(i, j)); // ".250" → 0.25
    i = j;
  }
  const offsetMin = i === n ? 0 : zoneMinutes(s, i);
  if (Number.isNaN(offsetMin)) return { ok: false };
  if (month < 1 || month > 12 || day < 1 || hour > 24 || minute > 59 || second > 60) return { ok: false };
  if (hour === 24 && (minute !== 0 || second !== 0)) return { ok: false };
  if (day > daysInMonth(year, month)) return { ok: false }; // e.g. 2024-02-30
  const ms = Date.UTC(year, month - 1, day, hour, minute, Math.min(second, 59));
  const leap = second === 60 ? 1 : 0;
  return { ok: true, timeS: ms / 1000 + leap + fraction - offsetMin * 60, hasZone: i !== n };
}

/** The separators of YYYY-MM-DDThh:mm:ss are where they must be. */
function punctuated(s: string): boolean {
  return (
    s.charCodeAt(4) === 0x2d &&
    s.charCodeAt(7) === 0x2d &&
    s.charCodeAt(10) === 0x54 &&
    s.charCodeAt(13) === 0x3a &&
    s.charCodeAt(16) === 0x3a
  );
}

function isDigit(c: number): boolean {
  return c >= 0x30 && c <= 0x39;
}

/** The decimal number written by `count` ASCII digits at `at`, or −1 when one is not a digit. */
function digits(s: string, at: number, count: number): number {
  let value = 0;
  for (let i = at; i < at + count; i++) {
    const c = s.charCodeAt(i);
    if (!isDigit(c)) return -1;
    value = value * 10 + (c - 0x30);
  }
  return value;
}

/** Gregorian calendar: 30 days hath September…; February has 29 in years divisible by 4, except centuries not divisible by 400. */
function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** Offset of the zone that starts at `at` and ends the text ("Z", "+hh:mm", "-hh:mm"), min; NaN if malformed. */
function zoneMinutes(s: string, at: number): number {
  const c = s.charCodeAt(at);
  if (c === 0x5a) return at + 1 === s.length ? 0 : Number.NaN; // Z
  if ((c !== 0x2b && c !== 0x2d) || s.length !== at + 6 || s.charCodeAt(at + 3) !== 0x3a) return Number.NaN;
  const hh = digits(s, at + 1, 2);
  const mm = digits(s, at + 4, 2);
  if (hh < 0 || mm < 0 || hh > 14 || mm > 59) return Number.NaN;
  return (c === 0x2d ? -1 : 1) * (hh * 60 + mm);
}
