import { InputError } from '../errors';

/** Index of the highest discharge; the first one when the peak repeats. */
export function findPeakIndex(dischargeM3s: ArrayLike<number>): number {
  let best = 0;
  let peak = dischargeM3s[0] as number;
  for (let k = 1; k < dischargeM3s.length; k++) {
    const q = dischargeM3s[k] as number;
    if (q > peak) {
      peak = q;
      best = k;
    }
  }
  return best;
}

/**
 * Start of rise: the lowest discharge at or before the peak, the last one when
 * the lowest value repeats (a flat pre-event baseflow rises from its end).
 * Taking the lowest point rather than the last local minimum keeps a small
 * wiggle on the rising limb from being mistaken for the start of rise.
 */
export function findStartOfRise(dischargeM3s: ArrayLike<number>, peakIndex: number): number {
  let best = 0;
  let low = dischargeM3s[0] as number;
  for (let k = 1; k <= peakIndex; k++) {
    const q = dischargeM3s[k] as number;
    if (q <= low) {
      low = q;
      best = k;
    }
  }
  return best;
}

/**
 * The start of rise a line method uses: the given sample index, checked
 * against the record, or the one found by `findStartOfRise`.
 */
export function resolveRiseIndex(
  dischargeM3s: ArrayLike<number>,
  riseIndex: number | undefined,
  peakIndex: number,
): number {
  if (riseIndex === undefined) return findStartOfRise(dischargeM3s, peakIndex);
  const n = dischargeM3s.length;
  if (riseIndex > n - 1) {
    throw new InputError(
      'riseIndex',
      `The start of rise, sample ${riseIndex + 1}, is past the last sample of the record (${n}).`,
      riseIndex,
    );
  }
  return riseIndex;
}
