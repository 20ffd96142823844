import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { parseClock, parseNumber } from '../../src/io';
import Papa from 'papaparse';
import { dateMs } from '../../src/io/time-values';
import { splitRows } from '../../src/io/table-text';

// The quick readers for plain cells (numbers.ts plainDecimal, time-values.ts
// plainIsoClock, dateMs in closed form) must give exactly what the general
// path gives. A leading space, or two spaces between date and time, sends a
// cell down the general path, so each cell is read both ways here.

describe('plain numbers read quickly read as the general pattern reads them', () => {
  test('digits with one mark and a sign', () => {
    let checked = 0;
    fc.assert(
      fc.property(
        fc.constantFrom('', '-', '+'),
        fc.string({ unit: fc.constantFrom('0', '1', '5', '9'), maxLength: 12 }),
        fc.option(fc.string({ unit: fc.constantFrom('0', '3', '7'), maxLength: 8 })),
        fc.constantFrom<'point' | 'comma'>('point', 'comma'),
        (sign, whole, fraction, decimal) => {
          const mark = decimal === 'point' ? '.' : ',';
          const cell = `${sign}${whole}${fraction === null ? '' : `${mark}${fraction}`}`;
          const quick = parseNumber(cell, decimal);
          const general = parseNumber(` ${cell}`, decimal);
          checked++;
          expect(Object.is(quick, general) || (Number.isNaN(quick) && Number.isNaN(general))).toBe(true);
        },
      ),
      { numRuns: 2000 },
    );
    expect(checked).toBe(2000);
  });

  test('worked cases', () => {
    expect(parseNumber('0.2', 'point')).toBe(0.2);
    expect(parseNumber('3,75', 'comma')).toBe(3.75);
    expect(parseNumber('-0', 'point')).toBe(0);
    expect(Object.is(parseNumber('-0', 'point'), -0)).toBe(false);
    expect(parseNumber('.', 'point')).toBeNaN();
    expect(parseNumber('-', 'point')).toBeNaN();
    expect(parseNumber('1.2.3', 'point')).toBeNaN();
    expect(parseNumber('5.', 'point')).toBe(5);
  });
});

describe('ISO date-times read quickly read as the general pattern reads them', () => {
  test('every field in and out of range', () => {
    const two = (n: number): string => String(n).padStart(2, '0');
    let checked = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 9999 }),
        fc.integer({ min: 0, max: 13 }),
        fc.integer({ min: 0, max: 32 }),
        fc.integer({ min: 0, max: 25 }),
        fc.integer({ min: 0, max: 60 }),
        fc.option(fc.integer({ min: 0, max: 60 })),
        fc.constantFrom(' ', 'T'),
        (y, mo, d, h, mi, sec, join) => {
          const date = `${String(y).padStart(4, '0')}-${two(mo)}-${two(d)}`;
          const time = `${two(h)}:${two(mi)}${sec === null ? '' : `:${two(sec)}`}`;
          const quick = parseClock(`${date}${join}${time}`, 'day-month');
          const general = parseClock(`${date}  ${time}`, 'day-month');
          checked++;
          expect(quick.ok).toBe(general.ok);
          if (quick.ok && general.ok) expect(quick.value).toEqual(general.value);
        },
      ),
      { numRuns: 3000 },
    );
    expect(checked).toBe(3000);
  });

  test('30 February and 29 February of a common year are refused; 29 February 2024 is read', () => {
    expect(parseClock('2023-02-30 10:00', 'day-month').ok).toBe(false);
    expect(parseClock('2023-02-29 10:00', 'day-month').ok).toBe(false);
    expect(parseClock('1900-02-29 10:00', 'day-month').ok).toBe(false);
    expect(parseClock('2000-02-29 10:00', 'day-month').ok).toBe(true);
    const leap = parseClock('2024-02-29T23:59:59', 'day-month');
    // 23 h 59 min 59 s = (23·60 + 59)·60 + 59 = 86,399 s
    expect(leap).toEqual({
      ok: true,
      value: { date: { year: 2024, month: 2, day: 29 }, hasTime: true, msOfDay: 86_399_000, zoneMinutes: null },
    });
  });
});

describe('dateMs in closed form', () => {
  test('agrees with the platform calendar (Date.UTC) from year 1 to 9999', () => {
    let checked = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 9999 }),
        fc.integer({ min: 1, max: 12 }),
        fc.integer({ min: 1, max: 28 }),
        (year, month, day) => {
          const d = new Date(0);
          d.setUTCFullYear(year, month - 1, day);
          checked++;
          expect(dateMs({ year, month, day })).toBe(d.getTime());
        },
      ),
      { numRuns: 3000 },
    );
    expect(checked).toBe(3000);
  });

  test('worked dates', () => {
    expect(dateMs({ year: 1970, month: 1, day: 1 })).toBe(0);
    // 2000-03-01: 30 years of 365 days + 7 leap days (72, 76, …, 96) = 10,957 days to 2000-01-01, + 31 + 29 = 11,017
    expect(dateMs({ year: 2000, month: 3, day: 1 })).toBe(11_017 * 86_400_000);
    // 1969-12-31 is the day before
    expect(dateMs({ year: 1969, month: 12, day: 31 })).toBe(-86_400_000);
  });
});

describe('text without quotes splits as papaparse splits it', () => {
  test('random cells, separators, blank cells and lines', () => {
    let checked = 0;
    fc.assert(
      fc.property(
        fc.string({ unit: fc.constantFrom('1', 'a', ' ', ',', ';', '\t', '\n', '.'), maxLength: 80, size: 'max' }),
        fc.constantFrom<'comma' | 'semicolon' | 'tab'>('comma', 'semicolon', 'tab'),
        (text, separator) => {
          const delimiter = { comma: ',', semicolon: ';', tab: '\t' }[separator];
          const ours = splitRows(text, separator).rows;
          const theirs = Papa.parse<string[]>(text, { delimiter, newline: '\n', skipEmptyLines: false }).data.map(
            (cells, k) => {
              const trimmed = cells.map((c) => c.trim());
              return { line: k + 1, cells: trimmed.every((c) => c === '') ? [] : trimmed };
            },
          );
          checked++;
          expect(ours).toEqual(theirs);
        },
      ),
      { numRuns: 2000 },
    );
    expect(checked).toBe(2000);
  });
});
