import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  FIRST_CLOCK_YEAR,
  LAST_CLOCK_YEAR,
  daysInMonth,
  hoursBetweenClocks,
  instantMs,
  isLeapYear,
  readIsoDateTime,
  validateStorm,
  wallClockMs,
} from '../../src/core';
import { isIsoDateTime } from '../../src/scenario/iso-date-time';

// The one strict reader of ISO 8601 date-times (src/core/wall-clock.ts).
// Calendar rules: ISO 8601-1:2019 §4.2 (Gregorian calendar, leap years).

describe('month lengths and leap years', () => {
  it('follows the Gregorian rule: every 4th year, not every 100th, every 400th', () => {
    expect([1900, 2000, 2023, 2024, 2100, 2400].map(isLeapYear)).toEqual([false, true, false, true, false, true]);
    expect(daysInMonth(2024, 2)).toBe(29);
    expect(daysInMonth(2023, 2)).toBe(28);
    expect(daysInMonth(1900, 2)).toBe(28);
    expect(daysInMonth(2000, 2)).toBe(29);
    expect([1, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12].map((m) => daysInMonth(2026, m))).toEqual([
      31, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31,
    ]);
    expect(daysInMonth(2026, 13)).toBe(0);
  });
});

describe('reading a date-time', () => {
  it('refuses 30 February, 29 February of a common year, and fields out of range', () => {
    for (const bad of [
      '2026-02-30T10:00',
      '2023-02-29T00:00',
      '1900-02-29T00:00',
      '2026-04-31T00:00',
      '2026-13-01T00:00',
      '2026-00-10T00:00',
      '2026-01-00T00:00',
      '2026-01-01T24:00',
      '2026-01-01T10:60',
      '2026-01-01T10:00:60',
      '2026-01-01T10:00+24:00',
      '2026-01-01T10:00+10:60',
      '2026-01-01 10:00',
      '14/07/2026',
      '',
    ]) {
      expect(readIsoDateTime(bad), bad).toBeNull();
      expect(wallClockMs(bad), bad).toBeNull();
    }
    expect(readIsoDateTime('2024-02-29T23:59:59')).not.toBeNull();
    expect(readIsoDateTime('2000-02-29T00:00')).not.toBeNull();
  });

  it('gives the wall clock on a zone-free axis, the zone apart', () => {
    // 2026-07-14: 56 years from 1970 = 56 × 365 = 20,440 days + 14 leap days (1972 … 2024) = 20,454 to
    // 2026-01-01; + 181 days (Jan 31, Feb 28, Mar 31, Apr 30, May 31, Jun 30) + 13 = 20,648; 15:00 = 54,000,000 ms.
    const wall = 20_648 * 86_400_000 + 54_000_000;
    expect(readIsoDateTime('2026-07-14T15:00')).toEqual({ wallMs: wall, zoneMinutes: null, hasTime: true });
    expect(readIsoDateTime('2026-07-14T15:00+10:00')).toEqual({ wallMs: wall, zoneMinutes: 600, hasTime: true });
    expect(readIsoDateTime('2026-07-14T15:00:00.5Z')).toEqual({ wallMs: wall + 500, zoneMinutes: 0, hasTime: true });
    expect(readIsoDateTime('2026-07-14T15:00-03:30')?.zoneMinutes).toBe(-210);
    expect(readIsoDateTime('2026-07-14')).toEqual({ wallMs: 20_648 * 86_400_000, zoneMinutes: null, hasTime: false });
    // 15:00 at +10:00 is 05:00 UTC
    expect(instantMs('2026-07-14T15:00+10:00')).toBe(20_648 * 86_400_000 + 5 * 3_600_000);
    expect(instantMs('2026-07-14T15:00')).toBeNull();
  });

  it('compares zoned times as instants and the rest as written', () => {
    // 10:00 at +10:00 is 00:00 UTC; 01:00Z is an hour later
    expect(hoursBetweenClocks('2026-07-14T10:00+10:00', '2026-07-14T01:00Z')).toEqual({ hours: 1, asWritten: false });
    expect(hoursBetweenClocks('2026-07-14T10:00+10:00', '2026-07-14T11:30')).toEqual({ hours: 1.5, asWritten: true });
    expect(hoursBetweenClocks('2026-02-28T00:00', '2026-02-30T00:00')).toBeNull();
  });

  it('agrees with the platform calendar (Date.UTC) on every valid date-time with a zone, year 1000 to 2999', () => {
    let checked = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: FIRST_CLOCK_YEAR, max: LAST_CLOCK_YEAR }),
        fc.integer({ min: 1, max: 12 }),
        fc.integer({ min: 1, max: 31 }),
        fc.integer({ min: 0, max: 23 }),
        fc.integer({ min: 0, max: 59 }),
        fc.integer({ min: -14 * 60, max: 14 * 60 }),
        (year, month, day, hour, minute, zone) => {
          fc.pre(day <= daysInMonth(year, month));
          const two = (n: number): string => String(n).padStart(2, '0');
          const z = `${zone < 0 ? '-' : '+'}${two(Math.floor(Math.abs(zone) / 60))}:${two(Math.abs(zone) % 60)}`;
          const text = `${year}-${two(month)}-${two(day)}T${two(hour)}:${two(minute)}${z}`;
          checked++;
          expect(instantMs(text)).toBe(Date.parse(text));
        },
      ),
      { numRuns: 2000 },
    );
    expect(checked).toBeGreaterThan(1800);
  });
});

describe('the core and the scenario schema read starts alike', () => {
  it('both refuse 30 February (Date.parse alone rolls it into March)', () => {
    expect(Number.isNaN(Date.parse('2026-02-30T10:00'))).toBe(false);
    expect(isIsoDateTime('2026-02-30T10:00')).toBe(false);
    expect(() => validateStorm({ durationsH: [1], depthsMm: [1], startIso: '2026-02-30T10:00' })).toThrow(
      /not an ISO 8601 date-time/,
    );
  });

  it('both take the years held, and refuse a date alone as a storm start', () => {
    expect(isIsoDateTime(`${FIRST_CLOCK_YEAR}-01-01T00:00`)).toBe(true);
    expect(isIsoDateTime(`${LAST_CLOCK_YEAR}-12-31T23:59`)).toBe(true);
    expect(() =>
      validateStorm({ durationsH: [1], depthsMm: [1], startIso: `${LAST_CLOCK_YEAR}-12-31T23:00` }),
    ).not.toThrow();
    expect(isIsoDateTime('2026-07-14')).toBe(false);
    expect(() => validateStorm({ durationsH: [1], depthsMm: [1], startIso: '2026-07-14' })).toThrow(/ISO 8601/);
  });
});
