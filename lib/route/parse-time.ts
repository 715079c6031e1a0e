/**
 * xsd:dateTime (W3C XML Schema 1.0 Part 2, §3.2.7): YYYY-MM-DDThh:mm:ss(.s+)?(Z|±hh:mm)?, the type of GPX
 * `<time>`. GPX 1.1 asks for UTC ("Z"); a missing zone is read as UTC and reported by the caller.
 */
const DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(\.\d+)?(Z|[+-]\d{2}:\d{2})?$/;

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
  const m = DATE_TIME.exec(text.trim());
  if (m === null) return { ok: false };
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const hour = Number(m[4]);
  const minute = Number(m[5]);
  const second = Number(m[6]);
  if (month < 1 || month > 12 || day < 1 || hour > 24 || minute > 59 || second > 60) return { ok: false };
  if (hour === 24 && (minute !== 0 || second !== 0)) return { ok: false };
  if (day > daysInMonth(year, month)) return { ok: false }; // e.g. 2024-02-30
  const ms = Date.UTC(year, month - 1, day, hour, minute, Math.min(second, 59));
  const fraction = m[7] === undefined ? 0 : Number(m[7]);
  const zone = m[8];
  const offsetMin = zone === undefined || zone === "Z" ? 0 : zoneMinutes(zone);
  if (Number.isNaN(offsetMin)) return { ok: false };
  const leap = second === 60 ? 1 : 0;
  return { ok: true, timeS: ms / 1000 + leap + fraction - offsetMin * 60, hasZone: zone !== undefined };
}

/** Gregorian calendar: 30 days hath September…; February has 29 in years divisible by 4, except centuries not divisible by 400. */
function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

function zoneMinutes(zone: string): number {
  const sign = zone.startsWith("-") ? -1 : 1;
  const hh = Number(zone.slice(1, 3));
  const mm = Number(zone.slice(4, 6));
  if (hh > 14 || mm > 59) return Number.NaN;
  return sign * (hh * 60 + mm);
}
