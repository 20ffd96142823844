import { isCleanBarBelowSums, PASS_BLOCK, summedBarsClean } from '../storm';
import type { BarTotals, CheckedComputeFn, ComputeFn, MethodSpec, TotalExcessFn } from './types';
import { peakRate } from './search-bounds';

// Habits of V8's optimiser shape the pass below (figures: 10⁶ bars, CPU
// time, measured here).
// - A loop over 10⁶ bars run once per call is optimised only mid-loop (on-
//   stack replacement), and the function can stay in the baseline tier,
//   entering that code call after call: 6–7 ms where the function optimised
//   whole takes 2.7. In blocks of PASS_BLOCK bars it is called often enough
//   to be optimised whole. The sums run bar after bar across blocks, so the
//   totals are the same to the last bit.
// - The type feedback of an element read is kept per function literal. One
//   loop fed Float64Array columns and plain arrays in their four layouts
//   (packed or holey, whole numbers or not) sees five, turns megamorphic and
//   runs ten times slower (27 ms instead of 2.5). So the block is written
//   twice, for Float64Array columns and for everything else; the two must stay
//   alike (test/core/loss/compute.test.ts holds them to the same numbers).
// - The running totals pass from block to block in module variables, not in
//   an object or array: reading and writing those needs no type feedback, so
//   code optimised mid-loop does not fall back to the baseline tier at the
//   loop's end, as it did each call when the block ended by storing into a
//   Float64Array (the store had never run when the loop was optimised).
// - The check per bar is isCleanBarBelowSums, two comparisons; the sums the
//   pass keeps anyway settle the rest (summedBarsClean). The four
//   comparisons of isCleanBar took a quarter of the pass's time.
// - That check is called through a local name. Bundled, that is the same
//   function; where modules stay apart (the test and bench runner's loader)
//   each use of an imported name reads a getter on the module object, which
//   is not inlined: once per bar, 12 ms instead of 4.
// - Each fused pass (this one, initial–continuing, proportional, curve
//   number) keeps its own driver, totals and block, though they look alike.
//   Both ways of sharing them were measured (10⁶ bars, CPU-time medians of
//   alternated runs, machine loaded) and cost speed. One block serving
//   every method (tried on a copy of these loops), choosing the method's
//   step bar by bar, ran the proportional pass at the curve number's speed
//   (8.8 ms instead of 1.6): the code and feedback of one function literal
//   serve all. One driver carrying the totals in a shared object: the
//   initial–continuing block, once deoptimised (a Float64Array after plain
//   arrays), was never optimised whole again and entered its on-stack-
//   replacement code block after block: 20–31 ms instead of 4–12, in 10
//   runs of 14 (3 of 5 with every store after its loop run once before the
//   block was first optimised).
// - The result arrays are zero-filled when allocated (0.6–1.0 ms of the
//   public path on 10⁶ bars, though the pass writes every element), and
//   JavaScript has no unfilled Float64Array. Measured instead: new
//   Array(10⁶) keeps its elements in a dictionary, 70 ms to write; new
//   Float64Array(list) copies, 110 ms; one buffer of 2n for both arrays
//   fills as much, and would tie the two results to one ArrayBuffer (a
//   transfer to a worker would take both).
const BLOCK = PASS_BLOCK;
const cleanBar = isCleanBarBelowSums;
const cleanSums = summedBarsClean;
// Rain, loss, excess (mm) and peak excess rate (mm/h) of the bars so far.
let sumRain = 0;
let sumLoss = 0;
let sumExcess = 0;
let sumPeak = 0;
// Duration of the bars so far (h): the storm must lie within a record's longest span.
let sumSpan = 0;

/**
 * Constant loss rate (φ-index): each bar loses φ·Δt or its whole depth,
 * whichever is less. Chow, Maidment & Mays (1988) Applied Hydrology, §5.2.
 * Checks each bar as it reads it (isCleanBarBelowSums, then summedBarsClean
 * on the sums) and returns null when a bar is not clean, so computeLosses
 * validates and computes in one pass.
 */
export const computeConstantChecked: CheckedComputeFn<'constant'> = (
  durationsH,
  depthsMm,
  method,
  lossOut,
  excessOut,
) => {
  const phi = method.rateMmH;
  const n = depthsMm.length;
  const typed = durationsH instanceof Float64Array && depthsMm instanceof Float64Array;
  sumRain = 0;
  sumLoss = 0;
  sumExcess = 0;
  sumPeak = 0;
  sumSpan = 0;
  for (let start = 0; start < n; start += BLOCK) {
    const end = Math.min(n, start + BLOCK);
    const clean = typed
      ? constantBlockTyped(durationsH, depthsMm, phi, lossOut, excessOut, start, end)
      : constantBlockListed(durationsH, depthsMm, phi, lossOut, excessOut, start, end);
    if (!clean) return null;
  }
  // A bar's (x + |x|)/2 may have overflowed (see constantPassExact): every
  // bar again, exactly. First, so that the bars are right even when the
  // sums then send the caller to validate: a clean storm whose depths only
  // sum past the largest double keeps these arrays.
  const totals =
    sumExcess < Infinity
      ? { rainMm: sumRain, totalLossMm: sumLoss, totalExcessMm: sumExcess, peakExcessMmH: sumPeak }
      : constantPassExact(durationsH, depthsMm, phi, lossOut, excessOut);
  // A bar too long, an infinite depth, or the storm past a record's span:
  // computeLosses then validates and names the bar.
  return cleanSums(sumSpan, sumRain) ? totals : null;
};

