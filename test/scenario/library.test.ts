import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEMO_SCENARIO,
  LIBRARY_FORMAT_TAG,
  LIBRARY_KEY,
  MAX_DELETED,
  createScenarioLibrary,
  type LibraryResult,
  type Scenario,
  type StorageLike,
} from '../../src/scenario';
import { scenarioArb } from '../helpers/scenario-arbitraries';
import { scenarioOf } from '../helpers/scenario-fixtures';

/** Web Storage in memory, with a quota and switches to make it fail. */
class MemoryStorage implements StorageLike {
  readonly items = new Map<string, string>();
  quotaChars = Infinity;
  failReads = false;

  getItem(key: string): string | null {
    if (this.failReads) throw new Error('SecurityError: storage is disabled');
    return this.items.get(key) ?? null;
  }

  setItem(key: string, value: string): void {
    let used = key.length + value.length;
    for (const [k, v] of this.items) if (k !== key) used += k.length + v.length;
    if (used > this.quotaChars) throw new Error('QuotaExceededError: the quota has been exceeded');
    this.items.set(key, value);
  }

  removeItem(key: string): void {
    this.items.delete(key);
  }

  snapshot(): Map<string, string> {
    return new Map(this.items);
  }
}

/** A clock that ticks one second a call, from a fixed start. */
function clock(): () => Date {
  let t = Date.parse('2026-07-14T15:00:00Z');
  return () => new Date((t += 1000));
}

function setup() {
  const storage = new MemoryStorage();
  const library = createScenarioLibrary(storage, { now: clock() });
  return { storage, library };
}

function value<T>(result: LibraryResult<T>): T {
  if (!result.ok) expect.fail(`expected success, got ${JSON.stringify(result.problems)}`);
  return result.value;
}

function refusal<T>(result: LibraryResult<T>): string[] {
  if (result.ok) expect.fail('expected the operation to be refused');
  expect(result.problems.length).toBeGreaterThan(0);
  return result.problems.map((p) => p.message);
}

const named = (name: string): Scenario => ({ ...DEMO_SCENARIO, name });
const names = (library: ReturnType<typeof setup>['library']): string[] =>
  library.list().entries.map((e) => scenarioOf(e).name);

