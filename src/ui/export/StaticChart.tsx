import type { Scenario } from '../../scenario/types';
import { Axes } from '../chart/Axes';
import type { ChartFrame } from '../chart/frame';
import { LossLayer } from '../chart/LossLayer';
import { RainLayer } from '../chart/RainLayer';
// Its styles, and the report's print styles, come with the code that draws it (the comparison, the report).
import './export.css';

export interface StaticChartProps {
  readonly frame: ChartFrame;
  readonly storm: Scenario['storm'];
  /** The core's loss per bar, or null when losses cannot be worked out (rain only is drawn). */
  readonly lossMm: Float64Array | null;
  /** A loss rate to draw as a line, mm/h, or null. */
  readonly lineMmH: number | null;
  /** What the chart shows, for assistive technology. */
  readonly label: string;
  readonly className?: string;
}

/**
 * A hyetograph that only shows: the workbench chart's own axes and layers
 * (so it looks the same) without the draggable line, for the printed report
 * and the comparison. It scales to the width of its box (viewBox).
 */
export function StaticChart({ frame, storm, lossMm, lineMmH, label, className }: StaticChartProps) {
  const { plot } = frame;
  const lineY = lineMmH !== null && lineMmH <= frame.topMmH ? frame.y(lineMmH) : null;
  return (
    <svg
      className={`static-chart${className ? ` ${className}` : ''}`}
      width={frame.width}
      height={frame.height}
      viewBox={`0 0 ${frame.width} ${frame.height}`}
      role="img"
      aria-label={label}
    >
      <Axes frame={frame} />
      <RainLayer frame={frame} storm={storm} />
      {lossMm ? <LossLayer frame={frame} storm={storm} lossMm={lossMm} partMm={null} /> : null}
      {lineY !== null ? (
        <line className="static-chart__line" x1={plot.left} x2={plot.right} y1={lineY} y2={lineY} />
      ) : null}
    </svg>
  );
}
