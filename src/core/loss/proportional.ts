import { isCleanBarBelowSums, PASS_BLOCK, summedBarsClean } from '../storm';
import type { CheckedComputeFn, ComputeFn, MethodSpec } from './types';

// One read of the storm, as the constant rate's pass (constant.ts says why
// it is shaped so): bars checked against their lower limits as they are
// read, the totals summed in the same loop, in blocks of PASS_BLOCK bars
// with the running sums between blocks in module variables.
const BLOCK = PASS_BLOCK;
const cleanBar = isCleanBarBelowSums;
const cleanSums = summedBarsClean;
let sumRain = 0;
let sumLoss = 0;
let sumExcess = 0;
let sumPeak = 0;
let sumSpan = 0;

/**
 * Proportional loss: every bar's excess is C·P (runoff coefficient C, 0..1),
 * the rational-method notion of a runoff coefficient applied bar by bar.
 * Checks each bar as it reads it; null when one is not clean (see
 * CheckedComputeFn).
 */
export const computeProportionalChecked: CheckedComputeFn<'proportional'> = (
  durationsH,
  depthsMm,
  method,
  lossOut,
  excessOut,
) => {
  const c = method.coefficient;
  const n = depthsMm.length;
  sumRain = 0;
  sumLoss = 0;
  sumExcess = 0;
  sumPeak = 0;
  sumSpan = 0;
  for (let start = 0; start < n; start += BLOCK) {
    if (!proportionalBlock(durationsH, depthsMm, c, lossOut, excessOut, start, Math.min(n, start + BLOCK))) return null;
  }
  if (!cleanSums(sumSpan, sumRain)) return null;
  return { rainMm: sumRain, totalLossMm: sumLoss, totalExcessMm: sumExcess, peakExcessMmH: sumPeak };
};

/** The same pass over a clean storm, where every check holds. */
export const computeProportional: ComputeFn<'proportional'> = (durationsH, depthsMm, method, lossOut, excessOut) =>
  computeProportionalChecked(durationsH, depthsMm, method, lossOut, excessOut) ?? undefined;

function proportionalBlock(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  c: number,
  lossOut: Float64Array,
  excessOut: Float64Array,
  start: number,
  end: number,
): boolean {
  let rain = sumRain;
  let loss = sumLoss;
  let total = sumExcess;
  let peak = +sumPeak; // a number from the start: see constant.ts
  let span = sumSpan;
  for (let k = start; k < end; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    if (!cleanBar(dt, p)) return false;
    span += dt;
    const excess = c * p;
    const l = p - excess;
    excessOut[k] = excess;
    lossOut[k] = l;
    rain += p;
    loss += l;
    total += excess;
    if (excess > peak * dt) peak = excess / dt;
  }
  sumRain = rain;
  sumLoss = loss;
  sumExcess = total;
  sumPeak = peak;
  sumSpan = span;
  return true;
}

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
  checkedCompute: computeProportionalChecked,
};
