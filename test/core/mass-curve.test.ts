import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLosses, massCurve } from '../../src/core';
import { methodArb, stormArb } from '../helpers/arbitraries';
import { expectAllClose, expectClose } from '../helpers/tolerance';

describe('the mass curve', () => {
  it('sums rainfall, loss and excess to each bar’s end (worked by hand: initial loss 5 mm, then 2 mm/h)', () => {
    // Bars of 1 h with 4, 6, 0 and 3 mm. Initial loss 5 mm, continuing loss 2 mm/h:
    // bar 1: all 4 mm go to the initial loss (1 mm of it left); loss 4, excess 0.
    // bar 2: 6 mm/h; the last 1 mm of initial loss takes 1/6 h, then 2 mm/h for the other 5/6 h:
    //        loss 1 + 2 × 5/6 = 8/3 mm, excess 6 − 8/3 = 10/3 mm.
    // bar 3: dry, nothing. bar 4: 3 mm/h above 2 mm/h: loss 2, excess 1.
    // Running sums: rain 4, 10, 10, 13; loss 4, 4 + 8/3 = 20/3, 20/3, 20/3 + 2 = 26/3; excess 0, 10/3, 10/3, 13/3.
    const storm = { durationsH: [1, 1, 1, 1], depthsMm: [4, 6, 0, 3] };
    const result = computeLosses(storm, { kind: 'initial-continuing', initialMm: 5, rateMmH: 2 });
    const curve = massCurve(storm.depthsMm, result);
    expect([...curve.rainMm]).toEqual([4, 10, 10, 13]);
    expectAllClose(curve.lossMm, [4, 20 / 3, 20 / 3, 26 / 3]);
    expectAllClose(curve.excessMm, [0, 10 / 3, 10 / 3, 13 / 3]);
  });

  it('an empty storm has an empty curve', () => {
    const curve = massCurve([], { lossMm: new Float64Array(0), excessMm: new Float64Array(0) });
    expect(curve.rainMm).toHaveLength(0);
  });

  it('rises with every bar and keeps rain = loss + excess at every bar end, ending at the core’s totals', () => {
    let reached = 0;
    fc.assert(
      fc.property(
        stormArb().chain((storm) => fc.tuple(fc.constant(storm), methodArb(storm))),
        ([storm, method]) => {
          const result = computeLosses(storm, method);
          const curve = massCurve(storm.depthsMm, result);
          const n = storm.depthsMm.length;
          for (let k = 0; k < n; k++) {
            const rain = curve.rainMm[k] as number;
            // Each bar balances to rounding (the core's invariant), so the sums do to n roundings of the total.
            expectClose((curve.lossMm[k] as number) + (curve.excessMm[k] as number), rain, 1e-9, 1e-9);
            if (k > 0) expect(rain).toBeGreaterThanOrEqual(curve.rainMm[k - 1] as number);
          }
          if (n > 0) {
            expectClose(curve.rainMm[n - 1] as number, result.rainMm, 1e-9, 1e-9);
            expectClose(curve.excessMm[n - 1] as number, result.totalExcessMm, 1e-9, 1e-9);
            reached++;
          }
        },
      ),
      { numRuns: 60 },
    );
    expect(reached).toBeGreaterThan(0);
  });
});
