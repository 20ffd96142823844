import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { InputError, alternatingPositions } from '../../../src/core';
import { thrown } from '../../helpers/thrown';

describe('alternating block positions', () => {
  test('an odd number of bars puts the peak in the middle bar, then right, then left', () => {
    expect(Array.from(alternatingPositions(5))).toEqual([2, 3, 1, 4, 0]);
  });

  test('twelve bars centred: the two largest straddle the middle, the peak in bar 6', () => {
    expect(Array.from(alternatingPositions(12, 0.5))).toEqual([5, 6, 4, 7, 3, 8, 2, 9, 1, 10, 0, 11]);
  });

  test('peak at 0: the blocks fall away from the first bar', () => {
    expect(Array.from(alternatingPositions(6, 0))).toEqual([0, 1, 2, 3, 4, 5]);
  });

  test('peak at 1: the blocks rise to the last bar', () => {
    expect(Array.from(alternatingPositions(6, 1))).toEqual([5, 4, 3, 2, 1, 0]);
  });

  test('peak at a quarter of 8 bars: ties go to the earlier bar, then the short side fills and the rest run right', () => {
    // Bar middles at 1.5/8 and 2.5/8 are equally near 0.25: bar index 1 wins.
    expect(Array.from(alternatingPositions(8, 0.25))).toEqual([1, 2, 0, 3, 4, 5, 6, 7]);
  });

  test('peak at 0.3 of 10 bars is not moved by rounding in 0.3 × 10', () => {
    // 0.3 × 10 = 3.0000000000000004; the tie between bars 2 and 3 still goes to bar 2.
    expect(alternatingPositions(10, 0.3)[0]).toBe(2);
  });

  test('a single bar holds the peak', () => {
    expect(Array.from(alternatingPositions(1, 0.7))).toEqual([0]);
  });

  test('for any bar count and peak, the blocks placed so far are always one unbroken run', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 80 }), fc.double({ min: 0, max: 1, noNaN: true }), (n, f) => {
        const positions = alternatingPositions(n, f);
        const seen = new Set<number>();
        let lo = Infinity;
        let hi = -Infinity;
        for (let r = 0; r < n; r++) {
          const p = positions[r] as number;
          expect(p).toBeGreaterThanOrEqual(0);
          expect(p).toBeLessThan(n);
          seen.add(p);
          lo = Math.min(lo, p);
          hi = Math.max(hi, p);
          expect(hi - lo).toBe(r); // r + 1 distinct bars spanning r + 1 places
        }
        expect(seen.size).toBe(n);
        // The peak bar's middle is within half a bar of the chosen fraction,
        // unless clamped to the first or last bar.
        const middle = ((positions[0] as number) + 0.5) / n;
        expect(Math.abs(middle - f)).toBeLessThanOrEqual(0.5 / n + 1e-9);
      }),
    );
  });

  test.each([-0.1, 1.01, Number.NaN, Infinity])('peak position %s is refused on peakFraction', (f) => {
    const error = thrown(() => alternatingPositions(4, f));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('peakFraction');
  });
});
