import { InputError } from './errors';
import { readIsoDateTime } from './wall-clock';
import {
  LONGEST_SPAN_TEXT,
  MAX_RECORD_H,
  clockYearProblem,
  describeOver,
  SHORTEST_STEP_ACCEPTED_H,
  stepProblem,
} from './time-limits';

/**
 * A storm: an ordered list of bars, each with a duration (h, > 0) and a
 * rainfall depth (mm, ≥ 0). Intensity of a bar = depth / duration.
 * `startIso` optionally places the storm on a clock (ISO 8601 date-time).
 */
export interface Storm {
  readonly durationsH: ArrayLike<number>;
  readonly depthsMm: ArrayLike<number>;
  readonly startIso?: string;
}

/**
 * Whether one bar is clean: its duration and its depth pass the rules below.
 * The one statement of them: validateStorm throws where it fails, and the
 * fused passes (computeLosses) test it as they read each bar, so the two
 * cannot disagree. Small enough for the optimiser to inline.
 */
export function isCleanBar(durationH: unknown, depthMm: unknown): boolean {
  return isCleanDuration(durationH) && isCleanDepth(depthMm);
}

// Limits of time (one second to 500 years, time-limits.ts) as module constants:
// read without a call per bar.
const SHORTEST_H = SHORTEST_STEP_ACCEPTED_H;
const LONGEST_H = MAX_RECORD_H;

/**
 * The half of isCleanBar that a pass summing both columns must test bar by
 * bar: a number of hours of at least a second, a number of millimetres not
 * below zero (NaN fails both comparisons). The other half follows from the
 * sums (summedBarsClean), so such a pass makes two comparisons a bar instead
 * of four (a quarter of the constant-rate pass's time on 10⁶ bars).
 */
export function isCleanBarBelowSums(durationH: unknown, depthMm: unknown): boolean {
  return typeof durationH === 'number' && durationH >= SHORTEST_H && typeof depthMm === 'number' && depthMm >= 0;
}

/**
 * Whether bars that all passed isCleanBarBelowSums are clean, given their
 * durations' sum (h) and depths' sum (mm), each added bar after bar. Sums of
 * numbers not below zero never fall as terms are added, in floating point as
 * in exact arithmetic, so a span within a record's longest bounds every
 * duration by it, and a finite depth sum leaves no depth infinite. (Finite
 * depths can sum past the largest double: then this says no, and the caller
 * checks bar by bar, which accepts them.)
 */
export function summedBarsClean(spanH: number, depthMm: number): boolean {
  return spanH <= LONGEST_H && depthMm < Infinity;
}

/** A bar lasts from one second to a record's longest span (time-limits.ts). */
function isCleanDuration(durationH: unknown): boolean {
  return typeof durationH === 'number' && durationH >= SHORTEST_H && durationH <= LONGEST_H;
}

/** A bar's depth is a finite number of millimetres, zero or more. */
function isCleanDepth(depthMm: unknown): boolean {
  return typeof depthMm === 'number' && depthMm >= 0 && depthMm < Infinity;
}

/**
 * How many bars a long pass reads per call of its inner loop. A loop over
 * 10⁶ bars run once per call is optimised only mid-loop and the function can
 * stay in V8's baseline tier (2–3 times slower); in blocks the inner function
 * is called often enough to be optimised whole.
 */
export const PASS_BLOCK = 4096;

/**
 * Throws an InputError naming the first bad bar or field. Runs once per call at
 * the core's edge, so the methods inside can assume clean data.
 */
export function validateStorm(storm: Storm): void {
  validateStormDepthMm(storm);
}

/**
 * validateStorm that also returns the storm's total depth, mm, summed in the
 * same pass over the bars (calibration needs both: one read of a long storm
 * instead of two).
 */
export function validateStormDepthMm(storm: Storm): number {
  validateStormLists(storm);
  const { durationsH, depthsMm } = storm;
  const n = durationsH.length;
  let total = 0;
  spanH = 0;
  for (let start = 0; start < n && total >= 0; start += PASS_BLOCK) {
    total = cleanDepthSum(durationsH, depthsMm, start, Math.min(n, start + PASS_BLOCK), total);
  }
  // A bar failed the comparisons, or the sums say one is too long or infinite:
  // find the first bar isCleanBar refuses, from the start (an infinite depth
  // may lie before the bar that stopped the loop). None when finite depths
  // only summed past the largest double, or the bars are clean and the storm
  // too long; validateStormSpan says which bar passes the span.
  if (!(total >= 0 && summedBarsClean(spanH, total))) {
    const k = firstUncleanBar(durationsH, depthsMm);
    if (k < n) throw barError(k, durationsH[k], depthsMm[k]);
  }
  validateStormSpan(storm, spanH);
  validateStormStart(storm);
  return total;
}

/** The storm's span so far, h, summed by cleanDepthSum (a module variable: see loss/constant.ts). */
let spanH = 0;

