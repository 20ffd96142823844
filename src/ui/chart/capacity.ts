import { line } from 'd3-shape';
import {
  greenAmptRateMmH,
  hortonCapacityMmH,
  totalDurationH,
  type LossKind,
  type LossMethod,
  type Storm,
} from '../../core';
import type { ChartFrame } from './frame';

/**
 * Infiltration capacity through the storm, for the methods whose loss is a
 * capacity curve rather than a constant rate. Every value comes from the
 * core's own capacity functions; this file only decides where to sample them.
 */
export interface CapacityCurve {
  readonly label: string;
  /** Path through the plot, or null when the core does not expose this variant's capacity. */
  readonly path: (frame: ChartFrame, storm: Storm, method: LossMethod, lossMm: Float64Array) => string | null;
}

/** Points are clipped to the top of the axis, so an unbounded capacity (dry soil) runs along it. */
function toPath(frame: ChartFrame, tH: ArrayLike<number>, rateMmH: ArrayLike<number>): string {
  const { x, y, topMmH } = frame;
  const points: [number, number][] = [];
  for (let i = 0; i < tH.length; i++) {
    const r = rateMmH[i] as number;
    points.push([x(tH[i] as number), y(Number.isFinite(r) ? Math.min(r, topMmH) : topMmH)]);
  }
  return line()(points) ?? '';
}

const horton: CapacityCurve = {
  label: 'Infiltration capacity',
  path: (frame, storm, method) => {
    if (method.kind !== 'horton') return null;
    // With time compression the capacity follows the infiltrated depth, which
    // the core does not expose as a function of time: nothing is drawn.
    if (method.ponding) return null;
    // Capacity follows clock time: f(t) = hortonCapacityMmH(t), sampled every 2 px.
    const durationH = totalDurationH(storm);
    const samples = Math.max(2, Math.ceil((frame.plot.right - frame.plot.left) / 2));
    const tH = new Float64Array(samples + 1);
    const rate = new Float64Array(samples + 1);
    for (let i = 0; i <= samples; i++) {
      tH[i] = (durationH * i) / samples;
      rate[i] = hortonCapacityMmH(method.f0MmH, method.fcMmH, method.kPerH, tH[i] as number);
    }
    return toPath(frame, tH, rate);
  },
};

const greenAmpt: CapacityCurve = {
  label: 'Infiltration capacity (at bar ends)',
  path: (frame, storm, method, lossMm) => {
    if (method.kind !== 'green-ampt') return null;
    // Capacity at each bar end from the depth infiltrated so far (the core's
    // per-bar loss, all of which infiltrates in this method).
    const n = lossMm.length;
    const every = Math.max(1, Math.floor(n / Math.max(1, frame.plot.right - frame.plot.left)));
    const count = Math.floor(n / every) + 1;
    const tH = new Float64Array(count);
    const rate = new Float64Array(count);
    let t = 0;
    let f = 0;
    let j = 0;
    for (let k = 0; k <= n; k++) {
      if (k % every === 0 && j < count) {
        tH[j] = t;
        rate[j] = greenAmptRateMmH(method.ksMmH, method.suctionMm, method.moistureDeficit, f);
        j++;
      }
      if (k < n) {
        t += storm.durationsH[k] as number;
        f += lossMm[k] as number;
      }
    }
    return toPath(frame, tH.subarray(0, j), rate.subarray(0, j));
  },
};

export const CAPACITY_CURVES: Partial<Record<LossKind, CapacityCurve>> = {
  horton,
  'green-ampt': greenAmpt,
};
