import type { ComputeFn, MethodSpec } from './types';
import { peakRate, stormDepth } from './search-bounds';

/**
 * Initial loss then continuing loss. The first IL mm of rain are lost. In the
 * bar where IL is used up, at t_r = r / i into the bar (r = initial loss
 * remaining), the continuing rate applies to the rest of that bar only:
 * E = max(0, i − CL)·(Δt − t_r). Later bars: E = max(0, i − CL)·Δt.
 * (Initial loss–continuing loss model, e.g. Australian Rainfall and Runoff,
 * Book 5; Chow, Maidment & Mays 1988, §5.2.)
 */
export const computeInitialContinuing: ComputeFn<'initial-continuing'> = (
  durationsH,
  depthsMm,
  method,
  lossOut,
  excessOut,
) => {
  const cl = method.rateMmH;
  let remaining = method.initialMm;
  const n = depthsMm.length;
  let k = 0;
  // Phase 1: bars that (partly) fill the initial loss.
  for (; k < n && remaining > 0; k++) {
    const p = depthsMm[k] as number;
    let excess = 0;
    if (remaining >= p) {
      remaining -= p;
    } else {
      // IL runs out part-way through the bar: rain after that meets the continuing rate.
      const dt = durationsH[k] as number;
      const tr = (remaining / p) * dt;
      excess = p - remaining - cl * (dt - tr);
      if (excess < 0) excess = 0;
      remaining = 0;
    }
    excessOut[k] = excess;
    lossOut[k] = p - excess;
  }
  // Phase 2: the continuing rate alone, branch-free as in the constant method.
  for (; k < n; k++) {
    const p = depthsMm[k] as number;
    const x = p - cl * (durationsH[k] as number);
    const excess = 0.5 * (x + Math.abs(x));
    excessOut[k] = excess;
    lossOut[k] = p - excess;
  }
};

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
};
