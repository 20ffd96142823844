// @vitest-environment jsdom
import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { InputError, shiftIso, validateStorm } from '../../src/core';
import {
  DEFAULT_NUMBER_FORMAT,
  applyFlowImport,
  applyRainImport,
  guessFlowSettings,
  guessRainSettings,
  type ImportProblem,
} from '../../src/io';
import { readPlainColumns } from '../../src/io/plain-columns';
import { readPlainRain } from '../../src/io/rain-import';
import { parseIsoDate } from '../../src/io/time-values';
import {
  DEMO_SCENARIO,
  decodeScenarioLink,
  encodeScenarioLink,
  parseScenario,
  scenarioFromFileText,
  scenarioToFileText,
  type Scenario,
} from '../../src/scenario';
import { withStartIso } from '../../src/store/edits';
import { DateField } from '../../src/ui/import-kit/DateField';
import { barClock, readBarTime, readStartText, shiftStartIso } from '../../src/ui/storm-input/bar-times';

// Issue 12: one clock module (src/core/wall-clock.ts) behind every reader of a
// date. Each entry point that reads a date or a date-time refuses the same
// five impossible ones and accepts 29 February of a leap year. Leap years by
// the Gregorian rule (every 4th year, not every 100th, every 400th): 2028 is
// one (2028 = 4·507), 2027 is not (odd). April has 30 days. A day has hours
// 0 to 23 (24:00 only as the end of a day in a pasted record), a year 12 months.
// All storms and records here are INVENTED for the test.

/** The impossible dates: [date, time, why the paste reader refuses it (its wording)]. */
const BAD: readonly (readonly [string, string, string])[] = [
  ['2026-02-30', '10:00', 'day 30 does not exist in month 2 of 2026.'],
  ['2026-04-31', '10:00', 'day 31 does not exist in month 4 of 2026.'],
  ['2027-02-29', '10:00', 'day 29 does not exist in month 2 of 2027.'],
  ['2026-05-01', '24:01', 'after 24:00 comes 00:00; hour 24 is only allowed as 24:00.'],
  ['2026-13-01', '10:00', 'there is no month 13.'],
];

// 2028-02-29 by hand, in days from 1970-01-01: 58 whole years 1970–2027 with
// 14 leap days (1972, 1976, …, 2024: (2024 − 1972)/4 + 1 = 14) give
// 58·365 + 14 = 21,184 days to 1 January 2028; January's 31 days and 28 more
// reach the 29th: 21,184 + 31 + 28 = 21,243 days = 21,243 · 86,400,000 ms
// = 1,835,395,200,000 ms.
const LEAP_DAY_MS = 1_835_395_200_000;
const HOUR_MS = 3_600_000;

/** The demo with its start replaced; it has no streamflow, so no record must follow the start. */
function demoStartingAt(startIso: string): Scenario {
  return { ...DEMO_SCENARIO, storm: { ...DEMO_SCENARIO.storm, startIso } };
}

describe('the scenario readers (schema, file, link)', () => {
  it.each(BAD)('refuse %sT%s in the schema, a file and a link', (date, time) => {
    const iso = `${date}T${time}`;
    const doc = demoStartingAt(iso);
    for (const result of [
      parseScenario(structuredClone(doc)),
      scenarioFromFileText(scenarioToFileText(doc)),
      decodeScenarioLink(encodeScenarioLink(doc)),
    ]) {
      if (result.ok) expect.fail(`${iso} was read`);
      const start = result.problems.find((p) => p.path === 'storm.startIso');
      expect(start?.message).toContain('must be an ISO 8601 date-time');
    }
  });

  it('accept 29 February 2028 in the schema, a file and a link', () => {
    const doc = demoStartingAt('2028-02-29T10:00');
    for (const result of [
      parseScenario(structuredClone(doc)),
      scenarioFromFileText(scenarioToFileText(doc)),
      decodeScenarioLink(encodeScenarioLink(doc)),
    ]) {
      if (!result.ok) expect.fail(JSON.stringify(result.problems));
      expect(result.scenario.storm.startIso).toBe('2028-02-29T10:00');
    }
  });
});

