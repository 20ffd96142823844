import { describe, expect, it } from 'vitest';
import {
  DEMO_SCENARIO,
  MAX_NAME_LENGTH,
  MAX_NOTES_LENGTH,
  createScenarioLibrary,
  parseScenario,
  type Scenario,
  type StorageLike,
} from '../../src/scenario';
import { FOUR_EVENTS } from '../helpers/event-fixtures';
import { scenarioOf } from '../helpers/scenario-fixtures';

// Names and notes are capped in the schema (src/scenario/text-limits.ts), as
// the saved list's rename field already was: 200 characters for a name,
// 10,000 for the notes. Before, any length was read and kept.

const messages = (input: unknown): string[] => {
  const result = parseScenario(input);
  return result.ok ? [] : result.problems.map((p) => p.message);
};

describe('names and notes are capped in the schema', () => {
  it('takes a name of exactly 200 characters and notes of exactly 10,000', () => {
    const doc: Scenario = { ...DEMO_SCENARIO, name: 'n'.repeat(200), notes: 'x'.repeat(10_000) };
    expect(parseScenario(doc)).toEqual({ ok: true, scenario: doc });
    expect([MAX_NAME_LENGTH, MAX_NOTES_LENGTH]).toEqual([200, 10_000]);
  });

  it('refuses a scenario name, catchment name and notes one character over, naming each field', () => {
    const doc = {
      ...DEMO_SCENARIO,
      name: 'n'.repeat(201),
      notes: 'x'.repeat(10_001),
      catchment: { ...DEMO_SCENARIO.catchment, name: 'c'.repeat(201) },
    };
    expect(messages(doc)).toEqual([
      'name: has 201 characters; it may have at most 200.',
      'notes: has 10,001 characters; it may have at most 10,000.',
      'catchment.name: has 201 characters; it may have at most 200.',
    ]);
  });

  it('refuses an event name over 200 characters, naming the event', () => {
    const events = FOUR_EVENTS.eventSet.events.map((e, k) => (k === 2 ? { ...e, name: 'e'.repeat(250) } : e));
    expect(messages({ ...FOUR_EVENTS, eventSet: { ...FOUR_EVENTS.eventSet, events } })).toEqual([
      'eventSet.events[2].name (event 3): has 250 characters; it may have at most 200.',
    ]);
  });
});

describe('the saved list keeps names within the cap', () => {
  it('a copy of a 200-character name is shortened to make room for " (copy)"', () => {
    const items = new Map<string, string>();
    const storage: StorageLike = {
      getItem: (k) => items.get(k) ?? null,
      setItem: (k, v) => void items.set(k, v),
      removeItem: (k) => void items.delete(k),
    };
    const library = createScenarioLibrary(storage);
    const saved = library.save({ ...DEMO_SCENARIO, name: 'n'.repeat(200) });
    if (!saved.ok) throw new Error('not saved');
    const copy = library.duplicate(saved.value.id);
    if (!copy.ok) throw new Error(copy.problems.map((p) => p.message).join(' '));
    // 200 − 7 = 193 characters of the name, then " (copy)".
    expect(scenarioOf(copy.value).name).toBe(`${'n'.repeat(193)} (copy)`);
    expect(library.list().problems).toEqual([]);
  });
});
