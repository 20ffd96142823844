/**
 * The storm's own wall clock on screen. Readings come from the core's
 * `wallClockMs` (zone-free axis); writing them never throws: a moment the
 * calendar cannot write (past the browser's date range, or not a number) is
 * written as "—". Records are held to the core's limits of time
 * (core/time-limits.ts), so this is a guard, not a path in use.
 */
import { wallClockParts } from '../../core';

export { wallClockMs } from '../../core';

/** What a moment the calendar cannot write is shown as. */
export const NO_CLOCK_TEXT = '—';

// Made at first use rather than at load, where they added the calendar's locale data to the task evaluating the
// app's script (core/time-limits.ts says why).
let dateFormatMade: Intl.DateTimeFormat | undefined;
const dateFormat = (): Intl.DateTimeFormat =>
  (dateFormatMade ??= new Intl.DateTimeFormat('en-GB', {
    timeZone: 'UTC',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
  }));
let timeFormatMade: Intl.DateTimeFormat | undefined;
const timeFormat = (): Intl.DateTimeFormat =>
  (timeFormatMade ??= new Intl.DateTimeFormat('en-GB', {
    timeZone: 'UTC',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }));

/** "14 Jul 2026" for a wall-clock time. */
export function formatWallDate(ms: number): string {
  return wallClockParts(ms) === null ? NO_CLOCK_TEXT : dateFormat().format(ms);
}

/** "15:00" for a wall-clock time. */
export function formatWallTime(ms: number): string {
  return wallClockParts(ms) === null ? NO_CLOCK_TEXT : timeFormat().format(ms);
}

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

/**
 * "15:10", "15:10:30" or "15:10:07.5" (seconds only when not whole minutes),
 * with the date first ("2026-07-14 15:10") when `withDate`: how the bar table
 * and the CSV export write a clock time.
 */
export function formatClockText(ms: number, withDate: boolean): string {
  const t = wallClockParts(ms);
  if (t === null) return NO_CLOCK_TEXT;
  const s = t.second + t.millisecond / 1000;
  const seconds = s === 0 ? '' : `:${s < 10 ? '0' : ''}${Number(s.toFixed(3))}`;
  const date = withDate ? `${pad(t.year, 4)}-${pad(t.month)}-${pad(t.day)} ` : '';
  return `${date}${pad(t.hour)}:${pad(t.minute)}${seconds}`;
}
