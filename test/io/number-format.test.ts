import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  GROUP_SPACE,
  NUMBER_FORMATS,
  numberFormat,
  quoteTyped,
  readNumber,
  writeNumber,
  type NumberFormat,
} from '../../src/io/number-format';

const COMMA_POINT = numberFormat('1,234.5');
const SPACE_POINT = numberFormat('1 234.5');
const SPACE_COMMA = numberFormat('1 234,5');
const POINT_COMMA = numberFormat('1.234,5');

const FIELD = { significant: 6 } as const;
const RESULT = { significant: 4, wholeFrom: 1000 } as const;

const value = (text: string, f: NumberFormat) => {
  const r = readNumber(text, f);
  return r.ok ? r.value : r.message;
};

describe('reading typed numbers under a number format', () => {
  it('reads thousands separators the way the screen writes them, never as a decimal mark', () => {
    // The defect: "45,000" read as 45 and "2,500" as 2.5 under a comma-grouping format.
    expect(value('45,000', COMMA_POINT)).toBe(45_000);
    expect(value('2,500', COMMA_POINT)).toBe(2_500);
    expect(value('1,234,567.25', COMMA_POINT)).toBe(1_234_567.25);
    expect(value('45 000', SPACE_POINT)).toBe(45_000);
    expect(value(`45${GROUP_SPACE}000,5`, SPACE_COMMA)).toBe(45_000.5);
    expect(value('45\u00a0000', SPACE_COMMA)).toBe(45_000);
    expect(value('45.000', POINT_COMMA)).toBe(45_000);
    expect(value('1.234.567,25', POINT_COMMA)).toBe(1_234_567.25);
  });

  it('reads plain numbers, signs, exponents and a bare or trailing decimal mark in every format', () => {
    for (const f of NUMBER_FORMATS) {
      const d = f.decimal;
      expect(value(' 12 ', f)).toBe(12);
      expect(value(`12${d}5`, f)).toBe(12.5);
      expect(value(`${d}5`, f)).toBe(0.5);
      expect(value(`3${d}`, f)).toBe(3);
      expect(value('-2', f)).toBe(-2);
      expect(value('\u22122', f)).toBe(-2);
      expect(value('+7', f)).toBe(7);
      expect(value(`1${d}5e3`, f)).toBe(1500);
      expect(value('2E-3', f)).toBe(0.002);
      expect(value('-0', f)).toBe(0);
    }
  });

  it('refuses a mark the format does not use, saying how to write it', () => {
    expect(value('2,5', COMMA_POINT)).toMatch(
      /^“2,5”: in the number format 1,234\.5 a comma stands only between groups of three digits \(1,234,567\) and decimals start with a point \(2\.5\)\.$/,
    );
    expect(value('2.5', SPACE_COMMA)).toBe(
      '“2.5” has a point, but the number format 1 234,5 writes decimals with a comma; write 2,5, or choose another number format.',
    );
    expect(value('2.5', POINT_COMMA)).toMatch(/^“2\.5”: in the number format 1\.234,5 a point stands only between/);
    expect(value('2,5', SPACE_POINT)).toMatch(/^“2,5” has a comma, but the number format 1 234\.5 writes decimals/);
  });

  it('refuses groups of other than three digits, two decimal marks, units, words and non-finite numbers', () => {
    expect(value('45,00', COMMA_POINT)).toMatch(/^“45,00”: in the number format/);
    expect(value('4,5000', COMMA_POINT)).toMatch(/^“4,5000”: in the number format/);
    expect(value('1.2.3', COMMA_POINT)).toMatch(/more than one point, or a mark out of place/);
    expect(value('1,234.5', POINT_COMMA)).toMatch(/^“1,234\.5”/);
    expect(value('12 mm', COMMA_POINT)).toBe('“12 mm” is not a plain number; leave out any unit or word.');
    expect(value('abc', COMMA_POINT)).toBe('“abc” is not a number.');
    expect(value('Infinity', COMMA_POINT)).toBe('“Infinity” is not a number.');
    expect(value('NaN', SPACE_COMMA)).toBe('“NaN” is not a number.');
    expect(value('1e999', COMMA_POINT)).toBe('“1e999” is too large to be a number here.');
    expect(value('', COMMA_POINT)).toBe('Enter a number.');
    expect(value('   ', COMMA_POINT)).toBe('Enter a number.');
  });

  it('refuses a space inside a number under a format that does not group with spaces, naming the space', () => {
    // The defect: "1 000" under 1,234.5 (and "0 1 2 1 0", ordinates pasted in one line) was told
    // "it has more than one point, or a mark out of place": there is no point in it.
    expect(value('1 000', COMMA_POINT)).toBe(
      '“1 000” has a space inside: the number format 1,234.5 groups digits with a comma (1,234,567) or not at all (1234567); type one number, without spaces.',
    );
    expect(value('0 1 2 1 0', POINT_COMMA)).toBe(
      '“0 1 2 1 0” has a space inside: the number format 1.234,5 groups digits with a point (1.234.567) or not at all (1234567); type one number, without spaces.',
    );
    expect(value('1\u00a0000', COMMA_POINT)).toMatch(/has a space inside/);
    // Under a format that groups with spaces, a space out of place keeps the grouping message.
    expect(value('1 00', SPACE_POINT)).toMatch(/^“1 00”: in the number format 1 234\.5 a space stands only between/);
  });

  it('quotes long typed text cut short, never three hundred digits back', () => {
    const long = `1${'0'.repeat(400)}`;
    const r = readNumber(long, COMMA_POINT);
    // 10^400 is past the largest double: refused, and quoted in 24 characters.
    expect(r).toEqual({ ok: false, message: `“1${'0'.repeat(22)}…” is too large to be a number here.` });
    expect(quoteTyped(' 12 ')).toBe('“12”');
  });
});

