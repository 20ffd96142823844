// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { createScenarioLibrary } from '../../../src/scenario';
import { FOUR_BARS, memoryStorage, SAMPLE_LARGE_REF } from '../../helpers/scenario-fixtures';
import { lazyPartsLoaded } from '../../helpers/render';
import { renderTools } from '../../helpers/render-tools';

// Issue 14: the sweep of orphan large-store records (src/store/large-sweep.ts)
// starts only in a page whose large store is in use, so a page that never had
// a large scenario never loads the large store's code for it. The saved list
// starts it when one of its entries (or a set-aside copy) points into the
// large store; here the large store's `sweepSoon` is watched.

const sweepSoon = vi.hoisted(() => vi.fn());
vi.mock('../../../src/store/large-store', async (original) => ({
  ...(await original<typeof import('../../../src/store/large-store')>()),
  sweepSoon,
}));

async function openList(storage: ReturnType<typeof memoryStorage>) {
  const { user } = renderTools({ storage });
  await lazyPartsLoaded();
  await user.click(screen.getByRole('button', { name: 'Saved scenarios' }));
  await lazyPartsLoaded();
  const panel = screen.getByRole('region', { name: 'Saved scenarios' });
  // The list is drawn: its effects have run.
  await within(panel).findByRole('list', { name: 'Scenarios saved in this browser' });
  return panel;
}

describe('the sweep of the large store starts only where the large store is in use', { timeout: 20_000 }, () => {
  beforeEach(() => sweepSoon.mockClear());

  it('a saved list of plain scenarios does not start it', async () => {
    const storage = memoryStorage();
    expect(createScenarioLibrary(storage).save({ ...FOUR_BARS, name: 'Plain' }).ok).toBe(true);
    await openList(storage);
    // Give a dynamic import time to land, had one been started.
    await new Promise((r) => setTimeout(r, 200));
    expect(sweepSoon).not.toHaveBeenCalled();
  });

  it('a saved list with a pointer into the large store starts it, with the page’s storage', async () => {
    const storage = memoryStorage();
    expect(createScenarioLibrary(storage).saveLarge(SAMPLE_LARGE_REF).ok).toBe(true);
    await openList(storage);
    await vi.waitFor(() => expect(sweepSoon).toHaveBeenCalledWith(storage));
  });
});
