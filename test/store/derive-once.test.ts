import { beforeEach, describe, expect, it, vi } from 'vitest';

// Every call of the core's storm and method checks, from anywhere (the core's
// own modules included), is counted: the checks are wrapped where they live.
const counts = vi.hoisted(() => ({ storm: 0, method: 0 }));
vi.mock('../../src/core/storm', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/core/storm')>();
  return {
    ...real,
    validateStorm: (...a: Parameters<typeof real.validateStorm>) => {
      counts.storm++;
      return real.validateStorm(...a);
    },
    validateStormDepthMm: (...a: Parameters<typeof real.validateStormDepthMm>) => {
      counts.storm++;
      return real.validateStormDepthMm(...a);
    },
    // The fused constant-rate pass starts with this check and then checks each bar as it computes.
    validateStormLists: (...a: Parameters<typeof real.validateStormLists>) => {
      counts.storm++;
      return real.validateStormLists(...a);
    },
  };
});
vi.mock('../../src/core/loss/methods', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../src/core/loss/methods')>();
  return {
    ...real,
    validateMethod: (...a: Parameters<typeof real.validateMethod>) => {
      counts.method++;
      return real.validateMethod(...a);
    },
  };
});

// test/setup.ts loaded the core before these mocks were set: load it afresh.
vi.resetModules();
const { createWorkbenchStore } = await import('../../src/store');
const { eventDerived } = await import('../../src/store/derive-events');
const { FOUR_BARS } = await import('../helpers/scenario-fixtures');
const { inventedEvents, withSet } = await import('../helpers/event-set-fixtures');

beforeEach(() => {
  counts.storm = 0;
  counts.method = 0;
});

type Store = ReturnType<typeof createWorkbenchStore>;

/** What the screen reads from the store after a frame of the loss line's drag. */
function readAsTheScreenDoes(store: Store): void {
  const { derived } = store;
  const s = store.getState().scenario;
  derived.results(s);
  derived.lossPartMm(s);
  derived.effectiveMethod(s);
  derived.fit(s);
  derived.isMatched(s);
  derived.fitInUse(s);
  derived.runoffVolumeM3(s);
  derived.target(s);
  eventDerived(derived).fits(s);
  eventDerived(derived).outcome(s);
}

describe('a drag frame of the loss line', () => {
  it('checks the dragged method once and the unchanged storm not at all', () => {
    // With an observed depth to fit, so the fit is worked out every frame too.
    const store = createWorkbenchStore({
      ...FOUR_BARS,
      observed: { as: 'depth', value: 6, parameter: 'rateMmH', locked: false },
    });
    const { actions } = store.getState();
    readAsTheScreenDoes(store);
    actions.beginGesture('Drag loss rate φ');
    const frames = [7, 6.5, 6, 5.5];
    counts.storm = 0;
    counts.method = 0;
    for (const v of frames) {
      actions.setParam('rateMmH', v);
      readAsTheScreenDoes(store);
    }
    actions.endGesture();
    // Before derive-once: 3 method checks and 2 storm checks per frame (the
    // edit, calibrate and computeLosses each checked again).
    expect(counts.method).toBe(frames.length);
    expect(counts.storm).toBe(0);
  });

  it('with an event set, fits no event again and checks no event storm', () => {
    const store = createWorkbenchStore(withSet(inventedEvents(3, 40)));
    const { actions } = store.getState();
    const fitsNow = () => eventDerived(store.derived).fits(store.getState().scenario);
    readAsTheScreenDoes(store);
    const before = fitsNow();
    actions.beginGesture('Drag loss rate φ');
    counts.storm = 0;
    counts.method = 0;
    const frames = [3, 2.5, 2];
    for (const v of frames) {
      actions.setParam('rateMmH', v);
      readAsTheScreenDoes(store);
    }
    actions.endGesture();
    // Fitted for rateMmH, the fits never read the dragged value: the same fits, no check but the edit's.
    expect(fitsNow()).toBe(before);
    expect(counts).toEqual({ storm: 0, method: frames.length });
    // The area is part of the key (a volume target depends on it): fitted again.
    actions.setAreaM2(2e6);
    expect(fitsNow()).not.toBe(before);
  });
});
