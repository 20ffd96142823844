import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  InputError,
  MAX_DESIGN_BARS,
  alternatingBlockStorm,
  idfDepthMm,
  totalDepthMm,
  totalDurationH,
  type Idf,
  type IdfTable,
  type Storm,
} from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';
import { thrown } from '../../helpers/thrown';

/** Largest depth held by any run of j consecutive bars. */
function maxRunDepth(storm: Storm, j: number): number {
  const p = storm.depthsMm;
  let best = -Infinity;
  for (let s = 0; s + j <= p.length; s++) {
    let sum = 0;
    for (let k = s; k < s + j; k++) sum += p[k] as number;
    best = Math.max(best, sum);
  }
  return best;
}

/**
 * IDF depth written out here from the relation itself, not through the core:
 * D(t) = i(t)·t with t converted to the formula's unit and i to mm/h.
 */
function formulaDepthMm(idf: Idf, durationH: number): number {
  if (idf.kind === 'table') throw new Error('formulas only');
  const t = idf.durationUnit === 'min' ? durationH * 60 : durationH;
  const toMm = idf.intensityUnit === 'in/h' ? 25.4 : 1;
  const i = idf.kind === 'a/(t+b)^c' ? idf.a / Math.pow(t + idf.b, idf.c) : idf.a / (Math.pow(t, idf.c) + idf.b);
  return i * toMm * durationH;
}

// Random formula relations (invented coefficients over the ranges seen in
// fitted IDF curves and beyond), step sizes, storm lengths and peak positions.
const formulaIdf: fc.Arbitrary<Idf> = fc
  .record({
    kind: fc.constantFrom('a/(t+b)^c' as const, 'a/(t^c+b)' as const),
    a: fc.double({ min: 1, max: 5000, noNaN: true }),
    b: fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 60, noNaN: true })),
    c: fc.oneof(fc.constant(1), fc.double({ min: 0.05, max: 1, noNaN: true })),
    durationUnit: fc.constantFrom('min' as const, 'h' as const),
    intensityUnit: fc.constantFrom('mm/h' as const, 'in/h' as const),
  })
  .filter((idf) => !(idf.c === 1 && idf.b === 0));

const layout = fc.record({
  bars: fc.integer({ min: 1, max: 48 }),
  stepMin: fc.constantFrom(1, 5, 10, 15, 30, 60),
  peakFraction: fc.double({ min: 0, max: 1, noNaN: true }),
});

