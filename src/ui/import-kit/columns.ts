import { parseClock, type SeriesSettings, type TextRow } from '../../io';

/** "Column 2: Rain (mm)" when the header names it, else "Column 2". */
export function columnLabel(c: number, header: readonly string[] | null): string {
  const name = header?.[c - 1];
  return name ? `Column ${c}: ${name}` : `Column ${c}`;
}

/** Column numbers to offer: every column read, and any the settings already name. */
export function columnNumbers(s: SeriesSettings, columnCount: number): number[] {
  return Array.from({ length: Math.max(1, columnCount, s.valueColumn, s.timeColumn ?? 0) }, (_, i) => i + 1);
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
