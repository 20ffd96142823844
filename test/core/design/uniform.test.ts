import { describe, expect, test } from 'vitest';
import { InputError, peakIntensityMmH, totalDepthMm, uniformStorm } from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';
import { thrown } from '../../helpers/thrown';

describe('uniform storm', () => {
  test('40 mm over 2 h in 15-minute steps is 8 bars of 5 mm at 20 mm/h', () => {
    const storm = uniformStorm({ depthMm: 40, durationH: 2, stepH: 0.25 });
    expect(Array.from(storm.depthsMm)).toEqual(new Array(8).fill(5));
    expect(Array.from(storm.durationsH)).toEqual(new Array(8).fill(0.25));
    expect(peakIntensityMmH(storm)).toBe(20);
  });

  test('steps given in minutes that do not convert exactly still make whole bars summing to the depth', () => {
    const storm = uniformStorm({ depthMm: 50, durationH: 1, stepH: 10 / 60 });
    expect(storm.depthsMm.length).toBe(6);
    expectClose(totalDepthMm(storm), 50);
  });

  test('a zero-depth storm is allowed and dry', () => {
    expect(totalDepthMm(uniformStorm({ depthMm: 0, durationH: 1, stepH: 0.5 }))).toBe(0);
  });

  test('the start time is kept when given', () => {
    expect(uniformStorm({ depthMm: 10, durationH: 1, stepH: 1, startIso: '2026-03-04T00:00:00Z' }).startIso).toBe(
      '2026-03-04T00:00:00Z',
    );
  });

  test.each([
    [{ depthMm: -1 }, 'depthMm'],
    [{ depthMm: Number.NaN }, 'depthMm'],
    [{ depthMm: Infinity }, 'depthMm'],
    [{ durationH: -2 }, 'durationH'],
    [{ stepH: 0 }, 'stepH'],
    [{ stepH: 0.3 }, 'stepH'],
    [{ stepH: 5 }, 'stepH'],
    [{ startIso: 'soon' }, 'startIso'],
  ])('%j is refused on %s', (patch, field) => {
    const error = thrown(() => uniformStorm({ depthMm: 40, durationH: 2, stepH: 0.25, ...patch }));
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).field).toBe(field);
  });
});
