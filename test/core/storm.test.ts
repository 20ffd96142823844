import { describe, expect, it } from 'vitest';
import { InputError, barEdgesH, peakIntensityMmH, totalDepthMm, validateStorm } from '../../src/core';
import { PASS_BLOCK, validateStormDepthMm } from '../../src/core/storm';

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

describe('validateStormDepthMm', () => {
  it('returns the total depth from the validating pass', () => {
    // 0 + 3.2 + 1 = 4.2 mm, summed in bar order as totalDepthMm sums it.
    const storm = { durationsH: [0.5, 1, 0.25], depthsMm: [0, 3.2, 1] };
    expect(validateStormDepthMm(storm)).toBe(0 + 3.2 + 1);
    expect(validateStormDepthMm({ durationsH: [], depthsMm: [] })).toBe(0);
  });

  it('sums across its blocks and names a bad bar past the first block', () => {
    const n = 2 * PASS_BLOCK + 5;
    const storm = { durationsH: new Array<number>(n).fill(0.25), depthsMm: new Array<number>(n).fill(0.5) };
    // n bars of 0.5 mm: every partial sum is a multiple of 0.5, exact in binary.
    expect(validateStormDepthMm(storm)).toBe(0.5 * n);
    storm.depthsMm[PASS_BLOCK + 1] = -3;
    const e = rejection(() => validateStormDepthMm(storm));
    expect([e.field, e.index]).toEqual(['depthsMm', PASS_BLOCK + 1]);
    expect(e.message).toMatch(new RegExp(`^Bar ${PASS_BLOCK + 2}: rainfall depth`));
  });

  // The pass compares bars with the lower limits only; the sums show an
  // infinite depth or a bar past a record's span, and the first bad bar is
  // then sought from the start.
  it('names the first bad bar when the one the pass stopped at comes later', () => {
    const n = 2 * PASS_BLOCK + 5;
    const storm = { durationsH: new Array<number>(n).fill(0.25), depthsMm: new Array<number>(n).fill(0.5) };
    storm.depthsMm[3] = Infinity;
    storm.depthsMm[n - 1] = Number.NaN;
    const e = rejection(() => validateStormDepthMm(storm));
    expect([e.field, e.index]).toEqual(['depthsMm', 3]);
    expect(e.message).toBe(
      'Bar 4: rainfall depth must be a finite number of millimetres, zero or more (got Infinity).',
    );
    // 10⁹ h, about 114,000 years: one bar past the 500-year limit, before the NaN.
    storm.depthsMm[3] = 0.5;
    storm.durationsH[PASS_BLOCK] = 1e9;
    const long = rejection(() => validateStormDepthMm(storm));
    expect([long.field, long.index]).toEqual(['durationsH', PASS_BLOCK]);
    expect(long.message).toMatch(new RegExp(`^Bar ${PASS_BLOCK + 1}: duration must be at most 500 years`));
  });

  it('accepts finite depths that sum past the largest double, and clean bars too long together', () => {
    // 7e307 mm each (finite; the largest double is about 1.797e308): the sum, 2.1e308, is Infinity.
    expect(validateStormDepthMm({ durationsH: [1, 1, 1], depthsMm: [7e307, 7e307, 7e307] })).toBe(Infinity);
    // Two bars of 300 years each are clean; together they pass the 500-year span (bar 2 passes it).
    const e = rejection(() => validateStormDepthMm({ durationsH: [300 * 8766, 300 * 8766], depthsMm: [1, 1] }));
    expect([e.field, e.index]).toEqual(['durationsH', 1]);
    expect(e.message).toMatch(/^Bar 2: the storm would run .* a record spans at most 500 years/);
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
