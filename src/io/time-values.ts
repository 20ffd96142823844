import {
  FIRST_CLOCK_YEAR,
  LAST_CLOCK_YEAR,
  MAX_RECORD_H,
  MAX_RECORD_YEARS,
  daysFromCivil,
  daysInMonth,
  describeHours,
  isBelowMinStep,
  wallClockParts,
  writeIsoDateTime,
  zoneText,
} from '../core';
import { formatDuration } from './describe';
import { notANumberReason, parseNumber, type DecimalMark, type Grouping } from './numbers';
import { problem, type ProblemList } from './problems';

/**
 * Times as they arrive in a paste, turned into hours from the first time.
 *
 * - 'clock': ISO 8601 date-times (2024-05-01T10:00, 2024-05-01 10:00:30,
 *   with or without Z / ±hh:mm), dates written day-first or month-first
 *   (01/05/2024 10:00, 01.05.2024 10:00), dates alone (daily records), or a
 *   time of day alone (10:00, 10:00:30, 10:00 PM).
 * - 'elapsed-min' / 'elapsed-h': plain numbers of minutes or hours.
 * - 'none': no time column; bars follow each other at a set step.
 *
 * Clock arithmetic is done on the wall-clock reading: times without a zone
 * are taken as written, with no daylight-saving jumps (gauges log in a fixed
 * time), and a given zone offset is honoured.
 *
 * Times of day without a date cross midnight when a time is earlier than the
 * one before and the step forward over midnight is at most 12 hours
 * (23:50 → 00:00 is 10 minutes); a larger backward jump is reported as out of
 * order rather than read as a day later. Without a date such times are not
 * placed on a calendar unless the user gives the date of the first time.
 */
export type TimeKind = 'clock' | 'elapsed-min' | 'elapsed-h' | 'none';

export const TIME_KINDS: readonly TimeKind[] = ['clock', 'elapsed-min', 'elapsed-h', 'none'];

/** How a date written with slashes or dots is read: 01/05/2024 is 1 May (day-month) or 5 January (month-day). */
export type DateOrder = 'day-month' | 'month-day';

export const DATE_ORDERS: readonly DateOrder[] = ['day-month', 'month-day'];

const MS_PER_HOUR = 3_600_000;
const MS_PER_DAY = 24 * MS_PER_HOUR;
/** Longest step forward over midnight that a time of day earlier than the one before may mean. */
const MAX_MIDNIGHT_STEP_MS = 12 * MS_PER_HOUR;

export interface CalendarDate {
  readonly year: number;
  readonly month: number;
  readonly day: number;
}

/** One clock cell as read. */
export interface ClockReading {
  readonly date: CalendarDate | null;
  /** Whether a time of day was written (a date alone has none). */
  readonly hasTime: boolean;
  /** Milliseconds after midnight (86,400,000 for 24:00). */
  readonly msOfDay: number;
  /** Offset from UTC in minutes when the cell gave one (Z is 0), else null. */
  readonly zoneMinutes: number | null;
}

export type Parsed<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly reason: string };

const TIME_PART = String.raw`(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?(?:\s*([AaPp])\.?[Mm]\.?)?`;
const ZONE_PART = String.raw`(Z|z|[+-]\d{2}(?::?\d{2})?)?`;
const TIME_ONLY = new RegExp(`^${TIME_PART}$`);
/** Year first: 2024-05-01, 2024/05/01, 2024.05.01. */
const YEAR_FIRST = new RegExp(String.raw`^(\d{4})([-/.])(\d{1,2})\2(\d{1,2})(?:(?:T|\s+)${TIME_PART}${ZONE_PART})?$`);
/** Day or month first: 01/05/2024, 1.5.2024, 01-05-2024, with a two-digit year caught to explain it. */
const YEAR_LAST = new RegExp(
  String.raw`^(\d{1,2})([-/.])(\d{1,2})\2(\d{2}|\d{4})(?:(?:T|\s+)${TIME_PART}${ZONE_PART})?$`,
);

const CLOCK_HELP =
  'use an ISO 8601 date-time (2024-05-01T10:00), a date and time (01/05/2024 10:00) or a time of day (10:00).';

function checkDate(year: number, month: number, day: number): Parsed<CalendarDate> {
  if (month < 1 || month > 12) return { ok: false, reason: `there is no month ${month}.` };
  const last = daysInMonth(year, month);
  if (day < 1 || day > last) return { ok: false, reason: `day ${day} does not exist in month ${month} of ${year}.` };
  return { ok: true, value: { year, month, day } };
}

