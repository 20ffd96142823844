import {
  calibrate,
  computeLosses,
  depthFromVolumeMm,
  isInputError,
  runoffVolumeM3,
  type CalibrationResult,
  type LossMethod,
  type LossResult,
} from '../core';
import type { Scenario } from '../scenario/types';
import { memoLast } from './memo';

/** The observed runoff as a depth to match, or why it cannot be one. */
export type Target = { readonly ok: true; readonly mm: number } | { readonly ok: false; readonly message: string };

/** Losses of the storm under the effective method, or the core's message when it refuses the input. */
export type Results =
  | { readonly ok: true; readonly result: LossResult; readonly method: LossMethod }
  | { readonly ok: false; readonly message: string; readonly field: string; readonly method: LossMethod };

export interface Derived {
  /** The observed runoff as a depth (null when none is entered). */
  target(s: Scenario): Target | null;
  /** The core's calibration for the observed runoff (null without a usable target). */
  fit(s: Scenario): CalibrationResult | null;
  /**
   * The method the screen shows and computes with: the stored method, or,
   * when "keep matched" is on and the core finds an answer, the stored method
   * with the fitted parameter set to that answer. Derived every time the
   * storm changes, so it never goes stale.
   */
  effectiveMethod(s: Scenario): LossMethod;
  /** True while the effective method's fitted parameter follows the observed runoff. */
  isMatched(s: Scenario): boolean;
  results(s: Scenario): Results;
  /** Runoff volume, m³, or null when the catchment area is not known. */
  runoffVolumeM3(s: Scenario): number | null;
}

/**
 * Memoised selectors over a scenario, all computed by the core. One set per
 * store, so two stores on a page do not evict each other's results.
 */
export function createDerived(): Derived {
  const target = memoLast((observed: Scenario['observed'], areaM2: number): Target | null => {
    if (observed === null) return null;
    if (observed.as === 'depth') return { ok: true, mm: observed.value };
    if (!(areaM2 > 0)) {
      return {
        ok: false,
        message: 'Enter the catchment area to turn the observed volume into a depth over the catchment.',
      };
    }
    return { ok: true, mm: depthFromVolumeMm(observed.value, areaM2) };
  });
  const targetOf = (s: Scenario): Target | null => target(s.observed, s.catchment.areaM2);

  const fit = memoLast(
    (storm: Scenario['storm'], method: LossMethod, parameter: string | null, t: Target | null): CalibrationResult | null => {
      if (parameter === null || t === null || !t.ok) return null;
      return calibrate(storm, method, parameter, t.mm);
    },
  );
  const fitOf = (s: Scenario): CalibrationResult | null =>
    fit(s.storm, s.method, s.observed?.parameter ?? null, targetOf(s));

  const effectiveMethod = (s: Scenario): LossMethod => {
    if (!s.observed?.locked) return s.method;
    const f = fitOf(s);
    return f?.ok ? f.method : s.method;
  };

  const results = memoLast((storm: Scenario['storm'], method: LossMethod): Results => {
    try {
      return { ok: true, result: computeLosses(storm, method), method };
    } catch (error) {
      if (isInputError(error)) return { ok: false, message: error.message, field: error.field, method };
      throw error;
    }
  });
  const resultsOf = (s: Scenario): Results => results(s.storm, effectiveMethod(s));

  return {
    target: targetOf,
    fit: fitOf,
    effectiveMethod,
    isMatched: (s) => Boolean(s.observed?.locked && fitOf(s)?.ok),
    results: resultsOf,
    runoffVolumeM3: (s) => {
      const r = resultsOf(s);
      if (!r.ok || !(s.catchment.areaM2 > 0)) return null;
      return runoffVolumeM3(r.result.totalExcessMm, s.catchment.areaM2);
    },
  };
}
