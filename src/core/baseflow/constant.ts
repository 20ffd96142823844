import { resolveRiseIndex } from './peak';
import type { SeparateFn } from './types';

/**
 * Constant-discharge separation: baseflow stays at the discharge of the start
 * of rise, Q_b = Q(t_r), until the recession first falls back to that
 * discharge after the peak (found by linear interpolation within the step),
 * or to the end of the record if it never does. One of the standard graphical
 * separations, e.g. Chow, Maidment & Mays (1988) Applied Hydrology, §5.1
 * (section cited from memory).
 */
export const separateConstant: SeparateFn<'constant'> = (timesH, dischargeM3s, method, context) => {
  const n = dischargeM3s.length;
  const rise = resolveRiseIndex(dischargeM3s, method.riseIndex, context.peakIndex);
  const level = dischargeM3s[rise] as number;
  let endTimeH = timesH[n - 1] as number;
  // Dips below the level between the rise and the peak are not an end: the
  // volume step counts only the flow above the line there.
  for (let k = Math.max(rise, context.peakIndex); k < n - 1; k++) {
    const q0 = dischargeM3s[k] as number;
    const q1 = dischargeM3s[k + 1] as number;
    if (q0 > level && q1 <= level) {
      const t0 = timesH[k] as number;
      const t1 = timesH[k + 1] as number;
      endTimeH = q1 === level ? t1 : Math.min(t1, t0 + ((q0 - level) / (q0 - q1)) * (t1 - t0));
      break;
    }
  }
  return { lineM3s: new Float64Array(n).fill(level), startIndex: rise, endTimeH, endLineM3s: level };
};
