import { describe, expect, it } from 'vitest';
import { defaultMethod } from '../../src/core';
import { createWorkbenchStore } from '../../src/store';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

const lastStep = (store: ReturnType<typeof createWorkbenchStore>) => store.getState().undoLabel;

describe('undo steps are named from the one label text', () => {
  it('a curve number edit reads "Set curve number CN", not "Set curve number cn"', () => {
    const store = createWorkbenchStore({ ...FOUR_BARS, method: defaultMethod('curve-number') });
    store.getState().actions.setParam('cn', 72);
    expect(lastStep(store)).toBe('Set curve number CN');
  });

  it('the loss rate keeps its symbol: "Set loss rate φ"', () => {
    const store = createWorkbenchStore(FOUR_BARS);
    store.getState().actions.setParam('rateMmH', 5);
    expect(lastStep(store)).toBe('Set loss rate φ');
  });

  it('each kind of change to the observed runoff has a name of its own', () => {
    const store = createWorkbenchStore(FOUR_BARS);
    const { actions } = store.getState();
    const names: (string | null)[] = [];
    actions.setObserved({ as: 'depth', value: 5, parameter: 'rateMmH' });
    names.push(lastStep(store));
    actions.setObserved({ as: 'volume', value: 5000 });
    names.push(lastStep(store));
    actions.setObserved(null);
    names.push(lastStep(store));
    expect(names).toEqual(['Set observed runoff', 'Give observed runoff as a volume', 'Clear observed runoff']);
  });
});
