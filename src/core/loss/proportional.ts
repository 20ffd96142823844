import type { ComputeFn, MethodSpec } from './types';

/**
 * Proportional loss: every bar's excess is C·P (runoff coefficient C, 0..1),
 * the rational-method notion of a runoff coefficient applied bar by bar.
 */
export const computeProportional: ComputeFn<'proportional'> = (_durationsH, depthsMm, method, lossOut, excessOut) => {
  const c = method.coefficient;
  const n = depthsMm.length;
  for (let k = 0; k < n; k++) {
    const p = depthsMm[k] as number;
    const excess = c * p;
    excessOut[k] = excess;
    lossOut[k] = p - excess;
  }
};

export const proportionalSpec: MethodSpec<'proportional'> = {
  kind: 'proportional',
  label: 'Proportional loss (runoff coefficient)',
  summary: 'A fixed fraction of every bar runs off; the rest is lost.',
  source: 'Runoff coefficient applied per bar (e.g. Chow, Maidment & Mays 1988, section 15.1).',
  params: [
    {
      key: 'coefficient',
      label: 'Runoff coefficient',
      unit: '-',
      min: 0,
      max: 1,
      step: 0.01,
      help: 'Fraction of rain that becomes excess, from 0 (none) to 1 (all).',
    },
  ],
  defaults: { kind: 'proportional', coefficient: 0.4 },
  dryBars: () => 'A dry bar has nothing to lose; the coefficient applies to each bar on its own.',
  compute: computeProportional,
};
