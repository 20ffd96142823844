import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { DEMO_SCENARIO } from './scenario/demo';
import { SET_ASIDE_PREFIX, STORAGE_KEY, createWorkbenchStore, loadScenario, persistStore, type StorageLike } from './store';
import { App } from './ui/App';
import { ErrorBoundary } from './ui/layout/ErrorBoundary';
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
const loaded = loadScenario(storage, DEMO_SCENARIO, new Date().toISOString());
const store = createWorkbenchStore(loaded.scenario, { notice: loaded.notice });
if (storage && loaded.canSave) {
  const persistence = persistStore(store, storage);
  // Save a change made just before the page closes or reloads.
  window.addEventListener('pagehide', () => persistence.flush());
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') persistence.flush();
  });
}

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
      <App store={store} />
    </ErrorBoundary>
  </StrictMode>,
);
