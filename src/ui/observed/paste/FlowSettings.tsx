import { parseNumber as parseCell, type FlowImportSettings, type TextRow } from '../../../io';
import { NumberField } from '../../fields/NumberField';
import { Select, DateField, SplitSettings, columnLabel, columnNumbers, dateNeeds } from './SettingControls';

/** A correction of the streamflow import's guesses. */
export type FlowSettingsPatch = Partial<FlowImportSettings>;

interface Props {
  readonly settings: FlowImportSettings;
  readonly header: readonly string[] | null;
  readonly columnCount: number;
  readonly rows: readonly TextRow[];
  readonly onChange: (patch: FlowSettingsPatch) => void;
}

/**
 * Every guess the streamflow import made, as a control to correct: how the
 * text splits, where the times and discharges are, the discharge unit.
 * Controls that do not apply to the present choice are left out.
 */
export function FlowSettings({ settings: s, header, columnCount, rows, onChange }: Props) {
  const columns = columnNumbers(s, columnCount);
  const hasTimes = s.timeColumn !== null && s.timeKind !== 'none';
  const need = dateNeeds(s, rows);

  const chooseTimeColumn = (value: string): void => {
    if (value === '') {
      onChange({ timeColumn: null, timeKind: 'none', dateColumn: null });
      return;
    }
    const c = Number(value);
    let timeKind = s.timeKind;
    if (timeKind === 'none') {
      const cell = rows.find((r) => r.cells.length > 0)?.cells[c - 1] ?? '';
      timeKind = Number.isNaN(parseCell(cell, s.decimal)) ? 'clock' : 'elapsed-h';
    }
    const patch: FlowSettingsPatch = { timeColumn: c, timeKind };
    if (c === s.valueColumn) {
      const other = columns.find((x) => x !== c);
      if (other !== undefined) Object.assign(patch, { valueColumn: other });
    }
    onChange(patch);
  };

  return (
    <div className="guesses">
      <SplitSettings settings={s} idPrefix="flow-paste" onChange={onChange} />

      <fieldset className="guesses__group">
        <legend>Times</legend>
        <Select label="Time column" value={s.timeColumn === null ? '' : String(s.timeColumn)} onChange={chooseTimeColumn}>
          <option value="">None: samples at a fixed step</option>
          {columns.map((c) => (
            <option key={c} value={String(c)}>
              {columnLabel(c, header)}
            </option>
          ))}
        </Select>
        {hasTimes ? (
          <Select label="Times are" value={s.timeKind} onChange={(v) => onChange({ timeKind: v as FlowImportSettings['timeKind'] })}>
            <option value="clock">Clock times or dates</option>
            <option value="elapsed-min">Minutes from the start</option>
            <option value="elapsed-h">Hours from the start</option>
          </Select>
        ) : (
          <NumberField
            id="flow-paste-step"
            label="Time step"
            unit="min"
            value={s.stepMinutesIfNoTime}
            check={(v) => (v > 0 ? null : 'The time step must be more than 0 minutes.')}
            onCommit={(v) => onChange({ stepMinutesIfNoTime: v })}
            hint="Samples are this far apart."
          />
        )}
        {need.dateColumn ? (
          <Select
            label="Date column"
            value={s.dateColumn === null ? '' : String(s.dateColumn)}
            onChange={(v) => onChange({ dateColumn: v === '' ? null : Number(v) })}
          >
            <option value="">None (dates with the times, or no dates)</option>
            {columns
              .filter((c) => c !== s.timeColumn && c !== s.valueColumn)
              .map((c) => (
                <option key={c} value={String(c)}>
                  {columnLabel(c, header)}
                </option>
              ))}
          </Select>
        ) : null}
        {need.dateOrder ? (
          <Select label="Dates are written" value={s.dateOrder} onChange={(v) => onChange({ dateOrder: v as FlowImportSettings['dateOrder'] })}>
            <option value="day-month">Day first (31/12/2024)</option>
            <option value="month-day">Month first (12/31/2024)</option>
          </Select>
        ) : null}
        {need.firstDate ? (
          <DateField
            value={s.dateForTimesOfDay}
            hint="For times of day without dates: puts the record on the calendar."
            onChange={(d) => onChange({ dateForTimesOfDay: d })}
          />
        ) : null}
      </fieldset>

      <fieldset className="guesses__group">
        <legend>Discharge</legend>
        <Select label="Discharge column" value={String(s.valueColumn)} onChange={(v) => onChange({ valueColumn: Number(v) })}>
          {columns
            .filter((c) => c !== s.timeColumn)
            .map((c) => (
              <option key={c} value={String(c)}>
                {columnLabel(c, header)}
              </option>
            ))}
        </Select>
        <Select label="Discharge unit" value={s.unit} onChange={(v) => onChange({ unit: v as FlowImportSettings['unit'] })}>
          <option value="m3/s">m³/s</option>
          <option value="L/s">L/s</option>
          <option value="ft3/s">ft³/s</option>
        </Select>
      </fieldset>
    </div>
  );
}
