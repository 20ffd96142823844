import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  InputError,
  applyDesignValue,
  computeLosses,
  defaultMethod,
  fitEvents,
  type CatchmentEvent,
  type EventRunoff,
} from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';
import { thrown } from '../../helpers/thrown';

// Invented events, each one bar of 1 h: with φ the runoff is rain − φ.
const oneBar = (id: string, rainMm: number, observedExcessMm: number): CatchmentEvent => ({
  id,
  name: id,
  storm: { durationsH: [1], depthsMm: [rainMm] },
  observedExcessMm,
});
const okRow = (row: EventRunoff | undefined) => {
  if (!row?.ok) return expect.fail(`expected an ok row, got ${JSON.stringify(row)}`);
  return row;
};

describe('applying a design value to every event', () => {
  const events = [oneBar('a', 10, 8), oneBar('b', 10, 5), oneBar('c', 10, 7), oneBar('e', 20, 10)];

  test('φ = 4 mm/h: runoff and error per event match the hand values', () => {
    const rows = applyDesignValue(events, defaultMethod('constant'), 'rateMmH', 4);
    // Runoff 6, 6, 6, 16 mm; error = runoff − observed.
    const expected = [
      { id: 'a', runoffMm: 6, errorMm: -2, errorPct: -25 },
      { id: 'b', runoffMm: 6, errorMm: 1, errorPct: 20 },
      { id: 'c', runoffMm: 6, errorMm: -1, errorPct: -100 / 7 },
      { id: 'e', runoffMm: 16, errorMm: 6, errorPct: 60 },
    ];
    expected.forEach((e, k) => {
      const row = okRow(rows[k]);
      expect(row.id).toBe(e.id);
      expectClose(row.runoffMm, e.runoffMm);
      expectClose(row.errorMm, e.errorMm);
      expectClose(row.errorPct ?? Number.POSITIVE_INFINITY, e.errorPct);
    });
    expect(okRow(rows[3])).toMatchObject({ rainMm: 20, observedMm: 10, runoffFraction: 0.8 });
  });

  test('applying each event’s own fitted value gives back its observed runoff', () => {
    const storm = fc
      .array(fc.tuple(fc.double({ min: 0.1, max: 2, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true })), {
        minLength: 1,
        maxLength: 20,
        size: 'max',
      })
      .map((bars) => ({ durationsH: bars.map((b) => b[0]), depthsMm: bars.map((b) => b[1]) }));
    const method = { kind: 'initial-continuing', initialMm: 3, rateMmH: 1 } as const;
    let checked = 0;
    fc.assert(
      // The observed runoff is a share of the most this initial loss lets through (continuing
      // rate 0), so every draw has a fit; drawn as a share of the rain, most had none.
      fc.property(
        storm,
        fc.integer({ min: 1, max: 2 ** 30 }).map((n) => n / 2 ** 30),
        (s, share) => {
          const most = computeLosses(s, { ...method, rateMmH: 0 }).totalExcessMm;
          fc.pre(most > 0);
          const event: CatchmentEvent = { id: 'x', name: 'x', storm: s, observedExcessMm: share * most };
          const fit = fitEvents([event], method, 'rateMmH')[0]?.result;
          expect(fit?.ok).toBe(true);
          if (!fit?.ok) return;
          const row = okRow(applyDesignValue([event], method, 'rateMmH', fit.value)[0]);
          expectClose(row.runoffMm, event.observedExcessMm, 1e-7, 1e-9);
          checked++;
        },
      ),
      { numRuns: 80 },
    );
    expect(checked).toBeGreaterThanOrEqual(70);
  });

  test('nothing observed: the error in mm is given, the percentage is not', () => {
    const row = okRow(applyDesignValue([oneBar('z', 10, 0)], defaultMethod('constant'), 'rateMmH', 4)[0]);
    expect(row.errorMm).toBe(6);
    expect(row.errorPct).toBeNull();
  });

  test('the other parameters of the method are kept', () => {
    // IL 5 mm, CL set to 1 mm/h on a 2 h storm of 10 mm/h: 20 − 5 − 1·1.5 = 13.5 mm
    // (IL is used up after 0.5 h; the continuing rate applies to the remaining 1.5 h).
    const event: CatchmentEvent = {
      id: 'il',
      name: 'il',
      storm: { durationsH: [2], depthsMm: [20] },
      observedExcessMm: 12,
    };
    const row = okRow(
      applyDesignValue([event], { kind: 'initial-continuing', initialMm: 5, rateMmH: 9 }, 'rateMmH', 1)[0],
    );
    expectClose(row.runoffMm, 13.5);
  });

  test('an event with a broken storm or observed depth gets a row that says why; the others are computed', () => {
    const rows = applyDesignValue(
      [
        oneBar('a', 10, 8),
        { id: 'bad', name: 'bad', storm: { durationsH: [1], depthsMm: [-2] }, observedExcessMm: 1 },
        oneBar('nan', 10, Number.NaN),
        oneBar('neg', 10, -3),
      ],
      defaultMethod('constant'),
      'rateMmH',
      4,
    );
    expect(rows.map((r) => r.ok)).toEqual([true, false, false, false]);
    expect(rows[1]).toMatchObject({ id: 'bad', ok: false, field: 'depthsMm' });
    expect(rows[2]).toMatchObject({ id: 'nan', ok: false, field: 'observedExcessMm' });
    expect(rows[3]).toMatchObject({ id: 'neg', ok: false, field: 'observedExcessMm' });
  });
});

describe('applying a design value refuses what applies to every event, naming the field', () => {
  const events = [oneBar('a', 10, 8)];

  test.each([
    ['constant', 'rateMmH', -1, 'rateMmH'],
    ['constant', 'rateMmH', Number.NaN, 'rateMmH'],
    ['proportional', 'coefficient', 1.5, 'coefficient'],
    ['constant', 'coefficient', 0.5, 'parameter'],
  ] as const)('%s with %s = %s is refused on %s', (kind, parameter, value, field) => {
    const error = thrown(() => applyDesignValue(events, defaultMethod(kind), parameter, value));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe(field);
  });

  test('duplicate ids', () => {
    const error = thrown(() => applyDesignValue([...events, ...events], defaultMethod('constant'), 'rateMmH', 1));
    expect((error as InputError).field).toBe('id');
  });
});
