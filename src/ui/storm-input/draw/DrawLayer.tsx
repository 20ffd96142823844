import { useEffect, useLayoutEffect, useRef, useState, type PointerEvent, type RefObject } from 'react';
import { useActions, useScenario } from '../../../store';
import { chartFrame, intensityPath, type ChartFrame } from '../../chart/frame';
import { frameThrottle, type FrameThrottle } from '../../interaction/frame-throttle';
import { useChartHeight } from '../../chart/chart-height';
import { useTimeSpanH } from '../../chart/time-span';
import { paintSegment, rateAtPointer, type StrokePoint } from './draw-math';

// The layer that takes the pointer in drawing mode: loaded when drawing first
// starts (DrawableChart), not part of the first screen.

/** Where the chart's svg sits inside the wrapper, px. */
interface Box {
  readonly left: number;
  readonly top: number;
  readonly width: number;
}

interface Stroke {
  readonly pointerId: number;
  /** The chart as it was when the stroke began: the stroke is drawn and read against it. */
  readonly frame: ChartFrame;
  readonly box: Box;
  /** Rates may go a little past the top of the axis, up to the top of the svg. */
  readonly maxMmH: number;
  /** The storm's bars at the start, and the depths as drawn so far. */
  readonly durationsH: readonly number[];
  readonly before: readonly number[];
  readonly depthsMm: Float64Array;
  last: StrokePoint;
  readonly throttle: FrameThrottle<null>;
}

function chartSvg(wrap: HTMLElement): SVGSVGElement | null {
  return wrap.querySelector<SVGSVGElement>('svg.chart__svg') ?? wrap.querySelector('svg');
}

function measure(wrap: HTMLElement): Box | null {
  const svg = chartSvg(wrap);
  if (!svg) return null;
  const r = svg.getBoundingClientRect();
  const w = wrap.getBoundingClientRect();
  const width = Number(svg.getAttribute('width')) || r.width;
  return { left: r.left - w.left, top: r.top - w.top, width };
}

