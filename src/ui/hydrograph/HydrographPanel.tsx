import { useState } from 'react';
import {
  TRANSFORMS,
  TRANSFORM_KINDS,
  TRANSFORM_OBJECTIVES,
  fittableTransformKeys,
  isTransformKind,
  type TransformObjective,
  type TransformParam,
} from '../../core';
import { useActions, useDerived, useScenario, useWorkbenchStore } from '../../store';
import { useDeferredDerived } from '../../store/deferred';
import {
  fitRunoffTransform,
  transformFitParameter,
  withTransformFit,
  withTransformKind,
} from '../../store/hydrograph-edits';
import { formatValue } from '../format';
import { dischargeText } from '../observed/discharge';
import { hoursMinutes, peakTimeText } from '../results/hours-minutes';
import { TransformFields } from './TransformFields';
import './hydrograph.css';

/** How each fit objective reads in the picker. */
export const OBJECTIVE_LABELS: Readonly<Record<TransformObjective, string>> = {
  peak: 'Observed peak discharge',
  'time-of-peak': 'Observed time of peak',
  nse: 'Best Nash–Sutcliffe efficiency',
};

/** A signed percentage; below 0.0001 % (solver round-off on a match) it reads 0. */
/** How each objective reads after a fit. */
const OBJECTIVE_PHRASES: Readonly<Record<TransformObjective, string>> = {
  peak: 'matching the observed peak discharge',
  'time-of-peak': 'matching the observed time of peak',
  nse: 'for the best Nash–Sutcliffe efficiency',
};

const signedPercent = (x: number | null): string => {
  if (x === null) return '—';
  if (Math.abs(x) < 1e-4) return '0 %';
  return `${x > 0 ? '+' : '−'}${formatValue(Math.abs(x))} %`;
};

interface Row {
  readonly id: string;
  readonly label: string;
  readonly value: string;
}

