import {
  createStoredSlot,
  describeError as describe,
  SET_ASIDE_MARK,
  type OtherTabWatch,
  type SlotCodec,
  type StorageLike,
  type StoredSlot,
} from '../scenario/stored-slot';
import type { Scenario } from '../scenario/types';
import { columnNumbers, LARGE_NUMBERS, readLargeMarker } from './large-marker';
import type { LargeRead } from './large-store';
import { windowStorageEvents } from './other-tabs';
import type { OtherTabChoiceHost } from './other-tab-choice';
import { readScenarioJson } from './read-scenario';

export type { OtherTabWatch, StorageLike } from '../scenario/stored-slot';
import type { StorageNotice, WorkbenchStore } from './scenario-store';

/** Where the browser keeps the current scenario. */
export const STORAGE_KEY = 'raincut.scenario';
/** Damaged saved data is moved to this key plus a time stamp, never deleted. */
export const SET_ASIDE_PREFIX = `${STORAGE_KEY}${SET_ASIDE_MARK}`;

/**
 * The current scenario's envelope is the scenario document itself (its own
 * `version`, upgraded by the schema's migrations): read through the one
 * schema, written as plain JSON.
 */
const SCENARIO_CODEC: SlotCodec<Scenario> = {
  decode(text) {
    const read = readScenarioJson(text);
    return read.ok ? { kind: 'ok', value: read.scenario, damage: [] } : { kind: 'unreadable', reason: read.message };
  },
  encode: (scenario) => JSON.stringify(scenario),
};

/** The browser's slot of the current scenario (the stored-slot rules: set-aside, two tabs). */
export function currentScenarioSlot(
  storage: StorageLike,
  options: { readonly now?: () => Date; readonly watch?: OtherTabWatch } = {},
): StoredSlot<Scenario> {
  return createStoredSlot(storage, { key: STORAGE_KEY, codec: SCENARIO_CODEC, ...options });
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
  const slot = currentScenarioSlot(storage, { now: () => new Date(nowIso) });
  let saved: string | null;
  try {
    saved = storage.getItem(STORAGE_KEY);
  } catch (error) {
    return { ok: false, reason: describe(error) };
  }
  if (saved === null) return { ok: true, key: null };
  const aside = slot.setAside(saved);
  if (!aside.ok) return aside;
  // The copy is made; an original that stays is set aside again next time, never lost.
  slot.remove();
  return aside;
}

export interface Loaded {
  readonly scenario: Scenario;
  readonly notice: StorageNotice | null;
  /** False when the saved copy could not be moved aside: saving would overwrite it. */
  readonly canSave: boolean;
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
  options: {
    readonly skipSaved?: boolean;
    /** The large store's record, read before start-up when the slot held a marker (see ./large-marker.ts). */
    readonly large?: LargeRead;
  } = {},
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
  const read = currentScenarioSlot(storage).read();
  if (read.kind === 'blocked') {
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message: `The saved scenario could not be read from this browser (${read.reason}).`,
      },
      canSave: false,
    };
  }
  if (read.kind === 'empty') return { scenario: fallback, notice: null, canSave: true };
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
  if (read.kind === 'ok') return { scenario: read.value, notice: null, canSave: true };
  const marker = readLargeMarker(read.text);
  if (marker && options.large?.ok) return { scenario: options.large.scenario, notice: null, canSave: true };
  const message = marker
    ? `${options.large && !options.large.ok ? options.large.message : 'This browser’s large store was not read.'} The pointer to it is set aside; the record stays in the large store.`
    : read.kind === 'unreadable'
      ? read.reason
      : `it was written by a newer version (${read.version}).`;

  const aside = setAsideSaved(storage, nowIso);
  if (!aside.ok || aside.key === null) {
    return {
      scenario: fallback,
      notice: {
        kind: 'unavailable',
        message:
          `The saved scenario is damaged (${message}) and could not be set aside (${aside.ok ? 'it vanished while being read' : aside.reason}). ` +
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
      message: `The saved scenario could not be opened: ${message} It is kept as it was (browser storage key "${aside.key}") and listed under Saved scenarios, “Set-aside copies”, to download or restore; the demo scenario is shown instead.`,
    },
    canSave: true,
  };
}

export interface Persistence {
  /** Writes any pending change now (on page hide). */
  flush(): void;
  stop(): void;
}

