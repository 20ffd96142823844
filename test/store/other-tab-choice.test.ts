import 'fake-indexeddb/auto';
import { createStore, get } from 'idb-keyval';
import { describe, expect, it, vi } from 'vitest';
import { createScenarioLibrary, type SavedEntry } from '../../src/scenario';
import type { StoredSlot } from '../../src/scenario/stored-slot';
import type { Scenario } from '../../src/scenario/types';
import { createWorkbenchStore } from '../../src/store';
import { LARGE_DB, LARGE_OBJECTS, unpack } from '../../src/store/large-store';
import { copyName, keepMine } from '../../src/store/other-tab-choice';
import { FOUR_BARS, LARGE_BARS, largeScenario, quotaStorage } from '../helpers/scenario-fixtures';

// Issue 11 and 14: "Keep this one", when another tab changed the saved
// scenario, saves this tab's scenario as a copy in the saved list before
// saving it as the current one again. A scenario too large for localStorage
// must take the large store's way into the list (a record and a pointer),
// not fail on the list's quota and leave the user with only "export it".

const records = createStore(LARGE_DB, LARGE_OBJECTS);
const BARS = LARGE_BARS;
const BIG = largeScenario('A long record in this tab (invented)');

function hostFor(scenario: Scenario) {
  const storage = quotaStorage(200_000);
  const store = createWorkbenchStore(scenario);
  store.getState().actions.setNotice({ kind: 'save-failed', message: 'stands in for the other-tab notice' });
  const acknowledge = vi.fn();
  const slot = { acknowledge, peek: () => null } as unknown as StoredSlot<Scenario>;
  const keep = vi.fn();
  return { storage, store, acknowledge, keep, host: { store, slot, storage, taken: vi.fn(), keep } };
}

describe('Keep this one with a scenario too large for localStorage', () => {
  it('puts this tab’s copy in the saved list through the large store, then keeps it as the current one', async () => {
    const { storage, store, acknowledge, keep, host } = hostFor(BIG);
    await keepMine(host);
    expect(store.getState().notice).toBeNull();
    const entries = createScenarioLibrary(storage).list().entries;
    expect(entries).toHaveLength(1);
    const entry = entries[0] as Extract<SavedEntry, { large: object }>;
    expect(entry.large).toMatchObject({ name: copyName(BIG.name), bars: BARS, numbers: 2 * BARS });
    // The record holds this tab's numbers.
    const kept = unpack(await get(entry.large.record, records)) as Scenario;
    expect(kept.storm).toStrictEqual(BIG.storm);
    expect(acknowledge).toHaveBeenCalledTimes(1);
    expect(keep).toHaveBeenCalledWith(store.getState().scenario);
  }, 30_000);

  it('a small scenario still goes into the list itself', async () => {
    const { storage, keep, host } = hostFor(FOUR_BARS);
    await keepMine(host);
    const [entry] = createScenarioLibrary(storage).list().entries;
    expect(entry && 'scenario' in entry ? entry.scenario.name : null).toBe(copyName(FOUR_BARS.name));
    expect(keep).toHaveBeenCalledTimes(1);
  });
});
