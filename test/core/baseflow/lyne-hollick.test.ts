import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { separateBaseflow } from '../../../src/core/baseflow';
import { separateLyneHollick } from '../../../src/core/baseflow/lyne-hollick';
import { hydrographs } from '../../helpers/hydrographs';
import { inputErrorOf } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const lyneHollick = (alpha: number, passes: number, stepH?: number) =>
  stepH === undefined
    ? ({ kind: 'lyne-hollick', alpha, passes } as const)
    : ({ kind: 'lyne-hollick', alpha, passes, stepH } as const);

describe('Lyne & Hollick filter', () => {
  it('returns a constant record as its own baseflow, for any α and number of passes', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 50 }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.integer({ min: 1, max: 9 }),
        (n, q, alpha, passes) => {
          const h = {
            timesH: Float64Array.from({ length: n }, (_, k) => k),
            dischargeM3s: new Float64Array(n).fill(q),
          };
          const result = separateBaseflow(h, lyneHollick(alpha, passes));
          expect(Array.from(result.baseflowM3s)).toEqual(Array.from(h.dischargeM3s));
          expect(result.directVolumeM3).toBe(0);
          expect(result.baseflowIndex).toBe(n > 1 && q > 0 ? 1 : 0);
        },
      ),
    );
  });

  it('follows the filter step by step on a short record (hand-worked, one pass)', () => {
    // α = 0.5, so (1 + α)/2 = 0.75. Q = 1, 3, 2, 1:
    // f = 0; 0.75·2 = 1.5; 0.75 − 0.75 = 0; 0 − 0.75 < 0 → 0.  b = Q − f = 1, 1.5, 2, 1.
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [1, 3, 2, 1] };
    expect(Array.from(separateBaseflow(h, lyneHollick(0.5, 1)).baseflowM3s)).toEqual([1, 1.5, 2, 1]);
  });

  it('alternates forward and backward passes, each filtering the last (hand-worked, three passes)', () => {
    // Pass 2, backward over 1, 1.5, 2, 1: f = 0; 0.75·1 = 0.75; 0.375 − 0.375 = 0;
    // −0.375 → 0. b = 1, 1.5, 1.25, 1.
    // Pass 3, forward over that: f = 0; 0.75·0.5 = 0.375; 0.1875 − 0.1875 = 0;
    // −0.1875 → 0. b = 1, 1.125, 1.25, 1.
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [1, 3, 2, 1] };
    expect(Array.from(separateBaseflow(h, lyneHollick(0.5, 2)).baseflowM3s)).toEqual([1, 1.5, 1.25, 1]);
    expect(Array.from(separateBaseflow(h, lyneHollick(0.5, 3)).baseflowM3s)).toEqual([1, 1.125, 1.25, 1]);
  });

  it('keeps 0 ≤ baseflow ≤ discharge on any record', () => {
    fc.assert(
      fc.property(
        hydrographs(),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.integer({ min: 1, max: 9 }),
        fc.option(fc.double({ min: 0.1, max: 48, noNaN: true }), { nil: undefined }),
        (h, alpha, passes, stepH) => {
          const result = separateBaseflow(h, lyneHollick(alpha, passes, stepH));
          for (let k = 0; k < h.timesH.length; k++) {
            const b = result.baseflowM3s[k] as number;
            expect(b).toBeGreaterThanOrEqual(0);
            expect(b).toBeLessThanOrEqual(h.dischargeM3s[k] as number);
          }
          expect(result.baseflowIndex).toBeGreaterThanOrEqual(0);
          expect(result.baseflowIndex).toBeLessThanOrEqual(1);
        },
      ),
    );
  });

  it('keeps every pass within 0 ≤ baseflow ≤ discharge by itself, before any later clipping', () => {
    fc.assert(
      fc.property(
        hydrographs(),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.integer({ min: 1, max: 9 }),
        (h, alpha, passes) => {
          const { lineM3s } = separateLyneHollick(h.timesH, h.dischargeM3s, lyneHollick(alpha, passes), {
            peakIndex: 0,
            areaM2: undefined,
          });
          for (let k = 0; k < h.timesH.length; k++) {
            expect(lineM3s[k]).toBeGreaterThanOrEqual(0);
            expect(lineM3s[k]).toBeLessThanOrEqual(h.dischargeM3s[k] as number);
          }
        },
      ),
    );
  });

  it('gives a lower, smoother baseflow under a flood with more passes', () => {
    const q = [2, 2, 10, 30, 22, 15, 10, 7, 5, 4, 3, 2.5, 2.2, 2];
    const h = { timesH: q.map((_, k) => k), dischargeM3s: q };
    const one = separateBaseflow(h, lyneHollick(0.925, 1));
    const three = separateBaseflow(h, lyneHollick(0.925, 3));
    expect(three.baseflowVolumeM3).toBeLessThan(one.baseflowVolumeM3);
    expect(three.directVolumeM3).toBeGreaterThan(0);
  });

  it('with a time step for α equal to the sample step, matches the per-sample filter', () => {
    const q = [2, 3, 9, 14, 8, 5, 3.5, 2.8];
    const h = { timesH: q.map((_, k) => 6 * k), dischargeM3s: q };
    const perSample = separateBaseflow(h, lyneHollick(0.925, 3));
    const scaled = separateBaseflow(h, lyneHollick(0.925, 3, 6));
    expect(Array.from(scaled.baseflowM3s)).toEqual(Array.from(perSample.baseflowM3s));
  });

  it('with a time step for α, uses α^(Δt/step) on each step', () => {
    // Steps of 2 h with α given per 1 h behave as α² per sample.
    const q = [2, 3, 9, 14, 8, 5, 3.5, 2.8];
    const scaled = separateBaseflow({ timesH: q.map((_, k) => 2 * k), dischargeM3s: q }, lyneHollick(0.9, 3, 1));
    const squared = separateBaseflow({ timesH: q.map((_, k) => k), dischargeM3s: q }, lyneHollick(0.81, 3));
    scaled.baseflowM3s.forEach((b, k) => expectClose(b, squared.baseflowM3s[k] as number));
  });

  it('rejects α outside [0, 1), passes that are not 1 to 9 whole, and a step that is not positive', () => {
    const h = { timesH: [0, 1], dischargeM3s: [1, 2] };
    expect(inputErrorOf(() => separateBaseflow(h, lyneHollick(1, 3))).field).toBe('alpha');
    expect(inputErrorOf(() => separateBaseflow(h, lyneHollick(-0.1, 3))).field).toBe('alpha');
    expect(inputErrorOf(() => separateBaseflow(h, lyneHollick(0.9, 0))).field).toBe('passes');
    expect(inputErrorOf(() => separateBaseflow(h, lyneHollick(0.9, 2.5))).field).toBe('passes');
    expect(inputErrorOf(() => separateBaseflow(h, lyneHollick(0.9, 10))).field).toBe('passes');
    expect(inputErrorOf(() => separateBaseflow(h, lyneHollick(0.9, 3, 0))).field).toBe('stepH');
    const missing = { kind: 'lyne-hollick', passes: 3 } as unknown as Parameters<typeof separateBaseflow>[1];
    expect(inputErrorOf(() => separateBaseflow(h, missing)).field).toBe('alpha');
  });
});
