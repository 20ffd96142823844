import type { RainImportSettings } from '../../../io';
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

/** A change to the import settings as the user corrects a guess. */
export type SettingsPatch = Partial<RainImportSettings>;

const RAIN_TIME_WORDS: TimeWords = {
  noTimes: 'None: bars one after another',
  stepHint: 'Each value is one bar this long.',
  noDates: 'None (dates with the times)',
  firstDateHint: 'For times of day without dates: puts the storm on the calendar.',
};

/**
 * Every guess the import layer made, as a control the user can correct:
 * how the text splits, where the times and values are, what the values mean.
 * Controls that do not apply to the present choice are left out.
 */
export function ImportSettings({
  settings: s,
  header,
  columnCount,
  rows,
  onChange,
}: SettingsPanelProps<RainImportSettings>) {
  const columns = columnNumbers(s, columnCount);
  const hasTimes = s.timeColumn !== null && s.timeKind !== 'none';
  const rateUnit = s.valueKind === 'intensity';
  const along = s.valuesAlong === 'line';
  // Choosing a time column means one value per line again.
  const change = (patch: SettingsPatch): void =>
    onChange(along && patch.timeColumn != null ? { ...patch, valuesAlong: 'column' } : patch);

  return (
    <div className="guesses">
      <SplitSettings settings={s} idPrefix="paste" onChange={onChange} />

      <TimeSettings
        settings={s}
        header={header}
        columns={columns}
        rows={rows}
        idPrefix="paste"
        words={RAIN_TIME_WORDS}
        numberKind="elapsed-min"
        onChange={change}
      >
        {hasTimes && s.valueKind !== 'cumulative' ? (
          <Select
            label="Each time marks"
            value={s.timeMarks}
            onChange={(v) => onChange({ timeMarks: v as RainImportSettings['timeMarks'] })}
            hint="Gauges usually stamp the end of the interval the rain fell in."
          >
            <option value="end">The end of its bar</option>
            <option value="start">The start of its bar</option>
          </Select>
        ) : null}
        {hasTimes ? (
          <Select
            label="Steps longer than the record’s"
            value={s.gaps ?? 'fill'}
            onChange={(v) => onChange({ gaps: v as RainImportSettings['gaps'] })}
            hint="A reading after a gap: its rain in one step of the record, the rest of the gap dry; or one long bar at a lower intensity."
          >
            <option value="fill">Fill with dry bars of the step</option>
            <option value="keep">Keep one long bar</option>
          </Select>
        ) : null}
      </TimeSettings>

      <fieldset className="guesses__group">
        <legend>Rainfall values</legend>
        <Select
          label="Values run"
          value={along ? 'line' : 'column'}
          onChange={(v) =>
            onChange(
              v === 'line'
                ? { valuesAlong: 'line', timeColumn: null, timeKind: 'none', dateColumn: null }
                : { valuesAlong: 'column' },
            )
          }
          hint={
            along ? 'Each value on a line is one bar, line after line, without times (a spreadsheet row).' : undefined
          }
        >
          <option value="column">Down a column</option>
          <option value="line">Along each line</option>
        </Select>
        {along ? null : (
          <Select
            label="Rainfall column"
            value={String(s.valueColumn)}
            onChange={(v) => onChange({ valueColumn: Number(v) })}
            hint={columnCapHint(columnCount)}
          >
            <ColumnOptions columns={columns.filter((c) => c !== s.timeColumn)} header={header} />
          </Select>
        )}
        <Select
          label="Values are"
          value={s.valueKind}
          onChange={(v) => onChange({ valueKind: v as RainImportSettings['valueKind'] })}
        >
          <option value="depth">Depth in each bar</option>
          <option value="intensity">Intensity (depth per hour)</option>
          <option value="cumulative">Cumulative depth</option>
        </Select>
        {s.valueKind === 'cumulative' ? (
          <Select
            label="Count cumulative depths from"
            value={s.cumulativeFrom}
            onChange={(v) => onChange({ cumulativeFrom: v as RainImportSettings['cumulativeFrom'] })}
          >
            <option value="first-value">The first reading</option>
            <option value="zero">Zero</option>
          </Select>
        ) : null}
        <Select label="Unit" value={s.unit} onChange={(v) => onChange({ unit: v as RainImportSettings['unit'] })}>
          <option value="mm">{rateUnit ? 'mm/h' : 'mm'}</option>
          <option value="in">{rateUnit ? 'in/h' : 'in'}</option>
        </Select>
      </fieldset>
    </div>
  );
}
