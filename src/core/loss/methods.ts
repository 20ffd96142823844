import { InputError } from '../errors';
import { kindTable } from '../kind-table';
import { constantSpec } from './constant';
import { initialContinuingSpec } from './initial-continuing';
import { proportionalSpec } from './proportional';
import { hortonSpec } from './horton';
import { greenAmptSpec } from './green-ampt';
import { curveNumberSpec } from './curve-number';
import type { LossKind, LossMethod, MethodOf, MethodSpec, MethodValue, NumericParam } from './types';

/**
 * The one table of loss methods. The UI builds its method picker and
 * parameter fields from it; calibration reads bounds from it. Adding a method
 * touches this table and nothing else outside its own file. Built by the
 * core's one factory of kind tables (kind-table.ts), as the transforms and
 * baseflow methods are.
 */
const LOSS_TABLE = kindTable<LossMethod, { readonly [K in LossKind]: MethodSpec<K> }>(
  {
    constant: constantSpec,
    'initial-continuing': initialContinuingSpec,
    proportional: proportionalSpec,
    horton: hortonSpec,
    'green-ampt': greenAmptSpec,
    'curve-number': curveNumberSpec,
  },
  'loss method',
);

export const METHODS = LOSS_TABLE.specs;

/** Method kinds in the order a picker shows them. */
export const METHOD_KINDS = LOSS_TABLE.kinds as LossKind[];

export const isLossKind: (kind: unknown) => kind is LossKind = LOSS_TABLE.isKind;

export const methodSpec: <K extends LossKind>(kind: K) => MethodSpec<K> = LOSS_TABLE.spec;

/**
 * Calls `fn` with the method and the spec of its kind, typed to the same kind,
 * so a caller can hand one to the other (`spec.dryBars(method)`).
 */
export const withSpec: <R>(
  method: LossMethod,
  fn: <K extends LossKind>(spec: MethodSpec<K>, method: MethodOf<K>) => R,
) => R = LOSS_TABLE.dispatch;

/**
 * The value `method` holds for the parameter or setting `key` (a key of its
 * spec's params or choices), or undefined when it holds none there (left out,
 * or not a number, switch or choice).
 */
export const methodValue: (method: LossMethod, key: string) => MethodValue | undefined = LOSS_TABLE.value;

/** The number `method` holds for the numeric parameter `key`, or undefined. */
export const methodNumber: (method: LossMethod, key: string) => number | undefined = LOSS_TABLE.number;

/**
 * A copy of `method` with the parameter or setting `key` set to `value`. Not
 * validated: the caller checks it (validateMethod) before it is used.
 */
export const withMethodValue: <M extends LossMethod>(method: M, key: string, value: MethodValue) => M =
  LOSS_TABLE.withValue;

/** The numeric parameter `key` of a method kind, or undefined. */
export function numericParam<K extends LossKind>(kind: K, key: string): NumericParam<K> | undefined {
  return methodSpec(kind).params.find((p) => p.key === key);
}

/** Default parameters for a method kind (a fresh object). */
export const defaultMethod: <K extends LossKind>(kind: K) => MethodOf<K> = LOSS_TABLE.defaults;

/**
 * Whether a parameter or setting takes part under the method's other
 * settings (the recovery rate only while capacity recovers).
 */
export function paramApplies<K extends LossKind>(
  param: Pick<NumericParam<K>, 'activeWhen'>,
  method: MethodOf<K>,
): boolean {
  return param.activeWhen ? param.activeWhen(method) : true;
}

/** Describes the allowed range of a parameter in words, e.g. "between 0 and 1". */
export function describeRange(param: NumericParam): string {
  const low = param.minExclusive ? `greater than ${param.min}` : `at least ${param.min}`;
  if (param.max === Infinity) return low;
  return param.minExclusive
    ? `greater than ${param.min} and at most ${param.max}`
    : `between ${param.min} and ${param.max}`;
}

/**
 * Throws an InputError naming the field when a parameter is missing, not a
 * finite number, or outside its physical range.
 */
export function validateMethod(method: LossMethod): void {
  if (!method || typeof method !== 'object') throw new InputError('method', 'No loss method was given.');
  if (!isLossKind(method.kind)) throw new InputError('kind', `Unknown loss method "${String(method.kind)}".`);
  const spec = methodSpec(method.kind) as MethodSpec;
  for (const param of spec.params) {
    const v = LOSS_TABLE.read(method, param.key);
    // Added after callers were written: leaving it out means its stated value.
    if (v === undefined && param.omitted !== undefined) continue;
    const unit = param.unit === '-' ? '' : ` ${param.unit}`;
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new InputError(
        param.key,
        `${param.label} must be a finite number${unit ? ` in${unit}` : ''} (got ${String(v)}).`,
      );
    }
    const tooLow = param.minExclusive ? v <= param.min : v < param.min;
    if (tooLow || v > param.max) {
      throw new InputError(param.key, `${param.label} must be ${describeRange(param)}${unit} (got ${v}).`);
    }
  }
  for (const choice of spec.choices ?? []) {
    const v = LOSS_TABLE.read(method, choice.key);
    if (v === undefined && choice.omitted !== undefined) continue;
    if (!choice.choices.some((c) => c.value === v)) {
      const allowed = choice.choices.map((c) => JSON.stringify(c.value)).join(' or ');
      throw new InputError(choice.key, `${choice.label} must be ${allowed} (got ${JSON.stringify(v)}).`);
    }
  }
  withSpec(method, (spec, m) => spec.validateExtra?.(m));
}
