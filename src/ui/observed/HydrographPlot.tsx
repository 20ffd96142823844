import { memo, useId, useMemo } from 'react';
import {
  baseflowEndPoint,
  baseflowMethodSpec,
  baseflowNumber,
  dischargeAtH,
  findPeakIndex,
  type BaseflowResult,
  type UnitSystem,
} from '../../core';
import type { Streamflow } from '../../scenario/types';
import { useDerived, useScenario, type Separation } from '../../store';
import { useDeferredDerived } from '../../store/deferred';
import { Axes } from '../chart/Axes';
import { useTimeSpanH } from '../chart/time-span';
import { useElementWidth } from '../chart/useElementWidth';
import { dischargeText } from './discharge';
import { EndPointHandle } from './EndPointHandle';
import { placeEndHandle } from './end-point-math';
import { ComputedLayer, computedPeakM3s } from './ComputedLayer';
import { HYDROGRAPH_HEIGHT, dischargeAxisTop, hydrographFrameToTop, type HydrographFrame } from './hydrograph-frame';
import { baseflowPath, directRunoffPath, seriesPath } from './hydrograph-paths';
import { OffsetControl } from './OffsetControl';
import { hoursText, momentText, recordClock, type RecordClock } from './time-text';
import { formatCount } from '../format';
import './observed.css';

/** The record's discharge line: depends on the record and the frame only, so moving the end point never redraws it. */
const DischargeLayer = memo(function DischargeLayer({ flow, frame }: { flow: Streamflow; frame: HydrographFrame }) {
  const d = useMemo(
    () => seriesPath(flow.timesH, flow.dischargeM3s, frame.offsetH, frame.x, frame.y),
    [flow.timesH, flow.dischargeM3s, frame],
  );
  return <path className="hydro__discharge" d={d} data-layer="discharge" />;
});

/** The core's separation: the shaded direct runoff and the baseflow line over its window. */
function SeparationLayer({
  flow,
  frame,
  result,
}: {
  flow: Streamflow;
  frame: HydrographFrame;
  result: BaseflowResult;
}) {
  const { fill, line } = useMemo(() => {
    const w = { startIndex: result.riseIndex, endTimeH: result.endTimeH, endM3s: endDischarge(flow, result) };
    return {
      fill: directRunoffPath(flow.timesH, flow.dischargeM3s, result.baseflowM3s, w, frame.offsetH, frame.x, frame.y),
      line: baseflowPath(flow.timesH, result.baseflowM3s, w, frame.offsetH, frame.x, frame.y),
    };
  }, [flow, frame, result]);
  const rise = result.riseIndex;
  const peak = result.peakIndex;
  return (
    <g>
      <path className="hydro__direct" d={fill} data-layer="direct-runoff" />
      <path className="hydro__baseflow" d={line} data-layer="baseflow" />
      <circle
        className="hydro__mark"
        cx={frame.x((flow.timesH[rise] as number) + frame.offsetH)}
        cy={frame.y(flow.dischargeM3s[rise] as number)}
        r={3.5}
        data-mark="rise"
      />
      <circle
        className="hydro__mark hydro__mark--peak"
        cx={frame.x((flow.timesH[peak] as number) + frame.offsetH)}
        cy={frame.y(flow.dischargeM3s[peak] as number)}
        r={3.5}
        data-mark="peak"
      />
    </g>
  );
}

/**
 * Discharge on the record at the end of the window, where the line methods
 * meet the hydrograph (read only when the end falls between samples).
 */
function endDischarge(flow: Streamflow, result: BaseflowResult): number {
  return dischargeAtH(flow.timesH, flow.dischargeM3s, result.endTimeH);
}

function summaryOf(flow: Streamflow, sep: Separation | null, clock: RecordClock, units: UnitSystem): string {
  const n = flow.timesH.length;
  const span = (flow.timesH[n - 1] as number) - (flow.timesH[0] as number);
  const peakAt = sep?.ok ? sep.result.peakIndex : findPeakIndex(flow.dischargeM3s);
  const head =
    `Hydrograph: ${formatCount(n)} samples over ${hoursText(span)}, peak ${dischargeText(flow.dischargeM3s[peakAt] as number, units)} ` +
    `at ${momentText(clock, flow.timesH[peakAt] as number)}`;
  if (!sep) return `${head}.`;
  const label = baseflowMethodSpec(sep.method.kind).label.toLowerCase();
  return sep.ok
    ? `${head}; baseflow separated by ${label}, shaded direct runoff above it.`
    : `${head}; baseflow not separated.`;
}

/** Room above and below the plot inside the clip, so a line along the top or the zero line keeps its full stroke. */
const CLIP_LINE_PX = 2;

