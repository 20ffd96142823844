import { scaleLinear } from 'd3-scale';
import type { Storm } from '../../../core';
import { intensityBarsPath } from '../../chart/bar-path';
import { linearMap } from '../../chart/linear-px';
import { SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH } from '../../import-kit';
/**
 * The sketch's path: the bar edges in pixels in one pass (the running sum of
 * barEdgesH through mapLinear's arithmetic), then the chart's own drawing of
 * intensity bars (intensityBarsPath), which takes each bar's top in the pass
 * that merges the narrow ones per pixel column: no column of 10⁶
 * intensities or top pixels is made (those passes held the page for over
 * 100 ms when a 10⁶-line file was read, issue 11). The path is the one
 * barsPath gives on those columns.
 */
export function sketchPath(storm: Storm, totalH: number, peak: number): string {
  const x = scaleLinear()
    .domain([0, totalH || 1])
    .range([SKETCH_PAD.left, SKETCH_WIDTH - SKETCH_PAD.right]);
  const y = scaleLinear()
    .domain([0, peak > 0 ? peak : 1])
    .range([SKETCH_HEIGHT - SKETCH_PAD.bottom, SKETCH_PAD.top]);
  const xm = linearMap(x);
  const px = (v: number): number => {
    if (xm === null) return x(v) ?? NaN;
    const t = (v - xm.d0) / xm.span;
    return xm.r0 * (1 - t) + xm.r1 * t;
  };
  const { durationsH, depthsMm } = storm;
  const n = depthsMm.length;
  const edgesPx = new Float64Array(n + 1);
  let edgeH = 0;
  edgesPx[0] = px(0);
  for (let k = 0; k < n; k++) {
    edgeH += durationsH[k] as number;
    edgesPx[k + 1] = px(edgeH);
  }
  return intensityBarsPath(edgesPx, depthsMm, durationsH, y, SKETCH_HEIGHT - SKETCH_PAD.bottom);
}
