import type { Grouping, SeriesSettings } from '../../io';
import { NumberField } from '../fields/NumberField';
import { Select } from './Select';
import { formatCount } from '../format';

/** More lines than a file the dialog reads can hold (50 MB of one-character lines is 25 million). */
const MAX_SKIP_LINES = 30_000_000;

/** How the text splits: separator, decimal mark, thousands separator, header line, lines to skip, blank lines. */
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
        <option value="space">Spaces</option>
        <option value="fixed">Aligned columns (fixed width)</option>
        <option value="none">None (one value a line)</option>
      </Select>
      <Select
        label="Decimal mark"
        value={s.decimal}
        onChange={(v) => {
          const decimal = v as SeriesSettings['decimal'];
          // A thousands separator that is now the decimal mark is switched to its partner (1,234.5 ↔ 1.234,5).
          const grouping = s.grouping ?? 'none';
          const clash = (decimal === 'comma' && grouping === 'comma') || (decimal === 'point' && grouping === 'point');
          onChange(clash ? { decimal, grouping: decimal === 'comma' ? 'point' : 'comma' } : { decimal });
        }}
      >
        <option value="point">Point (2.5)</option>
        <option value="comma">Comma (2,5)</option>
      </Select>
      <Select
        label="Thousands separator"
        value={s.grouping ?? 'none'}
        onChange={(v) => onChange({ grouping: v as Grouping })}
      >
        <option value="none">None (1234)</option>
        <option value="comma" disabled={s.decimal === 'comma'}>
          Comma (1,234)
        </option>
        <option value="point" disabled={s.decimal === 'point'}>
          Point (1.234)
        </option>
        <option value="space">Space (1 234)</option>
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
      <div className="field guess guess--check">
        <label className="switch">
          <input
            type="checkbox"
            checked={s.skipBlankLines ?? false}
            onChange={(e) => onChange({ skipBlankLines: e.currentTarget.checked })}
          />
          Skip blank lines inside the data
        </label>
      </div>
    </fieldset>
  );
}
