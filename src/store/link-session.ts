import { createStore, type StoreApi } from 'zustand/vanilla';
import { decodeScenarioLink, type Problem } from '../scenario';
import type { ScenarioResult } from '../scenario/problems';
import type { Scenario } from '../scenario/types';
import { createHistory } from './history';
import { persistStore, STORAGE_KEY, type Persistence, type StorageLike } from './persistence';
import type { WorkbenchStore } from './scenario-store';

type LibraryFactory = (typeof import('../scenario/library'))['createScenarioLibrary'];
let library: LibraryFactory | null = null;
/** The saved list's code, fetched only when a link is opened (not with the first screen). */
function loadLibrary(): Promise<LibraryFactory> {
  return import('../scenario/library').then((m) => (library = m.createScenarioLibrary));
}

/**
 * What happened with a share link in the address.
 *
 * - `none`: no link (or its message was dismissed).
 * - `shared`: a link's scenario is on screen, only on screen: the browser's
 *   saved copy is untouched and nothing is saved until the user keeps it or
 *   goes back to their own.
 * - `refused`: the link could not be opened; the user's own scenario is on
 *   screen and nothing was changed.
 * - `kept` / `back`: the outcome of the user's choice, said once.
 */
export type LinkState =
  | { readonly kind: 'none' }
  | {
      readonly kind: 'shared';
      /** Name of the shared scenario. */
      readonly name: string;
      /** Name of the user's own saved scenario, or null when this browser has none saved. */
      readonly ownName: string | null;
      /** False when this browser cannot save (storage off or unsafe), so keeping only ends the question. */
      readonly canSave: boolean;
      /** Why the last "keep" did not go through (the shared scenario stays on screen, unsaved). */
      readonly problem?: string;
    }
  | {
      readonly kind: 'refused';
      readonly problems: readonly Problem[];
      /** The scenario on screen, and whether the browser holds a saved one. */
      readonly ownName: string;
      readonly ownSaved: boolean;
    }
  | { readonly kind: 'kept'; readonly message: string }
  | { readonly kind: 'back'; readonly message: string };

export interface LinkSession extends Pick<StoreApi<LinkState>, 'getState' | 'subscribe'> {
  /** Opens the scenario of a fragment (with or without '#'); '' does nothing. */
  open(fragment: string): void;
  /** Keeps the shared scenario as the browser's current one; the user's previous one goes to the saved list first. */
  keep(): void;
  /** Puts the user's own scenario back on screen, with a fresh undo history; the shared one was never saved. */
  back(): void;
  dismiss(): void;
  /** Writes a pending change now (page hide). */
  flush(): void;
  /**
   * After the screen broke: stops saving without writing the pending change
   * (the one that broke it), and takes a shared link out of the address so
   * that a reload opens the user's own scenario instead of the link again.
   */
  halt(): void;
}

export interface LinkSessionOptions {
  readonly store: WorkbenchStore;
  readonly storage: StorageLike | null;
  /** False when the saved copy could not be set aside, so nothing may be written over it. */
  readonly canSave: boolean;
  /** The fragment of the address at start-up ('' for none): a link in it is opened at once. */
  readonly fragment: string;
  /** That fragment already read (off the page: store/open-scenario.ts `readLinkOffPage`); read here when absent. */
  readonly fragmentRead?: ScenarioResult;
  /** Removes the fragment from the address without reloading (history.replaceState). */
  readonly clearFragment: () => void;
  /** Quiet time before a change is saved, ms. */
  readonly persistDelayMs?: number;
  readonly now?: () => Date;
}

const why = (error: unknown): string => (error instanceof Error ? error.message : String(error));
const quoted = (name: string): string => `“${name}”`;

/**
 * Opening share links without losing the user's own work. A practitioner who
 * clicks a colleague's link expects to see that scenario at once, and expects
 * their own work to be there tomorrow; so the link's scenario is shown but
 * not saved. "Keep" first copies the user's own scenario into the saved list
 * (where it can be opened again), then saves the shared one as current.
 * "Back" shows the user's own again. A link that cannot be read changes
 * nothing and says what was wrong.
 */