/** Whether this browser has IndexedDB, where the large store lives (not in a private window of some browsers, nor in Node). */
const hasLargeStore = (): boolean => typeof indexedDB !== 'undefined';
/** The other-tab choices' code, fetched when the user makes one. */
const loadChoice = (): Promise<typeof import('./other-tab-choice')> => import('./other-tab-choice');
type LargeModule = typeof import('./large-store');
/** The large store's code (idb-keyval and the packing), fetched only when a scenario needs it. */
const loadLarge = (): Promise<LargeModule> => import('./large-store');
/** A failed fetch of the large store's code, in the shape of a failed read. */
const failedLoad = (error: unknown): { readonly ok: false; readonly message: string } => ({
  ok: false,
  message: `The code of this browser’s large store could not be loaded (${describe(error)}).`,
});

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
  const slot = currentScenarioSlot(storage, { watch });
  // The saved text as this tab finds it at the start is its stamp (see the stored-slot rules).
  slot.acknowledge();
  const changedElsewhere = (): boolean => slot.changedElsewhere();
  /** Large saves run one after another; a save overtaken by a newer one before it starts is skipped. */
  let largeQueue: Promise<void> = Promise.resolve();
  let largeLatest: Scenario | null = null;
  let stopped = false;
  /** Settled by flush (the page is closing), so large saves waiting for a quiet moment go at once; then a fresh one. */
  let hurry: () => void = () => undefined;
  const nextHurried = (): Promise<void> => new Promise<void>((resolve) => (hurry = resolve));
  let hurried = nextHurried();

  /** What the other-tab choices (./other-tab-choice.ts, loaded when one is made) need of this tab's saving. */
  const choice: OtherTabChoiceHost = {
    store,
    slot,
    storage,
    taken: (scenario) => {
      lastSaved = scenario;
      pending = null;
    },
    keep: (scenario) => {
      pending = null;
      save(scenario);
    },
  };
  const takeTheirs = (): void => void loadChoice().then((m) => m.takeTheirs(choice), reportFailedLoad);
  const keepMine = (): Promise<void> => loadChoice().then((m) => m.keepMine(choice), reportFailedLoad);
  const reportFailedLoad = (error: unknown): void =>
    store.getState().actions.setNotice({ kind: 'save-failed', message: failedLoad(error).message });

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

  function write(urgent = false): void {
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
    save(scenario, urgent);
  }

  function save(scenario: Scenario, urgent = false): void {
    if (columnNumbers(scenario) > LARGE_NUMBERS && hasLargeStore()) {
      saveLarge(scenario, urgent);
      return;
    }
    const before = readLargeMarker(slot.peek());
    const failed = slot.write(scenario);
    if (failed === null) {
      lastSaved = scenario;
      if (store.getState().notice?.kind === 'save-failed') store.getState().actions.setNotice(null);
      // Small again: the large record the marker named is no longer anyone's.
      if (before) void loadLarge().then((large) => large.dropLarge(before.id), failedLoad);
      return;
    }
    // Too large for localStorage after all: the large store takes it.
    if (/quota/i.test(failed) && hasLargeStore()) {
      saveLarge(scenario, urgent);
      return;
    }
    store.getState().actions.setNotice({
      kind: 'save-failed',
      message: `The latest change could not be saved in this browser (${failed}). It stays on screen; export it to keep it.`,
    });
  }

  /** Saves in the large store (IndexedDB) when the page is idle; one save at a time (see ./large-store.ts). */
  function saveLarge(scenario: Scenario, urgent: boolean): void {
    largeLatest = scenario;
    const current = (): boolean => !stopped && scenario === largeLatest;
    const closing = hurried;
    largeQueue = largeQueue
      .then(loadLarge)
      .then((large) =>
        large.saveInTurn({
          store,
          slot,
          scenario,
          urgent,
          hurried: closing,
          current,
          saved: () => (lastSaved = scenario),
          changed: () => {
            // Kept pending: written once the user has chosen.
            pending ??= scenario;
            tellOtherTab();
          },
        }),
      )
      .catch(reportFailedLoad);
  }

  const unwatch = slot.watch(() => {
    if (changedElsewhere()) tellOtherTab();
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
      hurry();
      hurried = nextHurried();
      write(true);
    },
    stop: () => {
      stopped = true;
      if (timer !== null) clearTimeout(timer);
      timer = null;
      unsubscribe();
      unwatch();
    },
  };
}
