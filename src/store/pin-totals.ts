import type { LossMethod, RunoffHydrograph } from '../core';
import type { Scenario } from '../scenario/types';
import { createDerived, type Derived } from './derive';
import { totalsOf, type Totals } from './totals';

/**
 * The pinned scenarios' derived values, for the comparison: each pin's
 * totals with its computed hydrograph. Loaded with the comparison, not the
 * first screen.
 */

/** A pin's totals with what its charts draw. */
export interface PinTotals extends Totals {
  /** The computed hydrograph (null without a unit hydrograph, or when it cannot be computed). */
  readonly hydrograph: RunoffHydrograph | null;
  /** The loss of each bar, mm, or null when the losses cannot be worked out. */
  readonly barLossMm: Float64Array | null;
  /** The loss method in use (the fitted one while its fit is kept matched). */
  readonly method: LossMethod;
}

// One set of memoised selectors per pinned document, so pins do not evict each other's results; a pin's
// go with its document.
const selectors = new WeakMap<Scenario, Derived>();
// A pin's totals, kept while its document is the same object and its hydrograph the same result (it is
// null until the hydrograph side's code has arrived).
const remembered = new WeakMap<Scenario, PinTotals>();

function selectorsOf(scenario: Scenario): Derived {
  let d = selectors.get(scenario);
  if (!d) selectors.set(scenario, (d = createDerived()));
  return d;
}

/** The totals and hydrograph of a pinned document, worked out once per document. */
export function pinTotals(scenario: Scenario): PinTotals {
  const derived = selectorsOf(scenario);
  const computed = derived.hydrograph(scenario);
  const hydrograph = computed?.ok ? computed.hydrograph : null;
  const known = remembered.get(scenario);
  if (known?.hydrograph === hydrograph) return known;
  const results = derived.results(scenario);
  const totals: PinTotals = {
    ...totalsOf(scenario, derived),
    hydrograph,
    barLossMm: results.ok ? results.result.lossMm : null,
    method: derived.effectiveMethod(scenario),
  };
  remembered.set(scenario, totals);
  return totals;
}

/** Calls `ready` once the pins' hydrographs can be had (the hydrograph side's code, fetched after the first screen). */
export function whenPinHydrographsReady(ready: () => void): void {
  createDerived().whenHydrographReady(ready);
}
