import { MAX_NAME_LENGTH } from '../scenario/text-limits';
import type { Scenario } from '../scenario/types';
import { readScenarioJson } from './read-scenario';
import type { StorageNotice, WorkbenchStore } from './scenario-store';

/** Where the browser keeps the current scenario. */
export const STORAGE_KEY = 'raincut.scenario';
/** Damaged saved data is moved to this key plus a time stamp, never deleted. */
export const SET_ASIDE_PREFIX = 'raincut.scenario.damaged.';

/**
 * The part of the Web Storage interface used here (localStorage, or a test
 * double). `length` and `key` let the saved list find set-aside copies
 * (src/store/set-aside.ts); without them there is simply nothing to list.
 */
export interface StorageLike {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
  readonly length?: number;
  key?(index: number): string | null;
}

/** The outcome of setting the saved scenario aside; never an exception. */
export type SetAsideResult =
  | { readonly ok: true; readonly key: string }
  | { readonly ok: true; readonly key: null }
  | { readonly ok: false; readonly reason: string };

/**
 * Moves the saved scenario to a set-aside key of its own (SET_ASIDE_PREFIX
 * and a time stamp; "-2", "-3" … when that is taken), so that it is kept but
 * no longer opened. The copy is written before the original is removed; if
 * the copy cannot be written (storage full, switched off), the original is
 * left exactly where it was and the reason is returned. `key: null` when
 * nothing was saved. Never throws.
 */
export function setAsideSaved(storage: StorageLike, nowIso: string): SetAsideResult {
  try {
    const saved = storage.getItem(STORAGE_KEY);
    if (saved === null) return { ok: true, key: null };
    let key = SET_ASIDE_PREFIX + nowIso;
    for (let n = 2; storage.getItem(key) !== null; n++) key = `${SET_ASIDE_PREFIX}${nowIso}-${n}`;
    storage.setItem(key, saved);
    try {
      storage.removeItem(STORAGE_KEY);
    } catch {
      // The copy is made; an original that stays is set aside again next time, never lost.
    }
    return { ok: true, key };
  } catch (error) {
    return { ok: false, reason: describe(error) };
  }
}

export interface Loaded {
  readonly scenario: Scenario;
  readonly notice: StorageNotice | null;
  /** False when the saved copy could not be moved aside: saving would overwrite it. */
  readonly canSave: boolean;
}

/** An error in words: its message, after its name when that says more than "Error" (QuotaExceededError). */
function describe(error: unknown): string {
  if (error !== null && typeof error === 'object' && typeof (error as Error).message === 'string') {
    const { name, message } = error as Error;
    return typeof name === 'string' && name !== '' && name !== 'Error' ? `${name}: ${message}` : message;
  }
  return String(error);
}

/**
 * Restores the saved scenario, or `fallback` when there is none. A saved copy
 * that cannot be read is moved to a set-aside key (so nothing the user had is
 * lost; the saved list shows it, see set-aside.ts) and reported; the screen
 * opens on `fallback`. `skipSaved` leaves the saved copy unopened and
 * unwritten (chosen on the error screen when it could not be set aside).
 */
export function loadScenario(
  storage: StorageLike | null,
  fallback: Scenario,
  nowIso: string,
  options: { readonly skipSaved?: boolean } = {},
): Loaded {
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
  if (options.skipSaved) {
    // After it stopped the screen and could not be set aside: left unopened and unwritten (see crash.ts).
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message:
          'The saved scenario was left unopened, as chosen after it stopped the workbench, and could not be set aside. ' +
          'It is still stored in this browser, unchanged; nothing will be saved over it in this tab.',
      },
      canSave: false,
    };
  }
  const read = readScenarioJson(saved);
  if (read.ok) return { scenario: read.scenario, notice: null, canSave: true };

  const aside = setAsideSaved(storage, nowIso);
  if (!aside.ok || aside.key === null) {
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message:
          `The saved scenario is damaged (${read.message}) and could not be set aside (${aside.ok ? 'it vanished while being read' : aside.reason}). ` +
          `It is left untouched under "${STORAGE_KEY}", and nothing will be saved over it in this session.`,
      },
      canSave: false,
    };
  }
  return {
    scenario: fallback,
    notice: {
      kind: 'set-aside',
      key: aside.key,
      message: `The saved scenario could not be opened: ${read.message} It is kept as it was (browser storage key "${aside.key}") and listed under Saved scenarios, “Set-aside copies”, to download or restore; the demo scenario is shown instead.`,
    },
    canSave: true,
  };
}

export interface Persistence {
  /** Writes any pending change now (on page hide). */
  flush(): void;
  stop(): void;
}

/** Calls back with the storage key another tab changed (null: all cleared); returns how to stop listening. */
export type OtherTabWatch = (changed: (key: string | null) => void) => () => void;

