// A method's optional total-only path (used by calibration) must give the
// same total as its per-bar compute, for every method in the table.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLosses, totalExcessMm } from '../../../src/core';
import { methodArb, stormArb } from '../../helpers/arbitraries';

describe('totalExcessMm', () => {
  it('equals the per-bar excess summed, to 1e-12 of the rainfall', () => {
    fc.assert(
      fc.property(
        stormArb().chain((storm) => methodArb(storm).map((method) => ({ storm, method }))),
        ({ storm, method }) => {
          const full = computeLosses(storm, method);
          const fast = totalExcessMm(storm, method);
          expect(Math.abs(fast - full.totalExcessMm)).toBeLessThanOrEqual(1e-12 * Math.max(full.rainMm, 1e-9));
        },
      ),
      { numRuns: 400 },
    );
  });
});
