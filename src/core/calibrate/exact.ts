import type { Storm } from '../storm';
import type { CurveNumberLoss, LossMethod } from '../loss/types';
import { exactPhi, exactPhiChecked } from './phi';
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

/**
 * An exact calibration that checks the bars as it reads them, for a storm
 * not yet validated: the value with the storm's total depth (mm), or null
 * when a bar is not clean (the caller validates, which names the bar). The
 * bar lists must match one to one and the method be valid; a target above
 * the rain gives what the calibrator gives for the whole rain.
 */
export type CheckedExactCalibrator = (
  storm: Storm,
  method: LossMethod,
  targetMm: number,
) => { readonly value: number; readonly rainMm: number } | null;

/** Keyed as EXACT_CALIBRATORS; each gives the same value as its entry there. */
export const CHECKED_EXACT_CALIBRATORS: Readonly<Record<string, CheckedExactCalibrator>> = {
  'constant.rateMmH': (storm, _method, target) => {
    const solved = exactPhiChecked(storm.durationsH, storm.depthsMm, target);
    return solved && { value: solved.phi, rainMm: solved.rainMm };
  },
};
