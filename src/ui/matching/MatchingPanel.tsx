import { useCallback, useState } from 'react';
import {
  UNIT_LABELS,
  VOLUME_UNITS,
  convertVolume,
  depthFromVolumeMm,
  methodSpec,
  paramApplies,
  runoffVolumeM3,
  type UnitSystem,
  type VolumeUnit,
} from '../../core';
import type { Scenario } from '../../scenario/types';
import { loadHydrographSide, useActions, useDerived, useScenario } from '../../store';
import { NumberField } from '../fields/NumberField';
import { formatValue } from '../format';
import { VOLUME_CHOICES, displayUnit, fromDisplay, toDisplay, unitText } from '../units';
import { labelInSentence, paramAmount } from '../results/fit-words';
import { lazyPart } from '../layout/LazyPart';

// How sure the fit is: its interval and calibration chart load on first use (not part of the first screen).
const FitUncertainty = lazyPart('fit uncertainty', () =>
  Promise.all([import('./FitUncertainty'), loadHydrographSide()]).then(([m]) => m.FitUncertainty),
);

/**
 * The observed value when the user switches between depth and volume: the
 * same runoff over the catchment (the core converts), or 0 when there is no
 * area to convert with (undo brings the old value back).
 */
function convertObserved(observed: Scenario['observed'], as: 'depth' | 'volume', areaM2: number): number {
  if (!observed) return 0;
  if (observed.as === as) return observed.value;
  if (!(areaM2 > 0)) return 0;
  return as === 'volume' ? runoffVolumeM3(observed.value, areaM2) : depthFromVolumeMm(observed.value, areaM2);
}

const DEFAULT_VOLUME_UNIT: Record<UnitSystem, VolumeUnit> = { si: 'm3', us: 'acre-ft' };

/**
 * Matching an observed runoff: the observed depth or volume, the parameter to
 * fit, "Fit" (the core's exact calibration) and "Keep matched". When the core
 * finds no answer its message stands next to the observed runoff. The answer
 * reads as a proposal ("Fit would set …") until it is the value in use, and
 * goes away while the observed runoff typed is not applied (Fit is off then).
 */
