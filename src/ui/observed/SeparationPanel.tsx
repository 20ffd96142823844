import {
  BASEFLOW_KINDS,
  BASEFLOW_METHODS,
  UNIT_LABELS,
  baseflowEndPoint,
  baseflowMethodSpec,
  baseflowNumber,
  convertArea,
  isBaseflowKind,
  type BaseflowMethodSpec,
  type BaseflowParam,
  type EndPointFacts,
  type UnitSystem,
} from '../../core';
import type { Streamflow } from '../../scenario/types';
import {
  useActions,
  useDerived,
  useScenario,
  useWorkbenchStore,
  withBaseflowDefaults,
  withBaseflowKind,
  withBaseflowParam,
  withSeparationAsObserved,
  type Separation,
} from '../../store';
import { formatValue } from '../format';
import { displayUnit, toDisplay, unitText } from '../units';
import { BaseflowParamField } from './BaseflowParamField';
import { dischargeText } from './discharge';
import { clockAt, clockParts, hoursText, momentText, recordClock, type RecordClock } from './time-text';
import './observed.css';
import { labelInSentence } from '../../scenario/label-text';

/** The field's hint: the table's help, or for a sample number the table's words in the way the field counts. */
function hintOf(param: BaseflowParam): string {
  const auto = param.optional ? ` Empty: ${param.optional.auto}.` : '';
  if (param.unit === 'sample') return `Sample number where the direct runoff begins (1 = the first sample).${auto}`;
  if (param.unit === 'h' && param.min === -Infinity) return `Hours after the first sample.${auto}`;
  // The table's help already says what an empty field means.
  return param.help;
}

function ParamFields({ flow, spec }: { flow: Streamflow; spec: BaseflowMethodSpec }) {
  const actions = useActions();
  const units = useScenario((s) => s.units);
  const stormStart = useScenario((s) => s.storm.startIso);
  const offsetH = useDerived((d, s) => d.alignment(s)?.offsetH ?? 0);
  const clock = recordClock(flow.startIso, stormStart, offsetH);
  const method = flow.baseflow;
  return (
    <div className="separation__params" key={method.kind}>
      {spec.params.map((param) => {
        const value = baseflowNumber(method, param.key);
        let note: string | null = null;
        if (param.unit === 'sample' && value !== undefined && value < flow.timesH.length) {
          note = `Sample ${value + 1} is at ${momentText(clock, flow.timesH[value] as number)}, ${dischargeText(flow.dischargeM3s[value] as number, units)}.`;
        } else if (param.unit === 'h' && param.min === -Infinity && value !== undefined) {
          const at = clockAt(clock, value);
          note = at ? `That is ${at}.` : null;
        }
        return (
          <BaseflowParamField
            key={param.key}
            id={`baseflow-${param.key}`}
            param={param}
            value={value}
            hint={hintOf(param)}
            note={note}
            history={actions}
            onSet={(v, edit) =>
              actions.edit(
                `Set ${labelInSentence(param.label)}`,
                (s) => withBaseflowParam(s, param.key, v),
                edit ?? { coalesceKey: `baseflow:${param.key}` },
              )
            }
          />
        );
      })}
    </div>
  );
}

/**
 * The rule that places the end point when none is set (for the straight
 * line, N = A^0.2 days after the peak), from the core's table: its days for
 * this catchment, and the button that goes back to it.
 */
