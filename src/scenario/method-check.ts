import {
  METHOD_KINDS,
  isInputError,
  isLossKind,
  methodSpec,
  validateMethod,
  type LossKind,
  type LossMethod,
  type MethodSpec,
} from '../core';
import { describeValue, type PathKey } from './problems';

/** Reports a problem at a path relative to the method object. */
export type ReportAt = (keys: readonly PathKey[], text: string) => void;

const kindList = (): string => METHOD_KINDS.map((k) => `"${k}"`).join(', ');

function parameterKeys(spec: MethodSpec): string[] {
  return [...spec.params.map((p) => p.key), ...(spec.choices ?? []).map((c) => c.key)];
}

/**
 * Reads a loss method from untrusted input. The kinds, parameters, bounds
 * and cross-parameter rules all come from the core's method table through
 * `validateMethod`, so kinds added to the core are read without a change
 * here. Returns a clean copy (only the kind and its parameters, -0 read as 0)
 * or undefined after reporting every problem found.
 *
 * `storedAs` is set for an entry of `methodMemory`, whose kind must match
 * the key it is stored under.
 */
export function readMethod(input: unknown, report: ReportAt, storedAs?: LossKind): LossMethod | undefined {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    report(
      [],
      `must be a loss method: an object with a "kind" (${kindList()}) and its parameters (got ${describeValue(input)}).`,
    );
    return undefined;
  }
  const raw = input as Readonly<Record<string, unknown>>;
  const own = (key: string): unknown => (Object.hasOwn(raw, key) ? raw[key] : undefined);
  const kind = own('kind');
  if (kind === undefined) {
    report(['kind'], `is missing; it names the loss method (${kindList()}).`);
    return undefined;
  }
  if (!isLossKind(kind)) {
    report(['kind'], `${describeValue(kind)} is not a loss method this version of Raincut knows (${kindList()}).`);
    return undefined;
  }
  if (storedAs !== undefined && kind !== storedAs) {
    report(['kind'], `must be "${storedAs}", the key it is stored under (got "${kind}").`);
    return undefined;
  }

  const spec = methodSpec(kind) as MethodSpec;
  const keys = parameterKeys(spec);
  let ok = true;
  for (const key of Object.keys(raw)) {
    if (key !== 'kind' && !keys.includes(key)) {
      report([key], `is not a parameter of the "${kind}" method (its parameters are ${keys.join(', ') || 'none'}).`);
      ok = false;
    }
  }
  const candidate: Record<string, unknown> = { kind };
  for (const param of spec.params) {
    const value = own(param.key);
    if (value === undefined) {
      const unit = param.unit === '-' ? '' : `, ${param.unit}`;
      report([param.key], `is missing (${param.label}${unit}).`);
      ok = false;
    }
    // -0 and 0 are the same amount; keep one so documents compare equal.
    candidate[param.key] = value === 0 ? 0 : value;
  }
  for (const choice of spec.choices ?? []) {
    const value = own(choice.key);
    if (value === undefined) {
      report([choice.key], `is missing (${choice.label}).`);
      ok = false;
    }
    candidate[choice.key] = value;
  }
  if (!ok) return undefined;

  try {
    validateMethod(candidate as unknown as LossMethod);
  } catch (error) {
    if (isInputError(error)) {
      // The core names the field it found wrong: a parameter key, 'kind', or
      // 'method' for the whole object.
      report(error.field === 'method' ? [] : [error.field], error.message);
    } else {
      report([], `could not be checked (${error instanceof Error ? error.message : String(error)}).`);
    }
    return undefined;
  }
  return candidate as unknown as LossMethod;
}

/** Keys of the numeric parameters of a method kind (the ones that can be fitted). */
export function fittableParameters(kind: LossKind): string[] {
  return methodSpec(kind).params.map((p) => p.key);
}
