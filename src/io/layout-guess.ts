import {
  detectNumberStyle,
  isMissingCell,
  looksNumeric,
  parseNumber,
  type DecimalMark,
  type Grouping,
  type NumberStyle,
} from './numbers';
import { detectSeparator, readTable, splitRows, type Separator, type TextRow, type TextTable } from './table-text';
import {
  guessDateOrder,
  guessElapsedKind,
  looksLikeClock,
  parseClock,
  type DateOrder,
  type TimeKind,
} from './time-values';

/**
 * First guesses at how a paste is laid out, shared by the rainfall and the
 * streamflow import. Every guess ends up as a plain setting the user can
 * change in the preview; nothing here is final.
 */
export interface LayoutGuess {
  readonly separator: Separator;
  readonly decimal: DecimalMark;
  readonly grouping: Grouping;
  /** 'line' when the values run along one line (a spreadsheet row copied), not down a column. */
  readonly valuesAlong: 'column' | 'line';
  readonly skipLines: number;
  readonly hasHeader: boolean;
  /** The head of the table (its first HEAD_LINES lines) as read with the guessed separator, skip and header. */
  readonly table: TextTable;
  readonly dateColumn: number | null;
  readonly timeColumn: number | null;
  readonly timeKind: TimeKind;
  readonly dateOrder: DateOrder;
  /** Columns (1-based, in order) other than the time and date whose cells are mostly numbers. */
  readonly numberColumns: readonly number[];
}

/** Rows looked at for guesses: enough to see the pattern, bounded for long records. */
const SAMPLE_ROWS = 500;
/** How far down a title block may reach before the data starts. */
const HEADER_SEARCH_ROWS = 200;
/**
 * Lines of the text the guesses read: past the title block and the rows
 * sampled, with room for blank lines. A record of 10⁶ lines is guessed from
 * its head in milliseconds instead of being split whole (twice) to look at
 * its first 500 rows.
 */
export const HEAD_LINES = 5000;

/** The first `lines` lines of the text (all of it when shorter). */
export function headOf(text: string, lines: number): string {
  let at = -1;
  for (let k = 0; k < lines; k++) {
    at = text.indexOf('\n', at + 1);
    if (at === -1) return text;
  }
  return text.slice(0, at);
}

