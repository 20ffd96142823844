import { useEffect, useRef, type KeyboardEvent, type PointerEvent } from 'react';
import type { UnitSystem } from '../../core';
import { useActions } from '../../store';
import { formatValue } from '../format';
import { displayUnit, fromDisplay, toDisplay, unitText } from '../units';
import { fineStep, grabOffsetPx, valueAfterKey, valueAtPointer } from './drag-math';
import type { ChartFrame } from './frame';
import { frameThrottle, type FrameThrottle } from './frame-throttle';

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

interface Drag {
  readonly pointerId: number;
  readonly grabPx: number;
  readonly throttle: FrameThrottle<number>;
}

/**
 * The loss-rate line: a slider drawn across the chart. Drag with the pointer
 * (pointer capture; one store update per frame; the whole drag is one undo
 * step) or step it with the keys (arrows fine, Page Up/Down coarse, Home/End).
 */
export function LossLine({ frame, paramKey, label, valueMmH, minMmH, system, locked }: LossLineProps) {
  const actions = useActions();
  const drag = useRef<Drag | null>(null);
  const { plot, y, topMmH, topDisplay } = frame;
  const above = valueMmH > topMmH;
  const yPx = y(Math.min(valueMmH, topMmH));
  const unit = unitText(displayUnit('rate', system));
  const shown = toDisplay('rate', valueMmH, system);
  const valueText = `${formatValue(shown)} ${unit}${above ? ', above the top of the chart' : ''}${locked ? ', kept matched to the observed runoff' : ''}`;
  const step = fineStep(topDisplay);

  // A drag still running when the line goes away (method switched) is finished, not lost.
  useEffect(
    () => () => {
      if (drag.current) {
        drag.current.throttle.flush();
        drag.current = null;
        actions.endGesture();
      }
    },
    [actions],
  );

  const pointerPx = (e: PointerEvent<SVGGElement>): number => {
    const svg = e.currentTarget.ownerSVGElement;
    return e.clientY - (svg ? svg.getBoundingClientRect().top : 0);
  };

  const onPointerDown = (e: PointerEvent<SVGGElement>): void => {
    if (locked || e.button !== 0 || drag.current) return;
    e.preventDefault();
    const el = e.currentTarget;
    el.focus({ preventScroll: true });
    el.setPointerCapture?.(e.pointerId);
    actions.beginGesture(`Drag ${label.toLowerCase()}`);
    drag.current = {
      pointerId: e.pointerId,
      grabPx: grabOffsetPx(y, pointerPx(e), Math.min(valueMmH, topMmH)),
      throttle: frameThrottle((v: number) => actions.setParam(paramKey, v)),
    };
  };

  const onPointerMove = (e: PointerEvent<SVGGElement>): void => {
    const d = drag.current;
    if (!d || e.pointerId !== d.pointerId) return;
    d.throttle.push(valueAtPointer(y, pointerPx(e), d.grabPx, minMmH, topMmH));
  };

  const finish = (e: PointerEvent<SVGGElement>, keep: boolean): void => {
    const d = drag.current;
    if (!d || e.pointerId !== d.pointerId) return;
    drag.current = null;
    if (keep) {
      d.throttle.flush();
      actions.endGesture();
    } else {
      d.throttle.cancel();
      actions.cancelGesture();
    }
    if (e.currentTarget.hasPointerCapture?.(e.pointerId)) e.currentTarget.releasePointerCapture(e.pointerId);
  };

  const onKeyDown = (e: KeyboardEvent<SVGGElement>): void => {
    if (e.key === 'Escape' && drag.current) {
      e.preventDefault();
      drag.current.throttle.cancel();
      drag.current = null;
      actions.cancelGesture();
      return;
    }
    if (locked || drag.current) return;
    const next = valueAfterKey(e.key, Math.min(shown, topDisplay), {
      step,
      coarse: step * 10,
      min: toDisplay('rate', minMmH, system),
      max: topDisplay,
    });
    if (next === null) return;
    e.preventDefault();
    const nextMmH = e.key === 'End' ? topMmH : e.key === 'Home' ? minMmH : fromDisplay('rate', next, system);
    actions.setParam(paramKey, nextMmH, { coalesceKey: `line:${paramKey}` });
  };

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
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={(e) => finish(e, true)}
      onPointerCancel={(e) => finish(e, false)}
      onLostPointerCapture={(e) => finish(e, true)}
      onKeyDown={onKeyDown}
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
