import {
  createStoredSlot,
  describeError as describe,
  SET_ASIDE_MARK,
  type OtherTabWatch,
  type SlotCodec,
  type StorageLike,
  type StoredSlot,
} from '../scenario/stored-slot';
import { MAX_NAME_LENGTH } from '../scenario/text-limits';
import type { Scenario } from '../scenario/types';
import { windowStorageEvents } from './other-tabs';
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
  const message = read.kind === 'unreadable' ? read.reason : `it was written by a newer version (${read.version}).`;

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
  const slot = currentScenarioSlot(storage, { watch });
  // The saved text as this tab finds it at the start is its stamp (see the stored-slot rules).
  slot.acknowledge();
  const changedElsewhere = (): boolean => slot.changedElsewhere();

  const takeTheirs = (): void => {
    const theirs = slot.peek();
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
    slot.acknowledge();
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
    slot.acknowledge();
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
    const failed = slot.write(scenario);
    if (failed === null) {
      lastSaved = scenario;
      if (store.getState().notice?.kind === 'save-failed') store.getState().actions.setNotice(null);
      return;
    }
    store.getState().actions.setNotice({
      kind: 'save-failed',
      message: `The latest change could not be saved in this browser (${failed}). It stays on screen; export it to keep it.`,
    });
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
