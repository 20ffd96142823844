import { methodSpec, paramApplies } from '../../core';
import { useActions, useScenario, withDesignPick, withEventParameter } from '../../store';
import { NumberField } from '../fields/NumberField';
import { formatPercent, formatValue } from '../format';
import {
  displayUnit,
  paramFromDisplay,
  paramPlausible,
  paramToDisplay,
  paramUnitText,
  toDisplay,
  unitText,
} from '../units';
import { FitChart } from './FitChart';
import { SpreadList } from './SpreadList';
import { TransformSpread, transformCell } from './TransformSpread';
import { useEventFits, useEventTransformFits } from './use-event-fits';

const PICKS = [
  { value: 'median', label: 'Median' },
  { value: 'mean', label: 'Mean' },
  { value: 'min', label: 'Smallest' },
  { value: 'max', label: 'Largest' },
] as const;

/**
 * Fit all: the chosen parameter fitted to every event at once (the core's
 * fitEvents), the spread of the fitted values, the chart against storm
 * size, the design value pick and each event's runoff with it.
 */
export function FitAll() {
  const units = useScenario((s) => s.units);
  const pick = useScenario((s) => s.eventSet.designPick);
  const actions = useActions();
  const { fits, outcome } = useEventFits();
  const shapes = useEventTransformFits();
  const spec = methodSpec(fits.method.kind);
  const param = spec.params.find((p) => p.key === fits.parameter);
  const paramLabel = param?.label ?? fits.parameter;
  const paramUnit = param ? paramUnitText(param.unit, units) : '';
  const showParam = (si: number): number => (param ? paramToDisplay(param.unit, si, units) : si);
  const withUnit = (si: number): string => `${formatValue(showParam(si))}${paramUnit === '' ? '' : ` ${paramUnit}`}`;
  const depthUnit = unitText(displayUnit('depth', units));
  const depth = (mm: number): string => `${formatValue(toDisplay('depth', mm, units))} ${depthUnit}`;
  const { summary } = fits;
  const without = summary.withoutAnswer + fits.withoutTarget;
  const stat = (x: number | null): string => (x === null ? '—' : withUnit(x));
  const runoffById = new Map(outcome.ok ? outcome.runoff.map((r) => [r.id, r]) : []);
  const ownValue = typeof pick === 'object' ? pick.value : null;

  return (
    <section className="panel fit-all" aria-labelledby="fit-all-title">
      <h2 id="fit-all-title">Fit all events</h2>
      <div className="fit-all__controls">
        <p className="panel__intro">
          {spec.label}, with the other parameters as set on the workbench. Each event is fitted on its own, exactly as
          the workbench would fit it.
        </p>
        <label htmlFor="fit-all-parameter">Parameter to fit</label>
        <select
          id="fit-all-parameter"
          value={fits.parameter}
          onChange={(e) => {
            const key = e.currentTarget.value;
            actions.edit('Choose the parameter fitted for every event', (s) => withEventParameter(s, key));
          }}
        >
          {spec.params
            .filter((p) => p.key === fits.parameter || paramApplies(p, fits.method))
            .map((p) => (
              <option key={p.key} value={p.key}>
                {p.label}
              </option>
            ))}
        </select>
      </div>

      <table className="fit-all__table">
        <caption>Fitted {paramLabel.toLowerCase()} for each event</caption>
        <thead>
          <tr>
            <th scope="col">Event</th>
            <th scope="col">Rainfall</th>
            <th scope="col">Observed runoff</th>
            <th scope="col">Runoff fraction</th>
            <th scope="col">Fitted {paramLabel.toLowerCase()}</th>
            {shapes ? <th scope="col">Fitted {shapes.param.label.toLowerCase()}</th> : null}
          </tr>
        </thead>
        <tbody>
          {fits.rows.map((row, k) => {
            const name = row.event.name.trim() === '' ? `Event ${k + 1}` : row.event.name;
            if (row.kind === 'no-target') {
              return (
                <tr key={row.event.id} className="fit-all__row--none">
                  <th scope="row">{name}</th>
                  <td colSpan={shapes ? 5 : 4}>
                    <strong>No answer:</strong> {row.message}
                  </td>
                </tr>
              );
            }
            const { fit } = row;
            return (
              <tr key={row.event.id} className={fit.result.ok ? undefined : 'fit-all__row--none'}>
                <th scope="row">{name}</th>
                <td>{fit.rainMm === null ? '—' : depth(fit.rainMm)}</td>
                <td>{depth(fit.observedMm)}</td>
                <td>{fit.runoffFraction === null ? '—' : formatPercent(fit.runoffFraction)}</td>
                <td>
                  {fit.result.ok ? (
                    withUnit(fit.result.value)
                  ) : (
                    <>
                      <strong>No answer:</strong> {fit.result.message}
                    </>
                  )}
                </td>
                {shapes ? <td>{transformCell(shapes, row.event.id)}</td> : null}
              </tr>
            );
          })}
        </tbody>
      </table>
      {fits.rows.length === 0 ? <p className="fit-all__empty">Add events to fit them.</p> : null}

      <h3>Spread of the fitted values</h3>
      <SpreadList
        label="Spread of the fitted values"
        summary={summary}
        withoutLabel="Without an answer"
        without={without}
        stat={stat}
      />

      {shapes ? <TransformSpread shapes={shapes} /> : null}

      <FitChart
        rows={fits.rows}
        parameterLabel={paramLabel}
        unit={paramUnit}
        depthUnit={depthUnit}
        showValue={showParam}
        showDepth={(mm) => toDisplay('depth', mm, units)}
        designValue={outcome.ok ? outcome.value : null}
      />

      <h3>Design value</h3>
      <fieldset className="fit-all__pick">
        <legend>Design {paramLabel.toLowerCase()}</legend>
        {PICKS.map((p) => (
          <label key={p.value} className="fit-all__pick-option">
            <input
              type="radio"
              name="design-pick"
              checked={pick === p.value}
              onChange={() =>
                actions.edit(`Use the ${p.label.toLowerCase()} as design value`, (s) => withDesignPick(s, p.value))
              }
            />
            {p.label}
          </label>
        ))}
        <label className="fit-all__pick-option">
          <input
            type="radio"
            name="design-pick"
            checked={typeof pick === 'object'}
            onChange={() =>
              actions.edit('Use a design value of your own', (s) =>
                withDesignPick(s, { value: outcome.ok ? outcome.value : 0 }),
              )
            }
          />
          A value of my own
        </label>
        <NumberField
          id="design-own-value"
          label="Own design value"
          {...(paramUnit === '' ? {} : { unit: paramUnit })}
          value={ownValue ?? (outcome.ok ? outcome.value : null)}
          toDisplay={showParam}
          fromDisplay={(v) => (param ? paramFromDisplay(param.unit, v, units) : v)}
          plausible={param ? paramPlausible(param.unit) : undefined}
          onCommit={(si, edit) => actions.edit('Set the design value', (s) => withDesignPick(s, { value: si }), edit)}
          history={actions}
        />
      </fieldset>
      {fits.rows.length === 0 && !outcome.ok ? (
        <p className="fit-all__design">The design value is chosen from the fitted values once events are added.</p>
      ) : outcome.ok ? (
        <p className="fit-all__design" role="status">
          Design {paramLabel.toLowerCase()}: <strong>{withUnit(outcome.value)}</strong>
        </p>
      ) : (
        <p className="fit-all__problem" role="alert">
          Design value: {outcome.message}
        </p>
      )}

      <table className="fit-all__table">
        <caption>Each event's runoff with the design value</caption>
        <thead>
          <tr>
            <th scope="col">Event</th>
            <th scope="col">Observed runoff</th>
            <th scope="col">Runoff with design value</th>
            <th scope="col">Error</th>
            <th scope="col">Error %</th>
          </tr>
        </thead>
        <tbody>
          {fits.rows.map((row, k) => {
            const name = row.event.name.trim() === '' ? `Event ${k + 1}` : row.event.name;
            const r = runoffById.get(row.event.id);
            if (!r || !r.ok) {
              return (
                <tr key={row.event.id} className="fit-all__row--none">
                  <th scope="row">{name}</th>
                  <td colSpan={4}>{r && !r.ok ? r.message : row.kind === 'no-target' ? row.message : '—'}</td>
                </tr>
              );
            }
            // The fit matches to the solver's tolerance: an error below a part in 10^9 of the observed runoff is none.
            const tiny = Math.abs(r.errorMm) <= 1e-9 * Math.max(1, r.observedMm);
            const errorMm = tiny ? 0 : r.errorMm;
            const errorPct = r.errorPct === null ? null : tiny ? 0 : r.errorPct;
            return (
              <tr key={row.event.id}>
                <th scope="row">{name}</th>
                <td>{depth(r.observedMm)}</td>
                <td>{depth(r.runoffMm)}</td>
                <td>{`${errorMm > 0 ? '+' : ''}${depth(errorMm)}`}</td>
                <td>{errorPct === null ? '—' : `${errorPct > 0 ? '+' : ''}${formatValue(errorPct)} %`}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </section>
  );
}