describe('alternating block storm from an IDF formula', () => {
  test('every duration that is a multiple of the step has its IDF depth in the central run of blocks', () => {
    fc.assert(
      fc.property(formulaIdf, layout, (idf, { bars, stepMin, peakFraction }) => {
        const stepH = stepMin / 60;
        const storm = alternatingBlockStorm({ idf, durationH: bars * stepH, stepH, peakFraction });
        for (let j = 1; j <= bars; j++) {
          expectClose(maxRunDepth(storm, j), formulaDepthMm(idf, j * stepH), 1e-9);
        }
      }),
    );
  });

  test('the blocks sum to the IDF depth of the whole storm', () => {
    fc.assert(
      fc.property(formulaIdf, layout, (idf, { bars, stepMin, peakFraction }) => {
        const stepH = stepMin / 60;
        const storm = alternatingBlockStorm({ idf, durationH: bars * stepH, stepH, peakFraction });
        expectClose(totalDepthMm(storm), formulaDepthMm(idf, bars * stepH), 1e-9);
        expect(storm.depthsMm.length).toBe(bars);
        expectClose(totalDurationH(storm), bars * stepH, 1e-12);
      }),
    );
  });

  test('blocks fall away from the peak on both sides', () => {
    fc.assert(
      fc.property(formulaIdf, layout, (idf, { bars, stepMin, peakFraction }) => {
        const stepH = stepMin / 60;
        const p = alternatingBlockStorm({ idf, durationH: bars * stepH, stepH, peakFraction }).depthsMm;
        let peak = 0;
        for (let k = 1; k < bars; k++) if ((p[k] as number) > (p[peak] as number)) peak = k;
        for (let k = peak; k > 0; k--) expect(p[k - 1] as number).toBeLessThanOrEqual(p[k] as number);
        for (let k = peak; k < bars - 1; k++) expect(p[k + 1] as number).toBeLessThanOrEqual(p[k] as number);
      }),
    );
  });

  test('Chow, Maidment & Mays (1988) Example 14.4.1: 2 h Denver storm, 10-year, 10-minute blocks', () => {
    // The relation is the one the example states: i = 96.6 / (T_d^0.97 + 13.90),
    // i in in/h, T_d in min. The reference below is computed from it.
    const denver: Idf = { kind: 'a/(t^c+b)', a: 96.6, b: 13.9, c: 0.97, durationUnit: 'min', intensityUnit: 'in/h' };
    const storm = alternatingBlockStorm({ idf: denver, durationH: 2, stepH: 10 / 60 });
    const blocksIn = Array.from(storm.depthsMm, (d) => d / 25.4);

    // From the published formula, written out here: cumulative depth D_j (in)
    // for T_d = 10j min is i · T_d / 60.
    const cumulativeIn = Array.from({ length: 12 }, (_, j) => {
      const tdMin = 10 * (j + 1);
      return (96.6 / (Math.pow(tdMin, 0.97) + 13.9)) * (tdMin / 60);
    });
    const incrementsIn = cumulativeIn.map((d, j) => d - (j === 0 ? 0 : (cumulativeIn[j - 1] as number)));
    // Centred arrangement: peak in 50–60 min, then alternately right and left.
    const expectedOrder = [10, 8, 6, 4, 2, 0, 1, 3, 5, 7, 9, 11];
    expectedOrder.forEach((rank, bar) => expectClose(blocksIn[bar] as number, incrementsIn[rank] as number, 1e-12));

    // The book's table, FROM MEMORY (3 decimals): cumulative depths (in) for
    // 10, 20, …, 120 min. Its incremental column is the difference of these
    // rounded depths, so blocks are compared to within 0.001 in.
    const bookCumulativeIn = [0.693, 1.001, 1.178, 1.296, 1.379, 1.443, 1.492, 1.533, 1.566, 1.594, 1.618, 1.639];
    bookCumulativeIn.forEach((d, j) => expectClose(cumulativeIn[j] as number, d, 0, 0.0005));
    // The book's hyetograph, FROM MEMORY, 0–10 min first: peak 0.693 in at 50–60 min.
    const bookHyetographIn = [0.024, 0.033, 0.049, 0.083, 0.178, 0.693, 0.308, 0.117, 0.064, 0.041, 0.028, 0.021];
    bookHyetographIn.forEach((d, bar) => expectClose(blocksIn[bar] as number, d, 0, 0.001));
    expectClose(totalDepthMm(storm) / 25.4, 1.639, 0, 0.0005);
  });

  test('the bars all have the step duration and the storm keeps its start time', () => {
    const idf: Idf = { kind: 'a/(t+b)^c', a: 1500, b: 12, c: 0.75, durationUnit: 'min', intensityUnit: 'mm/h' }; // invented
    const storm = alternatingBlockStorm({ idf, durationH: 3, stepH: 0.25, startIso: '2026-02-01T06:00:00Z' });
    expect(Array.from(storm.durationsH)).toEqual(new Array(12).fill(0.25));
    expect(storm.startIso).toBe('2026-02-01T06:00:00Z');
    expect('startIso' in alternatingBlockStorm({ idf, durationH: 3, stepH: 0.25 })).toBe(false);
  });

  test('peak at 0 puts the largest block first and the rest in falling order', () => {
    const idf: Idf = { kind: 'a/(t+b)^c', a: 1500, b: 12, c: 0.75, durationUnit: 'min', intensityUnit: 'mm/h' }; // invented
    const p = Array.from(alternatingBlockStorm({ idf, durationH: 1, stepH: 1 / 6, peakFraction: 0 }).depthsMm);
    expect(p).toEqual([...p].sort((x, y) => y - x));
    expectClose(p[0] as number, idfDepthMm(idf, 1 / 6));
  });
});