/** The browser's "storage" events: fired in every other tab of the same origin when one tab writes. */
const windowStorageEvents: OtherTabWatch = (changed) => {
  if (typeof window === 'undefined') return () => undefined;
  const listener = (event: StorageEvent): void => changed(event.key);
  window.addEventListener('storage', listener);
  return () => window.removeEventListener('storage', listener);
};

/** The name of this tab's copy when the user keeps it beside the other tab's version. */
export function copyName(name: string): string {
  const suffix = ' (this tab’s copy)';
  return `${name.slice(0, Math.max(0, MAX_NAME_LENGTH - suffix.length))}${suffix}`;
}

/**
 * Saves the scenario whenever it changes, at most once per `delayMs` of
 * quiet (a drag saves once, after it stops). A failed save is reported
 * through the store's notice, once per kind of failure.
 *
 * Two tabs: the saved text this tab last read or wrote is its version
 * stamp. When the saved scenario is found changed by another tab (its
 * "storage" event, or a different text at the next save), nothing is
 * written over it: the notice says so and offers the two ways on, to open
 * the other tab's version here or to keep this one (saved under a new name
 * in the saved list, then saved as the current scenario again).
 */
export function persistStore(
  store: WorkbenchStore,
  storage: StorageLike,
  delayMs = 400,
  watch: OtherTabWatch = windowStorageEvents,
): Persistence {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let pending: Scenario | null = null;
  let lastSaved: Scenario = store.getState().scenario;
  let known: string | null = readSlot();

  function readSlot(): string | null {
    try {
      return storage.getItem(STORAGE_KEY);
    } catch {
      return null;
    }
  }

  /** True when another tab wrote the saved scenario since this tab last read or wrote it. */
  const changedElsewhere = (): boolean => {
    const now = readSlot();
    return now !== null && now !== known;
  };

  const takeTheirs = (): void => {
    const theirs = readSlot();
    store.getState().actions.setNotice(null);
    if (theirs === null) return;
    const read = readScenarioJson(theirs);
    if (!read.ok) {
      store.getState().actions.setNotice({
        kind: 'save-failed',
        message: `The other tab's version could not be opened (${read.message}). This tab's scenario stays on screen and is not saved over it; export it to keep it.`,
      });
      return;
    }
    known = theirs;
    lastSaved = read.scenario;
    pending = null;
    store.getState().actions.replaceScenario(read.scenario, 'Open the other tab’s version');
    // The edit above is this tab's own view of the saved text: nothing to write.
    lastSaved = store.getState().scenario;
  };

  const keepMine = async (): Promise<void> => {
    const mine = store.getState().scenario;
    // The saved list's code loads here, on this rare path, not with the first screen.
    const { createScenarioLibrary } = await import('../scenario/library');
    const saved = createScenarioLibrary(storage).save({ ...mine, name: copyName(mine.name) });
    if (!saved.ok) {
      store.getState().actions.setNotice({
        kind: 'save-failed',
        message: `This tab's scenario could not be saved as a copy (${saved.problems.map((p) => p.message).join(' ')}). It stays on screen; export it to keep it.`,
      });
      return;
    }
    known = readSlot();
    store.getState().actions.setNotice(null);
    pending = null;
    save(mine);
  };

  const tellOtherTab = (): void => {
    if (store.getState().notice?.kind === 'other-tab') return;
    store.getState().actions.setNotice({
      kind: 'other-tab',
      message:
        'The saved scenario was changed in another tab of this workbench. This tab has not saved over it. Open that version here, or keep this one: it is saved under a new name in Saved scenarios and becomes the saved scenario again.',
      takeTheirs,
      keepMine,
    });
  };

  function write(): void {
    timer = null;
    const scenario = pending;
    if (!scenario || scenario === lastSaved) {
      pending = null;
      return;
    }
    if (changedElsewhere()) {
      // Kept pending: written once the user has chosen.
      tellOtherTab();
      return;
    }
    pending = null;
    save(scenario);
  }

  function save(scenario: Scenario): void {
    try {
      const json = JSON.stringify(scenario);
      storage.setItem(STORAGE_KEY, json);
      known = json;
      lastSaved = scenario;
      if (store.getState().notice?.kind === 'save-failed') store.getState().actions.setNotice(null);
    } catch (error) {
      store.getState().actions.setNotice({
        kind: 'save-failed',
        message: `The latest change could not be saved in this browser (${describe(error)}). It stays on screen; export it to keep it.`,
      });
    }
  }

  const unwatch = watch((key) => {
    if ((key === STORAGE_KEY || key === null) && changedElsewhere()) tellOtherTab();
  });

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
      unwatch();
    },
  };
}
