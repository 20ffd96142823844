import { describe, expect, it } from 'vitest';
import {
  FIRST_CLOCK_YEAR,
  LAST_CLOCK_YEAR,
  MAX_RECORD_H,
  MIN_STEP_H,
  describeHours,
  emptyStorm,
  resampleStorm,
  stepCount,
  validateHydrograph,
  validateStorm,
  wallClockMs,
  wallClockParts,
  withBarStartH,
} from '../../src/core';
import { expectInputError } from '../helpers/input-error';

// The limits of time (src/core/time-limits.ts): a record spans at most 500
// years of 365.25 days, a bar or sample step lasts at least a second, and a
// start clock falls in the years 1000 to 2999.

describe('the limits of time', () => {
  it('are 500 Julian years and one second', () => {
    // 500 × 365.25 d × 24 h = 500 × 8766 h = 4,383,000 h.
    expect(MAX_RECORD_H).toBe(4_383_000);
    expect(MIN_STEP_H * 3600).toBeCloseTo(1, 15);
    expect([FIRST_CLOCK_YEAR, LAST_CLOCK_YEAR]).toEqual([1000, 2999]);
  });

  it('keep every moment a record may reach far inside the browser’s date range', () => {
    // The furthest moments: a start clock at either end of its years, moved by an offset of 500 years
    // and a record of 500 years: 1000 years of 365.25 days = 365,250 days, 7.5 days more than 1000
    // Gregorian years (365.2425 days each), so from 31 Dec 2999 to early January 4000 and from
    // 1 Jan 1000 back to late December of the year −1 (proleptic Gregorian, astronomical year numbers);
    // some 6.4·10¹³ ms from 1970, against the Date range of 8.64·10¹⁵ ms.
    const reach = 2 * MAX_RECORD_H * 3.6e6;
    const last = wallClockParts((wallClockMs(`${LAST_CLOCK_YEAR}-12-31T23:59`) as number) + reach);
    const first = wallClockParts((wallClockMs(`${FIRST_CLOCK_YEAR}-01-01T00:00`) as number) - reach);
    expect(last?.year).toBe(4000);
    expect(first?.year).toBe(-1);
  });

  it('write spans in words a person reads at a glance', () => {
    expect(describeHours(0.5 / 3600)).toBe('0.5 s');
    expect(describeHours(0.25)).toBe('15 min');
    expect(describeHours(36)).toBe('36 h');
    expect(describeHours(24 * 4.5)).toBe('4.5 days');
    // 10¹² min = 1.6667·10¹⁰ h; / 8766 h a year = 1.901·10⁶ years.
    expect(describeHours(1e12 / 60)).toBe('1,901,000 years');
    expect(describeHours(Number.NaN)).toBe('NaN');
  });
});

describe('a storm is held to the limits of time', () => {
  it('takes bars of exactly one second and one storm of exactly 500 years', () => {
    expect(() => validateStorm({ durationsH: [1 / 3600, 1 / 3600], depthsMm: [0, 1] })).not.toThrow();
    expect(() => validateStorm({ durationsH: [MAX_RECORD_H], depthsMm: [3] })).not.toThrow();
    expect(() =>
      validateStorm({
        durationsH: [MAX_RECORD_H / 2, MAX_RECORD_H / 2],
        depthsMm: [3, 0],
        startIso: '2999-12-31T23:59',
      }),
    ).not.toThrow();
  });

  it('refuses a bar under a second, naming the bar', () => {
    const e = expectInputError(
      () => validateStorm({ durationsH: [1, 0.5 / 3600], depthsMm: [1, 1] }),
      'durationsH',
      /^Bar 2: duration must be at least 1 second \(got 0\.5 s\); check the unit\.$/,
    );
    expect(e.index).toBe(1);
  });

  it('refuses a bar of 10¹² minutes, naming the bar and quoting the value', () => {
    // 10¹² min / 60 = 16,666,666,666.667 h.
    const e = expectInputError(
      () => validateStorm({ durationsH: [1, 1e12 / 60], depthsMm: [1, 1], startIso: '2026-07-14T15:00' }),
      'durationsH',
      /^Bar 2: duration must be at most 500 years, 4,383,000 h \(got 16,666,666,666\.667 h, 1,901,000 years\)/,
    );
    expect(e.index).toBe(1);
  });

  it('refuses a storm whose bars add up past 500 years, naming the bar where it passes', () => {
    const e = expectInputError(
      () => validateStorm({ durationsH: [MAX_RECORD_H / 2, MAX_RECORD_H / 2, 1], depthsMm: [0, 0, 0] }),
      'durationsH',
      /^Bar 3: the storm would run 4,383,001 h, 500 years from its start; a record spans at most 500 years \(4,383,000 h\)\.$/,
    );
    expect(e.index).toBe(2);
  });

  it.each([
    ['0999-12-31T23:59', '0999'],
    ['3000-01-01T00:00', '3000'],
    ['0024-05-01T10:00', '0024'],
  ])('refuses a start clock of %s, naming the start and the years it may have', (startIso, year) => {
    expectInputError(
      () => validateStorm({ durationsH: [1], depthsMm: [1], startIso }),
      'startIso',
      new RegExp(
        `^The storm start "${startIso}" is in the year ${year}; a start clock falls in the years 1000 to 2999\\.$`,
      ),
    );
  });
});

