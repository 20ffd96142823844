import {
  methodValue,
  withMethodValue,
  InputError,
  MAX_RECORD_H,
  LONGEST_SPAN_TEXT,
  checkStepH,
  clockYearProblem,
  defaultMethod,
  describeHours,
  describeOver,
  totalDurationH,
  isLossKind,
  methodSpec,
  readIsoDateTime,
  validateStorm,
  type LossKind,
  type LossMethod,
  type Storm,
  type UnitSystem,
} from '../core';
import { MAX_NAME_LENGTH, MAX_NOTES_LENGTH, textLengthProblem } from '../scenario/text-limits';
import type { Scenario } from '../scenario/types';
import { checkRecordNearStorm } from './alignment';
import { checkMethod, knownClean } from './checked';

/**
 * Pure edits of the scenario document. Each returns a new Scenario sharing
 * every part it did not change (so memoised selectors keyed on `storm` or
 * `method` stay valid), or the same object when nothing changes. Bad input
 * throws the core's InputError naming the field (and bar), before anything
 * is changed: the store never holds a document the core would refuse.
 */

export type ScenarioStorm = Scenario['storm'];
export type Observed = NonNullable<Scenario['observed']>;

/** One bar, for inserting. */
export interface Bar {
  readonly durationH: number;
  readonly depthMm: number;
}

export function withName(s: Scenario, name: string): Scenario {
  if (typeof name !== 'string') throw new InputError('name', 'The scenario name must be text.');
  if (name === s.name) return s;
  const tooLong = textLengthProblem('The scenario name', name, MAX_NAME_LENGTH);
  if (tooLong !== null) throw new InputError('name', tooLong);
  return { ...s, name };
}

export function withCatchmentName(s: Scenario, name: string): Scenario {
  if (typeof name !== 'string') throw new InputError('catchment.name', 'The catchment name must be text.');
  if (name === s.catchment.name) return s;
  const tooLong = textLengthProblem('The catchment name', name, MAX_NAME_LENGTH);
  if (tooLong !== null) throw new InputError('catchment.name', tooLong);
  return { ...s, catchment: { ...s.catchment, name } };
}

export function withNotes(s: Scenario, notes: string): Scenario {
  if (typeof notes !== 'string') throw new InputError('notes', 'The notes must be text.');
  if (notes === s.notes) return s;
  const tooLong = textLengthProblem('The notes', notes, MAX_NOTES_LENGTH);
  if (tooLong !== null) throw new InputError('notes', tooLong);
  return { ...s, notes };
}

export function withUnits(s: Scenario, units: UnitSystem): Scenario {
  if (units !== 'si' && units !== 'us') {
    throw new InputError('units', `Units must be "si" or "us" (got ${JSON.stringify(units)}).`);
  }
  return units === s.units ? s : { ...s, units };
}

export function withAreaM2(s: Scenario, areaM2: number): Scenario {
  if (typeof areaM2 !== 'number' || !Number.isFinite(areaM2) || areaM2 < 0) {
    throw new InputError(
      'areaM2',
      `The catchment area must be a finite number of m², zero or more (got ${String(areaM2)}).`,
    );
  }
  return areaM2 === s.catchment.areaM2 ? s : { ...s, catchment: { ...s.catchment, areaM2 } };
}

/** Copies any storm (typed arrays included) into the document's plain form, after validating it. */
/**
 * The scenario's own copy of a column: a plain array's slice (one block
 * copy) or a counted loop over a typed array; Array.from goes element by
 * element through an iterator, about 0.2 s for 10⁶ bars on the page.
 */
function ownCopy(column: ArrayLike<number>): number[] {
  if (Array.isArray(column)) return (column as number[]).slice();
  const n = column.length;
  const copy = new Array<number>(n);
  for (let k = 0; k < n; k++) copy[k] = column[k] as number;
  return copy;
}

// Copies made for the document ahead of an edit (place-storm.ts), checked: taken as they are.
const owned = new WeakSet<Storm>();

/** Marks a checked copy, made for the document and shared with no one, to be taken without copying again. */
export function ownedStorm(copy: ScenarioStorm): ScenarioStorm {
  owned.add(copy);
  return knownClean(copy);
}

export function toScenarioStorm(storm: Storm): ScenarioStorm {
  if (owned.has(storm)) return storm as ScenarioStorm;
  validateStorm(storm);
  const durationsH = ownCopy(storm.durationsH);
  const depthsMm = ownCopy(storm.depthsMm);
  const copy =
    storm.startIso === undefined ? { durationsH, depthsMm } : { durationsH, depthsMm, startIso: storm.startIso };
  return knownClean(copy);
}

/**
 * Values equal to rounding: a resample to the storm's own step or a total set to the storm's own total
 * gives the bars back within a few units in the last place (0.39999999999999997 for 0.4).
 */