export function createLinkSession(options: LinkSessionOptions): LinkSession {
  const { store, storage, canSave, clearFragment } = options;
  const delayMs = options.persistDelayMs ?? 400;
  const now = options.now ?? (() => new Date());
  const state = createStore<LinkState>()(() => ({ kind: 'none' }));
  let persistence: Persistence | null = null;
  /** The user's own scenario while a shared one is on screen, and whether the browser holds it. */
  let own: { scenario: Scenario; saved: boolean } = { scenario: store.getState().scenario, saved: false };

  const startSaving = (): void => {
    if (!persistence && storage && canSave) persistence = persistStore(store, storage, delayMs);
  };
  const stopSaving = (): void => {
    if (!persistence) return;
    persistence.flush();
    persistence.stop();
    persistence = null;
  };
  /** Shows a scenario with an undo history of its own (undo must not step back into the other one). */
  const show = (scenario: Scenario): void => {
    store.getState().actions.cancelGesture();
    store.setState({ history: createHistory(scenario), scenario, undoLabel: null, redoLabel: null });
  };

  const open = (fragment: string, read?: ScenarioResult): void => {
    const text = fragment.replace(/^#/, '').trim();
    if (text === '') return;
    const decoded = read ?? decodeScenarioLink(text);
    const current = state.getState();
    if (!decoded.ok) {
      if (current.kind === 'shared') {
        // The shared scenario on screen still waits for the user's choice; say what was wrong with the new link.
        state.setState(
          {
            ...current,
            problem: `The new link could not be opened: ${decoded.problems.map((p) => p.message).join(' ')}`,
          },
          true,
        );
        return;
      }
      // A link that cannot be read is taken out of the address: reloading must not refuse it again.
      clearFragment();
      state.setState(
        {
          kind: 'refused',
          problems: decoded.problems,
          ownName: store.getState().scenario.name,
          ownSaved: storageHolds(),
        },
        true,
      );
      return;
    }
    if (current.kind !== 'shared') {
      // Whatever is on screen now is the user's own: save it before it leaves the screen.
      stopSaving();
      own = { scenario: store.getState().scenario, saved: canSave && storageHolds() };
    }
    if (own.saved && JSON.stringify(own.scenario) === JSON.stringify(decoded.scenario)) {
      // The link holds what this browser already has: nothing to choose.
      if (current.kind === 'shared') show(own.scenario);
      startSaving();
      clearFragment();
      state.setState(
        {
          kind: 'kept',
          message: `The link holds ${quoted(decoded.scenario.name)} exactly as it is already saved in this browser.`,
        },
        true,
      );
      return;
    }
    show(decoded.scenario);
    // "Keep" puts the user's own scenario in the saved list: its code is fetched now, while the choice is read.
    void loadLibrary().catch(() => {});
    state.setState(
      {
        kind: 'shared',
        name: decoded.scenario.name,
        ownName: own.saved ? own.scenario.name : null,
        canSave: Boolean(storage && canSave),
      },
      true,
    );
  };

  /** True when the browser holds a current scenario (read afresh; false when it cannot be read). */
  function storageHolds(): boolean {
    try {
      return storage?.getItem(STORAGE_KEY) != null;
    } catch {
      return false;
    }
  }

  /** "Keep": at once when the saved list's code is here (it is fetched as a link opens), else once it arrives. */
  const keep = (): void => {
    if (library) keepWith(library);
    else {
      loadLibrary().then(keepWith, (error: unknown) => {
        const current = state.getState();
        if (current.kind !== 'shared') return;
        state.setState({ ...current, problem: `The shared scenario could not be kept (${why(error)}); try again.` });
      });
    }
  };

  const keepWith = (createScenarioLibrary: LibraryFactory): void => {
    const current = state.getState();
    if (current.kind !== 'shared') return;
    const shared = store.getState().scenario;
    if (!storage || !canSave) {
      clearFragment();
      state.setState(
        {
          kind: 'kept',
          message: `${quoted(shared.name)} stays on screen, but this browser does not allow saving here: save it as a file to keep it.`,
        },
        true,
      );
      return;
    }
    let putAside = '';
    if (own.saved && JSON.stringify(own.scenario) !== JSON.stringify(shared)) {
      const saved = createScenarioLibrary(storage, { now }).save(own.scenario);
      if (!saved.ok) {
        state.setState({
          ...current,
          problem:
            `Your own scenario ${quoted(own.scenario.name)} could not be put in Saved scenarios, so it was not replaced ` +
            `(${saved.problems.map((p) => p.message).join(' ')}). Save the shared scenario as a file to keep it.`,
        });
        return;
      }
      putAside = ` Your previous scenario ${quoted(own.scenario.name)} is in Saved scenarios.`;
    }
    try {
      storage.setItem(STORAGE_KEY, JSON.stringify(shared));
    } catch (error) {
      state.setState({
        ...current,
        problem: `${quoted(shared.name)} could not be saved in this browser (${why(error)}); save it as a file to keep it.${putAside}`,
      });
      return;
    }
    own = { scenario: shared, saved: true };
    startSaving();
    clearFragment();
    state.setState(
      { kind: 'kept', message: `${quoted(shared.name)} is now your current scenario in this browser.${putAside}` },
      true,
    );
  };

  const back = (): void => {
    const current = state.getState();
    if (current.kind !== 'shared') return;
    show(own.scenario);
    startSaving();
    clearFragment();
    state.setState(
      {
        kind: 'back',
        message: `Back to ${quoted(own.scenario.name)}. The shared scenario ${quoted(current.name)} was not saved.`,
      },
      true,
    );
  };

  open(options.fragment, options.fragmentRead);
  // Saving runs unless a shared scenario is waiting for the user's choice.
  if (state.getState().kind !== 'shared') startSaving();

  return {
    getState: state.getState,
    subscribe: state.subscribe,
    open,
    keep,
    back,
    dismiss: () => {
      if (state.getState().kind !== 'shared') state.setState({ kind: 'none' }, true);
    },
    flush: () => persistence?.flush(),
    halt: () => {
      persistence?.stop();
      persistence = null;
      if (state.getState().kind === 'shared') clearFragment();
    },
  };
}
