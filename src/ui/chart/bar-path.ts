/**
 * One SVG path for a whole layer of bars, so a record of 100,000 bars is one
 * element, not 100,000. Bars narrower than a pixel share their pixel column,
 * drawn to the tallest of them: what the screen would show if each were drawn,
 * at a fraction of the cost. Wide bars keep a hairline gap between them.
 *
 * `edgesPx` are the bar edges in pixels (length n + 1, increasing); `topPx`
 * the top of each bar in pixels (its value through the y scale); `basePx` the
 * baseline. A bar whose top is at or below the baseline draws nothing.
 */
export function barsPath(edgesPx: ArrayLike<number>, topPx: ArrayLike<number>, basePx: number): string {
  const n = topPx.length;
  const path = barsPathWriter(basePx);
  for (let k = 0; k < n; k++) path.bar(edgesPx[k] as number, edgesPx[k + 1] as number, topPx[k] as number);
  return path.end();
}

/**
 * barsPath one bar at a time, for a caller that works out each bar's pixels
 * as it goes (no column of 10⁶ edges or tops made first): `bar` in order of
 * increasing x, then `end` for the path.
 */
export function barsPathWriter(basePx: number): {
  bar: (x0: number, x1: number, top: number) => void;
  end: () => string;
} {
  const parts: string[] = [];
  const r = (v: number): number => Math.round(v * 100) / 100;
  const rect = (x0: number, x1: number, top: number): void => {
    if (top < basePx) parts.push(`M${r(x0)},${r(basePx)}V${r(top)}H${r(x1)}V${r(basePx)}Z`);
  };
  // The pixel column being merged: its left edge, right edge and highest top.
  let column = NaN;
  let columnEnd = 0;
  let columnTop = basePx;
  const flush = (): void => {
    if (!Number.isNaN(column)) rect(column, Math.max(column + 1, columnEnd), columnTop);
    column = NaN;
    columnTop = basePx;
  };
  const bar = (x0: number, x1: number, top: number): void => {
    if (x1 - x0 >= 1) {
      flush();
      const gap = x1 - x0 >= 6 ? 1 : 0;
      rect(x0, x1 - gap, top);
      return;
    }
    const c = Math.floor(x0);
    if (c !== column) {
      flush();
      column = c;
      columnEnd = x1;
    } else if (x1 > columnEnd) columnEnd = x1;
    if (top < columnTop) columnTop = top;
  };
  return {
    bar,
    end: () => {
      flush();
      return parts.join('');
    },
  };
}
