import { memo, useMemo } from 'react';
import {
  baseflowMethodSpec,
  dischargeAtH,
  findPeakIndex,
  type BaseflowResult,
  type StraightLineBaseflow,
  type UnitSystem,
} from '../../core';
import type { Streamflow } from '../../scenario/types';
import { useDerived, useScenario, type Separation } from '../../store';
import { Axes } from '../chart/Axes';
import { useTimeSpanH } from '../chart/time-span';
import { useElementWidth } from '../chart/useElementWidth';
import { dischargeText } from './discharge';
import { EndPointHandle } from './EndPointHandle';
import { placeEndHandle } from './end-point-math';
import { HYDROGRAPH_HEIGHT, hydrographFrame, type HydrographFrame } from './hydrograph-frame';
import { baseflowPath, directRunoffPath, seriesPath } from './hydrograph-paths';
import { OffsetControl } from './OffsetControl';
import { hoursText, momentText, recordClock, type RecordClock } from './time-text';
import { formatCount } from '../format';

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

/** The chart itself, mounted with the record so it measures its own width. */
export function HydrographPlot({ flow }: { flow: Streamflow }) {
  const [boxRef, width] = useElementWidth<HTMLDivElement>(880);
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const separation = useDerived((d, s) => d.separation(s));
  const alignment = useDerived((d, s) => d.alignment(s));
  const span = useTimeSpanH();
  const offsetH = alignment?.offsetH ?? 0;

  const peakM3s = useMemo(() => flow.dischargeM3s[findPeakIndex(flow.dischargeM3s)] as number, [flow.dischargeM3s]);
  const frame = useMemo(
    () => hydrographFrame(storm, peakM3s, offsetH, width, HYDROGRAPH_HEIGHT, units, span),
    [storm, peakM3s, offsetH, width, units, span],
  );
  const clock = recordClock(flow.startIso, storm.startIso, offsetH);
  const method = flow.baseflow;
  const endParam =
    method.kind === 'straight-line'
      ? baseflowMethodSpec('straight-line').params.find((p) => p.key === 'endTimeH')
      : undefined;
  const handle =
    method.kind === 'straight-line' && endParam
      ? placeEndHandle(flow, method as StraightLineBaseflow, separation?.ok ? separation.result : null)
      : null;

  return (
    <>
      <div className="chart__box" ref={boxRef}>
        <svg
          className="chart__svg"
          width={width}
          height={HYDROGRAPH_HEIGHT}
          role="group"
          aria-labelledby="hydrograph-title"
        >
          <Axes frame={frame} />
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
        </svg>
      </div>
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
