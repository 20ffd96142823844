import type { UnitSystem } from '../../core';
import { useActions } from '../../store';
import { formatValue } from '../format';
import { useDragHandle } from '../interaction/useDragHandle';
import { displayUnit, fromDisplay, toDisplay, unitText } from '../units';
import { clamp, fineStep, grabOffsetPx, snapToStep, valueAfterKey, valueAtPointer } from './drag-math';
import type { ChartFrame } from './frame';
import { labelInSentence } from '../../scenario/label-text';

export interface LossLineProps {
  readonly frame: ChartFrame;
  /** The parameter the line is, and its label (from the METHODS table). */
  readonly paramKey: string;
  readonly label: string;
  /** The value shown (the effective one: the fitted value while matched), mm/h. */
  readonly valueMmH: number;
  readonly minMmH: number;
  readonly system: UnitSystem;
  /** Matched to the observed runoff: shown, but not movable. */
  readonly locked: boolean;
}

/**
 * The loss-rate line: a slider drawn across the chart. Drag with the pointer
 * (pointer capture; one store update per frame; the whole drag is one undo
 * step) or step it with the keys (arrows fine, Page Up/Down coarse, Home/End).
 */
export function LossLine({ frame, paramKey, label, valueMmH, minMmH, system, locked }: LossLineProps) {
  const actions = useActions();
  const { plot, y, topMmH, topDisplay } = frame;
  const above = valueMmH > topMmH;
  const yPx = y(Math.min(valueMmH, topMmH));
  const unit = unitText(displayUnit('rate', system));
  const shown = toDisplay('rate', valueMmH, system);
  const valueText = `${formatValue(shown)} ${unit}${above ? ', above the top of the chart' : ''}${locked ? ', kept matched to the observed runoff' : ''}`;
  const step = fineStep(topDisplay);

  const handlers = useDragHandle({
    axis: 'y',
    gesture: `Drag ${labelInSentence(label)}`,
    disabled: locked,
    grabOffsetPx: (px) => grabOffsetPx(y, px, Math.min(valueMmH, topMmH)),
    // The pointer's value lands on the arrow keys' step, in the units on screen, so a drag gives 6.2 mm/h, not 6.2137….
    valueAt: (px, grabPx) => {
      const atPointer = valueAtPointer(y, px, grabPx, minMmH, topMmH);
      const snapped = fromDisplay('rate', snapToStep(toDisplay('rate', atPointer, system), step), system);
      return clamp(snapped, minMmH, topMmH);
    },
    apply: (v) => actions.setParam(paramKey, v),
    stepKey: (key) => {
      const next = valueAfterKey(key, Math.min(shown, topDisplay), {
        step,
        coarse: step * 10,
        min: toDisplay('rate', minMmH, system),
        max: topDisplay,
      });
      if (next === null) return false;
      const nextMmH = key === 'End' ? topMmH : key === 'Home' ? minMmH : fromDisplay('rate', next, system);
      actions.setParam(paramKey, nextMmH, { coalesceKey: `line:${paramKey}` });
      return true;
    },
  });

  const labelText = `${label} ${formatValue(shown)} ${unit}${above ? ' ↑' : ''}`;
  const labelWidth = Math.max(90, labelText.length * 7 + 16);
  return (
    <g
      className={`loss-line${locked ? ' loss-line--locked' : ''}`}
      role="slider"
      tabIndex={0}
      aria-label={label}
      aria-orientation="vertical"
      aria-valuemin={toDisplay('rate', minMmH, system)}
      aria-valuemax={topDisplay}
      aria-valuenow={shown}
      aria-valuetext={valueText}
      aria-disabled={locked ? true : undefined}
      {...handlers}
      data-value-mmh={valueMmH}
    >
      <line className="loss-line__hit" x1={plot.left} x2={plot.right} y1={yPx} y2={yPx} />
      <line className="loss-line__halo" x1={plot.left} x2={plot.right} y1={yPx} y2={yPx} />
      <line className="loss-line__stroke" x1={plot.left} x2={plot.right} y1={yPx} y2={yPx} />
      <g transform={`translate(${plot.right - labelWidth},${Math.max(plot.top, yPx - 26)})`} aria-hidden="true">
        <rect className="loss-line__tag" width={labelWidth} height={20} rx={4} />
        <text className="loss-line__tag-text" x={8} y={14}>
          {labelText}
        </text>
      </g>
    </g>
  );
}
