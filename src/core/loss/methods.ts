import { InputError } from '../errors';
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
 * touches this table and nothing else outside its own file.
 */
export const METHODS: { readonly [K in LossKind]: MethodSpec<K> } = {
  constant: constantSpec,
  'initial-continuing': initialContinuingSpec,
  proportional: proportionalSpec,
  horton: hortonSpec,
  'green-ampt': greenAmptSpec,
  'curve-number': curveNumberSpec,
};

/** Method kinds in the order a picker shows them. */
export const METHOD_KINDS = Object.keys(METHODS) as LossKind[];

export function isLossKind(kind: unknown): kind is LossKind {
  return typeof kind === 'string' && Object.prototype.hasOwnProperty.call(METHODS, kind);
}

export function methodSpec<K extends LossKind>(kind: K): MethodSpec<K> {
  const spec = METHODS[kind] as MethodSpec<K> | undefined;
  if (!spec) throw new InputError('kind', `Unknown loss method "${String(kind)}".`);
  return spec;
}

/**
 * Calls `fn` with the method and the spec of its kind, typed to the same kind,
 * so a caller can hand one to the other (`spec.dryBars(method)`). TypeScript
 * cannot tie a union value to the table entry of its own member: this is the
 * one place that says so.
 */
export function withSpec<R>(
  method: LossMethod,
  fn: <K extends LossKind>(spec: MethodSpec<K>, method: MethodOf<K>) => R,
): R {
  return fn(methodSpec(method.kind) as MethodSpec, method);
}

/**
 * The value `method` holds for the parameter or setting `key` (a key of its
 * spec's params or choices), or undefined when it holds none there (left out,
 * or not a number, switch or choice).
 */
export function methodValue(method: LossMethod, key: string): MethodValue | undefined {
  const v: unknown = (method as unknown as Partial<Record<string, unknown>>)[key];
  return typeof v === 'number' || typeof v === 'boolean' || typeof v === 'string' ? v : undefined;
}

/** The number `method` holds for the numeric parameter `key`, or undefined. */
export function methodNumber(method: LossMethod, key: string): number | undefined {
  const v = methodValue(method, key);
  return typeof v === 'number' ? v : undefined;
}

/**
 * A copy of `method` with the parameter or setting `key` set to `value`. Not
 * validated: the caller checks it (validateMethod) before it is used.
 */
export function withMethodValue<M extends LossMethod>(method: M, key: string, value: MethodValue): M {
  return { ...method, [key]: value };
}

/** The numeric parameter `key` of a method kind, or undefined. */
export function numericParam<K extends LossKind>(kind: K, key: string): NumericParam<K> | undefined {
  return methodSpec(kind).params.find((p) => p.key === key);
}

/** Default parameters for a method kind (a fresh object). */
export function defaultMethod<K extends LossKind>(kind: K): MethodOf<K> {
  return { ...methodSpec(kind).defaults };
}

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
    const v: unknown = (method as unknown as Partial<Record<string, unknown>>)[param.key];
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
    const v: unknown = (method as unknown as Partial<Record<string, unknown>>)[choice.key];
    if (v === undefined && choice.omitted !== undefined) continue;
    if (!choice.choices.some((c) => c.value === v)) {
      const allowed = choice.choices.map((c) => JSON.stringify(c.value)).join(' or ');
      throw new InputError(choice.key, `${choice.label} must be ${allowed} (got ${JSON.stringify(v)}).`);
    }
  }
  withSpec(method, (spec, m) => spec.validateExtra?.(m));
}
