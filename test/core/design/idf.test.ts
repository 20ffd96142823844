import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  InputError,
  idfDepthMm,
  idfIntensityMmH,
  idfRangeH,
  validateIdf,
  type Idf,
  type IdfTable,
} from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';
import { thrown } from '../../helpers/thrown';

// Coefficients in this file are invented for the tests unless a source is named.

function fieldOf(fn: () => unknown): string | undefined {
  const error = thrown(fn);
  expect(error).toBeInstanceOf(InputError);
  return (error as InputError).field;
}

describe('IDF formulas', () => {
  test('a/(t+b)^c is evaluated with t in its own unit and gives mm/h', () => {
    // Invented: a = 1000, b = 10 min, c = 1 → at 30 min, 1000 / 40 = 25 mm/h.
    const idf: Idf = { kind: 'a/(t+b)^c', a: 1000, b: 10, c: 1, durationUnit: 'min', intensityUnit: 'mm/h' };
    expectClose(idfIntensityMmH(idf, 0.5), 25);
    // Depth is intensity × duration: 25 mm/h over 0.5 h.
    expectClose(idfDepthMm(idf, 0.5), 12.5);
  });

  test('a/(t+b)^c with t in hours and intensity in in/h converts at 25.4 mm per inch', () => {
    // Invented: 10 / (4 + 0)^0.5 = 5 in/h = 127 mm/h.
    const idf: Idf = { kind: 'a/(t+b)^c', a: 10, b: 0, c: 0.5, durationUnit: 'h', intensityUnit: 'in/h' };
    expectClose(idfIntensityMmH(idf, 4), 127);
  });

  test('a/(t^c+b) with t in minutes: 100 min, c = 0.5, b = 15 gives a / 25', () => {
    // Invented: 100^0.5 + 15 = 25, so 50 / 25 = 2 mm/h.
    const idf: Idf = { kind: 'a/(t^c+b)', a: 50, b: 15, c: 0.5, durationUnit: 'min', intensityUnit: 'mm/h' };
    expectClose(idfIntensityMmH(idf, 100 / 60), 2);
  });

  test('the Denver 10-year relation of Chow, Maidment & Mays (1988) Example 14.4.1 gives its tabled intensities', () => {
    // Relation i = 96.6 / (T_d^0.97 + 13.90), i in in/h, T_d in min, as stated
    // in the example. Tabled intensities (in/h, 3 decimals) FROM MEMORY of the
    // book's table: 10 min 4.158, 60 min 1.443, 120 min 0.820.
    const denver: Idf = { kind: 'a/(t^c+b)', a: 96.6, b: 13.9, c: 0.97, durationUnit: 'min', intensityUnit: 'in/h' };
    const inH = (minutes: number): number => idfIntensityMmH(denver, minutes / 60) / 25.4;
    expectClose(inH(10), 4.158, 0, 0.0005);
    expectClose(inH(60), 1.443, 0, 0.0005);
    expectClose(inH(120), 0.82, 0, 0.0005);
  });

  test('formulas cover every positive duration', () => {
    const idf: Idf = { kind: 'a/(t+b)^c', a: 1000, b: 10, c: 0.8, durationUnit: 'min', intensityUnit: 'mm/h' };
    expect(idfRangeH(idf)).toEqual({ minH: 0, maxH: Infinity });
    expect(idfIntensityMmH(idf, 1e-6)).toBeGreaterThan(0);
    expect(idfIntensityMmH(idf, 1e4)).toBeGreaterThan(0);
  });
});

