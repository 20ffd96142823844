import { describe, expect, it, vi } from 'vitest';
import type { Scenario } from '../../src/scenario/types';
import { createWorkbenchStore, type WorkbenchStore } from '../../src/store';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

// Undo and redo across long storms (issue 11's rule: no task of the page over 100 ms): a step that brings in a
// long storm whose results' arrays are not made waits for them (made in small tasks), then is taken; steps
// asked for meanwhile follow in order; any other step is taken at once. The history itself is history.ts's.

/** n bars of 5 min, depths from a pattern of `period` steps of 0.1 mm (invented). Over 65,536 bars: long. */
function stormOf(n: number, period: number): Scenario['storm'] {
  return {
    durationsH: new Array<number>(n).fill(5 / 60),
    depthsMm: Array.from({ length: n }, (_, i) => (i % period) / 10),
  };
}
const LONG = 70_000;

/** A store whose every change is drawn at once, as the screen does (the drawing computes the results). */
function drawnStore(): WorkbenchStore {
  const store = createWorkbenchStore(FOUR_BARS);
  store.subscribe((state) => void store.derived.results(state.scenario));
  return store;
}

describe('undo and redo across long storms', () => {
  it('waits for the long storm’s arrays, then takes the step with them made', async () => {
    const store = drawnStore();
    const { actions } = store.getState();
    const a = stormOf(LONG, 30);
    const b = stormOf(LONG, 17);
    actions.setStorm(a, 'Storm A');
    actions.setStorm(b, 'Storm B');
    const stormA = store.getState().history.past[1]?.doc.storm;
    // B's results took the arrays: A's are gone, and a step back to A must make them again.
    expect(stormA && store.derived.stormReady(stormA)).toBe(false);
    const atStep: boolean[] = [];
    store.subscribe((state, before) => {
      if (state.scenario !== before.scenario) atStep.push(store.derived.stormReady(state.scenario.storm));
    });
    actions.undo();
    // Not in the task of the click.
    expect(store.getState().scenario.storm.depthsMm).toEqual(b.depthsMm);
    await vi.waitFor(() => expect(store.getState().scenario.storm).toBe(stormA));
    expect(atStep).toEqual([true]);
    expect(store.getState().undoLabel).toBe('Storm A');
    expect(store.getState().redoLabel).toBe('Storm B');
  });

  it('takes steps asked for while one waits in order, each on the history as it then is', async () => {
    const store = drawnStore();
    const { actions } = store.getState();
    actions.setStorm(stormOf(LONG, 30), 'Storm A');
    actions.setStorm(stormOf(LONG, 17), 'Storm B');
    const [start, afterA, afterB] = [...store.getState().history.past.map((e) => e.doc), store.getState().scenario];
    const seen: Scenario[] = [];
    store.subscribe((state, before) => {
      if (state.scenario !== before.scenario) seen.push(state.scenario);
    });
    actions.undo(); // to A: waits for A's arrays
    actions.undo(); // to the four bars: after it
    await vi.waitFor(() => expect(store.getState().scenario).toBe(start));
    expect(seen).toEqual([afterA, start]);
    expect(store.getState().redoLabel).toBe('Storm A');
    actions.redo(); // to A: its arrays were made for the first undo, and the four bars took none: at once
    expect(store.getState().scenario).toBe(afterA);
    actions.redo(); // to B: B's arrays went with A's making
    actions.redo(); // nothing more to redo
    await vi.waitFor(() => expect(store.getState().scenario).toBe(afterB));
    expect(store.getState().history.future).toHaveLength(0);
    expect(store.getState().undoLabel).toBe('Storm B');
  });

  it('takes a step among short storms at once, as before', () => {
    const store = drawnStore();
    const { actions } = store.getState();
    actions.setStorm(stormOf(100, 7), 'Short storm');
    actions.undo();
    expect(store.getState().scenario).toBe(FOUR_BARS);
    actions.redo();
    expect(store.getState().undoLabel).toBe('Short storm');
  });
});
