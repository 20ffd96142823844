// @vitest-environment jsdom
import 'fake-indexeddb/auto';
import { screen, waitFor, within } from '@testing-library/react';
import { createStore, get, set } from 'idb-keyval';
import { describe, expect, it } from 'vitest';
import { LIBRARY_KEY, createScenarioLibrary, type SavedEntry } from '../../../src/scenario';
import { LARGE_DB, LARGE_OBJECTS } from '../../../src/store/large-store';
import { FOUR_BARS, LARGE_BARS, largeScenario, quotaStorage } from '../../helpers/scenario-fixtures';
import { lazyPartsLoaded } from '../../helpers/render';
import { renderTools } from '../../helpers/render-tools';

// Issue 14: a scenario too large for localStorage saved to the list. Before,
// the list's one setItem was refused (QuotaExceededError) and the panel said
// "That was not done". Now its numbers are a record in the browser's larger
// database (fake-indexeddb here) and the list holds a pointer to it.

const records = createStore(LARGE_DB, LARGE_OBJECTS);
const BARS = LARGE_BARS;
const BIG = largeScenario('A long record (invented)');
/** A localStorage that takes the small list and the current scenario's marker, not 10⁵ bars (about 2 M characters). */
const QUOTA = 200_000;

async function openPanel(user: ReturnType<typeof renderTools>['user']) {
  await user.click(screen.getByRole('button', { name: 'Saved scenarios' }));
  await lazyPartsLoaded();
  return screen.getByRole('region', { name: 'Saved scenarios' });
}

const largeEntries = (storage: ReturnType<typeof quotaStorage>) =>
  createScenarioLibrary(storage)
    .list()
    .entries.filter((e): e is Extract<SavedEntry, { large: object }> => 'large' in e);

describe('a scenario too large for localStorage in the saved list', { timeout: 60_000 }, () => {
  it('is saved with its numbers in the larger database, said so, and opens from the list in a new page', async () => {
    const storage = quotaStorage(QUOTA);
    const first = renderTools({ storage, fallback: BIG });
    const panel = await openPanel(first.user);
    await first.user.click(within(panel).getByRole('button', { name: 'Save current scenario to list' }));
    await waitFor(
      () =>
        expect(within(panel).getByRole('status')).toHaveTextContent('Saved “A long record (invented)” to the list.'),
      {
        timeout: 20_000,
      },
    );
    expect(within(panel).getByRole('status')).toHaveTextContent('kept in this browser’s larger database (IndexedDB)');
    const [entry] = largeEntries(storage);
    expect(entry?.large).toMatchObject({ name: BIG.name, bars: BARS, numbers: 2 * BARS, method: 'constant' });
    // The list's own text stays small: the numbers are in the record.
    expect((storage.getItem(LIBRARY_KEY) ?? '').length).toBeLessThan(1000);
    expect(await get(entry?.large.record as string, records)).toBeDefined();
    const item = within(within(panel).getByRole('list', { name: 'Scenarios saved in this browser' })).getAllByRole(
      'listitem',
    )[0] as HTMLElement;
    expect(item).toHaveTextContent(
      `kept in this browser’s larger database (IndexedDB) as record “${entry?.large.record}”`,
    );
    first.unmount();

    // A new page on the same storage: the list reads the pointer; Open reads the record.
    const second = renderTools({ storage });
    const again = await openPanel(second.user);
    expect(second.store.getState().scenario.name).toBe('Four bars');
    await second.user.click(within(again).getByRole('button', { name: 'Open A long record (invented)' }));
    await waitFor(() => expect(second.store.getState().scenario.name, again.textContent ?? '').toBe(BIG.name), {
      timeout: 20_000,
    });
    expect(second.store.getState().scenario.storm).toStrictEqual(BIG.storm);
    second.unmount();
  });

  it('a missing or damaged record is reported for that entry, and the rest of the list opens', async () => {
    const storage = quotaStorage(QUOTA);
    const library = createScenarioLibrary(storage);
    await set('library.test.damaged', { version: 2, storm: 'not a storm' }, records);
    const pointer = (record: string, name: string) => ({
      record,
      name,
      numbers: 10,
      bars: 5,
      method: 'constant' as const,
    });
    expect(library.saveLarge(pointer('library.test.missing', 'Gone record')).ok).toBe(true);
    expect(library.saveLarge(pointer('library.test.damaged', 'Damaged record')).ok).toBe(true);
    expect(library.save({ ...FOUR_BARS, name: 'Small one' }).ok).toBe(true);
    const { user, store, unmount } = renderTools({ storage });
    const panel = await openPanel(user);

    await user.click(within(panel).getByRole('button', { name: 'Open Gone record' }));
    const alert = await within(panel).findByRole('alert', {}, { timeout: 10_000 });
    expect(alert).toHaveTextContent(
      '“Gone record” is kept in this browser’s larger database (IndexedDB) as record “library.test.missing”, and it cannot be opened: This browser’s large store holds no record "library.test.missing"',
    );
    await user.click(within(panel).getByRole('button', { name: 'Open Damaged record' }));
    await waitFor(() =>
      expect(within(panel).getByRole('alert')).toHaveTextContent(
        'The record "library.test.damaged" in this browser’s large store is damaged',
      ),
    );
    expect(store.getState().scenario.name).toBe('Four bars');
    await user.click(within(panel).getByRole('button', { name: 'Open Small one' }));
    await waitFor(() => expect(store.getState().scenario.name).toBe('Small one'));
    expect(createScenarioLibrary(storage).list().entries).toHaveLength(3);
    unmount();
  });
});