describe('writing numbers under a number format', () => {
  it('results: four significant figures, whole numbers from 1000, grouped as the format groups', () => {
    expect(writeNumber(41.6, COMMA_POINT, RESULT)).toBe('41.6');
    expect(writeNumber(19.7345, COMMA_POINT, RESULT)).toBe('19.73');
    expect(writeNumber(0.012345, COMMA_POINT, RESULT)).toBe('0.01235');
    // 115,031.7 mm rounds to the whole 115,032 (half away from zero at .7).
    expect(writeNumber(115_031.7, COMMA_POINT, RESULT)).toBe('115,032');
    expect(writeNumber(-1234.5, COMMA_POINT, RESULT)).toBe('-1,235');
    expect(writeNumber(50_000, SPACE_POINT, RESULT)).toBe(`50${GROUP_SPACE}000`);
    expect(writeNumber(1234.5, SPACE_COMMA, FIELD)).toBe(`1${GROUP_SPACE}234,5`);
    expect(writeNumber(1_234_567.5, POINT_COMMA, { significant: 8 })).toBe('1.234.567,5');
    expect(writeNumber(-0, COMMA_POINT, RESULT)).toBe('0');
  });

  it('never writes NaN, Infinity or dozens of digits: an exponent from 10¹⁵ and below 10⁻⁶', () => {
    expect(writeNumber(Number.NaN, COMMA_POINT, RESULT)).toBe('—');
    expect(writeNumber(Infinity, COMMA_POINT, RESULT)).toBe('—');
    expect(writeNumber(-Infinity, COMMA_POINT, FIELD)).toBe('—');
    expect(writeNumber(1e300, COMMA_POINT, RESULT)).toBe('1e300');
    expect(writeNumber(1.23456e15, COMMA_POINT, RESULT)).toBe('1.235e15');
    expect(writeNumber(1.5e-7, SPACE_COMMA, RESULT)).toBe('1,5e-7');
    expect(writeNumber(-2.5e20, POINT_COMMA, FIELD)).toBe('-2,5e20');
    expect(writeNumber(999_999_999_999_999, COMMA_POINT, FIELD)).toBe('1e15');
  });

  it('fields: six significant figures, grouped', () => {
    expect(writeNumber(8, COMMA_POINT, FIELD)).toBe('8');
    expect(writeNumber(14.6612345, COMMA_POINT, FIELD)).toBe('14.6612');
    expect(writeNumber(45_000, COMMA_POINT, FIELD)).toBe('45,000');
    expect(writeNumber(123_456.7, POINT_COMMA, FIELD)).toBe('123.457');
  });
});

/**
 * Doubles of every size the screen may meet, and the awkward ones: whole
 * numbers near the grouping boundaries, tiny and huge magnitudes.
 */
const anyFinite = fc.oneof(
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.double({ min: -1e6, max: 1e6, noNaN: true }),
  fc.integer({ min: -10_000_000, max: 10_000_000 }),
  fc.double({ min: 1e-9, max: 1e-3, noNaN: true }),
);

describe('format → read gives the value back, in every offered format (property)', () => {
  const RUNS = 2_000;

  it.each(NUMBER_FORMATS.map((f) => [f.id, f] as const))(
    '%s: a field’s text reads back as exactly the six-figure value it shows',
    (_id, format) => {
      let checked = 0;
      fc.assert(
        fc.property(anyFinite, (x) => {
          const shown = Number(x.toPrecision(6));
          const text = writeNumber(x, format, FIELD);
          const back = readNumber(text, format);
          checked++;
          expect(back, text).toEqual({ ok: true, value: Object.is(shown, -0) ? 0 : shown });
          expect(text.length).toBeLessThanOrEqual(24);
        }),
        { numRuns: RUNS, seed: 16_2026 },
      );
      expect(checked).toBeGreaterThanOrEqual(RUNS);
    },
  );

  it.each(NUMBER_FORMATS.map((f) => [f.id, f] as const))(
    '%s: a result’s text reads back within its rounding (half a unit in the last figure shown)',
    (_id, format) => {
      let checked = 0;
      fc.assert(
        fc.property(anyFinite, (x) => {
          const text = writeNumber(x, format, RESULT);
          const back = readNumber(text, format);
          checked++;
          if (!back.ok) throw new Error(`${text}: ${back.message}`);
          // Whole numbers from 1000 (below 10¹⁵) are off by at most 0.5; otherwise four figures, 5e-4 relative.
          const whole = Math.abs(x) >= 1000 && Math.abs(x) < 1e15;
          const allowed = whole ? 0.5 : 5e-4 * Math.abs(x) * (1 + 1e-12);
          expect(Math.abs(back.value - x), text).toBeLessThanOrEqual(allowed);
        }),
        { numRuns: RUNS, seed: 11_2026 },
      );
      expect(checked).toBeGreaterThanOrEqual(RUNS);
    },
  );
});