/**
 * The constant-rate pass over clean bars with max(0, x) taken by Math.max.
 * The fast pass's (x + |x|)/2 is exact except where it overflows: x + |x| is
 * 2x, Infinity once x passes 8.99e307 (the core accepts any finite depth),
 * and x is −Infinity when φ·Δt passes the largest double (any finite rate is
 * accepted), where −Infinity + Infinity is NaN. Either makes the excess total
 * Infinity or NaN, so the fast pass tests that once, at its end, and hands
 * the storm here; a branch per bar costs about three times the pass on bars
 * that alternate about φ, so it is not taken on every storm.
 */
function constantPassExact(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  phi: number,
  lossOut: Float64Array,
  excessOut: Float64Array,
): BarTotals {
  let rain = 0;
  let loss = 0;
  let total = 0;
  let peak = 0;
  for (let k = 0; k < depthsMm.length; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    const excess = Math.max(p - phi * dt, 0);
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

/** The same pass over a clean storm, where every check holds. */
export const computeConstant: ComputeFn<'constant'> = (durationsH, depthsMm, method, lossOut, excessOut) =>
  computeConstantChecked(durationsH, depthsMm, method, lossOut, excessOut) ?? undefined;

function constantBlockTyped(
  durationsH: Float64Array,
  depthsMm: Float64Array,
  phi: number,
  lossOut: Float64Array,
  excessOut: Float64Array,
  start: number,
  end: number,
): boolean {
  let rain = sumRain;
  let loss = sumLoss;
  let total = sumExcess;
  // `+`: a number for the optimiser from the start. V8 peels the loop's first
  // bar, and a peak that bar leaves unchanged is still the module variable's
  // value, of no known type; the peak then stayed a tagged value, checked on
  // every bar and boxed in a fresh heap number each time it moved: 0.4 ms of
  // the 2.7 ms pass on 10⁶ bars.
  let peak = +sumPeak;
  let span = sumSpan;
  for (let k = start; k < end; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    if (!cleanBar(dt, p)) return false;
    span += dt;
    // max(0, x) as (x + |x|)/2: exact in floating point (x + |x| is 2x or
    // 0) except where it overflows (constantPassExact), and branch-free,
    // which matters on real storms where bars above and below φ alternate
    // unpredictably (about 3x faster than a branch or Math.max here).
    const x = p - phi * dt;
    const excess = 0.5 * (x + Math.abs(x));
    const l = p - excess;
    excessOut[k] = excess;
    lossOut[k] = l;
    // Totals in the same pass: one read of the storm instead of two.
    rain += p;
    loss += l;
    total += excess;
    // Compare by multiplication; divide only when the peak moves (rarely).
    if (excess > peak * dt) peak = excess / dt;
  }
  sumRain = rain;
  sumLoss = loss;
  sumExcess = total;
  sumPeak = peak;
  sumSpan = span;
  return true;
}

/** constantBlockTyped for plain arrays and other array-likes (see above). */
function constantBlockListed(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  phi: number,
  lossOut: Float64Array,
  excessOut: Float64Array,
  start: number,
  end: number,
): boolean {
  let rain = sumRain;
  let loss = sumLoss;
  let total = sumExcess;
  let peak = +sumPeak;
  let span = sumSpan;
  for (let k = start; k < end; k++) {
    const p = depthsMm[k] as number;
    const dt = durationsH[k] as number;
    if (!cleanBar(dt, p)) return false;
    span += dt;
    const x = p - phi * dt;
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
  return true;
}

/** Σ max(0, P − φΔt), the same expression as computeConstant, summed only. */
export const totalExcessConstant: TotalExcessFn<'constant'> = (durationsH, depthsMm, method) => {
  const n = depthsMm.length;
  let total = 0;
  for (let start = 0; start < n; start += BLOCK) {
    total = excessSum(durationsH, depthsMm, method.rateMmH, start, Math.min(n, start + BLOCK), total);
  }
  if (total < Infinity) return total;
  // A bar's (x + |x|)/2 overflowed (see constantPassExact): sum again with Math.max.
  total = 0;
  for (let k = 0; k < n; k++)
    total += Math.max((depthsMm[k] as number) - method.rateMmH * (durationsH[k] as number), 0);
  return total;
};

/** `total` plus the excess of bars start to end − 1 (clean bars), in blocks as above. */
function excessSum(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  phi: number,
  start: number,
  end: number,
  total: number,
): number {
  for (let k = start; k < end; k++) {
    const x = (depthsMm[k] as number) - phi * (durationsH[k] as number);
    total += 0.5 * (x + Math.abs(x));
  }
  return total;
}

export const constantSpec: MethodSpec<'constant'> = {
  kind: 'constant',
  label: 'Constant loss rate (φ-index)',
  summary: 'Every bar loses rain at one constant rate; rain above the rate becomes excess.',
  source: 'Chow, Maidment & Mays (1988) Applied Hydrology, section 5.2 (φ-index).',
  rateParam: 'rateMmH',
  params: [
    {
      key: 'rateMmH',
      label: 'Loss rate φ',
      unit: 'mm/h',
      min: 0,
      max: Infinity,
      step: 0.1,
      searchMax: peakRate,
      help: 'Constant loss rate; bars with a lower intensity lose all their rain.',
    },
  ],
  defaults: { kind: 'constant', rateMmH: 5 },
  dryBars: () => 'A dry bar loses nothing; the rate applies again in full to the next bar with rain.',
  compute: computeConstant,
  checkedCompute: computeConstantChecked,
  totalExcess: totalExcessConstant,
};
