/**
 * Clock readings of ISO 8601 start times, shared by the core's checks, the
 * store's alignment of a record with its storm, and the screen's clock.
 *
 * A start such as "2026-07-14T15:00" or "2026-07-14T15:00+10:00" is read as
 * the wall clock shows it (15:00, whatever the viewer's time zone), placed on
 * a zone-free axis of milliseconds that uses UTC's arithmetic, so the
 * browser's own zone never enters.
 */
const WALL = /^(\d{4})-(\d{2})-(\d{2})(?:T(\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?)?/;
const ZONE = /(?:Z|[+-]\d{2}:\d{2})$/;

/** True when the text ends in a zone ("Z", "+10:00"). */
export function namesZone(iso: string): boolean {
  return ZONE.test(iso);
}

/** Milliseconds of the wall-clock reading of `iso` on a zone-free axis, or null when it is not a date-time. */
export function wallClockMs(iso: string): number | null {
  const m = WALL.exec(iso);
  if (!m) return null;
  const n = (i: number): number => (m[i] === undefined ? 0 : Number(m[i]));
  const ms = m[7] === undefined ? 0 : Math.round(Number(m[7]) * 1000);
  // setUTCFullYear, not Date.UTC: Date.UTC reads the years 0 to 99 as 1900 to 1999.
  const d = new Date(0);
  d.setUTCFullYear(n(1), n(2) - 1, n(3));
  d.setUTCHours(n(4), n(5), n(6), ms);
  const t = d.getTime();
  return Number.isNaN(t) ? null : t;
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
  const a = zoned ? Date.parse(fromIso) : wallClockMs(fromIso);
  const b = zoned ? Date.parse(toIso) : wallClockMs(toIso);
  if (a === null || b === null || Number.isNaN(a) || Number.isNaN(b)) return null;
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
