import { describe, expect, it } from 'vitest';
import type { Storm } from '../../../src/core';
import { stormHours } from '../../../src/ui/chart/time-span';

describe('stormHours', () => {
  it('adds the bar durations once per storm object, and anew for an edited storm', () => {
    const durationsH = [0.5, 0.25, 1];
    const storm: Storm = { durationsH, depthsMm: [2, 0, 3.5] };
    // 0.5 + 0.25 + 1 = 1.75 h.
    expect(stormHours(storm)).toBe(1.75);
    // The store never mutates a storm; mutating one here shows the sum is kept for the object, not redone.
    durationsH[2] = 2;
    expect(stormHours(storm)).toBe(1.75);
    // An edit makes a new storm object: 0.5 + 0.25 + 2 = 2.75 h.
    expect(stormHours({ ...storm, durationsH: [...durationsH] })).toBe(2.75);
  });
});
