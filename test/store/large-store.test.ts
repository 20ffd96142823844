import 'fake-indexeddb/auto';
import { get, set, createStore } from 'idb-keyval';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createWorkbenchStore, loadScenario, persistStore, STORAGE_KEY, type OtherTabWatch } from '../../src/store';
import { LARGE_NUMBERS, readLargeMarker } from '../../src/store/large-marker';
import { LARGE_DB, LARGE_OBJECTS, pack, packInSlices, readLarge, unpack } from '../../src/store/large-store';
import { SLICE } from '../../src/store/next-task';
import type { Scenario } from '../../src/scenario/types';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

// Scenarios too large for localStorage go to the browser's IndexedDB (here
// fake-indexeddb, the same interface in memory), with a marker in the
// current scenario's slot. The same rules as the rest of storage: damaged
// data set aside, never written over another tab's newer save.

const NOW = '2026-03-01T10:00:00.000Z';
const records = createStore(LARGE_DB, LARGE_OBJECTS);

/** A storm of n five-minute bars, 0 to 2.9 mm in steps of 0.1 mm (invented). */
function barsOf(n: number, name = `${n} bars`): Scenario {
  const durationsH = new Array<number>(n).fill(5 / 60);
  const depthsMm = Array.from({ length: n }, (_, i) => (i % 30) / 10);
  return { ...FOUR_BARS, name, storm: { durationsH, depthsMm } };
}
// Over the threshold: 2 numbers a bar.
const LARGE_BARS = LARGE_NUMBERS / 2 + 1;

const stopAll: (() => void)[] = [];
afterEach(() => {
  for (const stop of stopAll.splice(0)) stop();
});

function tab(storage: ReturnType<typeof memoryStorage>, scenario: Scenario, watch?: OtherTabWatch) {
  const store = createWorkbenchStore(scenario);
  const persistence = persistStore(store, storage, 1, watch ?? (() => () => undefined));
  stopAll.push(persistence.stop);
  return { store, persistence, actions: store.getState().actions };
}

const markerIn = (storage: ReturnType<typeof memoryStorage>) => readLargeMarker(storage.data.get(STORAGE_KEY) ?? null);

describe('packing a scenario for the large store', () => {
  it('turns long columns into Float64Array and back, exactly', () => {
    const scenario = barsOf(5000);
    const packed = pack(scenario) as { storm: { depthsMm: unknown; durationsH: unknown }; name: string };
    expect(packed.storm.depthsMm).toBeInstanceOf(Float64Array);
    expect(packed.storm.durationsH).toBeInstanceOf(Float64Array);
    expect(packed.name).toBe('5000 bars');
    expect(unpack(packed)).toStrictEqual(scenario);
    // Short lists stay plain arrays.
    expect(Array.isArray((pack(FOUR_BARS) as Scenario).storm.depthsMm)).toBe(true);
  });

  it('packs in slices to the same record, however many slices a column takes', async () => {
    // 2.5 slices of bars, a column with a non-number past the first slice (stays a list), and a short one.
    const scenario = barsOf(Math.floor(SLICE * 2.5));
    expect(await packInSlices(scenario)).toStrictEqual(pack(scenario));
    const mixed = { long: [...new Array<number>(SLICE + 5).fill(0.1), 'x'], short: [1, 2] };
    const packed = (await packInSlices(mixed)) as { long: unknown[]; short: unknown };
    expect(Array.isArray(packed.long)).toBe(true);
    expect(packed).toStrictEqual(pack(mixed));
    expect(await packInSlices(FOUR_BARS)).toStrictEqual(pack(FOUR_BARS));
  });
});