describe('a streamflow record is held to the limits of time', () => {
  const flat = (timesH: number[]) => ({ timesH, dischargeM3s: timesH.map(() => 1) });

  it('takes samples a second apart and a record of exactly 500 years', () => {
    expect(() => validateHydrograph(flat([0, 1 / 3600, 2 / 3600]))).not.toThrow();
    expect(() => validateHydrograph(flat([0, MAX_RECORD_H]))).not.toThrow();
    // A second computed as the difference of two times near 4·10⁶ h still counts as a second.
    expect(() => validateHydrograph(flat([4_382_000, 4_382_000 + 1 / 3600]))).not.toThrow();
  });

  it('refuses samples closer than a second, naming the sample', () => {
    const e = expectInputError(
      () => validateHydrograph(flat([0, 1, 1 + 0.1 / 3600])),
      'timesH',
      /^Sample 3: it comes 0\.1 s after sample 2; samples are at least 1 second apart\.$/,
    );
    expect(e.index).toBe(2);
  });

  it('refuses a record of 3·10⁹ h, naming the sample', () => {
    const e = expectInputError(
      () => validateHydrograph(flat([0, 3e9])),
      'timesH',
      /^Sample 2: time 342,200 years is further from the first sample than a record spans/,
    );
    expect(e.index).toBe(1);
  });

  it('refuses a record that runs past 500 years from its first sample', () => {
    expectInputError(
      () => validateHydrograph(flat([-MAX_RECORD_H / 2 - 1, MAX_RECORD_H / 2 + 1])),
      'timesH',
      /^Sample 2: the record would run 4,383,002 h, 500 years from its first sample/,
    );
  });
});

describe('the storm tools and design storms are held to the limits of time', () => {
  it('refuse a time step under a second or over 500 years, naming the step', () => {
    expectInputError(() => resampleStorm({ durationsH: [1], depthsMm: [1] }, 0.9 / 3600), 'stepH', /at least 1 second/);
    expectInputError(() => emptyStorm(1e12 / 60, 1), 'stepH', /^The time step must be at most 500 years/);
    expectInputError(() => stepCount(1e12 / 60, 1), 'durationH', /^The storm duration must be at most 500 years/);
    expectInputError(() => stepCount(1, 0.5 / 3600), 'stepH', /^The time step must be at least 1 second/);
  });

  it('refuse a new empty storm longer than 500 years, naming the number of bars', () => {
    // 1,000,000 bars of 5 h = 5,000,000 h > 4,383,000 h.
    expectInputError(() => emptyStorm(5, 1_000_000), 'count', /^1000000 bars of 5 h would last 570\.4 years/);
  });

  it('resampling joins a remainder under a second to the bar before it', () => {
    // 1 h + 0.5 s in 10-minute steps: six bars, the last 10 min 0.5 s long, the total kept.
    const storm = { durationsH: [1 + 0.5 / 3600], depthsMm: [6] };
    const out = resampleStorm(storm, 10 / 60);
    expect(out.durationsH.length).toBe(6);
    expect((out.durationsH[5] as number) * 3600).toBeCloseTo(600.5, 9);
    expect(() => validateStorm(out)).not.toThrow();
  });

  it('moving a bar boundary refuses to leave a bar under a second', () => {
    expectInputError(
      () => withBarStartH({ durationsH: [1, 1], depthsMm: [1, 1] }, 1, 2 - 0.5 / 3600),
      'durationsH',
      /^Bar 2 would last less than a second/,
    );
  });
});

describe('clock readings', () => {
  it('read the years 0 to 99 as written, not as 1900 to 1999', () => {
    // Date.UTC(50, 0, 1) is 1950; the reading of "0050-01-01" must be the year 50.
    expect(wallClockParts(wallClockMs('0050-01-01T00:00') as number)?.year).toBe(50);
  });

  it('give no calendar fields for a moment past the browser’s date range, or not a number', () => {
    expect(wallClockParts(8.64e15)?.year).toBe(275760);
    for (const ms of [8.64e15 + 1, -8.64e15 - 1, 1e300, Infinity, Number.NaN]) expect(wallClockParts(ms)).toBeNull();
  });
});
