import { massCurve, type LossResult, type MassCurve } from '../core';
import { memoLast } from './memo';

/**
 * The storm's mass curve (core `massCurve`: running sums of rainfall, loss
 * and excess to each bar's end) for the losses on screen, derived once for
 * the chart's layer and the CSV export. Imported by path by those two, which
 * load on first use, so it stays off the first screen.
 */
export const massCurveOf: (depthsMm: ArrayLike<number>, result: Pick<LossResult, 'lossMm' | 'excessMm'>) => MassCurve =
  memoLast(massCurve);