function readTimeOfDay(
  hText: string,
  mText: string,
  sText: string | undefined,
  fracText: string | undefined,
  ampm: string | undefined,
): Parsed<number> {
  let hour = Number(hText);
  const minute = Number(mText);
  const second = sText === undefined ? 0 : Number(sText);
  const ms = fracText === undefined ? 0 : Number(fracText.slice(0, 3).padEnd(3, '0'));
  if (minute > 59) return { ok: false, reason: `minute ${minute} is out of range (0 to 59).` };
  if (second > 59) return { ok: false, reason: `second ${second} is out of range (0 to 59).` };
  if (ampm !== undefined) {
    if (hour < 1 || hour > 12)
      return { ok: false, reason: `hour ${hour} is out of range for a 12-hour clock (1 to 12).` };
    const pm = ampm.toLowerCase() === 'p';
    hour = (hour % 12) + (pm ? 12 : 0);
  } else if (hour === 24) {
    // 24:00 is the end of a day (ISO 8601 allows it); 24:10 is not a time.
    if (minute !== 0 || second !== 0 || ms !== 0)
      return { ok: false, reason: 'after 24:00 comes 00:00; hour 24 is only allowed as 24:00.' };
  } else if (hour > 23) {
    return { ok: false, reason: `hour ${hour} is out of range (0 to 23, or 24:00 for the end of a day).` };
  }
  return { ok: true, value: ((hour * 60 + minute) * 60 + second) * 1000 + ms };
}

function readZone(text: string | undefined): Parsed<number | null> {
  if (text === undefined) return { ok: true, value: null };
  if (text === 'Z' || text === 'z') return { ok: true, value: 0 };
  const sign = text.startsWith('-') ? -1 : 1;
  const digits = text.slice(1).replace(':', '');
  const hours = Number(digits.slice(0, 2));
  const minutes = digits.length > 2 ? Number(digits.slice(2)) : 0;
  if (hours > 14 || minutes > 59) return { ok: false, reason: `the time zone offset ${text} is out of range.` };
  return { ok: true, value: sign * (hours * 60 + minutes) };
}

/** The digit at position i of a text, or -1. */
function digitAt(text: string, i: number): number {
  const c = text.charCodeAt(i) - 48;
  return c >= 0 && c <= 9 ? c : -1;
}

/**
 * "YYYY-MM-DD HH:MM" or "YYYY-MM-DDTHH:MM:SS" (no zone, no fraction), the
 * form of most long gauge records, read by position; undefined for every
 * other cell, and for any field out of range, which the general path
 * reads and explains. Gives what the general path gives for the same cell.
 */
function plainIsoClock(text: string): Parsed<ClockReading> | undefined {
  const n = text.length;
  if (n !== 16 && n !== 19) return undefined;
  if (text[4] !== '-' || text[7] !== '-' || text[13] !== ':' || (text[10] !== ' ' && text[10] !== 'T'))
    return undefined;
  if (n === 19 && text[16] !== ':') return undefined;
  const at = [0, 1, 2, 3, 5, 6, 8, 9, 11, 12, 14, 15, 17, 18];
  const d: number[] = [];
  for (let k = 0; k < (n === 19 ? 14 : 12); k++) {
    const v = digitAt(text, at[k] as number);
    if (v < 0) return undefined;
    d.push(v);
  }
  const num = (k: number): number => (d[k] as number) * 10 + (d[k + 1] as number);
  const year = num(0) * 100 + num(2);
  const month = num(4);
  const day = num(6);
  const hour = num(8);
  const minute = num(10);
  const second = n === 19 ? num(12) : 0;
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return undefined;
  if (hour > 23 || minute > 59 || second > 59) return undefined;
  return {
    ok: true,
    value: {
      date: { year, month, day },
      hasTime: true,
      msOfDay: ((hour * 60 + minute) * 60 + second) * 1000,
      zoneMinutes: null,
    },
  };
}

/** Two digits at position i of a text, or -1. */
function twoDigitsAt(text: string, i: number): number {
  const a = text.charCodeAt(i) - 48;
  const b = text.charCodeAt(i + 1) - 48;
  return a >= 0 && a <= 9 && b >= 0 && b <= 9 ? a * 10 + b : -1;
}

