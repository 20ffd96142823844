import { describe, expect, test } from 'vitest';
import {
  InputError,
  defaultMethod,
  fitEvents,
  pickDesignValue,
  summariseFits,
  type CatchmentEvent,
} from '../../../src/core';
import { thrown } from '../../helpers/thrown';

// Invented events, each one bar of 1 h, so φ = rain − observed by hand.
const oneBar = (id: string, rainMm: number, observedExcessMm: number): CatchmentEvent => ({
  id,
  name: id,
  storm: { durationsH: [1], depthsMm: [rainMm] },
  observedExcessMm,
});
const fitsOf = (events: CatchmentEvent[]) => fitEvents(events, defaultMethod('constant'), 'rateMmH');

describe('summary of fitted values', () => {
  // φ = 2, 5, 3, (none: 12 mm observed from 10 mm of rain), 10 mm/h.
  const fits = fitsOf([
    oneBar('a', 10, 8),
    oneBar('b', 10, 5),
    oneBar('c', 10, 7),
    oneBar('d', 10, 12),
    oneBar('e', 20, 10),
  ]);

  test('counts only events with an answer, and says how many have none', () => {
    const s = summariseFits(fits);
    expect(s.count).toBe(4);
    expect(s.withoutAnswer).toBe(1);
  });

  test('mean, median, min and max match the hand values 5, 4, 2 and 10', () => {
    // Sorted: 2, 3, 5, 10. Mean 20/4 = 5; even count, median (3 + 5)/2 = 4.
    expect(summariseFits(fits)).toEqual({ count: 4, withoutAnswer: 1, mean: 5, median: 4, min: 2, max: 10 });
  });

  test('an odd count takes the middle value as median', () => {
    // φ = 2, 5, 3: sorted 2, 3, 5; median 3, mean 10/3.
    const s = summariseFits(fitsOf([oneBar('a', 10, 8), oneBar('b', 10, 5), oneBar('c', 10, 7)]));
    expect(s.median).toBe(3);
    expect(s.mean).toBeCloseTo(10 / 3, 14);
  });

  test('one event: every statistic is its value', () => {
    expect(summariseFits(fitsOf([oneBar('a', 10, 8)]))).toEqual({
      count: 1,
      withoutAnswer: 0,
      mean: 2,
      median: 2,
      min: 2,
      max: 2,
    });
  });

  test('no event with an answer: count 0 and no statistics', () => {
    const s = summariseFits(fitsOf([oneBar('a', 10, 12)]));
    expect(s.count).toBe(0);
    expect(s.withoutAnswer).toBe(1);
    expect(s.mean).toBeNull();
    expect(s.median).toBeNull();
    expect(s.min).toBeNull();
    expect(s.max).toBeNull();
  });

  test('the order of the events does not change the summary', () => {
    expect(summariseFits([...fits].reverse())).toEqual(summariseFits(fits));
  });
});

describe('picking the design value', () => {
  const summary = summariseFits(
    fitsOf([oneBar('a', 10, 8), oneBar('b', 10, 5), oneBar('c', 10, 7), oneBar('e', 20, 10)]),
  );

  test('the median is the default', () => {
    expect(pickDesignValue(summary)).toBe(4);
  });

  test('mean, min, max or a number of the user’s own', () => {
    expect(pickDesignValue(summary, 'mean')).toBe(5);
    expect(pickDesignValue(summary, 'min')).toBe(2);
    expect(pickDesignValue(summary, 'max')).toBe(10);
    expect(pickDesignValue(summary, { value: 3.7 })).toBe(3.7);
  });

  test('a number of the user’s own is allowed even when no event has an answer', () => {
    const none = summariseFits([]);
    expect(pickDesignValue(none, { value: 6 })).toBe(6);
    const error = thrown(() => pickDesignValue(none));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe('designValue');
    expect((error as InputError).message).toMatch(/no median/);
  });

  test.each([{ value: Number.NaN }, { value: Infinity }, 'mode'])('pick %j is refused on designValue', (pick) => {
    const error = thrown(() => pickDesignValue(summary, pick as never));
    expect((error as InputError).field).toBe('designValue');
  });
});
