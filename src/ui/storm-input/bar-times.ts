// Straight from the module, not the io index, so the first screen does not pull in the whole text import.
import { readIsoDateTime } from '../../core';
import { dateMs, isoAt, parseClock } from '../../io/time-values';
import { NO_CLOCK_TEXT, formatClockText, wallClockMs } from '../chart/clock';

/**
 * Bar times as the bar table shows and reads them. With a start, a bar's time
 * is the clock reading at which it starts, in the storm's own wall clock (as
 * the chart's axis shows it); without one, the time since the storm began, as
 * h:mm. Reading goes through the import layer's clock parser, so a time typed
 * in the table is read exactly as a pasted one would be.
 */

const MS_PER_HOUR = 3_600_000;
const MS_PER_DAY = 24 * MS_PER_HOUR;
const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

export type TimeText = { readonly ok: true; readonly hours: number } | { readonly ok: false; readonly message: string };

/** How the bar table writes and reads the times of one storm. */
export interface BarClock {
  /** Wall-clock reading of the storm's start on a zone-free axis, or null without a start. */
  readonly startMs: number | null;
  /** Whether the storm's bars fall on more than one calendar day (times then carry the date). */
  readonly multiDay: boolean;
  /** Column heading words: "clock" or "h:mm from the start". */
  readonly heading: string;
}

export function barClock(startIso: string | undefined, totalH: number): BarClock {
  const startMs = startIso === undefined ? null : wallClockMs(startIso);
  if (startMs === null) return { startMs: null, multiDay: false, heading: 'h:mm from start' };
  const lastMs = startMs + Math.max(0, totalH) * MS_PER_HOUR;
  const multiDay = Math.floor(startMs / MS_PER_DAY) !== Math.floor((lastMs - 1) / MS_PER_DAY) && totalH > 0;
  return { startMs, multiDay, heading: 'clock' };
}

/** Hours as h:mm, or h:mm:ss when the seconds are not whole minutes. */
export function elapsedText(hours: number): string {
  if (!Number.isFinite(hours)) return NO_CLOCK_TEXT;
  const totalMs = Math.round(hours * MS_PER_HOUR);
  const h = Math.floor(totalMs / MS_PER_HOUR);
  const m = Math.floor((totalMs % MS_PER_HOUR) / 60_000);
  const s = (totalMs % 60_000) / 1000;
  const seconds = s === 0 ? '' : `:${s < 10 ? '0' : ''}${Number(s.toFixed(3))}`;
  return `${h}:${pad(m)}${seconds}`;
}

/** The text for the start of a bar that starts `hours` after the storm start. */
export function barTimeText(clock: BarClock, hours: number): string {
  if (clock.startMs === null) return elapsedText(hours);
  return formatClockText(clock.startMs + hours * MS_PER_HOUR, clock.multiDay);
}

const ELAPSED = /^(\d+):(\d{1,2})(?::(\d{1,2}(?:[.,]\d+)?))?$/;

/**
 * Reads a bar time typed into the table, as hours from the storm's start.
 * `nearH` is the bar's present start: a time of day alone is read on that
 * bar's calendar day. Messages start lower-case, to follow "Bar 3 start: ".
 */
export function readBarTime(clock: BarClock, text: string, nearH: number): TimeText {
  const t = text.trim();
  if (t === '') return { ok: false, message: 'enter a time.' };
  if (clock.startMs === null) {
    const m = ELAPSED.exec(t);
    if (!m) return { ok: false, message: `“${t}” is not a time since the start; write it as h:mm, for example 1:20.` };
    const minutes = Number(m[2]);
    const seconds = m[3] === undefined ? 0 : Number(m[3].replace(',', '.'));
    if (minutes > 59) return { ok: false, message: `“${t}” has ${minutes} minutes; minutes run from 0 to 59.` };
    if (seconds >= 60) return { ok: false, message: `“${t}” has ${seconds} seconds; seconds run from 0 to 59.` };
    return { ok: true, hours: Number(m[1]) + minutes / 60 + seconds / 3600 };
  }
  if (!/^\d{1,2}:\d{2}/.test(t) && !/^\d{4}-/.test(t)) {
    return { ok: false, message: `“${t}” is not a clock time; write it as HH:MM, or YYYY-MM-DD HH:MM.` };
  }
  const read = parseClock(t, 'day-month');
  if (!read.ok) return { ok: false, message: `“${t}”: ${read.reason}` };
  const { date, hasTime, msOfDay, zoneMinutes } = read.value;
  if (!hasTime) return { ok: false, message: `“${t}” has a date but no time of day.` };
  if (zoneMinutes !== null) {
    return {
      ok: false,
      message: `“${t}” gives a time zone; bar times are read on the storm’s own clock, so leave the zone out.`,
    };
  }
  let dayMs: number;
  if (date === null) {
    const nearMs = clock.startMs + nearH * MS_PER_HOUR;
    dayMs = Math.floor(nearMs / MS_PER_DAY) * MS_PER_DAY;
  } else {
    dayMs = dateMs(date);
  }
  return { ok: true, hours: (dayMs + msOfDay - clock.startMs) / MS_PER_HOUR };
}

/** The start written `hours` later than `startIso`, in the same zone as it was written (or none). */
export function shiftStartIso(startIso: string, hours: number): string | null {
  const read = readIsoDateTime(startIso);
  if (read === null) return null;
  return isoAt(read, hours);
}

/**
 * Reads a storm start typed as YYYY-MM-DD HH:MM (a "T" may stand for the
 * space, seconds and a zone such as +10:00 or Z may follow). Returns the ISO
 * text to store, or a message.
 */
export function readStartText(text: string): { ok: true; iso: string } | { ok: false; message: string } {
  const t = text.trim();
  if (t === '') return { ok: false, message: 'Enter a date and time, for example 2024-05-01 09:50.' };
  if (!/^\d{4}-\d{1,2}-\d{1,2}/.test(t)) {
    return {
      ok: false,
      message: `“${t}” is not a date and time; write it as YYYY-MM-DD HH:MM, for example 2024-05-01 09:50.`,
    };
  }
  const read = parseClock(t, 'day-month');
  if (!read.ok) return { ok: false, message: `“${t}”: ${read.reason.charAt(0).toUpperCase()}${read.reason.slice(1)}` };
  const { date, hasTime, msOfDay, zoneMinutes } = read.value;
  if (date === null || !hasTime) return { ok: false, message: `“${t}” needs both a date and a time of day.` };
  return { ok: true, iso: isoAt({ wallMs: dateMs(date) + msOfDay, zoneMinutes }, 0) };
}

/** The start as the start field shows it: "2024-05-01 09:50" (seconds and zone kept when set). */
export function startFieldText(startIso: string | undefined): string {
  if (startIso === undefined) return '';
  return startIso.replace('T', ' ').replace(/(\d{2}:\d{2}):00(?=$|[Z+-])/, '$1');
}
