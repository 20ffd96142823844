import { parseClock, type SeriesSettings, type TextRow } from '../../io';

/** "Column 2: Rain (mm)" when the header names it, else "Column 2". */
export function columnLabel(c: number, header: readonly string[] | null): string {
  const name = header?.[c - 1];
  return name ? `Column ${c}: ${name}` : `Column ${c}`;
}

/**
 * Most columns offered in a column picker. A time series has a few columns; a
 * paste with thousands is a row of values, and hundreds of thousands of
 * options would freeze the page (a one-line paste of 200,000 cells took about
 * a minute to show). Our own number.
 */
export const MAX_COLUMN_CHOICES = 1000;

/** Column numbers to offer: every column read up to MAX_COLUMN_CHOICES, and any the settings already name. */
export function columnNumbers(s: SeriesSettings, columnCount: number): number[] {
  const count = Math.min(Math.max(1, columnCount), MAX_COLUMN_CHOICES);
  const columns = Array.from({ length: count }, (_, i) => i + 1);
  for (const named of [s.dateColumn, s.timeColumn, s.valueColumn]) {
    if (named !== null && named > count && !columns.includes(named)) columns.push(named);
  }
  return columns.sort((a, b) => a - b);
}

/** Said beside the value column when there are more columns than the pickers offer, else undefined. */
export function columnCapHint(columnCount: number): string | undefined {
  if (columnCount <= MAX_COLUMN_CHOICES) return undefined;
  return (
    `The text has ${columnCount.toLocaleString('en-US')} columns; only the first ${MAX_COLUMN_CHOICES.toLocaleString('en-US')} can be chosen here. ` +
    'Raincut reads one value per line: a row of values should be pasted as a column.'
  );
}

/** Which date controls the first data line calls for: times of day without dates, dates written with slashes. */
export function dateNeeds(s: SeriesSettings, rows: readonly TextRow[]) {
  const clock = s.timeColumn !== null && s.timeKind === 'clock';
  const firstRow = rows.find((r) => r.cells.length > 0);
  const timeCell = s.timeColumn === null ? '' : (firstRow?.cells[s.timeColumn - 1] ?? '');
  const dateCell = s.dateColumn === null ? '' : (firstRow?.cells[s.dateColumn - 1] ?? '');
  const reading = clock ? parseClock(timeCell, s.dateOrder) : null;
  const timesOfDay = reading !== null && reading.ok && reading.value.date === null;
  const slashed = /^\d{1,2}[./-]\d{1,2}[./-]\d{2,4}/;
  return {
    dateColumn: clock && (timesOfDay || s.dateColumn !== null),
    firstDate: clock && ((timesOfDay && s.dateColumn === null) || s.dateForTimesOfDay !== null),
    dateOrder: clock && (slashed.test(timeCell) || slashed.test(dateCell)),
  };
}