function EndPointRule({ endPoint, automatic }: { endPoint: EndPointFacts; automatic: boolean }) {
  const actions = useActions();
  const areaM2 = useScenario((s) => s.catchment.areaM2);
  const units = useScenario((s) => s.units);
  const { rule } = endPoint;
  const areaUnit = units === 'us' ? 'mi2' : 'km2';
  const days = areaM2 > 0 ? rule.daysAfterPeak(areaM2) : null;
  const words =
    days === null
      ? 'Needs the catchment area (under Catchment and notes).'
      : `${rule.symbol} = ${formatValue(days)} days (${formatValue(days * 24)} h) for A = ${formatValue(convertArea(areaM2, 'm2', rule.areaUnit))} ${UNIT_LABELS[rule.areaUnit]}` +
        (areaUnit === rule.areaUnit
          ? '.'
          : ` (${formatValue(convertArea(areaM2, 'm2', areaUnit))} ${UNIT_LABELS[areaUnit]}).`);
  return (
    <div className="separation__recession">
      <button
        type="button"
        aria-pressed={automatic}
        aria-describedby="recession-days"
        disabled={days === null}
        onClick={() => actions.edit(rule.action, (s) => withBaseflowParam(s, endPoint.key, undefined))}
      >
        {rule.action}
      </button>
      <p className="field__hint" id="recession-days">
        {words} {automatic && days !== null ? 'In use: the end follows the area.' : ''}
      </p>
    </div>
  );
}

interface Tile {
  readonly id: string;
  readonly label: string;
  readonly value: string;
  readonly note?: string | undefined;
}

function tilesOf(sep: Separation | null, units: UnitSystem, clock: RecordClock): Tile[] {
  const r = sep?.ok ? sep.result : null;
  const show = (q: 'depth' | 'volume', si: number): string =>
    `${formatValue(toDisplay(q, si, units))} ${unitText(displayUnit(q, units))}`;
  const peakAt = r ? clockParts(clock, r.peakTimeH) : null;
  return [
    { id: 'direct-volume', label: 'Direct runoff volume', value: r ? show('volume', r.directVolumeM3) : '—' },
    {
      id: 'direct-depth',
      label: 'Direct runoff depth',
      value: r && r.directDepthMm !== undefined ? show('depth', r.directDepthMm) : '—',
      note: r && r.directDepthMm === undefined ? 'needs the catchment area' : undefined,
    },
    {
      id: 'bfi',
      label: 'Baseflow index',
      value: r ? formatValue(r.baseflowIndex) : '—',
      note: r ? 'baseflow share of the record’s volume' : undefined,
    },
    { id: 'peak', label: 'Peak discharge', value: r ? dischargeText(r.peakM3s, units) : '—' },
    {
      id: 'peak-time',
      label: 'Time of peak',
      value: r ? (peakAt ? peakAt.time : hoursText(r.peakTimeH)) : '—',
      note: r
        ? peakAt
          ? `${peakAt.date}, ${hoursText(r.peakTimeH)} after the first sample`
          : 'after the first sample'
        : undefined,
    },
  ];
}

/** Sends the separated depth to Matching, or stops; the matching then follows every change of the separation. */
function UseAsObserved() {
  const store = useWorkbenchStore();
  const actions = useActions();
  const linked = useDerived((d, s) => d.observedFromSeparation(s));
  const depthMm = useDerived((d, s) => {
    const sep = d.separation(s);
    return sep?.ok ? (sep.result.directDepthMm ?? null) : null;
  });
  const target = useDerived((d, s) => d.target(s));
  const fit = useDerived((d, s) => d.fit(s));
  const units = useScenario((s) => s.units);
  const depthText =
    depthMm === null
      ? null
      : `${formatValue(toDisplay('depth', depthMm, units))} ${unitText(displayUnit('depth', units))}`;

  const toggle = (): void => {
    const s = store.getState().scenario;
    const sep = store.derived.separation(s);
    const mm = sep?.ok ? sep.result.directDepthMm : undefined;
    actions.edit(
      linked ? 'Stop using the separated depth as observed runoff' : 'Use separated depth as observed runoff',
      (doc) => withSeparationAsObserved(doc, !linked, mm),
    );
  };

  let status: string;
  if (linked) {
    status =
      target && !target.ok
        ? target.message
        : fit && !fit.ok
          ? `Matching uses ${depthText ?? 'this depth'}, but finds no loss for it: ${fit.message}`
          : `Matching follows this depth (${depthText ?? '—'}), and Keep matched holds the loss to it. Typing an observed runoff there stops this.`;
  } else {
    status =
      depthText === null
        ? 'Needs a direct-runoff depth: the separation and the catchment area.'
        : `Sends ${depthText} to Matching and keeps the loss fitted to it as the separation changes.`;
  }
  return (
    <div className="separation__use">
      <button
        type="button"
        className={linked ? undefined : 'button--primary'}
        aria-pressed={linked}
        aria-describedby="use-observed-status"
        disabled={!linked && depthMm === null}
        onClick={toggle}
      >
        Use as observed runoff
      </button>
      <p className="separation__status" id="use-observed-status" aria-live="polite">
        {status}
      </p>
    </div>
  );
}

