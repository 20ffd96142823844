import { useId, useState, type ReactNode } from 'react';
import { parseClock, parseNumber as parseCell, type RainImportSettings, type TextRow } from '../../../io';
import { NumberField } from '../../fields/NumberField';

/** A change to the import settings as the user corrects a guess. */
export type SettingsPatch = Partial<RainImportSettings>;

interface Props {
  readonly settings: RainImportSettings;
  readonly header: readonly string[] | null;
  readonly columnCount: number;
  readonly rows: readonly TextRow[];
  readonly onChange: (patch: SettingsPatch) => void;
}

function Select({
  label,
  value,
  onChange,
  children,
  hint,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  children: ReactNode;
  hint?: string;
}) {
  const id = useId();
  return (
    <div className="field guess">
      <label htmlFor={id}>{label}</label>
      <select id={id} value={value} onChange={(e) => onChange(e.currentTarget.value)} aria-describedby={hint ? `${id}-hint` : undefined}>
        {children}
      </select>
      {hint ? (
        <p className="field__hint" id={`${id}-hint`}>
          {hint}
        </p>
      ) : null}
    </div>
  );
}

/** A YYYY-MM-DD field that stores only a well-formed date (or none when emptied); bad text stays with its reason. */
function DateField({ value, onChange }: { value: string | null; onChange: (date: string | null) => void }) {
  const id = useId();
  const [draft, setDraft] = useState<{ text: string; message: string | null } | null>(null);
  const text = draft?.text ?? value ?? '';
  return (
    <div className={`field guess${draft?.message ? ' field--bad' : ''}`}>
      <label htmlFor={id}>Date of the first time</label>
      <input
        id={id}
        type="text"
        placeholder="YYYY-MM-DD"
        autoComplete="off"
        value={text}
        aria-invalid={draft?.message ? true : undefined}
        aria-describedby={`${id}-hint ${id}-msg`}
        onChange={(e) => {
          const typed = e.currentTarget.value;
          const t = typed.trim();
          if (t === '') {
            setDraft(null);
            onChange(null);
          } else if (/^\d{4}-\d{2}-\d{2}$/.test(t)) {
            setDraft(null);
            onChange(t);
          } else {
            setDraft({ text: typed, message: `“${t}” is not a date; write it as YYYY-MM-DD, for example 2024-05-01.` });
          }
        }}
      />
      <p className="field__hint" id={`${id}-hint`}>
        For times of day without dates: puts the storm on the calendar.
      </p>
      <p className="field__msg" id={`${id}-msg`} aria-live="polite">
        {draft?.message ?? null}
      </p>
    </div>
  );
}

function columnLabel(c: number, header: readonly string[] | null): string {
  const name = header?.[c - 1];
  return name ? `Column ${c}: ${name}` : `Column ${c}`;
}

/**
 * Every guess the import layer made, as a control the user can correct:
 * how the text splits, where the times and values are, what the values mean.
 * Controls that do not apply to the present choice are left out.
 */
