import { afterEach, describe, expect, it } from 'vitest';
import { formatForField, formatPercent, formatValue } from '../../src/ui/format';
import { chooseNumberFormat } from '../../src/ui/number-format';
import { parseNumber } from '../../src/ui/parse-number';
import { formatDuration } from '../../src/ui/rainfall/RainfallToolbar';

describe('reading typed numbers (in the reader’s number format; 1,234.5 unless chosen)', () => {
  afterEach(() => chooseNumberFormat('1,234.5'));

  it('accepts a decimal point, thousands separators, spaces and exponents', () => {
    expect(parseNumber(' 12.5 ')).toEqual({ ok: true, value: 12.5 });
    expect(parseNumber('45,000')).toEqual({ ok: true, value: 45_000 });
    expect(parseNumber('.5')).toEqual({ ok: true, value: 0.5 });
    expect(parseNumber('3.')).toEqual({ ok: true, value: 3 });
    expect(parseNumber('-2')).toEqual({ ok: true, value: -2 });
    expect(parseNumber('1e3')).toEqual({ ok: true, value: 1000 });
  });
  it('reads a decimal comma once the format has one', () => {
    chooseNumberFormat('1 234,5');
    expect(parseNumber('12,5')).toEqual({ ok: true, value: 12.5 });
    expect(parseNumber('45 000')).toEqual({ ok: true, value: 45_000 });
    expect(parseNumber('12.5').ok).toBe(false);
  });
  it('refuses anything else, quoting it', () => {
    expect(parseNumber('')).toEqual({ ok: false, message: 'Enter a number.' });
    expect(parseNumber('abc')).toEqual({ ok: false, message: '“abc” is not a number.' });
    expect(parseNumber('12,5').ok).toBe(false);
    expect(parseNumber('1,2,3').ok).toBe(false);
    expect(parseNumber('12 mm').ok).toBe(false);
    expect(parseNumber('Infinity').ok).toBe(false);
    expect(parseNumber('1e999')).toEqual({ ok: false, message: '“1e999” is too large to be a number here.' });
  });
});

describe('formatting', () => {
  it('results show four significant figures, whole numbers from 1000', () => {
    expect(formatValue(41.6)).toBe('41.6');
    expect(formatValue(19.7345)).toBe('19.73');
    expect(formatValue(0.012345)).toBe('0.01235');
    expect(formatValue(69973.4)).toBe('69,973');
    expect(formatValue(-0)).toBe('0');
    expect(formatValue(Number.NaN)).toBe('—');
    expect(formatPercent(0.5256)).toBe('52.56 %');
  });
  it('fields show up to six significant figures that read back as typed', () => {
    expect(formatForField(8)).toBe('8');
    expect(formatForField(14.6612345)).toBe('14.6612');
    expect(formatForField(0.1968503937)).toBe('0.19685');
    expect(formatForField(123456.7)).toBe('123,457');
    expect(parseNumber(formatForField(123456.7))).toEqual({ ok: true, value: 123_457 });
    expect(formatValue(1e300)).toBe('1e300');
    expect(formatForField(Number.POSITIVE_INFINITY)).toBe('');
  });
  it('durations read in minutes and hours', () => {
    expect(formatDuration(10 / 60)).toBe('10 min');
    expect(formatDuration(18 * (10 / 60))).toBe('3 h');
    expect(formatDuration(1.5)).toBe('1 h 30 min');
  });
  it('durations under a minute read in seconds, as a 1-s logger’s bars are', () => {
    // 1 s = 1/3600 h; in minutes it is 0.01667, which read as "0.017 min" (1.02 s).
    expect(formatDuration(1 / 3600)).toBe('1 s');
    expect(formatDuration(30 / 3600)).toBe('30 s');
    expect(formatDuration(0.5 / 3600)).toBe('0.5 s');
    // 59.5 s stays in seconds; a whole minute is a minute.
    expect(formatDuration(59.5 / 3600)).toBe('59.5 s');
    expect(formatDuration(1 / 60)).toBe('1 min');
  });
});
