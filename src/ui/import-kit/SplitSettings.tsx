import type { SeriesSettings } from '../../io';
import { NumberField } from '../fields/NumberField';
import { Select } from './Select';

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
      <Select
        label="Separator"
        value={s.separator}
        onChange={(v) => onChange({ separator: v as SeriesSettings['separator'] })}
      >
        <option value="tab">Tab</option>
        <option value="comma">Comma</option>
        <option value="semicolon">Semicolon</option>
        <option value="none">None (one value a line)</option>
      </Select>
      <Select
        label="Decimal mark"
        value={s.decimal}
        onChange={(v) => onChange({ decimal: v as SeriesSettings['decimal'] })}
      >
        <option value="point">Point (2.5)</option>
        <option value="comma">Comma (2,5)</option>
      </Select>
      <div className="field guess guess--check">
        <label className="switch">
          <input
            type="checkbox"
            checked={s.hasHeader}
            onChange={(e) => onChange({ hasHeader: e.currentTarget.checked })}
          />
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
