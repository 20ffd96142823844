import { describe, expect, it } from 'vitest';
import { pinTotals } from '../../src/store/pin-totals';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

describe("the pins' derived values", () => {
  it('are worked out once per pinned document, and pins do not evict each other', () => {
    const first = { ...FOUR_BARS };
    const wetter = { ...FOUR_BARS, method: { kind: 'constant' as const, rateMmH: 4 } };
    const a = pinTotals(first);
    const b = pinTotals(wetter);
    // Read in turn, as the comparison reads its pins at every render: each keeps its own.
    expect(pinTotals(first)).toBe(a);
    expect(pinTotals(wetter)).toBe(b);
    // Four bars of 2, 6, 10, 2 mm over 0.5 h each at 8 mm/h (4 mm a bar): excess 0 + 2 + 6 + 0 = 8 mm,
    // loss 2 + 4 + 4 + 2 mm; at 4 mm/h (2 mm a bar): excess 0 + 4 + 8 + 0 = 12 mm.
    expect(a.excessMm).toBe(8);
    expect(Array.from(a.barLossMm ?? [])).toEqual([2, 4, 4, 2]);
    expect(a.method).toEqual(FOUR_BARS.method);
    expect(b.excessMm).toBe(12);
    // No unit hydrograph in these documents.
    expect(a.hydrograph).toBeNull();
    // Another document (a pin taken again) is worked out afresh.
    expect(pinTotals({ ...first })).not.toBe(a);
  });
});
