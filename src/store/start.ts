import type { ScenarioResult } from '../scenario/problems';
import type { Scenario } from '../scenario/types';
import { readAreaUnits, writeAreaUnits } from './area-units';
import { createLinkSession, type LinkSession } from './link-session';
import type { LargeRead } from './large-store';
import { loadScenario, type StorageLike } from './persistence';
import { createWorkbenchStore, type WorkbenchStore } from './scenario-store';

export interface StartOptions {
  /** The browser's storage, or null where it is switched off. */
  readonly storage: StorageLike | null;
  /** The address's fragment ('#…' or ''): a share link in it opens at once, unsaved. */
  readonly fragment: string;
  /** Shown when nothing is saved (the demo). */
  readonly fallback: Scenario;
  readonly nowIso: string;
  /** Takes the fragment out of the address once the user has chosen (history.replaceState). */
  readonly clearFragment: () => void;
  readonly persistDelayMs?: number;
  /** Leave the saved scenario unopened and unwritten (chosen on the error screen; see crash.ts). */
  readonly skipSaved?: boolean;
  /** The large store's record, read first when the saved slot held its marker (src/store/large-marker.ts). */
  readonly large?: LargeRead;
  /** The fragment's share link, read first off the page (src/store/open-scenario.ts); read on the page when absent. */
  readonly linkRead?: ScenarioResult;
}

export interface Started {
  readonly store: WorkbenchStore;
  readonly link: LinkSession;
}

/**
 * The workbench at page load: the saved scenario (damaged data set aside, as
 * `loadScenario` does), then a share link in the address, if any, shown on
 * top of it without being saved (see `createLinkSession`). Saving starts
 * only when no shared scenario is waiting for the user's choice.
 */
export function startWorkbench(options: StartOptions): Started {
  const loaded = loadScenario(options.storage, options.fallback, options.nowIso, {
    skipSaved: options.skipSaved === true,
    ...(options.large ? { large: options.large } : {}),
  });
  const store = createWorkbenchStore(loaded.scenario, {
    notice: loaded.notice,
    areaUnits: readAreaUnits(options.storage),
  });
  // The area unit is a preference of this browser's: kept whenever it changes, never in the scenario.
  store.subscribe((state, before) => {
    if (state.areaUnits !== before.areaUnits) writeAreaUnits(options.storage, state.areaUnits);
  });
  const link = createLinkSession({
    store,
    storage: options.storage,
    canSave: loaded.canSave,
    fragment: options.fragment,
    ...(options.linkRead ? { fragmentRead: options.linkRead } : {}),
    clearFragment: options.clearFragment,
    ...(options.persistDelayMs === undefined ? {} : { persistDelayMs: options.persistDelayMs }),
  });
  return { store, link };
}
