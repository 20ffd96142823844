import { describe, expect, it } from 'vitest';
import { problemList } from '../../src/io/problems';
import {
  formatTimeOfDay,
  guessDateOrder,
  guessElapsedKind,
  isoAt,
  parseClock,
  parseIsoDate,
  readTimes,
  type TimeReadOptions,
  type TimeSource,
} from '../../src/io/time-values';

function reading(cell: string, order: 'day-month' | 'month-day' = 'day-month') {
  const r = parseClock(cell, order);
  if (!r.ok) throw new Error(`expected "${cell}" to read, got: ${r.reason}`);
  return r.value;
}

function reason(cell: string, order: 'day-month' | 'month-day' = 'day-month'): string {
  const r = parseClock(cell, order);
  if (r.ok) throw new Error(`expected "${cell}" to be refused`);
  return r.reason;
}

const H = 3_600_000;

describe('parseClock', () => {
  it('reads ISO 8601 date-times with T or a space, seconds and fractions', () => {
    expect(reading('2024-05-01T10:20')).toEqual({
      date: { year: 2024, month: 5, day: 1 },
      hasTime: true,
      msOfDay: 10 * H + 20 * 60_000,
      zoneMinutes: null,
    });
    expect(reading('2024-05-01 10:20:30').msOfDay).toBe(10 * H + 20 * 60_000 + 30_000);
    expect(reading('2024-05-01T10:20:30.250').msOfDay).toBe(10 * H + 20 * 60_000 + 30_250);
  });

  it('reads zone offsets: Z, ±hh:mm and ±hhmm', () => {
    expect(reading('2024-05-01T10:00Z').zoneMinutes).toBe(0);
    expect(reading('2024-05-01T10:00:00+10:00').zoneMinutes).toBe(600);
    expect(reading('2024-05-01T10:00-0330').zoneMinutes).toBe(-210);
    expect(reading('2024-05-01T10:00+05').zoneMinutes).toBe(300);
    expect(reason('2024-05-01T10:00+15:00')).toMatch(/offset \+15:00 is out of range/);
  });

  it('reads a date alone as midnight, for daily records', () => {
    expect(reading('2024-05-01')).toMatchObject({ hasTime: false, msOfDay: 0 });
  });

  it('reads day-first or month-first dates as the date order says', () => {
    expect(reading('01/05/2024 10:00').date).toEqual({ year: 2024, month: 5, day: 1 });
    expect(reading('01/05/2024 10:00', 'month-day').date).toEqual({ year: 2024, month: 1, day: 5 });
    expect(reading('1.5.2024 10:00').date).toEqual({ year: 2024, month: 5, day: 1 });
    expect(reading('2024/05/01 10:00').date).toEqual({ year: 2024, month: 5, day: 1 });
  });

  it('reads times of day with and without seconds, on a 24-hour or a 12-hour clock', () => {
    expect(reading('7:05')).toMatchObject({ date: null, msOfDay: 7 * H + 5 * 60_000 });
    expect(reading('23:59:59').msOfDay).toBe(24 * H - 1000);
    expect(reading('12:00 AM').msOfDay).toBe(0);
    expect(reading('12:30 pm').msOfDay).toBe(12.5 * H);
    expect(reading('1:15 P.M.').msOfDay).toBe(13.25 * H);
    expect(reading('5/1/2024 10:00 PM', 'month-day')).toMatchObject({
      date: { year: 2024, month: 5, day: 1 },
      msOfDay: 22 * H,
    });
  });

  it('takes 24:00 as the end of a day and nothing later', () => {
    expect(reading('24:00').msOfDay).toBe(24 * H);
    expect(reason('24:10')).toMatch(/only allowed as 24:00/);
    expect(reason('25:00')).toMatch(/hour 25 is out of range/);
  });

  it('refuses impossible dates and times with the reason', () => {
    expect(reason('2023-02-29 10:00')).toMatch(/day 29 does not exist in month 2 of 2023/);
    expect(reading('2024-02-29 10:00').date?.day).toBe(29);
    expect(reason('2024-13-01')).toMatch(/no month 13/);
    expect(reason('10:61')).toMatch(/minute 61/);
    expect(reason('10:00:75')).toMatch(/second 75/);
    expect(reason('13:00 PM')).toMatch(/12-hour clock/);
  });

  it('says which date order it used when a date does not exist under it', () => {
    expect(reason('05/31/2024')).toMatch(/read day first; change the date order/);
    expect(reason('31/05/2024', 'month-day')).toMatch(/read month first/);
  });

  it('asks for four-digit years rather than guessing the century', () => {
    expect(reason('01/05/24 10:00')).toMatch(/four/);
  });

  it('explains what it accepts when a cell is no time at all', () => {
    expect(reason('soon')).toMatch(/not a time; use an ISO 8601 date-time/);
    expect(reason('')).toBe('the time is missing.');
  });
});

