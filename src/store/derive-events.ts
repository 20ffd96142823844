import type { LossMethod } from '../core';
import type { Scenario } from '../scenario/types';
import type { Derived } from './derive';
import {
  designMethod,
  designOutcome,
  fitAllEvents,
  fittedParameter,
  type DesignOutcome,
  type EventFits,
} from './event-fits';
import { heldKey } from './held-key';
import { memoLast } from './memo';

/**
 * The event set's derived values: every event's fit, the design value and
 * the design method. Apart from derive.ts because only the event set and
 * design storm views (loaded on first use) read them; one set per store,
 * found by the store's Derived (`eventDerived`).
 */
export interface EventDerived {
  fits(s: Scenario): EventFits;
  outcome(s: Scenario): DesignOutcome;
  /** The fitted method with the design value, or null when there is none. */
  designMethod(s: Scenario): LossMethod | null;
}

const perStore = new WeakMap<Derived, EventDerived>();

/** The event set's derived values of the store whose Derived this is (made on first use). */
export function eventDerived(derived: Derived): EventDerived {
  let d = perStore.get(derived);
  if (!d) perStore.set(derived, (d = createEventDerived(derived)));
  return d;
}

function createEventDerived(derived: Derived): EventDerived {
  // Keyed on the method without the fitted parameter (`heldKey`): the fits never read its
  // value, so dragging the loss line fits no event again. `scenario` and `method` are read
  // only when a key changed.
  let scenario: Scenario | null = null;
  let method: LossMethod | null = null;
  const fits = memoLast(
    (_events: Scenario['eventSet']['events'], _areaM2: number, _parameter: string, _held: string): EventFits =>
      fitAllEvents(scenario as Scenario, method as LossMethod),
  );
  const fitsOf = (s: Scenario): EventFits => {
    scenario = s;
    method = derived.effectiveMethod(s);
    const parameter = fittedParameter(s);
    return fits(s.eventSet.events, s.catchment.areaM2, parameter, heldKey(method, parameter));
  };
  const outcome = memoLast((f: EventFits, _pick: Scenario['eventSet']['designPick']): DesignOutcome =>
    designOutcome(scenario as Scenario, f),
  );
  const outcomeOf = (s: Scenario): DesignOutcome => {
    const f = fitsOf(s);
    scenario = s;
    return outcome(f, s.eventSet.designPick);
  };
  const design = memoLast(designMethod);
  return {
    fits: fitsOf,
    outcome: outcomeOf,
    designMethod: (s) => design(fitsOf(s), outcomeOf(s)),
  };
}
