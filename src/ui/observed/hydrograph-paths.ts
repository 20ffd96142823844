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

/**
 * Builds a path from points in x order (either way), keeping at most four per
 * pixel column: the first, highest, lowest and last, in their order of
 * arrival. No object per point: a hydrograph redrawn on every drag frame
 * would otherwise leave thousands for the collector each frame.
 */
function thinner() {
  const parts: string[] = [];
  let col = Number.NaN;
  let count = 0;
  // The column's kept points: arrival number, x and y of the first, top (least y), bottom and last.
  let fN = -1;
  let fX = 0;
  let fY = 0;
  let tN = -1;
  let tX = 0;
  let tY = 0;
  let bN = -1;
  let bX = 0;
  let bY = 0;
  let lN = -1;
  let lX = 0;
  let lY = 0;
  const keptN = [0, 0, 0, 0];
  const keptX = [0, 0, 0, 0];
  const keptY = [0, 0, 0, 0];
  let k = 0;
  /** Adds a point to the column's kept ones in order of arrival, each once (a point may be first, top and last at once). */
  const keep = (n: number, x: number, y: number): void => {
    let i = k;
    for (let j = 0; j < k; j++) if (keptN[j] === n) return;
    while (i > 0 && (keptN[i - 1] as number) > n) {
      keptN[i] = keptN[i - 1] as number;
      keptX[i] = keptX[i - 1] as number;
      keptY[i] = keptY[i - 1] as number;
      i--;
    }
    keptN[i] = n;
    keptX[i] = x;
    keptY[i] = y;
    k++;
  };
  const flush = (): void => {
    if (fN < 0) return;
    k = 0;
    keep(fN, fX, fY);
    keep(tN, tX, tY);
    keep(bN, bX, bY);
    keep(lN, lX, lY);
    for (let i = 0; i < k; i++) {
      parts.push(
        `${parts.length === 0 ? 'M' : 'L'}${(keptX[i] as number).toFixed(1)},${(keptY[i] as number).toFixed(1)}`,
      );
    }
    fN = tN = bN = lN = -1;
  };
  return {
    add(x: number, y: number): void {
      const c = Math.round(x);
      if (c !== col) {
        flush();
        col = c;
      }
      const n = count++;
      if (fN < 0) {
        fN = tN = bN = n;
        fX = tX = bX = x;
        fY = tY = bY = y;
      } else {
        // Screen y grows downward.
        if (y < tY) {
          tN = n;
          tX = x;
          tY = y;
        }
        if (y > bY) {
          bN = n;
          bX = x;
          bY = y;
        }
      }
      lN = n;
      lX = x;
      lY = y;
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
