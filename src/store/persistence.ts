import type { Scenario } from '../scenario/types';
import { readScenarioJson } from './read-scenario';
import type { StorageNotice, WorkbenchStore } from './scenario-store';

/** Where the browser keeps the current scenario. */
export const STORAGE_KEY = 'raincut.scenario';
/** Damaged saved data is moved to this key plus a time stamp, never deleted. */
export const SET_ASIDE_PREFIX = 'raincut.scenario.damaged.';

/** The part of the Web Storage interface used here (localStorage, or a test double). */
export interface StorageLike {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export interface Loaded {
  readonly scenario: Scenario;
  readonly notice: StorageNotice | null;
  /** False when the saved copy could not be moved aside: saving would overwrite it. */
  readonly canSave: boolean;
}

const describe = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/**
 * Restores the saved scenario, or `fallback` when there is none. A saved copy
 * that cannot be read is moved to a set-aside key (so nothing the user had is
 * lost) and reported; the screen opens on `fallback`.
 */
export function loadScenario(storage: StorageLike | null, fallback: Scenario, nowIso: string): Loaded {
  if (!storage) {
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message: 'This browser does not allow saving here, so changes will not be kept after the page closes.',
      },
      canSave: false,
    };
  }
  let saved: string | null;
  try {
    saved = storage.getItem(STORAGE_KEY);
  } catch (error) {
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message: `The saved scenario could not be read from this browser (${describe(error)}).`,
      },
      canSave: false,
    };
  }
  if (saved === null) return { scenario: fallback, notice: null, canSave: true };
  const read = readScenarioJson(saved);
  if (read.ok) return { scenario: read.scenario, notice: null, canSave: true };

  const key = SET_ASIDE_PREFIX + nowIso;
  try {
    storage.setItem(key, saved);
    storage.removeItem(STORAGE_KEY);
  } catch (error) {
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message:
          `The saved scenario is damaged (${read.message}) and could not be set aside (${describe(error)}). ` +
          `It is left untouched under "${STORAGE_KEY}", and nothing will be saved over it in this session.`,
      },
      canSave: false,
    };
  }
  return {
    scenario: fallback,
    notice: {
      kind: 'set-aside',
      key,
      message: `The saved scenario could not be opened: ${read.message} It was kept in browser storage under "${key}", and the demo scenario is shown instead.`,
    },
    canSave: true,
  };
}

export interface Persistence {
  /** Writes any pending change now (on page hide). */
  flush(): void;
  stop(): void;
}

/**
 * Saves the scenario whenever it changes, at most once per `delayMs` of
 * quiet (a drag saves once, after it stops). A failed save is reported
 * through the store's notice, once per kind of failure.
 */
export function persistStore(store: WorkbenchStore, storage: StorageLike, delayMs = 400): Persistence {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let pending: Scenario | null = null;
  let lastSaved: Scenario = store.getState().scenario;

  const write = (): void => {
    timer = null;
    const scenario = pending;
    pending = null;
    if (!scenario || scenario === lastSaved) return;
    try {
      storage.setItem(STORAGE_KEY, JSON.stringify(scenario));
      lastSaved = scenario;
      if (store.getState().notice?.kind === 'save-failed') store.getState().actions.setNotice(null);
    } catch (error) {
      store.getState().actions.setNotice({
        kind: 'save-failed',
        message: `The latest change could not be saved in this browser (${describe(error)}). It stays on screen; export it to keep it.`,
      });
    }
  };

  const unsubscribe = store.subscribe((state, previous) => {
    if (state.scenario === previous.scenario) return;
    pending = state.scenario;
    if (timer !== null) clearTimeout(timer);
    timer = setTimeout(write, delayMs);
  });

  return {
    flush: () => {
      if (timer !== null) clearTimeout(timer);
      write();
    },
    stop: () => {
      if (timer !== null) clearTimeout(timer);
      timer = null;
      unsubscribe();
    },
  };
}
