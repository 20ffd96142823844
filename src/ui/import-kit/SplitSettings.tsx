import type { SeriesSettings } from '../../io';
import { NumberField } from '../fields/NumberField';
import { Select } from './Select';
import { formatCount } from '../format';

/** More lines than a file the dialog reads can hold (50 MB of one-character lines is 25 million). */
const MAX_SKIP_LINES = 30_000_000;

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
        check={(v) =>
          Number.isInteger(v) && v >= 0 && v <= MAX_SKIP_LINES
            ? null
            : `Enter a whole number of lines, 0 to ${formatCount(MAX_SKIP_LINES)}.`
        }
        onCommit={(v) => onChange({ skipLines: v })}
      />
    </fieldset>
  );
}