export function MatchingPanel() {
  const observed = useScenario((s) => s.observed);
  const units = useScenario((s) => s.units);
  const method = useScenario((s) => s.method);
  const kind = method.kind;
  const areaM2 = useScenario((s) => s.catchment.areaM2);
  const target = useDerived((d, s) => d.target(s));
  const fit = useDerived((d, s) => d.fit(s));
  const matched = useDerived((d, s) => d.isMatched(s));
  const inUse = useDerived((d, s) => d.fitInUse(s));
  // While the streamflow record is the observed runoff, the field shows its separated depth (derived, never stored).
  const fromRecord = useDerived((d, s) => d.observedFromSeparation(s));
  const actions = useActions();
  const [volumeUnitBySystem, setVolumeUnitBySystem] = useState(DEFAULT_VOLUME_UNIT);
  // False while the text in the observed-runoff field is refused: the store still holds the last good value.
  const [observedApplied, setObservedApplied] = useState(true);
  const onObservedApplied = useCallback((applied: boolean) => setObservedApplied(applied), []);
  const volumeUnit = volumeUnitBySystem[units];

  const spec = methodSpec(kind);
  const as = fromRecord ? 'depth' : (observed?.as ?? 'depth');
  const shown: Scenario['observed'] =
    fromRecord && observed ? { ...observed, as: 'depth', value: target?.ok ? target.mm : observed.value } : observed;
  const parameter = observed?.parameter ?? spec.params[0]?.key ?? '';
  const param = spec.params.find((p) => p.key === parameter);
  const depthUnit = unitText(displayUnit('depth', units));

  const problem = !observedApplied ? null : target && !target.ok ? target.message : fit && !fit.ok ? fit.message : null;
  let answer: string | null = null;
  if (!observedApplied) answer = 'The observed runoff typed is not applied, so there is nothing to fit until it is.';
  else if (fit?.ok && param) {
    const name = labelInSentence(param.label);
    const amount = paramAmount(param, fit.value, units);
    const giving = `giving the observed ${formatValue(toDisplay('depth', fit.excessMm, units))} ${depthUnit} of runoff.`;
    answer = !inUse
      ? `Fit would set ${name} to ${amount}, ${giving}`
      : `${matched ? 'Matched' : 'Fitted'}: ${name} is ${amount}, ${giving}`;
  }

  return (
    <section className="panel matching" aria-labelledby="matching-title">
      <h2 id="matching-title">Matching</h2>
      <p className="panel__intro">Fit one parameter so the rainfall excess equals an observed runoff.</p>
      <fieldset className="segmented">
        <legend>Observed runoff given as</legend>
        {(['depth', 'volume'] as const).map((option) => (
          <label key={option} className="segmented__option">
            <input
              type="radio"
              name="observed-as"
              value={option}
              checked={as === option}
              onChange={() => actions.setObserved({ as: option, value: convertObserved(shown, option, areaM2) })}
            />
            <span>{option === 'depth' ? 'Depth' : 'Volume'}</span>
          </label>
        ))}
      </fieldset>
      {as === 'depth' ? (
        <NumberField
          key="depth"
          id="observed-value"
          label="Observed runoff"
          unit={depthUnit}
          value={shown?.value ?? null}
          toDisplay={(mm) => toDisplay('depth', mm, units)}
          fromDisplay={(v) => fromDisplay('depth', v, units)}
          plausible="depth"
          onCommit={(mm, edit) => actions.setObserved({ as: 'depth', value: mm, parameter }, edit)}
          history={actions}
          onApplied={onObservedApplied}
          note={problem}
          hint={
            fromRecord
              ? 'The direct runoff separated from the streamflow record (see Baseflow separation); typing a value here stops following it.'
              : null
          }
        />
      ) : (
        <NumberField
          key="volume"
          id="observed-value"
          label="Observed runoff"
          value={observed?.value ?? null}
          toDisplay={(m3) => convertVolume(m3, 'm3', volumeUnit)}
          fromDisplay={(v) => convertVolume(v, volumeUnit, 'm3')}
          shownUnit={unitText(volumeUnit)}
          plausible="volume"
          onCommit={(m3, edit) => actions.setObserved({ as: 'volume', value: m3, parameter }, edit)}
          history={actions}
          onApplied={onObservedApplied}
          note={problem}
          hint={
            target?.ok
              ? `${formatValue(toDisplay('depth', target.mm, units))} ${depthUnit} over the catchment area (set under Catchment and notes).`
              : 'Spread over the catchment area (set under Catchment and notes).'
          }
          after={
            <select
              aria-label="Volume unit"
              value={volumeUnit}
              onChange={(e) => {
                const next = e.currentTarget.value;
                if (Object.prototype.hasOwnProperty.call(VOLUME_UNITS, next)) {
                  setVolumeUnitBySystem((u) => ({ ...u, [units]: next as VolumeUnit }));
                }
              }}
            >
              {VOLUME_CHOICES.map((u) => (
                <option key={u} value={u}>
                  {UNIT_LABELS[u] ?? u}
                </option>
              ))}
            </select>
          }
        />
      )}
      <div className="field">
        <label htmlFor="fit-parameter">Parameter to fit</label>
        <select
          id="fit-parameter"
          value={parameter}
          onChange={(e) => actions.setObserved({ parameter: e.currentTarget.value })}
        >
          {spec.params
            .filter((p) => p.key === parameter || paramApplies(p, method))
            .map((p) => (
              <option key={p.key} value={p.key}>
                {p.label}
              </option>
            ))}
        </select>
      </div>
      <div className="matching__actions">
        <button
          type="button"
          className="button--primary"
          onClick={() => actions.fitObserved()}
          disabled={!observedApplied || !fit?.ok || inUse}
          aria-describedby="fit-answer"
        >
          Fit
        </button>
        <label className="switch" htmlFor="keep-matched">
          <input
            id="keep-matched"
            type="checkbox"
            role="switch"
            checked={observed?.locked ?? false}
            disabled={observed === null}
            aria-describedby="keep-matched-hint"
            onChange={(e) => actions.setKeepMatched(e.currentTarget.checked)}
          />
          <span>Keep matched</span>
        </label>
      </div>
      <p className="field__hint" id="keep-matched-hint">
        While on, the fitted value follows the observed runoff as bars change.
        {areaM2 > 0 || as === 'depth' ? null : ' An observed volume needs the catchment area.'}
      </p>
      <p className="matching__answer" id="fit-answer" aria-live="polite">
        {answer}
      </p>
      {observed ? <FitUncertainty /> : null}
    </section>
  );
}
