import { InputError } from './errors';
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
 * Throws an InputError naming the first bad bar or field. Runs once per call at
 * the core's edge, so the methods inside can assume clean data.
 */
export function validateStorm(storm: Storm): void {
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
  // Limits of time (one second to 500 years, time-limits.ts), read once: no call per bar in the loop.
  const shortest = SHORTEST_STEP_ACCEPTED_H;
  const longest = MAX_RECORD_H;
  let totalH = 0;
  for (let k = 0; k < n; k++) {
    const d = durationsH[k] as number;
    // `!(… && …)` is also true for NaN; typeof catches text that compares as a number.
    if (!(d >= shortest && d <= longest) || typeof d !== 'number') {
      throw new InputError('durationsH', stepProblem(`Bar ${k + 1}: duration`, d) ?? `Bar ${k + 1}: bad duration.`, k);
    }
    totalH += d;
    const p = depthsMm[k] as number;
    if (!(p >= 0) || p === Infinity || typeof p !== 'number') {
      throw new InputError(
        'depthsMm',
        `Bar ${k + 1}: rainfall depth must be a finite number of millimetres, zero or more (got ${String(p)}).`,
        k,
      );
    }
  }
  // The whole storm within a record's span; only when it is not, a second pass finds the bar that passes it.
  if (totalH > longest) {
    let endH = 0;
    let k = 0;
    while (k < n - 1 && endH + (durationsH[k] as number) <= longest) endH += durationsH[k++] as number;
    endH += durationsH[k] as number;
    throw new InputError(
      'durationsH',
      `Bar ${k + 1}: the storm would run ${describeOver(endH)} from its start; a record spans at most ${LONGEST_SPAN_TEXT}.`,
      k,
    );
  }
  const start = storm.startIso;
  if (start !== undefined) {
    if (typeof start !== 'string' || Number.isNaN(Date.parse(start))) {
      throw new InputError('startIso', `The storm start "${String(start)}" is not an ISO 8601 date-time.`);
    }
    const year = clockYearProblem('The storm start', start);
    if (year !== null) throw new InputError('startIso', year);
  }
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