const same = (x: number, y: number): boolean => Math.abs(x - y) <= 1e-12 * Math.max(1, Math.abs(x), Math.abs(y));

/** Whether a storm has the same bars (durations and depths, bar for bar, to rounding) and start as the scenario's. */
export function sameStorm(a: Storm, b: Storm): boolean {
  if (a === b) return true;
  const n = a.depthsMm.length;
  if (b.depthsMm.length !== n || a.durationsH.length !== n || b.durationsH.length !== n) return false;
  if (a.startIso !== b.startIso) return false;
  for (let k = 0; k < n; k++) {
    if (!same(a.depthsMm[k] as number, b.depthsMm[k] as number)) return false;
    if (!same(a.durationsH[k] as number, b.durationsH[k] as number)) return false;
  }
  return true;
}

export function withStorm(s: Scenario, storm: Storm): Scenario {
  const next = { ...s, storm: toScenarioStorm(storm) };
  checkRecordNearStorm(next);
  return next;
}

function checkIndex(s: Scenario, k: number, field: string, allowEnd = false): void {
  const n = s.storm.depthsMm.length;
  const last = allowEnd ? n : n - 1;
  if (!Number.isInteger(k) || k < 0 || k > last) {
    const range = last < 0 ? 'the storm has no bars' : `bars are 1 to ${last + 1}`;
    throw new InputError(field, `There is no bar ${String(k + 1)} (${range}).`, Number.isInteger(k) ? k : undefined);
  }
}

function checkDepth(k: number, depthMm: number): void {
  if (typeof depthMm !== 'number' || !Number.isFinite(depthMm) || depthMm < 0) {
    throw new InputError(
      'depthsMm',
      `Bar ${k + 1}: rainfall depth must be a finite number of millimetres, zero or more (got ${String(depthMm)}).`,
      k,
    );
  }
}

/** One second to 500 years (core/time-limits.ts). */
function checkDuration(k: number, durationH: number): void {
  checkStepH('durationsH', `Bar ${k + 1}: duration`, durationH, k);
}

/** The storm's length after bar k's duration becomes `durationH` (or a bar of it is inserted), held to a record's span. */
function checkStormSpan(s: Scenario, k: number, durationH: number, replacing: boolean): void {
  const totalH = totalDurationH(s.storm) - (replacing ? (s.storm.durationsH[k] as number) : 0) + durationH;
  if (totalH > MAX_RECORD_H) {
    throw new InputError(
      'durationsH',
      `Bar ${k + 1}: with a duration of ${describeHours(durationH)} the storm would last ${describeOver(totalH)}; ` +
        `a record spans at most ${LONGEST_SPAN_TEXT}.`,
      k,
    );
  }
}

export function withBarDepth(s: Scenario, k: number, depthMm: number): Scenario {
  checkIndex(s, k, 'depthsMm');
  checkDepth(k, depthMm);
  if (s.storm.depthsMm[k] === depthMm) return s;
  const depthsMm = s.storm.depthsMm.slice();
  depthsMm[k] = depthMm;
  return { ...s, storm: { ...s.storm, depthsMm } };
}

export function withBarDuration(s: Scenario, k: number, durationH: number): Scenario {
  checkIndex(s, k, 'durationsH');
  checkDuration(k, durationH);
  if (s.storm.durationsH[k] === durationH) return s;
  checkStormSpan(s, k, durationH, true);
  const durationsH = s.storm.durationsH.slice();
  durationsH[k] = durationH;
  return { ...s, storm: { ...s.storm, durationsH } };
}

/**
 * Inserts a bar before index k (k = number of bars appends). Without a bar,
 * the new one is dry and as long as its neighbour (or 1 h in an empty storm).
 */
export function withBarInserted(s: Scenario, k: number, bar?: Bar): Scenario {
  checkIndex(s, k, 'depthsMm', true);
  const { durationsH: d, depthsMm: p } = s.storm;
  const durationH = bar?.durationH ?? d[k] ?? d[k - 1] ?? 1;
  const depthMm = bar?.depthMm ?? 0;
  checkDuration(k, durationH);
  checkDepth(k, depthMm);
  checkStormSpan(s, k, durationH, false);
  const durationsH = d.slice();
  const depthsMm = p.slice();
  durationsH.splice(k, 0, durationH);
  depthsMm.splice(k, 0, depthMm);
  return { ...s, storm: { ...s.storm, durationsH, depthsMm } };
}

export function withBarDeleted(s: Scenario, k: number): Scenario {
  checkIndex(s, k, 'depthsMm');
  const durationsH = s.storm.durationsH.slice();
  const depthsMm = s.storm.depthsMm.slice();
  durationsH.splice(k, 1);
  depthsMm.splice(k, 1);
  return { ...s, storm: { ...s.storm, durationsH, depthsMm } };
}

