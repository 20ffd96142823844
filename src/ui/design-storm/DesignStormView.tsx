import { useEffect, useMemo, useState } from 'react';
import { methodNumber, methodSpec, runoffVolumeM3, type LossMethod } from '../../core';
import { dischargeText } from '../observed/discharge';
import { peakAtText } from '../results/hours-minutes';
import { useActions, useDerived, useScenario, useWorkbenchStore, withDesignStormOnWorkbench } from '../../store';
import { toScenarioStorm } from '../../store/edits';
import { usePins, useServices } from '../services/services';
import { MAX_PINS } from '../../store/pin-board';
import { designDerived } from '../../store/derive-design';
import { eventDerived } from '../../store/derive-events';
import { useEventFits } from '../events/use-event-fits';
import { formatPercent, formatValue } from '../format';
import { displayUnit, paramToDisplay, paramUnitText, toDisplay, unitText } from '../units';
import { buildDesignStorm, FIELD_LABELS, FORM_DEPTH_UNIT, formInUnits, type DesignForm, type FormField } from './build';
import { DesignHydrograph } from './DesignHydrograph';
import { StormBars } from './StormBars';
import './design-storm.css';
import '../events/events.css';

// Invented starting values (no real gauge): a 2-hour storm from a made-up IDF formula.
const START: DesignForm = {
  shape: 'formula',
  formula: 'a/(t+b)^c',
  a: '1200',
  b: '10',
  c: '0.75',
  tableText: '10 90\n30 52\n60 33\n120 20',
  durationUnit: 'min',
  intensityUnit: 'mm/h',
  durationMin: '120',
  stepMin: '10',
  peak: '0.5',
  depthMm: '40',
  scale: false,
  scaleMm: '50',
};

function Text({
  form,
  field,
  set,
  hint,
  bad,
}: {
  form: DesignForm;
  field: FormField;
  set: (f: FormField, v: string) => void;
  hint?: string;
  bad: FormField | null;
}) {
  const id = `design-${field}`;
  const wrong = bad === field ? { 'aria-invalid': true, 'aria-describedby': 'design-form-problem' } : {};
  return (
    <div className="design-form__field">
      <label htmlFor={id}>
        {FIELD_LABELS[field]}
        {hint ? (
          <>
            {' '}
            <span className="design-form__unit">{hint}</span>
          </>
        ) : null}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={form[field] as string}
        onChange={(e) => set(field, e.currentTarget.value)}
        {...wrong}
      />
    </div>
  );
}

/**
 * Design storms: an alternating block storm from an IDF formula or table, or
 * a uniform storm, optionally scaled to a total depth; the design loss is
 * applied and the totals shown. The built storm can go on the workbench (one
 * undoable edit, belonging to no event) or be pinned for comparison.
 */
