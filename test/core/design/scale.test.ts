import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { InputError, scaleStormToDepth, totalDepthMm, type Storm } from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';
import { thrown } from '../../helpers/thrown';

// Invented storm: 4 bars, 30 min then 1 h bars, 20 mm in all.
const storm: Storm = { durationsH: [0.5, 0.5, 1, 1], depthsMm: [2, 8, 6, 4], startIso: '2026-01-10T12:00:00Z' };

describe('scaling a storm to a chosen depth', () => {
  test('doubling the depth doubles every bar and keeps durations and start', () => {
    const scaled = scaleStormToDepth(storm, 40);
    expect(Array.from(scaled.depthsMm)).toEqual([4, 16, 12, 8]);
    expect(Array.from(scaled.durationsH)).toEqual([0.5, 0.5, 1, 1]);
    expect(scaled.startIso).toBe('2026-01-10T12:00:00Z');
  });

  test('the input storm is left as it was', () => {
    scaleStormToDepth(storm, 5);
    expect(storm.depthsMm).toEqual([2, 8, 6, 4]);
  });

  test('scaling to 0 gives a dry storm of the same bars', () => {
    const dry = scaleStormToDepth(storm, 0);
    expect(Array.from(dry.depthsMm)).toEqual([0, 0, 0, 0]);
  });

  test('a dry storm scaled to 0 stays dry', () => {
    expect(Array.from(scaleStormToDepth({ durationsH: [1, 1], depthsMm: [0, 0] }, 0).depthsMm)).toEqual([0, 0]);
  });

  test('any storm scaled to any depth has that total and the same shape', () => {
    fc.assert(
      fc.property(
        fc
          .array(fc.double({ min: 0, max: 200, noNaN: true }), { minLength: 1, maxLength: 40 })
          .filter((p) => p.some((x) => x > 0)),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        (depths, target) => {
          const s: Storm = { durationsH: depths.map(() => 0.25), depthsMm: depths };
          const scaled = scaleStormToDepth(s, target);
          expectClose(totalDepthMm(scaled), target, 1e-12, 1e-12);
          const total = totalDepthMm(s);
          depths.forEach((p, k) => expectClose(scaled.depthsMm[k] as number, (p / total) * target, 1e-12, 1e-300));
        },
      ),
    );
  });

  test('a storm of vanishing depth scales without overflow', () => {
    // Found by the property above: 5e-324 mm (the smallest double) to 1 mm.
    const scaled = scaleStormToDepth({ durationsH: [1, 1], depthsMm: [5e-324, 0] }, 1);
    expect(Array.from(scaled.depthsMm)).toEqual([1, 0]);
  });

  test('a dry storm cannot be given rain: it has no pattern', () => {
    const error = thrown(() => scaleStormToDepth({ durationsH: [1, 1], depthsMm: [0, 0] }, 10));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('depthMm');
    expect((error as InputError).message).toMatch(/no rain/);
  });

  test.each([-1, Number.NaN, Infinity])('a new depth of %s is refused on depthMm', (depth) => {
    expect((thrown(() => scaleStormToDepth(storm, depth)) as InputError).field).toBe('depthMm');
  });

  test('a bad storm is refused on its own field and bar', () => {
    const error = thrown(() => scaleStormToDepth({ durationsH: [1, 0], depthsMm: [1, 1] }, 10)) as InputError;
    expect(error.field).toBe('durationsH');
    expect(error.index).toBe(1);
  });
});
