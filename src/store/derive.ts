import {
  attempt,
  methodValue,
  withSpec,
  calibrateUnchecked,
  computeLossesUnchecked,
  separateBaseflow,
  depthFromVolumeMm,
  runoffVolumeM3,
  type InputError,
  type BaseflowMethod,
  type BaseflowResult,
  type CalibrationResult,
  type LossMethod,
  type LossResult,
  type ObservedDirectRunoff,
} from '../core';
import type { Scenario } from '../scenario/types';
import { alignRecord, type Alignment } from './alignment';
import { methodProblem, stormProblem } from './checked';
import type { HydrographDerived, TimeSeries } from './derive-hydrograph';
import { memoLast } from './memo';
import { lossRing } from './loss-ring';

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

/** The core's refusal as the failed form of a derived value. */
function refused<M>(error: InputError, method: M): { ok: false; message: string; field: string; method: M } {
  return { ok: false, message: error.message, field: error.field, method };
}

/**
 * The hydrograph side of the derived values (derive-hydrograph.ts and the
 * core's transforms) is fetched just after the first screen, not with it:
 * until it arrives its values are null (as with no hydrograph chosen), and
 * `whenHydrographReady` tells the store to draw again once they can be had.
 */
type HydrographModule = typeof import('./derive-hydrograph');
let hydrographModule: HydrographModule | null = null;
let hydrographLoading: Promise<HydrographModule> | null = null;
const hydrographWaiting = new Set<() => void>();

/** Fetches the hydrograph side's code once (again after a failed fetch); resolves when it can be used. */
export function loadHydrographSide(): Promise<HydrographModule> {
  hydrographLoading ??= import('./derive-hydrograph').then(
    (m) => {
      hydrographModule = m;
      for (const ready of hydrographWaiting) ready();
      hydrographWaiting.clear();
      return m;
    },
    (error: unknown) => {
      hydrographLoading = null;
      throw error;
    },
  );
  return hydrographLoading;
}

