import { gammaQ, logGamma } from './gamma';
import { responseTooLong } from './step-limit';

/**
 * Share of a unit response's volume left off at its end. Dropping it and
 * rescaling the rest moves that share into the body of the response, far below
 * the 1e-9 volume tolerance and below any discharge a gauge resolves.
 */
const RESPONSE_TAIL = 1e-14;

/**
 * The smallest x (to 1e-12 relative) with Q(a, x) ≤ `tail`: where a gamma-
 * shaped response has delivered all but that share of its volume. Q falls
 * steadily in x, so bracket by doubling and bisect.
 */
export function gammaTailEnd(a: number, tail = RESPONSE_TAIL): number {
  const lg = logGamma(a);
  let lo = 0;
  let hi = Math.max(1, a);
  while (gammaQ(a, hi, lg) > tail) {
    lo = hi;
    hi *= 2;
  }
  while (hi - lo > 1e-12 * hi) {
    const mid = 0.5 * (lo + hi);
    if (gammaQ(a, mid, lg) > tail) lo = mid;
    else hi = mid;
  }
  return hi;
}

/** Longest unit response kept, in output steps (2²³, 64 MiB of weights). */
const MAX_RESPONSE_STEPS = 2 ** 23;

/**
 * A zeroed array for a unit response of `count` steps, or an InputError naming
 * the output step when the response would be unreasonably long for it.
 */
export function responseArray(count: number, stepH: number, lastingH: number): Float64Array {
  if (count > MAX_RESPONSE_STEPS) throw responseTooLong(lastingH, stepH, count, MAX_RESPONSE_STEPS);
  return new Float64Array(count);
}