describe('parseIsoDate', () => {
  it('reads YYYY-MM-DD and refuses other forms', () => {
    expect(parseIsoDate('2024-05-01')).toEqual({ ok: true, value: { year: 2024, month: 5, day: 1 } });
    expect(parseIsoDate('1/5/2024').ok).toBe(false);
    expect(parseIsoDate('2024-02-30').ok).toBe(false);
  });
});

function read(cells: readonly string[], options: Partial<TimeReadOptions> = {}, firstLine = 1) {
  const problems = problemList();
  const sources: TimeSource[] = cells.map((cell, i) => ({ line: firstLine + i, cell }));
  const line = readTimes(
    sources,
    {
      kind: 'clock',
      decimal: 'point',
      dateOrder: 'day-month',
      dateForTimesOfDay: null,
      column: 1,
      dateColumn: null,
      ...options,
    },
    problems,
  );
  return { ...line, problems: problems.list() };
}

describe('readTimes', () => {
  it('gives hours after the first time for ISO date-times with irregular gaps', () => {
    const r = read(['2024-05-01T10:00', '2024-05-01T10:05', '2024-05-01T10:30', '2024-05-01T12:00']);
    expect(r.hours).toEqual([0, 5 / 60, 0.5, 2]);
    expect(r.problems).toEqual([]);
    expect(r.origin).toEqual({ wallMs: Date.UTC(2024, 4, 1, 10), zoneMinutes: null });
  });

  it('runs times of day on over midnight', () => {
    const r = read(['23:40', '23:50', '00:00', '00:10', '01:00']);
    expect(r.hours.map((h) => Math.round(h * 60))).toEqual([0, 10, 20, 30, 80]);
    expect(r.origin).toBeNull();
    expect(r.firstTimeOfDayMs).toBe((23 * 60 + 40) * 60_000);
  });

  it('runs on from 24:00 to the next day', () => {
    const r = read(['23:50', '24:00', '00:10']);
    expect(r.hours.map((h) => Math.round(h * 60))).toEqual([0, 10, 20]);
  });

  it('places times of day on the calendar when the date of the first one is given', () => {
    const r = read(['23:50', '00:10'], { dateForTimesOfDay: { year: 2024, month: 5, day: 1 } });
    expect(r.origin).not.toBeNull();
    expect(isoAt(r.origin!, 0)).toBe('2024-05-01T23:50:00');
    expect(isoAt(r.origin!, r.hours[1]!)).toBe('2024-05-02T00:10:00');
  });

  it('reports a time of day that jumps back by more than half a day, naming both lines', () => {
    const r = read(['10:00', '10:10', '10:05', '10:20'], {}, 3);
    expect(r.problems).toEqual([
      {
        row: 5,
        column: 1,
        field: 'time',
        value: '10:05',
        reason:
          'this time is earlier than the time on line 4 ("10:10"); times must increase (a time of day is read as the next day only when the step over midnight is at most 12 h, here it would be 23 h 55 min).',
      },
    ]);
    expect(r.hours[2]).toBeNaN();
    expect(r.hours[3]).toBeCloseTo(20 / 60, 12);
  });

  it('reports a repeated time', () => {
    const r = read(['2024-05-01 10:00', '2024-05-01 10:00'], { column: 2 });
    expect(r.problems).toHaveLength(1);
    expect(r.problems[0]).toMatchObject({ row: 2, column: 2, field: 'time', value: '2024-05-01 10:00' });
    expect(r.problems[0]?.reason).toMatch(/same as the time on line 1/);
  });

  it('reports a dated time that goes back, without reading it as the next day', () => {
    const r = read(['2024-05-01 23:50', '2024-05-01 00:10']);
    expect(r.problems[0]).toMatchObject({ row: 2, column: 1 });
    expect(r.problems[0]?.reason).toBe(
      'this time is earlier than the time on line 1 ("2024-05-01 23:50"); times must increase.',
    );
  });

  it('refuses a mix of dated and undated times, and of zoned and unzoned ones', () => {
    expect(read(['2024-05-01 10:00', '10:10']).problems[0]).toMatchObject({
      row: 2,
      reason: expect.stringMatching(/no date but the first time does/),
    });
    expect(read(['10:00', '2024-05-01 10:10']).problems[0]).toMatchObject({
      row: 2,
      reason: expect.stringMatching(/has a date but the first time does not/),
    });
    expect(read(['2024-05-01T10:00Z', '2024-05-01T10:10']).problems[0]).toMatchObject({
      row: 2,
      reason: expect.stringMatching(/no time zone/),
    });
  });

  it('compares times written in different zones as instants', () => {
    const r = read(['2024-05-01T10:00Z', '2024-05-01T20:30+10:00']);
    expect(r.hours).toEqual([0, 0.5]);
    expect(r.origin).toEqual({ wallMs: Date.UTC(2024, 4, 1, 10), zoneMinutes: 0 });
  });

  it('reads elapsed minutes and hours with either decimal mark', () => {
    expect(read(['0', '10', '25'], { kind: 'elapsed-min' }).hours).toEqual([0, 10 / 60, 25 / 60]);
    expect(read(['0,5', '1', '1,75'], { kind: 'elapsed-h', decimal: 'comma' }).hours).toEqual([0, 0.5, 1.25]);
  });

  it('names the unit it expected for a bad elapsed time, and hints at clock times', () => {
    const r = read(['0', 'x', '10:00'], { kind: 'elapsed-min', column: 3 });
    expect(r.problems).toEqual([
      { row: 2, column: 3, field: 'time', value: 'x', reason: 'expected elapsed minutes; not a number.' },
      {
        row: 3,
        column: 3,
        field: 'time',
        value: '10:00',
        reason: 'expected elapsed minutes, but this is a clock time; set the time kind to clock.',
      },
    ]);
  });

  it('hints at elapsed times when a clock column holds plain numbers', () => {
    expect(read(['10:00', '15']).problems[0]?.reason).toMatch(
      /plain number: set the time kind to elapsed minutes or hours/,
    );
  });

  it('joins a date column to a time-of-day column', () => {
    const problems = problemList();
    const r = readTimes(
      [
        { line: 2, cell: '23:50', dateCell: '01/05/2024' },
        { line: 3, cell: '00:10', dateCell: '02/05/2024' },
        { line: 4, cell: '00:20', dateCell: '2024-05-02 00:00:00' },
        { line: 5, cell: '00:30', dateCell: '2024-05-02 06:00' },
        { line: 6, cell: '2024-05-02 00:40', dateCell: '02/05/2024' },
      ],
      { kind: 'clock', decimal: 'point', dateOrder: 'day-month', dateForTimesOfDay: null, column: 2, dateColumn: 1 },
      problems,
    );
    expect(r.hours.slice(0, 3).map((h) => Math.round(h * 60))).toEqual([0, 20, 30]);
    expect(problems.list()).toEqual([
      expect.objectContaining({ row: 5, column: 1, field: 'date', value: '2024-05-02 06:00' }),
      expect.objectContaining({ row: 6, column: 2, field: 'time', value: '2024-05-02 00:40' }),
    ]);
  });
});