/**
 * The cell text[start, end) in plainIsoClock's form, as milliseconds on the
 * zone-free timeline (what readTimes takes from it: its date's midnight plus
 * the time of day); NaN for any other cell. Read by position without a
 * string or an object per cell, for the long-record reader (plain-columns.ts).
 */
export function plainIsoMsAt(text: string, start: number, end: number): number {
  const n = end - start;
  if (n !== 16 && n !== 19) return NaN;
  const sep = text.charCodeAt(start + 10);
  if (
    text.charCodeAt(start + 4) !== 45 ||
    text.charCodeAt(start + 7) !== 45 ||
    text.charCodeAt(start + 13) !== 58 ||
    (sep !== 32 && sep !== 84) ||
    (n === 19 && text.charCodeAt(start + 16) !== 58)
  )
    return NaN;
  const century = twoDigitsAt(text, start);
  const yy = twoDigitsAt(text, start + 2);
  const month = twoDigitsAt(text, start + 5);
  const day = twoDigitsAt(text, start + 8);
  const hour = twoDigitsAt(text, start + 11);
  const minute = twoDigitsAt(text, start + 14);
  const second = n === 19 ? twoDigitsAt(text, start + 17) : 0;
  if (century < 0 || yy < 0 || day < 0 || hour < 0 || minute < 0 || second < 0) return NaN;
  const year = century * 100 + yy;
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return NaN;
  if (hour > 23 || minute > 59 || second > 59) return NaN;
  return daysFromCivil(year, month, day) * MS_PER_DAY + ((hour * 60 + minute) * 60 + second) * 1000;
}

/** Reads one clock cell. Never throws; a cell it cannot read gives a reason. */
export function parseClock(cell: string, order: DateOrder): Parsed<ClockReading> {
  const text = cell.trim();
  if (text === '') return { ok: false, reason: 'the time is missing.' };
  const quick = plainIsoClock(text);
  if (quick !== undefined) return quick;
  let m = TIME_ONLY.exec(text);
  if (m) {
    const t = readTimeOfDay(m[1] as string, m[2] as string, m[3], m[4], m[5]);
    if (!t.ok) return t;
    return { ok: true, value: { date: null, hasTime: true, msOfDay: t.value, zoneMinutes: null } };
  }
  let year: number;
  let month: number;
  let day: number;
  let yearLast = false;
  m = YEAR_FIRST.exec(text);
  if (m) {
    year = Number(m[1]);
    month = Number(m[3]);
    day = Number(m[4]);
  } else {
    m = YEAR_LAST.exec(text);
    if (!m) return { ok: false, reason: `not a time; ${CLOCK_HELP}` };
    if ((m[4] as string).length === 2) {
      return {
        ok: false,
        reason: 'the year has two digits; write it with four (2024, not 24) so the date is not misread.',
      };
    }
    year = Number(m[4]);
    yearLast = true;
    const first = Number(m[1]);
    const second = Number(m[3]);
    day = order === 'day-month' ? first : second;
    month = order === 'day-month' ? second : first;
  }
  const date = checkDate(year, month, day);
  if (!date.ok) {
    if (!yearLast) return date;
    const readAs = order === 'day-month' ? 'day first' : 'month first';
    return {
      ok: false,
      reason: `${date.reason.slice(0, -1)} (dates are read ${readAs}; change the date order if that is wrong).`,
    };
  }
  if (m[5] === undefined)
    return { ok: true, value: { date: date.value, hasTime: false, msOfDay: 0, zoneMinutes: null } };
  const t = readTimeOfDay(m[5], m[6] as string, m[7], m[8], m[9]);
  if (!t.ok) return t;
  const zone = readZone(m[10]);
  if (!zone.ok) return zone;
  return { ok: true, value: { date: date.value, hasTime: true, msOfDay: t.value, zoneMinutes: zone.value } };
}

/** True when the cell reads as a clock time under either date order. */
export function looksLikeClock(cell: string): boolean {
  return parseClock(cell, 'day-month').ok || parseClock(cell, 'month-day').ok;
}

/** Milliseconds of a calendar date's midnight on a zone-free timeline. */
export function dateMs(date: CalendarDate): number {
  return daysFromCivil(date.year, date.month, date.day) * MS_PER_DAY;
}

/** Reads a "YYYY-MM-DD" date (as typed into a settings field). */
export function parseIsoDate(text: string): Parsed<CalendarDate> {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
  if (!m) return { ok: false, reason: 'write the date as YYYY-MM-DD, for example 2024-05-01.' };
  return checkDate(Number(m[1]), Number(m[2]), Number(m[3]));
}

