import { InputError } from './errors';

/**
 * The one statement of how long and where in time a record may be. Every
 * time and duration that enters Raincut (a bar, a storm, a streamflow
 * sample, the offset between a record and its storm, a start clock) is held
 * to these limits at the edge, so that every moment the screen may have to
 * write as a date lies far inside what the browser's clock can write (a
 * Date holds ±8.64·10¹⁵ ms, about ±275,000 years from 1970; past that,
 * `Intl.DateTimeFormat.format` throws "Invalid time value").
 *
 * - A storm, a streamflow record, and the offset between them each span at
 *   most 500 years: the longest gauge records run about three centuries,
 *   so this is generous for any real record and tiny beside the clock's range
 *   (our own bound, common practice has no number for it).
 * - A bar, and the step between two streamflow samples, last at least one
 *   second: loggers time-stamp to the second; anything shorter is a unit
 *   slip, not rainfall (our own bound).
 * - A start clock (a storm's or a record's) falls in the years 1000 to
 *   2999: four-digit years as ISO 8601 writes them without an agreement on
 *   expanded years (ISO 8601-1:2019 §4.3.2), with room on both sides for the
 *   record's own length, so every moment of a record falls between about
 *   the years 0 and 4000.
 */
export const MAX_RECORD_YEARS = 500;

/** Hours in a Julian year of 365.25 days (the mean calendar year, to within 0.01 %). */
export const HOURS_PER_YEAR = 365.25 * 24;

/** Longest storm, streamflow record, or offset between the two, h (500 × 8766 = 4,383,000 h). */
export const MAX_RECORD_H = MAX_RECORD_YEARS * HOURS_PER_YEAR;

/** Shortest bar, and shortest step between two streamflow samples, h (one second). */
export const MIN_STEP_H = 1 / 3600;

/** First and last calendar year of a start clock. */
export const FIRST_CLOCK_YEAR = 1000;
export const LAST_CLOCK_YEAR = 2999;

/**
 * Rounding allowed below MIN_STEP_H: a one-second step computed as the
 * difference of two times hundreds of years in (hours near 4·10⁶, where
 * one unit in the last place is ~10⁻⁹ h) may fall a few microseconds short.
 * 10⁻⁴ s is far above that rounding and far below anything a logger writes.
 */
const MIN_STEP_SLACK_H = 1e-4 / 3600;

/** The limits in one sentence, for help texts and messages. */
export const TIME_LIMITS_TEXT =
  `a storm or streamflow record spans at most ${MAX_RECORD_YEARS} years, a bar or a step between samples ` +
  `lasts at least 1 second, and a start clock falls in the years ${FIRST_CLOCK_YEAR} to ${LAST_CLOCK_YEAR}`;

// The formatters are made at first use, not at load: the page's first Intl formatter loads the browser's locale
// data, 20–60 ms that otherwise fell in the task evaluating the app's script (measured, bench:ui link-largest).
let plainNumberFormat: Intl.NumberFormat | undefined;
const plainNumber = (): Intl.NumberFormat =>
  (plainNumberFormat ??= new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 }));

/**
 * A span of hours in words a person reads at a glance: "1.5 s", "12 min",
 * "36 h", "4.2 days", "1,141 years". Never throws; non-finite values are
 * written as they are.
 */
export function describeHours(hours: number): string {
  if (!Number.isFinite(hours)) return String(hours);
  const h = Math.abs(hours);
  const sign = hours < 0 ? '−' : '';
  if (h < 1 / 60) return `${sign}${plainNumber().format(h * 3600)} s`;
  if (h < 1) return `${sign}${plainNumber().format(h * 60)} min`;
  if (h < 72) return `${sign}${plainNumber().format(h)} h`;
  if (h < 3 * HOURS_PER_YEAR) return `${sign}${plainNumber().format(h / 24)} days`;
  return `${sign}${plainNumber().format(h / HOURS_PER_YEAR)} years`;
}

let groupedFormat: Intl.NumberFormat | undefined;
const grouped = (): Intl.NumberFormat =>
  (groupedFormat ??= new Intl.NumberFormat('en-US', { maximumFractionDigits: 3 }));
