/**
 * Reads a method's state at given times by running its own bar loop: over
 * the whole bars before a time, then over the part of the bar that holds it
 * (rain at that bar's intensity), on a copy. The methods give the same state
 * however a bar is cut, so this is the state at that moment, from the same
 * code that gives the losses. Not on a hot path: one copy of the state per
 * time asked for, and each bar run once.
 */
export function sampleCapacity<S>(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  timesH: ArrayLike<number>,
  out: Float64Array,
  start: S,
  copy: (state: S) => S,
  /** Runs bars `from` to `to` of the given lists from `state`, updating it. */
  run: (state: S, durationsH: ArrayLike<number>, depthsMm: ArrayLike<number>, from: number, to: number) => void,
  rate: (state: S) => number,
): void {
  const n = depthsMm.length;
  const state = copy(start);
  const partDuration = new Float64Array(1);
  const partDepth = new Float64Array(1);
  let j = 0; // first bar not yet run into `state`
  let barStart = 0; // its start, h
  for (let q = 0; q < timesH.length; q++) {
    const t = timesH[q] as number;
    // Whole bars that end at or before t.
    let to = j;
    let end = barStart;
    while (to < n && end + (durationsH[to] as number) <= t) end += durationsH[to++] as number;
    if (to > j) {
      run(state, durationsH, depthsMm, j, to);
      j = to;
      barStart = end;
    }
    const into = t - barStart;
    if (j < n && into > 0) {
      const part = copy(state);
      partDuration[0] = into;
      partDepth[0] = ((depthsMm[j] as number) * into) / (durationsH[j] as number);
      run(part, partDuration, partDepth, 0, 1);
      out[q] = rate(part);
    } else {
      out[q] = rate(state);
    }
  }
}
