import type { Storm, UnitSystem } from '../../core';
import { nextTask, SLICE } from '../../store/next-task';
import { barColumns } from './bar-path';
import { frameScales, rainPath, type ChartFrame } from './frame';
import { linearMap, type LinearMap, type LinearScale } from './linear-px';
import type { TimeSpanH } from './time-span';

/**
 * The chart frame of a long storm (staged-frame.ts), worked out a slice of
 * bars at a time with a pause for the page between slices, then its column
 * plan and the rainfall layer's path, each a task of its own: on 10⁶ bars
 * the whole frame held the page for one task of 100 to 200 ms (issue 11:
 * the page answers within 100 ms throughout a large import). The numbers
 * are chartFrame's to the last bit: the edges summed in barEdgesH's order,
 * then mapped in place through mapLinear's arithmetic. Null when `live()`
 * turned false meanwhile (the storm or the size changed).
 */
export async function chartFrameInSteps(
  storm: Storm,
  width: number,
  height: number,
  system: UnitSystem,
  span: TimeSpanH | undefined,
  live: () => boolean,
): Promise<ChartFrame | null> {
  const scales = frameScales(storm, width, height, system, span);
  const n = storm.durationsH.length;
  const edges = new Float64Array(n + 1);
  for (let from = 0; from < n; from += SLICE) {
    await nextTask();
    if (!live()) return null;
    sumEdges(storm.durationsH, edges, from, Math.min(n, from + SLICE));
  }
  const m = linearMap(scales.x);
  for (let from = 0; from <= n; from += SLICE) {
    await nextTask();
    if (!live()) return null;
    mapEdges(m ?? scales.x, edges, from, Math.min(n + 1, from + SLICE));
  }
  const frame: ChartFrame = { ...scales, edgesPx: edges };
  await nextTask();
  if (!live()) return null;
  barColumns(edges); // kept for the frame's edges: the layers' first draw reads it
  await nextTask();
  if (!live()) return null;
  rainPath(frame, storm); // kept for the frame: the rainfall layer's first draw reads it
  return frame;
}

// The loops sit in plain functions, called once a slice: V8 optimises a loop inside an async function late or never.

/** edges[k + 1] = edges[k] + d[k] for k in [from, to): barEdgesH's sums, in its order. */
function sumEdges(d: ArrayLike<number>, edges: Float64Array, from: number, to: number): void {
  for (let k = from; k < to; k++) edges[k + 1] = (edges[k] as number) + (d[k] as number);
}

/** edges[k] through the scale for k in [from, to), in place: mapLinear's arithmetic. */
function mapEdges(m: LinearMap | LinearScale, edges: Float64Array, from: number, to: number): void {
  if (typeof m === 'function') {
    for (let k = from; k < to; k++) edges[k] = m(edges[k] as number) ?? NaN;
    return;
  }
  const { d0, span, r0, r1 } = m;
  for (let k = from; k < to; k++) {
    const t = ((edges[k] as number) - d0) / span;
    edges[k] = r0 * (1 - t) + r1 * t;
  }
}
