import { InputError } from '../errors';

/**
 * Where the alternating block method puts each block, largest first.
 *
 * Chow, Maidment & Mays (1988) Applied Hydrology, section 14.4: the largest
 * block goes at the centre of the storm and the rest, in descending order,
 * alternately to its right and to its left. We keep that rule and let the
 * user move the peak:
 *
 * - The peak bar is the one whose middle lies closest to
 *   `peakFraction × duration`; on a tie (an even number of bars with the
 *   peak at 0.5) the earlier bar. With 12 bars and 0.5 the peak is bar 6 and
 *   the second block bar 7, so the two largest straddle the storm's middle.
 * - The next blocks alternate right, left, right, … of the blocks already
 *   placed. When one side reaches the storm's start or end, the remaining
 *   blocks continue, still in descending order, on the other side. So 0
 *   gives a storm that starts at its peak and falls away, 1 one that rises
 *   to its peak at the end.
 *
 * Either way the blocks placed so far always form one unbroken run, so the
 * j largest blocks are j consecutive bars: each duration's IDF depth sits
 * inside the storm, wherever the peak is.
 *
 * Returns `positions` with positions[r] = bar index of the r-th largest block
 * (r = 0 the peak). Throws InputError('peakFraction') outside 0..1.
 */
export function alternatingPositions(barCount: number, peakFraction = 0.5): Int32Array {
  if (typeof peakFraction !== 'number' || !Number.isFinite(peakFraction) || peakFraction < 0 || peakFraction > 1) {
    throw new InputError(
      'peakFraction',
      `The peak position must be a fraction of the storm from 0 (start) to 1 (end) (got ${String(peakFraction)}).`,
    );
  }
  const n = barCount;
  const positions = new Int32Array(n);
  if (n === 0) return positions;
  // Middle of bar k is at (k + ½)/n of the storm; nearest to f, ties to the
  // earlier bar: k = ⌈f·n − 1⌉. The 1e-9 absorbs rounding in f·n (0.3 × 10).
  let peak = Math.ceil(peakFraction * n - 1 - 1e-9);
  if (peak < 0) peak = 0;
  if (peak > n - 1) peak = n - 1;
  positions[0] = peak;
  let left = peak - 1;
  let right = peak + 1;
  for (let r = 1; r < n; r++) {
    const goRight = right < n && (left < 0 || r % 2 === 1);
    positions[r] = goRight ? right++ : left--;
  }
  return positions;
}
