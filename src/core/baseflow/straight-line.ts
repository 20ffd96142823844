import { InputError } from '../errors';
import { dischargeAtH } from './hydrograph';
import { resolveRiseIndex } from './peak';
import { recessionDays } from './recession-days';
import type { SeparateFn } from './types';

/**
 * Straight-line separation: baseflow runs straight from the start of rise
 * (t_r, Q(t_r)) to an end point (t_e, Q(t_e)) on the recession, Q(t_e) by
 * linear interpolation. The end is given, or N = A^0.2 days after the peak
 * (Linsley, Kohler & Paulhus, Hydrology for Engineers, McGraw-Hill).
 *
 * N = A^0.2 is at least a day for catchments over 1 mi², longer than most
 * event records are cut. When it falls after the record's last sample the
 * line ends at the last sample instead, and the separation says so in its
 * notice (a fallback of our own, common practice with a short record, no
 * source): a screen must show a separation and say how it was made, not stop.
 */
export const separateStraightLine: SeparateFn<'straight-line'> = (timesH, dischargeM3s, method, context) => {
  const n = dischargeM3s.length;
  const rise = resolveRiseIndex(dischargeM3s, method.riseIndex, context.peakIndex);
  const riseTimeH = timesH[rise] as number;
  const lastTimeH = timesH[n - 1] as number;
  let endTimeH: number;
  let notice: string | undefined;
  if (method.endTimeH !== undefined) {
    endTimeH = method.endTimeH;
    if (endTimeH > lastTimeH) {
      throw new InputError(
        'endTimeH',
        `The end point (${endTimeH} h) is after the last sample of the record (${lastTimeH} h).`,
      );
    }
  } else {
    if (context.areaM2 === undefined) {
      throw new InputError(
        'areaM2',
        'The straight-line end point needs an end time or the catchment area (for N = A^0.2 days after the peak).',
      );
    }
    const days = recessionDays(context.areaM2);
    const ruleH = (timesH[context.peakIndex] as number) + 24 * days;
    endTimeH = ruleH;
    if (ruleH > lastTimeH) {
      endTimeH = lastTimeH;
      notice =
        `N = A^0.2 = ${days.toFixed(3)} days puts the end ${ruleH.toFixed(2)} h after the first sample, past the record's last sample ` +
        `(${+lastTimeH.toFixed(2)} h), so the line ends at the last sample instead. Drag the end point or type an end time to choose another.`;
    }
  }
  if (!(endTimeH > riseTimeH)) {
    throw new InputError(
      'endTimeH',
      `The end point (${endTimeH} h) must be later than the start of rise (sample ${rise + 1}, ${riseTimeH} h).`,
    );
  }
  const riseQ = dischargeM3s[rise] as number;
  const endQ = dischargeAtH(timesH, dischargeM3s, endTimeH);
  const slope = (endQ - riseQ) / (endTimeH - riseTimeH);
  const lineM3s = new Float64Array(n);
  for (let k = 0; k < n; k++) lineM3s[k] = riseQ + slope * ((timesH[k] as number) - riseTimeH);
  return { lineM3s, startIndex: rise, endTimeH, endLineM3s: endQ, ...(notice === undefined ? {} : { notice }) };
};
