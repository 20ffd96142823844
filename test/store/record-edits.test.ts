import { describe, expect, it } from 'vitest';
import { splitEvents } from '../../src/core';
import { readScenario } from '../../src/store';
import { withRecordEvents, flowOffsetH } from '../../src/store/record-edits';
import { MAX_EVENTS } from '../../src/scenario/schema';
import { expectInputError } from '../helpers/input-error';
import { expectAllClose } from '../helpers/tolerance';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

// Eleven bars of 1 h from 2026-03-01 00:00: 2, 0, 0, 0, 3, 1, 0, 0, 0, 0, 4 mm.
// With a dry spell of 3 h between events: bars 1–3 (3 h) and 6–9 (4 h) both
// separate, so the events are bars 0–0 (2 mm), 4–5 (3 + 1 = 4 mm, 2 h) and 10–10 (4 mm).
const RAIN = {
  durationsH: new Array(11).fill(1),
  depthsMm: [2, 0, 0, 0, 3, 1, 0, 0, 0, 0, 4],
  startIso: '2026-03-01T00:00',
};
const EVENTS = splitEvents(RAIN, { minDryH: 3 });
const picks = (names: string[]) => EVENTS.map((event, k) => ({ event, name: names[k] ?? `E${k}` }));

/** The document after the edit still reads as a scenario (the schema's own check). */
function readsBack(doc: unknown): void {
  const r = readScenario(JSON.parse(JSON.stringify(doc)));
  if (!r.ok) throw new Error(r.message);
}

describe('adding events cut from a long record', () => {
  it('adds each picked event as a storm of its own, at the end of the set, leaving the workbench alone', () => {
    expect(EVENTS.map((e) => [e.firstBar, e.lastBar])).toEqual([
      [0, 0],
      [4, 5],
      [10, 10],
    ]);
    const s = withRecordEvents(FOUR_BARS, RAIN, picks(['a', 'b', 'c']));
    expect(s.eventSet.events.map((e) => [e.id, e.name])).toEqual([
      ['e1', 'a'],
      ['e2', 'b'],
      ['e3', 'c'],
    ]);
    // Event b: bars 4 and 5 (3 and 1 mm), starting 4 h after 00:00 (shiftIso writes the seconds).
    expect(s.eventSet.events[1]?.storm).toEqual({
      durationsH: [1, 1],
      depthsMm: [3, 1],
      startIso: '2026-03-01T04:00:00',
    });
    expect(s.eventSet.events[1]?.streamflow).toBeNull();
    expect(s.eventSet.activeId).toBeNull();
    expect(s.storm).toBe(FOUR_BARS.storm);
    readsBack(s);
  });

  it('gives each event its window of a streamflow record, lined up by the clocks', () => {
    // The flow record starts at 00:30, hourly: sample j is at j + 0.5 h on the rain's clock.
    // Event b runs 4 h to 6 h; with 2 h after, its window is 4 h to 8 h on the rain's clock,
    // 3.5 h to 7.5 h on the record's: from sample 3 (the last at or before 3.5) to sample 8
    // (the first at or after 7.5), six samples. Sample 3 lies at 3.5 h, half an hour before
    // the event's start: offset −0.5 h, clock 03:30.
    const flow = {
      timesH: Array.from({ length: 14 }, (_, j) => j),
      dischargeM3s: [1, 1, 1, 1, 2, 5, 9, 6, 4, 3, 2, 2, 1, 1],
      startIso: '2026-03-01T00:30',
    };
    expect(flowOffsetH(RAIN, flow)).toBe(0.5);
    const s = withRecordEvents(FOUR_BARS, RAIN, [{ event: EVENTS[1]!, name: 'b' }], { record: flow, afterH: 2 });
    const got = s.eventSet.events[0]?.streamflow;
    expect(got?.dischargeM3s).toEqual([1, 2, 5, 9, 6, 4]);
    expectAllClose(got?.timesH ?? [], [0, 1, 2, 3, 4, 5]);
    expect(got?.offsetH).toBe(-0.5);
    expect(got?.startIso).toBe('2026-03-01T03:30:00');
    expect(got?.baseflow.kind).toBe('straight-line');
    readsBack(s);
  });

  it('refuses, naming the event, a window the streamflow record does not reach', () => {
    // A record of 0 to 8 h covers event a (0–2 h) and b (4–7 h) but not c (10–12 h).
    const flow = { timesH: [0, 1, 2, 3, 4, 5, 6, 7, 8], dischargeM3s: [1, 1, 1, 1, 2, 3, 2, 1, 1] };
    expectInputError(
      () => withRecordEvents(FOUR_BARS, RAIN, picks(['a', 'b', 'c']), { record: flow, afterH: 1 }),
      'timesH',
      /^c: The streamflow record/,
    );
  });

  it('refuses more events than the set holds, changing nothing', () => {
    const many = Array.from({ length: MAX_EVENTS + 1 }, () => ({ event: EVENTS[0]!, name: 'x' }));
    expectInputError(() => withRecordEvents(FOUR_BARS, RAIN, many), 'events', new RegExp(`at most ${MAX_EVENTS}`));
    expectInputError(() => withRecordEvents(FOUR_BARS, RAIN, []), 'events', /No events/);
  });
});
