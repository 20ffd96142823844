import { describe, expect, it } from 'vitest';
import { InputError, computeLosses } from '../../src/core';
import { createWorkbenchStore } from '../../src/store';
import { placeImportedStorm } from '../../src/store/place-storm';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

/** n bars of 5 minutes; depths 0, 0.4, 0.8, 1.2 mm in turn (invented). */
function importedStorm(n: number) {
  return {
    durationsH: new Array<number>(n).fill(1 / 12),
    depthsMm: Array.from({ length: n }, (_, k) => (k % 4) * 0.4),
    startIso: '2026-02-01T00:00',
  };
}

describe('placing a long imported storm in steps', () => {
  it('is the edit setImportedStorm makes: one undoable step, the storm as given, results as the core’s', async () => {
    const store = createWorkbenchStore(FOUR_BARS);
    const imported = importedStorm(70_000);
    let placedWith: unknown = null;
    await placeImportedStorm(store, imported, 'Open rainfall file gauge.csv', () => {
      // Runs in the edit's task, after it: the dialog closes in the render that shows the storm.
      placedWith = store.getState().scenario.storm;
    });
    const s = store.getState().scenario;
    expect(placedWith).toBe(s.storm);
    expect(s.storm).toEqual(imported);
    // Handed over, not copied again: the importer's lists are the document's.
    expect(s.storm.depthsMm).toBe(imported.depthsMm);
    expect(store.getState().undoLabel).toBe('Open rainfall file gauge.csv');
    const r = store.derived.results(s);
    expect(r.ok && r.result.excessMm).toEqual(computeLosses(imported, s.method).excessMm);
    store.getState().actions.undo();
    expect(store.getState().scenario).toBe(FOUR_BARS);
  });

  it('copies columns that are not plain lists (typed arrays) into the document’s own lists', async () => {
    const store = createWorkbenchStore(FOUR_BARS);
    const plain = importedStorm(70_000);
    const typed = { durationsH: Float64Array.from(plain.durationsH), depthsMm: Float64Array.from(plain.depthsMm) };
    await placeImportedStorm(store, typed, 'Paste rainfall', () => {});
    const { storm } = store.getState().scenario;
    expect(Array.isArray(storm.durationsH) && Array.isArray(storm.depthsMm)).toBe(true);
    expect(storm.depthsMm).toEqual(plain.depthsMm);
  });

  it('refuses a storm the core refuses, naming the bar, and changes nothing', async () => {
    const store = createWorkbenchStore(FOUR_BARS);
    const bad = importedStorm(70_000);
    bad.depthsMm[69_999] = -1;
    let placed = false;
    const refused = await placeImportedStorm(store, bad, 'Paste rainfall', () => (placed = true)).catch(
      (error: unknown) => error,
    );
    expect(refused).toBeInstanceOf(InputError);
    expect((refused as InputError).message).toMatch(/Bar 70,?000/);
    expect(placed).toBe(false);
    expect(store.getState().scenario).toBe(FOUR_BARS);
  });
});
