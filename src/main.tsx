/// <reference types="vite-plugin-pwa/vanillajs" />
import { StrictMode, startTransition } from 'react';
import { registerSW } from 'virtual:pwa-register';
import { createUpdateChannel } from './offline/updates';
import { createRoot } from 'react-dom/client';
import { DEMO_SCENARIO } from './scenario/demo';
import { isScenarioLink, loadLinkReader } from './scenario/link';
import { STORAGE_KEY, type StorageLike } from './store';
import { SKIP_SAVED_KEY } from './store/crash-keys';
import { readLargeMarker } from './store/large-marker';
import type { LargeRead } from './store/large-store';
import type { ScenarioResult } from './scenario/problems';

type OpenScenarioModule = typeof import('./store/open-scenario');
import { startWorkbench } from './store/start';
import { App } from './ui/App';
import { ErrorBoundary } from './ui/layout/ErrorBoundary';
import { downloadBlob } from './ui/services/download';
import { browserServices } from './ui/services';
import { startNumberFormat } from './ui/number-format';
import './styles/app.css';

/** The browser's storage, or null where it is switched off (reading `localStorage` can itself throw). */
function browserStorage(): StorageLike | null {
  try {
    const storage = window.localStorage;
    return storage ?? null;
  } catch {
    return null;
  }
}

/** This tab's own storage (sessionStorage), or null. */
function tabStorage(): Storage | null {
  try {
    return window.sessionStorage ?? null;
  } catch {
    return null;
  }
}

const storage = browserStorage();
/**
 * The reader's number format (a browser preference, never part of the scenario), before the first draw. Its
 * first formatter loads the browser's locale data: 20–60 ms, in a task of its own when the page waits for a read.
 */
const startFormat = (): void => startNumberFormat({ storage, language: navigator.language });
const tab = tabStorage();
/** The saved slot's text as it is at load, or null. */
function readSlot(): string | null {
  try {
    return storage?.getItem(STORAGE_KEY) ?? null;
  } catch {
    return null;
  }
}
/** Set on the error screen when the saved scenario stopped the screen and could not be set aside. */
function takeSkipSaved(): boolean {
  try {
    return tab?.getItem(SKIP_SAVED_KEY) === '1';
  } catch {
    return false;
  }
}
/** Starts the workbench and draws the page; `large` is the large store's record when the saved slot named one. */
function start(large?: LargeRead, opening?: OpenScenarioModule, linkRead?: ScenarioResult): void {
  // The saved scenario, and a share link in the address shown over it unsaved until the user chooses (src/store/link-session.ts).
  const { store, link } = startWorkbench({
    storage,
    fragment: window.location.hash,
    fallback: DEMO_SCENARIO,
    nowIso: new Date().toISOString(),
    clearFragment: () =>
      window.history.replaceState(window.history.state, '', window.location.pathname + window.location.search),
    skipSaved: takeSkipSaved(),
    ...(large ? { large } : {}),
    ...(linkRead ? { linkRead } : {}),
  });
  // Save a change made just before the page closes or reloads.
  window.addEventListener('pagehide', () => link.flush());
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') link.flush();
  });
  // A link pasted into the address of an open page changes only the fragment.
  window.addEventListener('hashchange', () => {
    void loadLinkReader()
      .catch(() => {})
      .then(() => link.open(window.location.hash));
  });
  const services = browserServices({ storage, link });
  // After a crash: what was saved, and a way out that loses nothing (src/store/crash.ts).
  // Its code loads only when drawing fails; the autosave is stopped at once, before that load, so the change that
  // broke the screen is never written while it arrives.
  const recovery = () => {
    link.halt();
    return import('./store/crash').then((m) =>
      m.createCrashRecovery({ store, link, storage, now: () => new Date(), tabStorage: tab }),
    );
  };
  const downloadSaved = (text: string): void =>
    downloadBlob(new Blob([text], { type: 'application/json' }), 'raincut-saved-scenario.json');
  // After the first visit the app runs with no network: a service worker keeps it (build/offline-app.ts). A new
  // version waits until the user reloads (src/offline/updates.ts). The single-file build registers nothing.
  const updates = createUpdateChannel({
    register: registerSW,
    beforeReload: () => link.flush(),
    reloadPage: () => window.location.reload(),
  });

  const root = document.getElementById('root');
  if (!root) throw new Error('index.html has no #root element');
  const app = (
    <StrictMode>
      <ErrorBoundary recovery={recovery} download={downloadSaved}>
        <App store={store} services={services} updates={updates} />
      </ErrorBoundary>
    </StrictMode>
  );
  const draw = (): void => createRoot(root).render(app);
  // A restored (or linked) long storm: its check and the results' arrays made ready in tasks of their own before the
  // first draw; then the first render as a transition, which React works in slices of a few ms, yielding between
  // them, where an urgent one is made in one task (the largest share link's first render held the page about
  // 130 ms of its 230 ms task, measured). The page shows nothing until the whole screen is committed at once.
  const drawInSlices = (): void => startTransition(draw);
  if (opening) void opening.prepareLongStorm(store, store.getState().scenario.storm).then(drawInSlices, drawInSlices);
  else draw();
}

// A share link in the address is read first, by the reader off the page or else by the page's own, fetched only
// then (src/scenario/link.ts); a scenario kept in the large store (IndexedDB) is read first, only when the saved
// slot holds its marker.
const waits: Promise<unknown>[] = [];
let large: LargeRead | undefined;
let opening: OpenScenarioModule | undefined;
let linkRead: ScenarioResult | undefined;
if (isScenarioLink(window.location.hash)) {
  const fragment = window.location.hash;
  // Read off the page (src/store/open-scenario.ts): the largest link the reader accepts held the page 0.5 s on it.
  // The page's own reader is fetched only where there is none off the page: loading its decompressor was a task of
  // 50–120 ms of its own at start-up (measured on a loaded machine, bench:ui link-largest).
  waits.push(
    import('./store/open-scenario')
      .then((m) => ((opening = m), m.readLinkOffPage(fragment)))
      .then(
        (read) => (linkRead = read ?? undefined),
        () => undefined,
      )
      .then(() => (linkRead ? undefined : loadLinkReader().catch(() => {}))),
  );
}
const marker = readLargeMarker(readSlot());
if (marker) {
  // The large store is in use: records nothing names are deleted later, at a quiet moment (src/store/large-sweep.ts).
  void import('./store/large-store').then(
    (m) => m.sweepSoon(storage),
    () => undefined,
  );
  waits.push(
    // Read and checked off the page (src/store/open-scenario.ts): 10⁶ bars held the page 0.9 s on it.
    import('./store/open-scenario')
      .then((m) => ((opening = m), m.readLargeInSteps(marker)))
      .then(
        (read) => (large = read),
        (error: unknown) =>
          (large = { ok: false, message: `The large store’s code could not be loaded (${String(error)}).` }),
      ),
  );
}
if (waits.length > 0) {
  waits.push(new Promise((later) => setTimeout(later, 0)).then(startFormat));
  void Promise.all(waits).then(() => start(large, large?.ok || linkRead?.ok ? opening : undefined, linkRead));
} else {
  startFormat();
  start();
}
