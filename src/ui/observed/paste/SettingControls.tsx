import { useId, useState, type ReactNode } from 'react';
import { parseClock, type SeriesSettings, type TextRow } from '../../../io';
import { NumberField } from '../../fields/NumberField';

/**
 * Controls for the import settings every pasted series shares (how the
 * text splits, the time columns), typed on the io layer's SeriesSettings so
 * any series import can use them. The streamflow paste uses them; each
 * control is a correction of one guess.
 */

export function Select({
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
export function DateField({ value, hint, onChange }: { value: string | null; hint: string; onChange: (date: string | null) => void }) {
  const id = useId();
  const [draft, setDraft] = useState<{ text: string; message: string } | null>(null);
  const text = draft?.text ?? value ?? '';
  return (
    <div className={`field guess${draft ? ' field--bad' : ''}`}>
      <label htmlFor={id}>Date of the first time</label>
      <input
        id={id}
        type="text"
        placeholder="YYYY-MM-DD"
        autoComplete="off"
        value={text}
        aria-invalid={draft ? true : undefined}
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
        {hint}
      </p>
      <p className="field__msg" id={`${id}-msg`} aria-live="polite">
        {draft?.message ?? null}
      </p>
    </div>
  );
}

export function columnLabel(c: number, header: readonly string[] | null): string {
  const name = header?.[c - 1];
  return name ? `Column ${c}: ${name}` : `Column ${c}`;
}

export function columnNumbers(s: SeriesSettings, columnCount: number): number[] {
  return Array.from({ length: Math.max(1, columnCount, s.valueColumn, s.timeColumn ?? 0) }, (_, i) => i + 1);
}

/** How the text splits: separator, decimal mark, header line, lines to skip. */
export function SplitSettings({
  settings: s,
  idPrefix,
  onChange,
}: {
  settings: SeriesSettings;
  idPrefix: string;
  onChange: (patch: Partial<SeriesSettings>) => void;
}) {
  return (
    <fieldset className="guesses__group">
      <legend>How the text splits</legend>
      <Select label="Separator" value={s.separator} onChange={(v) => onChange({ separator: v as SeriesSettings['separator'] })}>
        <option value="tab">Tab</option>
        <option value="comma">Comma</option>
        <option value="semicolon">Semicolon</option>
        <option value="none">None (one value a line)</option>
      </Select>
      <Select label="Decimal mark" value={s.decimal} onChange={(v) => onChange({ decimal: v as SeriesSettings['decimal'] })}>
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
        id={`${idPrefix}-skip-lines`}
        label="Lines to skip at the top"
        value={s.skipLines}
        check={(v) => (Number.isInteger(v) && v >= 0 ? null : 'Enter a whole number of lines, 0 or more.')}
        onCommit={(v) => onChange({ skipLines: v })}
      />
    </fieldset>
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
