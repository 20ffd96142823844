import type { Storm } from '../../core';

/**
 * A long record reduced to what one pixel column can show: for each of
 * `count` equal slices of the record's time, the rain that fell in it and
 * the highest bar intensity inside it. Drawing one mark per column instead
 * of one per bar keeps the first draw of a 10⁶-bar record within a frame's
 * budget, and the highest intensity keeps a short burst visible however
 * many bars share its column.
 */
export interface RecordColumns {
  /** Hours of the record (the sum of its bar durations). */
  readonly spanH: number;
  /** Rain in each column, mm (a bar across a column edge is shared in proportion to time). */
  readonly depthMm: Float64Array;
  /** Highest intensity of a bar touching each column, mm/h (0 where dry). */
  readonly peakMmH: Float64Array;
  /** Highest value of `peakMmH`, mm/h. */
  readonly maxPeakMmH: number;
}

/**
 * The record in `count` columns, in one pass over the bars. A bar that spans
 * several columns lends its intensity to each and shares its depth among
 * them by time, so the column depths add up to the record's.
 */
export function recordColumns(storm: Storm, count: number): RecordColumns {
  const n = Math.max(1, Math.floor(count));
  const { durationsH: d, depthsMm: p } = storm;
  const bars = p.length;
  let spanH = 0;
  for (let k = 0; k < bars; k++) spanH += d[k] as number;
  const depthMm = new Float64Array(n);
  const peakMmH = new Float64Array(n);
  if (!(spanH > 0)) return { spanH: 0, depthMm, peakMmH, maxPeakMmH: 0 };
  const perH = n / spanH;
  let maxPeak = 0;
  let t = 0;
  for (let k = 0; k < bars; k++) {
    const dk = d[k] as number;
    const pk = p[k] as number;
    const from = t * perH;
    t += dk;
    if (pk <= 0) continue;
    const to = t * perH;
    const rate = pk / dk;
    if (rate > maxPeak) maxPeak = rate;
    let c = Math.min(n - 1, Math.floor(from));
    const last = Math.min(n - 1, Math.max(c, Math.ceil(to) - 1));
    if (c === last) {
      depthMm[c] = (depthMm[c] as number) + pk;
      if (rate > (peakMmH[c] as number)) peakMmH[c] = rate;
      continue;
    }
    // A bar across column edges: each column takes the rain of its share of the bar's time.
    const perColumn = pk / (to - from);
    for (; c <= last; c++) {
      const share = Math.min(to, c + 1) - Math.max(from, c);
      depthMm[c] = (depthMm[c] as number) + share * perColumn;
      if (rate > (peakMmH[c] as number)) peakMmH[c] = rate;
    }
  }
  return { spanH, depthMm, peakMmH, maxPeakMmH: maxPeak };
}

/**
 * One SVG path for the columns: a bar per wet column from the baseline
 * `bottom` up to its peak intensity on the `yOf` scale, `width` px wide
 * starting at `left`. One string, however long the record.
 */
export function columnsPath(
  columns: RecordColumns,
  left: number,
  width: number,
  bottom: number,
  yOf: (mmH: number) => number,
): string {
  const { peakMmH } = columns;
  const n = peakMmH.length;
  const w = width / n;
  const parts: string[] = [];
  for (let c = 0; c < n; c++) {
    const v = peakMmH[c] as number;
    if (v <= 0) continue;
    const x = left + c * w;
    // At least a pixel tall, so a drizzle column is not lost.
    const y = Math.min(bottom - 1, yOf(v));
    parts.push(`M${x.toFixed(1)},${bottom}V${y.toFixed(1)}h${w.toFixed(2)}V${bottom}Z`);
  }
  return parts.join('');
}