/**
 * Baseflow separation of the streamflow record: the method and its
 * parameters (generated from the core's BASEFLOW_METHODS table), what the
 * core makes of them, and the link that sends the direct-runoff depth to
 * Matching.
 */
export function SeparationPanel() {
  const flow = useScenario((s) => s.streamflow);
  const units = useScenario((s) => s.units);
  const stormStart = useScenario((s) => s.storm.startIso);
  const separation = useDerived((d, s) => d.separation(s));
  const offsetH = useDerived((d, s) => d.alignment(s)?.offsetH ?? 0);
  const actions = useActions();
  if (!flow) return null;
  const spec: BaseflowMethodSpec = baseflowMethodSpec(flow.baseflow.kind);
  const endPoint = baseflowEndPoint(flow.baseflow);
  const clock = recordClock(flow.startIso, stormStart, offsetH);
  const tiles = tilesOf(separation, units, clock);

  return (
    <section className="panel separation" aria-labelledby="separation-title">
      <h2 id="separation-title">Baseflow separation</h2>
      <div className="separation__body">
        <div className="separation__method">
          <div className="field">
            <label htmlFor="baseflow-kind">Baseflow method</label>
            <select
              id="baseflow-kind"
              value={flow.baseflow.kind}
              aria-describedby="baseflow-summary"
              onChange={(e) => {
                const kind = e.currentTarget.value;
                if (isBaseflowKind(kind))
                  actions.edit(`Separate by ${labelInSentence(BASEFLOW_METHODS[kind].label)}`, (s) =>
                    withBaseflowKind(s, kind),
                  );
              }}
            >
              {BASEFLOW_KINDS.map((kind) => (
                <option key={kind} value={kind}>
                  {BASEFLOW_METHODS[kind].label}
                </option>
              ))}
            </select>
            <p className="field__hint" id="baseflow-summary">
              {spec.summary}
            </p>
          </div>
          <ParamFields flow={flow} spec={spec} />
          {spec.conventions ? (
            <p className="field__hint separation__conventions" id="baseflow-conventions">
              <span className="separation__conventions-label">How the filter runs: </span>
              {spec.conventions}
            </p>
          ) : null}
          {endPoint ? (
            <EndPointRule endPoint={endPoint} automatic={baseflowNumber(flow.baseflow, endPoint.key) === undefined} />
          ) : null}
          <div className="method__foot">
            <button type="button" onClick={() => actions.edit('Use default baseflow values', withBaseflowDefaults)}>
              Use default values
            </button>
            <p className="method__source">Source: {spec.source}</p>
          </div>
        </div>
        <div className="separation__out">
          <dl className="results__grid separation__grid">
            {tiles.map((t) => (
              <div key={t.id} className={`results__item separation__item separation__item--${t.id}`}>
                <dt id={`separation-${t.id}-label`}>{t.label}</dt>
                <dd aria-labelledby={`separation-${t.id}-label`} data-result={t.id}>
                  {t.value}
                  {t.note ? <span className="results__note"> ({t.note})</span> : null}
                </dd>
              </div>
            ))}
          </dl>
          {separation && !separation.ok ? (
            <p className="results__error">No results until the separation works (see under the hydrograph).</p>
          ) : null}
          <UseAsObserved />
        </div>
      </div>
    </section>
  );
}
