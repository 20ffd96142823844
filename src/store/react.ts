import { createContext, createElement, useContext, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { Scenario } from '../scenario/types';
import type { Derived } from './derive';
import type { WorkbenchActions, WorkbenchState, WorkbenchStore } from './scenario-store';

/** The thin React binding: a context carrying one vanilla store, and narrow hooks. */
const StoreContext = createContext<WorkbenchStore | null>(null);

export function StoreProvider({ store, children }: { store: WorkbenchStore; children?: ReactNode }) {
  return createElement(StoreContext.Provider, { value: store }, children);
}

export function useWorkbenchStore(): WorkbenchStore {
  const store = useContext(StoreContext);
  if (!store) throw new Error('useWorkbenchStore needs a <StoreProvider> above it.');
  return store;
}

/** Any slice of the store state; re-renders only when the slice changes (===). */
export function useWorkbench<T>(selector: (state: WorkbenchState) => T): T {
  return useStore(useWorkbenchStore(), selector);
}

/** A slice of the scenario document. */
export function useScenario<T>(selector: (scenario: Scenario) => T): T {
  return useStore(useWorkbenchStore(), (state) => selector(state.scenario));
}

/** A derived value (memoised in the store's selectors, so stable while its inputs are). */
export function useDerived<T>(pick: (derived: Derived, scenario: Scenario) => T): T {
  const store = useWorkbenchStore();
  return useStore(store, (state) => pick(store.derived, state.scenario));
}

/** The store's actions (one stable object). */
export function useActions(): WorkbenchActions {
  return useWorkbenchStore().getState().actions;
}
