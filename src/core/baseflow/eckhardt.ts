import type { SeparateFn } from './types';
import { reflectPad } from './warm-up';

/**
 * Eckhardt (2005) two-parameter filter:
 *
 *   b_k = ((1 − BFImax) a b_{k−1} + (1 − a) BFImax Q_k) / (1 − a BFImax),  b_k ≤ Q_k
 *
 * Eckhardt, K. (2005) How to construct recursive digital filters for baseflow
 * separation, Hydrological Processes 19(2), 507–515 (citation from memory).
 * a is the recession constant (Q_{k+1} = a Q_k in a pure recession, where the
 * filter returns b = Q), BFImax the long-term baseflow index the filter tends
 * to (on a constant record b → BFImax·Q).
 *
 * Start: b_0 = Q_0, the record taken to start on baseflow. Constraint: every
 * term is ≥ 0 for 0 ≤ a < 1, 0 ≤ BFImax ≤ 1 and Q ≥ 0, so b ≥ 0; b is capped
 * at Q at each step and the capped value carried on, as the source states.
 *
 * `stepH` undefined: a applies per sample, as published. Otherwise each step
 * uses a^(Δt/stepH), the exact recession over a step of length Δt: in an
 * exponential recession Q(t) = Q₀·a^(t/stepH), so a constant found for daily
 * data becomes a^(Δt/24 h) for a step of Δt hours (Tallaksen 1995, A review
 * of baseflow recession analysis, J. Hydrol. 165, 349–370; from memory).
 * Published a values are for daily data, so the default stepH is 24 h.
 *
 * Warm-up (`warmUpSamples`): samples mirrored before the first (warm-up.ts),
 * filtered and then dropped, so b₀ = Q₀ is assumed on the mirror instead of
 * at the record's first sample. One forward pass needs no padding at the end.
 *
 * The typical BFImax values quoted in the help below are from memory of the
 * source; the defaults (a = 0.98, BFImax = 0.80) are common practice for
 * daily records, not a recommendation for any one catchment.
 */
export const separateEckhardt: SeparateFn<'eckhardt'> = (timesH, dischargeM3s, method) => {
  const n = dischargeM3s.length;
  const { bfiMax, stepH } = method;
  const padded = reflectPad(timesH, dischargeM3s, method.warmUpSamples ?? 0, false);
  const times = padded.timesH;
  const flow = padded.values;
  const size = flow.length;
  const all = new Float64Array(size);
  let b = flow[0] as number;
  all[0] = b;
  for (let k = 1; k < size; k++) {
    const q = flow[k] as number;
    const a =
      stepH === undefined ? method.a : Math.pow(method.a, ((times[k] as number) - (times[k - 1] as number)) / stepH);
    b = ((1 - bfiMax) * a * b + (1 - a) * bfiMax * q) / (1 - a * bfiMax);
    if (b > q) b = q;
    all[k] = b;
  }
  const lineM3s = padded.offset === 0 ? all : all.slice(padded.offset, padded.offset + n);
  return { lineM3s, startIndex: 0, endTimeH: timesH[n - 1] as number, endLineM3s: lineM3s[n - 1] as number };
};
