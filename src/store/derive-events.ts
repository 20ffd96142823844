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
import { fitAllEventTransforms, type EventTransformFits } from './event-transform-fits';
import { heldKey } from './held-key';
import { transformFitParameter } from './hydrograph-edits';
import { memoLast } from './memo';

/**
 * The event set's derived values: every event's fit, the design value, the
 * design method and the workbench's transform fitted to every event. Apart from derive.ts because only the event set and
 * design storm views (loaded on first use) read them; one set per store,
 * found by the store's Derived (`eventDerived`).
 */
export interface EventDerived {
  fits(s: Scenario): EventFits;
  outcome(s: Scenario): DesignOutcome;
  /** The fitted method with the design value, or null when there is none. */
  designMethod(s: Scenario): LossMethod | null;
  /** The workbench's transform parameter fitted to every event, or null when no transform has one to fit. */
  transformFits(s: Scenario): EventTransformFits | null;
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
  // Keyed on what the fits read: the loss fits (which carry the events with a target and the held method),
  // the events (their records), the area and the transform settings. A rename, a drag on the workbench
  // (its storm, loss line or record) or another hydrograph setting fits no event again.
  const transformFits = memoLast(
    (
      f: EventFits,
      events: Scenario['eventSet']['events'],
      areaM2: number,
      transform: Scenario['hydrograph']['transform'],
      parameter: string | null,
      objective: Scenario['hydrograph']['objective'],
    ): EventTransformFits | null => fitAllEventTransforms({ events, areaM2, transform, parameter, objective }, f),
  );
  return {
    fits: fitsOf,
    outcome: outcomeOf,
    designMethod: (s) => design(fitsOf(s), outcomeOf(s)),
    transformFits: (s) =>
      transformFits(
        fitsOf(s),
        s.eventSet.events,
        s.catchment.areaM2,
        s.hydrograph.transform,
        transformFitParameter(s.hydrograph),
        s.hydrograph.objective,
      ),
  };
}
