import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { DEFAULT_NUMBER_FORMAT, parseClock, parseNumber } from '../../src/io';
import { plainArray, plainNumberAt } from '../../src/io/plain-columns';
import { guessRainSettings, readPlainRain, readRainImport, type RainImportSettings } from '../../src/io/rain-import';
import { dateMs, plainIsoMsAt } from '../../src/io/time-values';
import { recordArbitrary, recordText } from '../helpers/plain-records';

// The columnar reader of long records (src/io/plain-columns.ts) must give
// exactly what the general reader gives, or nothing (null: the general
// reader then reads the text and words its problems). Each check below reads
// the same input both ways.

describe('a plain number read by position is the number the shared parser reads', () => {
  test('digits, one mark, a sign; short and long, both decimal marks', () => {
    let fast = 0;
    fc.assert(
      fc.property(
        fc.constantFrom('', '-', '+'),
        fc.string({ unit: fc.constantFrom('0', '1', '2', '5', '9'), maxLength: 30 }),
        fc.option(fc.string({ unit: fc.constantFrom('0', '3', '7', '9'), maxLength: 26 })),
        fc.constantFrom<'point' | 'comma'>('point', 'comma'),
        (sign, whole, fraction, decimal) => {
          const mark = decimal === 'point' ? '.' : ',';
          const cell = `${sign}${whole}${fraction === null ? '' : `${mark}${fraction}`}`;
          const ours = cell === '' ? NaN : plainNumberAt(cell, 0, cell.length, mark.charCodeAt(0));
          const shared = parseNumber(cell, decimal);
          // Ours leaves negative values (a problem to word) and unreadable cells to the general reader.
          if (Number.isNaN(shared) || shared < 0) expect(ours).toBeNaN();
          else {
            fast++;
            expect(Object.is(ours, shared)).toBe(true);
          }
        },
      ),
      { numRuns: 5000 },
    );
    expect(fast).toBeGreaterThan(2500);
  });

  test('worked cases: the division of exact doubles rounds as Number() does', () => {
    // 0.1 is not a double: 1 / 10 and Number('0.1') are the same nearest double.
    expect(plainNumberAt('0.1', 0, 3, 46)).toBe(0.1);
    // 123456789012345 (15 digits) / 10⁶ = 123456789.012345, the double nearest it.
    expect(plainNumberAt('123456789.012345', 0, 16, 46)).toBe(123456789.012345);
    // 17 digits go through Number(): 0.30000000000000004 is the double after 0.3.
    expect(plainNumberAt('0.30000000000000004', 0, 19, 46)).toBe(0.30000000000000004);
    expect(Object.is(plainNumberAt('-0.0', 0, 4, 46), 0)).toBe(true);
    expect(plainNumberAt('-1', 0, 2, 46)).toBeNaN();
    expect(plainNumberAt('1e3', 0, 3, 46)).toBeNaN();
    expect(plainNumberAt('2,5', 0, 3, 44)).toBe(2.5);
  });
});

describe('a plain ISO time read by position is the time the clock reader reads', () => {
  test('every field in and out of range; a number only where the clock reader reads the same time', () => {
    const two = (n: number): string => String(n).padStart(2, '0');
    let read = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 9999 }),
        fc.integer({ min: 0, max: 13 }),
        fc.integer({ min: 0, max: 32 }),
        fc.integer({ min: 0, max: 25 }),
        fc.integer({ min: 0, max: 60 }),
        fc.option(fc.integer({ min: 0, max: 60 })),
        fc.constantFrom(' ', 'T', '_'),
        (y, mo, d, h, mi, sec, join) => {
          const cell = `${String(y).padStart(4, '0')}-${two(mo)}-${two(d)}${join}${two(h)}:${two(mi)}${sec === null ? '' : `:${two(sec)}`}`;
          const ours = plainIsoMsAt(cell, 0, cell.length);
          const general = parseClock(cell, 'day-month');
          // NaN leaves the cell to the general reader (it also reads "24:00", the end of a day, which ours does not).
          if (Number.isNaN(ours)) return;
          read++;
          expect(general.ok && general.value.date !== null).toBe(true);
          if (general.ok && general.value.date !== null) {
            expect(ours).toBe(dateMs(general.value.date) + general.value.msOfDay);
          }
        },
      ),
      { numRuns: 4000 },
    );
    expect(read).toBeGreaterThan(1000);
  });
});

describe('the columnar reader gives what the general reader gives, or leaves the text to it', () => {
  test('random records, clean and flawed, under their guessed settings and a few changed ones', () => {
    let accepted = 0;
    let runs = 0;
    fc.assert(
      fc.property(
        recordArbitrary,
        fc.record({
          valueKind: fc.constantFrom<RainImportSettings['valueKind'] | null>(null, null, 'intensity', 'cumulative'),
          timeMarks: fc.constantFrom<RainImportSettings['timeMarks'] | null>(null, 'start'),
          gaps: fc.constantFrom<RainImportSettings['gaps'] | null>(null, 'keep'),
          cumulativeFrom: fc.constantFrom<RainImportSettings['cumulativeFrom']>('zero', 'first-value'),
        }),
        (record, change) => {
          runs++;
          const text = recordText(record);
          const guessed = guessRainSettings(text);
          const settings: RainImportSettings = {
            ...guessed,
            ...(change.valueKind === null
              ? {}
              : { valueKind: change.valueKind, cumulativeFrom: change.cumulativeFrom }),
            ...(change.timeMarks === null ? {} : { timeMarks: change.timeMarks }),
            ...(change.gaps === null ? {} : { gaps: change.gaps }),
          };
          const plain = readPlainRain(text, settings, DEFAULT_NUMBER_FORMAT, 50);
          const general = readRainImport(text, settings, DEFAULT_NUMBER_FORMAT);
          if (plain === null) return;
          accepted++;
          expect(general.result.ok).toBe(true);
          if (!general.result.ok) return;
          const storm = general.result.storm;
          expect(plainArray(plain.storm.durationsH)).toEqual(storm.durationsH);
          expect(plainArray(plain.storm.depthsMm)).toEqual(storm.depthsMm);
          expect(plain.storm.startIso).toBe(storm.startIso);
          expect(plain.summary).toBe(general.result.summary);
          expect(plain.header).toEqual(general.preview.header);
          expect(plain.rows).toEqual(general.preview.rows.slice(0, 50));
          expect(plain.rowCount).toBe(general.preview.rows.length);
          expect(plain.columnCount).toBe(general.preview.columnCount);
        },
      ),
      { numRuns: 1500 },
    );
    expect(runs).toBe(1500);
    // Most clean records are for the columnar reader; a test that never used it would prove nothing.
    expect(accepted).toBeGreaterThan(400);
  });

  test('a flaw anywhere leaves the whole text to the general reader, which names its line', () => {
    const lines = ['Time,Rain (mm)'];
    for (let k = 1; k <= 500; k++)
      lines.push(
        `2024-03-01 ${String(Math.floor(k / 60) % 24).padStart(2, '0')}:${String(k % 60).padStart(2, '0')},0.2`,
      );
    lines[321] = '2024-03-01 05:21,0.2mm';
    const text = lines.join('\n');
    const settings = guessRainSettings(text);
    expect(readPlainRain(text, settings, DEFAULT_NUMBER_FORMAT, 50)).toBeNull();
    const general = readRainImport(text, settings, DEFAULT_NUMBER_FORMAT);
    expect(general.result.ok).toBe(false);
    // lines[321] is line 322 of the text (line 1 is the header), column 2
    expect(general.result.problems[0]).toMatchObject({ row: 322, column: 2, value: '0.2mm' });
  });
});
