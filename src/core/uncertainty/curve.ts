import { InputError } from '../errors';
import { totalExcessMm } from '../loss/compute';
import { methodSpec, numericParam, validateMethod } from '../loss/methods';
import type { LossMethod, NumericParam } from '../loss/types';
import { validateStorm, type Storm } from '../storm';

export interface RunoffCurveOptions {
  /** Number of parameter values, evenly spaced (default 64, 2 to 10,000). */
  readonly points?: number;
  /** Ends of the range; default the range calibration searches (see below). */
  readonly from?: number;
  readonly to?: number;
}

export interface RunoffCurve {
  /** Parameter values, increasing. */
  readonly values: Float64Array;
  /** The storm's total excess at each value, mm. */
  readonly runoffMm: Float64Array;
}

/**
 * The range calibration searches for a parameter: its lower bound (just above
 * it when excluded; raised where it depends on the other parameters, as
 * Horton's f₀ ≥ f_c) to its upper bound, or, when that is unbounded, to the
 * value past which the storm gives no more change (the peak intensity for a
 * rate, the storm depth for the initial loss).
 */
export function parameterSearchRange(
  storm: Storm,
  method: LossMethod,
  param: NumericParam,
): { lo: number; hi: number } {
  const ownLo = param.minExclusive ? param.min + Math.max(Math.abs(param.min) * 1e-9, 1e-9) : param.min;
  const lo = param.searchMin ? Math.max(ownLo, param.searchMin(storm, method as never)) : ownLo;
  let hi = Number.isFinite(param.max) ? param.max : (param.searchMax?.(storm, method as never) ?? lo + 1);
  if (!(hi > lo)) hi = lo + 1;
  return { lo, hi };
}

/**
 * Runoff depth against one loss parameter (the others held), across its
 * range: the curve a calibration sits on, for a small chart of the fit with
 * the observed runoff (and its uncertainty band) marked. Throws an InputError
 * naming the field for a bad storm, method, parameter or option.
 */
export function runoffCurve(
  storm: Storm,
  method: LossMethod,
  parameter: string,
  options: RunoffCurveOptions = {},
): RunoffCurve {
  validateStorm(storm);
  validateMethod(method);
  const param = numericParam(method.kind, parameter);
  if (!param) {
    const spec = methodSpec(method.kind);
    throw new InputError(
      'parameter',
      `${spec.label} has no parameter "${parameter}"; it has ${spec.params.map((p) => p.key).join(', ')}.`,
    );
  }
  const points = options.points ?? 64;
  if (!Number.isInteger(points) || points < 2 || points > 10_000) {
    throw new InputError(
      'options.points',
      `The curve needs a whole number of points from 2 to 10,000 (got ${String(points)}).`,
    );
  }
  const range = parameterSearchRange(storm, method, param);
  const from = options.from ?? range.lo;
  const to = options.to ?? range.hi;
  for (const [key, v] of [
    ['from', from],
    ['to', to],
  ] as const) {
    const tooLow = param.minExclusive ? v <= param.min : v < param.min;
    if (typeof v !== 'number' || !Number.isFinite(v) || tooLow || v > param.max) {
      throw new InputError(
        `options.${key}`,
        `The curve's ${key === 'from' ? 'start' : 'end'} must be a value ${param.label.toLowerCase()} can take (got ${String(v)}).`,
      );
    }
  }
  if (!(to > from)) throw new InputError('options.to', `The curve must end above where it starts (${from} to ${to}).`);
  // Rules between parameters (Horton's f₀ ≥ f_c) hold along the curve when they hold at its ends.
  validateMethod({ ...method, [param.key]: from } as LossMethod);
  validateMethod({ ...method, [param.key]: to } as LossMethod);
  const values = new Float64Array(points);
  const runoffMm = new Float64Array(points);
  for (let i = 0; i < points; i++) {
    const v = i === points - 1 ? to : from + ((to - from) * i) / (points - 1);
    values[i] = v;
    runoffMm[i] = totalExcessMm(storm, { ...method, [param.key]: v } as LossMethod);
  }
  return { values, runoffMm };
}
