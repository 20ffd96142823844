import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { utcTicks } from 'd3-time';
import { barEdgesH, peakIntensityMmH, totalDurationH, type Storm, type UnitSystem } from '../../core';
import { formatValue } from '../format';
import { displayUnit, fromDisplay, toDisplay, unitText } from '../units';
import { formatWallDate, formatWallTime, wallClockMs } from './clock';
import { elapsedTicksH, formatElapsed } from './elapsed-ticks';
import { intensityBarsPath } from './bar-path';
import { mapLinear } from './linear-px';
import type { TimeSpanH } from './time-span';

/** The bars' one duration, h, or null when they differ (to a part in 10⁹, as the rainfall line reads them). */
function uniformStepH(storm: Storm): number | null {
  const d = storm.durationsH;
  const first = d[0];
  if (first === undefined) return null;
  for (let k = 1; k < d.length; k++) if (Math.abs((d[k] as number) - first) > 1e-9 * first) return null;
  return first;
}

/** Space around the plot for the axes, px. */
export const MARGIN = { top: 18, right: 20, bottom: 46, left: 62 } as const;

export interface Tick {
  readonly px: number;
  readonly label: string;
}

/**
 * Everything about the chart that depends only on the storm, the size and the
 * unit system: scales, ticks and bar edges. It does not change while the
 * loss line is dragged, so the rainfall layer drawn from it stays put.
 */
export interface ChartFrame {
  readonly width: number;
  readonly height: number;
  readonly plot: { readonly left: number; readonly right: number; readonly top: number; readonly bottom: number };
  /** Hours from the storm start → px (over the storm, or the span given to chartFrame). */
  readonly x: ScaleLinear<number, number>;
  /** Rate, mm/h (internal unit) → px. */
  readonly y: ScaleLinear<number, number>;
  /** Top of the rate axis, mm/h and in display units. */
  readonly topMmH: number;
  readonly topDisplay: number;
  readonly xTicks: readonly Tick[];
  readonly yTicks: readonly Tick[];
  readonly xTitle: string;
  readonly yTitle: string;
  /** Bar edges in px (n + 1). */
  readonly edgesPx: Float64Array;
}

/** Rate axes start at a round value even for a dry or empty storm. */
const EMPTY_TOP = { si: 10, us: 0.5 } as const;

/**
 * `span`, when given, is the stretch of time to show (hours from the storm
 * start; see time-span.ts): the storm and a streamflow record on one axis.
 * Without it the axis runs over the storm.
 */
export function chartFrame(
  storm: Storm,
  width: number,
  height: number,
  system: UnitSystem,
  span?: TimeSpanH,
): ChartFrame {
  const frame = frameScales(storm, width, height, system, span);
  return { ...frame, edgesPx: mapLinear(frame.x, barEdgesH(storm)) };
}

/** The frame but its bar edges: a few passes over the bars, no column written (frame-steps.ts adds the edges in steps). */
export function frameScales(
  storm: Storm,
  width: number,
  height: number,
  system: UnitSystem,
  span?: TimeSpanH,
): Omit<ChartFrame, 'edgesPx'> {
  const plot = {
    left: MARGIN.left,
    right: Math.max(MARGIN.left + 40, width - MARGIN.right),
    top: MARGIN.top,
    bottom: Math.max(MARGIN.top + 40, height - MARGIN.bottom),
  };
  const rateUnit = displayUnit('rate', system);
  const peakDisplay = toDisplay('rate', peakIntensityMmH(storm), system);
  // Round the top in the units on screen, so ticks are round numbers there.
  const yDisplay = scaleLinear()
    .domain([0, peakDisplay > 0 ? peakDisplay * 1.12 : EMPTY_TOP[system]])
    .range([plot.bottom, plot.top])
    .nice(6);
  const topDisplay = yDisplay.domain()[1] as number;
  const topMmH = fromDisplay('rate', topDisplay, system);
  const y = scaleLinear().domain([0, topMmH]).range([plot.bottom, plot.top]);
  const yTicks = yDisplay.ticks(6).map((v) => ({ px: yDisplay(v), label: formatValue(v) }));

  const durationH = totalDurationH(storm);
  const x = scaleLinear()
    .domain(span ? [span.startH, span.endH] : [0, durationH > 0 ? durationH : 1])
    .range([plot.left, plot.right]);
  const tickCount = Math.max(2, Math.floor((plot.right - plot.left) / 90));
  const startMs = storm.startIso === undefined ? null : wallClockMs(storm.startIso);
  let xTicks: Tick[];
  let xTitle: string;
  if (startMs !== null) {
    const fromMs = startMs + (x.domain()[0] as number) * 3.6e6;
    const endMs = startMs + (x.domain()[1] as number) * 3.6e6;
    // Exactly what d3's UTC time scale does (domain rounded to whole milliseconds, its calendar-aware ticks), on a
    // linear scale: the time scale would bring d3-time-format, unused here (the labels are our own), into the
    // first screen's JavaScript.
    const [clockFrom, clockEnd] = [Math.round(fromMs), Math.round(endMs)];
    const clock = scaleLinear().domain([clockFrom, clockEnd]).range([plot.left, plot.right]);
    const multiDay = formatWallDate(fromMs) !== formatWallDate(endMs);
    xTicks = utcTicks(new Date(clockFrom), new Date(clockEnd), tickCount).map((t) => ({
      px: clock(t.getTime()),
      label:
        multiDay && formatWallTime(t.getTime()) === '00:00' ? formatWallDate(t.getTime()) : formatWallTime(t.getTime()),
    }));
    xTitle = `Clock time, storm from ${formatWallDate(startMs)} ${formatWallTime(startMs)}`;
  } else {
    // Hours and minutes from the start, on bar edges when the bars are of one length (issue 16).
    const [fromH, toH] = x.domain() as [number, number];
    xTicks = elapsedTicksH(fromH, toH, tickCount, uniformStepH(storm)).map((h) => ({
      px: x(h),
      label: formatElapsed(h),
    }));
    xTitle = 'Time from storm start (h:mm)';
  }

  return {
    width,
    height,
    plot,
    x,
    y,
    topMmH,
    topDisplay,
    xTicks,
    yTicks,
    xTitle,
    yTitle: `Rainfall intensity (${unitText(rateUnit)})`,
  };
}

/**
 * Bars whose height is a depth per bar spread over its duration (the bar's
 * intensity, a hyetograph's defining picture) as one path on the frame.
 */
export function intensityPath(frame: ChartFrame, depthsMm: ArrayLike<number>, durationsH: ArrayLike<number>): string {
  return intensityBarsPath(frame.edgesPx, depthsMm, durationsH, frame.y, frame.plot.bottom);
}

// The rainfall layer's path per frame, so one worked out ahead (frame-steps.ts) is drawn, not worked out again.
const rainPaths = new WeakMap<ChartFrame, { readonly storm: Storm; readonly d: string }>();

/** The path of every bar at its full intensity on the frame (the rainfall layer). */
export function rainPath(frame: ChartFrame, storm: Storm): string {
  const kept = rainPaths.get(frame);
  if (kept?.storm === storm) return kept.d;
  const d = intensityPath(frame, storm.depthsMm, storm.durationsH);
  rainPaths.set(frame, { storm, d });
  return d;
}
