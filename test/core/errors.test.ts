import { describe, expect, it } from 'vitest';
import { attempt, InputError } from '../../src/core';

describe('attempt', () => {
  it('hands back the value of work that succeeds', () => {
    expect(attempt(() => 2 + 3)).toEqual({ ok: true, value: 5 });
  });

  it('hands back the InputError of work that refuses its input, message and field unchanged', () => {
    const refusal = new InputError('depthsMm', 'Bar 2: rainfall depth must be a finite number.', 1);
    const r = attempt(() => {
      throw refusal;
    });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.error).toBe(refusal);
  });

  it('throws on any other error: a defect is not bad input', () => {
    expect(() =>
      attempt(() => {
        throw new TypeError('not input');
      }),
    ).toThrow(TypeError);
  });
});
