/**
 * Reflected padding for the recursive filters' warm-up: the first `count`
 * samples after the first are mirrored in front of it (and, with `atEnd`, the
 * last `count` before the last are mirrored after it), times reflected about
 * the end sample, t₋ⱼ = 2t₀ − tⱼ, so the steps keep their lengths. The filter
 * runs over the padded series and only the record's own samples are kept, so
 * its start-up guess (all baseflow at the first sample) is made on the mirror
 * and has faded by the time the record begins. Reflecting 30 values at each
 * end is the warm-up of the standard approach to the Lyne–Hollick filter of
 * Ladson, Brown, Neal & Nathan (2013), Australian Journal of Water Resources
 * 17(1) (from memory). The end sample itself is not repeated; `count` is
 * capped at n − 1, all the record can mirror.
 */
export interface Padded {
  readonly timesH: Float64Array;
  readonly values: Float64Array;
  /** Index in the padded series of the record's first sample. */
  readonly offset: number;
}

export function reflectPad(
  timesH: ArrayLike<number>,
  values: ArrayLike<number>,
  count: number,
  atEnd: boolean,
): Padded {
  const n = values.length;
  const m = Math.min(Math.max(0, Math.floor(count)), n - 1);
  const tail = atEnd ? m : 0;
  const total = n + m + tail;
  const t = new Float64Array(total);
  const v = new Float64Array(total);
  const t0 = timesH[0] as number;
  for (let j = m; j >= 1; j--) {
    t[m - j] = 2 * t0 - (timesH[j] as number);
    v[m - j] = values[j] as number;
  }
  for (let k = 0; k < n; k++) {
    t[m + k] = timesH[k] as number;
    v[m + k] = values[k] as number;
  }
  const tn = timesH[n - 1] as number;
  for (let j = 1; j <= tail; j++) {
    t[m + n - 1 + j] = 2 * tn - (timesH[n - 1 - j] as number);
    v[m + n - 1 + j] = values[n - 1 - j] as number;
  }
  return { timesH: t, values: v, offset: m };
}
