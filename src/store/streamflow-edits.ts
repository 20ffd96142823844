import {
  FIRST_BASEFLOW_KIND,
  InputError,
  baseflowMethodSpec,
  baseflowNumber,
  checkSpanH,
  defaultBaseflowMethod,
  isBaseflowKind,
  attempt,
  methodSpec,
  separateBaseflow,
  validateBaseflowMethod,
  validateHydrograph,
  withoutBaseflowParam,
  withBaseflowValue,
  type BaseflowKind,
  type BaseflowMethod,
  type BaseflowMethodSpec,
} from '../core';
import type { Scenario, Streamflow } from '../scenario/types';
import { alignRecord, checkRecordNearStorm } from './alignment';

/**
 * Pure edits of the scenario's streamflow record, in the manner of
 * `edits.ts`: each returns a new Scenario sharing what it did not change (so
 * the memoised separation stays valid while only the offset moves), or the
 * same object when nothing changes, and throws the core's InputError, before
 * changing anything, on input the core would refuse.
 */

/** A record as the import layer or a test hands it in: times h after the first sample, discharge m³/s. */
export interface RecordInput {
  readonly timesH: ArrayLike<number>;
  readonly dischargeM3s: ArrayLike<number>;
  readonly startIso?: string | undefined;
}

/** The separation a new record starts with (the core's choice: a straight line, its end N = A^0.2 days after the peak). */
export { FIRST_BASEFLOW_KIND };

/**
 * The core's objection to `method` on this record and area that names one of
 * the method's own parameters, or null. Objections that name something else
 * (no catchment area yet; an automatic end point that falls past the record)
 * are states the user may be on the way through, shown on screen, not refused.
 */
function parameterObjection(
  record: Pick<Streamflow, 'timesH' | 'dischargeM3s'>,
  method: BaseflowMethod,
  areaM2: number,
): InputError | null {
  const r = attempt(() => separateBaseflow(record, method, { areaM2 }));
  if (r.ok) return null;
  const { error } = r;
  const own = baseflowMethodSpec(method.kind).params.some((p) => p.key === error.field);
  return own && baseflowNumber(method, error.field) !== undefined ? error : null;
}

/**
 * The method kept for a new record: the same kind and shape, with any
 * optional parameter the new record cannot take (an end point past its last
 * sample, a start of rise it does not have) put back to automatic.
 */
function fitToRecord(
  record: Pick<Streamflow, 'timesH' | 'dischargeM3s'>,
  method: BaseflowMethod,
  areaM2: number,
): BaseflowMethod {
  let current = method;
  const spec: BaseflowMethodSpec = baseflowMethodSpec(method.kind);
  for (let i = 0; i < spec.params.length; i++) {
    const objection = parameterObjection(record, current, areaM2);
    const param = objection ? spec.params.find((p) => p.key === objection.field) : undefined;
    if (!objection || !param?.optional) return current;
    current = withoutBaseflowParam(current, param.key);
  }
  return current;
}

/** Sets the streamflow record (pasted or opened), keeping the separation chosen for the last one where it still fits. */
export function withStreamflowRecord(s: Scenario, input: RecordInput): Scenario {
  const record = { timesH: Array.from(input.timesH), dischargeM3s: Array.from(input.dischargeM3s) };
  validateHydrograph(record);
  const startIso = input.startIso;
  const old = s.streamflow;
  const aligned = alignRecord(s.storm.startIso, startIso, old?.offsetH ?? 0);
  const area = s.catchment.areaM2;
  const memory: Partial<Record<BaseflowKind, BaseflowMethod>> = {};
  for (const [kind, entry] of Object.entries(old?.baseflowMemory ?? {})) {
    if (isBaseflowKind(kind) && entry) memory[kind] = fitToRecord(record, entry, area);
  }
  const next: Streamflow = {
    ...record,
    ...(startIso === undefined ? {} : { startIso }),
    // A record with a clock next to a storm with one starts lined up by the clocks, and keeps that offset.
    offsetH: aligned.offsetH,
    baseflow: fitToRecord(record, old?.baseflow ?? defaultBaseflowMethod(FIRST_BASEFLOW_KIND), area),
    baseflowMemory: memory,
    useAsObserved: old?.useAsObserved ?? false,
  };
  const result = { ...s, streamflow: next };
  checkRecordNearStorm(result);
  checkSpanH('offsetH', 'The offset from the storm start to the first sample', next.offsetH);
  return result;
}

function requireRecord(s: Scenario, field: string): Streamflow {
  if (!s.streamflow) throw new InputError(field, 'There is no streamflow record yet; paste or open one first.');
  return s.streamflow;
}

/**
 * Takes the record away. When it was the observed runoff, the depth shown
 * (`keepDepthMm`, the last separated depth) becomes the typed-in observed
 * runoff, so the matching keeps the number it had.
 */
