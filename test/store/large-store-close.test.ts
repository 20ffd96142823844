import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createWorkbenchStore, persistStore, STORAGE_KEY } from '../../src/store';
import { LARGE_NUMBERS, readLargeMarker } from '../../src/store/large-marker';
import type { Scenario } from '../../src/scenario/types';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

// Issue 14, saving a large scenario as the page closes: the page may stop
// at any await. The marker in the current scenario's slot must never name a
// record that was not written, and the record it named before is deleted
// only once the new marker is written. Every IndexedDB and localStorage
// step is logged in one list, so the order is checked as it happened.

const steps: string[] = [];
/** Set to hold every IndexedDB write open, as a page closing mid-write leaves it. */
let holdWrites = false;

vi.mock('idb-keyval', async (original) => {
  const real = await original<typeof import('idb-keyval')>();
  return {
    ...real,
    set: async (...args: Parameters<typeof real.set>) => {
      steps.push(`record written ${args[0] as string}`);
      if (holdWrites) return new Promise<void>(() => undefined);
      return real.set(...args);
    },
    del: async (...args: Parameters<typeof real.del>) => {
      steps.push(`record deleted ${args[0] as string}`);
      return real.del(...args);
    },
  };
});

function barsOf(n: number, name: string): Scenario {
  return {
    ...FOUR_BARS,
    name,
    storm: { durationsH: new Array<number>(n).fill(5 / 60), depthsMm: new Array<number>(n).fill(0.5) },
  };
}
const LARGE_BARS = LARGE_NUMBERS / 2 + 1;

function loggedStorage() {
  const storage = memoryStorage();
  return {
    ...storage,
    setItem: (key: string, value: string) => {
      const marker = readLargeMarker(value);
      steps.push(marker ? `marker written ${marker.id}` : `text written ${key}`);
      storage.setItem(key, value);
    },
  };
}

const stopAll: (() => void)[] = [];
const realIdle = globalThis.requestIdleCallback;
afterEach(() => {
  for (const stop of stopAll.splice(0)) stop();
  steps.length = 0;
  holdWrites = false;
  globalThis.requestIdleCallback = realIdle;
});

describe('saving a large scenario as the page closes', () => {
  it('writes the record, then the marker naming it, and only then deletes the record the old marker named', async () => {
    const storage = loggedStorage();
    const store = createWorkbenchStore(FOUR_BARS);
    stopAll.push(persistStore(store, storage, 1, () => () => undefined).stop);
    store.getState().actions.replaceScenario(barsOf(LARGE_BARS, 'First'), 'Open a long record');
    await vi.waitFor(() => expect(readLargeMarker(storage.getItem(STORAGE_KEY))).not.toBeNull(), { timeout: 10_000 });
    const first = readLargeMarker(storage.getItem(STORAGE_KEY))?.id as string;
    store.getState().actions.replaceScenario(barsOf(LARGE_BARS, 'Second'), 'Open another long record');
    await vi.waitFor(() => expect(steps).toContain(`record deleted ${first}`), { timeout: 10_000 });
    const second = readLargeMarker(storage.getItem(STORAGE_KEY))?.id as string;
    expect(second).not.toBe(first);
    expect(steps).toEqual([
      `record written ${first}`,
      `marker written ${first}`,
      `record written ${second}`,
      `marker written ${second}`,
      `record deleted ${first}`,
    ]);
  });

  it('a record write the closing page never finishes leaves the marker naming the whole record before it', async () => {
    const storage = loggedStorage();
    const store = createWorkbenchStore(FOUR_BARS);
    const persistence = persistStore(store, storage, 1, () => () => undefined);
    stopAll.push(persistence.stop);
    store.getState().actions.replaceScenario(barsOf(LARGE_BARS, 'Whole'), 'Open a long record');
    await vi.waitFor(() => expect(readLargeMarker(storage.getItem(STORAGE_KEY))).not.toBeNull(), { timeout: 10_000 });
    const whole = storage.getItem(STORAGE_KEY);
    holdWrites = true;
    store.getState().actions.setName('Being written as the page closes');
    persistence.flush();
    await vi.waitFor(() => expect(steps.filter((s) => s.startsWith('record written'))).toHaveLength(2), {
      timeout: 10_000,
    });
    await new Promise((r) => setTimeout(r, 50));
    expect(storage.getItem(STORAGE_KEY)).toBe(whole);
    expect(steps.filter((s) => s.startsWith('record deleted'))).toEqual([]);
  });

  it('a save already waiting for a quiet moment goes at once when the page starts to close', async () => {
    // A hidden page may never have a quiet moment: the browser holds its idle callbacks back.
    globalThis.requestIdleCallback = (() => 0) as typeof requestIdleCallback;
    const storage = loggedStorage();
    const store = createWorkbenchStore(FOUR_BARS);
    const persistence = persistStore(store, storage, 1, () => () => undefined);
    stopAll.push(persistence.stop);
    store.getState().actions.replaceScenario(barsOf(LARGE_BARS, 'Waiting for quiet'), 'Open a long record');
    // The autosave has taken the change and waits for a quiet moment that does not come.
    await new Promise((r) => setTimeout(r, 100));
    expect(steps).toEqual([]);
    persistence.flush();
    await vi.waitFor(
      () => expect(JSON.stringify(readLargeMarker(storage.getItem(STORAGE_KEY)))).toMatch(/"id":"scenario\./),
      { timeout: 10_000 },
    );
    expect(steps.map((s) => s.split(' ').slice(0, 2).join(' '))).toEqual(['record written', 'marker written']);
  });
});
