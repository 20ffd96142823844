import { AREA_UNITS, UNIT_LABELS, convertArea, type AreaUnit } from '../../core';
import { useActions, useScenario, useWorkbench } from '../../store';
import { NumberField } from '../fields/NumberField';
import { TextArea, TextInput } from '../fields/TextInput';
import { AREA_CHOICES } from '../units';

/** The catchment area, typed in a unit of the user's choice, stored in m². */
export function AreaField() {
  const areaM2 = useScenario((s) => s.catchment.areaM2);
  const units = useScenario((s) => s.units);
  // While "Keep matched" follows an observed volume (or a separated record), the fit needs an area: 0 is not applied.
  const fitNeedsArea = useScenario((s) =>
    Boolean(s.observed?.locked && (s.observed.as === 'volume' || s.streamflow?.useAsObserved)),
  );
  const actions = useActions();
  // The unit is a preference in the store (kept in this browser), so the CSV export and the report use it too.
  const unit = useWorkbench((s) => s.areaUnits[units]);
  return (
    <NumberField
      id="catchment-area"
      label="Catchment area"
      value={areaM2}
      toDisplay={(m2) => convertArea(m2, 'm2', unit)}
      fromDisplay={(v) => convertArea(v, unit, 'm2')}
      shownUnit={UNIT_LABELS[unit] ?? unit}
      plausible="area"
      check={(m2) =>
        fitNeedsArea && !(m2 > 0)
          ? 'The observed runoff is a volume kept matched, which needs an area greater than 0 to become a depth.'
          : null
      }
      onCommit={(m2, edit) => actions.setAreaM2(m2, edit)}
      history={actions}
      hint={areaM2 > 0 ? null : 'Needed for the runoff volume and for an observed volume.'}
      after={
        <select
          aria-label="Area unit"
          value={unit}
          onChange={(e) => {
            const next = e.currentTarget.value;
            if (Object.prototype.hasOwnProperty.call(AREA_UNITS, next)) actions.setAreaUnit(next as AreaUnit);
          }}
        >
          {AREA_CHOICES[units].map((u) => (
            <option key={u} value={u}>
              {UNIT_LABELS[u] ?? u}
            </option>
          ))}
        </select>
      }
    />
  );
}

/**
 * What the scenario is about: the catchment's name and area, and free notes. All three belong to the scenario
 * (saved, shared, printed), and a new storm from elsewhere may not belong to them (see the paste dialog).
 */
export function CatchmentPanel() {
  const name = useScenario((s) => s.catchment.name);
  const notes = useScenario((s) => s.notes);
  const actions = useActions();
  return (
    <section className="panel catchment" aria-labelledby="catchment-title">
      <h2 id="catchment-title">Catchment and notes</h2>
      <div className="catchment__grid">
        <div className="field catchment__name">
          <label htmlFor="catchment-name">Catchment name</label>
          <TextInput id="catchment-name" value={name} autoComplete="off" onCommit={actions.setCatchmentName} />
        </div>
        <div className="catchment__area">
          <AreaField />
        </div>
        <div className="field catchment__notes">
          <label htmlFor="scenario-notes">Notes</label>
          <TextArea id="scenario-notes" value={notes} rows={2} onCommit={actions.setNotes} />
        </div>
      </div>
    </section>
  );
}