export function ImportSettings({ settings: s, header, columnCount, rows, onChange }: Props) {
  const columns = Array.from({ length: Math.max(1, columnCount, s.valueColumn, s.timeColumn ?? 0) }, (_, i) => i + 1);
  const hasTimes = s.timeColumn !== null && s.timeKind !== 'none';
  const clock = hasTimes && s.timeKind === 'clock';
  const rateUnit = s.valueKind === 'intensity';
  // Date controls only where the times call for them: times of day without dates, or dates written day/month.
  const firstRow = rows.find((r) => r.cells.length > 0);
  const timeCell = s.timeColumn === null ? '' : (firstRow?.cells[s.timeColumn - 1] ?? '');
  const dateCell = s.dateColumn === null ? '' : (firstRow?.cells[s.dateColumn - 1] ?? '');
  const reading = clock ? parseClock(timeCell, s.dateOrder) : null;
  const timesOfDay = reading !== null && reading.ok && reading.value.date === null;
  const slashed = /^\d{1,2}[./-]\d{1,2}[./-]\d{2,4}/;
  const showDateColumn = clock && (timesOfDay || s.dateColumn !== null);
  const showFirstDate = clock && ((timesOfDay && s.dateColumn === null) || s.dateForTimesOfDay !== null);
  const showDateOrder = clock && (slashed.test(timeCell) || slashed.test(dateCell));

  const chooseTimeColumn = (value: string): void => {
    if (value === '') {
      onChange({ timeColumn: null, timeKind: 'none', dateColumn: null });
      return;
    }
    const c = Number(value);
    // Keep the kind the user had; from none, read the column's first cell to pick clock or minutes.
    let timeKind = s.timeKind;
    if (timeKind === 'none') {
      const cell = rows.find((r) => r.cells.length > 0)?.cells[c - 1] ?? '';
      timeKind = Number.isNaN(parseCell(cell, s.decimal)) ? 'clock' : 'elapsed-min';
    }
    const patch: SettingsPatch = { timeColumn: c, timeKind };
    if (c === s.valueColumn) {
      const other = columns.find((x) => x !== c);
      if (other !== undefined) Object.assign(patch, { valueColumn: other });
    }
    onChange(patch);
  };

  return (
    <div className="guesses">
      <fieldset className="guesses__group">
        <legend>How the text splits</legend>
        <Select label="Separator" value={s.separator} onChange={(v) => onChange({ separator: v as RainImportSettings['separator'] })}>
          <option value="tab">Tab</option>
          <option value="comma">Comma</option>
          <option value="semicolon">Semicolon</option>
          <option value="none">None (one value a line)</option>
        </Select>
        <Select label="Decimal mark" value={s.decimal} onChange={(v) => onChange({ decimal: v as RainImportSettings['decimal'] })}>
          <option value="point">Point (2.5)</option>
          <option value="comma">Comma (2,5)</option>
        </Select>
        <div className="field guess guess--check">
          <label className="switch">
            <input type="checkbox" checked={s.hasHeader} onChange={(e) => onChange({ hasHeader: e.currentTarget.checked })} />
            First line holds column names
          </label>
        </div>
        <NumberField
          id="paste-skip-lines"
          label="Lines to skip at the top"
          value={s.skipLines}
          check={(v) => (Number.isInteger(v) && v >= 0 ? null : 'Enter a whole number of lines, 0 or more.')}
          onCommit={(v) => onChange({ skipLines: v })}
        />
      </fieldset>

      <fieldset className="guesses__group">
        <legend>Times</legend>
        <Select label="Time column" value={s.timeColumn === null ? '' : String(s.timeColumn)} onChange={chooseTimeColumn}>
          <option value="">None: bars one after another</option>
          {columns.map((c) => (
            <option key={c} value={String(c)}>
              {columnLabel(c, header)}
            </option>
          ))}
        </Select>
        {hasTimes ? (
          <Select label="Times are" value={s.timeKind} onChange={(v) => onChange({ timeKind: v as RainImportSettings['timeKind'] })}>
            <option value="clock">Clock times or dates</option>
            <option value="elapsed-min">Minutes from the start</option>
            <option value="elapsed-h">Hours from the start</option>
          </Select>
        ) : (
          <NumberField
            id="paste-step"
            label="Time step"
            unit="min"
            value={s.stepMinutesIfNoTime}
            check={(v) => (v > 0 ? null : 'The time step must be more than 0 minutes.')}
            onCommit={(v) => onChange({ stepMinutesIfNoTime: v })}
            hint="Each value is one bar this long."
          />
        )}
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
        {showDateColumn ? (
          <Select
            label="Date column"
            value={s.dateColumn === null ? '' : String(s.dateColumn)}
            onChange={(v) => onChange({ dateColumn: v === '' ? null : Number(v) })}
          >
            <option value="">None (dates with the times)</option>
            {columns
              .filter((c) => c !== s.timeColumn && c !== s.valueColumn)
              .map((c) => (
                <option key={c} value={String(c)}>
                  {columnLabel(c, header)}
                </option>
              ))}
          </Select>
        ) : null}
        {showDateOrder ? (
          <Select label="Dates are written" value={s.dateOrder} onChange={(v) => onChange({ dateOrder: v as RainImportSettings['dateOrder'] })}>
            <option value="day-month">Day first (31/12/2024)</option>
            <option value="month-day">Month first (12/31/2024)</option>
          </Select>
        ) : null}
        {showFirstDate ? <DateField value={s.dateForTimesOfDay} onChange={(d) => onChange({ dateForTimesOfDay: d })} /> : null}
      </fieldset>

      <fieldset className="guesses__group">
        <legend>Rainfall values</legend>
        <Select label="Rainfall column" value={String(s.valueColumn)} onChange={(v) => onChange({ valueColumn: Number(v) })}>
          {columns
            .filter((c) => c !== s.timeColumn)
            .map((c) => (
              <option key={c} value={String(c)}>
                {columnLabel(c, header)}
              </option>
            ))}
        </Select>
        <Select label="Values are" value={s.valueKind} onChange={(v) => onChange({ valueKind: v as RainImportSettings['valueKind'] })}>
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
