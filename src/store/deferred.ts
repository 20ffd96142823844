import { useDeferredValue, useEffect, useMemo, useState } from 'react';
import { useStore } from 'zustand';
import type { Scenario } from '../scenario/types';
import type { Derived } from './derive';
import { useWorkbenchStore } from './react';

// Imported by path, by the hydrograph's parts that load after the first screen: not through
// store/index.ts, so the first screen's JavaScript does not carry it.

/**
 * A derived value that may trail the screen by a render: computed from the
 * scenario as React defers it (useDeferredValue). While the loss line is
 * dragged, the hyetograph, the line and the totals update in the urgent
 * render of each frame; a costly value read through this hook (the routed
 * hydrograph) is worked out in a render React runs right after, and drops
 * when the next frame's update has already arrived, so the drag never waits
 * for it. Every reader of one such value must use this hook: the store's
 * selectors remember one input each, and a reader of the current scenario
 * would make them compute it twice a frame.
 */
export function useDeferredDerived<T>(pick: (derived: Derived, scenario: Scenario) => T): T {
  const store = useWorkbenchStore();
  const deferred = useDeferredValue(useStore(store, (state) => state.scenario));
  // The hydrograph side of the derived values arrives after the first screen; read again when it does.
  const [ready, setReady] = useState(0);
  useEffect(() => {
    let live = true;
    store.derived.whenHydrographReady(() => {
      if (live) setReady((n) => n + 1);
    });
    return () => {
      live = false;
    };
  }, [store]);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- `pick` is a new function each render; the value depends on the scenario (and readiness) only
  return useMemo(() => pick(store.derived, deferred), [store, deferred, ready]);
}
