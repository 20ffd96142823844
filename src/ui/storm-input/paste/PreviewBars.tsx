import { useMemo } from 'react';
import { peakIntensityMmH, totalDurationH, type Storm, type UnitSystem } from '../../../core';
import { formatDuration } from '../../rainfall/RainfallToolbar';
import { formatCount, formatValue } from '../../format';
import { LISTED, PreviewSketch } from '../../import-kit';
import { displayUnit, toDisplay, unitText } from '../../units';
import { barClock, barTimeText } from '../bar-times';
import { sketchPath } from './sketch-path';

/**
 * What the paste would become: a sketch of the bars (one path, however many)
 * and the first few bars in the screen's units. Nothing here is applied.
 */
export function PreviewBars({ storm, units }: { storm: Storm; units: UnitSystem }) {
  const n = storm.depthsMm.length;
  // Each pass over the bars once per storm, not per render: a long record has 10⁶ of them.
  const { totalH, peak } = useMemo(() => ({ totalH: totalDurationH(storm), peak: peakIntensityMmH(storm) }), [storm]);
  const path = useMemo(() => sketchPath(storm, totalH, peak), [storm, totalH, peak]);
  // Start times of the bars listed only (the table shows the first LISTED).
  const starts = useMemo(() => {
    const listed = new Float64Array(Math.min(n, LISTED));
    for (let k = 1; k < listed.length; k++) listed[k] = (listed[k - 1] as number) + (storm.durationsH[k - 1] as number);
    return listed;
  }, [storm, n]);

  const clock = barClock(storm.startIso, totalH);
  const depthUnit = unitText(displayUnit('depth', units));
  const rateUnit = unitText(displayUnit('rate', units));
  const peakText = `${formatValue(toDisplay('rate', peak, units))} ${rateUnit}`;
  const listed = Math.min(n, LISTED);

  return (
    <PreviewSketch
      label={`Sketch of the ${formatCount(n)} bars read, highest intensity ${peakText}`}
      pathClassName="paste-preview__bars"
      path={path}
      caption="Bars read"
      count={n}
      headings={
        <>
          <th scope="col">Bar</th>
          <th scope="col">Start ({clock.heading})</th>
          <th scope="col">Duration</th>
          <th scope="col">Depth ({depthUnit})</th>
        </>
      }
    >
      {Array.from({ length: listed }, (_, k) => (
        <tr key={k}>
          <th scope="row">{k + 1}</th>
          <td>{barTimeText(clock, starts[k] as number)}</td>
          <td>{formatDuration(storm.durationsH[k] as number)}</td>
          <td>{formatValue(toDisplay('depth', storm.depthsMm[k] as number, units))}</td>
        </tr>
      ))}
    </PreviewSketch>
  );
}