export function withoutStreamflow(s: Scenario, keepDepthMm?: number): Scenario {
  if (s.streamflow === null) return s;
  const linked = s.streamflow.useAsObserved && s.observed !== null;
  const observed =
    linked && s.observed && keepDepthMm !== undefined
      ? { ...s.observed, as: 'depth' as const, value: keepDepthMm }
      : s.observed;
  return { ...s, streamflow: null, observed };
}

/** Sets the hours from the storm start to the first sample (used when the two are not both on a clock). */
export function withRecordOffsetH(s: Scenario, offsetH: number): Scenario {
  const flow = requireRecord(s, 'offsetH');
  // Within 500 years either way (core/time-limits.ts).
  checkSpanH('offsetH', 'The offset from the storm start to the first sample', offsetH);
  const value = offsetH === 0 ? 0 : offsetH;
  return value === flow.offsetH ? s : { ...s, streamflow: { ...flow, offsetH: value } };
}

/** Switches the separation method, remembering the one left and restoring the one chosen (or its defaults). */
export function withBaseflowKind(s: Scenario, kind: BaseflowKind): Scenario {
  const flow = requireRecord(s, 'kind');
  if (!isBaseflowKind(kind)) throw new InputError('kind', `Unknown baseflow method "${String(kind)}".`);
  if (kind === flow.baseflow.kind) return s;
  const baseflowMemory = { ...flow.baseflowMemory, [flow.baseflow.kind]: flow.baseflow };
  const remembered = flow.baseflowMemory[kind];
  const baseflow = remembered && remembered.kind === kind ? remembered : defaultBaseflowMethod(kind);
  return { ...s, streamflow: { ...flow, baseflow, baseflowMemory } };
}

/**
 * Sets one parameter of the separation method, or puts an optional one back
 * to automatic (`undefined`). Checked by the core: its bounds, and whether
 * it fits this record (a start of rise past the last sample, an end point
 * before the start of rise or after the record).
 */
export function withBaseflowParam(s: Scenario, key: string, value: number | undefined): Scenario {
  const flow = requireRecord(s, key);
  const spec: BaseflowMethodSpec = baseflowMethodSpec(flow.baseflow.kind);
  const param = spec.params.find((p) => p.key === key);
  if (!param) throw new InputError(key, `${spec.label} has no parameter "${key}".`);
  if (baseflowNumber(flow.baseflow, key) === value) return s;
  if (value === undefined && !param.optional) {
    throw new InputError(key, `${param.label} cannot be left empty (${spec.label}).`);
  }
  const baseflow = withBaseflowValue(flow.baseflow, key, value === 0 ? 0 : value);
  validateBaseflowMethod(baseflow);
  const objection = parameterObjection(flow, baseflow, s.catchment.areaM2);
  if (objection) throw objection;
  return { ...s, streamflow: { ...flow, baseflow } };
}

/** Replaces the separation method's parameters with its defaults. */
export function withBaseflowDefaults(s: Scenario): Scenario {
  const flow = requireRecord(s, 'kind');
  return { ...s, streamflow: { ...flow, baseflow: defaultBaseflowMethod(flow.baseflow.kind) } };
}

/**
 * Makes the separated direct-runoff depth the observed runoff to match (on),
 * or stops (off). On: the fit is kept matched, since following the
 * separation is what the link is for; an observed runoff is made when there
 * was none (`depthMm`, the depth now shown, fills its value), and one typed
 * in before is left as it was, unread while the link lasts. Off: `depthMm`
 * becomes the typed-in depth, so the matching keeps the number it showed.
 */
export function withSeparationAsObserved(s: Scenario, on: boolean, depthMm?: number): Scenario {
  const flow = requireRecord(s, 'useAsObserved');
  const depth = depthMm !== undefined && Number.isFinite(depthMm) && depthMm >= 0 ? depthMm : undefined;
  if (on) {
    if (flow.useAsObserved && s.observed?.locked) return s;
    const parameter = s.observed?.parameter ?? methodSpec(s.method.kind).params[0]?.key;
    if (parameter === undefined)
      throw new InputError('useAsObserved', `${methodSpec(s.method.kind).label} has no parameter to fit.`);
    const observed = s.observed
      ? { ...s.observed, locked: true }
      : { as: 'depth' as const, value: depth ?? 0, parameter, locked: true };
    return { ...s, observed, streamflow: flow.useAsObserved ? flow : { ...flow, useAsObserved: true } };
  }
  if (!flow.useAsObserved) return s;
  const observed =
    s.observed && depth !== undefined ? { ...s.observed, as: 'depth' as const, value: depth } : s.observed;
  return { ...s, observed, streamflow: { ...flow, useAsObserved: false } };
}