describe('IDF tables', () => {
  // Invented table: 10 min 100 mm/h, 40 min 50 mm/h, 2 h 25 mm/h.
  const table: IdfTable = {
    kind: 'table',
    durations: [10, 40, 120],
    intensities: [100, 50, 25],
    durationUnit: 'min',
    intensityUnit: 'mm/h',
  };

  test('a table gives its own rows exactly', () => {
    expect(idfIntensityMmH(table, 10 / 60)).toBe(100);
    expect(idfIntensityMmH(table, 40 / 60)).toBe(50);
    expect(idfIntensityMmH(table, 2)).toBe(25);
  });

  test('between rows it interpolates on log–log axes: half way in log t is the geometric mean', () => {
    // 20 min is the log midpoint of 10 and 40 min, so i = √(100 · 50) = 70.71… mm/h
    // (a straight line on log–log axes; a straight line on linear axes would give 86.67).
    expectClose(idfIntensityMmH(table, 20 / 60), Math.sqrt(100 * 50));
    // 80 min: log-fraction ln(2)/ln(3) of the way from 40 to 120 min.
    expectClose(idfIntensityMmH(table, 80 / 60), 50 * Math.pow(0.5, Math.log(2) / Math.log(3)));
  });

  test('a table sampled from a power law reproduces the law anywhere between its rows', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 500, noNaN: true }),
        fc.double({ min: -0.95, max: 0, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (k, m, u) => {
          const rows = [5, 15, 60, 360];
          const law = (tMin: number): number => k * Math.pow(tMin, m);
          const idf: IdfTable = {
            kind: 'table',
            durations: rows,
            intensities: rows.map(law),
            durationUnit: 'min',
            intensityUnit: 'mm/h',
          };
          const tMin = 5 * Math.pow(360 / 5, u);
          expectClose(idfIntensityMmH(idf, tMin / 60), law(tMin), 1e-9);
        },
      ),
    );
  });

  test('a table in hours and in/h converts both', () => {
    const idf: IdfTable = {
      kind: 'table',
      durations: [1, 4],
      intensities: [2, 1],
      durationUnit: 'h',
      intensityUnit: 'in/h',
    };
    // 2 h is the log midpoint: √(2 · 1) in/h.
    expectClose(idfIntensityMmH(idf, 2), Math.SQRT2 * 25.4);
  });

  test('a duration shorter than the first row is refused, not extrapolated', () => {
    const error = thrown(() => idfIntensityMmH(table, 5 / 60));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('durationH');
    expect((error as InputError).message).toMatch(/from 10 to 120 min; 5 min is outside it/);
    expect((error as InputError).message).toMatch(/not extrapolated/);
  });

  test('a duration longer than the last row is refused, not extrapolated', () => {
    expect(fieldOf(() => idfDepthMm(table, 3))).toBe('durationH');
  });

  test('the table range is reported in hours', () => {
    expect(idfRangeH(table)).toEqual({ minH: 10 / 60, maxH: 2 });
  });
});

describe('IDF validation names the bad field', () => {
  const good: Idf = { kind: 'a/(t+b)^c', a: 1000, b: 10, c: 0.8, durationUnit: 'min', intensityUnit: 'mm/h' };
  const goodTable: IdfTable = {
    kind: 'table',
    durations: [10, 60],
    intensities: [100, 30],
    durationUnit: 'min',
    intensityUnit: 'mm/h',
  };
  const bad = (patch: Record<string, unknown>, base: Idf = good): Idf => ({ ...base, ...patch }) as unknown as Idf;

  test('good relations pass', () => {
    expect(() => validateIdf(good)).not.toThrow();
    expect(() => validateIdf(goodTable)).not.toThrow();
  });

  test.each([
    [{ kind: 'power' }, 'kind'],
    [{ durationUnit: 's' }, 'durationUnit'],
    [{ intensityUnit: 'cm/h' }, 'intensityUnit'],
    [{ a: 0 }, 'a'],
    [{ a: Number.NaN }, 'a'],
    [{ b: -1 }, 'b'],
    [{ b: Infinity }, 'b'],
    [{ c: 0 }, 'c'],
    [{ c: 1.2 }, 'c'],
    [{ c: '0.8' }, 'c'],
    [{ c: 1, b: 0 }, 'b'],
  ])('formula %j is refused on %s', (patch, field) => {
    expect(fieldOf(() => validateIdf(bad(patch)))).toBe(field);
    expect(fieldOf(() => validateIdf(bad({ ...patch, kind: (patch as { kind?: string }).kind ?? 'a/(t^c+b)' })))).toBe(
      field,
    );
  });

  test.each([
    [{ durations: [10], intensities: [100] }, 'durations', undefined],
    [{ intensities: [100, 30, 20] }, 'intensities', undefined],
    [{ durations: [0, 60] }, 'durations', 0],
    [{ durations: [10, 10] }, 'durations', 1],
    [{ durations: [60, 10] }, 'durations', 1],
    [{ intensities: [100, -1] }, 'intensities', 1],
    [{ intensities: [100, Number.NaN] }, 'intensities', 1],
    [{ intensities: [30, 100] }, 'intensities', 1],
    // 100 mm/h for 10 min and 16 mm/h for 60 min: 16.7 mm then 16 mm, depth falls.
    [{ intensities: [100, 16] }, 'intensities', 1],
  ])('table %j is refused on %s (row index %s)', (patch, field, index) => {
    const error = thrown(() => validateIdf(bad(patch, goodTable)));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe(field);
    expect((error as InputError).index).toBe(index);
  });

  test('a table whose intensity falls exactly as 1/t (same depth at every row) is refused', () => {
    // 100 mm/h · 10 min = 50 mm/h · 20 min: the rain would stop after 10 min.
    expect(fieldOf(() => validateIdf(bad({ durations: [10, 20], intensities: [100, 50] }, goodTable)))).toBe(
      'intensities',
    );
  });

  test('a missing relation is refused', () => {
    expect(fieldOf(() => validateIdf(undefined as unknown as Idf))).toBe('idf');
  });
});