describe('the current scenario in the large store', () => {
  it('a scenario over the threshold is saved there, says where, and opens from there at the next start', async () => {
    const storage = memoryStorage();
    const { actions, store } = tab(storage, FOUR_BARS);
    const big = barsOf(LARGE_BARS);
    actions.replaceScenario(big, 'Open a long record');
    await vi.waitFor(() => expect(markerIn(storage)).not.toBeNull(), { timeout: 10_000 });
    const marker = markerIn(storage);
    if (!marker) throw new Error('no marker');
    expect(marker.numbers).toBe(2 * LARGE_BARS);
    expect(store.getState().notice).toMatchObject({
      kind: 'large-store',
      message: expect.stringMatching(/kept in this browser’s larger database \(IndexedDB\)/),
    });
    // At the next start: the page reads the record the marker names, then starts with it.
    const large = await readLarge(marker);
    const loaded = loadScenario(storage, FOUR_BARS, NOW, { large });
    expect(loaded.notice).toBeNull();
    expect(loaded.canSave).toBe(true);
    expect(loaded.scenario).toStrictEqual(big);
  });

  it('a smaller scenario the browser refuses for lack of room goes there too', async () => {
    const storage = memoryStorage();
    // localStorage with room for the marker (about 120 characters) but not for the scenario.
    const tight = {
      ...storage,
      setItem: (key: string, value: string) => {
        if (value.length > 200)
          throw Object.assign(new Error('The quota has been exceeded.'), { name: 'QuotaExceededError' });
        storage.setItem(key, value);
      },
    };
    const store = createWorkbenchStore(FOUR_BARS);
    stopAll.push(persistStore(store, tight, 1, () => () => undefined).stop);
    store.getState().actions.setName('Refused by localStorage');
    await vi.waitFor(() => expect(markerIn(storage)).not.toBeNull(), { timeout: 10_000 });
    const large = await readLarge(markerIn(storage) ?? { id: '', numbers: 0, savedAt: '' });
    expect(large.ok && large.scenario.name).toBe('Refused by localStorage');
  });

  it('the record of a scenario that became small again is deleted', async () => {
    const storage = memoryStorage();
    const { actions } = tab(storage, FOUR_BARS);
    actions.replaceScenario(barsOf(LARGE_BARS), 'Open a long record');
    await vi.waitFor(() => expect(markerIn(storage)).not.toBeNull(), { timeout: 10_000 });
    const id = markerIn(storage)?.id as string;
    expect(await get(id, records)).toBeDefined();
    actions.replaceScenario(FOUR_BARS, 'Back to four bars');
    await vi.waitFor(() => expect(JSON.parse(storage.data.get(STORAGE_KEY) ?? '{}').name).toBe('Four bars'));
    await vi.waitFor(async () => expect(await get(id, records)).toBeUndefined());
  });

  it('a damaged record is set aside at start-up: the marker kept under a key of its own, the record left in place', async () => {
    const id = 'scenario.damaged-test';
    await set(id, { ...(pack(barsOf(2000)) as object), storm: { durationsH: [1], depthsMm: [-5] } }, records);
    const markerText = JSON.stringify({ $format: 'raincut-large-store', id, numbers: 4000, savedAt: NOW });
    const storage = memoryStorage({ [STORAGE_KEY]: markerText });
    const marker = readLargeMarker(markerText);
    if (!marker) throw new Error('marker not read');
    const large = await readLarge(marker);
    expect(large).toMatchObject({
      ok: false,
      message: expect.stringMatching(
        /^The record "scenario\.damaged-test" in this browser’s large store is damaged: storm\.depthsMm\[0\]/,
      ),
    });
    const loaded = loadScenario(storage, FOUR_BARS, NOW, { large });
    expect(loaded.scenario).toBe(FOUR_BARS);
    expect(loaded.notice).toMatchObject({ kind: 'set-aside', key: `${STORAGE_KEY}.damaged.${NOW}` });
    expect(storage.data.get(`${STORAGE_KEY}.damaged.${NOW}`)).toBe(markerText);
    expect(storage.data.has(STORAGE_KEY)).toBe(false);
    expect(await get(id, records)).toBeDefined();
  });

  it('a marker naming no record says so, and the demo opens', async () => {
    const markerText = JSON.stringify({
      $format: 'raincut-large-store',
      id: 'scenario.gone',
      numbers: 4000,
      savedAt: NOW,
    });
    const large = await readLarge(readLargeMarker(markerText) ?? { id: '', numbers: 0, savedAt: '' });
    expect(large).toEqual({
      ok: false,
      message: 'This browser’s large store holds no record "scenario.gone" (it may have been cleared).',
    });
    const loaded = loadScenario(memoryStorage({ [STORAGE_KEY]: markerText }), FOUR_BARS, NOW, { large });
    expect(loaded.notice?.message).toMatch(/holds no record "scenario\.gone"/);
  });

  it('never writes over another tab’s newer save: the other tab’s marker stays, and this tab is told', async () => {
    const storage = memoryStorage();
    let heardByA: (key: string | null) => void = () => undefined;
    const a = tab(storage, FOUR_BARS, (changed) => {
      heardByA = changed;
      return () => undefined;
    });
    a.actions.replaceScenario(barsOf(LARGE_BARS, 'Tab A'), 'Open a long record');
    await vi.waitFor(() => expect(markerIn(storage)).not.toBeNull(), { timeout: 10_000 });
    const markerA = markerIn(storage)?.id;
    // Tab B opens now (it reads tab A's save as its stamp) and saves a change of its own.
    const b = tab(storage, FOUR_BARS);
    b.actions.replaceScenario(barsOf(LARGE_BARS, 'Tab B'), 'Open a long record');
    await vi.waitFor(() => expect(markerIn(storage)?.id).not.toBe(markerA), { timeout: 10_000 });
    heardByA(STORAGE_KEY);
    expect(a.store.getState().notice?.kind).toBe('other-tab');
    const theirs = markerIn(storage)?.id;
    a.actions.setName('Tab A, edited after');
    await new Promise((r) => setTimeout(r, 50));
    expect(markerIn(storage)?.id).toBe(theirs);
    const notice = a.store.getState().notice;
    if (notice?.kind !== 'other-tab') throw new Error('tab A was not told');
    // "Open the other tab's version" reads it from the large store.
    notice.takeTheirs();
    await vi.waitFor(() => expect(a.store.getState().scenario.name).toBe('Tab B'), { timeout: 10_000 });
  });
});
