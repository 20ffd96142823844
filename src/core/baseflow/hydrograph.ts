import { InputError } from '../errors';
import {
  LONGEST_SPAN_TEXT,
  MAX_RECORD_H,
  MAX_RECORD_YEARS,
  describeHours,
  describeOver,
  SHORTEST_STEP_ACCEPTED_H,
} from '../time-limits';
import type { Hydrograph } from './types';

/**
 * Throws an InputError naming the first bad sample (0-based `index`, shown
 * 1-based in the message) and its field. Runs once per call at the core's edge
 * so the methods can assume clean data: at least two samples (a volume needs
 * one step), finite strictly increasing times at least a second apart and
 * spanning at most 500 years (core/time-limits.ts), finite discharge ≥ 0.
 */
export function validateHydrograph(hydrograph: Hydrograph): void {
  if (!hydrograph || typeof hydrograph !== 'object') {
    throw new InputError('hydrograph', 'No streamflow record was given.');
  }
  const { timesH, dischargeM3s } = hydrograph;
  if (!timesH || typeof timesH.length !== 'number') {
    throw new InputError('timesH', 'The streamflow record has no list of sample times (timesH).');
  }
  if (!dischargeM3s || typeof dischargeM3s.length !== 'number') {
    throw new InputError('dischargeM3s', 'The streamflow record has no list of discharges (dischargeM3s).');
  }
  const n = timesH.length;
  if (dischargeM3s.length !== n) {
    throw new InputError(
      'dischargeM3s',
      `The streamflow record has ${n} sample times but ${dischargeM3s.length} discharges; they must match one to one.`,
    );
  }
  if (n < 2) {
    throw new InputError('timesH', `The streamflow record needs at least two samples to hold a volume (got ${n}).`);
  }
  // Limits of time (a record spans at most 500 years, samples at least a second apart, time-limits.ts),
  // read once: no call per sample in the loop.
  const shortest = SHORTEST_STEP_ACCEPTED_H;
  const longest = MAX_RECORD_H;
  const first = timesH[0] as number;
  for (let k = 0; k < n; k++) {
    const t = timesH[k] as number;
    if (typeof t !== 'number' || !Number.isFinite(t)) {
      throw new InputError('timesH', `Sample ${k + 1}: time must be a finite number of hours (got ${String(t)}).`, k);
    }
    if (!(t <= longest && t >= -longest)) {
      throw new InputError(
        'timesH',
        `Sample ${k + 1}: time ${describeHours(t)} is further from the first sample than a record spans (at most ${MAX_RECORD_YEARS} years).`,
        k,
      );
    }
    if (k > 0) {
      const before = timesH[k - 1] as number;
      if (!(t > before)) {
        throw new InputError(
          'timesH',
          `Sample ${k + 1}: time ${t} h must be later than the time of sample ${k} (${before} h); times must strictly increase.`,
          k,
        );
      }
      if (t - before < shortest) {
        throw new InputError(
          'timesH',
          `Sample ${k + 1}: it comes ${describeHours(t - before)} after sample ${k}; samples are at least 1 second apart.`,
          k,
        );
      }
      if (t - first > longest) {
        throw new InputError(
          'timesH',
          `Sample ${k + 1}: the record would run ${describeOver(t - first)} from its first sample; a record spans at most ${LONGEST_SPAN_TEXT}.`,
          k,
        );
      }
    }
    const q = dischargeM3s[k] as number;
    // `!(q >= 0)` also catches NaN; the second test catches +Infinity.
    if (typeof q !== 'number' || !(q >= 0) || q === Infinity) {
      throw new InputError(
        'dischargeM3s',
        `Sample ${k + 1}: discharge must be a finite number of m³/s, zero or more (got ${String(q)}).`,
        k,
      );
    }
  }
}

/**
 * Discharge at time `tH`, m³/s, by linear interpolation between samples (the
 * same shape the trapezoidal rule integrates). `tH` must lie within the record.
 */
export function dischargeAtH(timesH: ArrayLike<number>, dischargeM3s: ArrayLike<number>, tH: number): number {
  const n = timesH.length;
  // Binary search for the last sample at or before tH.
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if ((timesH[mid] as number) <= tH) lo = mid;
    else hi = mid;
  }
  const t0 = timesH[lo] as number;
  const t1 = timesH[hi] as number;
  const q0 = dischargeM3s[lo] as number;
  const q1 = dischargeM3s[hi] as number;
  if (tH <= t0) return q0;
  if (tH >= t1) return q1;
  return q0 + ((q1 - q0) * (tH - t0)) / (t1 - t0);
}
