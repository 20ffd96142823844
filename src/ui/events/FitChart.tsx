import { scaleLinear } from 'd3-scale';
import { formatCount, formatValue } from '../format';
import type { FitRow } from '../../store/event-fits';

export interface FitChartProps {
  readonly rows: readonly FitRow[];
  readonly parameterLabel: string;
  /** Unit text of the shown values ('' for none). */
  readonly unit: string;
  readonly depthUnit: string;
  /** SI → shown, for the fitted value and for depths. */
  readonly showValue: (si: number) => number;
  readonly showDepth: (mm: number) => number;
  readonly designValue: number | null;
}

const W = 420;
const H = 240;
const M = { top: 14, right: 16, bottom: 42, left: 56 };

/**
 * Each event's fitted value against its storm's rainfall depth, so a trend
 * with storm size shows; the design value as a dashed line. A figure with a
 * text summary for readers who cannot see the points.
 */
export function FitChart({ rows, parameterLabel, unit, depthUnit, showValue, showDepth, designValue }: FitChartProps) {
  const points: { name: string; x: number; y: number }[] = [];
  for (const row of rows) {
    if (row.kind !== 'fit' || !row.fit.result.ok || row.fit.rainMm === null) continue;
    points.push({ name: row.event.name, x: showDepth(row.fit.rainMm), y: showValue(row.fit.result.value) });
  }
  const design = designValue === null ? null : showValue(designValue);
  // Plain loops, not Math.max(...list): a spread of a long list overflows the call stack.
  let xMax = 1;
  let yLow = Infinity;
  let yHigh = -Infinity;
  for (const p of points) {
    xMax = Math.max(xMax, p.x);
    yLow = Math.min(yLow, p.y);
    yHigh = Math.max(yHigh, p.y);
  }
  // The axis also holds 0 and the design value; 1e-9 keeps a flat zero line off the top.
  let axisLow = Math.min(0, yLow);
  let axisHigh = Math.max(1e-9, yHigh);
  if (design !== null) {
    axisLow = Math.min(axisLow, design);
    axisHigh = Math.max(axisHigh, design);
  }
  const x = scaleLinear()
    .domain([0, xMax])
    .nice()
    .range([M.left, W - M.right]);
  const y = scaleLinear()
    .domain([axisLow, axisHigh])
    .nice()
    .range([H - M.bottom, M.top]);
  const u = unit === '' ? '' : ` ${unit}`;
  const sorted = [...points].sort((p, q) => p.x - q.x);
  const first = sorted[0];
  const last = sorted[sorted.length - 1];
  const summary =
    points.length === 0
      ? `No event has a fitted ${parameterLabel.toLowerCase()} to plot.`
      : points.length === 1 || !first || !last
        ? `One event: ${parameterLabel} ${formatValue(points[0]?.y ?? NaN)}${u} at ${formatValue(points[0]?.x ?? NaN)} ${depthUnit} of rain.`
        : `${formatCount(points.length)} events, from ${formatValue(first.x)} to ${formatValue(last.x)} ${depthUnit} of rain. ` +
          `${parameterLabel} is ${formatValue(first.y)}${u} for the smallest storm and ${formatValue(last.y)}${u} for the largest; ` +
          `${points.length > 1 ? `it ranges from ${formatValue(yLow)} to ${formatValue(yHigh)}${u}` : ''}` +
          (design === null ? '.' : `; the design value ${formatValue(design)}${u} is dashed.`);
  // With nothing to plot, a plain message rather than an empty frame whose axis has no range to label.
  if (points.length === 0) {
    return (
      <figure className="fit-chart fit-chart--empty" aria-labelledby="fit-chart-caption">
        <p className="fit-chart__empty">
          Nothing to plot yet: each event with an observed runoff and a fit shows here as a point, its fitted{' '}
          {parameterLabel.toLowerCase()} against its storm’s rainfall.
        </p>
        <figcaption id="fit-chart-caption" className="visually-hidden">
          {summary}
        </figcaption>
      </figure>
    );
  }
  return (
    <figure className="fit-chart" aria-labelledby="fit-chart-caption">
      <svg viewBox={`0 0 ${W} ${H}`} width="100%" role="img" aria-label={summary} className="fit-chart__svg">
        {x.ticks(5).map((t) => (
          <g key={`x${t}`} transform={`translate(${x(t)},0)`}>
            <line className="axes__grid" y1={M.top} y2={H - M.bottom} />
            <text className="axes__label" y={H - M.bottom + 16} textAnchor="middle">
              {formatValue(t)}
            </text>
          </g>
        ))}
        {y.ticks(5).map((t) => (
          <g key={`y${t}`} transform={`translate(0,${y(t)})`}>
            <line className="axes__grid" x1={M.left} x2={W - M.right} />
            <text className="axes__label" x={M.left - 6} dy="0.32em" textAnchor="end">
              {formatValue(t)}
            </text>
          </g>
        ))}
        <line className="axes__line" x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} />
        <line className="axes__line" x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} />
        <text className="axes__title" x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle">
          Storm rainfall ({depthUnit})
        </text>
        <text
          className="axes__title"
          transform={`translate(14,${(M.top + H - M.bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
        >
          {parameterLabel}
          {u === '' ? '' : ` (${unit})`}
        </text>
        {design === null ? null : (
          <line className="fit-chart__design" x1={M.left} x2={W - M.right} y1={y(design)} y2={y(design)} />
        )}
        {points.map((p) => (
          <circle key={p.name + p.x} className="fit-chart__point" cx={x(p.x)} cy={y(p.y)} r={5}>
            <title>{`${p.name}: ${formatValue(p.y)}${u} at ${formatValue(p.x)} ${depthUnit}`}</title>
          </circle>
        ))}
      </svg>
      <figcaption id="fit-chart-caption">{summary}</figcaption>
    </figure>
  );
}