/**
 * The chart itself, mounted with the record or a computed hydrograph so it
 * measures its own width: the record and its separation when there is one,
 * the computed direct runoff (and total flow) over it, or the computed
 * hydrograph alone.
 */
export function HydrographPlot({
  flow,
  labelledBy = 'hydrograph-title',
}: {
  flow: Streamflow | null;
  /** Id of the heading that names the chart (the workbench's, or another view's). */
  labelledBy?: string;
}) {
  const [boxRef, width] = useElementWidth<HTMLDivElement>(880);
  // An id fit for url(#…): React's own ids carry characters that need escaping there.
  const clipId = `hydro-plot-${useId().replace(/[^\w-]/g, '')}`;
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const computedTop = useDeferredDerived((d, s) => computedPeakM3s(d.hydrograph(s), d.totalFlow(s)));
  const span = useTimeSpanH();
  const recordPeakM3s = useMemo(
    () => (flow ? (flow.dischargeM3s[findPeakIndex(flow.dischargeM3s)] as number) : 0),
    [flow],
  );
  const alignment = useDerived((d, s) => d.alignment(s));
  const offsetH = alignment?.offsetH ?? 0;
  // A round top over the record and the computed flow: it changes only when the peaks pass a round value.
  const topDisplay = dischargeAxisTop(Math.max(recordPeakM3s, computedTop), units);
  const frame = useMemo(
    () => hydrographFrameToTop(storm, topDisplay, offsetH, width, HYDROGRAPH_HEIGHT, units, span),
    [storm, topDisplay, offsetH, width, units, span],
  );
  return (
    <>
      <div className="chart__box" ref={boxRef}>
        <svg className="chart__svg" width={width} height={HYDROGRAPH_HEIGHT} role="group" aria-labelledby={labelledBy}>
          <Axes frame={frame} />
          {flow ? <RecordLayers flow={flow} frame={frame} /> : null}
          {/* The axis ends where the unit hydrograph's recession has given nearly all its volume
              (derive-hydrograph's endH); the computed line's last, near-zero tail is cut at the plot's edge. */}
          <defs>
            <clipPath id={clipId}>
              <rect
                x={frame.plot.left}
                y={frame.plot.top - CLIP_LINE_PX}
                width={frame.plot.right - frame.plot.left}
                height={frame.plot.bottom - frame.plot.top + 2 * CLIP_LINE_PX}
              />
            </clipPath>
          </defs>
          <g clipPath={`url(#${clipId})`} data-clip="plot">
            <ComputedLayer frame={frame} />
          </g>
        </svg>
      </div>
      {flow ? <RecordNotes /> : null}
    </>
  );
}

/** The record's layers: separation, discharge and the end point to drag. */
function RecordLayers({ flow, frame }: { flow: Streamflow; frame: HydrographFrame }) {
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const separation = useDerived((d, s) => d.separation(s));
  const offsetH = frame.offsetH;
  const clock = recordClock(flow.startIso, storm.startIso, offsetH);
  const method = flow.baseflow;
  const endKey = baseflowEndPoint(method)?.key;
  const endParam =
    endKey === undefined ? undefined : baseflowMethodSpec(method.kind).params.find((p) => p.key === endKey);
  const handle = endParam
    ? placeEndHandle(
        flow,
        { riseIndex: baseflowNumber(method, 'riseIndex'), endTimeH: baseflowNumber(method, endParam.key) },
        separation?.ok ? separation.result : null,
      )
    : null;

  return (
    <>
      <g role="img" aria-label={summaryOf(flow, separation, clock, units)}>
        {separation?.ok ? <SeparationLayer flow={flow} frame={frame} result={separation.result} /> : null}
        <DischargeLayer flow={flow} frame={frame} />
      </g>
      {handle && endParam ? (
        <EndPointHandle
          frame={frame}
          paramKey={endParam.key}
          label={endParam.label}
          endTimeH={handle.endTimeH}
          endM3s={handle.endM3s}
          bounds={handle.bounds}
          clock={clock}
          system={units}
          automatic={handle.automatic}
        />
      ) : null}
    </>
  );
}

/** Below the chart with a record: its alignment, and what the separation says. */
function RecordNotes() {
  const separation = useDerived((d, s) => d.separation(s));
  return (
    <>
      <OffsetControl />
      {separation && !separation.ok ? (
        <p className="chart__error" role="alert">
          Baseflow cannot be separated: {separation.message}
        </p>
      ) : null}
      {separation?.ok && separation.result.notice ? (
        <p className="chart__notice" role="status">
          {separation.result.notice}
        </p>
      ) : null}
    </>
  );
}