describe('the saved-scenario list', () => {
  it('starts empty, with nothing wrong', () => {
    const { library } = setup();
    expect(library.list()).toEqual({ entries: [], deleted: [], setAside: [], canWrite: true, problems: [] });
  });

  it('saves a scenario under a new id with the time it was saved', () => {
    const { library, storage } = setup();
    const entry = value(library.save(DEMO_SCENARIO));
    expect(entry).toEqual({ id: 's1', savedAt: '2026-07-14T15:00:01.000Z', scenario: DEMO_SCENARIO });
    expect(library.list().entries).toEqual([entry]);
    expect(JSON.parse(storage.getItem(LIBRARY_KEY) ?? '')).toMatchObject({ $format: LIBRARY_FORMAT_TAG, version: 1 });
  });

  it('keeps the list for the next visit', () => {
    const { library, storage } = setup();
    value(library.save(named('A')));
    value(library.save(named('B')));
    expect(names(createScenarioLibrary(storage))).toEqual(['A', 'B']);
  });

  it('replaces an entry in place when saved again under its id', () => {
    const { library } = setup();
    const a = value(library.save(named('A')));
    value(library.save(named('B')));
    const again = value(library.save({ ...named('A'), notes: 'second try' }, a.id));
    expect(again.id).toBe(a.id);
    expect(library.list().entries.map((e) => [e.id, scenarioOf(e).notes])).toEqual([
      ['s1', 'second try'],
      ['s2', DEMO_SCENARIO.notes],
    ]);
  });

  it('saves as a new entry when the id is no longer in the list', () => {
    const { library } = setup();
    const a = value(library.save(named('A')));
    value(library.delete(a.id));
    expect(value(library.save(named('A'), a.id)).id).toBe('s2');
  });

  it('refuses to save an invalid scenario, naming the field, and writes nothing', () => {
    const { library, storage } = setup();
    const bad = { ...DEMO_SCENARIO, units: 'metric' } as unknown as Scenario;
    expect(refusal(library.save(bad))).toEqual(['units: must be "si" or "us" (got "metric").']);
    expect(storage.items.size).toBe(0);
  });

  it('renames an entry, keeping its id and place', () => {
    const { library } = setup();
    const a = value(library.save(named('A')));
    value(library.save(named('B')));
    expect(scenarioOf(value(library.rename(a.id, '  Event of 14 July  '))).name).toBe('Event of 14 July');
    expect(names(library)).toEqual(['Event of 14 July', 'B']);
    expect(library.list().entries[0]?.id).toBe(a.id);
  });

  it('refuses an empty or overlong name and an unknown id', () => {
    const { library } = setup();
    const a = value(library.save(named('A')));
    expect(refusal(library.rename(a.id, '   '))).toEqual(['A saved scenario needs a name; the new name is empty.']);
    expect(refusal(library.rename(a.id, 'x'.repeat(201)))[0]).toMatch(/a name may have at most 200/);
    expect(refusal(library.rename('s99', 'B'))).toEqual([
      'There is no saved scenario with id "s99"; it may have been deleted in another tab.',
    ]);
    expect(names(library)).toEqual(['A']);
  });

  it('duplicates an entry right after it, with a name that says it is a copy', () => {
    const { library } = setup();
    const a = value(library.save(named('A')));
    value(library.save(named('B')));
    const copy = value(library.duplicate(a.id));
    value(library.duplicate(a.id));
    value(library.duplicate(copy.id));
    expect(names(library)).toEqual(['A', 'A (copy 2)', 'A (copy)', 'A (copy 3)', 'B']);
    expect(new Set(library.list().entries.map((e) => e.id)).size).toBe(5);
  });

  it('deletes an entry and restores it to the same place with the same id', () => {
    const { library } = setup();
    value(library.save(named('A')));
    const b = value(library.save(named('B')));
    value(library.save(named('C')));
    const gone = value(library.delete(b.id));
    expect(gone).toMatchObject({ id: b.id, position: 1, deletedAt: '2026-07-14T15:00:04.000Z' });
    expect(names(library)).toEqual(['A', 'C']);
    expect(library.list().deleted.map((e) => e.id)).toEqual([b.id]);
    expect(value(library.restore(b.id))).toEqual(b);
    expect(names(library)).toEqual(['A', 'B', 'C']);
    expect(library.list().deleted).toEqual([]);
  });

  it('restores at the end when the list has since grown shorter', () => {
    const { library } = setup();
    const ids = ['A', 'B', 'C'].map((n) => value(library.save(named(n))).id);
    value(library.delete(ids[2] as string));
    value(library.delete(ids[0] as string));
    value(library.restore(ids[2] as string));
    expect(names(library)).toEqual(['B', 'C']);
  });

  it(`keeps the last ${MAX_DELETED} deletions for undo, most recent first`, () => {
    const { library } = setup();
    const ids = Array.from({ length: MAX_DELETED + 3 }, (_, i) => value(library.save(named(`S${i}`))).id);
    for (const id of ids) value(library.delete(id));
    const deleted = library.list().deleted;
    expect(deleted).toHaveLength(MAX_DELETED);
    expect(deleted[0]?.id).toBe(ids[ids.length - 1]);
    expect(refusal(library.restore(ids[0] as string))).toEqual([
      'There is no deleted scenario with id "s1" to restore.',
    ]);
  });

  it('gives back exactly what was saved, for random scenarios', () => {
    fc.assert(
      fc.property(scenarioArb, (scenario) => {
        const { library, storage } = setup();
        const id = value(library.save(scenario)).id;
        expect(scenarioOf(value(createScenarioLibrary(storage).get(id)))).toStrictEqual(scenario);
      }),
      { numRuns: 150, seed: 32 },
    );
  }, 60_000); // documents of hundreds of bars, records and events: generous on a busy machine

  it('does not write over an entry another tab changed since this list showed it', () => {
    const storage = new MemoryStorage();
    const tabA = createScenarioLibrary(storage);
    const tabB = createScenarioLibrary(storage);
    const a = value(tabA.save(named('A')));
    expect(names(tabB)).toEqual(['A']);
    value(tabA.rename(a.id, 'A, renamed in tab A'));
    // Tab B still shows "A": its update, rename and delete are refused, and nothing is written.
    const before = storage.snapshot();
    for (const attempt of [
      () => tabB.save({ ...named('B'), notes: 'tab B' }, a.id),
      () => tabB.rename(a.id, 'A, renamed in tab B'),
      () => tabB.delete(a.id),
    ]) {
      expect(refusal(attempt())).toEqual([
        '“A” was changed in another tab since this list was shown; nothing was written over it. The list now shows that version.',
      ]);
    }
    expect(storage.snapshot()).toEqual(before);
    // Once tab B has shown the other tab's version, it may change it.
    expect(names(tabB)).toEqual(['A, renamed in tab A']);
    expect(scenarioOf(value(tabB.rename(a.id, 'A, renamed in tab B'))).name).toBe('A, renamed in tab B');
  });

  it('does not bring back an entry another tab deleted since this list showed it', () => {
    const storage = new MemoryStorage();
    const tabA = createScenarioLibrary(storage);
    const tabB = createScenarioLibrary(storage);
    const a = value(tabA.save(named('A')));
    tabB.list();
    value(tabA.delete(a.id));
    expect(refusal(tabB.save(named('A, edited in tab B'), a.id))).toEqual([
      '“A” was deleted in another tab since this list was shown; nothing was written. The list now shows what is saved.',
    ]);
    expect(names(tabB)).toEqual([]);
  });

  it('does not undo changes made in another tab', () => {
    const storage = new MemoryStorage();
    const tabA = createScenarioLibrary(storage);
    const tabB = createScenarioLibrary(storage);
    value(tabA.save(named('from A')));
    value(tabB.save(named('from B')));
    expect(names(tabA)).toEqual(['from A', 'from B']);
  });
});

