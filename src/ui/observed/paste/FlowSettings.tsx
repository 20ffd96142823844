import type { FlowImportSettings } from '../../../io';
import {
  ColumnOptions,
  columnCapHint,
  columnNumbers,
  Select,
  SplitSettings,
  TimeSettings,
  type SettingsPanelProps,
  type TimeWords,
} from '../../import-kit';

/** A correction of the streamflow import's guesses. */
export type FlowSettingsPatch = Partial<FlowImportSettings>;

const FLOW_TIME_WORDS: TimeWords = {
  noTimes: 'None: samples at a fixed step',
  stepHint: 'Samples are this far apart.',
  noDates: 'None (dates with the times, or no dates)',
  firstDateHint: 'For times of day without dates: puts the record on the calendar.',
};

/**
 * Every guess the streamflow import made, as a control to correct: how the
 * text splits, where the times and discharges are, the discharge unit.
 * Controls that do not apply to the present choice are left out.
 */
export function FlowSettings({
  settings: s,
  header,
  columnCount,
  rows,
  onChange,
}: SettingsPanelProps<FlowImportSettings>) {
  const columns = columnNumbers(s, columnCount);

  return (
    <div className="guesses">
      <SplitSettings settings={s} idPrefix="flow-paste" onChange={onChange} />

      <TimeSettings
        settings={s}
        header={header}
        columns={columns}
        rows={rows}
        idPrefix="flow-paste"
        words={FLOW_TIME_WORDS}
        numberKind="elapsed-h"
        onChange={onChange}
      />

      <fieldset className="guesses__group">
        <legend>Discharge</legend>
        <Select
          label="Discharge column"
          value={String(s.valueColumn)}
          onChange={(v) => onChange({ valueColumn: Number(v) })}
          hint={columnCapHint(columnCount)}
        >
          <ColumnOptions columns={columns.filter((c) => c !== s.timeColumn)} header={header} />
        </Select>
        <Select
          label="Discharge unit"
          value={s.unit}
          onChange={(v) => onChange({ unit: v as FlowImportSettings['unit'] })}
        >
          <option value="m3/s">m³/s</option>
          <option value="L/s">L/s</option>
          <option value="ft3/s">ft³/s</option>
        </Select>
      </fieldset>
    </div>
  );
}
