import { expect } from 'vitest';

/**
 * |actual − expected| ≤ max(rel·|expected|, abs). Float comparisons in tests go
 * through this so the tolerance is stated where it is used.
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
