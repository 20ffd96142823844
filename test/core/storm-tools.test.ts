import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, barEdgesH, totalDepthMm, totalDurationH, type Storm } from '../../src/core';
import {
  MAX_TOOL_BARS,
  emptyStorm,
  firstRainLost,
  resampleStorm,
  scaleStormByFactor,
  withBarStartH,
} from '../../src/core/storm-tools';
import { stormArb } from '../helpers/arbitraries';
import { expectAllClose, expectClose } from '../helpers/tolerance';

// Invented storms for these checks.
const TEN_MIN = 10 / 60;
const sixBars: Storm = {
  durationsH: Array.from({ length: 6 }, () => TEN_MIN),
  depthsMm: [1, 3, 6, 4, 2, 0],
  startIso: '2026-03-02T08:00:00',
};
const uneven: Storm = { durationsH: [0.5, 0.25, 1], depthsMm: [3, 5, 4] };

function thrown(fn: () => unknown): InputError {
  try {
    fn();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  return expect.fail('expected an InputError');
}

/** Rain falling in [a, b) under the piecewise-constant intensity of a storm: the quantity resampling must keep. */
function rainBetween(storm: Storm, a: number, b: number): number {
  const edges = barEdgesH(storm);
  let sum = 0;
  for (let k = 0; k < storm.depthsMm.length; k++) {
    const lo = Math.max(a, edges[k] as number);
    const hi = Math.min(b, edges[k + 1] as number);
    if (hi > lo) sum += ((storm.depthsMm[k] as number) * (hi - lo)) / (storm.durationsH[k] as number);
  }
  return sum;
}

describe('resampling a storm to another time step', () => {
  it('to a step that is a multiple of the old one, sums whole bars', () => {
    const out = resampleStorm(sixBars, 0.5);
    expect(Array.from(out.depthsMm)).toEqual([10, 6]);
    expect(Array.from(out.durationsH)).toEqual([0.5, 0.5]);
    expect(out.startIso).toBe('2026-03-02T08:00:00');
  });

  it('to a step that divides the old one, splits each bar evenly', () => {
    const out = resampleStorm({ durationsH: [1, 1], depthsMm: [6, 2] }, 0.25);
    expect(Array.from(out.depthsMm)).toEqual([1.5, 1.5, 1.5, 1.5, 0.5, 0.5, 0.5, 0.5]);
    expect(Array.from(out.durationsH)).toEqual(Array(8).fill(0.25));
  });

  it('to a step that does not nest, shares each bar by its overlap with the new bars', () => {
    // Bars 0–0.5 h (3 mm, 6 mm/h), 0.5–0.75 h (5 mm, 20 mm/h), 0.75–1.75 h (4 mm, 4 mm/h); new step 0.4 h.
    const out = resampleStorm(uneven, 0.4);
    expect(out.durationsH.length).toBe(5);
    expectAllClose(out.durationsH, [0.4, 0.4, 0.4, 0.4, 0.15], 1e-12);
    // By hand: [0, 0.4) = 0.4·6 = 2.4; [0.4, 0.8) = 0.1·6 + 0.25·20 + 0.05·4 = 5.8;
    // [0.8, 1.2) = 1.6; [1.2, 1.6) = 1.6; [1.6, 1.75) = 0.6.
    expectAllClose(out.depthsMm, [2.4, 5.8, 1.6, 1.6, 0.6], 1e-12);
    expectClose(totalDepthMm(out), 12, 1e-14);
  });

  it('keeps the length of the storm: the last bar is shorter when the step does not divide it', () => {
    const out = resampleStorm(sixBars, 0.4);
    expectClose(totalDurationH(out), 1, 1e-12);
    expectAllClose(out.durationsH, [0.4, 0.4, 0.2], 1e-12);
  });

  it('to a step longer than the storm, gives one bar holding all the rain', () => {
    const out = resampleStorm(uneven, 5);
    expect(Array.from(out.durationsH)).toEqual([1.75]);
    expectClose(out.depthsMm[0] as number, 12, 1e-14);
  });

  it('reads minutes typed as hours to rounding: 3 h in 10-min steps is 18 bars, not 19', () => {
    const threeHours: Storm = { durationsH: [1, 1, 1], depthsMm: [1, 2, 3] };
    const out = resampleStorm(threeHours, 10 / 60);
    expect(out.durationsH.length).toBe(18);
    expectClose(totalDurationH(out), 3, 1e-12);
  });

  it('of an empty storm is an empty storm', () => {
    const out = resampleStorm({ durationsH: [], depthsMm: [] }, 0.5);
    expect(out.depthsMm.length).toBe(0);
  });

  it('leaves the storm it was given unchanged', () => {
    const copy = {
      ...uneven,
      durationsH: [...(uneven.durationsH as number[])],
      depthsMm: [...(uneven.depthsMm as number[])],
    };
    resampleStorm(uneven, 0.1);
    expect(uneven).toEqual(copy);
  });

  it('refuses a step that is not a positive number of hours, naming the step', () => {
    for (const bad of [0, -1, Number.NaN, Infinity])
      expect(thrown(() => resampleStorm(uneven, bad)).field).toBe('stepH');
  });

  it('refuses a step that would make too many bars', () => {
    // 1000 h in steps of one second: 3,600,000 bars.
    const error = thrown(() => resampleStorm({ durationsH: [1000], depthsMm: [1] }, 1 / 3600));
    expect(error.field).toBe('stepH');
    expect(error.message).toContain(String(MAX_TOOL_BARS));
  });

  it('refuses a bad storm with the core’s own message', () => {
    expect(thrown(() => resampleStorm({ durationsH: [1, 0], depthsMm: [1, 1] }, 0.5)).field).toBe('durationsH');
  });

  it('keeps the total depth of any storm at any step', () => {
    fc.assert(
      fc.property(stormArb(40), fc.double({ min: 1 / 60, max: 6, noNaN: true }), (storm, stepH) => {
        const out = resampleStorm(storm, stepH);
        expectClose(totalDepthMm(out), totalDepthMm(storm), 1e-12, 1e-12);
        // Durations within 1e-9 of a whole number of steps are taken as whole (see the 18-bar case).
        expectClose(totalDurationH(out), totalDurationH(storm), 1e-9, 1e-12);
        for (let j = 0; j < out.depthsMm.length; j++) {
          expect(out.depthsMm[j]).toBeGreaterThanOrEqual(0);
          expect(out.durationsH[j]).toBeGreaterThan(0);
        }
      }),
    );
  });

  it('puts into each new bar exactly the rain that fell in its time span', () => {
    fc.assert(
      fc.property(stormArb(25), fc.double({ min: 1 / 60, max: 4, noNaN: true }), (storm, stepH) => {
        const out = resampleStorm(storm, stepH);
        const edges = barEdgesH(out);
        const scale = Math.max(1, totalDepthMm(storm));
        for (let j = 0; j < out.depthsMm.length; j++) {
          expectClose(
            out.depthsMm[j] as number,
            rainBetween(storm, edges[j] as number, edges[j + 1] as number),
            1e-9,
            1e-12 * scale,
          );
        }
      }),
    );
  });

  it('to a finer step that nests and back again gives the storm it started from', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 50, noNaN: true }), { minLength: 1, maxLength: 30 }),
        fc.constantFrom(2, 3, 4, 6),
        (depths, parts) => {
          const storm: Storm = { durationsH: depths.map(() => 0.5), depthsMm: depths };
          const fine = resampleStorm(storm, 0.5 / parts);
          expect(fine.depthsMm.length).toBe(depths.length * parts);
          const back = resampleStorm(fine, 0.5);
          expectAllClose(back.depthsMm, depths, 1e-12, 1e-12);
        },
      ),
    );
  });
});