/** Peak and time to peak of the computed hydrograph; against a record, the errors and the efficiency. */
function HydrographResults() {
  const units = useScenario((s) => s.units);
  // Deferred with the chart's layer (see useDeferredDerived): a drag of the loss line does not wait for the routing.
  const computed = useDeferredDerived((d, s) => d.hydrograph(s));
  const comparison = useDeferredDerived((d, s) => d.comparison(s));
  if (computed === null) return null;
  if (!computed.ok) {
    return (
      <p className="hydrograph__error" role="alert">
        No hydrograph: {computed.message}
      </p>
    );
  }
  const h = computed.hydrograph;
  const rows: Row[] = [
    { id: 'peak-discharge', label: 'Peak discharge', value: dischargeText(h.peakM3s, units) },
    { id: 'time-to-peak', label: 'Time to peak', value: peakTimeText(h) },
  ];
  if (comparison) {
    rows.push(
      { id: 'peak-error', label: 'Peak error', value: signedPercent(comparison.peakErrorPct) },
      {
        id: 'timing-error',
        label: 'Timing error',
        value: `${hoursMinutes(comparison.timingErrorH, true)}${comparison.timingErrorH > 0 ? ' (late)' : comparison.timingErrorH < 0 ? ' (early)' : ''}`,
      },
      { id: 'volume-error', label: 'Volume error', value: signedPercent(comparison.volumeErrorPct) },
      {
        id: 'nse',
        label: 'Nash–Sutcliffe efficiency',
        value: comparison.nse === null ? '—' : comparison.nse.toFixed(3).replace('-', '−'),
      },
    );
  }
  return (
    <dl className="hydrograph__results" aria-label="Hydrograph results">
      {rows.map((row) => (
        <div key={row.id} className="hydrograph__result">
          <dt id={`hydro-result-${row.id}-label`}>{row.label}</dt>
          <dd aria-labelledby={`hydro-result-${row.id}-label`} data-result={row.id}>
            {row.value}
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** Fit a transform parameter to the observed direct runoff, by a stated objective, the loss kept on the volume. */
function HydrographFit() {
  const store = useWorkbenchStore();
  const actions = useActions();
  const settings = useScenario((s) => s.hydrograph);
  const hasObserved = useDerived((d, s) => d.observedDirect(s) !== null);
  const [answer, setAnswer] = useState<string | null>(null);
  const transform = settings.transform;
  if (transform === null) return null;
  const keys = fittableTransformKeys(transform.kind);
  if (keys.length === 0) {
    return <p className="field__hint">A unit hydrograph of your own is used as given; it has no parameter to fit.</p>;
  }
  const parameter = transformFitParameter(settings);
  const params = TRANSFORMS[transform.kind].params as readonly TransformParam[];
  const labelOf = (key: string): string => params.find((p) => p.key === key)?.label ?? key;
  // Fitting one of several parameters holds the others: "(n held)".
  const held = (key: string): string =>
    params
      .filter((p) => p.fit && p.key !== key)
      .map((p) => p.symbol ?? p.label.toLowerCase())
      .join(', ');
  return (
    <div className="hydrograph__fit" role="group" aria-labelledby="hydro-fit-title">
      <h3 id="hydro-fit-title">Fit to the record</h3>
      {keys.length > 1 ? (
        <div className="field">
          <label htmlFor="hydro-fit-param">Hydrograph parameter to fit</label>
          <select
            id="hydro-fit-param"
            value={parameter ?? ''}
            onChange={(e) => {
              const key = e.currentTarget.value;
              actions.edit('Choose the hydrograph parameter to fit', (s) => withTransformFit(s, { fitParameter: key }));
            }}
          >
            {keys.map((key) => (
              <option key={key} value={key}>
                {labelOf(key)}
                {` (${held(key)} held)`}
              </option>
            ))}
          </select>
        </div>
      ) : null}
      <div className="field">
        <label htmlFor="hydro-objective">Fit to</label>
        <select
          id="hydro-objective"
          value={settings.objective}
          onChange={(e) => {
            const objective = TRANSFORM_OBJECTIVES.find((o) => o === e.currentTarget.value);
            if (objective)
              actions.edit('Choose what the hydrograph fit matches', (s) => withTransformFit(s, { objective }));
          }}
        >
          {TRANSFORM_OBJECTIVES.map((o) => (
            <option key={o} value={o}>
              {OBJECTIVE_LABELS[o]}
            </option>
          ))}
        </select>
      </div>
      <button
        type="button"
        disabled={!hasObserved}
        onClick={() => {
          const s = store.getState().scenario;
          const outcome = fitRunoffTransform(s, store.derived);
          if (outcome.next !== null && outcome.result.ok) {
            const next = outcome.next;
            actions.edit(`Fit ${labelOf(parameter ?? '').toLowerCase()} to the record`, () => next);
            const unit = params.find((p) => p.key === parameter)?.unit === 'h' ? ' h' : '';
            setAnswer(
              `Fitted: ${labelOf(parameter ?? '')} ${formatValue(outcome.result.value)}${unit} ` +
                `${OBJECTIVE_PHRASES[s.hydrograph.objective]}` +
                (outcome.lossMatched ? '; the loss was matched to the observed volume first.' : '.'),
            );
          } else {
            setAnswer(outcome.result.ok ? null : outcome.result.message);
          }
        }}
      >
        Fit the hydrograph
      </button>
      {!hasObserved ? <p className="field__hint">Needs a streamflow record with its baseflow separated.</p> : null}
      <p className="hydrograph__answer" aria-live="polite" data-answer="hydro-fit">
        {answer}
      </p>
    </div>
  );
}

/**
 * The runoff hydrograph: which unit hydrograph turns the rainfall excess
 * into direct runoff, its parameters, the computed peak and, against an
 * observed record, how well it fits. "None" computes no hydrograph.
 */
export function HydrographPanel() {
  const actions = useActions();
  const transform = useScenario((s) => s.hydrograph.transform);
  const spec = transform ? TRANSFORMS[transform.kind] : null;
  return (
    <section className="panel hydrograph" aria-labelledby="hydrograph-panel-title">
      <h2 id="hydrograph-panel-title">Runoff hydrograph</h2>
      <div className="field">
        <label htmlFor="transform-kind">Unit hydrograph</label>
        <select
          id="transform-kind"
          value={transform?.kind ?? 'none'}
          aria-describedby="transform-summary"
          onChange={(e) => {
            const kind = e.currentTarget.value;
            actions.edit(isTransformKind(kind) ? `Use ${TRANSFORMS[kind].label}` : 'Compute no hydrograph', (s) =>
              withTransformKind(s, isTransformKind(kind) ? kind : null),
            );
          }}
        >
          <option value="none">None (no hydrograph)</option>
          {TRANSFORM_KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {TRANSFORMS[kind].label}
            </option>
          ))}
        </select>
        <p className="field__hint" id="transform-summary">
          {spec ? spec.summary : 'Choose one to route the rainfall excess to a direct runoff hydrograph.'}
        </p>
      </div>
      {transform ? (
        <>
          <TransformFields transform={transform} />
          <HydrographResults />
          <HydrographFit />
          <p className="method__source">Source: {spec?.source}</p>
        </>
      ) : null}
    </section>
  );
}
