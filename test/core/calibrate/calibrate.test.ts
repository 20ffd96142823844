// Calibration of the other parameters: exact runoff coefficient, and Brent's
// method for initial loss and continuing rate (1e-9 relative).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { brentRoot, calibrate, computeLosses, totalDepthMm } from '../../../src/core';
import { stormArb } from '../../helpers/arbitraries';
import { expectClose } from '../../helpers/tolerance';

const storm = { durationsH: [0.5, 0.5, 1, 0.25], depthsMm: [2, 10, 6, 5] };

describe('runoff coefficient', () => {
  it('is exact: C = observed / rainfall', () => {
    const r = calibrate(storm, { kind: 'proportional', coefficient: 0.5 }, 'coefficient', 5.75);
    expect(r).toMatchObject({ ok: true, value: 0.25 });
  });
});

describe('initial loss and continuing rate', () => {
  it('fits the continuing rate to a hand-worked case', () => {
    // IL = 5: after it, bar 2 has 0.35 h at 20 mm/h (7 mm), bars 3, 4 as they are.
    // For CL ≤ 6 mm/h all three run: 7 + 6 + 5 − CL·(0.35 + 1 + 0.25) = 14 → CL = 2.5.
    const r = calibrate(storm, { kind: 'initial-continuing', initialMm: 5, rateMmH: 0 }, 'rateMmH', 14);
    expect(r.ok).toBe(true);
    if (r.ok) expectClose(r.value, 2.5, 1e-9);
  });

  it('fits the initial loss to a hand-worked case', () => {
    // CL = 2: IL = 5 gives 14.8 mm (6.3 + 4 + 4.5); with IL = x between 2 and 12,
    // bar 2 gives (20 − 2)(0.5 − (x − 2)/20) → excess falls 0.9 mm per mm of IL.
    // 14.8 − 0.9·(x − 5) = 13.9 → x = 6.
    const r = calibrate(storm, { kind: 'initial-continuing', initialMm: 0, rateMmH: 2 }, 'initialMm', 13.9);
    expect(r.ok).toBe(true);
    if (r.ok) expectClose(r.value, 6, 1e-9);
  });

  it('round-trips to 1e-9 relative on random storms, for both parameters', () => {
    fc.assert(
      fc.property(
        stormArb(50),
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.constantFrom('initialMm', 'rateMmH'),
        (s, il, cl, share, parameter) => {
          const method = { kind: 'initial-continuing' as const, initialMm: il, rateMmH: cl };
          // A target the other parameter can reach: runoff at a random value of this one.
          const probe = { ...method, [parameter]: parameter === 'initialMm' ? share * totalDepthMm(s) : share * 20 };
          const target = computeLosses(s, probe).totalExcessMm;
          const r = calibrate(s, method, parameter, target);
          expect(r.ok).toBe(true);
          if (!r.ok) return;
          const back = computeLosses(s, r.method).totalExcessMm;
          expect(Math.abs(back - target)).toBeLessThanOrEqual(1e-9 * Math.max(target, 1e-6) + 1e-12);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('says which bound is reached and what runoff it gives when the target is out of reach', () => {
    // With CL = 30 mm/h only bar 4 (20 mm/h) … no bar exceeds 30, so no IL gives runoff.
    const r = calibrate(storm, { kind: 'initial-continuing', initialMm: 3, rateMmH: 30 }, 'initialMm', 8);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'min', boundValue: 0, boundExcessMm: 0 });
    if (!r.ok) expect(r.message).toMatch(/the lowest value \(0 mm\) gives 0 mm/);
  });
});

describe('calibrate input checks', () => {
  it('names an unknown parameter and the ones that exist', () => {
    const r = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'initialMm', 3);
    expect(r).toMatchObject({ ok: false, reason: 'unknown-parameter' });
    if (!r.ok) expect(r.message).toMatch(/rateMmH/);
  });

  it('reports a bad storm as a message instead of throwing', () => {
    const r = calibrate({ durationsH: [1, 0], depthsMm: [1, 1] }, { kind: 'constant', rateMmH: 1 }, 'rateMmH', 1);
    expect(r).toMatchObject({ ok: false, reason: 'invalid-input' });
    if (!r.ok) expect(r.message).toMatch(/^Bar 2/);
  });
});

describe("Brent's method", () => {
  it('finds the cube root of 2 to the tolerance asked', () => {
    const f = (x: number): number => x * x * x - 2;
    const x = brentRoot(f, 0, 2, f(0), f(2), { xTol: 1e-14 });
    expectClose(x, Math.cbrt(2), 1e-13);
  });
});
