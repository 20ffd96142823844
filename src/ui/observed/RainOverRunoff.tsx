import { memo, useMemo } from 'react';
import { useDerived, useScenario } from '../../store';
import { useDeferredDerived } from '../../store/deferred';
import { MARGIN, chartFrame, type ChartFrame } from '../chart/frame';
import { LossLayer } from '../chart/LossLayer';
import { RainLayer } from '../chart/RainLayer';
import { useChartHeight } from '../chart/chart-height';
import { useTimeSpanH } from '../chart/time-span';
import { useElementWidth } from '../chart/useElementWidth';
import { formatValue } from '../format';
import { displayUnit, toDisplay, unitText } from '../units';
import { HydrographLegendItems } from './HydrographChart';
import { HydrographPlot } from './HydrographPlot';
import './observed.css';

/** Height of the hanging hyetograph for a window's chart height: half the workbench's, so the hydrograph under it fits a laptop screen. */
const hangingHeightFor = (chartHeight: number): number => Math.round(chartHeight / 2);
/** Room under the hanging bars, px: the time axis and its labels are the hydrograph's, below. */
const HANGING_MARGIN_BOTTOM = 8;

/**
 * The rate axis of a hanging hyetograph: zero at the top edge, intensity
 * growing downward; the time axis is the hydrograph's below, on the same
 * scale, so its labels are not repeated here.
 */
const HangingAxes = memo(function HangingAxes({ frame, title }: { frame: ChartFrame; title: string }) {
  const { plot } = frame;
  const flip = (px: number): number => plot.top + plot.bottom - px;
  return (
    <g className="axes" aria-hidden="true">
      {frame.yTicks.map((t) => (
        <g key={`y${t.label}`} transform={`translate(0,${flip(t.px)})`}>
          <line className="axes__grid" x1={plot.left} x2={plot.right} />
          <text className="axes__label" x={plot.left - 8} dy="0.32em" textAnchor="end">
            {t.label}
          </text>
        </g>
      ))}
      <line className="axes__line" x1={plot.left} x2={plot.right} y1={plot.top} y2={plot.top} />
      <line className="axes__line" x1={plot.left} x2={plot.left} y1={plot.top} y2={plot.bottom} />
      {frame.xTicks.map((t, i) => (
        <line key={`x${i}`} className="axes__tick" x1={t.px} x2={t.px} y1={plot.top} y2={plot.top - 5} />
      ))}
      <text
        className="axes__title"
        transform={`translate(14,${(plot.top + plot.bottom) / 2}) rotate(-90)`}
        textAnchor="middle"
      >
        {title}
      </text>
    </g>
  );
});

/**
 * The hyetograph hanging from the top, in the workbench chart's own layers
 * and colours (dark excess, light loss), mirrored about the plot's middle so
 * the bars grow downward from the time axis at the top.
 */
function HangingHyetograph() {
  const [boxRef, width] = useElementWidth<HTMLDivElement>(880);
  const height = hangingHeightFor(useChartHeight());
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const results = useDerived((d, s) => d.results(s));
  const span = useTimeSpanH();
  // The workbench's frame (same time scale as the hydrograph below: same span and width), made for a height
  // whose plot ends just above this chart's foot, since no time labels sit under it.
  const hanging = useMemo(
    () => chartFrame(storm, width, height + MARGIN.bottom - HANGING_MARGIN_BOTTOM, units, span),
    [storm, width, height, units, span],
  );
  const { plot } = hanging;
  const depthUnit = unitText(displayUnit('depth', units));
  const label = results.ok
    ? `Hanging hyetograph: ${formatValue(toDisplay('depth', results.result.rainMm, units))} ${depthUnit} of rain, ` +
      `${formatValue(toDisplay('depth', results.result.totalExcessMm, units))} ${depthUnit} of it excess.`
    : 'Hanging hyetograph: rain only (the losses cannot be worked out).';
  return (
    <div className="chart__box" ref={boxRef}>
      <svg className="chart__svg hanging" width={width} height={height} role="img" aria-label={label}>
        {/* A short title: the hanging chart is half the height of the workbench's. */}
        <HangingAxes frame={hanging} title={`Rain (${unitText(displayUnit('rate', units))})`} />
        {/* Mirrored about the plot's middle: the bars hang from the top edge. */}
        <g transform={`translate(0,${plot.top + plot.bottom}) scale(1,-1)`}>
          <RainLayer frame={hanging} storm={storm} />
          {results.ok ? <LossLayer frame={hanging} storm={storm} lossMm={results.result.lossMm} partMm={null} /> : null}
        </g>
      </svg>
    </div>
  );
}

/**
 * The trade's picture of a storm and its runoff: the hyetograph hanging
 * upside down from the top, over the hydrograph (the record, its baseflow
 * and the computed direct runoff), both on one time axis. What is on the
 * workbench, drawn the other way; edits are made there.
 */
export function RainOverRunoff() {
  const flow = useScenario((s) => s.streamflow);
  const hasTransform = useScenario((s) => s.hydrograph.transform !== null);
  const withTotal = useDeferredDerived((d, s) => d.totalFlow(s) !== null);
  return (
    <section className="panel rain-over-runoff" aria-labelledby="rain-over-runoff-title">
      <div className="rain-over-runoff__head">
        <h2 id="rain-over-runoff-title">Rain over runoff</h2>
        <p className="panel__intro">
          The workbench’s storm hanging over its hydrograph, on one time axis; edit them on the Workbench view.
        </p>
      </div>
      <ul className="legend" aria-label="Legend of rain over runoff">
        <li>
          <span className="swatch swatch--excess" aria-hidden="true" /> Rainfall excess
        </li>
        <li>
          <span className="swatch swatch--loss" aria-hidden="true" /> Loss
        </li>
        <HydrographLegendItems flow={flow !== null} computed={hasTransform} />
        {withTotal ? (
          <li>
            <span className="swatch swatch--total" aria-hidden="true" /> Computed total flow
          </li>
        ) : null}
      </ul>
      <figure className="rain-over-runoff__figure" aria-labelledby="rain-over-runoff-title">
        <HangingHyetograph />
        {flow || hasTransform ? (
          <HydrographPlot flow={flow} labelledBy="rain-over-runoff-title" />
        ) : (
          <p className="hydro__empty">
            No hydrograph to hang the storm over yet: choose a unit hydrograph, or bring in a streamflow record, on the
            Workbench view.
          </p>
        )}
      </figure>
    </section>
  );
}