/** Where hour 0 of a time line sits on the calendar. */
export interface CalendarOrigin {
  /** Wall-clock reading of hour 0, as milliseconds on a zone-free timeline. */
  readonly wallMs: number;
  /** The zone offset the times were written in, minutes; null when they had none. */
  readonly zoneMinutes: number | null;
}

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

/**
 * ISO 8601 text for the instant `offsetH` hours after the origin, in the
 * origin's own zone: "2024-05-01T10:00:00" without a zone (as the times were
 * written), "2024-05-01T10:00:00+10:00" or "…Z" with one.
 */
export function isoAt(origin: CalendarOrigin, offsetH: number): string {
  return writeIsoDateTime(origin.wallMs + Math.round(offsetH * MS_PER_HOUR), zoneText(origin.zoneMinutes));
}

/** A time of day in milliseconds as HH:MM (or HH:MM:SS when seconds are set). */
export function formatTimeOfDay(msOfDay: number): string {
  const totalS = Math.round(msOfDay / 1000);
  const h = Math.floor(totalS / 3600);
  const m = Math.floor((totalS % 3600) / 60);
  const s = totalS % 60;
  return s === 0 ? `${pad(h)}:${pad(m)}` : `${pad(h)}:${pad(m)}:${pad(s)}`;
}

/** The cells of one row that hold its time. */
export interface TimeSource {
  readonly line: number;
  readonly cell: string;
  /** The date cell when dates and times are in separate columns. */
  readonly dateCell?: string;
}

export interface TimeReadOptions {
  readonly kind: Exclude<TimeKind, 'none'>;
  readonly decimal: DecimalMark;
  /** Thousands separator of elapsed times ("1,440" minutes); default none. */
  readonly grouping?: Grouping;
  readonly dateOrder: DateOrder;
  /** Date of the first time when the times are times of day with no date; null leaves them off the calendar. */
  readonly dateForTimesOfDay: CalendarDate | null;
  /** 1-based columns, for problems. */
  readonly column: number;
  readonly dateColumn: number | null;
}

export interface TimeLine {
  /** Hours after the first readable time, one per source; NaN where a time could not be used. */
  readonly hours: number[];
  /** Calendar place of hour 0, or null (elapsed times, or times of day with no date given). */
  readonly origin: CalendarOrigin | null;
  /** Time of day of hour 0 when times were times of day, else null. */
  readonly firstTimeOfDayMs: number | null;
}

interface Instant {
  /** Milliseconds (clock: zone-free wall time corrected by the zone offset; time of day: after midnight). */
  readonly ms: number;
  readonly dated: boolean;
  readonly zoned: boolean;
  readonly zoneMinutes: number | null;
}

function describeTimeKind(kind: Exclude<TimeKind, 'none'>): string {
  return kind === 'elapsed-min' ? 'minutes' : kind === 'elapsed-h' ? 'hours' : 'a clock time';
}

function readInstant(source: TimeSource, options: TimeReadOptions, problems: ProblemList): Instant | null {
  const { line, cell } = source;
  if (options.kind !== 'clock') {
    const v = parseNumber(cell, options.decimal, options.grouping);
    if (Number.isNaN(v)) {
      const expected = `expected elapsed ${describeTimeKind(options.kind)}`;
      const reason =
        cell.trim() === ''
          ? `${expected}; the time is missing.`
          : looksLikeClock(cell)
            ? `${expected}, but this is a clock time; set the time kind to clock.`
            : `${expected}; ${notANumberReason(cell, options.decimal, options.grouping)}`;
      problems.add(problem(line, options.column, 'time', cell, reason));
      return null;
    }
    const ms = options.kind === 'elapsed-min' ? v * 60_000 : v * MS_PER_HOUR;
    return { ms, dated: false, zoned: false, zoneMinutes: null };
  }
  if (options.dateColumn !== null) {
    const dateCell = source.dateCell ?? '';
    const d = parseClock(dateCell, options.dateOrder);
    if (!d.ok) {
      problems.add(problem(line, options.dateColumn, 'date', dateCell, d.reason));
      return null;
    }
    if (d.value.date === null || (d.value.hasTime && d.value.msOfDay !== 0)) {
      problems.add(
        problem(
          line,
          options.dateColumn,
          'date',
          dateCell,
          'expected a date alone in the date column (the time is in its own column).',
        ),
      );
      return null;
    }
    const t = parseClock(cell, options.dateOrder);
    if (!t.ok) {
      problems.add(problem(line, options.column, 'time', cell, t.reason));
      return null;
    }
    if (t.value.date !== null) {
      problems.add(
        problem(
          line,
          options.column,
          'time',
          cell,
          'this cell holds a date as well; with a separate date column the time column must hold a time of day only.',
        ),
      );
      return null;
    }
    return { ms: dateMs(d.value.date) + t.value.msOfDay, dated: true, zoned: false, zoneMinutes: null };
  }
  const c = parseClock(cell, options.dateOrder);
  if (!c.ok) {
    const numeric = !Number.isNaN(parseNumber(cell, options.decimal, options.grouping));
    const hint = numeric ? ' It is a plain number: set the time kind to elapsed minutes or hours.' : '';
    problems.add(problem(line, options.column, 'time', cell, `${c.reason}${hint}`));
    return null;
  }
  const r = c.value;
  if (r.date === null) return { ms: r.msOfDay, dated: false, zoned: false, zoneMinutes: null };
  const zone = r.zoneMinutes;
  return {
    ms: dateMs(r.date) + r.msOfDay - (zone ?? 0) * 60_000,
    dated: true,
    zoned: zone !== null,
    zoneMinutes: zone,
  };
}

