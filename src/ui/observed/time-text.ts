import { formatWallDate, formatWallTime, wallClockMs } from '../chart/clock';
import { formatValue } from '../format';

/**
 * How a moment of the record reads on screen. Times are kept as hours after
 * the record's first sample; a clock reading is added when the record has
 * one, or when the storm has one (through the offset that lines them up),
 * in the wall clock the chart's axis shows.
 */
export interface RecordClock {
  /** Wall-clock reading of the record's first sample on a zone-free axis, or null. */
  readonly firstMs: number | null;
}

export function recordClock(
  recordStartIso: string | undefined,
  stormStartIso: string | undefined,
  offsetH: number,
): RecordClock {
  if (recordStartIso !== undefined) {
    const ms = wallClockMs(recordStartIso);
    if (ms !== null) return { firstMs: ms };
  }
  if (stormStartIso !== undefined) {
    const ms = wallClockMs(stormStartIso);
    if (ms !== null) return { firstMs: ms + offsetH * 3.6e6 };
  }
  return { firstMs: null };
}

/** The date ("14 Jul 2026") and time ("21:00") of a moment, or null without a clock. */
export function clockParts(clock: RecordClock, tH: number): { readonly date: string; readonly time: string } | null {
  if (clock.firstMs === null) return null;
  const ms = Math.round(clock.firstMs + tH * 3.6e6);
  return { date: formatWallDate(ms), time: formatWallTime(ms) };
}

/** "14 Jul 2026 21:00", or null without a clock. */
export function clockAt(clock: RecordClock, tH: number): string | null {
  const parts = clockParts(clock, tH);
  return parts === null ? null : `${parts.date} ${parts.time}`;
}

/** "7 h" after the first sample. */
export function hoursText(tH: number): string {
  return `${formatValue(tH)} h`;
}

/** "21:00 (7 h after the first sample)" or "7 h after the first sample". */
export function momentText(clock: RecordClock, tH: number): string {
  const at = clockAt(clock, tH);
  const after = `${hoursText(tH)} after the first sample`;
  return at === null ? after : `${at} (${after})`;
}
