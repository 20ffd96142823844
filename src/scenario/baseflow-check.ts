import {
  BASEFLOW_KINDS,
  baseflowMethodSpec,
  isBaseflowKind,
  attempt,
  isInputError,
  separateBaseflow,
  validateBaseflowMethod,
  withBaseflowSpec,
  type BaseflowKind,
  type BaseflowMethod,
  type BaseflowMethodSpec,
} from '../core';
import type { ReportAt } from './method-check';
import { describeValue } from './problems';

const kindList = (): string => BASEFLOW_KINDS.map((k) => `"${k}"`).join(', ');

/**
 * Reads a baseflow separation method from untrusted input. Kinds,
 * parameters, bounds and which parameters may be left out all come from the
 * core's BASEFLOW_METHODS table through `validateBaseflowMethod`, so a method
 * added to the core is read without a change here. Returns a clean copy (the
 * kind and the parameters present, -0 read as 0) or undefined after
 * reporting every problem found.
 *
 * `storedAs` is set for an entry of `baseflowMemory`, whose kind must match
 * the key it is stored under.
 */
export function readBaseflowMethod(
  input: unknown,
  report: ReportAt,
  storedAs?: BaseflowKind,
): BaseflowMethod | undefined {
  if (input === null || typeof input !== 'object' || Array.isArray(input)) {
    report(
      [],
      `must be a baseflow method: an object with a "kind" (${kindList()}) and its parameters (got ${describeValue(input)}).`,
    );
    return undefined;
  }
  const raw = input as Readonly<Record<string, unknown>>;
  const own = (key: string): unknown => (Object.hasOwn(raw, key) ? raw[key] : undefined);
  const kind = own('kind');
  if (kind === undefined) {
    report(['kind'], `is missing; it names the baseflow method (${kindList()}).`);
    return undefined;
  }
  if (!isBaseflowKind(kind)) {
    report(['kind'], `${describeValue(kind)} is not a baseflow method this version of Raincut knows (${kindList()}).`);
    return undefined;
  }
  if (storedAs !== undefined && kind !== storedAs) {
    report(['kind'], `must be "${storedAs}", the key it is stored under (got "${kind}").`);
    return undefined;
  }

  const spec: BaseflowMethodSpec = baseflowMethodSpec(kind);
  const keys: string[] = spec.params.map((p) => p.key);
  let ok = true;
  for (const key of Object.keys(raw)) {
    if (key !== 'kind' && !keys.includes(key)) {
      report(
        [key],
        `is not a parameter of the "${kind}" baseflow method (its parameters are ${keys.join(', ') || 'none'}).`,
      );
      ok = false;
    }
  }
  const candidate: Record<string, unknown> = { kind };
  for (const param of spec.params) {
    const value = own(param.key);
    if (value === undefined) {
      if (param.optional) continue;
      report([param.key], `is missing (${param.label}${param.unit === '-' ? '' : `, ${param.unit}`}).`);
      ok = false;
    }
    // -0 and 0 are the same amount; keep one so documents compare equal.
    candidate[param.key] = value === 0 ? 0 : value;
  }
  if (!ok) return undefined;

  try {
    validateBaseflowMethod(candidate as unknown as BaseflowMethod);
  } catch (error) {
    if (isInputError(error)) report(error.field === 'method' ? [] : [error.field], error.message);
    else report([], `could not be checked (${error instanceof Error ? error.message : String(error)}).`);
    return undefined;
  }
  return candidate as unknown as BaseflowMethod;
}

/**
 * The core's message when a method's own parameters do not fit this record
 * (a start of rise past the last sample, an end point outside the record),
 * as `[field, message]`, or null when they fit. A method that needs the
 * catchment area to place its end point is not judged here: that depends on
 * the area, which may be entered later, and the screen says so.
 */
export function baseflowRecordProblem(
  record: { readonly timesH: readonly number[]; readonly dischargeM3s: readonly number[] },
  method: BaseflowMethod,
): readonly [field: string, message: string] | null {
  if (withBaseflowSpec(method, (spec, m) => spec.needsArea(m))) return null;
  const r = attempt(() => separateBaseflow(record, method));
  return r.ok ? null : [r.error.field, r.error.message];
}
