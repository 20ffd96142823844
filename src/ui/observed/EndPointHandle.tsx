import { attempt, type UnitSystem } from '../../core';
import { useActions, withBaseflowParam } from '../../store';
import { valueAfterKey } from '../chart/drag-math';
import { formatValue } from '../format';
import { useDragHandle } from '../interaction/useDragHandle';
import { dischargeText } from './discharge';
import { endGrabOffsetPx, endPointSteps, endTimeAtPointer, type EndBounds } from './end-point-math';
import type { HydrographFrame } from './hydrograph-frame';
import { clockAt, momentText, type RecordClock } from './time-text';
import { labelInSentence } from '../../scenario/label-text';

export interface EndPointHandleProps {
  readonly frame: HydrographFrame;
  /** The parameter the handle sets and its label, from BASEFLOW_METHODS. */
  readonly paramKey: string;
  readonly label: string;
  /** Where the handle stands: h after the first sample, and the discharge there (core's dischargeAtH). */
  readonly endTimeH: number;
  readonly endM3s: number;
  readonly bounds: EndBounds;
  readonly clock: RecordClock;
  readonly system: UnitSystem;
  /** True while the end is N = A^0.2 days after the peak (moving it sets it by hand). */
  readonly automatic: boolean;
}

/**
 * The end of direct runoff for the straight-line separation, as a handle on
 * the recession: drag it along the time axis (pointer capture, one store
 * update per frame, the whole drag one undo step; Escape puts it back) or
 * step it with the keys (arrows fine, Page Up/Down coarse, Home/End the
 * ends). The discharge under it comes from the core; the handle only says
 * when.
 */
export function EndPointHandle({
  frame,
  paramKey,
  label,
  endTimeH,
  endM3s,
  bounds,
  clock,
  system,
  automatic,
}: EndPointHandleProps) {
  const actions = useActions();
  const { x, y, plot, offsetH } = frame;
  const cx = x(endTimeH + offsetH);
  const cy = y(endM3s);
  const { step, coarse } = endPointSteps(bounds);

  const setEnd = (tH: number, coalesceKey?: string): void => {
    // The bounds keep the handle where the core accepts it; a refusal leaves the record as it was.
    attempt(() =>
      actions.edit(
        `Move ${labelInSentence(label)}`,
        (s) => withBaseflowParam(s, paramKey, tH),
        coalesceKey ? { coalesceKey } : {},
      ),
    );
  };

  const handlers = useDragHandle({
    axis: 'x',
    gesture: `Drag ${labelInSentence(label)}`,
    grabOffsetPx: (px) => endGrabOffsetPx(x, px, endTimeH, offsetH),
    valueAt: (px, grabPx) => endTimeAtPointer(x, px, grabPx, offsetH, bounds),
    apply: (tH) => setEnd(tH),
    stepKey: (key) => {
      const next = valueAfterKey(key, endTimeH, { step, coarse, min: bounds.minH, max: bounds.maxH });
      if (next === null) return false;
      setEnd(next, `end:${paramKey}`);
      return true;
    },
  });

  const at = clockAt(clock, endTimeH);
  const valueText =
    `${momentText(clock, endTimeH)}, ${dischargeText(endM3s, system)} on the recession` +
    (automatic ? ', at N = A^0.2 days after the peak' : '');
  const tagText = `End ${at === null ? `${formatValue(endTimeH)} h` : at.slice(-5)}`;
  const tagWidth = tagText.length * 7 + 16;
  const tagX = Math.min(Math.max(cx - tagWidth / 2, plot.left), plot.right - tagWidth);
  return (
    <g
      className={`end-handle${automatic ? ' end-handle--auto' : ''}`}
      role="slider"
      tabIndex={0}
      aria-label={label}
      aria-orientation="horizontal"
      aria-valuemin={bounds.minH}
      aria-valuemax={bounds.maxH}
      aria-valuenow={endTimeH}
      aria-valuetext={valueText}
      {...handlers}
      data-end-h={endTimeH}
    >
      <line className="end-handle__hit" x1={cx} x2={cx} y1={plot.top} y2={plot.bottom} />
      <line className="end-handle__guide" x1={cx} x2={cx} y1={plot.top + 22} y2={plot.bottom} />
      <circle className="end-handle__halo" cx={cx} cy={cy} r={11} />
      <circle className="end-handle__knob" cx={cx} cy={cy} r={6.5} />
      <g transform={`translate(${tagX},${plot.top})`} aria-hidden="true">
        <rect className="end-handle__tag" width={tagWidth} height={20} rx={4} />
        <text className="end-handle__tag-text" x={8} y={14}>
          {tagText}
        </text>
      </g>
    </g>
  );
}
