import { scaleLinear } from 'd3-scale';
import type { Storm } from '../../../core';
import { barsPathWriter } from '../../chart/bar-path';
import { linearMap } from '../../chart/linear-px';
import { SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH } from '../../import-kit';
/**
 * The sketch's path in one pass over the bars: each bar's edges and top in
 * pixels worked out as it is reached and merged per pixel column at once
 * (barsPathWriter), with no column of 10⁶ edges, intensities or pixels made
 * first (those passes held the page for over 100 ms when a 10⁶-line file was
 * read, issue 11). The arithmetic is mapLinear's over barEdgesH's running
 * sum, so the path is the one barsPath gives on those columns.
 */
export function sketchPath(storm: Storm, totalH: number, peak: number): string {
  const x = scaleLinear()
    .domain([0, totalH || 1])
    .range([SKETCH_PAD.left, SKETCH_WIDTH - SKETCH_PAD.right]);
  const y = scaleLinear()
    .domain([0, peak > 0 ? peak : 1])
    .range([SKETCH_HEIGHT - SKETCH_PAD.bottom, SKETCH_PAD.top]);
  const xm = linearMap(x);
  const ym = linearMap(y);
  const px = (m: typeof xm, scale: typeof x, v: number): number => {
    if (m === null) return scale(v) ?? NaN;
    const t = (v - m.d0) / m.span;
    return m.r0 * (1 - t) + m.r1 * t;
  };
  const { durationsH, depthsMm } = storm;
  const n = depthsMm.length;
  const path = barsPathWriter(SKETCH_HEIGHT - SKETCH_PAD.bottom);
  let edgeH = 0;
  let x0 = px(xm, x, 0);
  for (let k = 0; k < n; k++) {
    const d = durationsH[k] as number;
    edgeH += d;
    const x1 = px(xm, x, edgeH);
    path.bar(x0, x1, px(ym, y, (depthsMm[k] as number) / d));
    x0 = x1;
  }
  return path.end();
}
