// An event's own storm and its window of the streamflow record.
import { describe, expect, it } from 'vitest';
import { eventFlowWindow, eventSpanH, eventStorm, shiftIso, splitEvents } from '../../../src/core';
import { expectInputError } from '../../helpers/input-error';

// Invented record: hourly bars, two events (bars 6–8 and 30–31) with 6 h spells.
const depthsMm = new Array<number>(48).fill(0);
depthsMm[6] = 3;
depthsMm[7] = 0;
depthsMm[8] = 5;
depthsMm[30] = 2;
depthsMm[31] = 4;
const record = { durationsH: new Array<number>(48).fill(1), depthsMm, startIso: '2024-05-01T00:00' };
const [first, second] = splitEvents(record, { minDryH: 6 });
// Hourly streamflow over two days (invented): a base of 1 m³/s.
const flow = {
  timesH: Array.from({ length: 49 }, (_, i) => i),
  dischargeM3s: Array.from({ length: 49 }, (_, i) => 1 + (i >= 7 && i <= 14 ? 10 - Math.abs(i - 9) : 0)),
};

describe('eventStorm and eventSpanH', () => {
  it('cuts the event out, starting at hour 0 and placed on the calendar at its start', () => {
    expect(first).toEqual({ firstBar: 6, lastBar: 8, depthMm: 8, durationH: 3 });
    expect(eventSpanH(record, first!)).toEqual({ startH: 6, endH: 9 });
    expect(eventStorm(record, first!)).toEqual({
      durationsH: [1, 1, 1],
      depthsMm: [3, 0, 5],
      startIso: '2024-05-01T06:00:00',
    });
    expect(eventStorm(record, second!).startIso).toBe('2024-05-02T06:00:00');
  });

  it('keeps a zone as written, and leaves a storm without a start without one', () => {
    expect(shiftIso('2024-12-31T22:30+10:00', 2.5)).toBe('2025-01-01T01:00:00+10:00');
    expect(shiftIso('2024-05-01T00:00:00Z', 1 / 12)).toBe('2024-05-01T00:05:00Z');
    expect(shiftIso('2024-05-01T00:00:00.250', 0)).toBe('2024-05-01T00:00:00.250');
    const { startIso: _, ...noClock } = record;
    expect(eventStorm(noClock, first!)).toEqual({ durationsH: [1, 1, 1], depthsMm: [3, 0, 5] });
  });

  it('names a bar outside the record', () => {
    expectInputError(
      () => eventStorm(record, { firstBar: 40, lastBar: 50, depthMm: 0, durationH: 0 }),
      'lastBar',
      /47/,
    );
    expectInputError(
      () => eventStorm(record, { firstBar: -1, lastBar: 2, depthMm: 0, durationH: 0 }),
      'firstBar',
      /not a bar/,
    );
  });
});

describe('eventFlowWindow', () => {
  it('takes the record from the event start to the stated time after its end, timed from the event start', () => {
    // Event 6–9 h, 12 h after: samples at 6…21 h, times 0…15 h from the event start.
    const w = eventFlowWindow(record, first!, flow, { afterH: 12 });
    expect([w.firstSample, w.lastSample]).toEqual([6, 21]);
    expect(Array.from(w.timesH)).toEqual(Array.from({ length: 16 }, (_, i) => i));
    expect(Array.from(w.dischargeM3s)).toEqual(flow.dischargeM3s.slice(6, 22));
  });

  it('covers a window whose ends fall between samples with the samples around them', () => {
    // Two-hourly samples: window 6–21 h takes the samples at 6…22 h.
    const coarse = {
      timesH: flow.timesH.filter((t) => t % 2 === 0),
      dischargeM3s: flow.dischargeM3s.filter((_, i) => i % 2 === 0),
    };
    const w = eventFlowWindow(record, first!, coarse, { afterH: 12 });
    expect(w.timesH[0]).toBe(0);
    expect(w.timesH[w.timesH.length - 1]).toBe(16);
    // A record whose clock starts 1 h after the rain's: the window is 5–20 h on its
    // clock, covered by its samples at 4…20 h (5…21 h on the rain's), so it starts
    // 1 h before the event and ends 15 h after the event's start.
    const later = eventFlowWindow(record, first!, coarse, { afterH: 12, offsetH: 1 });
    expect([later.firstSample, later.lastSample]).toEqual([2, 10]);
    expect(later.timesH[0]).toBe(-1);
    expect(later.timesH[later.timesH.length - 1]).toBe(15);
  });

  it('names what is wrong when the record does not reach the event', () => {
    const short = { timesH: [0, 1, 2], dischargeM3s: [1, 1, 1] };
    expectInputError(() => eventFlowWindow(record, second!, short, { afterH: 12 }), 'timesH', /does not reach/);
    expectInputError(() => eventFlowWindow(record, first!, flow, { afterH: -1 }), 'afterH', /zero or more/);
    expectInputError(() => eventFlowWindow(record, first!, flow, { afterH: 1, offsetH: NaN }), 'offsetH', /offset/);
    expectInputError(
      () => eventFlowWindow(record, first!, { timesH: [0, 2], dischargeM3s: [1] }, { afterH: 1 }),
      'dischargeM3s',
      /match/,
    );
  });
});
