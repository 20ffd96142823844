import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_RECORD_H, validateHydrograph, validateStorm } from '../../src/core';
import {
  applyFlowImport,
  applyRainImport,
  guessFlowSettings,
  guessRainSettings,
  type FlowImportSettings,
  type ImportProblem,
  type RainImportSettings,
} from '../../src/io';

// The importers hold times to the core's limits of time (src/core/time-limits.ts)
// and say which line is past them. All data here is INVENTED for the tests.

function flowProblems(text: string, settings?: Partial<FlowImportSettings>): readonly ImportProblem[] {
  const result = applyFlowImport(text, { ...guessFlowSettings(text), ...settings });
  if (result.ok) throw new Error('expected problems, the text imported');
  return result.problems;
}

function rainProblems(text: string, settings?: Partial<RainImportSettings>): readonly ImportProblem[] {
  const result = applyRainImport(text, { ...guessRainSettings(text), ...settings });
  if (result.ok) throw new Error('expected problems, the text imported');
  return result.problems;
}

const brief = (p: ImportProblem) => ({ row: p.row, column: p.column, field: p.field, reason: p.reason });

describe('an import past the limits of time names the line', () => {
  it('a streamflow record whose second sample is 3·10⁹ h after the first', () => {
    // Before the limits this record was taken, and its clock could not be drawn.
    const problems = flowProblems('Hours\tQ (m3/s)\n0\t1\n3000000000\t2\n', { timeKind: 'elapsed-h' });
    expect(problems.map(brief)).toEqual([
      {
        row: 3,
        column: 1,
        field: 'time',
        reason: 'this time is 342,200 years after the first time; a record spans at most 500 years.',
      },
    ]);
  });

  it('rain whose bars are 10¹² min apart', () => {
    const problems = rainProblems('Minutes\tRain (mm)\n0\t1\n1000000000000\t2\n', { timeKind: 'elapsed-min' });
    expect(problems.map(brief)).toEqual([
      {
        row: 3,
        column: 1,
        field: 'time',
        reason: 'this time is 1,901,000 years after the first time; a record spans at most 500 years.',
      },
    ]);
  });

  it('times closer than a second', () => {
    const problems = flowProblems(
      'Time\tQ (m3/s)\n2024-05-01 10:00:00\t1\n2024-05-01 10:00:00.5\t2\n2024-05-01 10:00:02\t2\n',
    );
    expect(problems.map(brief)).toEqual([
      {
        row: 3,
        column: 1,
        field: 'time',
        reason:
          'this time is only 0.5 s after the time on line 2 ("2024-05-01 10:00:00"); times are at least 1 second apart.',
      },
    ]);
  });

  it('a first time in a year no start clock may have, with the date in its own column', () => {
    const problems = rainProblems('Date\tTime\tRain (mm)\n01/05/0024\t10:00\t1\n01/05/0024\t10:10\t2\n', {
      dateColumn: 1,
      timeColumn: 2,
      valueColumn: 3,
      timeKind: 'clock',
    });
    expect(problems.map(brief)).toEqual([
      {
        row: 2,
        column: 1,
        field: 'date',
        reason: 'the first time is in the year 24; a record starts in the years 1000 to 2999 (check the year).',
      },
    ]);
  });

  it('a step setting of 10¹² min for values without times', () => {
    const problems = rainProblems('1\n2\n3\n', { timeColumn: null, timeKind: 'none', stepMinutesIfNoTime: 1e12 });
    expect(problems.map((p) => p.reason)).toEqual([
      'the time step must be from 1 second (0.0167 min) to 500 years (262,980,000 min).',
    ]);
  });
});

describe('an import at the limits of time is taken', () => {
  it('a record of two samples exactly 500 years apart, from the first start year allowed', () => {
    // 500 years of 365.25 days = 182,625 days after 1000-01-01 00:00 (proleptic Gregorian, Date's calendar).
    // The years 1000 to 1499 hold 500 × 365 + 121 = 182,621 days (125 multiples of 4, less the centuries
    // 1000, 1100, 1300 and 1400, which are not divisible by 400), so the limit falls 4 days on: 1500-01-05.
    const text = 'Time\tQ (m3/s)\n1000-01-01T00:00\t1\n1500-01-05T00:00\t2\n';
    const result = applyFlowImport(text, guessFlowSettings(text));
    if (!result.ok) throw new Error(result.problems.map((p) => p.reason).join(' '));
    expect(result.record.timesH).toEqual([0, MAX_RECORD_H]);
    expect(result.record.startIso).toBe('1000-01-01T00:00:00');
    expect(() => validateHydrograph(result.record)).not.toThrow();
  });

  it('bars a second long from the last start year allowed', () => {
    const text = 'Time\tRain (mm)\n2999-12-31 23:59:57\t0.2\n2999-12-31 23:59:58\t0.4\n2999-12-31 23:59:59\t0.2\n';
    const result = applyRainImport(text, guessRainSettings(text));
    if (!result.ok) throw new Error(result.problems.map((p) => p.reason).join(' '));
    expect(Array.from(result.storm.durationsH, (d) => Math.round(d * 3600 * 1e6) / 1e6)).toEqual([1, 1, 1]);
    expect(() => validateStorm(result.storm)).not.toThrow();
  });

  it('records of random extreme-but-valid steps and spans always import, and the core takes them', () => {
    // Steps of one second to 50 years in elapsed hours; up to 10 samples, so at most 500 years in all.
    const step = fc.oneof(
      fc.constant(1 / 3600),
      fc.double({ min: 1 / 3600, max: 1, noNaN: true }),
      fc.double({ min: 1, max: MAX_RECORD_H / 10, noNaN: true }),
      fc.constant(MAX_RECORD_H / 10),
    );
    let tried = 0;
    fc.assert(
      fc.property(fc.array(step, { minLength: 1, maxLength: 9 }), (steps) => {
        const times = [0];
        for (const s of steps) times.push((times[times.length - 1] as number) + s);
        fc.pre(times[times.length - 1]! <= MAX_RECORD_H);
        tried++;
        const text = `Hours\tQ (m3/s)\n${times.map((t, k) => `${t}\t${k}`).join('\n')}\n`;
        const result = applyFlowImport(text, { ...guessFlowSettings(text), timeKind: 'elapsed-h' });
        if (!result.ok) throw new Error(result.problems.map((p) => p.reason).join(' '));
        expect(() => validateHydrograph(result.record)).not.toThrow();
      }),
      { numRuns: 500 },
    );
    expect(tried).toBeGreaterThan(400);
  });
});
