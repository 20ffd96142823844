import { expect } from 'vitest';
import { InputError } from '../../src/core';

/** Runs fn and expects an InputError naming `field`, with a message matching `message`. */
export function expectInputError(fn: () => unknown, field: string, message: RegExp): InputError {
  let caught: unknown;
  try {
    fn();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(InputError);
  const error = caught as InputError;
  expect(error.field).toBe(field);
  expect(error.message).toMatch(message);
  return error;
}
