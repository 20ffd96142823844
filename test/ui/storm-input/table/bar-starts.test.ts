import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { barEdgesH } from '../../../../src/core';
import { barStarts } from '../../../../src/ui/storm-input/table/bar-starts';

describe('the bar table’s bar starts', () => {
  it('are barEdgesH’s edges to the last bit, whichever rows are asked for first', () => {
    let cases = 0;
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 1, max: 1440 }), { minLength: 1, maxLength: 20_000, size: 'max' }),
        fc.array(fc.nat(), { minLength: 1, maxLength: 40 }),
        (minutes, asks) => {
          // Durations in hours from whole minutes: sums of sixtieths round at almost every step.
          const storm = { durationsH: minutes.map((m) => m / 60), depthsMm: minutes.map(() => 0) };
          const edges = barEdgesH(storm);
          const startH = barStarts(storm);
          for (const a of asks) {
            const k = a % minutes.length;
            expect(Object.is(startH(k), edges[k])).toBe(true);
          }
          const last = minutes.length - 1;
          expect(Object.is(startH(last), edges[last])).toBe(true);
          cases++;
        },
      ),
    );
    expect(cases).toBeGreaterThan(50);
  });
});