describe("the core's storm check and the record's start shift", () => {
  it.each(BAD)('refuse %sT%s', (date, time) => {
    const iso = `${date}T${time}`;
    const message = `The storm start "${iso}" is not an ISO 8601 date-time.`;
    expect(() => validateStorm({ durationsH: [1], depthsMm: [2], startIso: iso })).toThrow(message);
    // shiftIso read its own pattern through Date.UTC, which rolls 30 February over into 2 March.
    expect(() => shiftIso(iso, 1)).toThrow(new InputError('startIso', message));
  });

  it('accept 29 February 2028, and step over it by the calendar', () => {
    expect(() => validateStorm({ durationsH: [1], depthsMm: [2], startIso: '2028-02-29T10:00' })).not.toThrow();
    // 28 Feb 23:00 + 1 h is 29 Feb in 2028, 1 March in 2027; 29 Feb 23:00 + 1 h is 1 March.
    expect(shiftIso('2028-02-28T23:00', 1)).toBe('2028-02-29T00:00:00');
    expect(shiftIso('2027-02-28T23:00', 1)).toBe('2027-03-01T00:00:00');
    expect(shiftIso('2028-02-29T23:00+10:00', 1)).toBe('2028-03-01T00:00:00+10:00');
  });
});

describe('the storm start as the store sets it and the screen reads it', () => {
  it.each(BAD)('refuse %s %s', (date, time, reason) => {
    const iso = `${date}T${time}`;
    // The store's start edit used Date.parse, which took 30 February, 31 April and 29 February 2027.
    expect(() => withStartIso(DEMO_SCENARIO, iso)).toThrow(
      new InputError('startIso', `The storm start "${iso}" is not an ISO 8601 date-time.`),
    );
    const typed = `${date} ${time}`;
    // The start field's message: the reason with its first letter raised.
    expect(readStartText(typed)).toEqual({
      ok: false,
      message: `“${typed}”: ${reason.charAt(0).toUpperCase()}${reason.slice(1)}`,
    });
    expect(shiftStartIso(iso, 1)).toBeNull();
    // The record and rainfall views' clock: no start to draw from.
    expect(barClock(iso, 2).startMs).toBeNull();
    // A bar time typed with a date, on a storm that starts at 2028-02-29 10:00.
    expect(readBarTime(barClock('2028-02-29T10:00', 48), typed, 0)).toEqual({
      ok: false,
      message: `“${typed}”: ${reason}`,
    });
  });

  it('accept 29 February 2028', () => {
    expect(withStartIso(DEMO_SCENARIO, '2028-02-29T10:00').storm.startIso).toBe('2028-02-29T10:00');
    expect(readStartText('2028-02-29 10:00')).toEqual({ ok: true, iso: '2028-02-29T10:00:00' });
    // 29 Feb 23:30 + 1 h = 1 March 00:30, the zone kept as written.
    expect(shiftStartIso('2028-02-29T23:30+10:00', 1)).toBe('2028-03-01T00:30:00+10:00');
    const clock = barClock('2028-02-29T10:00', 48);
    // 10:00 on the leap day: LEAP_DAY_MS + 10 h = 1,835,395,200,000 + 36,000,000.
    expect(clock.startMs).toBe(LEAP_DAY_MS + 10 * HOUR_MS);
    expect(clock.startMs).toBe(1_835_431_200_000);
    // 1 March 10:00 is one day (24 h) after 29 February 10:00.
    expect(readBarTime(clock, '2028-03-01 10:00', 0)).toEqual({ ok: true, hours: 24 });
  });
});

