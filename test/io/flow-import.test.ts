import { describe, expect, it } from 'vitest';
import { DISCHARGE_UNITS } from '../../src/core';
import {
  applyFlowImport,
  describeProblem,
  flowUnitFromName,
  guessFlowImport,
  guessFlowSettings,
  type FlowImportSettings,
  type FlowRecord,
  type ImportProblem,
} from '../../src/io';
import { expectAllClose } from '../helpers/tolerance';

// All streamflow in this file is INVENTED for the tests; it describes no real gauge or event.

function recordOf(text: string, settings?: Partial<FlowImportSettings>): FlowRecord {
  const result = applyFlowImport(text, { ...guessFlowSettings(text), ...settings });
  if (!result.ok) throw new Error(`expected an import, got: ${result.problems.map(describeProblem).join(' | ')}`);
  return result.record;
}

function problemsOf(text: string, settings?: Partial<FlowImportSettings>): readonly ImportProblem[] {
  const result = applyFlowImport(text, { ...guessFlowSettings(text), ...settings });
  if (result.ok) throw new Error('expected problems, the text imported');
  return result.problems;
}

describe('guessFlowImport on realistic pastes', () => {
  it('reads an ISO-dated record in m³/s with irregular steps', () => {
    const text =
      'Date-time\tQ (m3/s)\n2024-05-01T00:00\t0.8\n2024-05-01T00:15\t0.9\n2024-05-01T00:30\t2.4\n2024-05-01T01:30\t5.1\n2024-05-01T03:30\t1.2\n';
    const preview = guessFlowImport(text);
    expect(preview.settings).toMatchObject({
      separator: 'tab',
      timeColumn: 1,
      valueColumn: 2,
      timeKind: 'clock',
      unit: 'm3/s',
      hasHeader: true,
    });
    expect(preview.problems).toEqual([]);
    expect(preview.summary).toBe(
      '5 samples 15 min to 2 h apart (irregular steps) from 2024-05-01 00:00, spanning 3 h 30 min, discharge in m³/s, peak 5.1 m³/s on line 5.',
    );
    const record = recordOf(text);
    expectAllClose(record.timesH, [0, 0.25, 0.5, 1.5, 3.5]);
    expect(record.dischargeM3s).toEqual([0.8, 0.9, 2.4, 5.1, 1.2]);
    expect(record.startIso).toBe('2024-05-01T00:00:00');
  });

  it('reads litres per second from a European CSV with day-first dates', () => {
    const text = 'Datum;Abfluss (l/s)\n30.04.2024 23:45;120\n01.05.2024 00:00;135,5\n01.05.2024 00:15;160\n';
    const preview = guessFlowImport(text);
    expect(preview.settings).toMatchObject({
      separator: 'semicolon',
      decimal: 'comma',
      unit: 'L/s',
      dateOrder: 'day-month',
    });
    expect(preview.summary).toBe(
      '3 samples every 15 min from 2024-04-30 23:45, spanning 30 min, discharge in L/s, peak 160 L/s on line 4.',
    );
    const record = recordOf(text);
    expect(record.dischargeM3s).toEqual([120 * 1e-3, 135.5 * 1e-3, 160 * 1e-3]);
    expect(record.startIso).toBe('2024-04-30T23:45:00');
  });

  it('converts cubic feet per second exactly (1 ft = 0.3048 m)', () => {
    const text = 'Time,Flow (cfs)\n5/1/2024 10:00 PM,12\n5/1/2024 11:00 PM,14\n5/2/2024 12:00 AM,13\n';
    const settings = guessFlowSettings(text);
    expect(settings).toMatchObject({ unit: 'ft3/s', dateOrder: 'month-day', separator: 'comma' });
    const record = recordOf(text);
    const ft3 = 0.028316846592; // 0.3048³ m³ exactly (the double nearest it)
    expect(DISCHARGE_UNITS['ft3/s']).toBe(ft3);
    expect(record.dischargeM3s).toEqual([12 * ft3, 14 * ft3, 13 * ft3]);
    expectAllClose(record.timesH, [0, 1, 2]);
    expect(record.startIso).toBe('2024-05-01T22:00:00');
  });

  it('reads elapsed hours and leaves the record off the calendar', () => {
    const text = 't (h),Q m3/s\n0,1.2\n0.5,3.4\n1.25,2.0\n';
    expect(guessFlowSettings(text)).toMatchObject({ timeKind: 'elapsed-h', unit: 'm3/s' });
    const record = recordOf(text);
    expect(record.timesH).toEqual([0, 0.5, 1.25]);
    expect(record.startIso).toBeUndefined();
  });

  it('measures elapsed times from the first sample, wherever it starts', () => {
    const record = recordOf('minutes\tdischarge\n30\t1\n45\t2\n75\t1.5', { timeKind: 'elapsed-min' });
    expectAllClose(record.timesH, [0, 0.25, 0.75]);
  });

  it('reads a column of discharges at a set step', () => {
    const text = '1.2\n3.4\n5\n2.2\n';
    expect(guessFlowSettings(text)).toMatchObject({ timeKind: 'none', timeColumn: null, stepMinutesIfNoTime: 15 });
    expectAllClose(recordOf(text, { stepMinutesIfNoTime: 30 }).timesH, [0, 0.5, 1, 1.5]);
    expect(guessFlowImport(text).summary).toBe(
      '4 samples every 15 min, spanning 45 min, discharge in m³/s, peak 5 m³/s on line 3; no times, so samples are 15 min apart as set.',
    );
  });

  it('runs times of day over midnight and takes the date when given', () => {
    const text = '23:30\t0.5\n23:45\t0.7\n00:00\t1.4\n00:30\t1.1\n';
    const record = recordOf(text, { dateForTimesOfDay: '2024-05-01' });
    expectAllClose(record.timesH, [0, 0.25, 0.5, 1]);
    expect(record.startIso).toBe('2024-05-01T23:30:00');
    expect(recordOf(text).startIso).toBeUndefined();
  });

  it('picks the discharge column by its name when other numbers stand beside it', () => {
    const text = 'Time\tStage (m)\tDischarge (L/s)\n10:00\t0.42\t310\n10:15\t0.45\t355\n';
    expect(guessFlowSettings(text)).toMatchObject({ valueColumn: 3, unit: 'L/s' });
  });
});

