import { FIRST_CLOCK_YEAR, LAST_CLOCK_YEAR, MAX_RECORD_H, MAX_RECORD_YEARS, isBarDurationH } from '../core';
import { SEPARATORS, readTable, type Separator, type TextRow, type TextTable } from './table-text';
import { GROUPINGS, notANumberReason, parseNumber, type DecimalMark, type Grouping } from './numbers';
import type { NumberFormat } from './number-format';
import { problem, type ImportProblem, type ProblemList } from './problems';
import {
  DATE_ORDERS,
  TIME_KINDS,
  parseIsoDate,
  readTimes,
  type DateOrder,
  type TimeKind,
  type TimeLine,
  type TimeSource,
} from './time-values';

/**
 * What rainfall and streamflow imports share: how the text is laid out, where
 * the time and the value are, and how times are read. Column numbers are
 * 1-based, as people count them and as problems report them.
 */
export interface SeriesSettings {
  readonly separator: Separator;
  readonly decimal: DecimalMark;
  /** What separates thousands in the numbers (default none); never the decimal mark. */
  readonly grouping?: Grouping | undefined;
  /**
   * 'line': the values run along each line, cell after cell, line after
   * line (a spreadsheet row copied), without times; 'column' (the default):
   * one value per line, in the value column.
   */
  readonly valuesAlong?: 'column' | 'line' | undefined;
  /** Leave out empty lines between data lines, counting them, rather than report each as a missing value. */
  readonly skipBlankLines?: boolean | undefined;
  /** Lines at the top of the text to ignore before the header or the data. */
  readonly skipLines: number;
  /** The first non-empty line after the skipped ones holds column names. */
  readonly hasHeader: boolean;
  /** Column of dates when dates and times of day are in separate columns; else null. */
  readonly dateColumn: number | null;
  /** Column of times; null when there are none (then timeKind is 'none'). */
  readonly timeColumn: number | null;
  readonly valueColumn: number;
  readonly timeKind: TimeKind;
  readonly dateOrder: DateOrder;
  /** "YYYY-MM-DD": the date of the first time when the times are times of day without a date; null keeps them off the calendar. */
  readonly dateForTimesOfDay: string | null;
  /** Step between values when there are no times (and the single bar's length when only one time is given), minutes. */
  readonly stepMinutesIfNoTime: number;
}

/** What the screen knows that the text may not say: how the reader writes numbers, and the storm's present step. */
export interface ImportHints {
  /** The reader's number format: settles "1,200" (twelve hundred, or 1.2) when the text leaves it open. */
  readonly numberFormat?: NumberFormat | undefined;
  /** The step, minutes, taken when neither the times nor a column name give one (the storm on screen's). */
  readonly stepMinutes?: number | undefined;
}

/** A column of values, with their times, read off the table. Arrays follow `table.rows`. */
export interface Series {
  readonly table: TextTable;
  /** Values in the unit they were pasted in; NaN where unreadable. */
  readonly values: number[];
  /** Times, or null when there is no time column. */
  readonly times: TimeLine | null;
}

const isWholeAtLeast = (v: unknown, min: number): v is number =>
  typeof v === 'number' && Number.isInteger(v) && v >= min;

function checkColumn(v: unknown, key: string, nullable: boolean, problems: ProblemList): boolean {
  if (nullable && v === null) return true;
  if (isWholeAtLeast(v, 1)) return true;
  problems.add(problem(0, 0, key, String(v), `must be a column number, 1 or more${nullable ? ', or none' : ''}.`));
  return false;
}

