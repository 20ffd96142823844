import 'fake-indexeddb/auto';
import { clear, createStore, get, keys, set } from 'idb-keyval';
import { beforeEach, describe, expect, it } from 'vitest';
import { createScenarioLibrary } from '../../src/scenario';
import { STORAGE_KEY, SET_ASIDE_PREFIX } from '../../src/store';
import { dropLarge, LARGE_DB, LARGE_OBJECTS, pack, recordKeys } from '../../src/store/large-store';
import { ORPHAN_AGE_MS, SWEEP_KEY, sweepLarge as sweep } from '../../src/store/large-sweep';
import type { StorageLike } from '../../src/store';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

// Issue 14: records of the large store that nothing names are deleted, but
// only after a sweep has seen them unnamed for a whole day (ORPHAN_AGE_MS),
// so a save in progress in another tab (record written, marker not yet) is
// never deleted.

const records = createStore(LARGE_DB, LARGE_OBJECTS);
const T0 = new Date('2026-03-01T10:00:00.000Z');
const later = (ms: number): Date => new Date(T0.getTime() + ms);
const DAY = ORPHAN_AGE_MS;
const RECORD = pack(FOUR_BARS);

const markerText = (id: string) =>
  JSON.stringify({ $format: 'raincut-large-store', id, numbers: 8, savedAt: T0.toISOString() });
/** One sweep over this test's large store. */
const sweepLarge = (storage: StorageLike, now: Date) => sweep(storage, now, { keys: recordKeys, drop: dropLarge });
const stored = async () => ((await keys(records)) as string[]).sort();

beforeEach(async () => {
  await clear(records);
});

describe('the sweep of records nothing names', () => {
  it('keeps every record a marker, a list pointer or a set-aside copy names; deletes an orphan only a day after first seeing it', async () => {
    for (const id of ['scenario.current', 'library.entry', 'library.deleted', 'scenario.aside', 'scenario.orphan'])
      await set(id, RECORD, records);
    const storage = memoryStorage({
      [STORAGE_KEY]: markerText('scenario.current'),
      [`${SET_ASIDE_PREFIX}2026-02-01T00:00:00.000Z`]: markerText('scenario.aside'),
    });
    const library = createScenarioLibrary(storage);
    const pointer = (record: string) => ({ record, name: record, numbers: 8, bars: 4, method: 'constant' as const });
    const kept = library.saveLarge(pointer('library.entry'));
    const gone = library.saveLarge(pointer('library.deleted'));
    if (!kept.ok || !gone.ok) throw new Error('the list did not take the pointers');
    expect(library.delete(gone.value.id).ok).toBe(true);

    expect(await sweepLarge(storage, T0)).toEqual({ dropped: [], waiting: ['scenario.orphan'] });
    // 1 ms short of a day: still kept.
    expect(await sweepLarge(storage, later(DAY - 1))).toEqual({ dropped: [], waiting: ['scenario.orphan'] });
    expect(await sweepLarge(storage, later(DAY))).toEqual({ dropped: ['scenario.orphan'], waiting: [] });
    expect(await stored()).toEqual(['library.deleted', 'library.entry', 'scenario.aside', 'scenario.current']);
    // Nothing left waiting: the sweep's own list is gone.
    expect(storage.getItem(SWEEP_KEY)).toBeNull();
  });

  it('two tabs: a save in progress in the other tab (record written, marker not yet) is never deleted', async () => {
    const storage = memoryStorage({ [STORAGE_KEY]: markerText('scenario.old') });
    await set('scenario.old', RECORD, records);
    // Tab B writes its new record…
    await set('scenario.new', RECORD, records);
    // …tab A sweeps before tab B's marker is written: the record is only noted.
    expect(await sweepLarge(storage, T0)).toEqual({ dropped: [], waiting: ['scenario.new'] });
    // Tab B writes its marker, then deletes the record the old marker named.
    storage.setItem(STORAGE_KEY, markerText('scenario.new'));
    await sweepLarge(storage, later(1));
    // A day on, the new record is named and kept; the old one (tab B's delete of it failed here) is no one's, and goes.
    expect(await sweepLarge(storage, later(2 * DAY))).toEqual({ dropped: ['scenario.old'], waiting: [] });
    expect(await get('scenario.new', records)).toBeDefined();
  });

  it('a record seen unnamed, then named, then unnamed again waits a whole day afresh', async () => {
    const storage = memoryStorage();
    await set('library.back', RECORD, records);
    await sweepLarge(storage, T0);
    storage.setItem(STORAGE_KEY, markerText('library.back'));
    await sweepLarge(storage, later(DAY / 2));
    storage.removeItem(STORAGE_KEY);
    expect(await sweepLarge(storage, later(DAY + 1))).toEqual({ dropped: [], waiting: ['library.back'] });
    expect(await sweepLarge(storage, later(DAY / 2 + 2 * DAY))).toEqual({ dropped: ['library.back'], waiting: [] });
  });

  it('a marker written between the sweep’s reading and its delete keeps the record', async () => {
    const base = memoryStorage({ 'raincut.pins': '{}' });
    await set('scenario.late', RECORD, records);
    await sweepLarge(base, T0);
    // The second reading of the texts (just before the delete) finds the marker another tab has just written.
    let readings = 0;
    const storage = {
      ...base,
      get length() {
        if (++readings === 2) base.setItem(STORAGE_KEY, markerText('scenario.late'));
        return base.length;
      },
    };
    expect(await sweepLarge(storage, later(DAY))).toEqual({ dropped: [], waiting: [] });
    expect(await get('scenario.late', records)).toBeDefined();
  });

  it('deletes nothing when the first sightings are damaged, when storage cannot list its keys, or when the clock went back', async () => {
    const storage = memoryStorage({ [SWEEP_KEY]: '{"$format":"raincut-large-sweep","orphans":' });
    await set('scenario.orphan', RECORD, records);
    expect(await sweepLarge(storage, T0)).toEqual({ dropped: [], waiting: ['scenario.orphan'] });
    // The clock went back a day: the sighting is "in the future", and starts afresh.
    expect(await sweepLarge(storage, later(-DAY))).toEqual({ dropped: [], waiting: ['scenario.orphan'] });
    // Seen afresh at the earlier time: half a day on from it is not a day, though the first sighting was longer ago.
    expect(await sweepLarge(storage, later(-DAY / 2))).toEqual({ dropped: [], waiting: ['scenario.orphan'] });
    const blind = { getItem: storage.getItem, setItem: storage.setItem, removeItem: storage.removeItem };
    expect(await sweepLarge(blind, later(10 * DAY))).toMatchObject({ dropped: [], skipped: expect.any(String) });
    expect(await stored()).toEqual(['scenario.orphan']);
  });
});
