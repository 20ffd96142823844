import { describe, expect, it } from 'vitest';
import { validateStorm } from '../../src/core';
import {
  MAX_LISTED_PROBLEMS,
  applyRainImport,
  describeProblem,
  guessRainImport,
  guessRainSettings,
  previewRainImport,
  rainHintsFromName,
  type ImportedStorm,
  type ImportProblem,
  type RainImportSettings,
} from '../../src/io';
import { expectAllClose } from '../helpers/tolerance';

// All rainfall in this file is INVENTED for the tests; it describes no real gauge or event.

/** The invented 18-bar storm of the demo scenario: 10-minute bars, 41.6 mm in all. */
const INVENTED_DEPTHS = [0.4, 0.8, 1.2, 1.8, 2.6, 3.8, 5.6, 6.4, 4.8, 3.6, 2.8, 2.2, 1.6, 1.2, 1.0, 0.8, 0.6, 0.4];

function clock(minutesFromMidnight: number): string {
  const m = ((minutesFromMidnight % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

function stormOf(text: string, settings?: Partial<RainImportSettings>): ImportedStorm {
  const result = applyRainImport(text, { ...guessRainSettings(text), ...settings });
  if (!result.ok) throw new Error(`expected an import, got: ${result.problems.map(describeProblem).join(' | ')}`);
  validateStorm(result.storm);
  return result.storm;
}

function problemsOf(text: string, settings?: Partial<RainImportSettings>): readonly ImportProblem[] {
  const result = applyRainImport(text, { ...guessRainSettings(text), ...settings });
  if (result.ok) throw new Error('expected problems, the text imported');
  return result.problems;
}

const TEN_MIN = 10 / 60;

describe('guessRainImport on realistic pastes', () => {
  it('reads a spreadsheet copy (tabs, header, times of day) and says what it understood', () => {
    const text = ['Time\tRain (mm)', ...INVENTED_DEPTHS.map((p, k) => `${clock(15 * 60 + 10 * (k + 1))}\t${p}`)].join(
      '\n',
    );
    const preview = guessRainImport(text);
    expect(preview.settings).toMatchObject({
      separator: 'tab',
      decimal: 'point',
      hasHeader: true,
      skipLines: 0,
      timeColumn: 1,
      valueColumn: 2,
      timeKind: 'clock',
      valueKind: 'depth',
      unit: 'mm',
      timeMarks: 'end',
    });
    expect(preview.problems).toEqual([]);
    expect(preview.header).toEqual(['Time', 'Rain (mm)']);
    expect(preview.rows).toHaveLength(18);
    expect(preview.rows[0]).toEqual({ line: 2, cells: ['15:10', '0.4'] });
    expect(preview.summary).toBe(
      '18 bars of 10 min from 15:00 (time of day; no date given), depths in mm, total 41.6 mm; time stamps mark the end of each bar.',
    );
    const storm = stormOf(text);
    expectAllClose(
      storm.durationsH,
      INVENTED_DEPTHS.map(() => TEN_MIN),
    );
    expect(storm.depthsMm).toEqual(INVENTED_DEPTHS);
    expect(storm.startIso).toBeUndefined();
  });

  it('reads a European CSV: semicolons, decimal commas, day-first dates with dots', () => {
    const text =
      'Zeit;Niederschlag (mm)\n01.05.2024 10:10;0,4\n01.05.2024 10:20;1,25\n01.05.2024 10:30;0\n01.05.2024 10:40;2,5\n';
    const preview = guessRainImport(text);
    expect(preview.settings).toMatchObject({
      separator: 'semicolon',
      decimal: 'comma',
      timeKind: 'clock',
      dateOrder: 'day-month',
    });
    const storm = stormOf(text);
    expect(storm.depthsMm).toEqual([0.4, 1.25, 0, 2.5]);
    expectAllClose(storm.durationsH, [TEN_MIN, TEN_MIN, TEN_MIN, TEN_MIN]);
    expect(storm.startIso).toBe('2024-05-01T10:00:00');
    expect(preview.summary).toBe(
      '4 bars of 10 min from 2024-05-01 10:00, depths in mm, total 4.15 mm; time stamps mark the end of each bar.',
    );
  });

  it('says when a column named for durations is not read, so daily bars are not taken silently for the step set', () => {
    // Invented: three bars with their durations in a column. Times are read, durations are not: the
    // bars take the step set (10 min here), and the summary must say the column was left.
    const text = 'duration_min,depth_mm\n1440,20\n1440,30\n60,1\n';
    const preview = guessRainImport(text);
    // The header's comma splits the columns: 20 mm in the first bar, not 1440.2 mm (a decimal comma).
    expect(preview.settings).toMatchObject({ separator: 'comma', timeColumn: null, valueColumn: 2 });
    // 20 + 30 + 1 = 51 mm.
    expect(preview.summary).toMatch(/^3 bars of 1 h, depths in mm, total 51 mm; /);
    expect(preview.summary).toMatch(
      /; column 1, “duration_min”, is not read: bars are as long as the time step set, not as that column says\.$/,
    );
    // A column of times is read as times, and no such note is given.
    expect(guessRainImport('time,depth_mm\n10:00,1\n10:10,2\n').summary).not.toMatch(/is not read/);
  });

  it('reads a single column of values at the step the user sets', () => {
    const text = INVENTED_DEPTHS.join('\n');
    const settings = guessRainSettings(text);
    expect(settings).toMatchObject({
      separator: 'none',
      timeColumn: null,
      timeKind: 'none',
      valueColumn: 1,
      stepMinutesIfNoTime: 60,
    });
    expect(guessRainImport(text).summary).toBe(
      '18 bars of 1 h, depths in mm, total 41.6 mm; no times, so bars are 1 h apart as set.',
    );
    const storm = stormOf(text, { stepMinutesIfNoTime: 10 });
    expectAllClose(
      storm.durationsH,
      INVENTED_DEPTHS.map(() => TEN_MIN),
    );
    expect(storm.depthsMm).toEqual(INVENTED_DEPTHS);
    expect(previewRainImport(text, { ...settings, stepMinutesIfNoTime: 10 }).summary).toMatch(/^18 bars of 10 min, /);
  });

  it('reads a single column with decimal commas and takes the step from the column name', () => {
    const text = 'Rain (mm per 5 min)\n0,4\n0,8\n1,2\n0,6\n';
    expect(guessRainSettings(text)).toMatchObject({
      separator: 'none',
      decimal: 'comma',
      hasHeader: true,
      stepMinutesIfNoTime: 5,
    });
    const storm = stormOf(text);
    expect(storm.depthsMm).toEqual([0.4, 0.8, 1.2, 0.6]);
    expectAllClose(storm.durationsH, [5 / 60, 5 / 60, 5 / 60, 5 / 60]);
  });

  it('turns cumulative gauge readings into bar depths, counting from the first reading', () => {
    const text =
      'Date-time,Cumulative rain (mm)\n2024-05-01 10:00,12.4\n2024-05-01 10:15,12.4\n2024-05-01 10:30,15.0\n2024-05-01 10:45,21.2\n2024-05-01 11:00,22.0\n';
    const preview = guessRainImport(text);
    expect(preview.settings).toMatchObject({
      valueKind: 'cumulative',
      cumulativeFrom: 'first-value',
      separator: 'comma',
    });
    const storm = stormOf(text);
    expectAllClose(storm.depthsMm, [0, 2.6, 6.2, 0.8], 1e-12, 1e-12);
    expectAllClose(storm.durationsH, [0.25, 0.25, 0.25, 0.25]);
    expect(storm.startIso).toBe('2024-05-01T10:00:00');
    expect(preview.summary).toBe(
      '4 bars of 15 min from 2024-05-01 10:00, cumulative depths in mm, total 9.6 mm; counted from the first reading, 12.4 on line 2.',
    );
  });

  it('recognises a rising column as cumulative without being told, and counts from zero when there are no times', () => {
    const text = '0.5\n1.1\n1.1\n2.0\n3.4\n3.9\n';
    expect(guessRainSettings(text)).toMatchObject({ valueKind: 'cumulative', cumulativeFrom: 'zero' });
    expectAllClose(stormOf(text, { stepMinutesIfNoTime: 10 }).depthsMm, [0.5, 0.6, 0, 0.9, 1.4, 0.5], 1e-12, 1e-12);
    expectAllClose(stormOf(text, { cumulativeFrom: 'first-value' }).depthsMm, [0.6, 0, 0.9, 1.4, 0.5], 1e-12, 1e-12);
  });

  it('runs times of day on past midnight', () => {
    const text = '23:30\t1.0\n23:40\t2.0\n23:50\t3.0\n00:00\t2.0\n00:10\t1.0\n00:30\t0.5\n';
    // The last step (20 min) is kept as one bar here; test/io/gaps.test.ts fills such gaps.
    const storm = stormOf(text, { gaps: 'keep' });
    expectAllClose(storm.durationsH, [TEN_MIN, TEN_MIN, TEN_MIN, TEN_MIN, TEN_MIN, 2 * TEN_MIN]);
    expect(storm.depthsMm).toEqual([1, 2, 3, 2, 1, 0.5]);
    expect(storm.startIso).toBeUndefined();
    expect(stormOf(text, { dateForTimesOfDay: '2024-12-31' }).startIso).toBe('2024-12-31T23:20:00');
  });

  it('gives bars of unequal duration for ISO times with irregular gaps, and keeps the zone', () => {
    const text =
      'time,rain\n2024-05-01T10:05Z,0.4\n2024-05-01T10:10Z,1.0\n2024-05-01T10:30Z,2.0\n2024-05-01T11:30Z,3.0\n';
    const preview = guessRainImport(text);
    expect(preview.summary).toBe(
      '4 bars of 5 min to 1 h (irregular steps) from 2024-05-01 10:00Z, depths in mm, total 6.4 mm; time stamps mark the end of each bar.',
    );
    const storm = stormOf(text);
    expectAllClose(storm.durationsH, [5 / 60, 5 / 60, 20 / 60, 1]);
    expect(storm.startIso).toBe('2024-05-01T10:00:00Z');
  });

  it('lets the time stamps mark bar starts instead, so the last bar takes the last gap', () => {
    const text = 'time,rain\n2024-05-01T10:00,0.4\n2024-05-01T10:10,1.0\n2024-05-01T10:30,2.0\n';
    const storm = stormOf(text, { timeMarks: 'start', gaps: 'keep' });
    expectAllClose(storm.durationsH, [TEN_MIN, 2 * TEN_MIN, 2 * TEN_MIN]);
    expect(storm.startIso).toBe('2024-05-01T10:00:00');
    expect(applyRainImport(text, { ...guessRainSettings(text), timeMarks: 'start' }).ok && 'yes').toBe('yes');
    expect(previewRainImport(text, { ...guessRainSettings(text), timeMarks: 'start' }).summary).toMatch(
      /mark the start of each bar/,
    );
  });

  it('converts inches exactly, 1 in = 25.4 mm', () => {
    const text = 'Time\tRain (in)\n10:15\t0.1\n10:30\t0.25\n10:45\t0.05\n';
    const preview = guessRainImport(text);
    expect(preview.settings.unit).toBe('in');
    expect(stormOf(text).depthsMm).toEqual([0.1 * 25.4, 0.25 * 25.4, 0.05 * 25.4]);
    expect(preview.summary).toBe(
      '3 bars of 15 min from 10:00 (time of day; no date given), depths in in, total 0.4 in (10.16 mm); time stamps mark the end of each bar.',
    );
  });

  it('turns intensities into depths over each bar, in mm/h and in/h', () => {
    const text = 'Elapsed (min)\tIntensity (mm/h)\n10\t12\n20\t30\n40\t6\n';
    expect(guessRainSettings(text)).toMatchObject({
      valueKind: 'intensity',
      unit: 'mm',
      timeKind: 'elapsed-min',
      timeMarks: 'end',
    });
    expectAllClose(stormOf(text, { gaps: 'keep' }).depthsMm, [2, 5, 2]);
    expectAllClose(stormOf(text, { gaps: 'keep' }).durationsH, [TEN_MIN, TEN_MIN, 2 * TEN_MIN]);
    const inches = 'Time\tRain rate (in/h)\n10:30\t1.2\n11:00\t0.4\n';
    expect(guessRainSettings(inches)).toMatchObject({ valueKind: 'intensity', unit: 'in' });
    expectAllClose(stormOf(inches).depthsMm, [0.6 * 25.4, 0.2 * 25.4]);
  });

  it('reads elapsed hours that start at 0 as bar starts', () => {
    const text = 'h;mm\n0;1,5\n0,5;2\n1;0,5\n';
    const settings = guessRainSettings(text);
    expect(settings).toMatchObject({
      separator: 'semicolon',
      decimal: 'comma',
      timeKind: 'elapsed-h',
      timeMarks: 'start',
    });
    expectAllClose(stormOf(text).durationsH, [0.5, 0.5, 0.5]);
  });

  it('joins a date column and a time column, and reads US month-first dates with AM/PM', () => {
    const text =
      'Date\tTime\tRain (in)\n4/30/2024\t11:30 PM\t0.02\n4/30/2024\t11:45 PM\t0.10\n5/1/2024\t12:00 AM\t0.04\n';
    const settings = guessRainSettings(text);
    expect(settings).toMatchObject({
      dateColumn: 1,
      timeColumn: 2,
      valueColumn: 3,
      dateOrder: 'month-day',
      unit: 'in',
    });
    const storm = stormOf(text);
    expect(storm.startIso).toBe('2024-04-30T23:15:00');
    expectAllClose(storm.durationsH, [0.25, 0.25, 0.25]);
  });

  it('skips a title block above the header and says so', () => {
    const text = 'Invented gauge, made up for a test\nLogger 7\n\nTime,Rain (mm)\n10:10,1\n10:20,2\n';
    const preview = guessRainImport(text);
    expect(preview.settings).toMatchObject({ skipLines: 3, hasHeader: true });
    expect(preview.summary).toMatch(/; 3 lines skipped at the top\.$/);
    expect(stormOf(text).depthsMm).toEqual([1, 2]);
  });

  it('does not take a bad first data line for a header', () => {
    const text = '10:10\t1.2x\n10:20\t0.4\n10:30\t0.8\n';
    expect(guessRainSettings(text).hasHeader).toBe(false);
    expect(problemsOf(text)).toEqual([
      {
        row: 1,
        column: 2,
        field: 'depth',
        value: '1.2x',
        reason: 'not a plain number; remove any unit or text after the number.',
      },
    ]);
  });

  it('takes a column named "time in min" for elapsed minutes, not for rain', () => {
    expect(guessRainSettings('Time in min\tP (in)\n5\t0.1\n10\t0.2\n15\t0.05')).toMatchObject({
      timeColumn: 1,
      timeKind: 'elapsed-min',
      valueColumn: 2,
      unit: 'in',
    });
  });

  it('ignores a bar-number column and takes the depths beside it', () => {
    const text = 'Bar\tDepth (mm)\n1\t0.5\n2\t1.5\n3\t0.25\n';
    expect(guessRainSettings(text)).toMatchObject({ timeColumn: null, valueColumn: 2, timeKind: 'none' });
    expect(stormOf(text).depthsMm).toEqual([0.5, 1.5, 0.25]);
  });

  it("reads a daily record stamped with dates alone as each day's rain under its date", () => {
    const text = 'Date\tRain (mm)\n2024-05-01\t12.5\n2024-05-02\t0\n2024-05-03\t3.5\n';
    expect(guessRainSettings(text)).toMatchObject({ timeKind: 'clock', timeMarks: 'start' });
    const storm = stormOf(text);
    expect(storm.durationsH).toEqual([24, 24, 24]);
    expect(storm.startIso).toBe('2024-05-01T00:00:00');
    expect(guessRainImport(text).summary).toBe(
      '3 bars of 24 h from 2024-05-01 00:00, depths in mm, total 16 mm; time stamps mark the start of each bar.',
    );
  });

  it('reports a footer line as a problem rather than reading or dropping it', () => {
    expect(problemsOf('Time\tRain (mm)\n10:10\t1\n10:20\t2\nTotal\t3')).toEqual([
      { row: 4, column: 1, field: 'time', value: 'Total', reason: expect.stringMatching(/^not a time/) },
    ]);
  });

  it('places a storm on the calendar only from dates, never from a guess', () => {
    expect(stormOf('10:10\t1\n10:20\t1').startIso).toBeUndefined();
    expect(stormOf('2024-05-01 10:10\t1\n2024-05-01 10:20\t1').startIso).toBe('2024-05-01T10:00:00');
  });

  it('uses the step setting for a lone time stamp', () => {
    const storm = stormOf('2024-05-01 10:10\t1.5', { stepMinutesIfNoTime: 5 });
    expectAllClose(storm.durationsH, [5 / 60]);
    expect(storm.startIso).toBe('2024-05-01T10:05:00');
  });
});

describe('rainHintsFromName', () => {
  it('reads kind, unit and step from common column names', () => {
    expect(rainHintsFromName('Rain (mm)')).toEqual({ unit: 'mm' });
    expect(rainHintsFromName('Rainfall in mm')).toEqual({ unit: 'mm' });
    expect(rainHintsFromName('Depth [in]')).toEqual({ kind: 'depth', unit: 'in' });
    expect(rainHintsFromName('Intensity (in/h)')).toEqual({ kind: 'intensity', unit: 'in' });
    expect(rainHintsFromName('mm/h')).toEqual({ kind: 'intensity', unit: 'mm' });
    expect(rainHintsFromName('Cumulative depth (mm)')).toEqual({ kind: 'cumulative', unit: 'mm' });
    expect(rainHintsFromName('10-min rain')).toEqual({ stepMinutes: 10 });
    expect(rainHintsFromName('hourly rain, inches')).toEqual({ unit: 'in', stepMinutes: 60 });
  });

  it('reads them in names written with underscores or points, as exports write them', () => {
    // The defect: an underscore is no word boundary, so "depth_in" was read in mm (25.4 times too small) and
    // "intensity_in_hr" as mm/h; "rain_mm_h" was taken for depths.
    expect(rainHintsFromName('depth_in')).toEqual({ kind: 'depth', unit: 'in' });
    expect(rainHintsFromName('intensity_in_hr')).toEqual({ kind: 'intensity', unit: 'in' });
    expect(rainHintsFromName('rain_in_per_hr')).toEqual({ kind: 'intensity', unit: 'in' });
    expect(rainHintsFromName('rain_mm_h')).toEqual({ kind: 'intensity', unit: 'mm' });
    expect(rainHintsFromName('i_mm_per_h')).toEqual({ kind: 'intensity', unit: 'mm' });
    expect(rainHintsFromName('cum_rain_mm')).toEqual({ kind: 'cumulative', unit: 'mm' });
    expect(rainHintsFromName('Rain.in')).toEqual({ unit: 'in' });
    expect(rainHintsFromName('rain_mm')).toEqual({ unit: 'mm' });
  });
});

describe('applyRainImport reports every bad input by line and column', () => {
  const header = 'Time\tRain (mm)\n';

  it('a value that is not a number', () => {
    expect(problemsOf(`${header}10:10\t0.4\n10:20\twet\n10:30\t0.8`)).toEqual([
      { row: 3, column: 2, field: 'depth', value: 'wet', reason: 'not a number.' },
    ]);
  });

  it('a negative value', () => {
    expect(problemsOf(`${header}10:10\t0.4\n10:20\t-0.2\n10:30\t0.8`)).toEqual([
      { row: 3, column: 2, field: 'depth', value: '-0.2', reason: 'Depth cannot be negative.' },
    ]);
  });

  it('a missing value: a short line, an empty cell, a gauge marker', () => {
    expect(problemsOf(`${header}10:10\t0.4\n10:20\n10:30\t\n10:40\tNA\n10:50\t0.8`)).toEqual([
      { row: 3, column: 2, field: 'depth', value: '', reason: 'the depth is missing (the line has 1 column).' },
      { row: 4, column: 2, field: 'depth', value: '', reason: 'the depth is missing.' },
      { row: 5, column: 2, field: 'depth', value: 'NA', reason: 'the value is missing.' },
    ]);
  });

  it('an empty line between data lines', () => {
    expect(problemsOf(`${header}10:10\t0.4\n\n10:30\t0.8`)).toEqual([
      {
        row: 3,
        column: 0,
        field: 'line',
        value: '',
        reason: 'the line is empty, so its depth is missing; remove the line, fill in the value, or skip blank lines.',
      },
    ]);
  });

  it('an empty line in a single column, as a spreadsheet copies an empty cell', () => {
    expect(problemsOf('0.4\n0.8\n\n1.2\n')).toEqual([
      {
        row: 3,
        column: 0,
        field: 'line',
        value: '',
        reason: 'the line is empty, so its depth is missing; remove the line, fill in the value, or skip blank lines.',
      },
    ]);
  });

  it('a repeated time and a time that goes back', () => {
    expect(
      problemsOf(`${header}2024-05-01 10:10\t0.4\n2024-05-01 10:10\t0.8\n2024-05-01 10:30\t0.8\n2024-05-01 10:20\t0.8`),
    ).toEqual([
      {
        row: 3,
        column: 1,
        field: 'time',
        value: '2024-05-01 10:10',
        reason: 'this time is the same as the time on line 2 ("2024-05-01 10:10"); times must increase.',
      },
      {
        row: 5,
        column: 1,
        field: 'time',
        value: '2024-05-01 10:20',
        reason: 'this time is earlier than the time on line 4 ("2024-05-01 10:30"); times must increase.',
      },
    ]);
  });

  it('a time that cannot be read', () => {
    expect(problemsOf(`${header}10:10\t0.4\n10:2O\t0.8\n10:30\t0.8`)).toEqual([
      {
        row: 3,
        column: 1,
        field: 'time',
        value: '10:2O',
        reason: expect.stringMatching(/^not a time; use an ISO 8601 date-time/),
      },
    ]);
  });

  it('a cumulative reading that falls, naming the reading before it', () => {
    expect(problemsOf('min\tcumulative (mm)\n0\t0\n10\t1.5\n20\t1.4\n30\t2.0', { valueKind: 'cumulative' })).toEqual([
      {
        row: 4,
        column: 2,
        field: 'cumulative depth',
        value: '1.4',
        reason:
          'the cumulative depth falls from 1.5 on line 3; cumulative readings cannot decrease (a gauge reset or a typing slip?).',
      },
    ]);
  });

  it('a decimal mark that does not match the setting', () => {
    expect(problemsOf('Time;Rain\n10:10;0,4\n10:20;0.8\n10:30;1,2')).toEqual([
      {
        row: 3,
        column: 2,
        field: 'depth',
        value: '0.8',
        reason: 'this number has a decimal point but the decimal mark is set to a comma.',
      },
    ]);
  });

  it('a quote that never closes', () => {
    const problems = problemsOf('Time,Rain\n10:10,0.4\n"10:20,0.8\n10:30,1.2');
    expect(problems[0]).toMatchObject({ row: 3, column: 0, field: 'line' });
    expect(problems[0]?.reason).toMatch(/never closed/);
  });

  it('several problems at once, listed in the order of the text', () => {
    const problems = problemsOf(`${header}10:10\tx\n10:10\t-1\n10:30\t0.8`);
    expect(problems.map((p) => [p.row, p.column, p.field])).toEqual([
      [2, 2, 'depth'],
      [3, 1, 'time'],
      [3, 2, 'depth'],
    ]);
  });

  it('a paste with no data at all', () => {
    for (const text of ['', '\n\n', 'Time\tRain (mm)\n']) {
      const problems = applyRainImport(text, { ...guessRainSettings('1'), hasHeader: true }).problems;
      expect(problems).toContainEqual({
        row: 0,
        column: 0,
        field: 'text',
        value: '',
        reason: 'no data lines were found; paste a column of values, or times and values.',
      });
    }
  });

  it('cumulative readings from the first one need two lines', () => {
    expect(problemsOf('12.5', { valueKind: 'cumulative', cumulativeFrom: 'first-value' })).toEqual([
      expect.objectContaining({ row: 0, field: 'text', reason: expect.stringMatching(/need at least two lines/) }),
    ]);
  });

  it('a chosen column that the data does not have', () => {
    expect(problemsOf('10:10\t1\n10:20\t2', { valueColumn: 3 })).toEqual([
      { row: 0, column: 3, field: 'valueColumn', value: '3', reason: 'there is no column 3: the data has 2 columns.' },
    ]);
  });

  it('lists at most a set number of problems and says how many more there are', () => {
    const text = Array.from({ length: 300 }, (_, k) => `x${k}`).join('\n');
    const problems = problemsOf(text, { hasHeader: false, skipLines: 0 });
    expect(problems).toHaveLength(MAX_LISTED_PROBLEMS + 1);
    expect(problems[0]).toMatchObject({ row: 1, column: 1, value: 'x0' });
    expect(problems.at(-1)).toEqual({
      row: 0,
      column: 0,
      field: 'text',
      value: '',
      reason: '100 more problems not listed; fix the ones above or check the settings.',
    });
    expect(applyRainImport(text, { ...guessRainSettings(text), hasHeader: false }).summary).toBe(
      'Read 300 data lines as depths in mm without times, at 1 h steps; 300 problems to fix before importing.',
    );
  });
});

describe('applyRainImport checks its settings', () => {
  const text = '10:10\t1\n10:20\t2';
  const base = guessRainSettings(text);
  const cases: [string, Partial<RainImportSettings>, string, RegExp][] = [
    [
      'a step of zero minutes',
      { timeColumn: null, timeKind: 'none', stepMinutesIfNoTime: 0 },
      'stepMinutesIfNoTime',
      /greater than zero/,
    ],
    [
      'a step that is not a number',
      { timeColumn: null, timeKind: 'none', stepMinutesIfNoTime: NaN },
      'stepMinutesIfNoTime',
      /greater than zero/,
    ],
    ['a time kind without a time column', { timeColumn: null }, 'timeColumn', /no time column is chosen/],
    ['a time column with no time kind', { timeKind: 'none' }, 'timeKind', /time kind is none/],
    ['the same column for times and values', { valueColumn: 1 }, 'timeColumn', /must differ/],
    ['a column number below 1', { valueColumn: 0 }, 'valueColumn', /column number, 1 or more/],
    ['a fractional column number', { timeColumn: 1.5 }, 'timeColumn', /column number/],
    [
      'a date column without clock times',
      { dateColumn: 3, timeKind: 'elapsed-min' },
      'dateColumn',
      /needs a time column of clock times/,
    ],
    ['a date for times of day that is no date', { dateForTimesOfDay: '31/12/2024' }, 'dateForTimesOfDay', /YYYY-MM-DD/],
    ['negative lines to skip', { skipLines: -1 }, 'skipLines', /whole number of lines/],
    ['an unknown separator', { separator: 'pipe' as never }, 'separator', /tab, comma, semicolon or none/],
    ['an unknown decimal mark', { decimal: 'dot' as never }, 'decimal', /point or comma/],
    ['an unknown unit', { unit: 'cm' as never }, 'unit', /mm or in/],
    ['an unknown value kind', { valueKind: 'rate' as never }, 'valueKind', /depth, intensity or cumulative/],
    ['an unknown time mark', { timeMarks: 'middle' as never }, 'timeMarks', /end or start/],
    ['an unknown cumulative start', { cumulativeFrom: 'base' as never }, 'cumulativeFrom', /zero or first-value/],
    ['an unknown date order', { dateOrder: 'year-day' as never }, 'dateOrder', /day-month or month-day/],
  ];
  it.each(cases)('refuses %s, naming the setting', (_, change, field, reason) => {
    const result = applyRainImport(text, { ...base, ...change });
    expect(result.ok).toBe(false);
    expect(result.problems).toContainEqual(
      expect.objectContaining({ row: 0, field, reason: expect.stringMatching(reason) }),
    );
  });

  it('refuses text that is not a string without throwing', () => {
    expect(applyRainImport(42 as never, base).problems).toEqual([
      expect.objectContaining({ field: 'text', reason: 'there is no text to read.' }),
    ]);
    expect(guessRainImport(undefined as never).problems.length).toBeGreaterThan(0);
    expect(applyRainImport('1\n2', null as never).problems).toEqual([
      { row: 0, column: 0, field: 'settings', value: 'null', reason: 'no import settings were given.' },
    ]);
  });
});

describe('describeProblem', () => {
  it('writes a problem as one line for people', () => {
    expect(describeProblem({ row: 4, column: 2, field: 'depth', value: 'abc', reason: 'not a number.' })).toBe(
      'Line 4, column 2 (depth) "abc": not a number.',
    );
    expect(describeProblem({ row: 3, column: 0, field: 'line', value: '', reason: 'the line is empty.' })).toBe(
      'Line 3 (line): the line is empty.',
    );
    expect(describeProblem({ row: 0, column: 0, field: 'stepMinutesIfNoTime', value: '0', reason: 'too small.' })).toBe(
      'Setting stepMinutesIfNoTime "0": too small.',
    );
    expect(describeProblem({ row: 0, column: 0, field: 'text', value: '', reason: 'no data.' })).toBe('no data.');
  });
});
