import type { BaseflowMethodSpec, SeparateFn } from './types';
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

/** The filter's conventions in words, for the screen and the README. */
const ECKHARDT_CONVENTIONS =
  'One forward pass. It starts with all flow as baseflow at its first sample (b₀ = Q₀); baseflow is capped at the flow at every step and the capped value carried on, so 0 ≤ baseflow ≤ flow. ' +
  'Without warm-up a record that starts on a recession is taken as all baseflow there; with warm-up, samples are mirrored before the first and dropped after filtering.';

export const eckhardtSpec: BaseflowMethodSpec<'eckhardt'> = {
  kind: 'eckhardt',
  label: 'Eckhardt filter',
  summary:
    'A two-parameter recursive filter: the recession constant shapes the baseflow, and BFImax caps the share of flow it can take over the long run.',
  source: 'Eckhardt (2005) Hydrological Processes 19(2), 507–515.',
  params: [
    {
      key: 'a',
      label: 'Recession constant a',
      unit: '-',
      min: 0,
      max: 1,
      maxExclusive: true,
      step: 0.005,
      help: 'Ratio of discharge from one step to the next in a pure recession; best taken from recession analysis. 0.98 is common practice for daily data.',
    },
    {
      key: 'bfiMax',
      label: 'BFImax',
      unit: '-',
      min: 0,
      max: 1,
      step: 0.05,
      help: 'Largest baseflow index the filter allows. Eckhardt (2005) suggests about 0.80 for perennial streams on porous aquifers, 0.50 for ephemeral streams on porous aquifers, 0.25 for perennial streams on hard rock.',
    },
    {
      key: 'stepH',
      label: 'Time step of a',
      unit: 'h',
      min: 0,
      minExclusive: true,
      max: Infinity,
      optional: { auto: 'a applies to each sample step, as published' },
      step: 1,
      help:
        'Step a was found for: 24 h for daily values, so a 15-minute record uses a^(0.25/24) per step, the same recession per hour (Tallaksen 1995, from memory). ' +
        'Leave empty to apply a to each sample as it stands.',
    },
    {
      key: 'warmUpSamples',
      label: 'Warm-up (samples mirrored before the start)',
      unit: 'samples',
      min: 0,
      max: Infinity,
      integer: true,
      optional: { auto: 'no warm-up: the filter starts at the first sample' },
      step: 1,
      help: 'Mirror this many samples before the first, so the start-up guess (all baseflow) fades before the record begins; as for the Lyne & Hollick filter (Ladson et al. 2013, from memory). Empty: none.',
    },
  ],
  // a for daily data, scaled to the record's step (stepH 24 h); no warm-up.
  defaults: { kind: 'eckhardt', a: 0.98, bfiMax: 0.8, stepH: 24 },
  conventions: ECKHARDT_CONVENTIONS,
  needsArea: () => false,
  separate: separateEckhardt,
};
