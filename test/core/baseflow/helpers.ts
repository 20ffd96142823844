import fc from 'fast-check';
import { expect } from 'vitest';
import { isInputError, type InputError } from '../../../src/core/errors';
import type { Hydrograph } from '../../../src/core/baseflow/types';

/** Asserts |actual − expected| ≤ tol · max(1, |expected|). */
export function expectClose(actual: number, expected: number, tol = 1e-12): void {
  const scale = Math.max(1, Math.abs(expected));
  expect(Math.abs(actual - expected), `${actual} should be within ${tol} of ${expected}`).toBeLessThanOrEqual(
    tol * scale,
  );
}

/** Runs `fn`, expecting it to throw an InputError, and returns that error. */
export function inputErrorOf(fn: () => unknown): InputError {
  try {
    fn();
  } catch (error) {
    if (isInputError(error)) return error;
    throw error;
  }
  throw new Error('Expected an InputError, but nothing was thrown.');
}

/**
 * A triangular direct-runoff hydrograph on top of a baseflow line: baseflow
 * `base(t)`, plus a triangle rising from 0 at `t0` to `peak` at `t1` and back to
 * 0 at `t2`. Sampled at `timesH`, which must include t0, t1 and t2 so the
 * samples trace the shape exactly.
 */
export function triangleOver(
  timesH: readonly number[],
  t0: number,
  t1: number,
  t2: number,
  peak: number,
  base: (t: number) => number,
): Hydrograph {
  const q = timesH.map((t) => {
    let tri = 0;
    if (t > t0 && t <= t1) tri = (peak * (t - t0)) / (t1 - t0);
    else if (t > t1 && t < t2) tri = (peak * (t2 - t)) / (t2 - t1);
    return base(t) + tri;
  });
  return { timesH: Float64Array.from(timesH), dischargeM3s: Float64Array.from(q) };
}

/**
 * Random valid hydrographs: 2 to `maxLength` samples, irregular steps from
 * 0.01 h to 24 h, discharge from 0 (often exactly) to 10⁴ m³/s.
 */
export function hydrographs(maxLength = 60): fc.Arbitrary<Hydrograph> {
  return fc.integer({ min: 2, max: maxLength }).chain((n) =>
    fc
      .record({
        steps: fc.array(fc.double({ min: 0.01, max: 24, noNaN: true }), { minLength: n - 1, maxLength: n - 1 }),
        start: fc.double({ min: -100, max: 100, noNaN: true }),
        q: fc.array(fc.oneof(fc.constant(0), fc.double({ min: 0, max: 1e4, noNaN: true })), {
          minLength: n,
          maxLength: n,
        }),
      })
      .map(({ steps, start, q }) => {
        const timesH = new Float64Array(n);
        timesH[0] = start;
        for (let k = 1; k < n; k++) timesH[k] = (timesH[k - 1] as number) + (steps[k - 1] as number);
        return { timesH, dischargeM3s: Float64Array.from(q, Math.abs) };
      }),
  );
}
