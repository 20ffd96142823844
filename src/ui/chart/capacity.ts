import {
  barEdgesH,
  infiltrationCapacity,
  METHOD_KINDS,
  methodSpec,
  totalDurationH,
  type LossKind,
  type LossMethod,
  type Storm,
} from '../../core';
import type { ChartFrame } from './frame';

/**
 * Infiltration capacity through the storm, for the methods whose loss is a
 * capacity curve rather than a constant rate (Horton in both readings,
 * Green–Ampt). Every value comes from the core's `infiltrationCapacity`, the
 * state of the same bar steps that give the losses (recovery in dry spells
 * included); this file only decides where to sample it.
 */
export interface CapacityCurve {
  readonly label: string;
  /** Path through the plot, or null when the core has no capacity for this method. */
  readonly path: (frame: ChartFrame, storm: Storm, method: LossMethod, lossMm: Float64Array) => string | null;
  /** The path, and how far the capacity runs above the chart's top (never clipped silently), or null. */
  readonly draw: (frame: ChartFrame, storm: Storm, method: LossMethod) => CapacityDrawing | null;
}

export interface CapacityDrawing {
  readonly path: string;
  /** The highest capacity where it runs above the top of the rate axis, mm/h (Infinity: unbounded); null if never. */
  readonly aboveTopMmH: number | null;
}

/** The highest capacity above the axis top, mm/h (Infinity when unbounded), or null when it stays under it. */
export function capacityAboveTop(frame: ChartFrame, rateMmH: ArrayLike<number>): number | null {
  let high: number | null = null;
  for (let i = 0; i < rateMmH.length; i++) {
    const r = rateMmH[i] as number;
    const v = Number.isNaN(r) ? null : r;
    if (v !== null && v > frame.topMmH && (high === null || v > high)) high = v;
  }
  return high;
}

/** A coordinate to 0.001 px, as d3-shape's line() writes it by default (its digits(3)). */
const px3 = (v: number): number => Math.round(v * 1000) / 1000;

/**
 * The polyline through the samples, written as d3-shape's line() writes it
 * (test/ui/chart/capacity.test.ts compares the two): a dozen lines here kept
 * d3-shape and d3-path, about 1.5 kB of gzip, off the first screen. Points
 * are clipped to the top of the axis, so an unbounded capacity (dry soil)
 * runs along it.
 */
export function capacityPath(frame: ChartFrame, tH: ArrayLike<number>, rateMmH: ArrayLike<number>): string {
  const { x, y, topMmH } = frame;
  let d = '';
  for (let i = 0; i < tH.length; i++) {
    const r = rateMmH[i] as number;
    const py = y(Number.isFinite(r) ? Math.min(r, topMmH) : topMmH);
    d += `${i ? 'L' : 'M'}${px3(x(tH[i] as number))},${px3(py)}`;
  }
  return d;
}

/**
 * Times to sample, h from the storm start: every 2 px across the storm, and
 * every bar edge while bars are wider than that (capacity bends there: rain
 * starts, stops or changes), merged in order.
 */
function capacitySampleTimes(frame: ChartFrame, storm: Storm): Float64Array {
  const durationH = totalDurationH(storm);
  const widthPx = Math.max(1, frame.x(durationH) - frame.x(0));
  const samples = Math.max(2, Math.ceil(widthPx / 2));
  const edges = storm.depthsMm.length <= samples ? barEdgesH(storm) : new Float64Array(0);
  const out = new Float64Array(samples + 1 + edges.length);
  let i = 0;
  let e = 0;
  for (let q = 0; q <= samples; q++) {
    const t = (durationH * q) / samples;
    while (e < edges.length && (edges[e] as number) < t) out[i++] = edges[e++] as number;
    out[i++] = t;
  }
  while (e < edges.length) out[i++] = edges[e++] as number;
  return out.subarray(0, i);
}

function drawCurve(kind: LossKind, frame: ChartFrame, storm: Storm, method: LossMethod): CapacityDrawing | null {
  if (method.kind !== kind || storm.depthsMm.length === 0) return null;
  const tH = capacitySampleTimes(frame, storm);
  const rate = infiltrationCapacity(storm, method, tH);
  return rate ? { path: capacityPath(frame, tH, rate), aboveTopMmH: capacityAboveTop(frame, rate) } : null;
}

const coreCurve = (kind: LossKind): CapacityCurve => ({
  label: 'Infiltration capacity',
  path: (frame, storm, method) => drawCurve(kind, frame, storm, method)?.path ?? null,
  draw: (frame, storm, method) => drawCurve(kind, frame, storm, method),
});

/** A curve for each method whose spec gives a capacity (src/core/loss/methods.ts): no list of kinds kept here. */
export const CAPACITY_CURVES: Partial<Record<LossKind, CapacityCurve>> = Object.fromEntries(
  METHOD_KINDS.filter((kind) => methodSpec(kind).capacity).map((kind) => [kind, coreCurve(kind)]),
);