describe('scaling a storm by a factor', () => {
  it('multiplies every bar and keeps durations and start', () => {
    const out = scaleStormByFactor(sixBars, 1.5);
    expect(Array.from(out.depthsMm)).toEqual([1.5, 4.5, 9, 6, 3, 0]);
    expect(Array.from(out.durationsH)).toEqual(sixBars.durationsH);
    expect(out.startIso).toBe(sixBars.startIso);
  });

  it('by zero leaves a dry storm of the same bars', () => {
    expect(Array.from(scaleStormByFactor(uneven, 0).depthsMm)).toEqual([0, 0, 0]);
  });

  it('refuses a negative or non-finite factor, naming the factor', () => {
    for (const bad of [-0.5, Number.NaN, Infinity])
      expect(thrown(() => scaleStormByFactor(uneven, bad)).field).toBe('factor');
  });

  it('refuses a factor that would overflow a bar, naming the bar', () => {
    const error = thrown(() => scaleStormByFactor({ durationsH: [1, 1], depthsMm: [0, 1e300] }, 1e10));
    expect(error.field).toBe('factor');
    expect(error.message).toContain('Bar 2');
  });
});

describe('the first bar whose rain a scaling would lose', () => {
  const wet = { durationsH: [1, 1, 1], depthsMm: [2, 0, 6] };

  it('is none when every bar with rain keeps a depth held to full precision', () => {
    // 6 mm × 1e-300 = 6e-300 mm, far above the smallest full-precision double, 2^-1022 ≈ 2.2251e-308.
    expect(firstRainLost(wet, scaleStormByFactor(wet, 1e-300))).toBe(-1);
    expect(firstRainLost(wet, scaleStormByFactor(wet, 3))).toBe(-1);
  });

  it('is the first wet bar that scaling by zero dries, and the dry bar before it does not count', () => {
    expect(firstRainLost(wet, scaleStormByFactor(wet, 0))).toBe(0);
    const dryFirst = { durationsH: [1, 1], depthsMm: [0, 4] };
    expect(firstRainLost(dryFirst, scaleStormByFactor(dryFirst, 0))).toBe(1);
  });

  it('is a wet bar left below the smallest full-precision depth, where its share of the pattern rounds away', () => {
    // 2 mm × 1e-308 = 2e-308 mm < 2^-1022 ≈ 2.2251e-308 (subnormal: digits lost); 6 mm × 1e-308 = 6e-308 is not.
    expect(firstRainLost(wet, scaleStormByFactor(wet, 1e-308))).toBe(0);
    const bigLast = { durationsH: [1, 1], depthsMm: [100, 1] };
    // 100 × 1e-309 = 1e-307 is normal; 1 × 1e-309 = 1e-309 is not: bar 2 (index 1).
    expect(firstRainLost(bigLast, scaleStormByFactor(bigLast, 1e-309))).toBe(1);
  });

  it('is none for a storm with no rain to lose', () => {
    const dry = { durationsH: [1, 1], depthsMm: [0, 0] };
    expect(firstRainLost(dry, scaleStormByFactor(dry, 0))).toBe(-1);
  });
});

