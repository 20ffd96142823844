import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { positivePartStep, recordVolumeM3, volumeAboveLineM3 } from '../../../src/core/baseflow/volume';
import { expectClose } from '../../helpers/tolerance';

/** Midpoint rule with many slices: an independent check of the exact formula. */
function bruteForcePositivePart(d0: number, d1: number, dt: number, slices = 20000): number {
  let sum = 0;
  for (let i = 0; i < slices; i++) {
    const d = d0 + ((d1 - d0) * (i + 0.5)) / slices;
    if (d > 0) sum += d;
  }
  return (sum * dt) / slices;
}

describe('positivePartStep', () => {
  it('is the trapezoid when the flow stays above the line', () => {
    expect(positivePartStep(2, 4, 0.5)).toBe(1.5);
  });

  it('is zero when the flow stays at or below the line', () => {
    expect(positivePartStep(-1, 0, 3)).toBe(0);
    expect(positivePartStep(0, 0, 3)).toBe(0);
  });

  it('counts only the triangle above the line when the flow crosses it', () => {
    // d goes from 2 to −1 over 1 h: zero at 2/3 h, triangle 2 × 2/3 / 2 = 2/3.
    expectClose(positivePartStep(2, -1, 1), 2 / 3);
    // d goes from −1 to 4 over 1 h: zero at 1/5 h, triangle 4 × 4/5 / 2 = 1.6.
    expectClose(positivePartStep(-1, 4, 1), 1.6);
  });

  it('agrees with a fine midpoint sum for any crossing', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        (d0, d1, dt) => {
          const exact = positivePartStep(d0, d1, dt);
          const approx = bruteForcePositivePart(d0, d1, dt);
          expect(Math.abs(exact - approx)).toBeLessThanOrEqual(1e-6 * Math.max(1, (Math.abs(d0) + Math.abs(d1)) * dt));
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('recordVolumeM3', () => {
  it('is the trapezoidal rule in m³ for hours and m³/s', () => {
    // (1 + 3)/2 × 1 h + (3 + 1)/2 × 2 h = 6 m³/s·h = 21,600 m³.
    expect(recordVolumeM3([0, 1, 3], [1, 3, 1])).toBe(21600);
  });
});

describe('volumeAboveLineM3', () => {
  it('integrates from the window start to an end inside a step', () => {
    // Flow 0, 4, 4 over a zero line; window from sample 1 to 1.5 h:
    // (4 + 4)/2 × 0.5 h = 2 m³/s·h.
    const v = volumeAboveLineM3([0, 1, 2], [0, 4, 4], [0, 0, 0], 1, 1.5, 0);
    expectClose(v, 2 * 3600);
  });

  it('uses the line value given for the end point, not a sample value', () => {
    // Flow 6 throughout, line 2 at samples and 6 at the end time 1 h:
    // d falls from 4 to 0 over 1 h, a triangle of 2 m³/s·h.
    const v = volumeAboveLineM3([0, 2], [6, 6], [2, 2], 0, 1, 6);
    expectClose(v, 2 * 3600);
  });
});
