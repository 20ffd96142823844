import type { UnitSystem } from '../../core';
import { useActions, useScenario, useWorkbench } from '../../store';
import { NumberFormatPicker } from '../number-format';
import { TextInput } from '../fields/TextInput';

const SYSTEMS: readonly { value: UnitSystem; label: string; hint: string }[] = [
  { value: 'si', label: 'SI', hint: 'mm, mm/h, ha, m³' },
  { value: 'us', label: 'US customary', hint: 'in, in/h, acres, acre-ft' },
];

/** Top bar: the scenario's name, the unit switch, the number format, undo and redo. */
export function Header() {
  const name = useScenario((s) => s.name);
  const units = useScenario((s) => s.units);
  const undoLabel = useWorkbench((s) => s.undoLabel);
  const redoLabel = useWorkbench((s) => s.redoLabel);
  const actions = useActions();

  return (
    <header className="top">
      <p className="top__brand" aria-hidden="true">
        Raincut
      </p>
      <h1 className="visually-hidden">Raincut rainfall loss workbench</h1>
      <div className="top__name">
        <label htmlFor="scenario-name">Scenario name</label>
        <TextInput
          id="scenario-name"
          value={name}
          autoComplete="off"
          onCommit={actions.setName}
          messageClassName="top__name-msg"
        />
        <button
          type="button"
          className="top__new"
          onClick={actions.newScenario}
          title="A blank scenario in the same units; Undo brings this one back"
        >
          New scenario
        </button>
      </div>
      <fieldset className="segmented" aria-describedby="units-hint">
        <legend>Units</legend>
        {SYSTEMS.map((s) => (
          <label key={s.value} className="segmented__option" title={s.hint}>
            <input
              type="radio"
              name="unit-system"
              value={s.value}
              checked={units === s.value}
              onChange={() => actions.setUnits(s.value)}
            />
            <span>{s.label}</span>
          </label>
        ))}
        <span id="units-hint" className="visually-hidden">
          Every value on screen converts; stored values stay exact.
        </span>
      </fieldset>
      <NumberFormatPicker />
      <div className="top__history" role="group" aria-label="History">
        <button
          type="button"
          onClick={actions.undo}
          disabled={undoLabel === null}
          title={undoLabel ? `Undo: ${undoLabel} (Ctrl+Z)` : 'Nothing to undo'}
          aria-keyshortcuts="Control+Z"
        >
          Undo
        </button>
        <button
          type="button"
          onClick={actions.redo}
          disabled={redoLabel === null}
          title={redoLabel ? `Redo: ${redoLabel} (Ctrl+Shift+Z or Ctrl+Y)` : 'Nothing to redo'}
          aria-keyshortcuts="Control+Shift+Z Control+Y"
        >
          Redo
        </button>
      </div>
    </header>
  );
}
