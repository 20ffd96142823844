import { useMemo } from 'react';
import { useDerived, useScenario } from '../../store';
import { designOutcome, fitAllEvents, type DesignOutcome, type EventFits } from './event-fits';

/** The fits of every event and the design outcome, recomputed only when the set, the method or the area change. */
export function useEventFits(): { fits: EventFits; outcome: DesignOutcome } {
  const eventSet = useScenario((s) => s.eventSet);
  const areaM2 = useScenario((s) => s.catchment.areaM2);
  const benchParameter = useScenario((s) => s.observed?.parameter ?? null);
  const method = useDerived((d, s) => d.effectiveMethod(s));
  const kind = useScenario((s) => s.method.kind);
  const scenario = useScenario((s) => s);
  return useMemo(() => {
    const fits = fitAllEvents(scenario, method);
    return { fits, outcome: designOutcome(scenario, fits) };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the parts read, not every edit
  }, [eventSet, areaM2, benchParameter, method, kind]);
}
