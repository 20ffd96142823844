export { createWorkbenchStore } from './scenario-store';
export type {
  CreateStoreOptions,
  EditOptions,
  StorageNotice,
  WorkbenchActions,
  WorkbenchState,
  WorkbenchStore,
} from './scenario-store';
export { createDerived, loadHydrographSide, type Derived, type Results, type Separation, type Target } from './derive';
export type { ComputedHydrograph, Outcome, TimeSeries } from './derive-hydrograph';
// The hydrograph's edits and fit (./hydrograph-edits) are imported by path: the panel that uses them loads on first use.
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
export { AREA_UNITS_KEY, DEFAULT_AREA_UNITS, readAreaUnits, type AreaUnits } from './area-units';
export { readScenario } from './read-scenario';
export {
  loadScenario,
  persistStore,
  STORAGE_KEY,
  SET_ASIDE_PREFIX,
  setAsideSaved,
  type SetAsideResult,
  type Loaded,
  type Persistence,
  type OtherTabWatch,
  type StorageLike,
} from './persistence';
// The pin board itself (./pins) is imported by path: the screen fetches it after the first frame (./pin-board).
export { createPinShelf, MAX_PINS, PINS_KEY, type PinShelf } from './pin-board';
export type { Pin, PinBoard, PinState } from './pins';
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
