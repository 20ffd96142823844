import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createScenarioLibrary } from '../../src/scenario/library';
import { STORAGE_KEY, createWorkbenchStore, persistStore, type OtherTabWatch } from '../../src/store';
import { FOUR_BARS, memoryStorage, scenarioOf } from '../helpers/scenario-fixtures';

// Two tabs of the workbench share one browser storage. The browser tells
// every other tab when one writes (the "storage" event); here a small bus
// does the same for two stores on one memory storage.

function twoTabs() {
  const storage = memoryStorage({ [STORAGE_KEY]: JSON.stringify(FOUR_BARS) });
  const listeners = new Map<string, (key: string | null) => void>();
  const watchFor =
    (tab: string): OtherTabWatch =>
    (changed) => {
      listeners.set(tab, changed);
      return () => listeners.delete(tab);
    };
  // Writes to the storage by one tab are heard by the other, as the browser does.
  const shared = {
    ...storage,
    getItem: (key: string) => storage.getItem(key),
    removeItem: (key: string) => storage.removeItem(key),
  };
  const tab = (name: string, other: string) => {
    const store = createWorkbenchStore(FOUR_BARS);
    const own = {
      ...shared,
      setItem: (key: string, value: string) => {
        storage.setItem(key, value);
        listeners.get(other)?.(key);
      },
    };
    const persistence = persistStore(store, own, 10, watchFor(name));
    return { store, persistence, actions: store.getState().actions };
  };
  return { storage, a: tab('a', 'b'), b: tab('b', 'a') };
}

const saved = (storage: ReturnType<typeof memoryStorage>) => JSON.parse(storage.data.get(STORAGE_KEY) ?? 'null');

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('two tabs of the workbench', () => {
  it('a tab told of the other tab’s save does not write over it, and keeps its own work on screen', () => {
    const { storage, a, b } = twoTabs();
    b.actions.setName('Changed in tab B');
    vi.advanceTimersByTime(10);
    expect(saved(storage).name).toBe('Changed in tab B');
    expect(a.store.getState().notice?.kind).toBe('other-tab');
    a.actions.setName('Typed in tab A');
    vi.advanceTimersByTime(100);
    expect(saved(storage).name).toBe('Changed in tab B');
    expect(a.store.getState().scenario.name).toBe('Typed in tab A');
  });

  it('a change made elsewhere with no event heard is found at the next save', () => {
    const { storage, a } = twoTabs();
    storage.setItem(STORAGE_KEY, JSON.stringify({ ...FOUR_BARS, name: 'Written by a tab we did not hear' }));
    a.actions.setName('Tab A');
    vi.advanceTimersByTime(10);
    expect(saved(storage).name).toBe('Written by a tab we did not hear');
    expect(a.store.getState().notice?.kind).toBe('other-tab');
  });

  it('"open the other tab’s version" puts it on screen as one undoable edit, and writes nothing', async () => {
    const { storage, a, b } = twoTabs();
    b.actions.setName('Tab B');
    vi.advanceTimersByTime(10);
    a.actions.setName('Tab A');
    vi.advanceTimersByTime(10);
    const notice = a.store.getState().notice;
    if (notice?.kind !== 'other-tab') throw new Error('tab A was not told');
    const writes = vi.spyOn(storage, 'setItem');
    notice.takeTheirs();
    // The choices' code is fetched when one is made (src/store/other-tab-choice.ts).
    await vi.dynamicImportSettled();
    vi.advanceTimersByTime(100);
    expect(a.store.getState().scenario.name).toBe('Tab B');
    expect(a.store.getState().notice).toBeNull();
    expect(writes).not.toHaveBeenCalled();
    a.actions.undo();
    expect(a.store.getState().scenario.name).toBe('Tab A');
  });

  it('"keep this one" saves it under a new name in the saved list, then as the saved scenario; the other tab is told', async () => {
    const { storage, a, b } = twoTabs();
    b.actions.setName('Tab B');
    vi.advanceTimersByTime(10);
    a.actions.setName('Tab A');
    vi.advanceTimersByTime(10);
    const notice = a.store.getState().notice;
    if (notice?.kind !== 'other-tab') throw new Error('tab A was not told');
    await notice.keepMine();
    const list = createScenarioLibrary(storage).list();
    expect(list.entries.map((e) => scenarioOf(e).name)).toEqual(['Tab A (this tab’s copy)']);
    expect(saved(storage).name).toBe('Tab A');
    expect(a.store.getState().notice).toBeNull();
    expect(b.store.getState().notice?.kind).toBe('other-tab');
    // Tab A saves as before from now on.
    a.actions.setName('Tab A again');
    vi.advanceTimersByTime(10);
    expect(saved(storage).name).toBe('Tab A again');
  });
});
