import type { OtherTabWatch } from '../scenario/stored-slot';

/**
 * The browser's "storage" events: fired in every other tab of the same
 * origin when one tab writes to localStorage (never in the tab that wrote).
 * The stored slots (src/scenario/stored-slot.ts) listen through this.
 */
export const windowStorageEvents: OtherTabWatch = (changed) => {
  if (typeof window === 'undefined') return () => undefined;
  const listener = (event: StorageEvent): void => {
    // A write to sessionStorage fires the event too; only localStorage is shared between tabs.
    if (event.storageArea !== null && event.storageArea !== window.localStorage) return;
    changed(event.key);
  };
  window.addEventListener('storage', listener);
  return () => window.removeEventListener('storage', listener);
};