describe("the import kit's date of the first time", () => {
  it.each(BAD.filter(([, time]) => time === '10:00'))('refuses %s', (date, _time, reason) => {
    expect(parseIsoDate(date)).toEqual({ ok: false, reason });
    const onChange = vi.fn();
    render(<DateField value={null} hint="" onChange={onChange} />);
    fireEvent.change(screen.getByLabelText('Date of the first time'), { target: { value: date } });
    expect(onChange).not.toHaveBeenCalled();
    expect(screen.getByText(`“${date}” is not a date; ${reason}`)).toBeTruthy();
  });

  it('accepts 29 February 2028', () => {
    expect(parseIsoDate('2028-02-29')).toEqual({ ok: true, value: { year: 2028, month: 2, day: 29 } });
    const onChange = vi.fn();
    render(<DateField value={null} hint="" onChange={onChange} />);
    fireEvent.change(screen.getByLabelText('Date of the first time'), { target: { value: '2028-02-29' } });
    expect(onChange).toHaveBeenCalledWith('2028-02-29');
  });
});

/** A record of three readings 5 minutes apart, the middle one at `middle`. */
const rainText = (middle: string): string =>
  `time,rain (mm)\n2028-02-29 23:50,1.0\n${middle},2.0\n2028-03-01 00:00,0.5\n`;
const flowText = (middle: string): string =>
  `time,flow (m3/s)\n2028-02-29 23:50,1.5\n${middle},2.5\n2028-03-01 00:00,2.0\n`;
const GOOD_MIDDLE = '2028-02-29 23:55';

/** The one problem of a refused import. */
function onlyProblem(result: { ok: boolean; problems: readonly ImportProblem[] }): ImportProblem {
  expect(result.ok).toBe(false);
  expect(result.problems).toHaveLength(1);
  return result.problems[0] as ImportProblem;
}

describe('the rainfall and streamflow importers, and the fast plain-columns reader', () => {
  const rainSettings = { ...guessRainSettings(rainText(GOOD_MIDDLE)), timeMarks: 'start' as const };
  const flowSettings = guessFlowSettings(flowText(GOOD_MIDDLE));

  it.each(BAD)('refuse %s %s, naming line 3, column 1, the time', (date, time, reason) => {
    const cell = `${date} ${time}`;
    // The fast reader leaves any cell it cannot read to the general reader, which words the problem.
    expect(readPlainColumns(rainText(cell), rainSettings, 0)).toBeNull();
    expect(readPlainRain(rainText(cell), rainSettings, DEFAULT_NUMBER_FORMAT, 0)).toBeNull();
    const expected = { row: 3, column: 1, field: 'time', value: cell, reason };
    expect(onlyProblem(applyRainImport(rainText(cell), rainSettings))).toEqual(expected);
    expect(onlyProblem(applyFlowImport(flowText(cell), flowSettings))).toEqual(expected);
  });

  it('accept 29 February 2028, and step from it to 1 March in 5 minutes', () => {
    // Readings at 23:50, 23:55 on the leap day and 00:00 on 1 March: 0, 5 and 10 minutes from the first.
    const hours = [0, 5 / 60, 10 / 60];
    const firstMs = LEAP_DAY_MS + (23 * 60 + 50) * 60_000; // 1,835,395,200,000 + 85,800,000
    const plain = readPlainColumns(rainText(GOOD_MIDDLE), rainSettings, 0);
    expect(plain?.times?.origin).toEqual({ wallMs: 1_835_481_000_000, zoneMinutes: null });
    expect(firstMs).toBe(1_835_481_000_000);
    expect(Array.from(plain?.times?.hours ?? [])).toEqual(hours);
    expect(readPlainRain(rainText(GOOD_MIDDLE), rainSettings, DEFAULT_NUMBER_FORMAT, 0)?.storm.startIso).toBe(
      '2028-02-29T23:50:00',
    );
    const rain = applyRainImport(rainText(GOOD_MIDDLE), rainSettings);
    if (!rain.ok) expect.fail(JSON.stringify(rain.problems));
    expect(rain.storm.startIso).toBe('2028-02-29T23:50:00');
    expect(rain.storm.depthsMm).toEqual([1, 2, 0.5]);
    const flow = applyFlowImport(flowText(GOOD_MIDDLE), flowSettings);
    if (!flow.ok) expect.fail(JSON.stringify(flow.problems));
    expect(flow.record.startIso).toBe('2028-02-29T23:50:00');
    expect(flow.record.timesH).toEqual(hours);
  });
});
