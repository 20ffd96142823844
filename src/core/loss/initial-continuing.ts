import { isCleanBarBelowSums, PASS_BLOCK, summedBarsClean } from '../storm';
import type { BarTotals, CheckedComputeFn, ComputeFn, MethodSpec } from './types';
import { peakRate, stormDepth } from './search-bounds';

// One read of the storm, as the constant rate's pass (constant.ts says why
// it is shaped so): bars checked against their lower limits as they are
// read, the totals summed in the same loop, in blocks of PASS_BLOCK bars
// with the running sums and the initial loss still to fill between blocks
// in module variables.
const BLOCK = PASS_BLOCK;
const cleanBar = isCleanBarBelowSums;
const cleanSums = summedBarsClean;
let sumRain = 0;
let sumLoss = 0;
let sumExcess = 0;
let sumPeak = 0;
let sumSpan = 0;
let initialLeft = 0;

/**
 * Initial loss then continuing loss. The first IL mm of rain are lost. In the
 * bar where IL is used up, at t_r = r / i into the bar (r = initial loss
 * remaining), the continuing rate applies to the rest of that bar only:
 * E = max(0, i − CL)·(Δt − t_r). Later bars: E = max(0, i − CL)·Δt.
 * (Initial loss–continuing loss model, e.g. Australian Rainfall and Runoff,
 * Book 5; Chow, Maidment & Mays 1988, §5.2.) Checks each bar as it reads it;
 * null when one is not clean (see CheckedComputeFn).
 */
export const computeInitialContinuingChecked: CheckedComputeFn<'initial-continuing'> = (
  durationsH,
  depthsMm,
  method,
  lossOut,
  excessOut,
) => {
  const cl = method.rateMmH;
  const n = depthsMm.length;
  sumRain = 0;
  sumLoss = 0;
  sumExcess = 0;
  sumPeak = 0;
  sumSpan = 0;
  initialLeft = method.initialMm;
  for (let start = 0; start < n; start += BLOCK) {
    if (!initialContinuingBlock(durationsH, depthsMm, cl, lossOut, excessOut, start, Math.min(n, start + BLOCK))) {
      return null;
    }
  }
  // The continuing rate's (x + |x|)/2 may have overflowed (constant.ts,
  // constantPassExact says where): every bar again, exactly; before the
  // sums are judged, as there.
  const totals =
    sumExcess < Infinity
      ? { rainMm: sumRain, totalLossMm: sumLoss, totalExcessMm: sumExcess, peakExcessMmH: sumPeak }
      : initialContinuingExact(durationsH, depthsMm, method.initialMm, cl, lossOut, excessOut);
  return cleanSums(sumSpan, sumRain) ? totals : null;
};

/** The same pass over a clean storm, where every check holds. */
export const computeInitialContinuing: ComputeFn<'initial-continuing'> = (
  durationsH,
  depthsMm,
  method,
  lossOut,
  excessOut,
) => computeInitialContinuingChecked(durationsH, depthsMm, method, lossOut, excessOut) ?? undefined;

/**
 * Excess of the bar in which the initial loss runs out (`remainingMm` < P):
 * after t_r = r/i into the bar, the rest meets the continuing rate.
 */
function excessAsInitialRunsOut(p: number, dt: number, remainingMm: number, cl: number): number {
  const tr = (remainingMm / p) * dt;
  const excess = p - remainingMm - cl * (dt - tr);
  return excess < 0 ? 0 : excess;
}

function initialContinuingBlock(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  cl: number,
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
  let remaining = +initialLeft;
  let k = start;
  // Phase 1: bars that (partly) fill the initial loss.
  for (; k < end && remaining > 0; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    if (!cleanBar(dt, p)) return false;
    span += dt;
    let excess = 0;
    if (remaining >= p) {
      remaining -= p;
    } else {
      excess = excessAsInitialRunsOut(p, dt, remaining, cl);
      remaining = 0;
    }
    const l = p - excess;
    excessOut[k] = excess;
    lossOut[k] = l;
    rain += p;
    loss += l;
    total += excess;
    if (excess > peak * dt) peak = excess / dt;
  }
  // Phase 2: the continuing rate alone, branch-free as in the constant method.
  for (; k < end; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    if (!cleanBar(dt, p)) return false;
    span += dt;
    const x = p - cl * dt;
    const excess = 0.5 * (x + Math.abs(x));
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
  initialLeft = remaining;
  return true;
}

/** The pass over clean bars with the continuing rate's max(0, x) by Math.max (constant.ts, constantPassExact). */
function initialContinuingExact(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  initialMm: number,
  cl: number,
  lossOut: Float64Array,
  excessOut: Float64Array,
): BarTotals {
  let remaining = initialMm;
  let rain = 0;
  let loss = 0;
  let total = 0;
  let peak = 0;
  for (let k = 0; k < depthsMm.length; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    let excess = 0;
    if (remaining <= 0) {
      excess = Math.max(p - cl * dt, 0);
    } else if (remaining >= p) {
      remaining -= p;
    } else {
      excess = excessAsInitialRunsOut(p, dt, remaining, cl);
      remaining = 0;
    }
    const l = p - excess;
    excessOut[k] = excess;
    lossOut[k] = l;
    rain += p;
    loss += l;
    total += excess;
    if (excess > peak * dt) peak = excess / dt;
  }
  return { rainMm: rain, totalLossMm: loss, totalExcessMm: total, peakExcessMmH: peak };
}

export const initialContinuingSpec: MethodSpec<'initial-continuing'> = {
  kind: 'initial-continuing',
  label: 'Initial loss, then continuing loss',
  summary: 'The first rain fills an initial loss; after that, rain loses at a constant continuing rate.',
  source:
    'Initial loss–continuing loss model (Australian Rainfall and Runoff, Book 5; Chow, Maidment & Mays 1988, section 5.2).',
  rateParam: 'rateMmH',
  // With no continuing rate the method loses exactly the initial loss, bar by bar.
  lossPart: { label: 'Initial loss', variant: (m) => ({ ...m, rateMmH: 0 }) },
  params: [
    {
      key: 'initialMm',
      label: 'Initial loss',
      unit: 'mm',
      min: 0,
      max: Infinity,
      step: 0.5,
      searchMax: stormDepth,
      help: 'Depth of rain lost before any runoff (interception, depression storage, wetting up).',
    },
    {
      key: 'rateMmH',
      label: 'Continuing loss rate',
      unit: 'mm/h',
      min: 0,
      max: Infinity,
      step: 0.1,
      searchMax: peakRate,
      help: 'Constant loss rate once the initial loss is satisfied.',
    },
  ],
  defaults: { kind: 'initial-continuing', initialMm: 10, rateMmH: 2.5 },
  dryBars: () =>
    'A dry bar loses nothing. The initial loss is filled once per storm and does not refill in dry spells: after a long gap, treat the next burst as a storm of its own.',
  compute: computeInitialContinuing,
  checkedCompute: computeInitialContinuingChecked,
};
