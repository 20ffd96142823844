import { useDerived, useScenario } from '../../store';
import { formatPercent, formatValue } from '../format';
import { displayUnit, toDisplay, unitText, type Quantity } from '../units';

interface Row {
  readonly id: string;
  readonly label: string;
  readonly value: string;
  readonly note?: string;
}

/**
 * Totals for the storm under the current method, from the core; they follow every drag frame. A strip right
 * under the hyetograph that stays in view at the foot of the window while the page scrolls (styles/app.css),
 * so the numbers and the loss line are seen together on a laptop screen.
 */
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
      <h2 id="results-title" className="results__title">
        Results
      </h2>
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
    </section>
  );
}
