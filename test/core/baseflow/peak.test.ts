import { describe, expect, it } from 'vitest';
import { findPeakIndex, findStartOfRise } from '../../../src/core/baseflow/peak';

describe('findPeakIndex', () => {
  it('finds the highest discharge', () => {
    expect(findPeakIndex([1, 3, 9, 4, 2])).toBe(2);
  });

  it('takes the first sample of a repeated peak', () => {
    expect(findPeakIndex([1, 5, 5, 2])).toBe(1);
  });
});

describe('findStartOfRise', () => {
  it('is the lowest discharge before the peak', () => {
    const q = [6, 5, 4, 7, 12, 8];
    expect(findStartOfRise(q, findPeakIndex(q))).toBe(2);
  });

  it('is the last sample of a flat pre-event baseflow', () => {
    const q = [3, 3, 3, 8, 5];
    expect(findStartOfRise(q, findPeakIndex(q))).toBe(2);
  });

  it('is not fooled by a small wiggle on the rising limb', () => {
    // The last local minimum before the peak is the 5.9 at sample 5; the
    // rise starts at the 4.5 at sample 3.
    const q = [5, 4.8, 4.6, 4.5, 6, 5.9, 9, 14, 10];
    expect(findStartOfRise(q, findPeakIndex(q))).toBe(3);
  });

  it('is the first sample when the record starts at its peak', () => {
    const q = [9, 7, 4, 2];
    expect(findStartOfRise(q, findPeakIndex(q))).toBe(0);
  });

  it('ignores lower flows after the peak', () => {
    const q = [4, 3, 10, 1];
    expect(findStartOfRise(q, findPeakIndex(q))).toBe(1);
  });
});
