import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { barEdgesH, type Storm } from '../../../src/core';
import { chartFrame } from '../../../src/ui/chart/frame';
import {
  barClock,
  barTimeText,
  elapsedText,
  readBarTime,
  readStartText,
  shiftStartIso,
  startFieldText,
} from '../../../src/ui/storm-input/bar-times';
import { barAt, paintSegment, rateAtPointer } from '../../../src/ui/storm-input/draw/draw-math';
import { readCell } from '../../../src/ui/storm-input/table/cell-edit';
import { moveCell, scrollToShow, visibleRows } from '../../../src/ui/storm-input/table/grid-nav';
import { expectAllClose, expectClose } from '../../helpers/tolerance';

// Invented storm for these checks: 30-min bars, then a 1-hour bar.
const storm: Storm = { durationsH: [0.5, 0.5, 1], depthsMm: [2, 6, 3], startIso: '2026-07-14T23:00:00' };
const elapsed: Storm = { durationsH: [0.5, 0.5, 1], depthsMm: [2, 6, 3] };

describe('bar times', () => {
  it('without a start are hours and minutes since the storm began', () => {
    const clock = barClock(undefined, 2);
    expect(barTimeText(clock, 0)).toBe('0:00');
    expect(barTimeText(clock, 1.5)).toBe('1:30');
    expect(elapsedText(25 + 1 / 120)).toBe('25:00:30');
  });

  it('with a start are clock readings on the storm’s own clock, with dates when the storm crosses midnight', () => {
    const oneDay = barClock('2026-07-14T15:00:00+10:00', 2);
    expect(barTimeText(oneDay, 0.25)).toBe('15:15');
    const twoDays = barClock(storm.startIso, 2);
    expect(twoDays.multiDay).toBe(true);
    expect(barTimeText(twoDays, 1)).toBe('2026-07-15 00:00');
  });

  it('read back as they are written', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 72 * 60 }), (minutes) => {
        const hours = minutes / 60;
        for (const clock of [barClock(undefined, 80), barClock('2026-07-14T06:10:00', 80)]) {
          const read = readBarTime(clock, barTimeText(clock, hours), hours);
          expect(read.ok).toBe(true);
          if (read.ok) expectClose(read.hours, hours, 1e-12, 1e-12);
        }
      }),
    );
  });

  it('a time of day alone is read on the day of the bar being edited', () => {
    const clock = barClock(storm.startIso, 2);
    const read = readBarTime(clock, '00:20', 1);
    expect(read).toEqual({ ok: true, hours: 80 / 60 });
  });

  it('refuse text that is not a time, saying how to write one', () => {
    expect(readBarTime(barClock(undefined, 2), '1:75', 0)).toEqual({
      ok: false,
      message: '“1:75” has 75 minutes; minutes run from 0 to 59.',
    });
    expect(readBarTime(barClock(undefined, 2), 'soon', 0).ok).toBe(false);
    const clocked = readBarTime(barClock(storm.startIso, 2), '25:00', 0);
    expect(clocked.ok).toBe(false);
    if (!clocked.ok) expect(clocked.message).toContain('hour 25 is out of range');
    const zoned = readBarTime(barClock(storm.startIso, 2), '2026-07-14T23:30+02:00', 0);
    expect(zoned.ok).toBe(false);
  });

  it('a start moved keeps the zone it was written in', () => {
    expect(shiftStartIso('2026-07-14T15:00:00+10:00', 1.5)).toBe('2026-07-14T16:30:00+10:00');
    expect(shiftStartIso('2026-07-14T23:30:00', 1)).toBe('2026-07-15T00:30:00');
  });

  it('a typed storm start becomes ISO 8601, and a bad one says why', () => {
    expect(readStartText('2024-05-01 09:50')).toEqual({ ok: true, iso: '2024-05-01T09:50:00' });
    expect(readStartText('2024-05-01T09:50:30Z')).toEqual({ ok: true, iso: '2024-05-01T09:50:30Z' });
    expect(readStartText('01/05/2024 09:50').ok).toBe(false);
    const bad = readStartText('2024-02-30 10:00');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toContain('Day 30 does not exist in month 2');
    expect(startFieldText('2024-05-01T09:50:00')).toBe('2024-05-01 09:50');
  });
});

