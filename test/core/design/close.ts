import { expect } from 'vitest';

/**
 * Float comparison for the design and event tests: |actual − expected| must
 * be within `abs` + `rel`·|expected|. Defaults suit sums of a few dozen
 * terms computed two ways.
 */
export function expectClose(actual: number, expected: number, rel = 1e-10, abs = 1e-12): void {
  const tol = abs + rel * Math.abs(expected);
  if (!(Math.abs(actual - expected) <= tol)) {
    expect.fail(`expected ${actual} to be within ${tol} of ${expected}`);
  }
}

/** Runs `fn` and returns the error it throws (fails the test if it does not throw). */
export function thrown(fn: () => unknown): unknown {
  try {
    fn();
  } catch (error) {
    return error;
  }
  return expect.fail('expected a throw, got none');
}
