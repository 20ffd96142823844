import { memo } from 'react';
import type { ChartFrame } from './frame';

/** What the axes read from a frame (the hyetograph's, or the hydrograph's below it). */
export type AxesFrame = Pick<ChartFrame, 'plot' | 'xTicks' | 'yTicks' | 'height' | 'xTitle' | 'yTitle'>;

/** Axes, grid lines and titles. Depends on the frame only, so a drag never redraws it. */
export const Axes = memo(function Axes({ frame }: { frame: AxesFrame }) {
  const { plot, xTicks, yTicks } = frame;
  return (
    <g className="axes" aria-hidden="true">
      {yTicks.map((t) => (
        <g key={`y${t.label}`} transform={`translate(0,${t.px})`}>
          <line className="axes__grid" x1={plot.left} x2={plot.right} />
          <text className="axes__label" x={plot.left - 8} dy="0.32em" textAnchor="end">
            {t.label}
          </text>
        </g>
      ))}
      <line className="axes__line" x1={plot.left} x2={plot.right} y1={plot.bottom} y2={plot.bottom} />
      <line className="axes__line" x1={plot.left} x2={plot.left} y1={plot.top} y2={plot.bottom} />
      {xTicks.map((t, i) => (
        <g key={`x${i}`} transform={`translate(${t.px},${plot.bottom})`}>
          <line className="axes__tick" y2={5} />
          <text className="axes__label" y={18} textAnchor="middle">
            {t.label}
          </text>
        </g>
      ))}
      <text className="axes__title" x={(plot.left + plot.right) / 2} y={frame.height - 6} textAnchor="middle">
        {frame.xTitle}
      </text>
      <text
        className="axes__title"
        transform={`translate(14,${(plot.top + plot.bottom) / 2}) rotate(-90)`}
        textAnchor="middle"
      >
        {frame.yTitle}
      </text>
    </g>
  );
});
