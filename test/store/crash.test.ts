import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DEMO_SCENARIO, encodeScenarioLink } from '../../src/scenario';
import { SET_ASIDE_PREFIX, STORAGE_KEY, loadScenario, setAsideSaved } from '../../src/store';
import { SKIP_SAVED_KEY, createCrashRecovery } from '../../src/store/crash';
import { listSetAside } from '../../src/store/set-aside';
import { startWorkbench } from '../../src/store/start';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

const NOW = new Date('2026-03-01T10:00:00.000Z');

/** A storage whose writes always fail as a full browser storage does. */
function fullStorage(initial: Record<string, string>) {
  const storage = memoryStorage(initial);
  storage.failNextWrites(new DOMException('The quota has been exceeded.', 'QuotaExceededError'));
  return storage;
}

function started(storage: ReturnType<typeof memoryStorage>, fragment = '') {
  const calls = { clearFragment: 0 };
  const { store, link } = startWorkbench({
    storage,
    fragment,
    fallback: DEMO_SCENARIO,
    nowIso: NOW.toISOString(),
    clearFragment: () => {
      calls.clearFragment++;
    },
    persistDelayMs: 400,
  });
  const tab = memoryStorage();
  const recovery = createCrashRecovery({ store, link, storage, now: () => NOW, tabStorage: tab });
  return { store, link, recovery, calls, tab };
}

describe('after the screen breaks, what is saved is told truthfully', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('the change that broke the screen is not written after the fact, and the saved one is the one before', () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = memoryStorage({ [STORAGE_KEY]: saved });
    const { store, recovery } = started(storage);
    // The edit that (say) broke the screen: the autosave would write it 400 ms later.
    store.getState().actions.setName('Broken');
    const report = recovery.report();
    vi.advanceTimersByTime(1000);
    expect(storage.data.get(STORAGE_KEY)).toBe(saved);
    expect(report.state).toBe('older');
    expect(report.text).toMatch(/^The change that stopped the screen was not saved/);
  });

  it('a scenario opened from storage that breaks the screen is said to be the saved one', () => {
    const storage = memoryStorage({ [STORAGE_KEY]: JSON.stringify(FOUR_BARS) });
    const { recovery } = started(storage);
    expect(recovery.report().state).toBe('saved');
  });

  it('a shared link that breaks the screen is taken out of the address and the user’s own scenario is untouched', () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = memoryStorage({ [STORAGE_KEY]: saved });
    const { recovery, calls, link } = started(
      storage,
      `#${encodeScenarioLink({ ...DEMO_SCENARIO, name: 'From a link' })}`,
    );
    expect(link.getState().kind).toBe('shared');
    const report = recovery.report();
    expect(report.state).toBe('shared');
    expect(report.text).toContain('Your own saved scenario has not been changed');
    // Reloading now opens the user's own scenario, not the link again: no loop.
    expect(calls.clearFragment).toBe(1);
    vi.advanceTimersByTime(1000);
    expect(storage.data.get(STORAGE_KEY)).toBe(saved);
    expect(listSetAside(storage).copies).toEqual([]);
  });

  it('nothing saved is said as such', () => {
    expect(started(memoryStorage()).recovery.report().state).toBe('nothing');
  });
});

describe('setting the saved scenario aside', () => {
  it('moves it to a key of its own, listed among the set-aside copies', () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = memoryStorage({ [STORAGE_KEY]: saved });
    expect(started(storage).recovery.setAside()).toEqual({
      ok: true,
      text: 'The saved scenario is set aside; find it under Saved scenarios, “Set-aside copies”.',
    });
    expect(storage.data.has(STORAGE_KEY)).toBe(false);
    expect(storage.data.get(`${SET_ASIDE_PREFIX}${NOW.toISOString()}`)).toBe(saved);
    expect(listSetAside(storage).copies).toEqual([
      {
        key: `${SET_ASIDE_PREFIX}${NOW.toISOString()}`,
        kind: 'scenario',
        setAsideAt: NOW.toISOString(),
        chars: saved.length,
      },
    ]);
  });

  it('never writes over an earlier copy set aside at the same moment', () => {
    const storage = memoryStorage({ [STORAGE_KEY]: 'second', [`${SET_ASIDE_PREFIX}${NOW.toISOString()}`]: 'first' });
    expect(setAsideSaved(storage, NOW.toISOString())).toEqual({
      ok: true,
      key: `${SET_ASIDE_PREFIX}${NOW.toISOString()}-2`,
    });
    expect(storage.data.get(`${SET_ASIDE_PREFIX}${NOW.toISOString()}`)).toBe('first');
  });

  it('with storage full, does not throw, leaves the saved scenario where it was, and says what to do', () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = fullStorage({ [STORAGE_KEY]: saved });
    const { recovery, tab } = started(storage);
    let result: ReturnType<typeof recovery.setAside> | undefined;
    expect(() => {
      result = recovery.setAside();
    }).not.toThrow();
    expect(result).toEqual({
      ok: false,
      text:
        'The saved scenario could not be set aside (QuotaExceededError: The quota has been exceeded.); it is still saved, unchanged. ' +
        'Download it to keep a copy, then start without it: this tab will leave it unopened and write nothing over it.',
    });
    expect(storage.data.get(STORAGE_KEY)).toBe(saved);
    expect(recovery.savedText()).toBe(saved);
    // Starting without it: this tab remembers, and the next start leaves it unopened and unwritten.
    expect(recovery.skipSavedNextTime()).toBe(true);
    expect(tab.data.get(SKIP_SAVED_KEY)).toBe('1');
    const next = loadScenario(storage, DEMO_SCENARIO, NOW.toISOString(), { skipSaved: true });
    expect(next.scenario).toBe(DEMO_SCENARIO);
    expect(next.canSave).toBe(false);
    expect(next.notice?.message).toMatch(/left unopened/);
  });

  it('at start-up, damaged saved data with storage full is left in place and saving is off, without throwing', () => {
    const storage = fullStorage({ [STORAGE_KEY]: '{"version":' });
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW.toISOString());
    expect(loaded.canSave).toBe(false);
    expect(loaded.notice?.message).toMatch(
      /could not be set aside \(QuotaExceededError: The quota has been exceeded\.\)/,
    );
    expect(storage.data.get(STORAGE_KEY)).toBe('{"version":');
  });
});

describe('a saved scenario past what this version reads', () => {
  it('is refused naming the field, set aside as it was, and listed; the user’s work is not lost', () => {
    // Written before the limits of time: one bar of 3·10⁹ h.
    const old = JSON.stringify({ ...FOUR_BARS, storm: { durationsH: [3e9], depthsMm: [5] } });
    const storage = memoryStorage({ [STORAGE_KEY]: old });
    const loaded = loadScenario(storage, DEMO_SCENARIO, NOW.toISOString());
    expect(loaded.scenario).toBe(DEMO_SCENARIO);
    expect(loaded.notice?.kind).toBe('set-aside');
    expect(loaded.notice?.message).toContain('storm.durationsH[0] (bar 1): must be a number of hours from 1 second');
    expect(loaded.notice?.message).toContain('Set-aside copies');
    const [copy] = listSetAside(storage).copies;
    expect(copy?.kind).toBe('scenario');
    expect(storage.data.get(copy?.key ?? '')).toBe(old);
  });
});