/** Adds a problem for each setting that is out of range or contradicts another. */
export function checkSeriesSettings(s: SeriesSettings, problems: ProblemList): void {
  if (!SEPARATORS.includes(s.separator)) {
    problems.add(problem(0, 0, 'separator', String(s.separator), 'must be tab, comma, semicolon or none.'));
  }
  if (s.decimal !== 'point' && s.decimal !== 'comma') {
    problems.add(problem(0, 0, 'decimal', String(s.decimal), 'must be point or comma.'));
  }
  const grouping = s.grouping ?? 'none';
  if (!GROUPINGS.includes(grouping)) {
    problems.add(problem(0, 0, 'grouping', String(grouping), 'must be none, comma, point or space.'));
  } else if ((grouping === 'comma' && s.decimal === 'comma') || (grouping === 'point' && s.decimal === 'point')) {
    problems.add(
      problem(0, 0, 'grouping', grouping, `the thousands separator cannot also be the decimal mark (a ${grouping}).`),
    );
  }
  if (s.valuesAlong !== undefined && s.valuesAlong !== 'column' && s.valuesAlong !== 'line') {
    problems.add(problem(0, 0, 'valuesAlong', String(s.valuesAlong), 'must be column or line.'));
  }
  if (s.skipBlankLines !== undefined && typeof s.skipBlankLines !== 'boolean') {
    problems.add(problem(0, 0, 'skipBlankLines', String(s.skipBlankLines), 'must be true or false.'));
  }
  if (!isWholeAtLeast(s.skipLines, 0)) {
    problems.add(problem(0, 0, 'skipLines', String(s.skipLines), 'must be a whole number of lines, 0 or more.'));
  }
  if (typeof s.hasHeader !== 'boolean') {
    problems.add(problem(0, 0, 'hasHeader', String(s.hasHeader), 'must be true or false.'));
  }
  const valueOk = checkColumn(s.valueColumn, 'valueColumn', false, problems);
  const timeOk = checkColumn(s.timeColumn, 'timeColumn', true, problems);
  const dateOk = checkColumn(s.dateColumn, 'dateColumn', true, problems);
  if (!TIME_KINDS.includes(s.timeKind)) {
    problems.add(problem(0, 0, 'timeKind', String(s.timeKind), 'must be clock, elapsed-min, elapsed-h or none.'));
  } else if (timeOk && (s.timeKind === 'none') !== (s.timeColumn === null)) {
    problems.add(
      s.timeColumn === null
        ? problem(0, 0, 'timeColumn', 'none', `the time kind is ${s.timeKind} but no time column is chosen.`)
        : problem(0, 0, 'timeKind', 'none', `column ${s.timeColumn} is chosen for times but the time kind is none.`),
    );
  }
  if (valueOk && timeOk && s.timeColumn !== null && s.timeColumn === s.valueColumn) {
    problems.add(
      problem(0, 0, 'timeColumn', String(s.timeColumn), 'the time column and the value column must differ.'),
    );
  }
  if (dateOk && s.dateColumn !== null) {
    if (s.dateColumn === s.valueColumn || s.dateColumn === s.timeColumn) {
      problems.add(
        problem(
          0,
          0,
          'dateColumn',
          String(s.dateColumn),
          'the date column must differ from the time and value columns.',
        ),
      );
    }
    if (s.timeColumn === null || s.timeKind !== 'clock') {
      problems.add(
        problem(
          0,
          0,
          'dateColumn',
          String(s.dateColumn),
          'a date column needs a time column of clock times beside it.',
        ),
      );
    }
  }
  if (!DATE_ORDERS.includes(s.dateOrder)) {
    problems.add(problem(0, 0, 'dateOrder', String(s.dateOrder), 'must be day-month or month-day.'));
  }
  if (s.dateForTimesOfDay !== null) {
    const d = typeof s.dateForTimesOfDay === 'string' ? parseIsoDate(s.dateForTimesOfDay) : null;
    if (d === null || !d.ok) {
      problems.add(
        problem(
          0,
          0,
          'dateForTimesOfDay',
          String(s.dateForTimesOfDay),
          d === null ? 'must be a date or none.' : d.reason,
        ),
      );
    } else if (d.value.year < FIRST_CLOCK_YEAR || d.value.year > LAST_CLOCK_YEAR) {
      problems.add(
        problem(
          0,
          0,
          'dateForTimesOfDay',
          String(s.dateForTimesOfDay),
          `a record starts in the years ${FIRST_CLOCK_YEAR} to ${LAST_CLOCK_YEAR} (got the year ${d.value.year}).`,
        ),
      );
    }
  }
  if (s.valuesAlong === 'line' && s.timeKind !== 'none') {
    problems.add(
      problem(0, 0, 'valuesAlong', 'line', 'values that run along a line have no times; choose no time column.'),
    );
  }
  if (s.timeKind === 'none') checkStep(s, problems);
}

/**
 * The rows of values read along each line: one row per cell, in reading
 * order, each naming the column it came from. Empty cells at the ends of a
 * line (a trailing separator) are left out; empty cells between values stay
 * and are reported as missing.
 */
function valuesAlongLines(table: TextTable): TextTable {
  const rows: TextRow[] = [];
  for (const row of table.rows) {
    let end = row.cells.length;
    while (end > 0 && row.cells[end - 1] === '') end--;
    let start = 0;
    while (start < end && row.cells[start] === '') start++;
    if (end === 0) rows.push(row);
    for (let c = start; c < end; c++) rows.push({ line: row.line, cells: [row.cells[c] as string], column: c + 1 });
  }
  return { ...table, rows, columnCount: Math.min(1, table.columnCount) };
}

/** The step setting must be a positive, finite number of minutes wherever it is used. */
export function checkStep(s: SeriesSettings, problems: ProblemList): boolean {
  const v = s.stepMinutesIfNoTime;
  if (typeof v === 'number' && isBarDurationH(v / 60)) return true;
  const reason =
    typeof v === 'number' && v > 0 && Number.isFinite(v)
      ? `the time step must be from 1 second (0.0167 min) to ${MAX_RECORD_YEARS} years (${(MAX_RECORD_H * 60).toLocaleString('en-US')} min).`
      : 'the time step must be a number of minutes greater than zero.';
  problems.add(problem(0, 0, 'stepMinutesIfNoTime', String(v), reason));
  return false;
}

function capitalised(field: string): string {
  return field.charAt(0).toUpperCase() + field.slice(1);
}

/**
 * Reads the value column (and the time column) of every data row. Values must
 * be numbers, zero or more: every one that is not adds a problem naming its
 * line, column and field. Assumes the settings passed checkSeriesSettings.
 */
