import { calibrate, type CalibrationResult } from '../calibrate/calibrate';
import { InputError } from '../errors';
import type { LossMethod } from '../loss/types';
import type { Storm } from '../storm';

/** One end of the observed runoff's uncertainty and the fit there. */
export interface CalibrationEnd {
  /** The observed runoff moved by the uncertainty, mm. */
  readonly runoffMm: number;
  /** Exactly what `calibrate` returns for that runoff. */
  readonly result: CalibrationResult;
}

export interface CalibrationInterval {
  /** The fit to the observed runoff itself (what `calibrate` returns). */
  readonly fit: CalibrationResult;
  /** The fit to the observed runoff less the uncertainty… */
  readonly lowRunoff: CalibrationEnd;
  /** …and to it plus the uncertainty. */
  readonly highRunoff: CalibrationEnd;
  /**
   * The fitted values at the two ends, smaller first: a loss rate fitted to
   * more runoff is lower, so `min` usually comes from `highRunoff`. null when
   * either end has no answer (each end's result says why).
   */
  readonly range: { readonly min: number; readonly max: number } | null;
}

/**
 * The fitted loss parameter with its interval from the uncertainty of the
 * observed runoff: gauge and rating errors make the observed direct-runoff
 * volume uncertain by ± some per cent, so the parameter is fitted (by
 * `calibrate`, exactly as for the value itself) to the observed runoff × (1 − u)
 * and × (1 + u). The central fit does not change. `uncertaintyPct` 0 gives
 * three equal fits. Throws an InputError naming `uncertaintyPct` when it is not
 * a finite number from 0 to below 100; everything else comes back in the
 * results as `calibrate` reports it.
 */
export function calibrationInterval(
  storm: Storm,
  method: LossMethod,
  parameter: string,
  observedMm: number,
  uncertaintyPct: number,
): CalibrationInterval {
  if (
    typeof uncertaintyPct !== 'number' ||
    !Number.isFinite(uncertaintyPct) ||
    uncertaintyPct < 0 ||
    uncertaintyPct >= 100
  ) {
    throw new InputError(
      'uncertaintyPct',
      `The uncertainty of the observed runoff must be a number of per cent from 0 to below 100 (got ${String(uncertaintyPct)}).`,
    );
  }
  const u = uncertaintyPct / 100;
  const fit = calibrate(storm, method, parameter, observedMm);
  const end = (runoffMm: number): CalibrationEnd => ({
    runoffMm,
    result: calibrate(storm, method, parameter, runoffMm),
  });
  const lowRunoff = end(observedMm * (1 - u));
  const highRunoff = end(observedMm * (1 + u));
  const range =
    lowRunoff.result.ok && highRunoff.result.ok
      ? {
          min: Math.min(lowRunoff.result.value, highRunoff.result.value),
          max: Math.max(lowRunoff.result.value, highRunoff.result.value),
        }
      : null;
  return { fit, lowRunoff, highRunoff, range };
}
