import type { Storm } from '../storm';
import type { CurveNumberLoss, LossMethod } from '../loss/types';
import { exactPhi } from './phi';
import { curveNumberFromRunoff } from './curve-number';
import { conversionOf } from '../loss/curve-number';

/**
 * Closed-form or non-iterative calibrations, keyed "kind.parameter". Each takes
 * a clean storm, the method (other parameters fixed), a target excess in
 * [0, rain] and the storm's rain, and returns the parameter value.
 */
export type ExactCalibrator = (storm: Storm, method: LossMethod, targetMm: number, rainMm: number) => number;

export const EXACT_CALIBRATORS: Readonly<Record<string, ExactCalibrator>> = {
  'constant.rateMmH': (storm, _method, target) => exactPhi(storm.durationsH, storm.depthsMm, target),
  // E = C·P, so C = E / P; a dry storm has only the target 0, met by C = 0.
  'proportional.coefficient': (_storm, _method, target, rain) => (rain > 0 ? Math.min(1, target / rain) : 0),
  // The storm's total excess is Q(ΣP) whatever the bars, so the single-total
  // inversion (Hawkins 1993) is exact. A dry storm fits any CN: keep the given one.
  'curve-number.cn': (_storm, method, target, rain) => {
    const cnMethod = method as CurveNumberLoss;
    return rain > 0 ? curveNumberFromRunoff(rain, target, cnMethod.iaRatio, conversionOf(cnMethod)) : cnMethod.cn;
  },
};
