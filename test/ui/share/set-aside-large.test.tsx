// @vitest-environment jsdom
import 'fake-indexeddb/auto';
import { screen, within } from '@testing-library/react';
import { createStore, get, set } from 'idb-keyval';
import { describe, expect, it, vi } from 'vitest';
import { LIBRARY_KEY, createScenarioLibrary, type SavedEntry } from '../../../src/scenario';
import { SET_ASIDE_PREFIX } from '../../../src/store';
import { LARGE_DB, LARGE_OBJECTS, pack } from '../../../src/store/large-store';
import {
  FOUR_BARS,
  LARGE_BARS,
  largeScenario,
  memoryStorage,
  quotaStorage,
  scenarioOf,
} from '../../helpers/scenario-fixtures';
import { renderTools, savedText } from '../../helpers/render-tools';
import { lazyPartsLoaded } from '../../helpers/render';

// Issue 11 and 14: a set-aside copy may be a large-store marker (the pointer
// the current scenario's slot held when a scenario too large for
// localStorage was set aside). Its scenario is the IndexedDB record it names
// (here fake-indexeddb): Restore, Download and Delete act on that record,
// and say so plainly when it is gone.

const AT = '2026-02-20T08:30:00.000Z';
const KEY = `${SET_ASIDE_PREFIX}${AT}`;
const records = createStore(LARGE_DB, LARGE_OBJECTS);
const BIG = { ...FOUR_BARS, name: 'Kept in the larger database' };
let count = 0;

async function browserWithMarker(withRecord = true) {
  const id = `scenario.set-aside-test.${count++}`;
  if (withRecord) await set(id, pack(BIG), records);
  const markerText = JSON.stringify({ $format: 'raincut-large-store', id, numbers: 8, savedAt: AT });
  return { id, markerText, storage: memoryStorage({ [KEY]: markerText }) };
}

async function openCopy(user: ReturnType<typeof renderTools>['user']) {
  await user.click(screen.getByRole('button', { name: 'Saved scenarios' }));
  await lazyPartsLoaded();
  const panel = screen.getByRole('region', { name: 'Saved scenarios' });
  const list = () => within(panel).queryByRole('list', { name: 'Set-aside copies' });
  const item = () => within(list() as HTMLElement).getAllByRole('listitem')[0] as HTMLElement;
  return { panel, list, item };
}

const savedNames = (storage: ReturnType<typeof memoryStorage>) =>
  createScenarioLibrary(storage)
    .list()
    .entries.map((e) => scenarioOf(e).name);

