import { describe, expect, it } from 'vitest';
import {
  describeSteps,
  formatAmount,
  formatDuration,
  formatIsoForPeople,
  isRegular,
  plural,
} from '../../src/io/describe';
import { numberFormat } from '../../src/io/number-format';

describe('formatDuration', () => {
  it('says durations the way people do', () => {
    expect(formatDuration(10 / 60)).toBe('10 min');
    expect(formatDuration(1)).toBe('1 h');
    expect(formatDuration(1.5)).toBe('1 h 30 min');
    expect(formatDuration(2.5 / 60)).toBe('2.5 min');
    expect(formatDuration(30 / 3600)).toBe('30 s');
    expect(formatDuration(48)).toBe('48 h');
  });

  it('hides the rounding of time arithmetic', () => {
    expect(formatDuration(0.1 + 0.2 - 0.3 + 1 / 6)).toBe('10 min');
  });
});

describe('describeSteps', () => {
  it('gives one step, or the range of an irregular one', () => {
    expect(describeSteps([1 / 6, 1 / 6])).toBe('10 min');
    expect(describeSteps([5 / 60, 25 / 60])).toBe('5 to 25 min (irregular steps)');
    expect(describeSteps([10 / 60, 1])).toBe('10 min to 1 h (irregular steps)');
    expect(isRegular([0.5, 0.5])).toBe(true);
    expect(isRegular([0.5, 0.25])).toBe(false);
  });
});

describe('formatAmount and formatIsoForPeople', () => {
  it('drops trailing zeros and seconds that are zero', () => {
    expect(formatAmount(41.6)).toBe('41.6');
    expect(formatAmount(41.604)).toBe('41.6');
    expect(formatAmount(-0)).toBe('0');
    // As the screen writes a result: whole and grouped from 1000 (115,031.7 rounds to 115,032).
    expect(formatAmount(115_031.7)).toBe('115,032');
    expect(formatAmount(115_031.7, numberFormat('1 234,5'))).toBe('115\u202f032');
    expect(formatDuration(50_000)).toBe('50,000 h');
    expect(plural(50_000, 'bar')).toBe('50,000 bars');
    expect(formatIsoForPeople('2024-05-01T10:00:00')).toBe('2024-05-01 10:00');
    expect(formatIsoForPeople('2024-05-01T10:00:30Z')).toBe('2024-05-01 10:00:30Z');
    expect(formatIsoForPeople('2024-05-01T10:00:00+10:00')).toBe('2024-05-01 10:00+10:00');
  });
});
