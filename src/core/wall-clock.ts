/**
 * Clock readings of ISO 8601 start times, shared by the core's checks, the
 * store's alignment of a record with its storm, and the screen's clock.
 *
 * A start such as "2026-07-14T15:00" or "2026-07-14T15:00+10:00" is read as
 * the wall clock shows it (15:00, whatever the viewer's time zone), placed on
 * a zone-free axis of milliseconds that uses UTC's arithmetic, so the
 * browser's own zone never enters.
 */
/** Any ISO 8601 date-time or date, read field by field; the zone, when written, is "Z" or "±hh:mm". */
const ISO = /^(\d{4})-(\d{2})-(\d{2})(?:T(\d{2}):(\d{2})(?::(\d{2})(\.\d{1,9})?)?)?(Z|[+-]\d{2}:\d{2})?$/;
/** A zone written at the end of a date-time: "Z" or "±hh:mm". */
export const ZONE_AT_END = /(?:Z|[+-]\d{2}:\d{2})$/;
const MS_PER_DAY = 86_400_000;

/** True for a leap year of the Gregorian calendar (every 4th year, not every 100th, every 400th). */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Days in a month (1 to 12) of a Gregorian year; 0 for a month that does not exist. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  if (month < 1 || month > 12) return 0;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/**
 * Days from 1970-01-01 to a date of the proleptic Gregorian calendar, in
 * closed form (the days-from-civil algorithm of Hinnant, "chrono-Compatible
 * Low-Level Date Algorithms", 2013): no Date object, every year alike.
 */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const doy = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

/** A date-time as written: its wall-clock reading on the zone-free axis, and its zone's offset in minutes (null: none written). */
export interface IsoReading {
  readonly wallMs: number;
  readonly zoneMinutes: number | null;
  /** Whether a time of day was written ("2026-07-14" has none). */
  readonly hasTime: boolean;
}

/**
 * The one strict reader of ISO 8601 date-times in Raincut
 * ("2026-07-14", "2026-07-14T15:00", "2026-07-14T15:00:00.5Z",
 * "2026-07-14T15:00+10:00"): every field in range (no 30 February, no
 * 24:00, no minute 60, a zone within ±23:59), or null. Never throws.
 */
export function readIsoDateTime(text: string): IsoReading | null {
  if (typeof text !== 'string') return null;
  const m = ISO.exec(text);
  if (!m) return null;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (day < 1 || day > daysInMonth(year, month)) return null;
  const hour = m[4] === undefined ? 0 : Number(m[4]);
  const minute = m[5] === undefined ? 0 : Number(m[5]);
  const second = m[6] === undefined ? 0 : Number(m[6]);
  if (hour > 23 || minute > 59 || second > 59) return null;
  const ms = m[7] === undefined ? 0 : Math.round(Number(m[7]) * 1000);
  let zoneMinutes: number | null = null;
  if (m[8] !== undefined) {
    if (m[8] === 'Z') zoneMinutes = 0;
    else {
      const zh = Number(m[8].slice(1, 3));
      const zm = Number(m[8].slice(4, 6));
      if (zh > 23 || zm > 59) return null;
      zoneMinutes = (m[8][0] === '-' ? -1 : 1) * (zh * 60 + zm);
    }
  }
  const wallMs = daysFromCivil(year, month, day) * MS_PER_DAY + ((hour * 60 + minute) * 60 + second) * 1000 + ms;
  return { wallMs, zoneMinutes, hasTime: m[4] !== undefined };
}

/** True when the text ends in a zone ("Z", "+10:00"). */
export function namesZone(iso: string): boolean {
  return ZONE_AT_END.test(iso);
}

/** Milliseconds of the wall-clock reading of `iso` on a zone-free axis, or null when it is not a date-time (readIsoDateTime). */
export function wallClockMs(iso: string): number | null {
  return readIsoDateTime(iso)?.wallMs ?? null;
}

/** The instant a date-time that names its zone stands for (ms from 1970 UTC), or null without a zone or when unreadable. */
export function instantMs(iso: string): number | null {
  const read = readIsoDateTime(iso);
  return read === null || read.zoneMinutes === null ? null : read.wallMs - read.zoneMinutes * 60_000;
}

/**
 * Hours from `fromIso` to `toIso`, or null when either is not a readable
 * date-time. Two times that both name their zone are compared as instants;
 * otherwise the clock readings are compared as written (`asWritten`).
 */
export function hoursBetweenClocks(
  fromIso: string,
  toIso: string,
): { readonly hours: number; readonly asWritten: boolean } | null {
  const zoned = namesZone(fromIso) && namesZone(toIso);
  const a = zoned ? instantMs(fromIso) : wallClockMs(fromIso);
  const b = zoned ? instantMs(toIso) : wallClockMs(toIso);
  if (a === null || b === null) return null;
  return { hours: (b - a) / 3.6e6, asWritten: !zoned };
}

/** The most milliseconds from 1970 a Date holds, either way (ECMA-262 §21.4.1.1: 8.64·10¹⁵). */
const DATE_RANGE_MS = 8.64e15;

export interface WallClockParts {
  readonly year: number;
  /** 1 to 12. */
  readonly month: number;
  readonly day: number;
  readonly hour: number;
  readonly minute: number;
  readonly second: number;
  readonly millisecond: number;
}

/**
 * The calendar fields of a moment on the zone-free axis (rounded to the
 * millisecond), or null when the calendar cannot write it: not a finite
 * number, or past the browser's date range. Never throws.
 */
export function wallClockParts(ms: number): WallClockParts | null {
  if (typeof ms !== 'number' || !Number.isFinite(ms) || Math.abs(ms) > DATE_RANGE_MS) return null;
  const d = new Date(Math.round(ms));
  if (Number.isNaN(d.getTime())) return null;
  return {
    year: d.getUTCFullYear(),
    month: d.getUTCMonth() + 1,
    day: d.getUTCDate(),
    hour: d.getUTCHours(),
    minute: d.getUTCMinutes(),
    second: d.getUTCSeconds(),
    millisecond: d.getUTCMilliseconds(),
  };
}
