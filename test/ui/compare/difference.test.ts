import { describe, expect, it } from 'vitest';
import { difference } from '../../../src/ui/compare';

describe('difference from the first pin', () => {
  it('a larger value reads as an up arrow, a plus sign, the amount with its unit and the share', () => {
    expect(difference(20, 25, 'mm')).toEqual({ direction: 'up', text: '▲ +5 mm (+25 %)' });
  });

  it('a smaller value reads as a down arrow and a minus sign', () => {
    expect(difference(8, 6, 'mm/h')).toEqual({ direction: 'down', text: '▼ −2 mm/h (−25 %)' });
  });

  it('percentage points carry no share of a share', () => {
    expect(difference(52.5, 40, 'percentage points', { percentPoints: true })).toEqual({
      direction: 'down',
      text: '▼ −12.5 percentage points',
    });
  });

  it('equal values, and values equal but for rounding in unit conversion, read as the same', () => {
    expect(difference(41.6, 41.6, 'mm').direction).toBe('same');
    expect(difference(0.1 + 0.2, 0.3, 'in')).toEqual({ direction: 'same', text: '= same as 1' });
    expect(difference(0, 0, 'mm').direction).toBe('same');
  });

  it('from zero there is no share to give', () => {
    expect(difference(0, 3, 'mm')).toEqual({ direction: 'up', text: '▲ +3 mm' });
  });

  it('a missing value has nothing to show', () => {
    expect(difference(null, 3, 'm³').direction).toBe('none');
    expect(difference(3, null, 'm³').direction).toBe('none');
  });
});
