import { NUMBER_FORMATS, isNumberFormatId } from '../../io/number-format';
import { chooseNumberFormat, useNumberFormat } from './preference';

/**
 * "Number format": how this browser writes and reads numbers (groups of
 * thousands, decimal mark). A preference of the reader's, not part of the
 * scenario.
 */
export function NumberFormatPicker() {
  const format = useNumberFormat();
  return (
    <div className="top__format">
      <label htmlFor="number-format">Number format</label>
      <select
        id="number-format"
        value={format.id}
        aria-describedby="number-format-hint"
        onChange={(e) => {
          const id = e.currentTarget.value;
          if (isNumberFormatId(id)) chooseNumberFormat(id);
        }}
      >
        {NUMBER_FORMATS.map((f) => (
          <option key={f.id} value={f.id} title={f.label}>
            {f.id}
          </option>
        ))}
      </select>
      <span id="number-format-hint" className="visually-hidden">
        How numbers are written and typed in this browser: thousands grouped and decimals marked as in the sample. Links
        and files are not changed.
      </span>
    </div>
  );
}