/** Sets or clears (undefined) the storm's clock start. */
export function withStartIso(s: Scenario, startIso: string | undefined): Scenario {
  if (startIso === s.storm.startIso) return s;
  const { startIso: _old, ...rest } = s.storm;
  if (startIso === undefined) return { ...s, storm: rest };
  if (typeof startIso !== 'string' || readIsoDateTime(startIso)?.hasTime !== true) {
    throw new InputError('startIso', `The storm start "${String(startIso)}" is not an ISO 8601 date-time.`);
  }
  const year = clockYearProblem('The storm start', startIso);
  if (year !== null) throw new InputError('startIso', year);
  const next = { ...s, storm: { ...rest, startIso } };
  checkRecordNearStorm(next);
  return next;
}

/**
 * Switches the loss method, keeping the storm. The method being left is
 * remembered in methodMemory (as `leaving`, which the caller passes when the
 * effective method differs from the stored one, e.g. while matched), and the
 * new method comes back with its last parameters, or its defaults.
 * The parameter to fit follows when the old one does not exist in the new method.
 */
export function withMethodKind(s: Scenario, kind: LossKind, leaving: LossMethod = s.method): Scenario {
  if (!isLossKind(kind)) throw new InputError('kind', `Unknown loss method "${String(kind)}".`);
  if (kind === s.method.kind) return s;
  const methodMemory = { ...s.methodMemory, [s.method.kind]: leaving };
  const remembered = s.methodMemory[kind];
  const method = remembered && remembered.kind === kind ? remembered : defaultMethod(kind);
  const params = methodSpec(kind).params;
  let observed = s.observed;
  if (observed && !params.some((p) => p.key === observed?.parameter)) {
    const first = params[0];
    observed = first ? { ...observed, parameter: first.key } : { ...observed, locked: false };
  }
  return { ...s, method, methodMemory, observed };
}

/** Sets one parameter (numeric or choice) of the active method, checked by the core. */
export function withParam(s: Scenario, key: string, value: number | boolean | string): Scenario {
  const current = methodValue(s.method, key);
  if (current === value) return s;
  const spec = methodSpec(s.method.kind);
  const known = spec.params.some((p) => p.key === key) || (spec.choices ?? []).some((c) => c.key === key);
  if (!known) throw new InputError(key, `${spec.label} has no parameter "${key}".`);
  const method = withMethodValue(s.method, key, value);
  checkMethod(method);
  return { ...s, method };
}

/** Replaces the active method's parameters with its defaults. */
export function withMethodDefaults(s: Scenario): Scenario {
  return { ...s, method: defaultMethod(s.method.kind) };
}

/** Sets a whole method (e.g. the fitted one from calibrate), checked by the core. */
export function withMethod(s: Scenario, method: LossMethod): Scenario {
  checkMethod(method);
  return { ...s, method };
}

/**
 * Changes part of the observed runoff (creating it when absent). Typing a
 * value, or choosing depth or volume, takes the observed runoff back from
 * the streamflow record when it followed the record's separation.
 */
export function withObserved(s: Scenario, patch: Partial<Observed> | null): Scenario {
  const flow = s.streamflow;
  if (flow?.useAsObserved && (patch === null || patch.value !== undefined || patch.as !== undefined)) {
    return withObserved({ ...s, streamflow: { ...flow, useAsObserved: false } }, patch);
  }
  if (patch === null) return s.observed === null ? s : { ...s, observed: null };
  const base: Observed = s.observed ?? {
    as: 'depth',
    value: 0,
    parameter: methodSpec(s.method.kind).params[0]?.key ?? '',
    locked: false,
  };
  const next: Observed = { ...base, ...patch };
  if (next.as !== 'depth' && next.as !== 'volume') {
    throw new InputError(
      'observed.as',
      `Observed runoff is given as "depth" or "volume" (got ${JSON.stringify(next.as)}).`,
    );
  }
  if (typeof next.value !== 'number' || !Number.isFinite(next.value) || next.value < 0) {
    throw new InputError(
      'observed.value',
      `The observed runoff must be a finite number, zero or more (got ${String(next.value)}).`,
    );
  }
  if (!methodSpec(s.method.kind).params.some((p) => p.key === next.parameter)) {
    throw new InputError(
      'observed.parameter',
      `${methodSpec(s.method.kind).label} has no parameter "${next.parameter}" to fit.`,
    );
  }
  const same =
    s.observed !== null &&
    s.observed.as === next.as &&
    s.observed.value === next.value &&
    s.observed.parameter === next.parameter &&
    s.observed.locked === next.locked;
  return same ? s : { ...s, observed: next };
}
