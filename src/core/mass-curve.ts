import type { LossResult } from './loss/types';

/**
 * The cumulative mass curve of a storm: rainfall, loss and rainfall excess
 * summed from the storm start to the end of each bar, in mm. The curve of
 * cumulative rainfall against time is the mass curve of a storm (Chow,
 * Maidment & Mays 1988, §14.1, from memory); the loss and excess curves are
 * the same running sums of the core's per-bar loss and excess, so at every
 * bar end rain = loss + excess, as the methods' own balance ΣP = ΣL + ΣE.
 *
 * Sums are accumulated in bar order, one pass, without compensation: the
 * last value of each column is the same sum the totals of `computeLosses`
 * report to within rounding of the order (both add the bars left to right).
 */
export interface MassCurve {
  /** Cumulative rainfall at the end of bar k, mm. */
  readonly rainMm: Float64Array;
  readonly lossMm: Float64Array;
  readonly excessMm: Float64Array;
}

export function massCurve(depthsMm: ArrayLike<number>, result: Pick<LossResult, 'lossMm' | 'excessMm'>): MassCurve {
  const n = depthsMm.length;
  const rainMm = new Float64Array(n);
  const lossMm = new Float64Array(n);
  const excessMm = new Float64Array(n);
  let rain = 0;
  let loss = 0;
  let excess = 0;
  for (let k = 0; k < n; k++) {
    rain += depthsMm[k] as number;
    loss += result.lossMm[k] as number;
    excess += result.excessMm[k] as number;
    rainMm[k] = rain;
    lossMm[k] = loss;
    excessMm[k] = excess;
  }
  return { rainMm, lossMm, excessMm };
}
