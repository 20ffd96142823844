import type { Scenario } from '../../src/scenario/types';
import type { SavedEntry } from '../../src/scenario/library';
import { readScenario } from '../../src/store';
import { LARGE_NUMBERS } from '../../src/store/large-marker';

/**
 * A small test scenario: four bars of 30 min, 2/6/10/2 mm (intensities 4, 12,
 * 20, 4 mm/h), 1 km². Written as a version-1 document and read through the
 * scenario layer, so it stays a current Scenario when the format moves on.
 */
const FOUR_BARS_V1 = {
  version: 2,
  name: 'Four bars',
  notes: '',
  storm: { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [2, 6, 10, 2] },
  catchment: { name: 'Test catchment', areaM2: 1e6 },
  units: 'si',
  method: { kind: 'constant', rateMmH: 8 },
  methodMemory: {},
  observed: null,
  streamflow: null,
};

function read(doc: unknown): Scenario {
  const r = readScenario(doc);
  if (!r.ok) throw new Error(`test fixture does not read: ${r.message}`);
  return r.scenario;
}

export const FOUR_BARS: Scenario = read(FOUR_BARS_V1);

/** A memory-backed Storage double that can be told to fail. */
export function memoryStorage(initial: Record<string, string> = {}) {
  const data = new Map(Object.entries(initial));
  let failWith: Error | null = null;
  return {
    data,
    failNextWrites(error: Error | null) {
      failWith = error;
    },
    getItem: (key: string) => data.get(key) ?? null,
    setItem: (key: string, value: string) => {
      if (failWith) throw failWith;
      data.set(key, value);
    },
    removeItem: (key: string) => {
      data.delete(key);
    },
    get length() {
      return data.size;
    },
    key: (index: number) => [...data.keys()][index] ?? null,
  };
}

/** Freezes a document and everything inside it, so a migration or reader that writes into its input throws. */
export function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object') {
    for (const inner of Object.values(value)) deepFreeze(inner);
    Object.freeze(value);
  }
  return value;
}

/** The scenario of a saved-list entry held in the list itself (a large-store entry holds only a pointer: the test fails). */
export function scenarioOf(entry: SavedEntry): Scenario {
  if ('large' in entry) throw new Error(`entry ${entry.id} is kept in the large store, not in the list`);
  return entry.scenario;
}

/**
 * `memoryStorage` that refuses, as a browser's full localStorage does (a
 * QuotaExceededError), any one text longer than `maxChars`.
 */
export function quotaStorage(maxChars: number, initial: Record<string, string> = {}) {
  const storage = memoryStorage(initial);
  const setItem = storage.setItem;
  storage.setItem = (key: string, value: string) => {
    if (value.length > maxChars) {
      throw new DOMException(`Setting "${key}" exceeded the quota.`, 'QuotaExceededError');
    }
    setItem(key, value);
  };
  return storage;
}

/** Bars in `largeScenario`: just over the large store's threshold (2 numbers a bar). */
export const LARGE_BARS = LARGE_NUMBERS / 2 + 1;

/**
 * An invented scenario too large for localStorage's usual room, so it goes to the
 * large store: LARGE_BARS bars of 5 min, 0 to 2.9 mm in steps of 0.1 mm.
 */
export function largeScenario(name: string): Scenario {
  return {
    ...FOUR_BARS,
    name,
    storm: {
      durationsH: new Array<number>(LARGE_BARS).fill(5 / 60),
      depthsMm: Array.from({ length: LARGE_BARS }, (_, i) => (i % 30) / 10),
    },
  };
}

/** A saved list's pointer into the large store (src/scenario/library.ts, LargeRef), to an invented four-bar record. */
export const SAMPLE_LARGE_REF = {
  record: 'library.2026-02-20T08:30:00.000Z.a1',
  numbers: 8,
  name: 'Pointed at',
  bars: 4,
  method: 'constant',
} as const;
