import { parseNumber, type DecimalMark, type Grouping } from './numbers';
import { formatIsoForPeople } from './describe';

/**
 * Spreadsheets keep a date as a day number: days since 1899-12-30 in the
 * 1900 date system (so that 1 Mar 1900 is day 61), the time of day as its
 * fraction. A date column copied while formatted as a plain number pastes
 * as such numbers, which the importer reads as elapsed hours or minutes, as
 * it must: it says so, with the date the first would be, so the user can
 * copy the column again as dates. Day numbers from 20,000 (1954) up to the
 * year 2999 stepping by less than a day are taken to be such; elapsed hours
 * or minutes that start that far from zero in steps under one are not seen
 * in records (our rule, no source).
 */
const FIRST_DAY = 20_000;
/** Day number of 3000-01-01, past the last year a record may start in (src/core/time-limits.ts). */
const LAST_DAY = 401_769;
/** Milliseconds from 1899-12-30 to 1970-01-01 (25,569 days). */
const EPOCH_OFFSET_MS = 25_569 * 86_400_000;

export interface ElapsedTimes {
  readonly kind: 'elapsed-min' | 'elapsed-h';
  /** The first time cell as written, its line, and the step to the next time in hours. */
  readonly firstCell: string;
  readonly firstLine: number;
  readonly stepH: number;
  readonly decimal: DecimalMark;
  readonly grouping: Grouping | undefined;
}

/** The note for a summary when elapsed times look like spreadsheet day numbers; null otherwise. */
export function spreadsheetDaysNote(t: ElapsedTimes): string | null {
  const first = parseNumber(t.firstCell.trim(), t.decimal, t.grouping ?? 'none');
  const step = t.kind === 'elapsed-min' ? t.stepH * 60 : t.stepH;
  if (!(first >= FIRST_DAY && first < LAST_DAY && step > 0 && step < 1)) return null;
  const ms = Math.round((first * 86_400_000 - EPOCH_OFFSET_MS) / 1000) * 1000;
  const date = formatIsoForPeople(new Date(ms).toISOString().slice(0, 19));
  const unit = t.kind === 'elapsed-min' ? 'minutes' : 'hours';
  return `the times are plain numbers (“${t.firstCell.trim()}” on line ${t.firstLine}), read as elapsed ${unit}; if they are a spreadsheet’s dates (that one is ${date} in the 1900 date system), format that column as dates in the spreadsheet and copy again`;
}

/** What an importer's settings say of its times, as spreadsheetDaysFor reads them. */
export interface TimeSettings {
  readonly timeKind: string;
  readonly timeColumn: number | null;
  readonly decimal: DecimalMark;
  readonly grouping?: Grouping | undefined;
}

/**
 * spreadsheetDaysNote for an import (rainfall or streamflow): its settings,
 * its first row as read (cells and line) and its times in hours; null when
 * the times are not elapsed numbers in a column, or there is only one.
 */
export function spreadsheetDaysFor(
  s: TimeSettings,
  first: { readonly cells: readonly string[]; readonly line: number } | null | undefined,
  timesH: ArrayLike<number>,
): string | null {
  const kind = s.timeKind;
  if ((kind !== 'elapsed-min' && kind !== 'elapsed-h') || s.timeColumn === null || !first || timesH.length < 2)
    return null;
  return spreadsheetDaysNote({
    kind,
    firstCell: first.cells[s.timeColumn - 1] ?? '',
    firstLine: first.line,
    stepH: (timesH[1] as number) - (timesH[0] as number),
    decimal: s.decimal,
    grouping: s.grouping,
  });
}
