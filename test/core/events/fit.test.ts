import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  InputError,
  calibrate,
  defaultMethod,
  fitEvents,
  type CatchmentEvent,
  type LossMethod,
} from '../../../src/core';
import { thrown } from '../../helpers/thrown';

// All events in this file are invented.
const bar = (depthMm: number, durationH = 1) => ({ durationsH: [durationH], depthsMm: [depthMm] });

describe('fitting every event of a catchment', () => {
  test('each row gives rainfall, observed runoff, runoff fraction and the fitted φ-index', () => {
    const events: CatchmentEvent[] = [
      { id: 'a', name: 'March', storm: { durationsH: [1, 1, 1], depthsMm: [4, 12, 4] }, observedExcessMm: 6 },
      { id: 'b', name: 'June', storm: bar(10), observedExcessMm: 8 },
    ];
    const rows = fitEvents(events, defaultMethod('constant'), 'rateMmH');
    expect(rows.map((r) => r.id)).toEqual(['a', 'b']);
    expect(rows[0]).toMatchObject({ rainMm: 20, observedMm: 6, runoffFraction: 0.3 });
    expect(rows[1]).toMatchObject({ rainMm: 10, observedMm: 8, runoffFraction: 0.8 });
    // By hand: March, only the 12 mm bar is above φ, 12 − φ = 6 → φ = 6 mm/h.
    // June: one 10 mm bar in 1 h, 10 − φ = 8 → φ = 2 mm/h.
    expect(rows[0]?.result).toMatchObject({ ok: true, value: 6 });
    expect(rows[1]?.result).toMatchObject({ ok: true, value: 2 });
  });

  test('events without an answer are kept, with calibrate’s reason and message', () => {
    const events: CatchmentEvent[] = [
      { id: 'more', name: 'More than rain', storm: bar(10), observedExcessMm: 12 },
      { id: 'neg', name: 'Negative', storm: bar(10), observedExcessMm: -1 },
      { id: 'bad', name: 'Broken storm', storm: { durationsH: [1, 0], depthsMm: [5, 5] }, observedExcessMm: 1 },
      { id: 'dry', name: 'Dry', storm: bar(0), observedExcessMm: 0 },
    ];
    const rows = fitEvents(events, defaultMethod('constant'), 'rateMmH');
    expect(rows.map((r) => (r.result.ok ? 'ok' : r.result.reason))).toEqual([
      'exceeds-rainfall',
      'negative-target',
      'invalid-input',
      'ok',
    ]);
    expect(rows[0]?.runoffFraction).toBe(1.2);
    // A broken storm has no rainfall to report; a dry one has no fraction.
    expect(rows[2]?.rainMm).toBeNull();
    expect(rows[2]?.runoffFraction).toBeNull();
    expect(rows[3]?.rainMm).toBe(0);
    expect(rows[3]?.runoffFraction).toBeNull();
    for (const row of rows) if (!row.result.ok) expect(row.result.message.length).toBeGreaterThan(0);
  });

  test('an unknown parameter fails every event the way calibrate does', () => {
    const events: CatchmentEvent[] = [{ id: 'a', name: 'A', storm: bar(10), observedExcessMm: 5 }];
    const rows = fitEvents(events, defaultMethod('constant'), 'coefficient');
    expect(rows[0]?.result).toEqual(calibrate(bar(10), defaultMethod('constant'), 'coefficient', 5));
    expect(rows[0]?.result.ok).toBe(false);
  });

  test('an empty event list gives an empty table', () => {
    expect(fitEvents([], defaultMethod('constant'), 'rateMmH')).toEqual([]);
  });

  test('every row agrees exactly with calibrating that event alone', () => {
    const storm = fc
      .array(fc.tuple(fc.double({ min: 0.05, max: 3, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true })), {
        minLength: 1,
        maxLength: 30,
      })
      .map((bars) => ({ durationsH: bars.map((b) => b[0]), depthsMm: bars.map((b) => b[1]) }));
    const event = fc.record({ storm, fraction: fc.double({ min: -0.1, max: 1.1, noNaN: true }) });
    const fitted: { method: LossMethod; parameter: string }[] = [
      { method: defaultMethod('constant'), parameter: 'rateMmH' },
      { method: defaultMethod('proportional'), parameter: 'coefficient' },
      { method: { kind: 'initial-continuing', initialMm: 5, rateMmH: 2 }, parameter: 'rateMmH' },
      { method: { kind: 'initial-continuing', initialMm: 5, rateMmH: 2 }, parameter: 'initialMm' },
    ];
    fc.assert(
      fc.property(
        fc.array(event, { minLength: 1, maxLength: 8 }),
        fc.constantFrom(...fitted),
        (drawn, { method, parameter }) => {
          const events: CatchmentEvent[] = drawn.map((e, k) => {
            const rain = e.storm.depthsMm.reduce((s, p) => s + p, 0);
            return { id: `e${k}`, name: `Event ${k + 1}`, storm: e.storm, observedExcessMm: e.fraction * rain };
          });
          const rows = fitEvents(events, method, parameter);
          expect(rows).toHaveLength(events.length);
          events.forEach((e, k) => {
            const alone = calibrate(e.storm, method, parameter, e.observedExcessMm);
            const row = rows[k];
            expect(row?.result).toEqual(alone);
            if (alone.ok && row?.result.ok) expect(Object.is(row.result.value, alone.value)).toBe(true);
          });
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('fitting refuses a malformed event list, naming the field', () => {
  const good: CatchmentEvent = { id: 'a', name: 'A', storm: bar(10), observedExcessMm: 5 };

  test('two events with one id', () => {
    const error = thrown(() => fitEvents([good, { ...good, name: 'Copy' }], defaultMethod('constant'), 'rateMmH'));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('id');
    expect((error as InputError).index).toBe(1);
  });

  test.each([
    [{ ...good, id: '' }, 'id'],
    [{ ...good, id: 7 }, 'id'],
    [{ ...good, name: undefined }, 'name'],
    [null, 'events'],
  ])('event %j is refused on %s', (event, field) => {
    const error = thrown(() => fitEvents([event as unknown as CatchmentEvent], defaultMethod('constant'), 'rateMmH'));
    expect((error as InputError).field).toBe(field);
    expect((error as InputError).index).toBe(0);
  });

  test('a list that is not an array', () => {
    const error = thrown(() => fitEvents({} as unknown as CatchmentEvent[], defaultMethod('constant'), 'rateMmH'));
    expect((error as InputError).field).toBe('events');
  });
});
