import type { BaseflowMethodSpec, SeparateFn } from './types';

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
 * uses α^(Δt/stepH), which keeps the filter's time constant fixed across
 * irregular steps (our generalisation, not in the sources).
 */
export function lyneHollickPass(
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
 * forward, …, each filtering the baseflow of the pass before.
 */
export const separateLyneHollick: SeparateFn<'lyne-hollick'> = (timesH, dischargeM3s, method) => {
  const n = dischargeM3s.length;
  let current = new Float64Array(n);
  let next = new Float64Array(n);
  lyneHollickPass(timesH, dischargeM3s, current, method.alpha, method.stepH, true);
  for (let p = 1; p < method.passes; p++) {
    lyneHollickPass(timesH, current, next, method.alpha, method.stepH, p % 2 === 0);
    [current, next] = [next, current];
  }
  return { lineM3s: current, startIndex: 0, endTimeH: timesH[n - 1] as number, endLineM3s: current[n - 1] as number };
};

export const lyneHollickSpec: BaseflowMethodSpec<'lyne-hollick'> = {
  kind: 'lyne-hollick',
  label: 'Lyne & Hollick filter',
  summary:
    'A recursive digital filter takes the quick, high-frequency part of the record as direct runoff; more passes give a smoother baseflow.',
  source:
    'Lyne & Hollick (1979), Hydrology and Water Resources Symposium, IEAust, Perth; as applied by Nathan & McMahon (1990), Water Resources Research 26(7).',
  params: [
    {
      key: 'alpha',
      label: 'Filter parameter α',
      unit: '-',
      min: 0,
      max: 1,
      maxExclusive: true,
      step: 0.005,
      help: 'Higher α gives a smoother, lower baseflow. 0.925 is common practice (Nathan & McMahon 1990), for daily data.',
    },
    {
      key: 'passes',
      label: 'Passes',
      unit: '-',
      min: 1,
      max: 9,
      integer: true,
      step: 1,
      help: 'Passes over the record, alternating forward and backward; 3 is usual.',
    },
    {
      key: 'stepH',
      label: 'Time step of α',
      unit: 'h',
      min: 0,
      minExclusive: true,
      max: Infinity,
      optional: { auto: 'α applies to each sample step, as published' },
      step: 1,
      help: 'Step α was chosen for (e.g. 24 h for daily α); each step then uses α^(Δt/step). Leave empty to apply α per sample.',
    },
  ],
  defaults: { kind: 'lyne-hollick', alpha: 0.925, passes: 3 },
  needsArea: () => false,
  separate: separateLyneHollick,
};