describe('alternating block storm from an IDF table', () => {
  // Invented table, log–log slope steepening with duration (like a fitted curve).
  const table: IdfTable = {
    kind: 'table',
    durations: [5, 10, 30, 60, 120, 360],
    intensities: [150, 120, 70, 45, 28, 12],
    durationUnit: 'min',
    intensityUnit: 'mm/h',
  };

  test('durations on the table rows have their tabled depth in the central run, and the total is the 6-hour depth', () => {
    const storm = alternatingBlockStorm({ idf: table, durationH: 6, stepH: 5 / 60 });
    expectClose(totalDepthMm(storm), 12 * 6, 1e-9);
    // 72 bars of 5 min; rows at 5, 10, 30, 60, 120, 360 min are 1, 2, 6, 12, 24, 72 bars.
    [1, 2, 6, 12, 24, 72].forEach((bars, row) => {
      const depth = (table.intensities[row] as number) * ((table.durations[row] as number) / 60);
      expectClose(maxRunDepth(storm, bars), depth, 1e-9);
    });
  });

  test('a table whose log–log slope flattens still sums to the depth of the full duration, blocks falling from the peak', () => {
    // Invented: depth 20 mm in 10 min, 22 mm in 20 min, 36 mm in 60 min. The
    // log–log slope flattens at 20 min, so the 20–30 min block (4.4 mm) is
    // larger than the 10–20 min one (2 mm) and sorting moves it.
    const flattening: IdfTable = {
      kind: 'table',
      durations: [10, 20, 60],
      intensities: [120, 66, 36],
      durationUnit: 'min',
      intensityUnit: 'mm/h',
    };
    const storm = alternatingBlockStorm({ idf: flattening, durationH: 1, stepH: 10 / 60 });
    expectClose(totalDepthMm(storm), 36, 1e-9);
    const sorted = Array.from(storm.depthsMm).sort((x, y) => y - x);
    // Centred six bars: ranks at bars [5th, 3rd, 1st, 0th, 2nd, 4th].
    expect(Array.from(storm.depthsMm)).toEqual([4, 2, 0, 1, 3, 5].map((r) => sorted[r]));
    // The 20-minute depth (22 mm) is exceeded by the two largest blocks: documented behaviour.
    expect(maxRunDepth(storm, 2)).toBeGreaterThan(22 + 2);
  });

  test('a step shorter than the first row is refused on stepH, not extrapolated', () => {
    const error = thrown(() => alternatingBlockStorm({ idf: table, durationH: 1, stepH: 2 / 60 }));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('stepH');
    expect((error as InputError).message).toMatch(/from 5 to 360 min; 2 min is outside it/);
  });

  test('a storm longer than the last row is refused on durationH, not extrapolated', () => {
    const error = thrown(() => alternatingBlockStorm({ idf: table, durationH: 12, stepH: 1 }));
    expect((error as InputError).field).toBe('durationH');
    expect((error as InputError).message).toMatch(/720 min is outside it/);
  });
});

describe('alternating block storm refuses bad input, naming the field', () => {
  const idf: Idf = { kind: 'a/(t+b)^c', a: 1500, b: 12, c: 0.75, durationUnit: 'min', intensityUnit: 'mm/h' }; // invented

  test.each([
    [{ durationH: 0 }, 'durationH'],
    [{ durationH: Number.NaN }, 'durationH'],
    [{ stepH: 0 }, 'stepH'],
    [{ stepH: -0.5 }, 'stepH'],
    [{ stepH: 3 }, 'stepH'],
    [{ stepH: 0.3 }, 'stepH'],
    [{ stepH: 2 / MAX_DESIGN_BARS / 2 }, 'stepH'],
    [{ peakFraction: 2 }, 'peakFraction'],
    [{ startIso: 'next Tuesday' }, 'startIso'],
    [{ idf: { ...idf, c: 2 } }, 'c'],
  ])('%j is refused on %s', (patch, field) => {
    const error = thrown(() => alternatingBlockStorm({ idf, durationH: 2, stepH: 0.25, ...patch }));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe(field);
  });

  test('a duration that is a whole number of steps only to rounding is accepted', () => {
    // 7 × (1/7 h) is not exactly 1 in floating point.
    expect(alternatingBlockStorm({ idf, durationH: 1, stepH: 1 / 7 }).depthsMm.length).toBe(7);
  });
});
