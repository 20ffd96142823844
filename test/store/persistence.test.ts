import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DEMO_SCENARIO } from '../../src/scenario/demo';
import {
  SET_ASIDE_PREFIX,
  STORAGE_KEY,
  createWorkbenchStore,
  loadScenario,
  persistStore,
  readScenario,
} from '../../src/store';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

const NOW = '2026-03-01T10:00:00.000Z';

describe('restoring the saved scenario', () => {
  it('opens the saved scenario when there is one', () => {
    const storage = memoryStorage({ [STORAGE_KEY]: JSON.stringify(FOUR_BARS) });
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW);
    expect(loaded.scenario).toEqual(FOUR_BARS);
    expect(loaded.notice).toBeNull();
  });

  it('opens the fallback when nothing is saved', () => {
    const loaded = loadScenario(memoryStorage(), DEMO_SCENARIO, NOW);
    expect(loaded.scenario).toBe(DEMO_SCENARIO);
    expect(loaded.notice).toBeNull();
  });

  it('text that is not JSON is set aside under its own key and reported', () => {
    const storage = memoryStorage({ [STORAGE_KEY]: '{"version":1,' });
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW);
    expect(loaded.scenario).toBe(DEMO_SCENARIO);
    expect(loaded.notice?.kind).toBe('set-aside');
    expect(loaded.notice?.message).toMatch(/not valid JSON/);
    expect(storage.data.get(SET_ASIDE_PREFIX + NOW)).toBe('{"version":1,');
    expect(storage.data.has(STORAGE_KEY)).toBe(false);
  });

  it('a damaged field is named in the report', () => {
    const bad = { ...FOUR_BARS, storm: { durationsH: [0.5, 0.5], depthsMm: [1, -2] } };
    const loaded = loadScenario(memoryStorage({ [STORAGE_KEY]: JSON.stringify(bad) }), DEMO_SCENARIO, NOW);
    expect(loaded.notice?.message).toContain('storm.depthsMm[1] (bar 2): must be a number ≥ 0');
    expect(loaded.notice?.kind === 'set-aside' && loaded.notice.key).toBe(SET_ASIDE_PREFIX + NOW);
  });

  it('damaged data that cannot be set aside is left where it is, and saving is off', () => {
    const storage = memoryStorage({ [STORAGE_KEY]: 'nonsense' });
    storage.failNextWrites(new Error('quota exceeded'));
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW);
    expect(loaded.canSave).toBe(false);
    expect(loaded.notice?.message).toMatch(/could not be set aside \(quota exceeded\)/);
    expect(storage.data.get(STORAGE_KEY)).toBe('nonsense');
  });

  it('no storage at all is reported, not an error', () => {
    const loaded = loadScenario(null, DEMO_SCENARIO, NOW);
    expect(loaded.notice?.kind).toBe('unavailable');
    expect(loaded.canSave).toBe(false);
  });

  it('reads through the scenario schema, naming the wrong field', () => {
    expect(readScenario(DEMO_SCENARIO)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
    const cases: [unknown, RegExp][] = [
      [[], /must be a JSON object/],
      [{ ...FOUR_BARS, version: 7 }, /^version: is 7/],
      [{ ...FOUR_BARS, units: 'metric' }, /^units: /],
      [{ ...FOUR_BARS, method: { kind: 'constant', rateMmH: -1 } }, /^method.rateMmH: Loss rate φ/],
      [{ ...FOUR_BARS, methodMemory: { magic: {} } }, /^methodMemory.magic: /],
      [{ ...FOUR_BARS, catchment: { name: 'x', areaM2: -5 } }, /^catchment.areaM2: /],
      [
        { ...FOUR_BARS, observed: { as: 'depth', value: 1, parameter: 'rateMmH', locked: 'yes' } },
        /^observed.locked: /,
      ],
      [{ ...FOUR_BARS, storm: { durationsH: [1], depthsMm: ['3'] } }, /^storm.depthsMm\[0\] \(bar 1\)/],
    ];
    for (const [value, message] of cases) {
      const r = readScenario(value);
      expect(r.ok).toBe(false);
      expect(!r.ok && r.message).toMatch(message);
    }
  });
});

describe('saving as the scenario changes', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('saves once after a burst of edits settles', () => {
    const storage = memoryStorage();
    const writes = vi.spyOn(storage, 'setItem');
    const store = createWorkbenchStore(FOUR_BARS);
    persistStore(store, storage, 400);
    const a = store.getState().actions;
    a.beginGesture('Drag');
    for (let v = 7; v > 2; v -= 0.5) {
      a.setParam('rateMmH', v);
      vi.advanceTimersByTime(50);
    }
    a.endGesture();
    expect(writes).not.toHaveBeenCalled();
    vi.advanceTimersByTime(400);
    expect(writes).toHaveBeenCalledTimes(1);
    expect(JSON.parse(storage.data.get(STORAGE_KEY) ?? 'null')).toEqual(store.getState().scenario);
  });

  it('flush writes a pending change at once', () => {
    const storage = memoryStorage();
    const store = createWorkbenchStore(FOUR_BARS);
    const p = persistStore(store, storage, 400);
    store.getState().actions.setName('Before reload');
    p.flush();
    expect(JSON.parse(storage.data.get(STORAGE_KEY) ?? 'null').name).toBe('Before reload');
  });

  it('a failed save is reported on screen and cleared by the next good one', () => {
    const storage = memoryStorage();
    const store = createWorkbenchStore(FOUR_BARS);
    persistStore(store, storage, 10);
    storage.failNextWrites(new Error('QuotaExceededError'));
    store.getState().actions.setName('Big');
    vi.advanceTimersByTime(10);
    expect(store.getState().notice?.kind).toBe('save-failed');
    expect(store.getState().notice?.message).toContain('QuotaExceededError');
    storage.failNextWrites(null);
    store.getState().actions.setName('Smaller');
    vi.advanceTimersByTime(10);
    expect(store.getState().notice).toBeNull();
  });

  it('stop ends saving', () => {
    const storage = memoryStorage();
    const store = createWorkbenchStore(FOUR_BARS);
    persistStore(store, storage, 10).stop();
    store.getState().actions.setName('Never saved');
    vi.advanceTimersByTime(100);
    expect(storage.data.size).toBe(0);
  });
});
