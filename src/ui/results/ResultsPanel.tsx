import { useState } from 'react';
import { AREA_UNITS, UNIT_LABELS, convertArea, type AreaUnit, type UnitSystem } from '../../core';
import { useActions, useDerived, useScenario } from '../../store';
import { NumberField } from '../fields/NumberField';
import { formatPercent, formatValue } from '../format';
import { AREA_CHOICES, displayUnit, toDisplay, unitText, type Quantity } from '../units';

interface Row {
  readonly id: string;
  readonly label: string;
  readonly value: string;
  readonly note?: string;
}

/** The catchment area, typed in a unit of the user's choice, stored in m². */
function AreaField() {
  const areaM2 = useScenario((s) => s.catchment.areaM2);
  const units = useScenario((s) => s.units);
  // While "Keep matched" follows an observed volume (or a separated record), the fit needs an area: 0 is not applied.
  const fitNeedsArea = useScenario((s) =>
    Boolean(s.observed?.locked && (s.observed.as === 'volume' || s.streamflow?.useAsObserved)),
  );
  const actions = useActions();
  const [unitBySystem, setUnitBySystem] = useState<Record<UnitSystem, AreaUnit>>({ si: 'ha', us: 'acre' });
  const unit = unitBySystem[units];
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
            if (Object.prototype.hasOwnProperty.call(AREA_UNITS, next)) {
              setUnitBySystem((u) => ({ ...u, [units]: next as AreaUnit }));
            }
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

/** Totals for the storm under the current method, from the core; they follow every drag frame. */
export function ResultsPanel() {
  const units = useScenario((s) => s.units);
  const results = useDerived((d, s) => d.results(s));
  const volumeM3 = useDerived((d, s) => d.runoffVolumeM3(s));

  const show = (q: Quantity, si: number): string =>
    `${formatValue(toDisplay(q, si, units))} ${unitText(displayUnit(q, units))}`;
  const r = results.ok ? results.result : null;
  const rows: Row[] = [
    { id: 'rain', label: 'Rainfall depth', value: r ? show('depth', r.rainMm) : '—' },
    { id: 'loss', label: 'Loss depth', value: r ? show('depth', r.totalLossMm) : '—' },
    { id: 'excess', label: 'Excess depth', value: r ? show('depth', r.totalExcessMm) : '—' },
    {
      id: 'volume',
      label: 'Runoff volume',
      value: volumeM3 === null ? '—' : show('volume', volumeM3),
      ...(volumeM3 === null && r ? { note: 'needs the catchment area' } : {}),
    },
    { id: 'fraction', label: 'Runoff fraction', value: r ? formatPercent(r.runoffFraction) : '—' },
    { id: 'peak', label: 'Peak excess intensity', value: r ? show('rate', r.peakExcessMmH) : '—' },
  ];

  return (
    <section className="panel results" aria-labelledby="results-title">
      <h2 id="results-title">Results</h2>
      <dl className="results__grid">
        {rows.map((row) => (
          <div key={row.id} className="results__item">
            <dt id={`result-${row.id}-label`}>{row.label}</dt>
            <dd aria-labelledby={`result-${row.id}-label`} data-result={row.id}>
              {row.value}
              {row.note ? <span className="results__note"> ({row.note})</span> : null}
            </dd>
          </div>
        ))}
      </dl>
      {!results.ok ? (
        <p className="results__error" role="alert">
          {results.message}
        </p>
      ) : null}
      <div className="results__area">
        <AreaField />
      </div>
    </section>
  );
}
