import { useMemo } from 'react';
import { scaleLinear } from 'd3-scale';
import { findPeakIndex, type UnitSystem } from '../../../core';
import type { FlowRecord } from '../../../io';
import { formatValue } from '../../format';
import { dischargeText, dischargeToDisplay, dischargeUnitText } from '../discharge';
import { seriesPath } from '../hydrograph-paths';
import { clockAt, hoursText, momentText, recordClock } from '../time-text';

const WIDTH = 560;
const HEIGHT = 110;
const PAD = { top: 6, right: 4, bottom: 4, left: 4 } as const;
/** Samples listed under the sketch; the rest are counted. */
const LISTED = 8;

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
      .range([PAD.left, WIDTH - PAD.right]);
    const top = dischargeM3s[findPeakIndex(dischargeM3s)] as number;
    const y = scaleLinear().domain([0, top > 0 ? top : 1]).range([HEIGHT - PAD.bottom, PAD.top]);
    return seriesPath(timesH, dischargeM3s, 0, x, y);
  }, [timesH, dischargeM3s, n]);
  const clock = recordClock(record.startIso, undefined, 0);
  const listed = Math.min(n, LISTED);
  const peakText = `${dischargeText(dischargeM3s[peak] as number, units)} at ${momentText(clock, timesH[peak] as number)}`;

  return (
    <div className="paste-preview">
      <svg
        className="paste-preview__sketch"
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        preserveAspectRatio="none"
        role="img"
        aria-label={`Sketch of the ${n} samples read, peak ${peakText}`}
      >
        <line className="paste-preview__base" x1={PAD.left} x2={WIDTH - PAD.right} y1={HEIGHT - PAD.bottom} y2={HEIGHT - PAD.bottom} />
        <path className="flow-preview__line" d={path} />
      </svg>
      <table className="paste-preview__table">
        <caption>Samples read{n > listed ? ` (first ${listed} of ${n})` : ''}</caption>
        <thead>
          <tr>
            <th scope="col">Sample</th>
            <th scope="col">{clock.firstMs === null ? 'Time after the first sample' : 'Time'}</th>
            <th scope="col">Discharge ({dischargeUnitText(units)})</th>
          </tr>
        </thead>
        <tbody>
          {Array.from({ length: listed }, (_, k) => (
            <tr key={k}>
              <th scope="row">{k + 1}</th>
              <td>{clockAt(clock, timesH[k] as number) ?? hoursText(timesH[k] as number)}</td>
              <td>{formatValue(dischargeToDisplay(dischargeM3s[k] as number, units))}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
