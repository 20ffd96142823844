import { scaleLinear } from 'd3-scale';
import type { Storm } from '../../core';
import { formatCount, formatValue } from '../format';

/** A small hyetograph of the design storm: each bar's rain, its excess part darker. */
export function StormBars({
  storm,
  excessMm,
  description,
}: {
  storm: Storm;
  excessMm: ArrayLike<number> | null;
  description: string;
}) {
  const W = 420;
  const H = 160;
  const M = { top: 8, right: 8, bottom: 26, left: 44 };
  const n = storm.depthsMm.length;
  let total = 0;
  let peak = 0;
  let peakAt = 0;
  const starts: number[] = [];
  for (let k = 0; k < n; k++) {
    starts.push(total);
    total += storm.durationsH[k] as number;
    const i = (storm.depthsMm[k] as number) / (storm.durationsH[k] as number);
    if (i > peak) {
      peak = i;
      peakAt = k;
    }
  }
  const x = scaleLinear()
    .domain([0, total])
    .range([M.left, W - M.right]);
  const y = scaleLinear()
    .domain([0, peak || 1])
    .nice()
    .range([H - M.bottom, M.top]);
  const label = `${description}: ${formatCount(n)} bars, peak intensity ${formatValue(peak)} mm/h in bar ${peakAt + 1}.`;
  return (
    <figure className="design-bars">
      <svg viewBox={`0 0 ${W} ${H}`} width="100%" role="img" aria-label={label}>
        {y.ticks(4).map((t) => (
          <g key={t} transform={`translate(0,${y(t)})`}>
            <line className="axes__grid" x1={M.left} x2={W - M.right} />
            <text className="axes__label" x={M.left - 5} dy="0.32em" textAnchor="end">
              {formatValue(t)}
            </text>
          </g>
        ))}
        {Array.from({ length: n }, (_, k) => {
          const d = storm.durationsH[k] as number;
          const rain = (storm.depthsMm[k] as number) / d;
          const ex = excessMm ? (excessMm[k] as number) / d : 0;
          const x0 = x(starts[k] as number);
          const w = Math.max(0.5, x((starts[k] as number) + d) - x0 - 0.5);
          return (
            <g key={k}>
              <rect className="layer--loss" x={x0} width={w} y={y(rain)} height={y(0) - y(rain)} />
              <rect className="layer--excess" x={x0} width={w} y={y(ex)} height={y(0) - y(ex)} />
            </g>
          );
        })}
        <line className="axes__line" x1={M.left} x2={W - M.right} y1={y(0)} y2={y(0)} />
        <text className="axes__title" x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle">
          {formatValue(total)} h; intensity in mm/h
        </text>
      </svg>
      <figcaption className="design-bars__caption">{label}</figcaption>
    </figure>
  );
}
