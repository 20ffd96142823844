import { useMemo } from 'react';
import type { Storm, UnitSystem } from '../../core';
import { Axes } from '../chart/Axes';
import { dischargeAxisTop, hydrographFrameToTop, type HydrographFrame } from './hydrograph-frame';
import { seriesPath } from './hydrograph-paths';
import './observed.css';

/** A computed hydrograph to draw: times h from its storm's start, discharge m³/s. */
export interface HydrographSeries {
  readonly timesH: ArrayLike<number>;
  readonly dischargeM3s: ArrayLike<number>;
  readonly peakM3s: number;
}

/** Share of the peak under which the recession's tail is left off the axis (a drawing choice, no hydrology). */
const TAIL_SHARE = 1e-3;

/** Last time the series is above a thousandth of its peak, h (where the drawn recession ends). */
export function visibleEndH(h: HydrographSeries): number {
  const floor = TAIL_SHARE * h.peakM3s;
  for (let i = h.dischargeM3s.length - 1; i >= 0; i--) {
    if ((h.dischargeM3s[i] as number) > floor) return h.timesH[Math.min(i + 1, h.timesH.length - 1)] as number;
  }
  return h.timesH[h.timesH.length - 1] as number;
}

/**
 * The frame of a hydrograph drawn on its own (a design storm's, a pinned
 * scenario's): time from the storm start to `endH`, discharge from 0 to a
 * round value above `peakM3s`, in the screen's units.
 */
export function staticHydrographFrame(
  storm: Storm,
  peakM3s: number,
  endH: number,
  width: number,
  height: number,
  units: UnitSystem,
): HydrographFrame {
  let stormH = 0;
  for (let k = 0; k < storm.durationsH.length; k++) stormH += storm.durationsH[k] as number;
  const span = { startH: 0, endH: Math.max(endH, stormH) };
  return hydrographFrameToTop(storm, dischargeAxisTop(peakM3s, units), 0, width, height, units, span);
}

/** A computed direct runoff hydrograph as a still chart, for views that show one without a record. */
export function StaticHydrograph({
  frame,
  series,
  label,
  className = 'chart__svg',
}: {
  readonly frame: HydrographFrame;
  readonly series: HydrographSeries;
  readonly label: string;
  readonly className?: string;
}) {
  const d = useMemo(() => seriesPath(series.timesH, series.dischargeM3s, 0, frame.x, frame.y), [series, frame]);
  return (
    <svg className={className} width={frame.width} height={frame.height} role="img" aria-label={label}>
      <Axes frame={frame} />
      <path className="hydro__computed" d={d} data-layer="computed-direct" />
    </svg>
  );
}
