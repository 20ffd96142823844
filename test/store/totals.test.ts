import { describe, expect, it } from 'vitest';
import { createDerived } from '../../src/store';
import { totalsOf } from '../../src/store/totals';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

describe('a scenario’s totals', () => {
  it('are worked out once per document and set of selectors, afresh for a changed one', () => {
    const derived = createDerived();
    const first = totalsOf(FOUR_BARS, derived);
    expect(totalsOf(FOUR_BARS, derived)).toBe(first);
    // Four bars of 2, 6, 10, 2 mm at a loss of 8 mm/h over 0.5 h (4 mm a bar): excess 0 + 2 + 6 + 0 = 8 mm.
    expect(first.excessMm).toBe(8);
    const wetter = { ...FOUR_BARS, method: { kind: 'constant' as const, rateMmH: 4 } };
    // At 4 mm/h (2 mm a bar): 0 + 4 + 8 + 0 = 12 mm.
    expect(totalsOf(wetter, derived).excessMm).toBe(12);
    expect(totalsOf(FOUR_BARS, createDerived())).not.toBe(first);
  });
});
