import { describe, expect, it } from 'vitest';
import { recoverScenarios } from '../../src/store/set-aside';
import { FOUR_BARS, SAMPLE_LARGE_REF } from '../helpers/scenario-fixtures';

// What a set-aside saved list gives back (issue 14): the scenarios its entries
// hold, the large-store pointers some entries hold instead, and, by where they
// stood, the entries that are neither.

const AT = '2026-02-20T08:30:00.000Z';

describe('recoverScenarios on a set-aside saved list', () => {
  it('gives scenarios, pointers and what is wrong with the rest, each by where it stood', () => {
    const text = JSON.stringify({
      entries: [
        { id: 'a', savedAt: AT, scenario: FOUR_BARS },
        { id: 'b', savedAt: AT, large: SAMPLE_LARGE_REF },
        { id: 'c', savedAt: AT, large: { ...SAMPLE_LARGE_REF, method: 'no-such-method' } },
        { id: 'd', savedAt: 'yesterday', large: SAMPLE_LARGE_REF },
      ],
    });
    const { scenarios, pointers, problems } = recoverScenarios(text);
    expect(scenarios.map((s) => s.name)).toEqual([FOUR_BARS.name]);
    expect(pointers).toStrictEqual([{ id: 'b', savedAt: AT, large: SAMPLE_LARGE_REF }]);
    expect(problems.map((p) => p.path)).toEqual(['entries[2]', 'entries[3]']);
    expect(problems[0]?.message).toMatch(/^entries\[2\]: its loss method is not one this version knows/);
    expect(problems[1]?.message).toBe('entries[3]: its pointer has no proper id or time saved.');
  });

  it('a list of pointers alone is not "no scenario"', () => {
    const { scenarios, pointers, problems } = recoverScenarios(
      JSON.stringify({
        entries: [],
        deleted: [{ id: 'b', savedAt: AT, large: SAMPLE_LARGE_REF, deletedAt: AT, position: 0 }],
      }),
    );
    expect(scenarios).toEqual([]);
    expect(pointers.map((p) => p.large.name)).toEqual(['Pointed at']);
    expect(problems).toEqual([]);
  });
});
