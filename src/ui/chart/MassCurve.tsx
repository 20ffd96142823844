import { scaleLinear } from 'd3-scale';
import type { LossResult, Storm, UnitSystem } from '../../core';
import { massCurveOf } from '../../store/mass-curve';
import { formatValue } from '../format';
import { displayUnit, toDisplay, unitText } from '../units';
import type { ChartFrame } from './frame';
import { cumulativePath } from './mass-path';
import './mass-curve.css';

export interface MassCurveProps {
  readonly frame: ChartFrame;
  readonly storm: Storm;
  readonly result: Pick<LossResult, 'lossMm' | 'excessMm'>;
  readonly units: UnitSystem;
}

const CURVES = [
  { key: 'rainMm', label: 'Cumulative rainfall', className: 'mass-curve__rain' },
  { key: 'lossMm', label: 'Cumulative loss', className: 'mass-curve__loss' },
  { key: 'excessMm', label: 'Cumulative excess', className: 'mass-curve__excess' },
] as const;

/**
 * The storm's mass curve over the hyetograph (issue 16): cumulative rainfall,
 * loss and rainfall excess from the storm start, in depth, on a scale of its
 * own at the right-hand edge. Drawn in a layer of its own over the chart that
 * lets the pointer through, so the loss line is dragged as before; loaded the
 * first time it is switched on.
 */
export function MassCurve({ frame, storm, result, units }: MassCurveProps) {
  const curve = massCurveOf(storm.depthsMm, result);
  const n = curve.rainMm.length;
  const depthUnit = unitText(displayUnit('depth', units));
  const totalDisplay = n === 0 ? 0 : toDisplay('depth', curve.rainMm[n - 1] as number, units);
  // The scale in the units on screen, rounded there so its ticks are round numbers.
  const yDisplay = scaleLinear()
    .domain([0, totalDisplay > 0 ? totalDisplay : 1])
    .range([frame.plot.bottom, frame.plot.top])
    .nice(5);
  const y = (mm: number): number => yDisplay(toDisplay('depth', mm, units));
  const paths = CURVES.map((c) => ({ ...c, d: cumulativePath(frame.edgesPx, curve[c.key], y) }));
  const end = (a: Float64Array): string =>
    `${formatValue(n === 0 ? 0 : toDisplay('depth', a[n - 1] as number, units))} ${depthUnit}`;
  const summary =
    `Mass curve, cumulative depth from the storm start: by the end ${end(curve.rainMm)} of rainfall, ` +
    `${end(curve.lossMm)} of loss, ${end(curve.excessMm)} of excess.`;
  const { plot } = frame;
  return (
    <div className="mass-curve" data-layer="mass-curve">
      <svg className="mass-curve__svg" width={frame.width} height={frame.height} role="img" aria-label={summary}>
        <g className="mass-curve__axis" aria-hidden="true">
          <line x1={plot.right} x2={plot.right} y1={plot.top} y2={plot.bottom} />
          {yDisplay.ticks(5).map((v) => (
            <g key={v} transform={`translate(${plot.right},${yDisplay(v)})`}>
              <line x2={-5} />
              {/* In the chart's right margin, clear of the curves, which all end at the right-hand edge. */}
              <text x={3} dy="0.32em">
                {formatValue(v)}
              </text>
            </g>
          ))}
        </g>
        {paths.map((p) => (
          <g key={p.key} className={p.className} data-curve={p.key}>
            <path className="mass-curve__halo" d={p.d} />
            <path className="mass-curve__line" d={p.d} />
          </g>
        ))}
      </svg>
      <ul className="legend mass-curve__legend" aria-label="Mass curve legend">
        <li className="mass-curve__scale">Cumulative depth ({depthUnit}), scale at right:</li>
        {CURVES.map((c) => (
          <li key={c.key}>
            <span className={`mass-curve__swatch ${c.className}`} aria-hidden="true" /> {c.label}
          </li>
        ))}
      </ul>
    </div>
  );
}
