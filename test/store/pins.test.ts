import { describe, expect, it } from 'vitest';
import { PINS_KEY, createPinBoard, MAX_PINS } from '../../src/store/pins';
import { FOUR_BARS, memoryStorage } from '../helpers/scenario-fixtures';

const NOW = () => new Date('2026-03-01T10:00:00.000Z');

describe('the pin board', () => {
  it('a pin is a deep copy, checked by the schema', () => {
    const board = createPinBoard(memoryStorage(), { now: NOW });
    const result = board.pin(FOUR_BARS);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.pin.scenario).toEqual(FOUR_BARS);
    expect(result.pin.scenario).not.toBe(FOUR_BARS);
    expect(result.pin.scenario.storm.depthsMm).not.toBe(FOUR_BARS.storm.depthsMm);
  });

  it('refuses a scenario the schema refuses, saying why', () => {
    const board = createPinBoard(memoryStorage(), { now: NOW });
    const bad = { ...FOUR_BARS, storm: { ...FOUR_BARS.storm, durationsH: [0.5, 0, 0.5, 0.5] } };
    const result = board.pin(bad);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.message).toMatch(/^This scenario cannot be pinned: storm\.durationsH\[1\] \(bar 2\)/);
    expect(board.getState().pins).toEqual([]);
  });

  it('two tabs add to one list instead of writing over each other', () => {
    const storage = memoryStorage();
    const a = createPinBoard(storage, { now: NOW });
    const b = createPinBoard(storage, { now: NOW });
    a.pin({ ...FOUR_BARS, name: 'from tab A' });
    b.pin({ ...FOUR_BARS, name: 'from tab B' });
    a.reload();
    expect(a.getState().pins.map((p) => p.scenario.name)).toEqual(['from tab A', 'from tab B']);
    expect(new Set(a.getState().pins.map((p) => p.id)).size).toBe(2);
  });

  it(`holds at most ${MAX_PINS}`, () => {
    const board = createPinBoard(memoryStorage(), { now: NOW });
    for (let i = 0; i < MAX_PINS; i++) expect(board.pin(FOUR_BARS).ok).toBe(true);
    expect(board.pin(FOUR_BARS)).toEqual({
      ok: false,
      message: `${MAX_PINS} scenarios are pinned already; unpin one to pin another.`,
    });
  });

  it('a list that is not JSON is set aside as it was and a fresh one started', () => {
    const storage = memoryStorage({ [PINS_KEY]: '{"$format":"raincut-pins",' });
    const board = createPinBoard(storage, { now: NOW });
    expect(board.getState().problems[0]?.message).toMatch(
      /^The pinned scenarios could not be read \(it is not valid JSON/,
    );
    expect(storage.data.get(`${PINS_KEY}.damaged.2026-03-01T10:00:00.000Z`)).toBe('{"$format":"raincut-pins",');
    expect(board.pin(FOUR_BARS).ok).toBe(true);
  });

  it('when damaged pins cannot be set aside, nothing is written over them; once it can be, they are set aside first', () => {
    const storage = memoryStorage({ [PINS_KEY]: 'not json' });
    storage.failNextWrites(new Error('quota exceeded'));
    const board = createPinBoard(storage, { now: NOW });
    expect(board.getState().problems[0]?.message).toMatch(/could not be set aside \(quota exceeded\)/);
    // A pin is kept for the page, and the damaged text stays as it was.
    expect(board.pin(FOUR_BARS).ok).toBe(true);
    expect(board.getState().pins).toHaveLength(1);
    expect(storage.data.get(PINS_KEY)).toBe('not json');
    storage.failNextWrites(null);
    expect(board.pin(FOUR_BARS).ok).toBe(true);
    expect(storage.data.get(`${PINS_KEY}.damaged.2026-03-01T10:00:00.000Z`)).toBe('not json');
    expect(JSON.parse(storage.data.get(PINS_KEY) as string).pins).toHaveLength(2);
  });

  it('where the browser allows no storage, pins still work for the page', () => {
    const board = createPinBoard(null, { now: NOW });
    expect(board.pin(FOUR_BARS).ok).toBe(true);
    expect(board.getState().pins).toHaveLength(1);
  });
});
