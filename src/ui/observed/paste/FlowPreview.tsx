import { useMemo } from 'react';
import { scaleLinear } from 'd3-scale';
import { findPeakIndex, type UnitSystem } from '../../../core';
import type { FlowRecord } from '../../../io';
import { formatCount, formatValue } from '../../format';
import { LISTED, PreviewSketch, SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH } from '../../import-kit';
import { dischargeText, dischargeToDisplay, dischargeUnitText } from '../discharge';
import { seriesPath } from '../hydrograph-paths';
import { clockAt, hoursText, momentText, recordClock } from '../time-text';

/**
 * What the paste would become: a sketch of the hydrograph (one path, however
 * many samples) and the first few samples in the screen's units. Nothing
 * here is applied.
 */
export function FlowPreview({ record, units }: { record: FlowRecord; units: UnitSystem }) {
  const { timesH, dischargeM3s } = record;
  const n = timesH.length;
  const peak = findPeakIndex(dischargeM3s);
  const path = useMemo(() => {
    const x = scaleLinear()
      .domain([timesH[0] as number, (timesH[n - 1] as number) > (timesH[0] as number) ? (timesH[n - 1] as number) : 1])
      .range([SKETCH_PAD.left, SKETCH_WIDTH - SKETCH_PAD.right]);
    const top = dischargeM3s[findPeakIndex(dischargeM3s)] as number;
    const y = scaleLinear()
      .domain([0, top > 0 ? top : 1])
      .range([SKETCH_HEIGHT - SKETCH_PAD.bottom, SKETCH_PAD.top]);
    return seriesPath(timesH, dischargeM3s, 0, x, y);
  }, [timesH, dischargeM3s, n]);
  const clock = recordClock(record.startIso, undefined, 0);
  const listed = Math.min(n, LISTED);
  const peakText = `${dischargeText(dischargeM3s[peak] as number, units)} at ${momentText(clock, timesH[peak] as number)}`;

  return (
    <PreviewSketch
      label={`Sketch of the ${formatCount(n)} samples read, peak ${peakText}`}
      pathClassName="flow-preview__line"
      path={path}
      caption="Samples read"
      count={n}
      headings={
        <>
          <th scope="col">Sample</th>
          <th scope="col">{clock.firstMs === null ? 'Time after the first sample' : 'Time'}</th>
          <th scope="col">Discharge ({dischargeUnitText(units)})</th>
        </>
      }
    >
      {Array.from({ length: listed }, (_, k) => (
        <tr key={k}>
          <th scope="row">{k + 1}</th>
          <td>{clockAt(clock, timesH[k] as number) ?? hoursText(timesH[k] as number)}</td>
          <td>{formatValue(dischargeToDisplay(dischargeM3s[k] as number, units))}</td>
        </tr>
      ))}
    </PreviewSketch>
  );
}