/**
 * Reads a column of times into hours after the first time. Every cell that
 * cannot be read, and every time that is not later than the one before, adds
 * a problem naming its line and column and gets NaN.
 */
export function readTimes(sources: readonly TimeSource[], options: TimeReadOptions, problems: ProblemList): TimeLine {
  const hours: number[] = new Array<number>(sources.length).fill(NaN);
  let first: Instant | null = null;
  let prev: { ms: number; line: number; cell: string } | null = null;
  let dayOffsetMs = 0;
  for (let i = 0; i < sources.length; i++) {
    const source = sources[i] as TimeSource;
    const instant = readInstant(source, options, problems);
    if (instant === null) continue;
    const { line, cell } = source;
    if (first === null) {
      // The record's start clock falls in the years a start may have (core/time-limits.ts).
      const year = instant.dated ? wallClockParts(instant.ms + (instant.zoneMinutes ?? 0) * 60_000)?.year : undefined;
      if (year !== undefined && (year < FIRST_CLOCK_YEAR || year > LAST_CLOCK_YEAR)) {
        problems.add(
          problem(
            line,
            options.dateColumn ?? options.column,
            options.dateColumn === null ? 'time' : 'date',
            options.dateColumn === null ? cell : (source.dateCell ?? ''),
            `the first time is in the year ${year}; a record starts in the years ${FIRST_CLOCK_YEAR} to ${LAST_CLOCK_YEAR} (check the year).`,
          ),
        );
        return { hours, origin: null, firstTimeOfDayMs: null };
      }
      first = instant;
    } else if (instant.dated !== first.dated) {
      problems.add(
        problem(
          line,
          options.column,
          'time',
          cell,
          instant.dated
            ? 'this time has a date but the first time does not; give all times a date, or none.'
            : 'this time has no date but the first time does; give all times a date, or none.',
        ),
      );
      continue;
    } else if (instant.zoned !== first.zoned) {
      problems.add(
        problem(
          line,
          options.column,
          'time',
          cell,
          instant.zoned
            ? 'this time has a time zone but the first time does not; give all times a zone, or none.'
            : 'this time has no time zone but the first time has one; give all times a zone, or none.',
        ),
      );
      continue;
    }
    let ms = instant.ms + dayOffsetMs;
    if (prev !== null && ms <= prev.ms) {
      const overMidnight = ms + MS_PER_DAY - prev.ms;
      const timeOfDay = options.kind === 'clock' && !instant.dated;
      if (timeOfDay && ms < prev.ms && overMidnight <= MAX_MIDNIGHT_STEP_MS) {
        dayOffsetMs += MS_PER_DAY;
        ms += MS_PER_DAY;
      } else {
        const reason =
          ms === prev.ms
            ? `this time is the same as the time on line ${prev.line} ("${prev.cell}"); times must increase.`
            : timeOfDay
              ? `this time is earlier than the time on line ${prev.line} ("${prev.cell}"); times must increase ` +
                `(a time of day is read as the next day only when the step over midnight is at most 12 h, here it would be ${formatDuration(overMidnight / MS_PER_HOUR)}).`
              : `this time is earlier than the time on line ${prev.line} ("${prev.cell}"); times must increase.`;
        problems.add(problem(line, options.column, 'time', cell, reason));
        continue;
      }
    }
    // The limits of time (core/time-limits.ts): steps of at least a second, a record of at most 500 years.
    const stepH = prev === null ? Infinity : (ms - prev.ms) / MS_PER_HOUR;
    const fromFirstH = (ms - first.ms) / MS_PER_HOUR;
    const past =
      prev !== null && isBelowMinStep(stepH)
        ? `this time is only ${describeHours(stepH)} after the time on line ${prev.line} ("${prev.cell}"); times are at least 1 second apart.`
        : !(Math.abs(fromFirstH) <= MAX_RECORD_H)
          ? `this time is ${describeHours(fromFirstH)} after the first time; a record spans at most ${MAX_RECORD_YEARS} years.`
          : null;
    if (past !== null) {
      problems.add(problem(line, options.column, 'time', cell, past));
      continue;
    }
    hours[i] = fromFirstH;
    prev = { ms, line, cell };
  }
  let origin: CalendarOrigin | null = null;
  let firstTimeOfDayMs: number | null = null;
  if (first !== null && options.kind === 'clock') {
    if (first.dated) {
      const zone = first.zoneMinutes;
      origin = { wallMs: first.ms + (zone ?? 0) * 60_000, zoneMinutes: zone };
    } else {
      firstTimeOfDayMs = first.ms;
      if (options.dateForTimesOfDay !== null) {
        origin = { wallMs: dateMs(options.dateForTimesOfDay) + first.ms, zoneMinutes: null };
      }
    }
  }
  return { hours, origin, firstTimeOfDayMs };
}

