import { expect } from 'vitest';
import { InputError, isInputError } from '../../src/core';

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
