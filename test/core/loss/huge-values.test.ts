// Depths and rates near the largest double (1.797e308) that the core accepts
// (validateStorm: any finite depth ≥ 0; validateMethod: any finite rate ≥ 0).
// A branch-free max(0, x) written as (x + |x|)/2 overflows there: x + |x| is
// 2x, Infinity once x passes 8.99e307; and a rate times a duration past the
// largest double makes x = −Infinity, and −Infinity + Infinity is NaN. Every
// expected value below is worked by hand. (The curve number's product
// N = x_a·x_b + S(x_a + x_b) overflows the same way: N/(N + S²) was NaN.)
import { describe, expect, it } from 'vitest';
import { computeLosses, totalExcessMm, type LossMethod, type Storm } from '../../../src/core';

const results = (storm: Storm, method: LossMethod) => {
  const r = computeLosses(storm, method);
  return {
    loss: Array.from(r.lossMm),
    excess: Array.from(r.excessMm),
    totals: [r.rainMm, r.totalLossMm, r.totalExcessMm, r.peakExcessMmH],
  };
};

describe('losses on depths and rates near the largest double', () => {
  // One bar of 1e308 mm over 1 h, φ = 4 mm/h. φΔt = 4 mm. Excess P − φΔt =
  // 1e308 − 4, which rounds to 1e308 (a unit in the last place of 1e308 is
  // 2^971 ≈ 2.0e292, far above 4); loss P − excess = 1e308 − 1e308 = 0.
  // Totals: rain 1e308, loss 0, excess 1e308; peak 1e308 mm / 1 h = 1e308 mm/h.
  const bar: Storm = { durationsH: [1], depthsMm: [1e308] };
  it('a single bar of 1e308 mm keeps its excess finite under the constant rate', () => {
    expect(results(bar, { kind: 'constant', rateMmH: 4 })).toEqual({
      loss: [0],
      excess: [1e308],
      totals: [1e308, 0, 1e308, 1e308],
    });
    expect(totalExcessMm(bar, { kind: 'constant', rateMmH: 4 })).toBe(1e308);
  });

  it('a single bar of 1e308 mm keeps its excess finite under initial then continuing loss', () => {
    // IL = 0 mm and CL = 4 mm/h: the constant rate's figures above.
    expect(results(bar, { kind: 'initial-continuing', initialMm: 0, rateMmH: 4 })).toEqual({
      loss: [0],
      excess: [1e308],
      totals: [1e308, 0, 1e308, 1e308],
    });
  });

  // A rate of 1e308 mm/h over a 2 h bar: φΔt = 2e308, past the largest
  // double, so Infinity. The bar of 1 mm loses all of it: loss min(1, ∞) = 1,
  // excess 0; totals rain 1, loss 1, excess 0, peak 0.
  const wet: Storm = { durationsH: [2], depthsMm: [1] };
  it('a rate whose product with the duration passes the largest double loses the whole bar', () => {
    expect(results(wet, { kind: 'constant', rateMmH: 1e308 })).toEqual({
      loss: [1],
      excess: [0],
      totals: [1, 1, 0, 0],
    });
    expect(totalExcessMm(wet, { kind: 'constant', rateMmH: 1e308 })).toBe(0);
    // After an initial loss of 0.5 mm the continuing rate meets the bar's
    // other 0.5 mm at 1e308 mm/h: all of it is lost too.
    expect(results(wet, { kind: 'initial-continuing', initialMm: 0.5, rateMmH: 1e308 })).toEqual({
      loss: [1],
      excess: [0],
      totals: [1, 1, 0, 0],
    });
    // Initial loss used up by an earlier bar: the continuing rate alone on bar 2.
    const two: Storm = { durationsH: [1, 2], depthsMm: [3, 1] };
    // Bar 1: 3 mm against IL 3 mm: all lost, IL used up. Bar 2 as above.
    expect(results(two, { kind: 'initial-continuing', initialMm: 3, rateMmH: 1e308 })).toEqual({
      loss: [3, 1],
      excess: [0, 0],
      totals: [4, 4, 0, 0],
    });
  });
  it('a single bar of 1e308 mm keeps its excess finite under the curve number', () => {
    // CN 50, I_a = 0.2 S: S = 25400/50 − 254 = 254 mm, I_a = 50.8 mm (TR-55
    // eq. 2-4 in mm). Rain beyond I_a x = 1e308 − 50.8, which rounds to 1e308.
    // Q = x²/(x + S) = x − S + S²/(x + S), within 254 mm of 1e308, so 1e308
    // once rounded; loss P − Q = 0. The product form's N = S·x = 2.54e310
    // passes the largest double, and N/(N + S²) was ∞/∞ = NaN.
    expect(results(bar, { kind: 'curve-number', cn: 50, iaRatio: 0.2 })).toEqual({
      loss: [0],
      excess: [1e308],
      totals: [1e308, 0, 1e308, 1e308],
    });
  });
});