describe('isoAt', () => {
  it('writes the instant in the zone the times were written in', () => {
    expect(isoAt({ wallMs: Date.UTC(2024, 4, 1, 10), zoneMinutes: null }, -1 / 6)).toBe('2024-05-01T09:50:00');
    expect(isoAt({ wallMs: Date.UTC(2024, 4, 1, 10), zoneMinutes: 0 }, 0)).toBe('2024-05-01T10:00:00Z');
    expect(isoAt({ wallMs: Date.UTC(2024, 4, 1, 0, 5), zoneMinutes: 330 }, -0.25)).toBe('2024-04-30T23:50:00+05:30');
    expect(isoAt({ wallMs: Date.UTC(2024, 4, 1), zoneMinutes: -210 }, 0.5 / 3600)).toBe(
      '2024-05-01T00:00:00.500-03:30',
    );
  });
});

describe('formatTimeOfDay', () => {
  it('shows seconds only when there are some', () => {
    expect(formatTimeOfDay(10 * H)).toBe('10:00');
    expect(formatTimeOfDay(10 * H + 5000)).toBe('10:00:05');
  });
});

describe('guessElapsedKind', () => {
  it('follows the column name when it says', () => {
    expect(guessElapsedKind([1, 2, 3], 'Time (min)')).toBe('elapsed-min');
    expect(guessElapsedKind([5, 10, 15], 'Elapsed (h)')).toBe('elapsed-h');
    expect(guessElapsedKind([5, 10, 15], 'hours')).toBe('elapsed-h');
  });

  it('takes whole numbers stepping by 5 or more as minutes and the rest as hours', () => {
    expect(guessElapsedKind([5, 10, 15, 20], '')).toBe('elapsed-min');
    expect(guessElapsedKind([1, 2, 3, 4], '')).toBe('elapsed-h');
    expect(guessElapsedKind([0.25, 0.5, 0.75], '')).toBe('elapsed-h');
  });
});

describe('guessDateOrder', () => {
  it('is settled by a day above 12 in either place', () => {
    expect(guessDateOrder(['30/04/2024 23:00', '01/05/2024 00:00'])).toBe('day-month');
    expect(guessDateOrder(['04/30/2024 23:00', '05/01/2024 00:00'])).toBe('month-day');
  });

  it('otherwise picks the order in which the times rise in the smallest steps', () => {
    // Read month-first these are 4 May and 5 May; read day-first, 5 April and 5 May.
    expect(guessDateOrder(['05/04/2024 23:00', '05/05/2024 00:00'])).toBe('month-day');
    expect(guessDateOrder(['04/05/2024 23:00', '05/05/2024 00:00'])).toBe('day-month');
  });

  it('reads day first when nothing tells them apart, and when there are no such dates', () => {
    expect(guessDateOrder(['01/05/2024 10:00', '01/05/2024 11:00'])).toBe('day-month');
    expect(guessDateOrder(['2024-05-01 10:00'])).toBe('day-month');
  });
});
