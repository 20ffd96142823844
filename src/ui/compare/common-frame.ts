import { barEdgesH, peakIntensityMmH, totalDurationH, type Storm, type UnitSystem } from '../../core';
import { chartFrame, type ChartFrame } from '../chart/frame';

/**
 * Frames for several storms on one scale: the same time axis (hours from
 * each storm's start, up to the longest storm) and the same intensity axis
 * (up to the highest peak), so bars of equal intensity stand equally tall
 * in every small chart.
 *
 * The shared frame is the workbench chart's own frame for a one-bar storm
 * spanning the longest duration at the highest peak (the axes then come out
 * rounded in the units on screen, as on the main chart); each storm then gets
 * its own bar edges on that time scale.
 */
export function commonFrames(
  storms: readonly Storm[],
  width: number,
  height: number,
  system: UnitSystem,
): ChartFrame[] {
  let spanH = 0;
  let peakMmH = 0;
  for (const s of storms) {
    spanH = Math.max(spanH, totalDurationH(s));
    peakMmH = Math.max(peakMmH, peakIntensityMmH(s));
  }
  const span = spanH > 0 ? spanH : 1;
  const shared = chartFrame({ durationsH: [span], depthsMm: [peakMmH * span] }, width, height, system);
  return storms.map((storm) => {
    const edgesH = barEdgesH(storm);
    const edgesPx = new Float64Array(edgesH.length);
    for (let k = 0; k < edgesH.length; k++) edgesPx[k] = shared.x(edgesH[k] as number);
    return { ...shared, edgesPx };
  });
}
