import { describe, expect, it } from 'vitest';
import { InputError, barEdgesH, peakIntensityMmH, totalDepthMm, validateStorm } from '../../src/core';

function rejection(fn: () => void): InputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('validateStorm', () => {
  it('accepts bars of unequal duration, dry bars and typed arrays', () => {
    expect(() => validateStorm({ durationsH: [0.5, 1, 0.25], depthsMm: [0, 3.2, 1] })).not.toThrow();
    expect(() =>
      validateStorm({ durationsH: new Float64Array([1, 2]), depthsMm: new Float64Array([1, 0]) }),
    ).not.toThrow();
    expect(() => validateStorm({ durationsH: [], depthsMm: [] })).not.toThrow();
  });

  it('names the field when lengths do not match', () => {
    const e = rejection(() => validateStorm({ durationsH: [1, 1], depthsMm: [1] }));
    expect(e.field).toBe('depthsMm');
    expect(e.message).toMatch(/2 bar durations but 1 bar depths/);
  });

  it.each([
    ['zero', 0],
    ['negative', -0.5],
    ['NaN', Number.NaN],
    ['infinite', Infinity],
  ])('rejects a %s duration and names the bar', (_label, bad) => {
    const e = rejection(() => validateStorm({ durationsH: [1, 1, bad], depthsMm: [1, 2, 3] }));
    expect(e.field).toBe('durationsH');
    expect(e.index).toBe(2);
    expect(e.message).toMatch(/^Bar 3: duration/);
  });

  it.each([
    ['negative', -1],
    ['NaN', Number.NaN],
    ['infinite', Infinity],
  ])('rejects a %s depth and names the bar', (_label, bad) => {
    const e = rejection(() => validateStorm({ durationsH: [1, 1], depthsMm: [bad, 2] }));
    expect(e.field).toBe('depthsMm');
    expect(e.index).toBe(0);
    expect(e.message).toMatch(/^Bar 1: rainfall depth/);
  });

  it('rejects a start time that is not a date-time', () => {
    const e = rejection(() => validateStorm({ durationsH: [1], depthsMm: [1], startIso: 'yesterday' }));
    expect(e.field).toBe('startIso');
  });
});

describe('storm summaries', () => {
  const storm = { durationsH: [0.5, 0.25, 1], depthsMm: [2, 5, 3] };
  it('adds up depth, finds the peak intensity and the bar edges', () => {
    expect(totalDepthMm(storm)).toBe(10);
    expect(peakIntensityMmH(storm)).toBe(20);
    expect(Array.from(barEdgesH(storm))).toEqual([0, 0.5, 0.75, 1.75]);
  });
});
