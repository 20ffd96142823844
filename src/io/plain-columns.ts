import { FIRST_CLOCK_YEAR, LAST_CLOCK_YEAR, MAX_RECORD_H, isBelowMinStep, wallClockParts } from '../core';
import type { SeriesSettings } from './series';
import { normaliseText, readTable, type TextRow } from './table-text';
import { plainIsoMsAt, type TimeLine } from './time-values';

/**
 * A long record read straight into columns: one pass over the text by
 * character codes, no string, array or object per line. Only for what is
 * plainly readable: no quotes, a tab, comma or semicolon between cells (or
 * one cell a line), values of digits with at most one decimal mark, times
 * (if any) as "YYYY-MM-DD HH:MM[:SS]" rising by at least a second, no empty
 * line inside the data, nothing but ASCII. Anything else, and anything the
 * general reader (series.ts) would report as a problem, gives null: the
 * caller then reads the text with the general reader, whose messages name
 * the line, column and cell. So for every text this reader accepts, it
 * gives exactly the columns the general reader gives (test/io/plain-columns
 * checks that on random texts); it only gives them without the 10⁷ short-lived
 * objects that made a 10⁶-line read spend most of its time collecting garbage.
 */
export interface PlainColumns {
  readonly header: TextRow | null;
  /** The first data rows as the general splitter gives them (for the preview and the settings panel). */
  readonly headRows: readonly TextRow[];
  readonly rowCount: number;
  /** Line number (1-based) of the first data row; the data rows are on consecutive lines. */
  readonly firstLine: number;
  /** Largest number of cells on a data line. */
  readonly columnCount: number;
  /** The value column, as the general reader reads it (all finite and ≥ 0 here). */
  readonly values: Float64Array;
  /** The times, as readTimes gives them, or null without a time column. */
  readonly times: ColumnTimes | null;
}

/** A TimeLine (time-values.ts) with its hours in a column. */
export interface ColumnTimes extends Omit<TimeLine, 'hours'> {
  readonly hours: Float64Array;
}

const DELIMITER = { comma: 44, semicolon: 59, tab: 9 } as const;
const NO_DELIMITER = -1;
const MS_PER_HOUR = 3_600_000;

/** Powers of ten that a double holds exactly (10²² is the largest). */
const POW10 = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/** What String.prototype.trim removes, among the ASCII characters (anything above ASCII sends the text to the general reader). */
const isSpace = (c: number): boolean => c === 32 || (c >= 9 && c <= 13);

/**
 * The number in text[a, b) (already trimmed), when it is digits with at
 * most one decimal mark and an optional sign, finite and not negative;
 * NaN otherwise. Up to 15 digits and 22 decimals it is the quotient of two
 * doubles that hold their values exactly, which IEEE 754 division rounds
 * correctly, so it is the double nearest the decimal, as Number() reads it
 * (the "fast path" of Clinger 1990, How to read floating point numbers
 * accurately); longer cells go through Number() itself.
 */
export function plainNumberAt(text: string, a: number, b: number, mark: number): number {
  let i = a;
  const first = text.charCodeAt(a);
  const negative = first === 45;
  if (negative || first === 43) i++;
  let m = 0;
  let digits = 0;
  let decimals = 0;
  let marked = false;
  for (; i < b; i++) {
    const c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      m = m * 10 + (c - 48);
      digits++;
      if (marked) decimals++;
    } else if (c === mark && !marked) marked = true;
    else return NaN;
  }
  if (digits === 0) return NaN;
  let v: number;
  if (digits <= 15 && decimals <= 22) v = m / (POW10[decimals] as number);
  else {
    const cell = text.slice(a, b);
    v = Math.abs(Number(mark === 46 ? cell : cell.replace(',', '.')));
    if (!Number.isFinite(v)) return NaN;
  }
  // "-0" is 0; a negative value is a problem the general reader words.
  if (v === 0) return 0;
  return negative ? NaN : v;
}

/** Lines given to the general splitter to find the header and the first data row. */
const HEAD_LINES = 200;

/**
 * The value column and the time column of a plainly readable record, or
 * null (see PlainColumns). `settings` must have passed the import's check.
 * `headRows`: how many of the first data rows to keep as split.
 */
