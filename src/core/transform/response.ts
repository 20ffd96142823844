import { byKind } from '../kind-table';
import { TRANSFORM_WEIGHTS } from './weights';
import type { Transform } from './types';

/**
 * The unit response of a (validated) transform for an output step Δ: r_j, the
 * share of a step's excess volume that runs off as the discharge sampled at
 * the instant j·Δ after the step starts, so that a 1 mm excess spread over
 * [0, Δ] on area A gives q(j·Δ) = r_j·A·1 mm/Δ. The weights are rescaled to
 * sum to exactly 1, which makes every transform conserve volume, and
 * trimmed after their last non-zero value.
 */
export function unitResponse(transform: Transform, stepH: number): Float64Array {
  const w = byKind(TRANSFORM_WEIGHTS, transform, (weights, t) => weights(t, stepH));
  let sum = 0;
  let last = -1;
  for (let j = 0; j < w.length; j++) {
    const v = w[j] as number;
    sum += v;
    if (v > 0) last = j;
  }
  const r = w.subarray(0, last + 1);
  for (let j = 0; j < r.length; j++) r[j] = (r[j] as number) / sum;
  return r;
}