const TIME_NAME = /time|date|clock|elapsed|\bmin|minute|hour|\bhrs?\b|\bh\b|\bt\b|stamp/i;
/** Columns that count bars or rows rather than measure anything. */
const INDEX_NAME = /^\s*(?:bar|bar\s*(?:no\.?|number|#)|no\.?|#|n|nr\.?|index|step|row|id|interval)\s*$/i;

type CellKind = 'empty' | 'data' | 'word' | 'other';

function cellKind(cell: string): CellKind {
  if (cell === '' || isMissingCell(cell)) return 'empty';
  if (looksNumeric(cell) || looksLikeClock(cell)) return 'data';
  // A number with a few letters stuck to it ("1.2mm", "3 in") is a bad value, not a column name.
  if (/\p{L}/u.test(cell) && !/^[+-]?\d+(?:[.,]\d+)?\s*\p{L}{0,3}\.?$/u.test(cell)) return 'word';
  return 'other';
}

type RowKind = 'blank' | 'data' | 'header' | 'mixed';

function rowKind(row: TextRow): RowKind {
  let data = 0;
  let words = 0;
  let other = 0;
  for (const cell of row.cells) {
    const k = cellKind(cell);
    if (k === 'data') data++;
    else if (k === 'word') words++;
    else if (k === 'other') other++;
  }
  if (data + words + other === 0) return 'blank';
  if (words === 0 && other === 0) return 'data';
  if (data === 0 && other === 0) return 'header';
  return 'mixed';
}

/**
 * Where the data starts. The first line whose cells are all numbers or times
 * is data. Walking up from it, lines that are not all words are taken as data
 * too (a bad first row must be reported, never swallowed as a header); the
 * first all-words line met is the header, and lines above it are skipped.
 */
function guessHeader(rows: readonly TextRow[]): { skipLines: number; hasHeader: boolean } {
  const limit = Math.min(rows.length, HEADER_SEARCH_ROWS);
  let first = -1;
  for (let i = 0; i < limit; i++) {
    if (rowKind(rows[i] as TextRow) === 'data') {
      first = i;
      break;
    }
  }
  if (first === -1) {
    // No clean data line: a words-only first line with more lines below is still most likely a header.
    const nonBlank = rows.filter((r) => r.cells.length > 0);
    const top = nonBlank[0];
    const hasHeader = top !== undefined && nonBlank.length > 1 && rowKind(top) === 'header';
    return { skipLines: 0, hasHeader };
  }
  for (let j = first - 1; j >= 0; j--) {
    const kind = rowKind(rows[j] as TextRow);
    if (kind === 'blank') continue;
    if (kind === 'header') return { skipLines: (rows[j] as TextRow).line - 1, hasHeader: true };
  }
  return { skipLines: 0, hasHeader: false };
}

interface ColumnStats {
  nonEmpty: number;
  numeric: number;
  clock: number;
  dateOnly: number;
  timeOfDay: number;
  values: number[];
  cells: string[];
}

function columnStats(rows: readonly TextRow[], column: number, style: NumberStyle): ColumnStats {
  const stats: ColumnStats = { nonEmpty: 0, numeric: 0, clock: 0, dateOnly: 0, timeOfDay: 0, values: [], cells: [] };
  for (const row of rows) {
    const cell = row.cells[column] ?? '';
    if (cell === '' || isMissingCell(cell)) continue;
    stats.nonEmpty++;
    stats.cells.push(cell);
    const v = parseNumber(cell, style.decimal, style.grouping);
    stats.values.push(v);
    if (!Number.isNaN(v)) {
      stats.numeric++;
      continue;
    }
    const c = parseClock(cell, 'day-month');
    const read = c.ok ? c : parseClock(cell, 'month-day');
    if (!read.ok) continue;
    stats.clock++;
    if (read.value.date === null) stats.timeOfDay++;
    else if (!read.value.hasTime) stats.dateOnly++;
  }
  return stats;
}

const mostly = (count: number, stats: ColumnStats): boolean => stats.nonEmpty > 0 && count * 2 >= stats.nonEmpty;

function rises(values: readonly number[]): boolean {
  let prev = -Infinity;
  let n = 0;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    if (!(v > prev)) return false;
    prev = v;
    n++;
  }
  return n >= 2;
}

/**
 * Guesses separator, decimal mark and grouping, header, and the time and
 * date columns. `isValueName` tells whether a column name names the value
 * being imported (rain depth, discharge), so such a column is not taken for
 * elapsed time. `preferred` is the reader's own way of writing numbers: it
 * settles what the text leaves open ("1,200": twelve hundred, or 1.2).
 */
export function guessLayout(
  whole: string,
  isValueName: (name: string) => boolean,
  preferred?: NumberStyle,
): LayoutGuess {
  const text = headOf(whole, HEAD_LINES);
  const separator = detectSeparator(text);
  const raw = splitRows(text, separator).rows;
  const sampleCells: string[] = [];
  // One cell at a time: `push(...cells)` overflows the call stack on a line of ~10⁵ cells.
  for (const row of raw.slice(0, SAMPLE_ROWS)) for (const cell of row.cells) sampleCells.push(cell);
  const style = detectNumberStyle(sampleCells, separator === 'comma', preferred);
  const { skipLines, hasHeader } = guessHeader(raw);
  const table = readTable(text, { separator, skipLines, hasHeader });
  const sample = table.rows.filter((r) => r.cells.length > 0).slice(0, SAMPLE_ROWS);
  const name = (c: number): string => table.header?.cells[c] ?? '';
  const stats: ColumnStats[] = [];
  for (let c = 0; c < table.columnCount; c++) stats.push(columnStats(sample, c, style));
  // One line of numbers only (a spreadsheet row copied): the values run along it, one bar per cell.
  // Mostly numbers is enough, so a slip in one cell is reported there rather than the row read as one bar.
  const only = sample.length === 1 ? sample[0] : undefined;
  let numbersAlong = 0;
  let filledAlong = 0;
  for (const cell of only?.cells ?? []) {
    if (cell === '' || isMissingCell(cell)) continue;
    filledAlong++;
    if (!Number.isNaN(parseNumber(cell, style.decimal, style.grouping))) numbersAlong++;
  }
  const along = table.header === null && numbersAlong >= 2 && numbersAlong * 2 >= filledAlong;

  let dateColumn: number | null = null;
  let timeColumn: number | null = null;
  let timeKind: TimeKind = 'none';
  const clockCells: string[] = [];
  for (let c = 0; c < stats.length && timeColumn === null; c++) {
    const s = stats[c] as ColumnStats;
    const next = stats[c + 1];
    if (mostly(s.dateOnly, s) && next !== undefined && mostly(next.timeOfDay, next)) {
      dateColumn = c + 1;
      timeColumn = c + 2;
      timeKind = 'clock';
      for (const cell of s.cells) clockCells.push(cell);
    } else if (mostly(s.clock, s)) {
      timeColumn = c + 1;
      timeKind = 'clock';
      for (const cell of s.cells) clockCells.push(cell);
    }
  }
  const isIndex = (c: number): boolean => INDEX_NAME.test(name(c));
  const numeric = (c: number): boolean => {
    const s = stats[c] as ColumnStats;
    return mostly(s.numeric, s) && !isIndex(c);
  };
  if (timeColumn === null && stats.length >= 2 && !along) {
    // Elapsed times: a rising column of numbers with another number column beside it to carry the values.
    const candidates: number[] = [];
    for (let c = 0; c < stats.length; c++) {
      if (numeric(c) && rises((stats[c] as ColumnStats).values) && !isValueName(name(c))) candidates.push(c);
    }
    const named = candidates.find((c) => TIME_NAME.test(name(c)));
    const pick = named ?? candidates[0];
    if (pick !== undefined) {
      const others = stats.some((_, c) => c !== pick && numeric(c));
      if (others) {
        timeColumn = pick + 1;
        timeKind = guessElapsedKind((stats[pick] as ColumnStats).values, name(pick));
      }
    }
  }
  const numberColumns: number[] = [];
  for (let c = 0; c < stats.length; c++) {
    if (c + 1 !== timeColumn && c + 1 !== dateColumn && numeric(c)) numberColumns.push(c + 1);
  }
  const dateOrder = guessDateOrder(clockCells);
  return {
    separator,
    decimal: style.decimal,
    grouping: style.grouping,
    valuesAlong: along ? 'line' : 'column',
    skipLines,
    hasHeader,
    table,
    dateColumn,
    timeColumn,
    timeKind,
    dateOrder,
    numberColumns,
  };
}

/** Picks the value column: the first number column whose name matches, else the first number column, else the first column not holding times. */
export function pickValueColumn(guess: LayoutGuess, isValueName: (name: string) => boolean): number {
  const name = (c: number): string => guess.table.header?.cells[c - 1] ?? '';
  const named = guess.numberColumns.find((c) => isValueName(name(c)));
  if (named !== undefined) return named;
  const firstNumber = guess.numberColumns[0];
  if (firstNumber !== undefined) return firstNumber;
  for (let c = 1; c <= Math.max(1, guess.table.columnCount); c++) {
    if (c !== guess.timeColumn && c !== guess.dateColumn) return c;
  }
  return 1;
}
