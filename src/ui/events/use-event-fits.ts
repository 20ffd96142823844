import { useDerived } from '../../store';
import { eventDerived } from '../../store/derive-events';
import type { DesignOutcome, EventFits } from '../../store/event-fits';
import type { EventTransformFits } from '../../store/event-transform-fits';

/** The fits of every event and the design outcome, from the store's event-set selectors (store/derive-events.ts). */
export function useEventFits(): { fits: EventFits; outcome: DesignOutcome } {
  const fits = useDerived((d, s) => eventDerived(d).fits(s));
  const outcome = useDerived((d, s) => eventDerived(d).outcome(s));
  return { fits, outcome };
}

/** The workbench's transform fitted to every event, from the store's event-set selectors (store/derive-events.ts). */
export function useEventTransformFits(): EventTransformFits | null {
  return useDerived((d, s) => eventDerived(d).transformFits(s));
}
