import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { separateBaseflow } from '../../../src/core/baseflow';
import { fineVolumeAbove, hydrographs, triangleOver } from '../../helpers/hydrographs';
import { inputErrorOf } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const constant = { kind: 'constant' } as const;

describe('constant-discharge separation', () => {
  // Baseflow 3 m³/s; triangle from 2 h up 9 m³/s to a peak at 5 h, down to 0 at 11 h.
  // Its area: 9 × (11 − 2) / 2 = 40.5 m³/s·h = 145,800 m³.
  const triangleM3 = 40.5 * 3600;

  it('gives the area of a triangle over constant baseflow exactly, on regular steps', () => {
    const times = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13];
    const result = separateBaseflow(
      triangleOver(times, 2, 5, 11, 9, () => 3),
      constant,
    );
    expectClose(result.directVolumeM3, triangleM3);
    expect(result.riseIndex).toBe(2);
    expect(result.endTimeH).toBe(11);
    expect(Array.from(result.baseflowM3s)).toEqual(times.map(() => 3));
  });

  it('gives the area of a triangle over constant baseflow exactly, on irregular steps', () => {
    const times = [0, 0.7, 2, 2.3, 3.9, 5, 5.25, 7.1, 8, 10.6, 11, 13.5];
    const result = separateBaseflow(
      triangleOver(times, 2, 5, 11, 9, () => 3),
      constant,
    );
    expectClose(result.directVolumeM3, triangleM3);
    expect(result.riseIndex).toBe(2);
    expect(result.endTimeH).toBe(11);
  });

  it('ends where the recession crosses the start-of-rise discharge within a step', () => {
    // Hand-worked: level 1 from sample 0; recession 3 → 0.5 over 2–3 h meets 1
    // at 2 + (3 − 1)/(3 − 0.5) = 2.8 h. Direct: (0 + 4)/2 + (4 + 2)/2 + 2 × 0.8 / 2
    // = 5.8 m³/s·h = 20,880 m³.
    const result = separateBaseflow({ timesH: [0, 1, 2, 3], dischargeM3s: [1, 5, 3, 0.5] }, constant);
    expectClose(result.endTimeH, 2.8);
    expectClose(result.directVolumeM3, 20880);
    expect(Array.from(result.baseflowM3s)).toEqual([1, 1, 1, 0.5]);
    expect(Array.from(result.directM3s)).toEqual([0, 4, 2, 0]);
  });

  it('counts only the flow above the line where the discharge dips below it before the peak', () => {
    // Hand-worked, level 2 from a chosen start at sample 0:
    // 0–1 h: d 0 → 2, 1;  1–2 h: d 2 → −1, crossing, 2²/3 / 2 = 2/3;
    // 2–3 h: d −1 → 4, 4²/5 / 2 = 1.6;  3–4 h: d 4 → 0, 2;  end at 4 h.
    // Sum 5.2667 m³/s·h = 18,960 m³.
    const hydrograph = { timesH: [0, 1, 2, 3, 4, 5], dischargeM3s: [2, 4, 1, 6, 2, 2] };
    const result = separateBaseflow(hydrograph, { kind: 'constant', riseIndex: 0 });
    expectClose(result.directVolumeM3, 18960);
    expect(result.endTimeH).toBe(4);
    expect(Array.from(result.baseflowM3s)).toEqual([2, 2, 1, 2, 2, 2]);
    expect(Array.from(result.directM3s)).toEqual([0, 2, 0, 4, 0, 0]);
  });

  it('reports the sample time itself when the recession meets the level at a sample', () => {
    // 0.2 + 1 × (0.9 − 0.2) rounds to 0.8999999999999999 in floating point.
    const result = separateBaseflow({ timesH: [0, 0.2, 0.9, 1.5], dischargeM3s: [1, 5, 1, 1] }, constant);
    expect(result.endTimeH).toBe(0.9);
  });

  it('runs to the end of the record when the recession never falls back to the level', () => {
    const result = separateBaseflow({ timesH: [0, 1, 2, 3], dischargeM3s: [1, 5, 4, 3] }, constant);
    expect(result.endTimeH).toBe(3);
    // (0 + 4)/2 + (4 + 3)/2 + (3 + 2)/2 = 8 m³/s·h.
    expectClose(result.directVolumeM3, 8 * 3600);
  });

  it('has no direct runoff before the start of rise', () => {
    const result = separateBaseflow({ timesH: [0, 1, 2, 3, 4], dischargeM3s: [4, 2, 6, 3, 2] }, constant);
    expect(result.riseIndex).toBe(1);
    expect(result.directM3s[0]).toBe(0);
    expect(result.baseflowM3s[0]).toBe(4);
  });

  it('names a start-of-rise index past the record with that index', () => {
    const error = inputErrorOf(() =>
      separateBaseflow({ timesH: [0, 1, 2], dischargeM3s: [1, 3, 1] }, { kind: 'constant', riseIndex: 7 }),
    );
    expect([error.field, error.index]).toEqual(['riseIndex', 7]);
  });

  it('rejects a start of rise that is negative or not a whole sample', () => {
    const h = { timesH: [0, 1, 2], dischargeM3s: [1, 3, 1] };
    const negative = inputErrorOf(() => separateBaseflow(h, { kind: 'constant', riseIndex: -1 }));
    expect([negative.field, negative.index]).toEqual(['riseIndex', undefined]);
    const fractional = inputErrorOf(() => separateBaseflow(h, { kind: 'constant', riseIndex: 1.5 }));
    expect([fractional.field, fractional.index]).toEqual(['riseIndex', undefined]);
  });

  it('matches a fine numerical integral of the flow above the line on any record', () => {
    fc.assert(
      fc.property(hydrographs(30), (h) => {
        const result = separateBaseflow(h, constant);
        const level = h.dischargeM3s[result.riseIndex] as number;
        const fine = fineVolumeAbove(h.timesH, h.dischargeM3s, result.riseIndex, result.endTimeH, () => level);
        expect(Math.abs(result.directVolumeM3 - fine.aboveM3)).toBeLessThanOrEqual(fine.toleranceM3);
      }),
      { numRuns: 150 },
    );
  });
});
