import { useMemo } from 'react';
import { scaleLinear } from 'd3-scale';
import { barEdgesH, peakIntensityMmH, totalDurationH, type Storm, type UnitSystem } from '../../../core';
import { barsPath } from '../../chart/bar-path';
import { mapLinear } from '../../chart/linear-px';
import { formatDuration } from '../../rainfall/RainfallToolbar';
import { formatCount, formatValue } from '../../format';
import { LISTED, PreviewSketch, SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH } from '../../import-kit';
import { displayUnit, toDisplay, unitText } from '../../units';
import { barClock, barTimeText } from '../bar-times';

/**
 * What the paste would become: a sketch of the bars (one path, however many)
 * and the first few bars in the screen's units. Nothing here is applied.
 */
export function PreviewBars({ storm, units }: { storm: Storm; units: UnitSystem }) {
  const n = storm.depthsMm.length;
  // Each pass over the bars once per storm, not per render: a long record has 10⁶ of them.
  const { edges, totalH, peak } = useMemo(
    () => ({ edges: barEdgesH(storm), totalH: totalDurationH(storm), peak: peakIntensityMmH(storm) }),
    [storm],
  );
  const path = useMemo(() => {
    const x = scaleLinear()
      .domain([0, totalH || 1])
      .range([SKETCH_PAD.left, SKETCH_WIDTH - SKETCH_PAD.right]);
    const y = scaleLinear()
      .domain([0, peak > 0 ? peak : 1])
      .range([SKETCH_HEIGHT - SKETCH_PAD.bottom, SKETCH_PAD.top]);
    const intensities = new Float64Array(n);
    for (let k = 0; k < n; k++) intensities[k] = (storm.depthsMm[k] as number) / (storm.durationsH[k] as number);
    return barsPath(mapLinear(x, edges), mapLinear(y, intensities), SKETCH_HEIGHT - SKETCH_PAD.bottom);
  }, [storm, n, edges, totalH, peak]);

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
          <td>{barTimeText(clock, edges[k] as number)}</td>
          <td>{formatDuration(storm.durationsH[k] as number)}</td>
          <td>{formatValue(toDisplay('depth', storm.depthsMm[k] as number, units))}</td>
        </tr>
      ))}
    </PreviewSketch>
  );
}
