import { expect } from 'vitest';

/** Runs `fn` and returns the error it throws (fails the test if it does not throw). */
export function thrown(fn: () => unknown): unknown {
  try {
    fn();
  } catch (error) {
    return error;
  }
  return expect.fail('expected a throw, got none');
}