/**
 * The check validateStorm makes after every bar: the whole storm lies within a
 * record's longest span, given its total duration (h) summed in the same pass.
 * Only when it does not, a second pass finds the bar that passes the limit.
 */
export function validateStormSpan(storm: Storm, totalH: number): void {
  if (totalH <= LONGEST_H) return;
  const { durationsH } = storm;
  const n = durationsH.length;
  let endH = 0;
  let k = 0;
  while (k < n - 1 && endH + (durationsH[k] as number) <= LONGEST_H) endH += durationsH[k++] as number;
  endH += durationsH[k] as number;
  throw new InputError(
    'durationsH',
    `Bar ${k + 1}: the storm would run ${describeOver(endH)} from its start; a record spans at most ${LONGEST_SPAN_TEXT}.`,
    k,
  );
}

/**
 * `total` plus the depths of bars start to end − 1, or −1 if one of them fails
 * isCleanBarBelowSums (the sums settle the rest: summedBarsClean).
 */
function cleanDepthSum(
  durationsH: ArrayLike<unknown>,
  depthsMm: ArrayLike<unknown>,
  start: number,
  end: number,
  total: number,
): number {
  let span = spanH;
  for (let k = start; k < end; k++) {
    const p = depthsMm[k];
    const d = durationsH[k];
    if (!isCleanBarBelowSums(d, p)) return -1;
    total += p as number;
    span += d as number;
  }
  spanH = span;
  return total;
}

/** The index of the first bar isCleanBar refuses, or the number of bars when all are clean. */
function firstUncleanBar(durationsH: ArrayLike<unknown>, depthsMm: ArrayLike<unknown>): number {
  const n = durationsH.length;
  let k = 0;
  while (k < n && isCleanBar(durationsH[k], depthsMm[k])) k++;
  return k;
}

/**
 * The checks validateStorm makes before it reads any bar: both lists are
 * there and match one to one. Throws an InputError naming the field.
 */
export function validateStormLists(storm: Storm): void {
  const { durationsH, depthsMm } = storm;
  if (!durationsH || typeof durationsH.length !== 'number') {
    throw new InputError('durationsH', 'The storm has no list of bar durations (durationsH).');
  }
  if (!depthsMm || typeof depthsMm.length !== 'number') {
    throw new InputError('depthsMm', 'The storm has no list of bar depths (depthsMm).');
  }
  const n = durationsH.length;
  if (depthsMm.length !== n) {
    throw new InputError(
      'depthsMm',
      `The storm has ${n} bar durations but ${depthsMm.length} bar depths; they must match one to one.`,
    );
  }
}

/** The check validateStorm makes after every bar: the start, when given, is a date-time within the years held. */
export function validateStormStart(storm: Storm): void {
  const start = storm.startIso;
  if (start === undefined) return;
  const read = typeof start === 'string' ? readIsoDateTime(start) : null;
  if (read === null || !read.hasTime) {
    throw new InputError('startIso', `The storm start "${String(start)}" is not an ISO 8601 date-time.`);
  }
  const year = clockYearProblem('The storm start', start);
  if (year !== null) throw new InputError('startIso', year);
}

/** The error for bar k, which isCleanBar refused: the duration if it is bad, else the depth. */
function barError(k: number, d: unknown, p: unknown): InputError {
  if (!isCleanDuration(d)) {
    return new InputError(
      'durationsH',
      stepProblem(`Bar ${k + 1}: duration`, d as number) ?? `Bar ${k + 1}: bad duration (got ${String(d)}).`,
      k,
    );
  }
  return new InputError(
    'depthsMm',
    `Bar ${k + 1}: rainfall depth must be a finite number of millimetres, zero or more (got ${String(p)}).`,
    k,
  );
}

/** Total rainfall depth, mm. */
export function totalDepthMm(storm: Storm): number {
  const p = storm.depthsMm;
  let sum = 0;
  for (let k = 0; k < p.length; k++) sum += p[k] as number;
  return sum;
}

/** Total storm duration, h. */
export function totalDurationH(storm: Storm): number {
  const d = storm.durationsH;
  let sum = 0;
  for (let k = 0; k < d.length; k++) sum += d[k] as number;
  return sum;
}

/** Highest bar intensity, mm/h (0 for a dry or empty storm). */
export function peakIntensityMmH(storm: Storm): number {
  const { durationsH: d, depthsMm: p } = storm;
  let peak = 0;
  for (let k = 0; k < p.length; k++) {
    const i = (p[k] as number) / (d[k] as number);
    if (i > peak) peak = i;
  }
  return peak;
}

/** Bar start times from the storm start, h (length n + 1: the last is the end). */
export function barEdgesH(storm: Storm): Float64Array {
  const d = storm.durationsH;
  const edges = new Float64Array(d.length + 1);
  for (let k = 0; k < d.length; k++) edges[k + 1] = (edges[k] as number) + (d[k] as number);
  return edges;
}
