import 'fake-indexeddb/auto';
import { createStore, get, keys } from 'idb-keyval';
import { describe, expect, it } from 'vitest';
import { LIBRARY_KEY, createScenarioLibrary, type SavedEntry } from '../../src/scenario';
import { openEntry, saveToList } from '../../src/store/large-library';
import { LARGE_NUMBERS } from '../../src/store/large-marker';
import { LARGE_DB, LARGE_OBJECTS } from '../../src/store/large-store';
import type { Scenario } from '../../src/scenario/types';
import { FOUR_BARS, quotaStorage } from '../helpers/scenario-fixtures';

// Issue 14: the saved list's large entries (src/store/large-library.ts): the
// record first, then the entry naming it, then the old record goes; the
// list's two-tab and damaged-data rules hold for them as for any entry.

const records = createStore(LARGE_DB, LARGE_OBJECTS);
const NOW = new Date('2026-03-01T10:00:00.000Z');
const BARS = LARGE_NUMBERS / 2 + 1;
/** 0 to 2.9 mm in steps of 0.1 mm (invented). */
const big = (name: string, step = 0.1): Scenario => ({
  ...FOUR_BARS,
  name,
  storm: {
    durationsH: new Array<number>(BARS).fill(5 / 60),
    depthsMm: Array.from({ length: BARS }, (_, i) => (i % 30) * step),
  },
});
const recordOf = (entry: SavedEntry): string => {
  if (!('large' in entry)) throw new Error('not a large entry');
  return entry.large.record;
};
const value = <T>(r: { ok: true; value: T } | { ok: false; problems: readonly { message: string }[] }): T => {
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join(' '));
  return r.value;
};

describe('large entries of the saved list', { timeout: 60_000 }, () => {
  it('Update writes a new record, points the entry at it, then deletes the old one', async () => {
    const storage = quotaStorage(100_000);
    const library = createScenarioLibrary(storage);
    const first = value(await saveToList(library, big('Long record'), { now: NOW }));
    const oldRecord = recordOf(first);
    library.list();
    const updated = value(await saveToList(library, big('Long record, wetter', 0.2), { id: first.id, now: NOW }));
    expect(updated.id).toBe(first.id);
    expect(recordOf(updated)).not.toBe(oldRecord);
    expect(await get(oldRecord, records)).toBeUndefined();
    const opened = await openEntry(value(library.get(first.id)));
    expect(opened.ok && opened.scenario.storm.depthsMm[29]).toBeCloseTo(5.8, 12); // 29 × 0.2
  });

  it('a rename changes the name it opens under; delete keeps the record for Undo', async () => {
    const storage = quotaStorage(100_000);
    const library = createScenarioLibrary(storage);
    const entry = value(await saveToList(library, big('Before'), { now: NOW }));
    library.list();
    value(library.rename(entry.id, 'After'));
    const opened = await openEntry(value(library.get(entry.id)));
    expect(opened.ok && opened.scenario.name).toBe('After');
    const copy = value(library.duplicate(entry.id));
    expect(recordOf(copy)).toBe(recordOf(entry));
    library.list();
    const gone = value(library.delete(entry.id));
    expect(await get(recordOf(gone), records)).toBeDefined();
    value(library.restore(entry.id));
    expect(
      createScenarioLibrary(storage)
        .list()
        .entries.map((e) => e.id),
    ).toEqual([entry.id, copy.id]);
  });

  it('another tab changed the entry since it was shown: the update is refused and its new record deleted', async () => {
    const storage = quotaStorage(100_000);
    const tabA = createScenarioLibrary(storage);
    const tabB = createScenarioLibrary(storage);
    const entry = value(await saveToList(tabA, big('Shared'), { now: NOW }));
    tabA.list();
    tabB.list();
    value(tabB.rename(entry.id, 'Renamed in tab B'));
    const before = await get(recordOf(entry), records);
    const held = (await keys(records)).length;
    const refused = await saveToList(tabA, big('From tab A'), { id: entry.id, now: NOW });
    expect(refused.ok).toBe(false);
    expect(!refused.ok && refused.problems.map((p) => p.message).join(' ')).toContain('was changed in another tab');
    // The entry still names its whole old record; no other record is left.
    expect(await get(recordOf(entry), records)).toStrictEqual(before);
    expect(await keys(records)).toHaveLength(held);
    const listed = value(tabA.get(entry.id));
    expect('large' in listed && listed.large.name).toBe('Renamed in tab B');
  });

  it('a damaged pointer in the stored list is set aside and left out, and the other entries stay', () => {
    const storage = quotaStorage(100_000);
    const library = createScenarioLibrary(storage);
    value(library.save({ ...FOUR_BARS, name: 'Small' }));
    value(library.saveLarge({ record: 'library.x', numbers: 8, name: 'Large', bars: 4, method: 'constant' }));
    const text = storage.getItem(LIBRARY_KEY) as string;
    storage.setItem(LIBRARY_KEY, text.replace('"record":"library.x"', '"record":42'));
    const listing = createScenarioLibrary(storage).list();
    expect(listing.entries.map((e) => e.id)).toEqual(['s1']);
    expect(listing.problems.map((p) => p.message).join(' ')).toContain(
      'entries[1]: its pointer into this browser’s larger database is damaged: it names no proper record (got 42).',
    );
    expect(listing.setAside).toHaveLength(1);
  });
});
