/**
 * The storm's own wall clock. A start such as "2026-07-14T15:00" or
 * "2026-07-14T15:00+10:00" is shown as 15:00 whatever the viewer's time zone:
 * the time on the gauge is what a hydrologist reads against. The fields are
 * read as written and placed on a UTC axis, so the browser's zone never enters.
 */
const WALL = /^(\d{4})-(\d{2})-(\d{2})(?:T(\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?)?/;

/** Milliseconds of the wall-clock reading of `iso` on a UTC axis, or null when it is not a date-time. */
export function wallClockMs(iso: string): number | null {
  const m = WALL.exec(iso);
  if (!m) return null;
  const n = (i: number): number => (m[i] === undefined ? 0 : Number(m[i]));
  const ms = m[7] === undefined ? 0 : Math.round(Number(m[7]) * 1000);
  const t = Date.UTC(n(1), n(2) - 1, n(3), n(4), n(5), n(6), ms);
  return Number.isNaN(t) ? null : t;
}

const dateFormat = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  day: 'numeric',
  month: 'short',
  year: 'numeric',
});
const timeFormat = new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC',
  hour: '2-digit',
  minute: '2-digit',
  hourCycle: 'h23',
});

/** "14 Jul 2026" for a wall-clock time. */
export function formatWallDate(ms: number): string {
  return dateFormat.format(ms);
}

/** "15:00" for a wall-clock time. */
export function formatWallTime(ms: number): string {
  return timeFormat.format(ms);
}
