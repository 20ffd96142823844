import type { ReactNode } from 'react';
import { parseNumber as parseCell, type SeriesSettings, type TextRow } from '../../io';
import { NumberField } from '../fields/NumberField';
import { ColumnOptions } from './ColumnOptions';
import { dateNeeds } from './columns';
import { DateField } from './DateField';
import { Select } from './Select';

/** The words that differ between one series and another (bars of rain, samples of flow). */
export interface TimeWords {
  /** The time column's "none" option, e.g. "None: bars one after another". */
  readonly noTimes: string;
  /** Under the time step when there are no times. */
  readonly stepHint: string;
  /** The date column's "none" option. */
  readonly noDates: string;
  /** Under the date of the first time. */
  readonly firstDateHint: string;
}

export interface TimeSettingsProps {
  readonly settings: SeriesSettings;
  readonly header: readonly string[] | null;
  readonly columns: readonly number[];
  readonly rows: readonly TextRow[];
  /** Prefix of the step field's id. */
  readonly idPrefix: string;
  readonly words: TimeWords;
  /** The kind taken when a time column is chosen from none and its first cell is a number. */
  readonly numberKind: 'elapsed-min' | 'elapsed-h';
  readonly onChange: (patch: Partial<SeriesSettings>) => void;
  /** Controls of the series' own, shown after the kind of times (or the step). */
  readonly children?: ReactNode;
}

/**
 * Where the times are and how to read them: the time column, their kind or
 * the fixed step, and the date controls the first data line calls for.
 */
export function TimeSettings({
  settings: s,
  header,
  columns,
  rows,
  idPrefix,
  words,
  numberKind,
  onChange,
  children,
}: TimeSettingsProps) {
  const hasTimes = s.timeColumn !== null && s.timeKind !== 'none';
  const need = dateNeeds(s, rows);

  const chooseTimeColumn = (value: string): void => {
    if (value === '') {
      onChange({ timeColumn: null, timeKind: 'none', dateColumn: null });
      return;
    }
    const c = Number(value);
    // Keep the kind the user had; from none, read the column's first cell to pick clock or a count from the start.
    let timeKind = s.timeKind;
    if (timeKind === 'none') {
      const cell = rows.find((r) => r.cells.length > 0)?.cells[c - 1] ?? '';
      timeKind = Number.isNaN(parseCell(cell, s.decimal, s.grouping)) ? 'clock' : numberKind;
    }
    const patch: Partial<SeriesSettings> = { timeColumn: c, timeKind };
    if (c === s.valueColumn) {
      const other = columns.find((x) => x !== c);
      if (other !== undefined) Object.assign(patch, { valueColumn: other });
    }
    onChange(patch);
  };

  return (
    <fieldset className="guesses__group">
      <legend>Times</legend>
      <Select label="Time column" value={s.timeColumn === null ? '' : String(s.timeColumn)} onChange={chooseTimeColumn}>
        <option value="">{words.noTimes}</option>
        <ColumnOptions columns={columns} header={header} />
      </Select>
      {hasTimes ? (
        <Select
          label="Times are"
          value={s.timeKind}
          onChange={(v) => onChange({ timeKind: v as SeriesSettings['timeKind'] })}
        >
          <option value="clock">Clock times or dates</option>
          <option value="elapsed-min">Minutes from the start</option>
          <option value="elapsed-h">Hours from the start</option>
        </Select>
      ) : (
        <NumberField
          id={`${idPrefix}-step`}
          label="Time step"
          unit="min"
          value={s.stepMinutesIfNoTime}
          plausible={{ quantity: 'barDuration', siPerValue: 1 / 60 }}
          check={(v) => (v > 0 ? null : 'The time step must be more than 0 minutes.')}
          onCommit={(v) => onChange({ stepMinutesIfNoTime: v })}
          hint={words.stepHint}
        />
      )}
      {children}
      {need.dateColumn ? (
        <Select
          label="Date column"
          value={s.dateColumn === null ? '' : String(s.dateColumn)}
          onChange={(v) => onChange({ dateColumn: v === '' ? null : Number(v) })}
        >
          <option value="">{words.noDates}</option>
          <ColumnOptions columns={columns.filter((c) => c !== s.timeColumn && c !== s.valueColumn)} header={header} />
        </Select>
      ) : null}
      {need.dateOrder ? (
        <Select
          label="Dates are written"
          value={s.dateOrder}
          onChange={(v) => onChange({ dateOrder: v as SeriesSettings['dateOrder'] })}
        >
          <option value="day-month">Day first (31/12/2024)</option>
          <option value="month-day">Month first (12/31/2024)</option>
        </Select>
      ) : null}
      {need.firstDate ? (
        <DateField
          value={s.dateForTimesOfDay}
          hint={words.firstDateHint}
          onChange={(d) => onChange({ dateForTimesOfDay: d })}
        />
      ) : null}
    </fieldset>
  );
}