describe('flowUnitFromName', () => {
  it('recognises the usual ways of writing the units', () => {
    expect(flowUnitFromName('Q (L/s)')).toBe('L/s');
    expect(flowUnitFromName('flow lps')).toBe('L/s');
    expect(flowUnitFromName('Discharge [cfs]')).toBe('ft3/s');
    expect(flowUnitFromName('Q ft³/s')).toBe('ft3/s');
    expect(flowUnitFromName('Q m³/s')).toBe('m3/s');
    expect(flowUnitFromName('cumecs')).toBe('m3/s');
    expect(flowUnitFromName('Flow')).toBeUndefined();
  });

  it('reads the units in names written with underscores or points, as exports write them', () => {
    // The defect: "discharge_l_s" and "q_lps" were taken for m³/s (an underscore is no word boundary), so a
    // record in L/s came in a thousand times too large: a 4.5 m³/s peak read as 4,500 m³/s.
    expect(flowUnitFromName('discharge_l_s')).toBe('L/s');
    expect(flowUnitFromName('q_lps')).toBe('L/s');
    expect(flowUnitFromName('Flow.L.s')).toBe('L/s');
    expect(flowUnitFromName('flow_cms')).toBe('m3/s');
    expect(flowUnitFromName('discharge_m3s')).toBe('m3/s');
    expect(flowUnitFromName('q_cfs')).toBe('ft3/s');
    expect(flowUnitFromName('flow_class')).toBeUndefined();
    expect(guessFlowImport('time,discharge_l_s\n10:00,300\n10:15,4500\n10:30,900').settings.unit).toBe('L/s');
  });
});

describe('applyFlowImport reports every bad input by line and column', () => {
  it('a negative discharge', () => {
    expect(problemsOf('Time\tQ\n10:00\t1\n10:15\t-0.5\n10:30\t1')).toEqual([
      { row: 3, column: 2, field: 'discharge', value: '-0.5', reason: 'Discharge cannot be negative.' },
    ]);
  });

  it('a discharge that is not a number, and a missing one', () => {
    expect(problemsOf('Time\tQ\n10:00\t1\n10:15\tice\n10:30')).toEqual([
      { row: 3, column: 2, field: 'discharge', value: 'ice', reason: 'not a number.' },
      { row: 4, column: 2, field: 'discharge', value: '', reason: 'the discharge is missing (the line has 1 column).' },
    ]);
  });

  it('times that do not increase', () => {
    expect(problemsOf('2024-05-01 10:00\t1\n2024-05-01 10:15\t2\n2024-05-01 10:15\t3')).toEqual([
      {
        row: 3,
        column: 1,
        field: 'time',
        value: '2024-05-01 10:15',
        reason: 'this time is the same as the time on line 2 ("2024-05-01 10:15"); times must increase.',
      },
    ]);
  });

  it('a record of one sample', () => {
    expect(problemsOf('2024-05-01 10:00\t1')).toEqual([
      {
        row: 0,
        column: 0,
        field: 'text',
        value: '',
        reason: 'a streamflow record needs at least two samples; only one line was found.',
      },
    ]);
  });

  it('an unknown unit', () => {
    expect(problemsOf('1\n2', { unit: 'gpm' as never })).toEqual([
      { row: 0, column: 0, field: 'unit', value: 'gpm', reason: 'must be m3/s, L/s or ft3/s.' },
    ]);
  });

  it('no settings, or no text', () => {
    expect(applyFlowImport('1\n2', undefined as never).problems).toEqual([
      { row: 0, column: 0, field: 'settings', value: 'undefined', reason: 'no import settings were given.' },
    ]);
    expect(applyFlowImport(null as never, guessFlowSettings('1\n2')).problems).toEqual([
      { row: 0, column: 0, field: 'text', value: '', reason: 'there is no text to read.' },
    ]);
  });

  it('a failure summary that says what was read', () => {
    const result = applyFlowImport('Time\tQ\n10:00\t1\n10:15\t-1', guessFlowSettings('Time\tQ\n10:00\t1\n10:15\t-1'));
    expect(result.summary).toBe(
      'Read 2 data lines as discharge in m³/s with clock times in column 1; 1 problem to fix before importing.',
    );
  });
});
