// Invariants every loss method in the core's table must keep, checked over
// random storms with unequal bar durations (fast-check). Methods added to the
// table later are picked up by methodArb automatically.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLosses } from '../../../src/core';
import { methodArb, stormArb } from '../../helpers/arbitraries';

const cases = stormArb().chain((storm) => methodArb(storm).map((method) => ({ storm, method })));

describe('every loss method', () => {
  it('keeps 0 ≤ loss ≤ rain in every bar and rain = loss + excess to 1e-9 relative', () => {
    fc.assert(
      fc.property(cases, ({ storm, method }) => {
        const r = computeLosses(storm, method);
        // One expect per storm, not five per bar: with storms of hundreds of bars the
        // matcher calls themselves took most of this test's time.
        const broken: string[] = [];
        for (let k = 0; k < storm.depthsMm.length; k++) {
          const p = storm.depthsMm[k] as number;
          const l = r.lossMm[k] as number;
          const e = r.excessMm[k] as number;
          if (!(Number.isFinite(l) && Number.isFinite(e))) broken.push(`bar ${k}: loss ${l}, excess ${e} not finite`);
          else if (!(l >= 0)) broken.push(`bar ${k}: loss ${l} < 0`);
          else if (!(l <= p * (1 + 1e-12))) broken.push(`bar ${k}: loss ${l} > rain ${p}`);
          else if (!(Math.abs(p - l - e) <= 1e-9 * Math.max(p, 1e-300)))
            broken.push(`bar ${k}: rain ${p} ≠ loss ${l} + excess ${e}`);
        }
        expect(broken).toEqual([]);
        const totalRain = storm.depthsMm.reduce((a, b) => a + b, 0);
        expect(Math.abs(totalRain - r.totalLossMm - r.totalExcessMm)).toBeLessThanOrEqual(
          1e-9 * Math.max(totalRain, 1e-9),
        );
        expect(r.runoffFraction).toBeGreaterThanOrEqual(0);
        expect(r.runoffFraction).toBeLessThanOrEqual(1 + 1e-12);
      }),
      { numRuns: 400 },
    );
  });

  it('never returns NaN, even for a dry storm', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 20 }).chain((n) => {
          const storm = { durationsH: Array(n).fill(0.25) as number[], depthsMm: Array(n).fill(0) as number[] };
          return methodArb(storm).map((method) => ({ storm, method }));
        }),
        ({ storm, method }) => {
          const r = computeLosses(storm, method);
          expect(
            [r.rainMm, r.totalLossMm, r.totalExcessMm, r.runoffFraction, r.peakExcessMmH].every(Number.isFinite),
          ).toBe(true);
          expect(r.totalExcessMm).toBe(0);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('every loss method and variant', () => {
  it('does not change when a bar, wet or dry, is split into two halves of equal intensity (to 1e-9)', () => {
    fc.assert(
      fc.property(cases, fc.nat(), ({ storm, method }, pick) => {
        const k = pick % storm.depthsMm.length;
        const split = {
          durationsH: storm.durationsH.flatMap((d, j) => (j === k ? [d / 2, d / 2] : [d])),
          depthsMm: storm.depthsMm.flatMap((p, j) => (j === k ? [p / 2, p / 2] : [p])),
        };
        const whole = computeLosses(storm, method);
        const halves = computeLosses(split, method);
        const scale = Math.max(whole.rainMm, 1e-9);
        expect(Math.abs(whole.totalExcessMm - halves.totalExcessMm)).toBeLessThanOrEqual(1e-9 * scale);
        const joined = (halves.excessMm[k] as number) + (halves.excessMm[k + 1] as number);
        expect(Math.abs((whole.excessMm[k] as number) - joined)).toBeLessThanOrEqual(1e-9 * scale);
      }),
      { numRuns: 600 },
    );
  });
});

describe('constant, initial–continuing and proportional losses', () => {
  it('give less excess for a higher loss parameter (monotone response)', () => {
    fc.assert(
      fc.property(
        stormArb(),
        fc.double({ min: 0, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (storm, a, b) => {
          const [lo, hi] = a < b ? [a, b] : [b, a];
          const e = (rate: number): number => computeLosses(storm, { kind: 'constant', rateMmH: rate }).totalExcessMm;
          expect(e(hi)).toBeLessThanOrEqual(e(lo) + 1e-12);
          const il = (mm: number): number =>
            computeLosses(storm, { kind: 'initial-continuing', initialMm: mm, rateMmH: 1 }).totalExcessMm;
          expect(il(hi)).toBeLessThanOrEqual(il(lo) + 1e-9);
        },
      ),
    );
  });
});
