import { OLDER_TEXT, SAVED_TEXT } from './crash-text';
import type { CrashReport } from './crash-report';
import { readLargeMarker } from './large-marker';
import type { LinkSession } from './link-session';
import { STORAGE_KEY, setAsideSaved, type StorageLike } from './persistence';
import type { WorkbenchStore } from './scenario-store';

export type { CrashReport, SavedState } from './crash-report';

export type CrashSetAside =
  { readonly ok: true; readonly text: string } | { readonly ok: false; readonly text: string };

export interface CrashRecovery {
  /** Stops the autosave (dropping the change that broke the screen), clears a shared link, and says what is saved. */
  report(): CrashReport;
  /** Moves the saved scenario to a set-aside copy, so a reload starts from the demo. Never throws. */
  setAside(): CrashSetAside;
  /** The saved scenario's text, for a download, or null (for a scenario in the large store, the marker: see `largeText`). */
  savedText(): string | null;
  /**
   * When the saved scenario is in the large store: reads its record and says
   * truthfully whether it is the scenario on screen (`saved`), an older one
   * (`older`), or cannot be read (`gone`); null when it is not there.
   */
  checkLarge(): Promise<CrashReport> | null;
  /** The large store's saved scenario as a document's text, for a download; null when it is not there. */
  largeText(): Promise<
    { readonly ok: true; readonly text: string } | { readonly ok: false; readonly text: string }
  > | null;
  /** Marks this tab to start without opening the saved scenario (when it could not be set aside); false when it cannot. */
  skipSavedNextTime(): boolean;
}

export interface CrashRecoveryOptions {
  readonly store: WorkbenchStore;
  readonly link: Pick<LinkSession, 'getState' | 'halt'>;
  readonly storage: StorageLike | null;
  readonly now: () => Date;
  /** Where "start without the saved scenario" is remembered for this tab (sessionStorage), or null. */
  readonly tabStorage: Pick<StorageLike, 'setItem'> | null;
}

/** The tab-only key that asks the next start to leave the saved scenario unopened. */
export { SKIP_SAVED_KEY } from './crash-keys';
import { SKIP_SAVED_KEY } from './crash-keys';

/** The large store's side of this screen (./crash-large.ts), fetched only when the saved scenario is there. */
const loadCrashLarge = (): Promise<typeof import('./crash-large')> => import('./crash-large');
const notLoaded = (error: unknown): string => `The large store’s code did not load (${String(error)}).`;

function readSaved(storage: StorageLike | null): string | null {
  try {
    return storage?.getItem(STORAGE_KEY) ?? null;
  } catch {
    return null;
  }
}

export function createCrashRecovery(options: CrashRecoveryOptions): CrashRecovery {
  const { store, link, storage } = options;
  return {
    report() {
      const shared = link.getState().kind === 'shared';
      link.halt();
      if (shared) {
        return {
          state: 'shared',
          text:
            'The scenario on screen came from a share link and was never saved. Your own saved scenario has not been changed, ' +
            'and the link has been taken out of the address, so reloading opens your own scenario.',
        };
      }
      const saved = readSaved(storage);
      if (saved === null) {
        return {
          state: 'nothing',
          text: 'Nothing is saved in this browser, so reloading starts again from the demo scenario.',
        };
      }
      const large = readLargeMarker(saved);
      if (large) {
        return {
          state: 'large',
          large,
          text: 'Reading the saved scenario from this browser’s larger database (IndexedDB)…',
        };
      }
      if (saved === JSON.stringify(store.getState().scenario)) return { state: 'saved', text: SAVED_TEXT };
      return { state: 'older', text: OLDER_TEXT };
    },

    checkLarge() {
      const large = readLargeMarker(readSaved(storage));
      if (!large) return null;
      return loadCrashLarge().then(
        (m) => m.checkLarge(large, store.getState().scenario),
        (error: unknown): CrashReport => ({ state: 'gone', large, text: notLoaded(error) }),
      );
    },

    largeText() {
      const large = readLargeMarker(readSaved(storage));
      if (!large) return null;
      return loadCrashLarge().then(
        (m) => m.largeText(large),
        (error: unknown) => ({ ok: false as const, text: notLoaded(error) }),
      );
    },

    setAside() {
      if (!storage)
        return { ok: false, text: 'This browser does not allow saving here, so there is nothing to set aside.' };
      const result = setAsideSaved(storage, options.now().toISOString());
      if (!result.ok) {
        return {
          ok: false,
          text:
            `The saved scenario could not be set aside (${result.reason}); it is still saved, unchanged. ` +
            'Download it to keep a copy, then start without it: this tab will leave it unopened and write nothing over it.',
        };
      }
      return {
        ok: true,
        text:
          result.key === null
            ? 'Nothing was saved to set aside.'
            : 'The saved scenario is set aside; find it under Saved scenarios, “Set-aside copies”.',
      };
    },

    savedText: () => readSaved(storage),

    skipSavedNextTime() {
      if (!options.tabStorage) return false;
      try {
        options.tabStorage.setItem(SKIP_SAVED_KEY, '1');
        return true;
      } catch {
        return false;
      }
    },
  };
}