export function DrawLayer({ wrapRef }: { wrapRef: RefObject<HTMLDivElement | null> }) {
  const actions = useActions();
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  // The hyetograph's own time axis (shared with a streamflow record when there is one).
  const span = useTimeSpanH();
  const height = useChartHeight();
  const stroke = useRef<Stroke | null>(null);
  const [box, setBox] = useState<Box | null>(null);
  const [, setVersion] = useState(0);

  useLayoutEffect(() => {
    const wrap = wrapRef.current;
    if (!wrap) return;
    setBox(measure(wrap));
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(() => setBox(measure(wrap)));
    observer.observe(wrap);
    return () => observer.disconnect();
  }, [wrapRef]);

  const drop = (): void => {
    const s = stroke.current;
    if (!s) return;
    s.throttle.cancel();
    stroke.current = null;
    setVersion((v) => v + 1);
  };

  // Esc drops a stroke in progress; the layer going away (drawing switched off) drops it too.
  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      if (e.key === 'Escape' && stroke.current) {
        e.preventDefault();
        drop();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => {
      window.removeEventListener('keydown', onKey);
      stroke.current?.throttle.cancel();
      stroke.current = null;
    };
  }, []);

  const n = storm.depthsMm.length;
  const frame = box ? chartFrame(storm, box.width, height, units, span) : null;

  const pointIn = (s: Pick<Stroke, 'frame' | 'box' | 'maxMmH'>, e: PointerEvent<HTMLDivElement>): StrokePoint => {
    const wrap = wrapRef.current;
    const origin = wrap ? wrap.getBoundingClientRect() : { left: 0, top: 0 };
    const x = e.clientX - origin.left - s.box.left;
    const y = e.clientY - origin.top - s.box.top;
    const { plot, topDisplay } = s.frame;
    return {
      x: Math.min(Math.max(x, plot.left), plot.right),
      rateMmH: rateAtPointer(s.frame.y, y, s.maxMmH, topDisplay, units),
    };
  };

  const paint = (s: Stroke, from: StrokePoint, to: StrokePoint): void => {
    paintSegment(s.frame.edgesPx, from, to, (k, rateMmH) => {
      s.depthsMm[k] = rateMmH * (s.durationsH[k] as number);
    });
  };

  const onPointerDown = (e: PointerEvent<HTMLDivElement>): void => {
    if (e.button !== 0 || stroke.current || n === 0) return;
    const wrap = wrapRef.current;
    const at = wrap ? measure(wrap) : null;
    if (!at) return;
    e.preventDefault();
    e.currentTarget.setPointerCapture?.(e.pointerId);
    const f = chartFrame(storm, at.width, height, units, span);
    // The axis follows the pointer: above the plot (the pointer is captured) a stroke goes on rising on the
    // stroke's own scale, up to three plot heights over the top, and the axis grows to the result when the stroke
    // ends. Before, a stroke stopped at the chart's top and an empty storm's 10 mm/h axis took many strokes to grow.
    const reachPx = f.plot.top - 3 * (f.plot.bottom - f.plot.top);
    const base = { frame: f, box: at, maxMmH: Math.max(f.y.invert(reachPx), f.topMmH) };
    const first = pointIn(base, e);
    const s: Stroke = {
      ...base,
      pointerId: e.pointerId,
      durationsH: Array.from(storm.durationsH),
      before: Array.from(storm.depthsMm),
      depthsMm: Float64Array.from(storm.depthsMm),
      last: first,
      throttle: frameThrottle(() => setVersion((v) => v + 1)),
    };
    paint(s, first, first);
    stroke.current = s;
    setBox(at);
    setVersion((v) => v + 1);
  };

  const onPointerMove = (e: PointerEvent<HTMLDivElement>): void => {
    const s = stroke.current;
    if (!s || e.pointerId !== s.pointerId) return;
    const next = pointIn(s, e);
    paint(s, s.last, next);
    s.last = next;
    s.throttle.push(null);
  };

  const finish = (e: PointerEvent<HTMLDivElement>, keep: boolean): void => {
    const s = stroke.current;
    if (!s || e.pointerId !== s.pointerId) return;
    if (keep) {
      const next = pointIn(s, e);
      paint(s, s.last, next);
    }
    s.throttle.cancel();
    stroke.current = null;
    if (e.currentTarget.hasPointerCapture?.(e.pointerId)) e.currentTarget.releasePointerCapture(e.pointerId);
    const changed = keep && s.depthsMm.some((v, k) => v !== s.before[k]);
    if (changed) {
      const drawn = {
        durationsH: s.durationsH,
        depthsMm: s.depthsMm,
        ...(storm.startIso === undefined ? {} : { startIso: storm.startIso }),
      };
      actions.setStorm(drawn, 'Draw bars');
    }
    setVersion((v) => v + 1);
  };

  const s = stroke.current;
  const shown = s ? s.frame : frame;
  const at = s ? s.box : box;
  const preview = s ? intensityPath(s.frame, s.depthsMm, s.durationsH) : null;

  return (
    <div
      className={`draw-layer${s ? ' draw-layer--stroke' : ''}`}
      role="application"
      aria-label="Drawing area: press and sweep across the chart to set bar heights"
      aria-describedby="draw-panel-title"
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={(e) => finish(e, true)}
      onPointerCancel={(e) => finish(e, false)}
      onLostPointerCapture={(e) => finish(e, true)}
    >
      {shown && at ? (
        <svg
          className="draw-layer__svg"
          width={shown.width}
          height={shown.height}
          style={{ left: at.left, top: at.top }}
          aria-hidden="true"
        >
          <rect
            className="draw-layer__plot"
            x={shown.plot.left}
            y={shown.plot.top}
            width={shown.plot.right - shown.plot.left}
            height={shown.plot.bottom - shown.plot.top}
          />
          {preview !== null ? (
            <>
              <rect
                className="draw-layer__veil"
                x={shown.plot.left}
                y={0}
                width={shown.plot.right - shown.plot.left}
                height={shown.plot.bottom}
              />
              <path className="draw-layer__bars" d={preview} data-layer="drawn" />
            </>
          ) : null}
          {n === 0 ? (
            <text
              className="draw-layer__empty"
              x={(shown.plot.left + shown.plot.right) / 2}
              y={shown.plot.top + 28}
              textAnchor="middle"
            >
              Start a new empty storm to draw on
            </text>
          ) : null}
        </svg>
      ) : null}
    </div>
  );
}
