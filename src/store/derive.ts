import {
  methodValue,
  calibrate,
  computeLosses,
  separateBaseflow,
  depthFromVolumeMm,
  isInputError,
  runoffVolumeM3,
  type BaseflowMethod,
  type BaseflowResult,
  type CalibrationResult,
  type LossMethod,
  type LossResult,
} from '../core';
import type { Scenario } from '../scenario/types';
import { alignRecord, type Alignment } from './alignment';
import { memoLast } from './memo';

/** The observed runoff as a depth to match, or why it cannot be one. */
export type Target = { readonly ok: true; readonly mm: number } | { readonly ok: false; readonly message: string };

/** Losses of the storm under the effective method, or the core's message when it refuses the input. */
export type Results =
  | { readonly ok: true; readonly result: LossResult; readonly method: LossMethod }
  | { readonly ok: false; readonly message: string; readonly field: string; readonly method: LossMethod };

/** Baseflow separation of the streamflow record, or the core's message when it refuses it. */
export type Separation =
  | { readonly ok: true; readonly result: BaseflowResult; readonly method: BaseflowMethod }
  | { readonly ok: false; readonly message: string; readonly field: string; readonly method: BaseflowMethod };

export interface Derived {
  /**
   * The observed runoff as a depth (null when none is entered). While the
   * streamflow record is used as the observed runoff, it is the separated
   * direct-runoff depth, worked out afresh whenever the record, the
   * separation or the catchment area changes.
   */
  target(s: Scenario): Target | null;
  /** The core's baseflow separation of the streamflow record (null when there is no record). */
  separation(s: Scenario): Separation | null;
  /** True while the observed runoff to match is the separated direct-runoff depth. */
  observedFromSeparation(s: Scenario): boolean;
  /** Where the record starts on the storm's time axis (null when there is no record). */
  alignment(s: Scenario): Alignment | null;
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
  /**
   * True when the core's answer is the value in use: the effective method's
   * parameter to fit equals the fit (after "Fit", or while kept matched).
   * Until then the answer is only a proposal ("Fit would set …").
   */
  fitInUse(s: Scenario): boolean;
  results(s: Scenario): Results;
  /** Runoff volume, m³, or null when the catchment area is not known. */
  runoffVolumeM3(s: Scenario): number | null;
}

/**
 * Memoised selectors over a scenario, all computed by the core. One set per
 * store, so two stores on a page do not evict each other's results.
 */
export function createDerived(): Derived {
  type Flow = NonNullable<Scenario['streamflow']>;
  // Keyed on the record's lists, not the record, so moving the offset does not separate again.
  const separation = memoLast(
    (
      timesH: Flow['timesH'] | null,
      dischargeM3s: Flow['dischargeM3s'] | null,
      method: BaseflowMethod | null,
      areaM2: number,
    ): Separation | null => {
      if (timesH === null || dischargeM3s === null || method === null) return null;
      try {
        return { ok: true, result: separateBaseflow({ timesH, dischargeM3s }, method, { areaM2 }), method };
      } catch (error) {
        if (isInputError(error)) return { ok: false, message: error.message, field: error.field, method };
        throw error;
      }
    },
  );
  const separationOf = (s: Scenario): Separation | null =>
    separation(
      s.streamflow?.timesH ?? null,
      s.streamflow?.dischargeM3s ?? null,
      s.streamflow?.baseflow ?? null,
      s.catchment.areaM2,
    );
  const linked = (s: Scenario): boolean => Boolean(s.streamflow?.useAsObserved && s.observed !== null);

  const alignment = memoLast((stormStart: string | undefined, flow: Flow | null): Alignment | null =>
    flow === null ? null : alignRecord(stormStart, flow.startIso, flow.offsetH),
  );

  const separatedTarget = memoLast((sep: Separation | null): Target => {
    if (sep === null) return { ok: false, message: 'There is no streamflow record to take the observed runoff from.' };
    if (!sep.ok) return { ok: false, message: `The streamflow record cannot be separated: ${sep.message}` };
    const mm = sep.result.directDepthMm;
    if (mm === undefined) {
      return {
        ok: false,
        message: 'Enter the catchment area to turn the separated direct runoff into a depth over the catchment.',
      };
    }
    return { ok: true, mm };
  });

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
  const targetOf = (s: Scenario): Target | null =>
    linked(s) ? separatedTarget(separationOf(s)) : target(s.observed, s.catchment.areaM2);

  const fit = memoLast(
    (
      storm: Scenario['storm'],
      method: LossMethod,
      parameter: string | null,
      t: Target | null,
    ): CalibrationResult | null => {
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
    separation: separationOf,
    observedFromSeparation: linked,
    alignment: (s) => alignment(s.storm.startIso, s.streamflow),
    fit: fitOf,
    effectiveMethod,
    isMatched: (s) => Boolean(s.observed?.locked && fitOf(s)?.ok),
    fitInUse: (s) => {
      const f = fitOf(s);
      const key = s.observed?.parameter;
      if (!f?.ok || key === undefined) return false;
      return methodValue(effectiveMethod(s), key) === f.value;
    },
    results: resultsOf,
    runoffVolumeM3: (s) => {
      const r = resultsOf(s);
      if (!r.ok || !(s.catchment.areaM2 > 0)) return null;
      return runoffVolumeM3(r.result.totalExcessMm, s.catchment.areaM2);
    },
  };
}
