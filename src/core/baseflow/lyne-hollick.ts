import type { SeparateFn } from './types';
import { reflectPad } from './warm-up';

/**
 * One pass of the Lyne & Hollick (1979) filter over `input`, written to
 * `output` (baseflow), forward or backward. The quickflow f follows
 *
 *   f_k = α f_{k−1} + (1 + α)/2 · (x_k − x_{k−1}),   b_k = x_k − f_k
 *
 * Lyne, V. & Hollick, M. (1979) Stochastic time-variable rainfall-runoff
 * modelling, Hydrology and Water Resources Symposium, Institution of
 * Engineers Australia, Perth; in the form used for baseflow by Nathan, R.J. &
 * McMahon, T.A. (1990) Water Resources Research 26(7), 1465–1473 (both
 * citations from memory).
 *
 * Start: f = 0 at the first sample of the pass, i.e. the pass starts on
 * baseflow (b = x there), as an event record cut just before the rise does.
 * Constraint: f is clamped to [0, x_k] at every step and the clamped value is
 * carried into the next step, so 0 ≤ b_k ≤ x_k; with x ≥ 0 that holds for
 * every pass and so, pass after pass, 0 ≤ baseflow ≤ discharge. Only the
 * lower clamp binds in exact arithmetic: 0 ≤ f_{k−1} ≤ x_{k−1} and 0 ≤ α < 1
 * give f_k ≤ (α − 1)/2 · x_{k−1} + (1 + α)/2 · x_k ≤ x_k; the upper one guards
 * against rounding.
 *
 * `stepH` undefined: α applies per sample, as published. Otherwise each step
 * uses α^(Δt/stepH). With no input change the quickflow decays by α a step,
 * f_k = α·f_{k−1}, as a recession does by its constant, so α scales with the
 * step as a recession constant does (k_Δt = k_day^(Δt/1 day) for an
 * exponential recession; Tallaksen 1995, J. Hydrol. 165, from memory): the
 * filter then forgets at the same rate in hours on daily, hourly and
 * irregular records. Published α values are for daily data, so the default
 * stepH is 24 h (the scaling applied to α is our reading of that practice).
 */
function lyneHollickPass(
  timesH: ArrayLike<number>,
  input: ArrayLike<number>,
  output: Float64Array,
  alpha: number,
  stepH: number | undefined,
  forward: boolean,
): void {
  const n = input.length;
  const first = forward ? 0 : n - 1;
  const dir = forward ? 1 : -1;
  let f = 0;
  output[first] = input[first] as number;
  for (let i = 1; i < n; i++) {
    const k = first + dir * i;
    const prev = k - dir;
    const x = input[k] as number;
    const a =
      stepH === undefined ? alpha : Math.pow(alpha, Math.abs((timesH[k] as number) - (timesH[prev] as number)) / stepH);
    f = a * f + 0.5 * (1 + a) * (x - (input[prev] as number));
    if (f < 0) f = 0;
    else if (f > x) f = x;
    output[k] = x - f;
  }
}

/**
 * Lyne–Hollick separation: `passes` passes alternating forward, backward,
 * forward, …, each filtering the baseflow of the pass before. With
 * `warmUpSamples`, the record is padded at both ends by reflection
 * (warm-up.ts) before the passes and the padding dropped after them.
 */
export const separateLyneHollick: SeparateFn<'lyne-hollick'> = (timesH, dischargeM3s, method) => {
  const n = dischargeM3s.length;
  const padded = reflectPad(timesH, dischargeM3s, method.warmUpSamples ?? 0, true);
  const size = padded.values.length;
  let current = new Float64Array(size);
  let next = new Float64Array(size);
  lyneHollickPass(padded.timesH, padded.values, current, method.alpha, method.stepH, true);
  for (let p = 1; p < method.passes; p++) {
    lyneHollickPass(padded.timesH, current, next, method.alpha, method.stepH, p % 2 === 0);
    [current, next] = [next, current];
  }
  const lineM3s = padded.offset === 0 && size === n ? current : current.slice(padded.offset, padded.offset + n);
  return { lineM3s, startIndex: 0, endTimeH: timesH[n - 1] as number, endLineM3s: lineM3s[n - 1] as number };
};
