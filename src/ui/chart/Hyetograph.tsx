import { useMemo, useState } from 'react';
import { totalDepthMm } from '../../core';
import { useDerived, useScenario } from '../../store';
import { formatCount, formatValue } from '../format';
import { displayUnit, toDisplay, unitText } from '../units';
import { Axes } from './Axes';
import { CAPACITY_CURVES } from './capacity';
import { useChartHeight } from './chart-height';
import { STAGED_FROM_BARS, useChartFrame } from './staged-frame';
import { lossPartOf, rateLine } from './method-layers';
import { lazyPart } from '../layout/LazyPart';
import { LossLayer } from './LossLayer';
import type { MassCurveProps } from './MassCurve';
import { LossLine } from './LossLine';
import { RainLayer } from './RainLayer';
import { useTimeSpanH } from './time-span';
import { useElementWidth } from './useElementWidth';

export { CHART_HEIGHT } from './chart-height';

// The mass curve's code loads the first time it is switched on (it is not part of the first screen).
const MassCurve = lazyPart<MassCurveProps>('mass curve', () => import('./MassCurve').then((m) => m.MassCurve));

/**
 * The hyetograph: each bar split into the part lost and the part that runs
 * off, axes with units (clock times when the storm has a start), and for
 * rate methods the loss-rate line to drag.
 */
export function Hyetograph() {
  const storm = useScenario((s) => s.storm);
  // A long storm's chart is drawn in steps after its first render: its width is read from the page's own
  // layout rather than asked for at mount, which would lay out the whole page inside the mounting task.
  const staged = storm.depthsMm.length >= STAGED_FROM_BARS;
  const [boxRef, width, widthKnown] = useElementWidth<HTMLDivElement>(880, { firstFromLayout: staged });
  const units = useScenario((s) => s.units);
  const results = useDerived((d, s) => d.results(s));
  const matched = useDerived((d, s) => d.isMatched(s));
  const fittedKey = useScenario((s) => s.observed?.parameter ?? null);
  const method = results.method;
  const [mass, setMass] = useState(false);

  // With a streamflow record the axis holds the record too, shared with the hydrograph below.
  const span = useTimeSpanH();
  const height = useChartHeight();
  // Null while a long storm's frame is worked out in steps (staged-frame.ts): the chart says it is drawing.
  const frame = useChartFrame(storm, widthKnown || !staged ? width : null, height, units, span);
  const part = useDerived((d, s) => d.lossPartMm(s));
  const capacity = CAPACITY_CURVES[method.kind];
  const capacityDrawing = useMemo(
    () => (frame && capacity && results.ok ? capacity.draw(frame, storm, method) : null),
    [capacity, frame, storm, method, results.ok],
  );
  const capacityPath = capacityDrawing?.path ?? null;
  const aboveTop = capacityDrawing?.aboveTopMmH ?? null;

  const line = rateLine(method);
  const lineParam = line?.param;
  const lineKey = lineParam?.key;
  const lineValue = line?.valueMmH;
  const partLabel = lossPartOf(method)?.label ?? null;
  const n = storm.depthsMm.length;

  const depthUnit = unitText(displayUnit('depth', units));
  const summary = results.ok
    ? `${formatCount(n)} bars, ${formatValue(toDisplay('depth', results.result.rainMm, units))} ${depthUnit} of rain: ` +
      `${formatValue(toDisplay('depth', results.result.totalLossMm, units))} ${depthUnit} lost, ` +
      `${formatValue(toDisplay('depth', results.result.totalExcessMm, units))} ${depthUnit} excess.`
    : `${formatCount(n)} bars, ${formatValue(toDisplay('depth', totalDepthMm(storm), units))} ${depthUnit} of rain.`;

  return (
    <figure className="chart" aria-labelledby="chart-title">
      <figcaption className="chart__head">
        <h2 id="chart-title">Hyetograph</h2>
        <ul className="legend" aria-label="Legend">
          <li>
            <span className="swatch swatch--excess" aria-hidden="true" /> Rainfall excess
          </li>
          <li>
            <span className="swatch swatch--loss" aria-hidden="true" /> Loss
          </li>
          {partLabel ? (
            <li>
              <span className="swatch swatch--part" aria-hidden="true" /> {partLabel}
            </li>
          ) : null}
          {capacity && capacityPath ? (
            <li>
              <span className="swatch swatch--capacity" aria-hidden="true" /> {capacity.label}
            </li>
          ) : null}
          {lineParam ? (
            <li>
              <span className="swatch swatch--line" aria-hidden="true" /> {lineParam.label} (drag or use arrow keys)
            </li>
          ) : null}
        </ul>
        <button type="button" className="chart__toggle" aria-pressed={mass} onClick={() => setMass(!mass)}>
          Mass curve
        </button>
      </figcaption>
      <div className="chart__box" ref={boxRef}>
        <svg className="chart__svg" width={width} height={height} role="group" aria-labelledby="chart-title">
          <defs>
            <pattern id="part-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
              <rect className="hatch__bg" width="6" height="6" />
              <line className="hatch__line" x1="0" y1="0" x2="0" y2="6" />
            </pattern>
          </defs>
          {frame ? (
            <>
              <Axes frame={frame} />
              <g role="img" aria-label={`Bars: ${summary}`}>
                <RainLayer frame={frame} storm={storm} />
                {results.ok ? (
                  <LossLayer frame={frame} storm={storm} lossMm={results.result.lossMm} partMm={part} />
                ) : null}
              </g>
            </>
          ) : (
            <text className="chart__empty" x={width / 2} y={height / 2} textAnchor="middle" role="status">
              Drawing {formatCount(n)} bars…
            </text>
          )}
          {capacityPath ? (
            <path className="capacity" d={capacityPath} data-layer="capacity" aria-hidden="true" />
          ) : null}
          {frame && aboveTop !== null ? (
            <text className="capacity__clip" x={frame.plot.left + 6} y={frame.plot.top + 12} aria-hidden="true">
              ▲ capacity above the chart
            </text>
          ) : null}
          {frame && n === 0 ? (
            <text
              className="chart__empty"
              x={(frame.plot.left + frame.plot.right) / 2}
              y={(frame.plot.top + frame.plot.bottom) / 2}
              textAnchor="middle"
            >
              No rainfall bars yet
            </text>
          ) : null}
          {frame && lineKey && lineParam && typeof lineValue === 'number' ? (
            <LossLine
              frame={frame}
              paramKey={lineKey}
              label={lineParam.label}
              valueMmH={lineValue}
              minMmH={lineParam.min}
              system={units}
              locked={matched && fittedKey === lineKey}
            />
          ) : null}
        </svg>
        {frame && mass && results.ok ? (
          <MassCurve frame={frame} storm={storm} result={results.result} units={units} />
        ) : null}
      </div>
      {aboveTop !== null ? (
        <p className="chart__notice" data-note="capacity-clip">
          The infiltration capacity runs above the top of the chart, where its dashed line runs along the top edge:{' '}
          {Number.isFinite(aboveTop)
            ? `up to ${formatValue(toDisplay('rate', aboveTop, units))} ${unitText(displayUnit('rate', units))}.`
            : 'without bound where the rain starts on dry soil (Green–Ampt’s capacity at the first drop).'}
        </p>
      ) : null}
      {!results.ok ? (
        <p className="chart__error" role="alert">
          Losses cannot be worked out: {results.message}
        </p>
      ) : null}
    </figure>
  );
}
