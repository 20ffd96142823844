import { scaleLinear, type ScaleLinear } from 'd3-scale';
import type { Storm, UnitSystem } from '../../core';
import { chartFrame, type Tick } from '../chart/frame';
import type { TimeSpanH } from '../chart/time-span';
import { formatValue } from '../format';
import { dischargeFromDisplay, dischargeToDisplay, dischargeUnitText } from './discharge';

/** Height of the hydrograph chart, px. */
export const HYDROGRAPH_HEIGHT = 280;

/**
 * Scales and ticks of the hydrograph. The time axis is the hyetograph's own
 * (chartFrame over the same span and width), so the two charts line up to
 * the pixel; only the vertical axis is the hydrograph's: discharge from 0 to
 * a round value above the peak, in the screen's units.
 */
export interface HydrographFrame {
  readonly width: number;
  readonly height: number;
  readonly plot: { readonly left: number; readonly right: number; readonly top: number; readonly bottom: number };
  /** Hours from the storm start → px. */
  readonly x: ScaleLinear<number, number>;
  /** Discharge, m³/s (internal unit) → px. */
  readonly y: ScaleLinear<number, number>;
  readonly xTicks: readonly Tick[];
  readonly yTicks: readonly Tick[];
  readonly xTitle: string;
  readonly yTitle: string;
  /** Storm time of the record's time zero: storm hours = record hours + offsetH. */
  readonly offsetH: number;
}

/**
 * Top of the discharge axis in display units: a round value above the peak.
 * Peaks that round to the same top draw the same frame, so a computed
 * hydrograph that moves with a drag redraws the record only when the axis
 * itself has to change.
 */
export function dischargeAxisTop(peakM3s: number, system: UnitSystem): number {
  const peakDisplay = dischargeToDisplay(peakM3s, system);
  const nice = scaleLinear()
    .domain([0, peakDisplay > 0 ? peakDisplay * 1.1 : 1])
    .nice(5);
  return nice.domain()[1] as number;
}

export function hydrographFrame(
  storm: Storm,
  peakM3s: number,
  offsetH: number,
  width: number,
  height: number,
  system: UnitSystem,
  span: TimeSpanH | undefined,
): HydrographFrame {
  return hydrographFrameToTop(storm, dischargeAxisTop(peakM3s, system), offsetH, width, height, system, span);
}

/** hydrographFrame with the top of the axis (display units) given, as dischargeAxisTop gives it. */
export function hydrographFrameToTop(
  storm: Storm,
  topDisplay: number,
  offsetH: number,
  width: number,
  height: number,
  system: UnitSystem,
  span: TimeSpanH | undefined,
): HydrographFrame {
  const base = chartFrame(storm, width, height, system, span);
  const { plot } = base;
  const yDisplay = scaleLinear().domain([0, topDisplay]).range([plot.bottom, plot.top]);
  const topM3s = dischargeFromDisplay(topDisplay, system);
  return {
    width,
    height,
    plot,
    x: base.x,
    y: scaleLinear().domain([0, topM3s]).range([plot.bottom, plot.top]),
    xTicks: base.xTicks,
    yTicks: yDisplay.ticks(5).map((v) => ({ px: yDisplay(v), label: formatValue(v) })),
    xTitle: base.xTitle,
    yTitle: `Discharge (${dischargeUnitText(system)})`,
    offsetH,
  };
}
