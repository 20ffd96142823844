// @vitest-environment jsdom
import { describe, expect, it } from 'vitest';
import { windowStorageEvents } from '../../src/store/other-tabs';
import { PINS_KEY, createPinBoard } from '../../src/store/pins';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

// Two tabs share one browser storage; the browser tells every other tab of a
// write with a "storage" event. Here the event is dispatched by hand, as the
// browser would in the tab that did not write.

const NOW = () => new Date('2026-03-01T10:00:00.000Z');
const announce = (key: string | null) => window.dispatchEvent(new StorageEvent('storage', { key }));

describe('pins in two tabs', () => {
  it('a pin made in another tab shows here as soon as that tab’s write is announced', () => {
    const storage = memoryStorage();
    const here = createPinBoard(storage, { now: NOW, watch: windowStorageEvents });
    const there = createPinBoard(storage, { now: NOW });
    const stop = here.watchOtherTabs();
    there.pin({ ...FOUR_BARS, name: 'pinned in the other tab' });
    expect(here.getState().pins).toEqual([]);
    announce(PINS_KEY);
    expect(here.getState().pins.map((p) => p.scenario.name)).toEqual(['pinned in the other tab']);
    // Unpinned there: gone here too.
    there.unpin(there.getState().pins[0]?.id ?? '');
    announce(PINS_KEY);
    expect(here.getState().pins).toEqual([]);
    stop();
  });

  it('a write to another key, or after the tab stopped listening, changes nothing here', () => {
    const storage = memoryStorage();
    const here = createPinBoard(storage, { now: NOW, watch: windowStorageEvents });
    const there = createPinBoard(storage, { now: NOW });
    const stop = here.watchOtherTabs();
    there.pin(FOUR_BARS);
    announce('raincut.library');
    expect(here.getState().pins).toEqual([]);
    stop();
    announce(PINS_KEY);
    expect(here.getState().pins).toEqual([]);
  });

  it('pinning here on a list the other tab changed unheard keeps the other tab’s pins', () => {
    const storage = memoryStorage();
    const here = createPinBoard(storage, { now: NOW, watch: windowStorageEvents });
    const there = createPinBoard(storage, { now: NOW });
    here.pin({ ...FOUR_BARS, name: 'here 1' });
    there.pin({ ...FOUR_BARS, name: 'there 1' });
    // No event heard: the next change still reads afresh and adds to it.
    here.pin({ ...FOUR_BARS, name: 'here 2' });
    const stored = JSON.parse(storage.data.get(PINS_KEY) ?? 'null') as { pins: { scenario: { name: string } }[] };
    expect(stored.pins.map((p) => p.scenario.name)).toEqual(['here 1', 'there 1', 'here 2']);
  });
});
