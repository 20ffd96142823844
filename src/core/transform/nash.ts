import { gammaP, gammaQ, logGamma } from './gamma';
import { gammaTailEnd, responseArray } from './tail';

/**
 * The Nash (1957) instantaneous unit hydrograph, 1/h: the outflow of n equal
 * linear reservoirs in series, each with storage constant k, after a unit
 * impulse of inflow: u(t) = (t/k)^(n−1)·e^(−t/k) / (k·Γ(n)). n need not be a
 * whole number. Its peak is at t = (n − 1)·k (for n > 1).
 */
export function nashIuh(tH: number, n: number, kH: number): number {
  if (tH <= 0) return n === 1 && tH === 0 ? 1 / kH : 0;
  const x = tH / kH;
  return Math.exp((n - 1) * Math.log(x) - x - logGamma(n)) / kH;
}

/**
 * The S-curve of the Nash cascade: the share of an impulse that has run off by
 * time t, ∫₀ᵗ u = P(n, t/k), the regularised lower incomplete gamma function.
 */
export function nashSCurve(tH: number, n: number, kH: number): number {
  return gammaP(n, tH / kH);
}

/**
 * The D-hour Nash unit hydrograph with D = the output step, at the step's
 * instants j·Δ from the start of the excess: u_D(jΔ) = (S(jΔ) − S((j−1)Δ))/Δ,
 * the IUH integrated over each step through its S-curve. Unnormalised weights
 * S(jΔ) − S((j−1)Δ). Each difference is taken on whichever side of the S-curve
 * is small (P on the rise, Q = 1 − P in the tail), so the tail keeps its digits.
 */
export function nashWeights(n: number, kH: number, stepH: number): Float64Array {
  const endX = gammaTailEnd(n);
  const count = Math.ceil((endX * kH) / stepH) + 1;
  const w = responseArray(count, stepH, endX * kH);
  // Each S value is computed once: P while below n + 1 (where gammaP and
  // gammaQ switch expansions), Q after; the step across takes both ends as Q.
  const split = n + 1;
  const lg = logGamma(n);
  let prev = 0; // P(n, x0) on the rise, Q(n, x0) in the tail
  let inTail = false;
  for (let j = 1; j < count; j++) {
    const x1 = (j * stepH) / kH;
    let d: number;
    if (x1 < split) {
      const p1 = gammaP(n, x1, lg);
      d = p1 - prev;
      prev = p1;
    } else {
      if (!inTail) {
        prev = gammaQ(n, ((j - 1) * stepH) / kH, lg);
        inTail = true;
      }
      const q1 = gammaQ(n, x1, lg);
      d = prev - q1;
      prev = q1;
    }
    w[j] = d > 0 ? d : 0;
  }
  return w;
}
