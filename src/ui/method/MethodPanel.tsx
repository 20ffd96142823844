import {
  METHOD_KINDS,
  METHODS,
  attempt,
  isLossKind,
  methodSpec,
  paramApplies,
  validateMethod,
  methodValue,
  withMethodValue,
  withSpec,
  type ChoiceParam,
  type LossMethod,
  type MethodSpec,
  type NumericParam,
} from '../../core';
import { useActions, useDerived, useScenario } from '../../store';
import { NumberField } from '../fields/NumberField';
import { paramFromDisplay, paramPlausible, paramToDisplay, paramUnitText } from '../units';
import { lazyPart } from '../layout/LazyPart';

// Green–Ampt's soil texture values load when that method is chosen, not with the first screen.
const SoilPresets = lazyPart('soil texture values', () => import('./SoilPresets').then((m) => m.SoilPresets));

/** The core's own message for a candidate parameter value, or null when the core accepts it. */
function coreProblem(method: LossMethod, key: string, value: number | boolean | string): string | null {
  const r = attempt(() => validateMethod(withMethodValue(method, key, value)));
  return r.ok ? null : r.error.message;
}

function ParamField({ param, method, stored }: { param: NumericParam; method: LossMethod; stored: LossMethod }) {
  const units = useScenario((s) => s.units);
  const observed = useScenario((s) => s.observed);
  const matched = useDerived((d, s) => d.isMatched(s));
  const actions = useActions();
  const locked = matched && observed?.parameter === param.key;
  const value = methodValue(method, param.key);
  return (
    <NumberField
      id={`param-${param.key}`}
      label={param.label}
      unit={paramUnitText(param.unit, units)}
      value={typeof value === 'number' ? value : null}
      toDisplay={(si) => paramToDisplay(param.unit, si, units)}
      fromDisplay={(v) => paramFromDisplay(param.unit, v, units)}
      plausible={paramPlausible(param.unit)}
      check={(si) => coreProblem(stored, param.key, si)}
      onCommit={(si, edit) => actions.setParam(param.key, si, edit)}
      history={actions}
      readOnly={locked}
      hint={param.help}
      note={locked ? 'Kept matched to the observed runoff (see Matching).' : null}
    />
  );
}

/** More choices than this show as a drop-down rather than radio buttons. */
const MAX_RADIOS = 4;

function ChoiceField({ choice, method }: { choice: ChoiceParam; method: LossMethod }) {
  const actions = useActions();
  const value = methodValue(method, choice.key);
  const id = `choice-${choice.key}`;
  const index = choice.choices.findIndex((c) => c.value === value);
  if (choice.display === 'switch') {
    // A yes/no setting whose label says what "yes" means: one checkbox.
    return (
      <div className="field choice choice--switch">
        <label className="choice__option">
          <input
            type="checkbox"
            id={id}
            checked={value === true}
            aria-describedby={`${id}-hint`}
            onChange={(e) => actions.setParam(choice.key, e.currentTarget.checked)}
          />
          <span>{choice.label}</span>
        </label>
        <p className="field__hint" id={`${id}-hint`}>
          {choice.help}
        </p>
      </div>
    );
  }
  if (choice.choices.length <= MAX_RADIOS) {
    return (
      <fieldset className="field choice" aria-describedby={`${id}-hint`}>
        <legend>{choice.label}</legend>
        {choice.choices.map((c, i) => (
          <label key={String(c.value)} className="choice__option">
            <input
              type="radio"
              name={id}
              checked={i === index}
              onChange={() => actions.setParam(choice.key, c.value)}
            />
            <span>{c.label}</span>
          </label>
        ))}
        <p className="field__hint" id={`${id}-hint`}>
          {choice.help}
        </p>
      </fieldset>
    );
  }
  return (
    <div className="field">
      <label htmlFor={id}>{choice.label}</label>
      <select
        id={id}
        value={index < 0 ? '' : String(index)}
        aria-describedby={`${id}-hint`}
        onChange={(e) => {
          const picked = choice.choices[Number(e.currentTarget.value)];
          if (picked) actions.setParam(choice.key, picked.value);
        }}
      >
        {index < 0 ? <option value="">Choose…</option> : null}
        {choice.choices.map((c, i) => (
          <option key={String(c.value)} value={String(i)}>
            {c.label}
          </option>
        ))}
      </select>
      <p className="field__hint" id={`${id}-hint`}>
        {choice.help}
      </p>
    </div>
  );
}

/** Loss method picker and the method's parameters, all generated from the core's METHODS table. */
export function MethodPanel() {
  const stored = useScenario((s) => s.method);
  const method = useDerived((d, s) => d.effectiveMethod(s));
  const actions = useActions();
  const spec = methodSpec(method.kind) as MethodSpec;

  return (
    <section className="panel method" aria-labelledby="method-title">
      <h2 id="method-title">Losses</h2>
      <div className="field">
        <label htmlFor="method-kind">Loss method</label>
        <select
          id="method-kind"
          value={method.kind}
          aria-describedby="method-summary"
          onChange={(e) => {
            const kind = e.currentTarget.value;
            if (isLossKind(kind)) actions.setMethodKind(kind);
          }}
        >
          {METHOD_KINDS.map((kind) => (
            <option key={kind} value={kind}>
              {METHODS[kind].label}
            </option>
          ))}
        </select>
        <p className="field__hint" id="method-summary">
          {spec.summary}
        </p>
      </div>
      <div className="method__params" key={method.kind}>
        {/* Parameters that always apply, then the settings, then what a setting switches on (the recovery rate under its switch). */}
        {spec.params
          .filter((param) => !param.activeWhen)
          .map((param) => (
            <ParamField key={param.key} param={param} method={method} stored={stored} />
          ))}
        {(spec.choices ?? [])
          .filter((choice) => paramApplies(choice, method))
          .map((choice) => (
            <ChoiceField key={choice.key} choice={choice} method={method} />
          ))}
        {spec.params
          .filter((param) => param.activeWhen && paramApplies(param, method))
          .map((param) => (
            <ParamField key={param.key} param={param} method={method} stored={stored} />
          ))}
        {spec.soilPresets ? <SoilPresets /> : null}
      </div>
      <p className="method__dry" id="method-dry-bars">
        <span className="method__dry-label">In dry bars: </span>
        {withSpec(method, (spec, m) => spec.dryBars(m))}
      </p>
      <div className="method__foot">
        <button type="button" onClick={actions.resetMethodDefaults}>
          Use default values
        </button>
        <p className="method__source">Source: {spec.source}</p>
      </div>
    </section>
  );
}
