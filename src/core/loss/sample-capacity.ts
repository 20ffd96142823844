/**
 * Reads a method's state at given times by running its own bar step: up to
 * the bar that holds a time, then over the part of that bar before it (rain
 * at the bar's intensity). The methods give the same state however a bar is
 * cut, so this is the state at that moment, from the same code that gives
 * the losses. Not on a hot path: one copy of the state per time asked for.
 */
export function sampleCapacity<S>(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  timesH: ArrayLike<number>,
  out: Float64Array,
  start: S,
  copy: (state: S) => S,
  bar: (state: S, depthMm: number, durationH: number) => unknown,
  rate: (state: S) => number,
): void {
  const n = depthsMm.length;
  const state = copy(start);
  let j = 0; // bar holding the current time
  let barStart = 0; // its start, h
  for (let q = 0; q < timesH.length; q++) {
    const t = timesH[q] as number;
    // Whole bars that end at or before t.
    while (j < n && barStart + (durationsH[j] as number) <= t) {
      bar(state, depthsMm[j] as number, durationsH[j] as number);
      barStart += durationsH[j] as number;
      j++;
    }
    const into = t - barStart;
    if (j < n && into > 0) {
      const part = copy(state);
      const dt = durationsH[j] as number;
      bar(part, ((depthsMm[j] as number) * into) / dt, into);
      out[q] = rate(part);
    } else {
      out[q] = rate(state);
    }
  }
}
