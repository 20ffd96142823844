// @vitest-environment jsdom
import 'fake-indexeddb/auto';
import { screen } from '@testing-library/react';
import { createStore, del, get, set } from 'idb-keyval';
import { describe, expect, it, vi } from 'vitest';
import { DEMO_SCENARIO } from '../../../src/scenario';
import { STORAGE_KEY } from '../../../src/store';
import { createCrashRecovery } from '../../../src/store/crash';
import { readLargeMarker } from '../../../src/store/large-marker';
import { LARGE_DB, LARGE_OBJECTS, pack, readLarge } from '../../../src/store/large-store';
import { listSetAside } from '../../../src/store/set-aside';
import { startWorkbench } from '../../../src/store/start';
import { quietConsoleErrors, showErrorScreen } from '../../helpers/error-screen';
import { FOUR_BARS, memoryStorage } from '../../helpers/scenario-fixtures';

// Issue 11: the error screen tells the truth about what was saved, also when
// the saved scenario is in the large store (IndexedDB, here fake-indexeddb)
// and the current scenario's slot holds only a marker naming its record.

const NOW = new Date('2026-03-01T10:00:00.000Z');
const records = createStore(LARGE_DB, LARGE_OBJECTS);
let count = 0;

/** A large-store save of `scenario` as the page would leave it: the record, then the marker naming it. */
async function savedLarge(scenario = FOUR_BARS) {
  const id = `scenario.crash-test.${count++}`;
  await set(id, pack(scenario), records);
  const markerText = JSON.stringify({ $format: 'raincut-large-store', id, numbers: 8, savedAt: NOW.toISOString() });
  return { id, markerText, storage: memoryStorage({ [STORAGE_KEY]: markerText }) };
}

/** The page as main.tsx starts it when the slot holds a marker: the record is read first. */
async function page(storage: ReturnType<typeof memoryStorage>) {
  const marker = readLargeMarker(storage.data.get(STORAGE_KEY) ?? null);
  if (!marker) throw new Error('the slot holds no marker');
  const large = await readLarge(marker);
  const { store, link } = startWorkbench({
    storage,
    fragment: '',
    fallback: DEMO_SCENARIO,
    nowIso: NOW.toISOString(),
    clearFragment: () => {},
    large,
  });
  const recovery = createCrashRecovery({ store, link, storage, now: () => NOW, tabStorage: memoryStorage() });
  return { store, recovery };
}

describe('when drawing fails and the saved scenario is in the large store', () => {
  quietConsoleErrors();

  it('says it is the saved one, downloads the scenario itself (not the marker), and sets the marker aside with the record kept', async () => {
    const { id, markerText, storage } = await savedLarge();
    const { store, recovery } = await page(storage);
    expect(store.getState().scenario).toStrictEqual(FOUR_BARS);
    const { reload, download, user } = showErrorScreen(recovery);
    expect(
      await screen.findByText(
        /^The scenario that stopped the screen is the one saved in this browser, so reloading would stop it again\..*larger database \(IndexedDB\)/,
      ),
    ).toBeInTheDocument();
    expect(screen.queryByText(/was not saved/)).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Download the saved scenario' }));
    await vi.waitFor(() => expect(download).toHaveBeenCalledOnce());
    const downloaded = download.mock.calls[0]?.[0] as string;
    expect(downloaded).not.toBe(markerText);
    expect(JSON.parse(downloaded)).toStrictEqual(FOUR_BARS);

    await user.click(screen.getByRole('button', { name: 'Set the saved scenario aside and start from the demo' }));
    expect(reload).toHaveBeenCalledOnce();
    expect(storage.data.has(STORAGE_KEY)).toBe(false);
    expect(listSetAside(storage).copies.map((c) => storage.data.get(c.key))).toEqual([markerText]);
    // The set-aside marker still names a whole record.
    expect(await get(id, records)).toBeDefined();
  });

  it('says the change was not saved when the record holds the scenario from before it', async () => {
    const { storage } = await savedLarge();
    const { store, recovery } = await page(storage);
    store.getState().actions.setName('Broken by this edit');
    showErrorScreen(recovery);
    expect(await screen.findByText(/^The change that stopped the screen was not saved/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Set the saved scenario aside and start from the demo' })).toBeNull();
  });

  it('says plainly when the record the marker names is gone, and what a reload does', async () => {
    const { id, storage } = await savedLarge();
    const { recovery } = await page(storage);
    await del(id, records);
    showErrorScreen(recovery);
    expect(
      await screen.findByText(
        new RegExp(
          `cannot be had: This browser’s large store holds no record "${id.replace(/\./g, '\\.')}" \\(it may have been cleared\\)\\. Reloading keeps the pointer`,
        ),
      ),
    ).toBeInTheDocument();
    expect(screen.queryByText(/is the one saved in this browser/)).toBeNull();
  });
});