// MAX_RECORD_H is a whole number of hours (500 × 8766): its digits grouped by three, as en-US writes them.
const LONGEST = `${String(MAX_RECORD_H).replace(/\B(?=(\d{3})+$)/g, ',')} h`;

/** The longest span in words: "500 years (4,383,000 h)". */
export const LONGEST_SPAN_TEXT = `${MAX_RECORD_YEARS} years (${LONGEST})`;

/**
 * A value past the longest span, in hours and in years, so that one just
 * past the limit does not read as "500 years": "4,383,001.5 h, 500 years".
 */
export function describeOver(hours: number): string {
  return `${grouped().format(hours)} h, ${describeHours(hours)}`;
}

/**
 * The shortest step accepted: one second less the rounding allowance. Loops
 * over every bar compare with this (hoisted into a local) rather than call
 * isBelowMinStep, so that no call is made per bar.
 */
export const SHORTEST_STEP_ACCEPTED_H = MIN_STEP_H - MIN_STEP_SLACK_H;

/** True when `hours` is shorter than a bar or a step between samples may be (under one second, to rounding). */
export function isBelowMinStep(hours: number): boolean {
  return hours < SHORTEST_STEP_ACCEPTED_H;
}

/** True for a number of hours a bar may last (one second to 500 years). */
export function isBarDurationH(hours: number): boolean {
  return typeof hours === 'number' && !isBelowMinStep(hours) && hours <= MAX_RECORD_H;
}

/** True for a number of hours a span (a whole record, an offset, a sample time) may be, either sign. */
export function isSpanH(hours: number): boolean {
  return typeof hours === 'number' && Math.abs(hours) <= MAX_RECORD_H;
}

/** Why `hours` cannot be a bar duration (or step), or null. `what` names it: "Bar 3: duration", "The time step". */
export function stepProblem(what: string, hours: number): string | null {
  if (typeof hours !== 'number' || !Number.isFinite(hours) || !(hours > 0)) {
    return `${what} must be a finite number of hours greater than zero (got ${String(hours)}).`;
  }
  if (isBelowMinStep(hours)) {
    return `${what} must be at least 1 second (got ${describeHours(hours)}); check the unit.`;
  }
  if (hours > MAX_RECORD_H) {
    return `${what} must be at most ${MAX_RECORD_YEARS} years, ${LONGEST} (got ${describeOver(hours)}); check the unit.`;
  }
  return null;
}

/** Throws an InputError naming `field` (and bar `index`) when `hours` cannot be a bar duration or a step. */
export function checkStepH(field: string, what: string, hours: number, index?: number): void {
  const message = stepProblem(what, hours);
  if (message !== null) throw new InputError(field, message, index);
}

/** Why a span of `hours` (a whole storm, a record, an offset) is too long, or null. */
export function spanProblem(what: string, hours: number): string | null {
  if (typeof hours !== 'number' || !Number.isFinite(hours)) {
    return `${what} must be a finite number of hours (got ${String(hours)}).`;
  }
  if (Math.abs(hours) > MAX_RECORD_H) {
    return `${what} must be within ${MAX_RECORD_YEARS} years, ${LONGEST}, either way (got ${describeOver(hours)}).`;
  }
  return null;
}

/** Throws an InputError naming `field` when a span is longer than a record may be. */
export function checkSpanH(field: string, what: string, hours: number, index?: number): void {
  const message = spanProblem(what, hours);
  if (message !== null) throw new InputError(field, message, index);
}

const YEAR = /^(\d{4,})-/;

/**
 * Why the year of an ISO 8601 start clock falls outside the years a start
 * may have, or null (also null for text that does not start with a year:
 * that is the date-time check's to refuse).
 */
export function clockYearProblem(what: string, iso: string): string | null {
  const m = YEAR.exec(iso);
  if (!m) return null;
  const year = Number(m[1]);
  if (year >= FIRST_CLOCK_YEAR && year <= LAST_CLOCK_YEAR) return null;
  return `${what} "${iso}" is in the year ${m[1]}; a start clock falls in the years ${FIRST_CLOCK_YEAR} to ${LAST_CLOCK_YEAR}.`;
}
