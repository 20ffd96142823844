import { InputError } from '../errors';
import { constantSpec } from './constant';
import { eckhardtSpec } from './eckhardt';
import { lyneHollickSpec } from './lyne-hollick';
import { straightLineSpec } from './straight-line';
import type { BaseflowKind, BaseflowMethod, BaseflowMethodOf, BaseflowMethodSpec, BaseflowParam } from './types';

/**
 * The one table of baseflow separation methods. The UI builds its method
 * picker and parameter fields from it; validation reads bounds from it.
 */
export const BASEFLOW_METHODS: { readonly [K in BaseflowKind]: BaseflowMethodSpec<K> } = {
  constant: constantSpec,
  'straight-line': straightLineSpec,
  'lyne-hollick': lyneHollickSpec,
  eckhardt: eckhardtSpec,
};

/** Method kinds in the order a picker shows them. */
export const BASEFLOW_KINDS = Object.keys(BASEFLOW_METHODS) as BaseflowKind[];

export function isBaseflowKind(kind: unknown): kind is BaseflowKind {
  return typeof kind === 'string' && Object.prototype.hasOwnProperty.call(BASEFLOW_METHODS, kind);
}

export function baseflowMethodSpec<K extends BaseflowKind>(kind: K): BaseflowMethodSpec<K> {
  const spec = BASEFLOW_METHODS[kind] as BaseflowMethodSpec<K> | undefined;
  if (!spec) throw new InputError('kind', `Unknown baseflow method "${String(kind)}".`);
  return spec;
}

/** Default parameters for a method kind (a fresh object). */
export function defaultBaseflowMethod<K extends BaseflowKind>(kind: K): BaseflowMethodOf<K> {
  return { ...baseflowMethodSpec(kind).defaults };
}

/** The allowed range of a parameter in words, e.g. "at least 0 and less than 1". */
export function describeBaseflowRange(param: BaseflowParam): string {
  const lowBound = param.min !== -Infinity;
  const highBound = param.max !== Infinity;
  const low = param.minExclusive ? `greater than ${param.min}` : `at least ${param.min}`;
  const high = param.maxExclusive ? `less than ${param.max}` : `at most ${param.max}`;
  const kind = param.integer ? 'a whole number' : 'a number';
  if (lowBound && highBound) return `${kind} ${low} and ${high}`;
  if (lowBound) return `${kind} ${low}`;
  if (highBound) return `${kind} ${high}`;
  return kind;
}

/** The number `method` holds for the parameter `key`, or undefined when it holds none (an optional one left out). */
export function baseflowNumber(method: BaseflowMethod, key: string): number | undefined {
  const v: unknown = (method as unknown as Partial<Record<string, unknown>>)[key];
  return typeof v === 'number' ? v : undefined;
}

/** A copy of `method` without the optional parameter `key` (which then goes back to automatic). */
export function withoutBaseflowParam<M extends BaseflowMethod>(method: M, key: string): M {
  const { [key]: _gone, ...rest } = method as unknown as Partial<Record<string, unknown>>;
  return rest as unknown as M;
}

/**
 * Throws an InputError naming the field when a parameter is missing (and not
 * optional), not a finite number, not whole where it must be, or outside its
 * bounds. Bounds that depend on the record are checked by the method itself.
 */
export function validateBaseflowMethod(method: BaseflowMethod): void {
  if (!method || typeof method !== 'object') throw new InputError('method', 'No baseflow method was given.');
  if (!isBaseflowKind(method.kind)) {
    throw new InputError('kind', `Unknown baseflow method "${String(method.kind)}".`);
  }
  const spec = baseflowMethodSpec(method.kind) as BaseflowMethodSpec;
  const values = method as unknown as Record<string, unknown>;
  for (const param of spec.params) {
    const v = values[param.key];
    if (v === undefined && param.optional) continue;
    const unit = param.unit === 'h' ? ' h' : '';
    // A sample index names a sample, so a bad one is reported with it.
    const index = param.unit === 'sample' && Number.isInteger(v) && (v as number) >= 0 ? (v as number) : undefined;
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new InputError(
        param.key,
        `${param.label} must be a finite number${unit && ` of hours`} (got ${String(v)}).`,
      );
    }
    const tooLow = param.minExclusive ? v <= param.min : v < param.min;
    const tooHigh = param.maxExclusive ? v >= param.max : v > param.max;
    if (tooLow || tooHigh || (param.integer && !Number.isInteger(v))) {
      throw new InputError(
        param.key,
        `${param.label} must be ${describeBaseflowRange(param)}${unit} (got ${v}).`,
        index,
      );
    }
  }
}
