export { createWorkbenchStore } from './scenario-store';
export type { CreateStoreOptions, WorkbenchActions, WorkbenchStore } from './scenario-store';
export { createDerived, type Derived, type Separation } from './derive';
export {
  withBaseflowDefaults,
  withBaseflowKind,
  withBaseflowParam,
  withRecordOffsetH,
  withSeparationAsObserved,
  withStreamflowRecord,
  withoutStreamflow,
} from './streamflow-edits';
export { alignRecord } from './alignment';
export { readScenario } from './read-scenario';
export {
  loadScenario,
  persistStore,
  STORAGE_KEY,
  SET_ASIDE_PREFIX,
  setAsideSaved,
  type StorageLike,
} from './persistence';
export { StoreProvider, useActions, useDerived, useScenario, useWorkbench, useWorkbenchStore } from './react';
export {
  withDesignPick,
  withDesignStormOnWorkbench,
  withEventAdded,
  withEventMoved,
  withEventOnWorkbench,
  withEventParameter,
  withEventRemoved,
  withEventRenamed,
} from './event-edits';