describe('the saved-scenario list with damaged or failing storage', () => {
  it('sets unreadable stored text aside exactly as it was and starts afresh', () => {
    const { library, storage } = setup();
    storage.items.set(LIBRARY_KEY, '{"$format": "raincut-library", "entries": [');
    const listing = library.list();
    const aside = 'raincut.library.damaged.2026-07-14T15:00:01.000Z';
    expect(listing.entries).toEqual([]);
    expect(listing.setAside).toEqual([aside]);
    expect(listing.problems[0]?.message).toBe(
      `The saved list of scenarios was damaged and could not be read. It is kept as it was under browser storage key "${aside}".`,
    );
    expect(listing.problems[1]?.message).toMatch(/^The saved list could not be read: it is not valid JSON/);
    expect(storage.items.get(aside)).toBe('{"$format": "raincut-library", "entries": [');
    // Repaired once: the next reading is clean and still points at the copy.
    expect(library.list()).toMatchObject({ problems: [], setAside: [aside], canWrite: true });
  });

  it('keeps the good entries, leaves out the damaged one, and says which field was wrong', () => {
    const { library, storage } = setup();
    value(library.save(named('A')));
    value(library.save(named('B')));
    const stored = JSON.parse(storage.getItem(LIBRARY_KEY) ?? '');
    stored.entries[1].scenario.storm.depthsMm[0] = -3;
    const text = JSON.stringify(stored);
    storage.items.set(LIBRARY_KEY, text);
    const listing = library.list();
    expect(listing.entries.map((e) => scenarioOf(e).name)).toEqual(['A']);
    expect(listing.problems.map((p) => p.path)).toEqual(['', 'entries[1].scenario.storm.depthsMm[0]']);
    expect(listing.problems[1]?.message).toBe(
      'entries[1] "B": storm.depthsMm[0] (bar 1): must be a number ≥ 0 (rain depth, mm) (got -3).',
    );
    expect(storage.items.get(listing.setAside[0] as string)).toBe(text);
  });

  it('does not reuse an id after a damaged counter', () => {
    const { library, storage } = setup();
    value(library.save(named('A')));
    value(library.save(named('B')));
    const stored = JSON.parse(storage.getItem(LIBRARY_KEY) ?? '');
    stored.nextId = 'three';
    storage.items.set(LIBRARY_KEY, JSON.stringify(stored));
    expect(value(library.save(named('C'))).id).toBe('s3');
  });

  it('sets data aside under a fresh key when the first choice is taken', () => {
    const storage = new MemoryStorage();
    const library = createScenarioLibrary(storage, { now: () => new Date('2026-07-14T15:00:00Z') });
    storage.items.set('raincut.library.damaged.2026-07-14T15:00:00.000Z', 'older damage');
    storage.items.set(LIBRARY_KEY, 'not json');
    expect(library.list().setAside).toEqual(['raincut.library.damaged.2026-07-14T15:00:00.000Z-2']);
    expect(storage.items.get('raincut.library.damaged.2026-07-14T15:00:00.000Z')).toBe('older damage');
  });

  it('writes nothing over damaged data that cannot be set aside', () => {
    const { library, storage } = setup();
    storage.items.set(LIBRARY_KEY, 'x'.repeat(100));
    storage.quotaChars = 150; // no room for a copy
    const before = storage.snapshot();
    const listing = library.list();
    expect(listing.canWrite).toBe(false);
    expect(listing.problems[0]?.message).toMatch(
      /^The saved scenarios are damaged and could not be set aside \(QuotaExceededError/,
    );
    expect(refusal(library.save(named('A'))).at(-1)).toBe(
      'The scenario was not done: the saved list cannot be written safely now.',
    );
    expect(storage.snapshot()).toEqual(before);
  });

  it('leaves a list from a newer Raincut untouched', () => {
    const { library, storage } = setup();
    storage.items.set(LIBRARY_KEY, JSON.stringify({ $format: LIBRARY_FORMAT_TAG, version: 2, entries: [] }));
    const before = storage.snapshot();
    expect(library.list()).toMatchObject({ canWrite: false, entries: [] });
    expect(library.list().problems[0]?.message).toMatch(/written by a newer version of Raincut \(list version 2\)/);
    refusal(library.save(named('A')));
    expect(storage.snapshot()).toEqual(before);
  });

  it('reports storage that cannot be read, without throwing', () => {
    const { library, storage } = setup();
    storage.failReads = true;
    expect(library.list()).toMatchObject({ canWrite: false, entries: [] });
    expect(library.list().problems[0]?.message).toBe(
      'The saved scenarios could not be read from this browser (SecurityError: storage is disabled).',
    );
    refusal(library.save(named('A')));
  });

  it('keeps what was saved before when the browser refuses a write', () => {
    const { library, storage } = setup();
    value(library.save(named('A')));
    const before = storage.snapshot();
    storage.quotaChars = (storage.getItem(LIBRARY_KEY) ?? '').length + 100;
    const big = { ...named('B'), notes: 'n'.repeat(10_000) };
    expect(refusal(library.save(big))[0]).toMatch(
      /^The scenario could not be saved: the browser refused to store the list \(QuotaExceededError.*save the scenario as a file to keep it\.$/,
    );
    expect(storage.snapshot()).toEqual(before);
    expect(names(library)).toEqual(['A']);
  });

  it('never loses stored text, whatever it is', () => {
    // Any stored text either reads cleanly (and is left as it is) or is
    // copied, character for character, to a set-aside key.
    const good = (() => {
      const { library, storage } = setup();
      value(library.save(named('A')));
      value(library.delete(value(library.save(named('B'))).id));
      return storage.getItem(LIBRARY_KEY) ?? '';
    })();
    const damaged = fc.oneof(
      fc.string({ unit: 'binary', maxLength: 80 }),
      fc.json({ maxDepth: 3 }),
      fc
        .tuple(fc.nat({ max: good.length }), fc.string({ maxLength: 3 }))
        .map(([at, s]) => good.slice(0, at) + s + good.slice(at + 1)),
      fc.nat({ max: good.length }).map((at) => good.slice(0, at)),
    );
    fc.assert(
      fc.property(damaged, (text) => {
        const { library, storage } = setup();
        storage.items.set(LIBRARY_KEY, text);
        const listing = library.list();
        if (listing.problems.length === 0) {
          expect(storage.items.get(LIBRARY_KEY)).toBe(text);
        } else if (listing.canWrite) {
          expect(storage.items.get(listing.setAside.at(-1) as string)).toBe(text);
        } else {
          expect(storage.items.get(LIBRARY_KEY)).toBe(text);
        }
        for (const p of listing.problems) expect(p.message.length).toBeGreaterThan(10);
      }),
      { numRuns: 1_500, seed: 31 },
    );
  });
});