export function DesignStormView() {
  const units = useScenario((s) => s.units);
  const [form, setForm] = useState<DesignForm>(() => formInUnits(START, units));
  // The form follows the SI / US switch: depths and intensities are re-expressed in the new units.
  useEffect(() => {
    setForm((f) => ((f.depthUnit ?? 'mm') === FORM_DEPTH_UNIT[units] ? f : formInUnits(f, units)));
  }, [units]);
  const formDepthUnit = form.depthUnit ?? 'mm';
  const [loss, setLoss] = useState<'design' | 'workbench'>('design');
  const [said, setSaid] = useState<string | null>(null);
  const set = (
    field: FormField | 'shape' | 'formula' | 'durationUnit' | 'intensityUnit' | 'scale',
    value: string | boolean,
  ): void => setForm((f) => ({ ...f, [field]: value }));
  const areaM2 = useScenario((s) => s.catchment.areaM2);
  const benchMethod = useDerived((d, s) => d.effectiveMethod(s));
  const { fits } = useEventFits();
  const fromSet = useDerived((d, s) => eventDerived(d).designMethod(s));
  const method: LossMethod = loss === 'design' && fromSet ? fromSet : benchMethod;
  const actions = useActions();
  const store = useWorkbenchStore();
  const { pins: board } = useServices();
  const { pins } = usePins();

  const built = useMemo(() => buildDesignStorm(form), [form]);
  // Derived in the store (store/derive-design.ts), checked once per storm and method.
  const design = designDerived(store.derived);
  const result = built.ok ? design.losses(built.storm, method) : null;

  // The design peak, through the workbench's unit hydrograph (issue 13), when one is chosen.
  const transform = useScenario((s) => s.hydrograph.transform);
  const peak = built.ok && result ? design.peak(built.storm, result, transform, areaM2) : null;

  const spec = methodSpec(method.kind);
  const param = spec.params.find((p) => p.key === fits.parameter);
  const depthUnit = unitText(displayUnit('depth', units));
  const depth = (mm: number): string => `${formatValue(toDisplay('depth', mm, units))} ${depthUnit}`;
  const designText =
    fromSet && param
      ? `${param.label} ${formatValue(paramToDisplay(param.unit, methodNumber(fromSet, fits.parameter) ?? NaN, units))} ${paramUnitText(param.unit, units)}`
      : null;
  const messageId = 'design-form-problem';
  const badField = built.ok ? null : built.field;
  const invalid = (field: FormField) =>
    !built.ok && built.field === field ? { 'aria-invalid': true, 'aria-describedby': messageId } : {};

  const putOnBench = (): void => {
    if (!built.ok) return;
    const storm = toScenarioStorm(built.storm);
    actions.edit('Put the design storm on the workbench', (s) => withDesignStormOnWorkbench(s, storm, method));
    setSaid(
      'The design storm is on the workbench, with the design loss. Undo puts back what was there; the events are unchanged.',
    );
  };
  const pin = async (): Promise<void> => {
    if (!built.ok) return;
    // A copy of the scenario as it would be with the design storm on the workbench; the screen is not changed.
    const copy = withDesignStormOnWorkbench(store.getState().scenario, toScenarioStorm(built.storm), method);
    const pinned = await board.pin({ ...copy, name: `Design storm: ${built.description}` });
    setSaid(
      pinned.ok
        ? `Pinned the design result (${board.getState().pins.length} of ${MAX_PINS}); the comparison is on the Workbench view, beside the events you pin there.`
        : pinned.message,
    );
  };

  return (
    <div className="design-view">
      <section className="panel design-form" aria-labelledby="design-form-title">
        <h2 id="design-form-title">Design storm</h2>
        <fieldset className="design-form__group">
          <legend>Storm shape</legend>
          {(
            [
              ['formula', 'IDF formula, alternating block'],
              ['table', 'IDF table, alternating block'],
              ['uniform', 'Uniform depth'],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="design-form__choice">
              <input
                type="radio"
                name="design-shape"
                checked={form.shape === value}
                onChange={() => set('shape', value)}
              />
              {label}
            </label>
          ))}
        </fieldset>
        {form.shape === 'formula' ? (
          <>
            <label htmlFor="design-formula">IDF relation</label>
            <select id="design-formula" value={form.formula} onChange={(e) => set('formula', e.currentTarget.value)}>
              <option value="a/(t+b)^c">i = a / (t + b)^c</option>
              <option value="a/(t^c+b)">i = a / (t^c + b)</option>
            </select>
            <div className="design-form__row">
              <Text form={form} field="a" set={set} bad={badField} />
              <Text form={form} field="b" set={set} bad={badField} />
              <Text form={form} field="c" set={set} bad={badField} />
            </div>
          </>
        ) : null}
        {form.shape === 'table' ? (
          <div className="design-form__field">
            <label htmlFor="design-tableText">IDF table</label>
            <textarea
              id="design-tableText"
              rows={6}
              value={form.tableText}
              onChange={(e) => set('tableText', e.currentTarget.value)}
              aria-describedby="design-table-hint"
              {...invalid('tableText')}
            />
            <p id="design-table-hint" className="design-form__hint">
              One row per duration: duration and average intensity, in the units below.
            </p>
          </div>
        ) : null}
        {form.shape !== 'uniform' ? (
          <div className="design-form__row">
            <div className="design-form__field">
              <label htmlFor="design-duration-unit">Unit of t</label>
              <select
                id="design-duration-unit"
                value={form.durationUnit}
                onChange={(e) => set('durationUnit', e.currentTarget.value)}
              >
                <option value="min">min</option>
                <option value="h">h</option>
              </select>
            </div>
            <div className="design-form__field">
              <label htmlFor="design-intensity-unit">Unit of i</label>
              <select
                id="design-intensity-unit"
                value={form.intensityUnit}
                onChange={(e) => set('intensityUnit', e.currentTarget.value)}
              >
                <option value="mm/h">mm/h</option>
                <option value="in/h">in/h</option>
              </select>
            </div>
          </div>
        ) : (
          <Text form={form} field="depthMm" set={set} bad={badField} hint={`(${formDepthUnit})`} />
        )}
        <div className="design-form__row">
          <Text form={form} field="durationMin" set={set} bad={badField} hint="(min)" />
          <Text form={form} field="stepMin" set={set} bad={badField} hint="(min)" />
          {form.shape !== 'uniform' ? (
            <Text form={form} field="peak" set={set} bad={badField} hint="(0 start – 1 end)" />
          ) : null}
        </div>
        <label className="design-form__choice">
          <input type="checkbox" checked={form.scale} onChange={(e) => set('scale', e.currentTarget.checked)} />
          Scale to a total depth
        </label>
        {form.scale ? <Text form={form} field="scaleMm" set={set} bad={badField} hint={`(${formDepthUnit})`} /> : null}
        {!built.ok ? (
          <p id={messageId} role="alert" className="design-form__problem">
            {built.message}
          </p>
        ) : null}
      </section>

      <section className="panel design-result" aria-labelledby="design-result-title">
        <h2 id="design-result-title">Design storm with the design loss</h2>
        <div className="design-form__field">
          <label htmlFor="design-loss">Loss to apply</label>
          <select
            id="design-loss"
            value={loss}
            onChange={(e) => setLoss(e.currentTarget.value === 'workbench' ? 'workbench' : 'design')}
          >
            <option value="design" disabled={!fromSet}>
              {designText ? `Design value from the events (${designText})` : 'Design value from the events (none yet)'}
            </option>
            <option value="workbench">The workbench's method as set ({methodSpec(benchMethod.kind).label})</option>
          </select>
        </div>
        {loss === 'design' && !fromSet ? (
          <p className="design-form__hint">
            No design value yet (fit events on the Event set view); the workbench's method is used.
          </p>
        ) : null}
        {built.ok ? (
          <>
            <StormBars
              storm={built.storm}
              excessMm={result?.ok ? result.r.excessMm : null}
              description={built.description}
            />
            {result?.ok ? (
              <dl className="fit-all__summary" aria-label="Design storm totals">
                <div>
                  <dt>Rainfall depth</dt>
                  <dd>{depth(result.r.rainMm)}</dd>
                </div>
                <div>
                  <dt>Loss depth</dt>
                  <dd>{depth(result.r.totalLossMm)}</dd>
                </div>
                <div>
                  <dt>Excess depth</dt>
                  <dd>{depth(result.r.totalExcessMm)}</dd>
                </div>
                <div>
                  <dt>Runoff volume</dt>
                  <dd>
                    {areaM2 > 0
                      ? `${formatValue(toDisplay('volume', runoffVolumeM3(result.r.totalExcessMm, areaM2), units))} ${unitText(displayUnit('volume', units))}`
                      : '— (needs the catchment area)'}
                  </dd>
                </div>
                <div>
                  <dt>Runoff fraction</dt>
                  <dd>{formatPercent(result.r.runoffFraction)}</dd>
                </div>
                {peak ? (
                  <div>
                    <dt>Design peak discharge</dt>
                    <dd data-result="design-peak">
                      {peak.ok ? peakAtText(peak, dischargeText(peak.peakM3s, units)) : `— (${peak.message})`}
                    </dd>
                  </div>
                ) : null}
              </dl>
            ) : result ? (
              <p role="alert" className="design-form__problem">
                {result.message}
              </p>
            ) : null}
            {peak?.ok ? <DesignHydrograph storm={built.storm} hydrograph={peak.hydrograph} units={units} /> : null}
            <div className="design-result__actions">
              <button type="button" className="button--primary" onClick={putOnBench}>
                Put the design storm on the workbench
              </button>
              <button type="button" onClick={() => void pin()} disabled={pins.length >= MAX_PINS}>
                Pin the design result to compare
              </button>
            </div>
          </>
        ) : (
          <p>Correct the storm above to see it here.</p>
        )}
        {said ? <p role="status">{said}</p> : null}
      </section>
    </div>
  );
}