describe('reading a typed cell of the bar table', () => {
  const clock = barClock(undefined, 2);

  it('a depth is read in the screen’s unit and stored in mm', () => {
    expect(readCell(elapsed, 1, 'depth', '0.5', 'us', clock)).toEqual({ ok: true, kind: 'depth', depthMm: 12.7 });
    // In the default number format (1,234.5) a comma groups thousands: "7,500" is 7,500 mm, "7,5" is refused.
    expect(readCell(elapsed, 1, 'depth', '7,500', 'si', clock)).toEqual({ ok: true, kind: 'depth', depthMm: 7500 });
    expect(readCell(elapsed, 1, 'depth', '7,5', 'si', clock).ok).toBe(false);
  });

  it('a bad depth or duration is refused with a message naming the bar', () => {
    expect(readCell(elapsed, 1, 'depth', 'lots', 'si', clock)).toEqual({
      ok: false,
      message: 'Bar 2 depth: “lots” is not a number.',
    });
    expect(readCell(elapsed, 0, 'depth', '-1', 'si', clock)).toEqual({
      ok: false,
      message: 'Bar 1 depth: “-1” mm: a rainfall or runoff depth cannot be negative.',
    });
    expect(readCell(elapsed, 2, 'duration', '0', 'si', clock)).toEqual({
      ok: false,
      // A second is 1/60 min = 0.01667 min to four figures.
      message:
        'Bar 3 duration: “0” min is less than a bar or time step can be (at least 0.01667 min): no rain gauge resolves less than a second (common practice, no source).',
    });
  });

  it('a duration is typed in minutes', () => {
    expect(readCell(elapsed, 2, 'duration', '45', 'si', clock)).toEqual({
      ok: true,
      kind: 'duration',
      durationH: 0.75,
    });
  });

  it('a new start moves the boundary with the bar before, as one named edit', () => {
    const edit = readCell(elapsed, 1, 'start', '0:40', 'si', clock);
    expect(edit.ok && edit.kind).toBe('storm');
    if (edit.ok && edit.kind === 'storm') {
      expectAllClose(edit.storm.durationsH, [2 / 3, 1 / 3, 1], 1e-12);
      expect(edit.label).toBe('Set bar 2 start time');
    }
  });

  it('a start outside the neighbouring bars is refused, naming both ends', () => {
    const edit = readCell(elapsed, 1, 'start', '1:10', 'si', clock);
    expect(edit).toEqual({
      ok: false,
      message:
        'Bar 2 start: must fall after bar 1 starts (0:00) and before bar 2 ends (1:00); change durations to move the later bars.',
    });
  });

  it('the first bar’s start moves the storm’s clock start, and without a clock it stays at 0:00', () => {
    const withClock = readCell(storm, 0, 'start', '22:30', 'si', barClock(storm.startIso, 2));
    expect(withClock).toEqual({ ok: true, kind: 'start', startIso: '2026-07-14T22:30:00' });
    const without = readCell(elapsed, 0, 'start', '0:10', 'si', clock);
    expect(without.ok).toBe(false);
    expect(readCell(elapsed, 0, 'start', '0:00', 'si', clock)).toEqual({ ok: true, kind: 'none' });
  });
});

