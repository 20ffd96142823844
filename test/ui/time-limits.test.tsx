// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { MAX_RECORD_H } from '../../src/core';
import type { Scenario } from '../../src/scenario/types';
import { NO_CLOCK_TEXT, formatClockText, formatWallDate, formatWallTime, wallClockMs } from '../../src/ui/chart/clock';
import { elapsedText } from '../../src/ui/storm-input/bar-times';
import { lazyPartsLoaded, renderWorkbench } from '../helpers/render';
import { FOUR_BARS } from '../helpers/scenario-fixtures';
import { WITH_TRIANGLE } from '../helpers/flow-fixtures';

// Every typed time or duration is held to its plausible range and, last, to
// the core's limits of time (src/core/time-limits.ts: a record of at most 500
// years, bars of at least a second, start clocks in the years 1000 to 2999),
// with a message beside the field, and nothing past them reaches the store, the autosave or the clock
// formatters. Before these limits, a bar duration of 10¹² min typed into the
// bar table of a storm with a start clock was stored, and drawing the chart
// threw "Invalid time value" (Intl.DateTimeFormat past the Date range).

const CLOCKED: Scenario = { ...FOUR_BARS, storm: { ...FOUR_BARS.storm, startIso: '2026-07-14T15:00:00' } };

type User = ReturnType<typeof renderWorkbench>['user'];

/** The duration cell of bar k (1-based) in the bar table (the header is row 1, duration column 3). */
function durationCell(k: number): HTMLElement {
  const grid = screen.getByRole('grid', { name: 'Bar table' });
  const row = within(grid)
    .getAllByRole('row')
    .find((r) => r.getAttribute('aria-rowindex') === String(k + 1));
  const cell =
    row &&
    within(row)
      .getAllByRole('gridcell')
      .find((c) => c.getAttribute('aria-colindex') === '3');
  if (!cell) throw new Error(`no duration cell for bar ${k}`);
  return cell;
}

async function retype(user: User, field: HTMLElement, text: string): Promise<void> {
  await user.clear(field);
  await user.type(field, text);
}

describe('the clock formatters never throw', () => {
  // 2999-12-31 23:59 plus 1000 years of 365.25 days: the furthest moment a record may reach.
  const furthest = (wallClockMs('2999-12-31T23:59') as number) + 2 * MAX_RECORD_H * 3.6e6;

  it('write the furthest moment a record may reach', () => {
    // 1000 years of 365.25 days = 365,250 days. The Gregorian years 3000 to 3999 hold 365,242 days
    // (242 leap years: 250 multiples of 4 less the eight centuries not divisible by 400), so the
    // moment falls 8 days after 31 Dec 3999 23:59: 8 Jan 4000 23:59.
    expect(formatWallDate(furthest)).toBe('8 Jan 4000');
    expect(formatWallTime(furthest)).toBe('23:59');
    expect(formatClockText(furthest, true)).toBe('4000-01-08 23:59');
  });

  it.each([
    ['past the browser’s date range', 8.64e15 + 1],
    ['a bar of 10¹² min from a 2026 start', (wallClockMs('2026-07-14T15:00') as number) + 1e12 * 60_000],
    ['a record of 3·10⁹ h', 3e9 * 3.6e6],
    ['minus infinity', -Infinity],
    ['not a number', Number.NaN],
  ])('write a dash for a moment %s', (_what, ms) => {
    expect(formatWallDate(ms)).toBe(NO_CLOCK_TEXT);
    expect(formatWallTime(ms)).toBe(NO_CLOCK_TEXT);
    expect(formatClockText(ms, true)).toBe(NO_CLOCK_TEXT);
  });

  it('write elapsed times of any size, and a dash for what is not a number', () => {
    // 4,383,000 h = 500 years, written as hours and minutes.
    expect(elapsedText(MAX_RECORD_H)).toBe('4383000:00');
    expect(elapsedText(Number.NaN)).toBe(NO_CLOCK_TEXT);
    expect(elapsedText(Infinity)).toBe(NO_CLOCK_TEXT);
  });
});

/**
 * The plausible range's refusal of a bar or step past a year (src/io/plausible.ts): a year of
 * 366 days is 366 × 24 × 60 = 527,040 min.
 */
const STEP_PAST_A_YEAR =
  '“1e12” min is more than a bar or time step can be (at most 527,040 min): a rainfall bar is one reading of a gauge, and the longest totals kept are yearly (common practice, no source).';

/**
 * CLOCKED's first two bars (0.5 h each) and then 498 bars of a 366-day year (8,784 h each, the
 * longest a typed bar may be): 0.5 + 0.5 + 498 × 8,784 = 1 + 4,374,432 = 4,374,433 h, inside
 * 500 years (4,383,000 h), so the storm reads; but bar 2 typed as a whole year is past them.
 */
const NEAR_500_YEARS: Scenario = {
  ...CLOCKED,
  storm: {
    ...CLOCKED.storm,
    durationsH: [0.5, 0.5, ...Array.from({ length: 498 }, () => 8784)],
    depthsMm: [2, 6, ...Array.from({ length: 498 }, () => 0)],
  },
};