export function readPlainColumns(raw: string, s: SeriesSettings, headRows: number): PlainColumns | null {
  if (s.valuesAlong === 'line' || s.skipBlankLines === true || s.dateColumn !== null) return null;
  if (s.timeKind !== 'none' && s.timeKind !== 'clock') return null;
  const delimiter = s.separator === 'none' ? NO_DELIMITER : DELIMITER[s.separator as keyof typeof DELIMITER];
  if (delimiter === undefined) return null;
  const text = raw.charCodeAt(0) === 0xfeff || raw.includes('\r') ? normaliseText(raw) : raw;
  if (text.includes('"')) return null;

  // The header and the first data row, found by the general splitter on the first lines.
  let headEnd = 0;
  const lineStarts: number[] = [0];
  for (let k = 0; k < s.skipLines + HEAD_LINES; k++) {
    const nl = text.indexOf('\n', headEnd);
    if (nl === -1) {
      headEnd = text.length;
      break;
    }
    headEnd = nl + 1;
    lineStarts.push(headEnd);
  }
  const head = readTable(text.slice(0, headEnd), {
    separator: s.separator,
    skipLines: s.skipLines,
    hasHeader: s.hasHeader,
  });
  const firstRow = head.rows[0];
  if (firstRow === undefined) return null;
  const firstLine = firstRow.line;
  const mark = s.decimal === 'comma' ? 44 : 46;
  const valueColumn = s.valueColumn;
  const timeColumn = s.timeKind === 'clock' ? (s.timeColumn as number) : 0;

  // Columns as long as the lines left (at most), filled in place: no growing array is copied or collected.
  let lines = 1;
  for (let i = text.indexOf('\n', lineStarts[firstLine - 1]); i !== -1; i = text.indexOf('\n', i + 1)) lines++;
  const values = new Float64Array(lines);
  const hours = timeColumn > 0 ? new Float64Array(lines) : null;
  let count = 0;
  let columnCount = 0;
  let firstMs = NaN;
  let prevMs = NaN;
  let ended = false;
  const n = text.length;
  for (let from = lineStarts[firstLine - 1] as number; from <= n;) {
    let end = text.indexOf('\n', from);
    if (end === -1) end = n;
    let cells = 1;
    let cellStart = from;
    let blank = true;
    let va = -1;
    let vb = -1;
    let ta = -1;
    let tb = -1;
    for (let i = from; i <= end; i++) {
      const c = i < end ? text.charCodeAt(i) : delimiter;
      if (c === delimiter) {
        if (cells === valueColumn) {
          va = cellStart;
          vb = i;
        } else if (cells === timeColumn) {
          ta = cellStart;
          tb = i;
        }
        if (i < end) cells++;
        cellStart = i + 1;
      } else if (c > 127) return null;
      else if (blank && !isSpace(c)) blank = false;
    }
    from = end + 1;
    if (blank) {
      // Empty lines at the end are no data; one between data lines is for the general reader to report or skip.
      ended = true;
      continue;
    }
    if (ended) return null;
    if (cells > columnCount) columnCount = cells;
    if (va < 0) return null;
    // Trimmed in place (no pair returned per line: 10⁶ of them showed in the profile).
    while (va < vb && isSpace(text.charCodeAt(va))) va++;
    while (vb > va && isSpace(text.charCodeAt(vb - 1))) vb--;
    if (va === vb) return null;
    const v = plainNumberAt(text, va, vb, mark);
    if (Number.isNaN(v)) return null;
    values[count] = v;
    if (hours === null) {
      count++;
      continue;
    }
    if (ta < 0) return null;
    while (ta < tb && isSpace(text.charCodeAt(ta))) ta++;
    while (tb > ta && isSpace(text.charCodeAt(tb - 1))) tb--;
    const ms = plainIsoMsAt(text, ta, tb);
    if (Number.isNaN(ms)) return null;
    // readTimes' checks, in its order and with its arithmetic; any breach is for it to word.
    if (count === 0) {
      const year = wallClockParts(ms)?.year;
      if (year === undefined || year < FIRST_CLOCK_YEAR || year > LAST_CLOCK_YEAR) return null;
      firstMs = ms;
    } else if (ms <= prevMs || isBelowMinStep((ms - prevMs) / MS_PER_HOUR)) return null;
    const fromFirstH = (ms - firstMs) / MS_PER_HOUR;
    if (!(Math.abs(fromFirstH) <= MAX_RECORD_H)) return null;
    hours[count++] = fromFirstH;
    prevMs = ms;
  }
  return {
    header: head.header,
    headRows: head.rows.slice(0, headRows),
    rowCount: count,
    firstLine,
    columnCount,
    values: values.subarray(0, count),
    times:
      hours === null
        ? null
        : { hours: hours.subarray(0, count), origin: { wallMs: firstMs, zoneMinutes: null }, firstTimeOfDayMs: null },
  };
}

/**
 * A column as a plain array (what a scenario holds and JSON writes), copied
 * by a counted loop into an array made at its length: several times faster
 * than Array.from, which goes through the typed array's iterator.
 */
export function plainArray(column: ArrayLike<number>): number[] {
  const n = column.length;
  const plain = new Array<number>(n);
  for (let k = 0; k < n; k++) plain[k] = column[k] as number;
  return plain;
}
