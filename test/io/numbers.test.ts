import { describe, expect, it } from 'vitest';
import { detectDecimal, isMissingCell, notANumberReason, parseNumber } from '../../src/io/numbers';

describe('parseNumber', () => {
  it('reads plain numbers with a decimal point', () => {
    expect(parseNumber('41.6', 'point')).toBe(41.6);
    expect(parseNumber(' 0.25 ', 'point')).toBe(0.25);
    expect(parseNumber('.5', 'point')).toBe(0.5);
    expect(parseNumber('3.', 'point')).toBe(3);
    expect(parseNumber('+2', 'point')).toBe(2);
    expect(parseNumber('-1.5', 'point')).toBe(-1.5);
    expect(parseNumber('1.2e-3', 'point')).toBe(0.0012);
  });

  it('reads decimal commas only when the mark is a comma', () => {
    expect(parseNumber('0,4', 'comma')).toBe(0.4);
    expect(parseNumber('12,75', 'comma')).toBe(12.75);
    expect(parseNumber('7', 'comma')).toBe(7);
    expect(parseNumber('0,4', 'point')).toBeNaN();
    expect(parseNumber('0.4', 'comma')).toBeNaN();
  });

  it('takes the unicode minus some spreadsheets write as a minus sign', () => {
    expect(parseNumber('\u22122.5', 'point')).toBe(-2.5);
  });

  it('refuses anything that is not one plain finite number', () => {
    for (const cell of [
      '',
      ' ',
      'abc',
      '1.2mm',
      '1,234.5',
      '1 234',
      '1e999',
      'Infinity',
      'NaN',
      '0x10',
      '1.2.3',
      '--1',
      '1e',
    ]) {
      expect(parseNumber(cell, 'point'), cell).toBeNaN();
    }
  });
});

describe('notANumberReason', () => {
  it('says a value is missing for empty cells and usual missing markers', () => {
    for (const cell of ['', '-', '---', 'NA', 'n/a', '#N/A', 'null']) {
      expect(isMissingCell(cell), cell).toBe(true);
      expect(notANumberReason(cell, 'point')).toBe('the value is missing.');
    }
  });

  it('points at the decimal-mark setting when the other mark is used', () => {
    expect(notANumberReason('0,4', 'point')).toMatch(/decimal comma but the decimal mark is set to a point/);
    expect(notANumberReason('0.4', 'comma')).toMatch(/decimal point but the decimal mark is set to a comma/);
  });

  it('names both readings of a comma before three digits', () => {
    expect(notANumberReason('1,234', 'point')).toMatch(/decimal comma.*thousands/);
  });

  it('recognises thousands separators, trailing units and overflow', () => {
    expect(notANumberReason('1,234.5', 'point')).toMatch(/thousands separators/);
    expect(notANumberReason('1.234,5', 'comma')).toMatch(/thousands separators/);
    expect(notANumberReason('1.2 mm', 'point')).toMatch(/remove any unit/);
    expect(notANumberReason('1e999', 'point')).toMatch(/too large/);
    expect(notANumberReason('wet', 'point')).toBe('not a number.');
  });
});

describe('detectDecimal', () => {
  it('goes with the mark most cells use', () => {
    expect(detectDecimal(['0,4', '1,2', '3'], false)).toBe('comma');
    expect(detectDecimal(['0.4', '1.2', '0,5'], false)).toBe('point');
  });

  it('does not mistake dates or times for decimals', () => {
    expect(detectDecimal(['01.05.2024 10:00', '0,4', '01.05.2024 10:10', '0,8'], false)).toBe('comma');
  });

  it('keeps the point when there is nothing to go on, and with comma-separated cells', () => {
    expect(detectDecimal(['1', '2', 'Time'], false)).toBe('point');
    expect(detectDecimal(['0,4', '1,2'], true)).toBe('point');
  });
});