describe('moving through the bar table from the keyboard', () => {
  const shape = { rows: 100, cols: 7, page: 10 };

  it('arrows move one cell and stop at the edges', () => {
    expect(moveCell('ArrowDown', false, { row: 3, col: 2 }, shape)).toEqual({ row: 4, col: 2 });
    expect(moveCell('ArrowUp', false, { row: 0, col: 2 }, shape)).toEqual({ row: 0, col: 2 });
    expect(moveCell('ArrowRight', false, { row: 0, col: 6 }, shape)).toEqual({ row: 0, col: 6 });
    expect(moveCell('ArrowLeft', false, { row: 5, col: 1 }, shape)).toEqual({ row: 5, col: 0 });
  });

  it('Page keys move a screenful, Home/End the row, Ctrl+Home/End the whole storm', () => {
    expect(moveCell('PageDown', false, { row: 95, col: 3 }, shape)).toEqual({ row: 99, col: 3 });
    expect(moveCell('PageUp', false, { row: 15, col: 3 }, shape)).toEqual({ row: 5, col: 3 });
    expect(moveCell('Home', false, { row: 7, col: 3 }, shape)).toEqual({ row: 7, col: 0 });
    expect(moveCell('End', true, { row: 7, col: 3 }, shape)).toEqual({ row: 99, col: 3 });
    expect(moveCell('Home', true, { row: 7, col: 3 }, shape)).toEqual({ row: 0, col: 3 });
  });

  it('other keys are not moves', () => {
    expect(moveCell('a', false, { row: 0, col: 0 }, shape)).toBeNull();
    expect(moveCell('ArrowDown', false, { row: 0, col: 0 }, { rows: 0, cols: 7, page: 1 })).toBeNull();
  });

  it('only the rows in view (and a margin) are drawn, and scrolling brings a row into view', () => {
    expect(visibleRows(0, 300, 30, 5000, 5)).toEqual({ first: 0, end: 15 });
    expect(visibleRows(3000, 300, 30, 5000, 5)).toEqual({ first: 95, end: 115 });
    expect(visibleRows(0, 300, 30, 3, 5)).toEqual({ first: 0, end: 3 });
    expect(scrollToShow(50, 0, 300, 30)).toBe(1230);
    expect(scrollToShow(2, 1230, 300, 30)).toBe(60);
    expect(scrollToShow(45, 1230, 300, 30)).toBe(1230);
  });
});

describe('drawing with the pointer', () => {
  const frame = chartFrame(elapsed, 880, 320, 'si');

  it('finds the bar under x, holding to the first and last bar outside the storm', () => {
    const e = frame.edgesPx;
    expect(barAt(e, (e[0] as number) + 1)).toBe(0);
    expect(barAt(e, (e[2] as number) + 0.01)).toBe(2);
    expect(barAt(e, -50)).toBe(0);
    expect(barAt(e, 5000)).toBe(2);
    expect(barAt(new Float64Array([0]), 3)).toBe(-1);
  });

  it('a sweep faster than the bars paints every bar it passes, along a straight line', () => {
    const many = barEdgesH({ durationsH: Array(100).fill(0.1), depthsMm: Array(100).fill(0) });
    const painted: [number, number][] = [];
    paintSegment(many, { x: 0.05, rateMmH: 0 }, { x: 9.95, rateMmH: 99 }, (k, r) => painted.push([k, r]));
    expect(painted.map(([k]) => k)).toEqual(Array.from({ length: 100 }, (_, k) => k));
    for (const [k, r] of painted) expectClose(r, k, 1e-9, 1e-9);
  });

  it('reads the rate from the chart’s scale, never below zero nor above the limit, on a round grid', () => {
    expect(rateAtPointer(frame.y, frame.y(12.34), 50, frame.topDisplay, 'si')).toBe(12.3);
    expect(rateAtPointer(frame.y, frame.plot.bottom + 80, 50, frame.topDisplay, 'si')).toBe(0);
    expect(rateAtPointer(frame.y, -400, 23, frame.topDisplay, 'si')).toBe(23);
  });

  it('respects the units on screen: in US customary the grid is in inches per hour', () => {
    const us = chartFrame(elapsed, 880, 320, 'us');
    const rate = rateAtPointer(us.y, us.y(12.34), 50, us.topDisplay, 'us');
    // The axis runs to 0.6 in/h, so the grid is 0.001 in/h: 12.34 mm/h = 0.48583 in/h → 0.486 in/h.
    expect(us.topDisplay).toBe(0.6);
    expectClose(rate, 0.486 * 25.4, 1e-12);
  });
});
