import { InputError } from '../errors';
import { validateStorm, type Storm } from '../storm';
import { alternatingPositions } from './alternation';
import { idfCovers, idfIntensityEvaluator, outsideTableMessage, validateIdf, type Idf } from './idf';
import { stepCount } from './steps';

export interface AlternatingBlockOptions {
  /** The IDF relation for the chosen return period. */
  readonly idf: Idf;
  /** Total storm duration, h. */
  readonly durationH: number;
  /** Time step (bar duration), h; must divide the duration. */
  readonly stepH: number;
  /** Where the peak block sits, as a fraction of the storm: 0 start, 0.5 centre (default), 1 end. */
  readonly peakFraction?: number;
  /** Optional start of the storm on the clock (ISO 8601). */
  readonly startIso?: string;
}

/**
 * Design hyetograph by the alternating block method (Chow, Maidment & Mays
 * 1988, Applied Hydrology, section 14.4). With step Δt and n = T/Δt bars:
 *
 * 1. From the IDF relation, the depth for each duration jΔt, j = 1..n:
 *    D_j = i(jΔt) · jΔt.
 * 2. The block depths are the increments D_j − D_(j−1) (D_0 = 0).
 * 3. The blocks are sorted largest first and placed by `alternatingPositions`:
 *    the largest at the peak, the rest alternately right and left of it.
 *
 * For the formula relations (concave, rising depth) the increments already
 * fall with j, so the j largest blocks are the first j increments and the
 * storm holds the IDF depth of every duration jΔt in j consecutive bars.
 * A table's log–log segments can make an increment larger than the one
 * before it (where the table's slope flattens); the blocks are still sorted,
 * as the method prescribes, and the total is still the IDF depth of T, but
 * the depth of such an intermediate duration is then exceeded, not matched.
 *
 * Throws InputError naming the field. A table is not extrapolated: the step
 * and the duration must both lie within its rows.
 */
export function alternatingBlockStorm(options: AlternatingBlockOptions): Storm {
  const { idf, durationH, stepH } = options;
  validateIdf(idf);
  const n = stepCount(durationH, stepH);
  const positions = alternatingPositions(n, options.peakFraction ?? 0.5);
  const barH = durationH / n;
  if (idf.kind === 'table') {
    if (!idfCovers(idf, barH)) throw new InputError('stepH', outsideTableMessage(idf, barH));
    if (!idfCovers(idf, durationH)) throw new InputError('durationH', outsideTableMessage(idf, durationH));
  }
  const intensityMmH = idfIntensityEvaluator(idf);

  const increments = new Float64Array(n);
  let previous = 0;
  for (let j = 1; j <= n; j++) {
    // j·T/n rather than a running sum, so the last duration is exactly T.
    const t = j === n ? durationH : (j * durationH) / n;
    const depth = intensityMmH(t) * t;
    // Validated relations have depth rising with duration, so a negative
    // increment can only be rounding where the depth is flat to ~1e-15
    // (c near 1, b near 0, long storms); it is a dry block, not negative rain.
    increments[j - 1] = depth > previous ? depth - previous : 0;
    previous = depth;
  }
  // Largest first; equal blocks keep duration order, so a formula's blocks
  // (already falling) are left exactly as computed.
  const ranked = Array.from({ length: n }, (_, k) => k).sort(
    (p, q) => (increments[q] as number) - (increments[p] as number) || p - q,
  );

  const depthsMm = new Float64Array(n);
  for (let r = 0; r < n; r++) depthsMm[positions[r] as number] = increments[ranked[r] as number] as number;
  const storm: Storm = {
    durationsH: new Float64Array(n).fill(barH),
    depthsMm,
    ...(options.startIso !== undefined ? { startIso: options.startIso } : {}),
  };
  validateStorm(storm);
  return storm;
}
