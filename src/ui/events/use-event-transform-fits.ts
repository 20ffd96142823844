import { useMemo } from 'react';
import { useScenario } from '../../store';
import type { EventFits } from '../../store/event-fits';
import { fitAllEventTransforms, type EventTransformFits } from './event-transform-fits';

/** The transform fitted for every event, recomputed only when the loss fits or the hydrograph settings change. */
export function useEventTransformFits(fits: EventFits): EventTransformFits | null {
  const hydrograph = useScenario((s) => s.hydrograph);
  const scenario = useScenario((s) => s);
  return useMemo(
    () => fitAllEventTransforms(scenario, fits),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the parts read (the loss fits carry the set and the area)
    [fits, hydrograph],
  );
}