describe('an empty storm to draw on', () => {
  it('has the chosen number of dry bars of the chosen step', () => {
    const s = emptyStorm(0.25, 8, '2026-03-02T08:00:00');
    expect(Array.from(s.durationsH)).toEqual(Array(8).fill(0.25));
    expect(Array.from(s.depthsMm)).toEqual(Array(8).fill(0));
    expect(s.startIso).toBe('2026-03-02T08:00:00');
  });

  it('refuses a count that is not a whole number from 1, and a bad step', () => {
    for (const bad of [0, 2.5, -3, MAX_TOOL_BARS + 1]) expect(thrown(() => emptyStorm(0.5, bad)).field).toBe('count');
    expect(thrown(() => emptyStorm(0, 4)).field).toBe('stepH');
  });
});

describe('moving the start of a bar', () => {
  it('moves the boundary with the bar before it, keeping every depth and the other bars’ times', () => {
    const out = withBarStartH(uneven, 1, 0.6);
    expectAllClose(out.durationsH, [0.6, 0.15, 1], 1e-12);
    expect(Array.from(out.depthsMm)).toEqual([3, 5, 4]);
    expectClose(totalDurationH(out), totalDurationH(uneven), 1e-14);
  });

  it('refuses a start outside the two bars it joins, naming the bar', () => {
    const before = thrown(() => withBarStartH(uneven, 2, 0.5));
    expect(before.index).toBe(2);
    expect(before.message).toContain('Bar 3');
    expect(thrown(() => withBarStartH(uneven, 1, 1.75)).index).toBe(1);
  });

  it('refuses the first bar, whose start is the storm’s', () => {
    expect(thrown(() => withBarStartH(uneven, 0, 0.1)).message).toContain('bars 2 to 3');
  });
});
