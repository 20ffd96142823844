import { scaleLinear } from 'd3-scale';
import fc from 'fast-check';
import { expect, test } from 'vitest';
import { linearMap, mapLinear } from '../../../src/ui/chart/linear-px';

// The loops over every bar write a linear scale's arithmetic out (linear-px.ts);
// each pixel must be the one d3-scale's scaleLinear gives for the same value,
// bit for bit, or the chart's paths would change with the number of bars.

const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true });

test('every value maps to the pixel d3-scale gives, for rising, falling and niced domains', () => {
  let mapped = 0;
  fc.assert(
    fc.property(
      finite,
      finite,
      finite,
      finite,
      fc.boolean(),
      fc.array(fc.oneof(finite, fc.constantFrom(NaN, 0, -0, Infinity)), { minLength: 1, maxLength: 40 }),
      (d0, d1, r0, r1, nice, values) => {
        const scale = scaleLinear().domain([d0, d1]).range([r0, r1]);
        if (nice) scale.nice(6);
        const ours = mapLinear(scale, values);
        values.forEach((v, k) => {
          const theirs = scale(v) ?? NaN;
          expect(Object.is(ours[k], theirs) || (Number.isNaN(ours[k]) && Number.isNaN(theirs))).toBe(true);
        });
        if (linearMap(scale) !== null) mapped++;
      },
    ),
    { numRuns: 3000 },
  );
  // Nearly every random scale is plain two-stop arithmetic: the written-out path is the one tested.
  expect(mapped).toBeGreaterThan(2900);
});

test('a clamped scale or a domain of one point is left to the scale itself', () => {
  expect(linearMap(scaleLinear().domain([0, 1]).range([0, 10]).clamp(true))).toBeNull();
  expect(linearMap(scaleLinear().domain([2, 2]).range([0, 10]))).toBeNull();
  // d3 maps a one-point domain to the middle of the range: (0 + 10) / 2 = 5
  expect(Array.from(mapLinear(scaleLinear().domain([2, 2]).range([0, 10]), [7]))).toEqual([5]);
  // clamped: 3 on [0, 1] → [0, 10] is held at 10
  expect(Array.from(mapLinear(scaleLinear().domain([0, 1]).range([0, 10]).clamp(true), [3]))).toEqual([10]);
});
