import { memo, useMemo } from 'react';
import { scaleLinear } from 'd3-scale';
import { utcTicks } from 'd3-time';
import type { RecordEvent, Storm, UnitSystem } from '../../core';
import { Axes, type AxesFrame } from '../chart/Axes';
import { useElementWidth } from '../chart/useElementWidth';
import { formatValue } from '../format';
import { formatWallDate, formatWallTime } from '../chart/clock';
import { barClock, barTimeText, type BarClock } from '../storm-input/bar-times';
import { displayUnit, toDisplay, unitText } from '../units';
import { eventBandsPath } from './bands';
import { columnsPath, recordColumns } from './columns';

const HEIGHT = 220;

/**
 * Time ticks across the record: calendar-aware on a clock (d3-time's UTC
 * ticks on the zone-free wall-clock axis, as the hyetograph does), labelled
 * with the date at midnight and the time otherwise; hours from the start
 * without one.
 */
function timeTicks(clock: BarClock, spanH: number, left: number, right: number) {
  const count = Math.max(2, Math.floor((right - left) / 110));
  if (clock.startMs === null) {
    const x = scaleLinear()
      .domain([0, spanH > 0 ? spanH : 1])
      .range([left, right]);
    return x.ticks(count).map((h) => ({ px: x(h), label: barTimeText(clock, h) }));
  }
  const from = Math.round(clock.startMs);
  const to = Math.round(clock.startMs + spanH * 3.6e6);
  const x = scaleLinear().domain([from, to]).range([left, right]);
  const multiDay = formatWallDate(from) !== formatWallDate(to);
  return utcTicks(new Date(from), new Date(to), count).map((t) => {
    const ms = t.getTime();
    return { px: x(ms), label: multiDay && formatWallTime(ms) === '00:00' ? formatWallDate(ms) : formatWallTime(ms) };
  });
}
const MARGIN = { top: 12, right: 34, bottom: 44, left: 60 };

export interface OverviewChartProps {
  readonly storm: Storm;
  readonly startsH: Float64Array;
  readonly picked: readonly RecordEvent[];
  readonly unpicked: readonly RecordEvent[];
  readonly units: UnitSystem;
}

/**
 * The whole record at a glance: one bar per pixel column at the highest
 * intensity inside it (recordColumns), with bands over the events, darker
 * for the ones picked. The columns depend on the record and the width only,
 * so changing the dry spell redraws the bands alone.
 */
export const OverviewChart = memo(function OverviewChart({
  storm,
  startsH,
  picked,
  unpicked,
  units,
}: OverviewChartProps) {
  const [ref, width] = useElementWidth<HTMLDivElement>(900);
  const plot = { left: MARGIN.left, right: width - MARGIN.right, top: MARGIN.top, bottom: HEIGHT - MARGIN.bottom };
  const plotWidth = Math.max(1, plot.right - plot.left);
  const spanH = startsH[startsH.length - 1] as number;

  const columns = useMemo(() => recordColumns(storm, Math.round(plotWidth)), [storm, plotWidth]);
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([0, spanH > 0 ? spanH : 1])
        .range([plot.left, plot.right]),
    [spanH, plot.left, plot.right],
  );
  const rateUnit = unitText(displayUnit('rate', units));
  const peakShown = toDisplay('rate', columns.maxPeakMmH, units);
  const y = useMemo(
    () =>
      scaleLinear()
        .domain([0, peakShown > 0 ? peakShown : 1])
        .nice()
        .range([plot.bottom, plot.top]),
    [peakShown, plot.bottom, plot.top],
  );
  const barsD = useMemo(
    () => columnsPath(columns, plot.left, plotWidth, plot.bottom, (v) => y(toDisplay('rate', v, units))),
    [columns, plot.left, plotWidth, plot.bottom, y, units],
  );
  const pickedD = useMemo(
    () => eventBandsPath(picked, startsH, (h) => x(h), plot.top, plot.bottom),
    [picked, startsH, x, plot.top, plot.bottom],
  );
  const unpickedD = useMemo(
    () => eventBandsPath(unpicked, startsH, (h) => x(h), plot.top, plot.bottom),
    [unpicked, startsH, x, plot.top, plot.bottom],
  );

  const clock = barClock(storm.startIso, spanH);
  const frame: AxesFrame = {
    plot,
    height: HEIGHT,
    xTicks: timeTicks(clock, spanH, plot.left, plot.right),
    yTicks: y.ticks(4).map((v) => ({ px: y(v), label: formatValue(v) })),
    xTitle:
      clock.startMs === null ? 'Time from the record start (h:mm)' : `Clock time, record from ${barTimeText(clock, 0)}`,
    yTitle: `Highest intensity, ${rateUnit}`,
  };
  const count = picked.length + unpicked.length;

  return (
    <div className="record-chart" ref={ref}>
      <svg
        width={width}
        height={HEIGHT}
        role="img"
        aria-label={`The rainfall record with ${count} event${count === 1 ? '' : 's'} marked, ${picked.length} picked`}
      >
        <path className="record-chart__band record-chart__band--off" d={unpickedD} data-layer="unpicked" />
        <path className="record-chart__band" d={pickedD} data-layer="picked" />
        <Axes frame={frame} />
        <path className="record-chart__rain" d={barsD} data-layer="record" />
      </svg>
    </div>
  );
});
