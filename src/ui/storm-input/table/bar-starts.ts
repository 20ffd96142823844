import type { Storm } from '../../../core';

/** Bars between two kept starts. */
const STRIDE = 1 << 12;

/**
 * Each bar's start, h from the storm start, for the rows in view: every
 * 4096th start is kept (as far as the rows asked for reach), and a bar's
 * start is summed on from the one kept before it, in barEdgesH's order, so
 * it is barEdgesH's value to the last bit. The table no longer writes a column of every start (8 MB for 10⁶
 * bars, most of its first draw of a long import, issue 11) to show a
 * screenful of rows.
 */
export function barStarts(storm: Storm): (k: number) => number {
  const d = storm.durationsH;
  // kept[b]: the start of bar b·STRIDE, summed as far as a row asked for (the first screenful needs one block).
  const kept = [0];
  return (k) => {
    const block = Math.floor(k / STRIDE);
    while (kept.length <= block) {
      const b = kept.length - 1;
      let sum = kept[b] as number;
      for (let j = b * STRIDE; j < (b + 1) * STRIDE; j++) sum += d[j] as number;
      kept.push(sum);
    }
    let start = kept[block] as number;
    for (let j = block * STRIDE; j < k; j++) start += d[j] as number;
    return start;
  };
}
