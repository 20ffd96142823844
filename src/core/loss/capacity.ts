import { validateStorm, type Storm } from '../storm';
import { InputError } from '../errors';
import { methodSpec, validateMethod } from './methods';
import type { LossMethod, MethodSpec } from './types';

/**
 * Infiltration capacity of the soil, mm/h, at each of `timesH` (hours from
 * the storm start, non-decreasing), for the methods whose loss follows a
 * capacity curve (Horton in both readings, Green–Ampt); null for the others.
 * Times past the storm's end read the state at its end. Validates like
 * computeLosses; Infinity where the capacity is unbounded (Green–Ampt on dry
 * soil with ψΔθ > 0).
 */
export function infiltrationCapacity(storm: Storm, method: LossMethod, timesH: ArrayLike<number>): Float64Array | null {
  validateStorm(storm);
  validateMethod(method);
  const spec = methodSpec(method.kind) as MethodSpec;
  if (!spec.capacity) return null;
  for (let q = 0; q < timesH.length; q++) {
    const t = timesH[q] as number;
    if (!Number.isFinite(t) || (q > 0 && t < (timesH[q - 1] as number))) {
      throw new InputError(
        'timesH',
        `Time ${q + 1}: capacity times must be finite hours in non-decreasing order (got ${String(t)}).`,
        q,
      );
    }
  }
  const out = new Float64Array(timesH.length);
  spec.capacity(storm.durationsH, storm.depthsMm, method as never, timesH, out);
  return out;
}
