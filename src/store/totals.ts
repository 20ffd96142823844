import { methodSpec, type NumericParam } from '../core';
import type { Scenario } from '../scenario/types';
import type { Derived } from './derive';

/**
 * A scenario's totals as the comparison and the report show them, all in SI
 * and all from the core through the store's derived selectors (results,
 * runoff volume, fit); nothing is computed here. Loaded with the comparison
 * and the report, not the first screen.
 */
export interface Totals {
  readonly rainMm: number | null;
  readonly lossMm: number | null;
  readonly excessMm: number | null;
  /** Null without a catchment area. */
  readonly volumeM3: number | null;
  readonly fraction: number | null;
  readonly peakExcessMmH: number | null;
  /**
   * The parameter fitted to the observed runoff and its value, only while
   * that value is the one in use (after "Fit", or kept matched); otherwise
   * null with the reason in `fitNote`.
   */
  readonly fitted: { readonly param: NumericParam; readonly value: number } | null;
  /** The core's answer when it is not in use: what "Fit" would set. */
  readonly proposed: { readonly param: NumericParam; readonly value: number } | null;
  readonly fitNote: string | null;
  /** The core's message when the losses cannot be worked out. */
  readonly error: string | null;
}

// Per store (its Derived) and per document: a pin's totals are worked out once, not at every render.
const remembered = new WeakMap<Derived, WeakMap<Scenario, Totals>>();

/** The totals of `scenario` from `derived` (the store's or a pin's selectors), kept while both are the same objects. */
export function totalsOf(scenario: Scenario, derived: Derived): Totals {
  let byScenario = remembered.get(derived);
  if (!byScenario) remembered.set(derived, (byScenario = new WeakMap()));
  let totals = byScenario.get(scenario);
  if (!totals) byScenario.set(scenario, (totals = totalsNow(scenario, derived)));
  return totals;
}

function totalsNow(scenario: Scenario, derived: Derived): Totals {
  const results = derived.results(scenario);
  const r = results.ok ? results.result : null;
  const fit = derived.fit(scenario);
  const spec = methodSpec(scenario.method.kind);
  const param = spec.params.find((p) => p.key === scenario.observed?.parameter);
  let fitted: Totals['fitted'] = null;
  let proposed: Totals['proposed'] = null;
  let fitNote: string | null = null;
  if (scenario.observed === null) fitNote = 'no observed runoff to fit';
  else if (fit === null) {
    const target = derived.target(scenario);
    fitNote = target && !target.ok ? target.message : 'nothing to fit';
  } else if (!fit.ok) fitNote = fit.message;
  else if (!param) fitNote = 'the fitted parameter is not one of this method';
  else if (derived.fitInUse(scenario)) fitted = { param, value: fit.value };
  else {
    proposed = { param, value: fit.value };
    fitNote = 'not in use: Fit has not been pressed';
  }
  return {
    rainMm: r ? r.rainMm : null,
    lossMm: r ? r.totalLossMm : null,
    excessMm: r ? r.totalExcessMm : null,
    volumeM3: derived.runoffVolumeM3(scenario),
    fraction: r ? r.runoffFraction : null,
    peakExcessMmH: r ? r.peakExcessMmH : null,
    fitted,
    proposed,
    fitNote,
    error: results.ok ? null : results.message,
  };
}