describe('a set-aside copy that points into the large store', { timeout: 20_000 }, () => {
  it('is listed with where its scenario is, and Restore reads the record it names into the saved list', async () => {
    const { id, storage } = await browserWithMarker();
    const { user } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, item } = await openCopy(user);
    expect(item()).toHaveTextContent(`kept in this browser’s larger database (IndexedDB) as record “${id}”`);
    await user.click(within(item()).getByRole('button', { name: /^Restore Saved scenario set aside/ }));
    await vi.waitFor(() => expect(savedNames(storage)).toEqual(['Kept in the larger database']));
    // The list is written before the message is drawn: wait for the message too.
    await vi.waitFor(() =>
      expect(within(panel).getAllByRole('status')[1]).toHaveTextContent(
        'Restored “Kept in the larger database” to the saved list',
      ),
    );
  });

  it('Download gives the scenario from the record, not the marker', async () => {
    const { id, markerText, storage } = await browserWithMarker();
    const { user, saved } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, item } = await openCopy(user);
    await user.click(within(item()).getByRole('button', { name: /^Download/ }));
    await vi.waitFor(() => expect(saved).toHaveLength(1));
    const text = await savedText(saved);
    expect(text).not.toBe(markerText);
    expect(JSON.parse(text)).toStrictEqual(BIG);
    expect(within(panel).getAllByRole('status')[1]).toHaveTextContent(
      `from this browser’s larger database (record “${id}”)`,
    );
  });

  it('Delete removes the marker and its record; Undo puts back the record, then the marker', async () => {
    const { id, markerText, storage } = await browserWithMarker();
    const { user } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, list, item } = await openCopy(user);
    await user.click(within(item()).getByRole('button', { name: /^Delete/ }));
    await vi.waitFor(() => expect(storage.data.has(KEY)).toBe(false));
    await vi.waitFor(async () => expect(await get(id, records)).toBeUndefined());
    await user.click(await within(panel).findByRole('button', { name: 'Undo' }));
    await vi.waitFor(() => expect(storage.data.get(KEY)).toBe(markerText));
    expect(await get(id, records)).toBeDefined();
    // The list is drawn again after the write: wait for it (read at once, it raced the render on a loaded machine).
    await vi.waitFor(() => expect(within(list() as HTMLElement).getAllByRole('listitem')).toHaveLength(1));
  });

  it('when the record is gone, Restore and Download say so plainly and give nothing', async () => {
    const { id, storage } = await browserWithMarker(false);
    const { user, saved } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, item } = await openCopy(user);
    const gone = `is only a pointer to a record in this browser’s larger database, and that record cannot be had: This browser’s large store holds no record "${id}" (it may have been cleared).`;
    await user.click(within(item()).getByRole('button', { name: /^Restore/ }));
    expect(await within(panel).findByText(new RegExp(gone.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')))).toBeInTheDocument();
    expect(savedNames(storage)).toEqual([]);
    await user.click(within(item()).getByRole('button', { name: /^Download/ }));
    await new Promise((r) => setTimeout(r, 50));
    expect(saved).toHaveLength(0);
  });

  it('Restore of a set-aside saved list reads its large entries from their records into the saved list', async () => {
    // A saved list set aside (e.g. by a newer version's write) whose first entry is a pointer
    // into the large store. Before, Restore read only entries holding a scenario and said of
    // this one "cannot be opened", though its record was there.
    const id = `library.set-aside-test.${count++}`;
    await set(id, pack(BIG), records);
    const old = memoryStorage();
    const oldList = createScenarioLibrary(old);
    const pointed = oldList.saveLarge({ record: id, numbers: 8, name: 'Pointed at', bars: 4, method: 'constant' });
    expect(pointed.ok).toBe(true);
    expect(oldList.save({ ...FOUR_BARS, name: 'Held in the list' }).ok).toBe(true);
    const listKey = `${LIBRARY_KEY}.damaged.${AT}`;
    const storage = memoryStorage({ [listKey]: old.data.get(LIBRARY_KEY) as string });
    const { user } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, item } = await openCopy(user);
    await user.click(within(item()).getByRole('button', { name: /^Restore Saved list of scenarios/ }));
    await vi.waitFor(() =>
      expect(within(panel).getAllByRole('status')[1]).toHaveTextContent(
        /Restored “(Pointed at|Held in the list)”, “(Pointed at|Held in the list)” to the saved list/,
      ),
    );
    // The pointer's scenario under the entry's name (a rename changes only the entry), with the record's numbers.
    const restored = createScenarioLibrary(storage).list().entries;
    expect(restored.map((e) => ('large' in e ? e.large.name : e.scenario.name)).sort()).toEqual([
      'Held in the list',
      'Pointed at',
    ]);
    const fromRecord = restored.find((e) => !('large' in e) && e.scenario.name === 'Pointed at') as Extract<
      SavedEntry,
      { scenario: object }
    >;
    expect(fromRecord.scenario.storm).toStrictEqual(BIG.storm);
    // The copy is kept, and so is the record it names.
    expect(storage.data.has(listKey)).toBe(true);
    expect(await get(id, records)).toBeDefined();
  });

  it('Restore of a marker whose scenario is too large for localStorage puts it in the saved list through the large store', async () => {
    const bars = LARGE_BARS;
    const huge = largeScenario('A long set-aside record (invented)');
    const id = `scenario.set-aside-test.${count++}`;
    await set(id, pack(huge), records);
    const markerText = JSON.stringify({ $format: 'raincut-large-store', id, numbers: 2 * bars, savedAt: AT });
    // Takes the list of pointers, not 10⁵ bars (about 2 M characters). Before, Restore's one
    // setItem was refused: "Nothing in … can be opened", with the quota error beneath.
    const storage = quotaStorage(200_000, { [KEY]: markerText });
    const { user } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, item } = await openCopy(user);
    await user.click(within(item()).getByRole('button', { name: /^Restore Saved scenario set aside/ }));
    await vi.waitFor(
      () =>
        expect(within(panel).getAllByRole('status')[1]).toHaveTextContent(
          'Restored “A long set-aside record (invented)” to the saved list',
        ),
      { timeout: 50_000 },
    );
    const [entry] = createScenarioLibrary(storage).list().entries;
    expect(entry && 'large' in entry ? entry.large : null).toMatchObject({ name: huge.name, bars, numbers: 2 * bars });
    // A record of its own, so deleting the restored entry never takes the set-aside copy's record.
    expect(entry && 'large' in entry ? entry.large.record : id).not.toBe(id);
  }, 60_000);
});
