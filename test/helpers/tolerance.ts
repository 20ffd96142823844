import { expect } from 'vitest';

/**
 * The one tolerance rule of the tests: |actual − expected| ≤ max(rel·|expected|, abs).
 * Every float comparison in test/core goes through this (or expectAllClose),
 * with the tolerance stated at the call when it is not the default 1e-12; `rel`
 * bounds the error of a computation, `abs` the floor for expected values near
 * zero, and (…, 0, h) states a printed table's half-unit of rounding h.
 */
export function expectClose(actual: number, expected: number, rel = 1e-12, abs = 1e-12): void {
  const tol = Math.max(rel * Math.abs(expected), abs);
  const diff = Math.abs(actual - expected);
  if (!(diff <= tol)) {
    expect.fail(`expected ${actual} to be within ${tol} of ${expected} (off by ${diff})`);
  }
}

/** Relative closeness for a whole array. */
export function expectAllClose(actual: ArrayLike<number>, expected: ArrayLike<number>, rel = 1e-12, abs = 1e-12): void {
  expect(actual.length).toBe(expected.length);
  for (let k = 0; k < expected.length; k++) expectClose(actual[k] as number, expected[k] as number, rel, abs);
}
