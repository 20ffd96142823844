import { describe, expect, it, vi } from 'vitest';

// Every fit of the transform over the event set is counted where the core does it.
const counts = vi.hoisted(() => ({ transformFits: 0 }));
vi.mock('../../src/core/events/transform-fit', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/core/events/transform-fit')>();
  return {
    ...real,
    fitEventTransforms: (...a: Parameters<typeof real.fitEventTransforms>) => {
      counts.transformFits++;
      return real.fitEventTransforms(...a);
    },
  };
});

// test/setup.ts loaded the core before this mock was set: load it afresh.
vi.resetModules();
const { createWorkbenchStore } = await import('../../src/store');
const { eventDerived } = await import('../../src/store/derive-events');
const { withTransformFit, withTransformParam } = await import('../../src/store/hydrograph-edits');
const { FOUR_BARS } = await import('../helpers/scenario-fixtures');
const { eventWithReservoirRecord } = await import('../helpers/hydrographs');
type Scenario = import('../../src/scenario/types').Scenario;
type SetEvent = import('../../src/scenario/types').SetEvent;

// One invented event on FOUR_BARS's 1 km² catchment with its own record: a
// linear reservoir's (k = 2 h) under 10 mm of excess from 0 h, on no
// baseflow. By hand: 30 mm of rain, 10 mm observed, so φ = 20 mm/h and the
// excess is 10 mm in the one hour; fitting k to the record's peak gives back
// k = 2 h (the record is the Nash cascade's n = 1 response).
const AREA = 1e6;
const EVENT: SetEvent = eventWithReservoirRecord('a', 'One hour (invented)', [30], 10, 0, 2, AREA);
const SET: Scenario = {
  ...FOUR_BARS,
  hydrograph: {
    ...FOUR_BARS.hydrograph,
    transform: { kind: 'nash', n: 1, kH: 5 },
    fitParameter: 'kH',
    objective: 'peak',
  },
  eventSet: { events: [EVENT], activeId: null, parameter: 'rateMmH', designPick: 'median' },
};

describe("the event set's transform fits, derived in the store", () => {
  it('fit every event once, and again only when what they read changes', () => {
    const store = createWorkbenchStore(SET);
    const { actions } = store.getState();
    const fitsNow = () => eventDerived(store.derived).transformFits(store.getState().scenario);
    counts.transformFits = 0;
    const first = fitsNow();
    expect(counts.transformFits).toBe(1);
    const fit = first?.byId.get('a')?.result;
    expect(fit?.ok).toBe(true);
    if (fit?.ok) expect(fit.value).toBeCloseTo(2, 4);
    expect(fitsNow()).toBe(first);

    // None of these is read by the fits: no event is fitted again.
    actions.setName('Renamed (invented)');
    expect(fitsNow()).toBe(first);
    actions.setCatchmentName('Another brook (invented)');
    expect(fitsNow()).toBe(first);
    actions.beginGesture('Drag loss rate φ');
    for (const v of [7, 6.5, 6]) {
      actions.setParam('rateMmH', v);
      expect(fitsNow()).toBe(first);
    }
    actions.endGesture();
    actions.beginGesture('Drag bar 2');
    for (const v of [12, 13]) {
      actions.setBarDepth(1, v);
      expect(fitsNow()).toBe(first);
    }
    actions.endGesture();
    // A new hydrograph settings object holding the same transform, parameter and objective.
    actions.edit('Same hydrograph settings', (s) => ({ ...s, hydrograph: { ...s.hydrograph } }));
    expect(fitsNow()).toBe(first);
    expect(counts.transformFits).toBe(1);

    // What they read: the objective, the transform and the area each fit the events again.
    actions.edit('Fit to the efficiency', (s) => withTransformFit(s, { objective: 'nse' }));
    const byNse = fitsNow();
    expect(byNse).not.toBe(first);
    expect(counts.transformFits).toBe(2);
    actions.edit('Set n', (s) => withTransformParam(s, 'n', 2));
    expect(fitsNow()).not.toBe(byNse);
    expect(counts.transformFits).toBe(3);
    actions.setAreaM2(2e6);
    fitsNow();
    expect(counts.transformFits).toBe(4);
  });
});
