import { useEffect, useRef, type KeyboardEvent, type PointerEvent } from 'react';
import { useActions } from '../../store';
import { frameThrottle, type FrameThrottle } from './frame-throttle';

export interface DragHandleOptions {
  /** The axis the handle moves along; the pointer is measured from the SVG's left (x) or top (y), px. */
  readonly axis: 'x' | 'y';
  /** The undo label of one drag. */
  readonly gesture: string;
  /** Shown but not movable, by pointer or by keys. */
  readonly disabled?: boolean;
  /** The pointer's offset from the handle at the press, px; kept for the whole drag. */
  readonly grabOffsetPx: (pointerPx: number) => number;
  /** The value under the pointer, clamped (pure maths from the chart's scale). */
  readonly valueAt: (pointerPx: number, grabPx: number) => number;
  /** Stores a dragged value; called at most once an animation frame. */
  readonly apply: (value: number) => void;
  /** Steps the value for a key; false when the key is not one the slider uses. */
  readonly stepKey: (key: string) => boolean;
}

export interface DragHandleHandlers {
  readonly onPointerDown: (e: PointerEvent<SVGGElement>) => void;
  readonly onPointerMove: (e: PointerEvent<SVGGElement>) => void;
  readonly onPointerUp: (e: PointerEvent<SVGGElement>) => void;
  readonly onPointerCancel: (e: PointerEvent<SVGGElement>) => void;
  readonly onLostPointerCapture: (e: PointerEvent<SVGGElement>) => void;
  readonly onKeyDown: (e: KeyboardEvent<SVGGElement>) => void;
}

interface Drag {
  readonly pointerId: number;
  readonly grabPx: number;
  readonly throttle: FrameThrottle<number>;
}

/**
 * The drag protocol of a slider drawn on a chart: pointer capture, the grab
 * offset taken at the press, each move recomputed from the pointer, one store
 * update per frame, the whole drag one undo step; release keeps it, a pointer
 * cancel or Escape puts it back. Keys step the value when no drag runs.
 */
export function useDragHandle({
  axis,
  gesture,
  disabled = false,
  grabOffsetPx,
  valueAt,
  apply,
  stepKey,
}: DragHandleOptions): DragHandleHandlers {
  const actions = useActions();
  const drag = useRef<Drag | null>(null);

  // A drag still running when the handle goes away (method switched) is finished, not lost.
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
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    return axis === 'x' ? e.clientX - (box ? box.left : 0) : e.clientY - (box ? box.top : 0);
  };

  const onPointerDown = (e: PointerEvent<SVGGElement>): void => {
    if (disabled || e.button !== 0 || drag.current) return;
    e.preventDefault();
    const el = e.currentTarget;
    el.focus({ preventScroll: true });
    el.setPointerCapture?.(e.pointerId);
    actions.beginGesture(gesture);
    drag.current = { pointerId: e.pointerId, grabPx: grabOffsetPx(pointerPx(e)), throttle: frameThrottle(apply) };
  };

  const onPointerMove = (e: PointerEvent<SVGGElement>): void => {
    const d = drag.current;
    if (!d || e.pointerId !== d.pointerId) return;
    d.throttle.push(valueAt(pointerPx(e), d.grabPx));
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
    if (disabled || drag.current) return;
    if (stepKey(e.key)) e.preventDefault();
  };

  return {
    onPointerDown,
    onPointerMove,
    onPointerUp: (e) => finish(e, true),
    onPointerCancel: (e) => finish(e, false),
    onLostPointerCapture: (e) => finish(e, true),
    onKeyDown,
  };
}
