/**
 * One SVG polyline for a cumulative curve through (edgesPx[0], y(0)) and
 * (edgesPx[k + 1], y(cumulative[k])) for every bar k: straight between bar
 * ends, which is exact for rainfall (uniform within its bar) and joins the
 * loss and excess at the bar ends where the core reports them.
 *
 * A point less than half a pixel to the right of the last one drawn is
 * skipped unless it is the last, so a storm of 10⁶ bars is a path of about
 * two points per pixel column; the curves only rise, so a skipped point lies
 * between its neighbours' heights and the line misses it by under a pixel
 * sideways, never in height at the points drawn.
 */
export function cumulativePath(
  edgesPx: ArrayLike<number>,
  cumulative: ArrayLike<number>,
  y: (value: number) => number,
): string {
  const n = cumulative.length;
  if (n === 0) return '';
  const r = (v: number): number => Math.round(v * 100) / 100;
  let lastX = edgesPx[0] as number;
  let d = `M${r(lastX)},${r(y(0))}`;
  for (let k = 0; k < n; k++) {
    const x = edgesPx[k + 1] as number;
    if (x - lastX < 0.5 && k < n - 1) continue;
    d += `L${r(x)},${r(y(cumulative[k] as number))}`;
    lastX = x;
  }
  return d;
}