/** Median of the positive steps between successive values (NaN entries skipped). */
function medianStep(values: readonly number[]): number {
  const steps: number[] = [];
  let prev = NaN;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    if (!Number.isNaN(prev) && v > prev) steps.push(v - prev);
    prev = v;
  }
  if (steps.length === 0) return NaN;
  steps.sort((a, b) => a - b);
  return steps[Math.floor(steps.length / 2)] as number;
}

/**
 * Minutes or hours for a column of elapsed times. The column name decides
 * when it says ("min", "hours", "h", "hr"); otherwise whole numbers stepping
 * by 5 or more are minutes (5, 10, 15 …) and anything else is hours
 * (1, 2, 3 … or 0.25, 0.5 …).
 */
export function guessElapsedKind(values: readonly number[], columnName: string): 'elapsed-min' | 'elapsed-h' {
  const name = columnName.toLowerCase();
  if (/min/.test(name)) return 'elapsed-min';
  if (/hour|\bhrs?\b|\bh\b/.test(name)) return 'elapsed-h';
  const allWhole = values.every((v) => Number.isNaN(v) || Number.isInteger(v));
  return allWhole && medianStep(values) >= 5 ? 'elapsed-min' : 'elapsed-h';
}

const SLASHED = /^(\d{1,2})[-/.](\d{1,2})[-/.]\d{4}/;

/**
 * Day-first or month-first for dates like 01/05/2024. A first number above 12
 * settles day-first, a second above 12 month-first. Otherwise the order under
 * which the times rise in the smallest steps wins (successive readings are
 * hours or days apart, not months); a tie is read day-first, and the preview
 * shows the resulting start date so a wrong reading is seen.
 */
export function guessDateOrder(cells: readonly string[]): DateOrder {
  let dayFirstProof = false;
  let monthFirstProof = false;
  let slashed = 0;
  for (const cell of cells) {
    const m = SLASHED.exec(cell.trim());
    if (!m) continue;
    slashed++;
    if (Number(m[1]) > 12) dayFirstProof = true;
    if (Number(m[2]) > 12) monthFirstProof = true;
  }
  if (slashed === 0 || dayFirstProof !== monthFirstProof) return monthFirstProof ? 'month-day' : 'day-month';
  const score = (order: DateOrder): number => {
    let total = 0;
    let prev = NaN;
    for (const cell of cells) {
      const c = parseClock(cell, order);
      if (!c.ok || c.value.date === null) continue;
      const ms = dateMs(c.value.date) + c.value.msOfDay;
      if (!Number.isNaN(prev)) total += ms >= prev ? ms - prev : 1e15;
      prev = ms;
    }
    return total;
  };
  return score('month-day') < score('day-month') ? 'month-day' : 'day-month';
}
