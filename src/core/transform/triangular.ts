import { responseArray } from './tail';

/**
 * Base of the NRCS triangular unit hydrograph in units of Tp. Published as
 * 2.67 (NEH-630 ch. 16, from memory), which is 8/3 rounded: the base that,
 * with the peak rate factor 484, holds exactly the excess volume
 * (qp·Tb/2 = V with V = (4/3)·qp·Tp, see `dimensionlessArea`, gives Tb = 8/3·Tp).
 */
export const TRIANGULAR_BASE_OVER_TP = 8 / 3;

/**
 * The D-hour triangular unit hydrograph with D = the output step, sampled at
 * the step's instants from the start of the excess; unnormalised weights
 * (q/qp). Tp = D/2 + lag, rising linearly to the peak at Tp and falling
 * linearly to zero at 8/3·Tp (NEH-630 ch. 16, from memory).
 */
export function triangularWeights(lagH: number, stepH: number): Float64Array {
  const tpH = stepH / 2 + lagH;
  const base = TRIANGULAR_BASE_OVER_TP;
  const count = Math.ceil((base * tpH) / stepH) + 1;
  const w = responseArray(count, stepH, base * tpH);
  for (let j = 0; j < count; j++) {
    const x = (j * stepH) / tpH;
    w[j] = x <= 1 ? x : x < base ? (base - x) / (base - 1) : 0;
  }
  return w;
}
