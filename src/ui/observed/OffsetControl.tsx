import { useState } from 'react';
import { useActions, useDerived, useScenario, withRecordOffsetH } from '../../store';
import { NumberField } from '../fields/NumberField';
import { formatValue } from '../format';

type OffsetUnit = 'h' | 'min';
const PER_HOUR: Record<OffsetUnit, number> = { h: 1, min: 60 };

/** "1 h 30 min before", "45 min after", "at" the storm start. */
function offsetWords(offsetH: number): string {
  if (offsetH === 0) return 'at the storm start';
  const minutes = Math.abs(offsetH) * 60;
  const h = Math.floor(minutes / 60 + 1e-9);
  const m = minutes - h * 60;
  const parts = [h > 0 ? `${formatValue(h)} h` : '', m > 1e-6 ? `${formatValue(m)} min` : ''].filter(Boolean);
  return `${parts.join(' ')} ${offsetH < 0 ? 'before' : 'after'} the storm start`;
}

/**
 * Lining the record up with the storm. With clock times on both the clocks
 * do it and this says how they fall; otherwise the user sets when the first
 * sample comes after the storm start, in hours or minutes (negative: before).
 */
export function OffsetControl() {
  const alignment = useDerived((d, s) => d.alignment(s));
  const stored = useScenario((s) => s.streamflow?.offsetH ?? 0);
  const actions = useActions();
  const [unit, setUnit] = useState<OffsetUnit>('h');
  if (!alignment) return null;
  if (alignment.source === 'clocks') {
    return (
      <p className="hydro__align" data-align="clocks">
        Lined up by clock time: the record’s first sample is {offsetWords(alignment.offsetH)}.
        {alignment.note ? ` ${alignment.note}` : ''}
      </p>
    );
  }
  return (
    <div className="hydro__align hydro__align--offset" data-align="offset">
      <NumberField
        key={unit}
        id="record-offset"
        label="Record start after storm start"
        value={stored}
        toDisplay={(h) => h * PER_HOUR[unit]}
        fromDisplay={(v) => v / PER_HOUR[unit]}
        shownUnit={unit}
        plausible="offset"
        onCommit={(h, edit) => actions.edit('Line up the record', (s) => withRecordOffsetH(s, h), edit)}
        history={actions}
        hint={`The rainfall and the record do not both have clock times, so line them up here: the first sample is ${offsetWords(stored)}. Negative when the record starts first.`}
        after={
          <select
            aria-label="Offset unit"
            value={unit}
            onChange={(e) => setUnit(e.currentTarget.value === 'min' ? 'min' : 'h')}
          >
            <option value="h">h</option>
            <option value="min">min</option>
          </select>
        }
      />
    </div>
  );
}