function readSeries(text: string, s: SeriesSettings, field: string, problems: ProblemList): Series {
  const split = readTable(text, s);
  const along = s.valuesAlong === 'line';
  const table = along ? valuesAlongLines(split) : split;
  const grouping = s.grouping ?? 'none';
  for (const p of table.problems) problems.add(p);
  const { rows, columnCount } = table;
  const columnExists = (key: string, c: number | null): boolean => {
    if (c === null || rows.length === 0 || c <= columnCount) return true;
    problems.add(
      problem(
        0,
        c,
        key,
        String(c),
        `there is no column ${c}: the data has ${columnCount} column${columnCount === 1 ? '' : 's'}.`,
      ),
    );
    return false;
  };
  const valueThere = along || columnExists('valueColumn', s.valueColumn);
  const useTimes = s.timeKind !== 'none' && s.timeColumn !== null;
  const timeThere = useTimes && columnExists('timeColumn', s.timeColumn);
  const dateThere = useTimes && columnExists('dateColumn', s.dateColumn);

  const values = new Array<number>(rows.length).fill(NaN);
  const sources: TimeSource[] = [];
  const sourceRow: number[] = [];
  for (let i = 0; i < rows.length; i++) {
    const { line, cells, column: along = null } = rows[i]!;
    if (cells.length === 0) {
      problems.add(
        problem(
          line,
          0,
          'line',
          '',
          `the line is empty, so its ${field} is missing; remove the line, fill in the value, or skip blank lines.`,
        ),
      );
      continue;
    }
    if (valueThere) {
      const column = along ?? s.valueColumn;
      const cell = along === null ? cells[s.valueColumn - 1] : cells[0];
      if (cell === undefined || cell === '') {
        const only = cell === undefined ? ` (the line has ${cells.length} column${cells.length === 1 ? '' : 's'})` : '';
        problems.add(problem(line, column, field, '', `the ${field} is missing${only}.`));
      } else {
        const v = parseNumber(cell, s.decimal, grouping);
        if (Number.isNaN(v))
          problems.add(problem(line, column, field, cell, notANumberReason(cell, s.decimal, grouping)));
        else if (v < 0) problems.add(problem(line, column, field, cell, `${capitalised(field)} cannot be negative.`));
        else values[i] = v;
      }
    }
    if (timeThere && dateThere) {
      const cell = cells[(s.timeColumn as number) - 1] ?? '';
      const dateCell = s.dateColumn === null ? undefined : (cells[s.dateColumn - 1] ?? '');
      sources.push(dateCell === undefined ? { line, cell } : { line, cell, dateCell });
      sourceRow.push(i);
    }
  }
  let times: TimeLine | null = null;
  if (useTimes) {
    const dateForTimesOfDay = s.dateForTimesOfDay === null ? null : parseIsoDate(s.dateForTimesOfDay);
    const line = readTimes(
      sources,
      {
        kind: s.timeKind as Exclude<TimeKind, 'none'>,
        decimal: s.decimal,
        grouping,
        dateOrder: s.dateOrder,
        dateForTimesOfDay: dateForTimesOfDay !== null && dateForTimesOfDay.ok ? dateForTimesOfDay.value : null,
        column: s.timeColumn as number,
        dateColumn: s.dateColumn,
      },
      problems,
    );
    const hours = new Array<number>(rows.length).fill(NaN);
    for (let k = 0; k < sourceRow.length; k++) hours[sourceRow[k]!] = line.hours[k]!;
    times = { hours, origin: line.origin, firstTimeOfDayMs: line.firstTimeOfDayMs };
  }
  return { table, values, times };
}

/** What a paste dialog shows of one import run: the settings, its summary and problems, and the table as split. */
export function previewOf<S extends SeriesSettings>(
  settings: S,
  result: { readonly summary: string; readonly problems: readonly ImportProblem[] },
  series: Series | null,
) {
  const table = series?.table ?? null;
  return {
    settings,
    summary: result.summary,
    header: table?.header?.cells ?? null,
    rows: table?.rows ?? [],
    columnCount: table?.columnCount ?? 0,
    problems: result.problems,
  };
}

/** The header's name for a 1-based column, or ''. */
export function columnName(table: TextTable, column: number | null): string {
  if (column === null || table.header === null) return '';
  return table.header.cells[column - 1] ?? '';
}

/**
 * The opening every import run shares: the text and the settings are there,
 * the settings pass the import's own check, and the text splits into a
 * series. Returns null when the run cannot go on (its problems are listed).
 */
export function openSeries<S extends SeriesSettings>(
  text: unknown,
  settings: S,
  checkSettings: (s: S, problems: ProblemList) => void,
  field: (s: S) => string,
  problems: ProblemList,
): Series | null {
  if (typeof text !== 'string') {
    problems.add(problem(0, 0, 'text', '', 'there is no text to read.'));
    return null;
  }
  if (settings === null || typeof settings !== 'object') {
    problems.add(problem(0, 0, 'settings', String(settings), 'no import settings were given.'));
    return null;
  }
  checkSettings(settings, problems);
  if (problems.count > 0) return null;
  return readSeries(text, settings, field(settings), problems);
}
