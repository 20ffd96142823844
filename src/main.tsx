/// <reference types="vite-plugin-pwa/vanillajs" />
import { StrictMode } from 'react';
import { registerSW } from 'virtual:pwa-register';
import { createUpdateChannel } from './offline/updates';
import { createRoot } from 'react-dom/client';
import { DEMO_SCENARIO } from './scenario/demo';
import { SET_ASIDE_PREFIX, STORAGE_KEY, type StorageLike } from './store';
import { startWorkbench } from './store/start';
import { App } from './ui/App';
import { ErrorBoundary } from './ui/layout/ErrorBoundary';
import { browserServices } from './ui/share';
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

const storage = browserStorage();
// The saved scenario, and a share link in the address shown over it unsaved until the user chooses (src/store/link-session.ts).
const { store, link } = startWorkbench({
  storage,
  fragment: window.location.hash,
  fallback: DEMO_SCENARIO,
  nowIso: new Date().toISOString(),
  clearFragment: () =>
    window.history.replaceState(window.history.state, '', window.location.pathname + window.location.search),
});
// Save a change made just before the page closes or reloads.
window.addEventListener('pagehide', () => link.flush());
document.addEventListener('visibilitychange', () => {
  if (document.visibilityState === 'hidden') link.flush();
});
// A link pasted into the address of an open page changes only the fragment.
window.addEventListener('hashchange', () => link.open(window.location.hash));
const services = browserServices({ storage, link });
// After the first visit the app runs with no network: a service worker keeps it (build/offline-app.ts). A new
// version waits until the user reloads (src/offline/updates.ts). The single-file build registers nothing.
const updates = createUpdateChannel({
  register: registerSW,
  beforeReload: () => link.flush(),
  reloadPage: () => window.location.reload(),
});

/** After a crash: keep the saved scenario under a set-aside key, and reload on the demo. */
function setAsideAndReload(): void {
  try {
    const saved = storage?.getItem(STORAGE_KEY);
    if (storage && saved != null) {
      storage.setItem(SET_ASIDE_PREFIX + new Date().toISOString(), saved);
      storage.removeItem(STORAGE_KEY);
    }
  } finally {
    window.location.reload();
  }
}

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');
createRoot(root).render(
  <StrictMode>
    <ErrorBoundary onSetAside={setAsideAndReload}>
      <App store={store} services={services} updates={updates} />
    </ErrorBoundary>
  </StrictMode>,
);
