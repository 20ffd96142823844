/**
 * SVG paths for the hydrograph, from the core's numbers only: the record,
 * the core's baseflow at each sample, its direct-runoff window (start of rise
 * to end time) and the discharge at the end time. Nothing here computes
 * hydrology; it places points.
 *
 * Long records are thinned per pixel column: the first, lowest, highest and
 * last point of each column are kept, which draws what the full record would
 * draw at a fraction of the points.
 */
export interface Px {
  (value: number): number;
}

interface Point {
  readonly x: number;
  readonly y: number;
  /** Order of arrival within the column. */
  readonly n: number;
}

/** Builds a path from points in x order (either way), keeping at most four per pixel column. */
function thinner() {
  const parts: string[] = [];
  let col = Number.NaN;
  let count = 0;
  let first: Point | null = null;
  let top: Point | null = null;
  let bottom: Point | null = null;
  let last: Point | null = null;
  const flush = (): void => {
    const kept = [first, top, bottom, last]
      .filter((p): p is Point => p !== null)
      .sort((a, b) => a.n - b.n)
      .filter((p, i, all) => i === 0 || p.n !== (all[i - 1] as Point).n);
    for (const p of kept) parts.push(`${parts.length === 0 ? 'M' : 'L'}${p.x.toFixed(1)},${p.y.toFixed(1)}`);
    first = top = bottom = last = null;
  };
  return {
    add(x: number, y: number): void {
      const c = Math.round(x);
      if (c !== col) {
        flush();
        col = c;
      }
      const p: Point = { x, y, n: count++ };
      if (!first) first = p;
      // Screen y grows downward.
      if (!top || y < top.y) top = p;
      if (!bottom || y > bottom.y) bottom = p;
      last = p;
    },
    end(): string {
      flush();
      return parts.join('');
    },
  };
}

/** The line through (times[k] + offset, values[k]) for every sample. */
export function seriesPath(
  timesH: ArrayLike<number>,
  values: ArrayLike<number>,
  offsetH: number,
  x: Px,
  y: Px,
): string {
  const t = thinner();
  for (let k = 0; k < timesH.length; k++) t.add(x((timesH[k] as number) + offsetH), y(values[k] as number));
  return t.end();
}

export interface Window {
  /** First sample of the direct runoff (the start of rise). */
  readonly startIndex: number;
  /** End of the direct runoff, h after the first sample (may fall between samples). */
  readonly endTimeH: number;
  /** Discharge at the end time, m³/s (the core's dischargeAtH). */
  readonly endM3s: number;
}

/** Samples inside the window: from startIndex to the last sample at or before the end time. */
function lastInside(timesH: ArrayLike<number>, w: Window): number {
  let k = w.startIndex;
  while (k + 1 < timesH.length && (timesH[k + 1] as number) <= w.endTimeH) k++;
  return k;
}

/** The separation line inside the direct-runoff window, ending on the hydrograph at the end time. */
export function baseflowPath(
  timesH: ArrayLike<number>,
  baseflowM3s: ArrayLike<number>,
  w: Window,
  offsetH: number,
  x: Px,
  y: Px,
): string {
  const t = thinner();
  const last = lastInside(timesH, w);
  for (let k = w.startIndex; k <= last; k++) t.add(x((timesH[k] as number) + offsetH), y(baseflowM3s[k] as number));
  if (w.endTimeH > (timesH[last] as number)) t.add(x(w.endTimeH + offsetH), y(w.endM3s));
  return t.end();
}

/**
 * The direct runoff: the area between the hydrograph (top, forward) and the
 * baseflow (bottom, back) over the window, closed at the end point, where
 * the two meet.
 */
export function directRunoffPath(
  timesH: ArrayLike<number>,
  dischargeM3s: ArrayLike<number>,
  baseflowM3s: ArrayLike<number>,
  w: Window,
  offsetH: number,
  x: Px,
  y: Px,
): string {
  const last = lastInside(timesH, w);
  const partial = w.endTimeH > (timesH[last] as number);
  const top = thinner();
  for (let k = w.startIndex; k <= last; k++) top.add(x((timesH[k] as number) + offsetH), y(dischargeM3s[k] as number));
  if (partial) top.add(x(w.endTimeH + offsetH), y(w.endM3s));
  const bottom = thinner();
  for (let k = last; k >= w.startIndex; k--)
    bottom.add(x((timesH[k] as number) + offsetH), y(baseflowM3s[k] as number));
  const upper = top.end();
  const lower = bottom.end();
  if (upper === '' || lower === '') return '';
  return `${upper}L${lower.slice(1)}Z`;
}
