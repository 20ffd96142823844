import { describe, expect, it } from 'vitest';
import { AREA_UNITS_KEY, DEFAULT_AREA_UNITS, createWorkbenchStore, readAreaUnits } from '../../src/store';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

const holding = (text: string | null) => ({ getItem: (key: string) => (key === AREA_UNITS_KEY ? text : null) });

describe('the area unit preference', () => {
  it('reads each system’s saved unit, and falls back to hectares and acres for anything else', () => {
    expect(readAreaUnits(holding('{"si":"km2","us":"mi2"}'))).toEqual({ si: 'km2', us: 'mi2' });
    // A unit of the other system, an unknown unit, damaged text, nothing saved, no storage at all.
    expect(readAreaUnits(holding('{"si":"acre","us":"furlong"}'))).toEqual(DEFAULT_AREA_UNITS);
    expect(readAreaUnits(holding('{"si":'))).toEqual(DEFAULT_AREA_UNITS);
    expect(readAreaUnits(holding('"km2"'))).toEqual(DEFAULT_AREA_UNITS);
    expect(readAreaUnits(holding(null))).toEqual(DEFAULT_AREA_UNITS);
    expect(readAreaUnits(null)).toEqual({ si: 'ha', us: 'acre' });
    const throwing = {
      getItem: () => {
        throw new Error('SecurityError');
      },
    };
    expect(readAreaUnits(throwing)).toEqual(DEFAULT_AREA_UNITS);
  });

  it('setAreaUnit changes the unit of the system it belongs to, and neither the scenario nor the undo history', () => {
    const store = createWorkbenchStore(FOUR_BARS);
    const { actions } = store.getState();
    actions.setAreaUnit('mi2');
    actions.setAreaUnit('m2');
    expect(store.getState().areaUnits).toEqual({ si: 'm2', us: 'mi2' });
    expect(store.getState().scenario).toBe(FOUR_BARS);
    expect(store.getState().undoLabel).toBeNull();
  });
});