export interface Derived extends HydrographDerived {
  /** Calls `ready` once the hydrograph side's code has arrived (at once if it has). */
  whenHydrographReady(ready: () => void): void;
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
  /** Readies the results' arrays for a long storm about to enter the store, in small tasks (loss-ring.ts). */
  prepareStorm(storm: Scenario['storm']): Promise<void>;
  /** True when the storm's results take no new arrays (short, or prepared or in use): see loss-ring.ts `ready`. */
  stormReady(storm: Scenario['storm']): boolean;
  /**
   * The loss of the part the effective method's table entry computes alone
   * (`lossPart`, the chart's shade), per bar, mm; null when it has none or the
   * core refuses the input. Keyed on that part's method, so dragging a rate the
   * part does not read computes it once.
   */
  lossPartMm(s: Scenario): Float64Array | null;
  /** Runoff volume, m³, or null when the catchment area is not known. */
  runoffVolumeM3(s: Scenario): number | null;
  /** The separated direct runoff on the storm's time axis (null without a separated record). */
  observedDirect(s: Scenario): ObservedDirectRunoff | null;
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
      const r = attempt(() => separateBaseflow({ timesH, dischargeM3s }, method, { areaM2 }));
      return r.ok ? { ok: true, result: r.value, method } : refused(r.error, method);
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
      // Checked as they entered the store (checked.ts): calibrate would check both again.
      const problem = stormProblem(storm) ?? methodProblem(method);
      if (problem) return { ok: false, reason: 'invalid-input', message: problem.message };
      return calibrateUnchecked(storm, method, parameter, t.mm);
    },
  );
  const fitOf = (s: Scenario): CalibrationResult | null =>
    fit(s.storm, s.method, s.observed?.parameter ?? null, targetOf(s));

  const effectiveMethod = (s: Scenario): LossMethod => {
    if (!s.observed?.locked) return s.method;
    const f = fitOf(s);
    return f?.ok ? f.method : s.method;
  };

  const buffersFor = lossRing();
  const results = memoLast((storm: Scenario['storm'], method: LossMethod): Results => {
    // In computeLosses' order (the storm, then the method), each checked once per object.
    const problem = stormProblem(storm) ?? methodProblem(method);
    if (problem) return refused(problem, method);
    return { ok: true, result: computeLossesUnchecked(storm, method, buffersFor(storm)), method };
  });
  const resultsOf = (s: Scenario): Results => results(s.storm, effectiveMethod(s));

  let part: LossMethod | null = null; // read only when the key below changed
  const lossPart = memoLast((storm: Scenario['storm'], _partKey: string): Float64Array | null => {
    if (part === null || (stormProblem(storm) ?? methodProblem(part))) return null;
    return computeLossesUnchecked(storm, part).lossMm;
  });
  const lossPartOf = (s: Scenario): Float64Array | null => {
    part = withSpec(effectiveMethod(s), (spec, m) => (spec.lossPart ? spec.lossPart.variant(m) : null));
    return lossPart(s.storm, JSON.stringify(part));
  };

  // The record's samples on the storm's time axis, for the computed hydrograph to be set against.
  const shifted = memoLast((timesH: readonly number[], offsetH: number): Float64Array => {
    const out = new Float64Array(timesH.length);
    for (let i = 0; i < out.length; i++) out[i] = (timesH[i] as number) + offsetH;
    return out;
  });
  const separatedOnAxis = (s: Scenario): { timesH: Float64Array; result: BaseflowResult } | null => {
    const sep = separationOf(s);
    const aligned = alignment(s.storm.startIso, s.streamflow);
    if (!sep?.ok || !aligned || !s.streamflow) return null;
    return { timesH: shifted(s.streamflow.timesH, aligned.offsetH), result: sep.result };
  };
  const observedDirect = memoLast(
    (timesH: Float64Array | undefined, result: BaseflowResult | undefined): ObservedDirectRunoff | null =>
      timesH && result ? { timesH, directM3s: result.directM3s } : null,
  );
  const baseflowOnAxis = memoLast(
    (timesH: Float64Array | undefined, result: BaseflowResult | undefined): TimeSeries | null =>
      timesH && result ? { timesH, dischargeM3s: result.baseflowM3s } : null,
  );
  const observedDirectOf = (s: Scenario): ObservedDirectRunoff | null => {
    const on = separatedOnAxis(s);
    return observedDirect(on?.timesH, on?.result);
  };
  const lossSide: Parameters<HydrographModule['createHydrographDerived']>[0] = {
    excessMm: (s) => {
      const r = resultsOf(s);
      return r.ok ? r.result.excessMm : null;
    },
    observedDirect: observedDirectOf,
    baseflowOnStormAxis: (s) => {
      const on = separatedOnAxis(s);
      return baseflowOnAxis(on?.timesH, on?.result);
    },
    targetMm: (s) => {
      const t = targetOf(s);
      return t?.ok ? t.mm : null;
    },
  };

  let side: HydrographDerived | null = null;
  /** The hydrograph side, or null (its code then starts loading). */
  const hydro = (): HydrographDerived | null => {
    if (side) return side;
    if (hydrographModule) return (side = hydrographModule.createHydrographDerived(lossSide));
    void loadHydrographSide().catch(() => {}); // a failed fetch is tried again at the next call
    return null;
  };
  const hydrographSide: HydrographDerived = {
    hydrograph: (s) => hydro()?.hydrograph(s) ?? null,
    totalFlow: (s) => hydro()?.totalFlow(s) ?? null,
    comparison: (s) => hydro()?.comparison(s) ?? null,
    hydrographEndH: (s) => hydro()?.hydrographEndH(s) ?? null,
    unitHydrographDepthMm: (s) => hydro()?.unitHydrographDepthMm(s) ?? null,
    lossInterval: (s) => hydro()?.lossInterval(s) ?? null,
    lossCurve: (s) => hydro()?.lossCurve(s) ?? null,
  };

  return {
    ...hydrographSide,
    whenHydrographReady: (ready) => {
      if (hydrographModule) ready();
      else {
        hydrographWaiting.add(ready);
        void loadHydrographSide().catch(() => {});
      }
    },
    observedDirect: observedDirectOf,
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
    prepareStorm: (storm) => buffersFor.prepare(storm),
    stormReady: (storm) => buffersFor.ready(storm),
    lossPartMm: lossPartOf,
    runoffVolumeM3: (s) => {
      const r = resultsOf(s);
      if (!r.ok || !(s.catchment.areaM2 > 0)) return null;
      return runoffVolumeM3(r.result.totalExcessMm, s.catchment.areaM2);
    },
  };
}