// A typed value meets the plausible range first (src/io/plausible.ts: a bar,
// a step or a storm of at most a year, an offset within a year): its message
// quotes what was typed and names the field. The core's limits of time are
// the last gate, reached by what passes the first: a storm whose bars, each
// plausible, add up to more than 500 years.
describe('a time or duration typed past the limits is refused beside its field', () => {
  it('a bar duration of 10¹² min in the bar table of a storm with a start clock', async () => {
    const { user, scenario, store } = renderWorkbench(CLOCKED);
    await lazyPartsLoaded();
    await user.click(durationCell(1));
    await user.keyboard('1e12{Enter}');
    const editor = screen.getByRole('textbox', { name: 'Bar 1 duration' });
    expect(editor).toHaveAccessibleDescription(`Bar 1 duration: ${STEP_PAST_A_YEAR}`);
    expect(scenario()).toBe(CLOCKED);
    expect(store.getState().history.past).toHaveLength(0);
    // The chart still draws its clock axis.
    expect(screen.getByText(/Clock time, storm from 14 Jul 2026 15:00/)).toBeInTheDocument();
  });

  it('a bar duration that would make the storm run past 500 years, refused by the store with the bar named', async () => {
    const { user, scenario, store } = renderWorkbench(NEAR_500_YEARS);
    await lazyPartsLoaded();
    await user.click(durationCell(2));
    // 527,040 min = 8,784 h, a year of 366 days: the most the plausible range lets a bar be.
    await user.keyboard('527040{Enter}');
    expect(screen.getByRole('textbox', { name: 'Bar 2 duration' })).toHaveAccessibleDescription(
      // 4,374,433 h − 0.5 h (bar 2 as it was) + 8,784 h = 4,383,216.5 h; ÷ 8,766 h a year = 500.02 years,
      // "500" to four figures. 8,784 h ÷ 24 = 366 days.
      'Bar 2: with a duration of 366 days the storm would last 4,383,216.5 h, 500 years; a record spans at most 500 years (4,383,000 h).',
    );
    expect(scenario()).toBe(NEAR_500_YEARS);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('a new empty storm of 10¹² min bars in the drawing panel', async () => {
    const { user, scenario } = renderWorkbench(CLOCKED);
    await lazyPartsLoaded();
    await user.click(screen.getByRole('button', { name: 'Draw bars' }));
    await lazyPartsLoaded();
    const panel = screen.getByRole('region', { name: 'Drawing bars' });
    const step = within(panel).getByRole('textbox', { name: 'Bar duration (min)' });
    await retype(user, step, '1e12');
    await user.click(within(panel).getByRole('button', { name: 'Start a new empty storm' }));
    expect(step).toHaveAccessibleDescription(STEP_PAST_A_YEAR);
    expect(scenario()).toBe(CLOCKED);
  });

  it('a resample step of 10¹² min and a storm start in the year 24 in Storm tools', async () => {
    const { user, scenario } = renderWorkbench(CLOCKED);
    await lazyPartsLoaded();
    await user.click(screen.getByRole('button', { name: 'Storm tools' }));
    await lazyPartsLoaded();
    const tools = screen.getByRole('region', { name: 'Storm tools' });
    const step = within(tools).getByRole('textbox', { name: 'New time step (min)' });
    await retype(user, step, '1e12');
    await user.click(within(tools).getByRole('button', { name: 'Resample' }));
    expect(step).toHaveAccessibleDescription(expect.stringContaining(STEP_PAST_A_YEAR));
    const start = within(tools).getByRole('textbox', { name: 'Storm start' });
    await retype(user, start, '0024-05-01 10:00');
    await user.click(within(tools).getByRole('button', { name: 'Set start' }));
    expect(start).toHaveAccessibleDescription(
      expect.stringContaining(
        'The storm start "0024-05-01T10:00:00" is in the year 0024; a start clock falls in the years 1000 to 2999.',
      ),
    );
    expect(scenario()).toBe(CLOCKED);
  });

  it('a design storm of 10¹² min', async () => {
    const view = renderWorkbench(CLOCKED);
    await lazyPartsLoaded();
    await view.user.click(screen.getByRole('tab', { name: 'Design storm' }));
    await lazyPartsLoaded();
    await retype(view.user, screen.getByRole('textbox', { name: 'Storm duration (min)' }), '1e12');
    expect(screen.getByRole('alert')).toHaveTextContent(
      // A year of 366 days = 527,040 min (as above).
      /^Storm duration: “1e12” min is more than a storm duration can be \(at most 527,040 min\)/,
    );
    expect(view.scenario()).toBe(CLOCKED);
  });

  it('a record offset of 10¹² h', async () => {
    const { user, scenario, store } = renderWorkbench(WITH_TRIANGLE);
    await lazyPartsLoaded();
    const offset = screen.getByLabelText(/^Record start after storm start/);
    await retype(user, offset, '1e12');
    expect(offset).toHaveAccessibleDescription(
      expect.stringContaining(
        // A year of 366 days = 366 × 24 = 8,784 h, either way.
        '“1e12” h is more than a time between the storm and the record can be (at most 8,784 h): a streamflow record for an event starts within days of its storm; a year is far beyond that (common practice, no source). Not applied; still 0 h.',
      ),
    );
    expect(offset).toHaveValue('1e12');
    // Not applied: the offset stays as it was before the typing (0 h), never the "1e1" (10 h) typed on the way.
    expect(scenario()).toBe(WITH_TRIANGLE);
    expect(store.getState().history.past).toHaveLength(0);
  });
});
