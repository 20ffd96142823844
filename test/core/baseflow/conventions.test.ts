// The conventions the recursive filters' results depend on, each checked by
// hand on a record that starts on a recession (Q = 4, 2, 1, 3, 1 m³/s, hourly):
// the start value, clamping and what is carried on, the direction of each
// pass, reflected padding (warm-up) at the ends, and the time step the
// published daily constants are scaled to. Filters: Lyne & Hollick (1979) as
// applied by Nathan & McMahon (1990); Eckhardt (2005); warm-up by reflection
// after Ladson et al. (2013); all citations from memory.
import { describe, expect, it } from 'vitest';
import { separateBaseflow } from '../../../src/core/baseflow';
import { reflectPad } from '../../../src/core/baseflow/warm-up';
import { expectClose } from '../../helpers/tolerance';

const RECEDING = { timesH: [0, 1, 2, 3, 4], dischargeM3s: [4, 2, 1, 3, 1] };
const baseflow = (method: Parameters<typeof separateBaseflow>[1]): number[] =>
  Array.from(separateBaseflow(RECEDING, method).baseflowM3s);

describe('Lyne & Hollick conventions (α = 0.5, so (1 + α)/2 = 0.75)', () => {
  it('starts each pass with no quickflow, so without warm-up a record that starts on a recession is all baseflow there', () => {
    // f = 0 → b = 4; 0.75(2 − 4) < 0 → 0, b = 2; 0.75(1 − 2) < 0 → 0, b = 1;
    // 0 + 0.75(3 − 1) = 1.5, b = 1.5; 0.75 + 0.75(1 − 3) < 0 → 0, b = 1.
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 1 })).toEqual([4, 2, 1, 1.5, 1]);
  });

  it('carries the clamped quickflow on, not the value before clamping', () => {
    // At 3 h the quickflow before is the clamped 0; carrying the unclamped −0.75
    // instead would give f = 0.5·(−0.75) + 1.5 = 1.125 and b = 1.875, not 1.5.
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 1 })[3]).toBe(1.5);
  });

  it('runs the second pass backward over the first pass’s baseflow', () => {
    // Backward over 4, 2, 1, 1.5, 1 from the end: f = 0, b = 1; 0.75(1.5 − 1) = 0.375,
    // b = 1.125; 0.1875 + 0.75(1 − 1.5) < 0 → 0, b = 1; 0.75(2 − 1) = 0.75, b = 1.25;
    // 0.375 + 0.75(4 − 2) = 1.875, b = 2.125.
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 2 })).toEqual([2.125, 1.25, 1, 1.125, 1]);
  });

  it('with a warm-up of 2 mirrors 2 samples about each end, filters, and keeps the record’s own samples', () => {
    // Padded: 1, 2, [4, 2, 1, 3, 1], 3, 1 (the end samples are not repeated).
    // Forward: b = 1; f = 0.75 → 1.25; 0.375 + 1.5 = 1.875 → 2.125; 0.9375 − 1.5 < 0 → 2;
    // → 1; f = 1.5 → 1.5; → 1; f = 1.5 → 1.5; → 1. The record's first sample now
    // has quickflow 1.875 instead of none.
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 1, warmUpSamples: 2 })).toEqual([2.125, 2, 1, 1.5, 1]);
    // Backward over 1, 1.25, 2.125, 2, 1, 1.5, 1, 1.5, 1 from the end: 1; 0.375 → 1.125;
    // → 1; 0.375 → 1.125; → 1; 0.75 → 1.25; 0.375 + 0.09375 = 0.46875 → 1.65625; (→ 1.25; → 1).
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 2, warmUpSamples: 2 })).toEqual([
      1.65625, 1.25, 1, 1.125, 1,
    ]);
  });

  it('mirrors at most what the record holds (n − 1 samples), and nothing with a warm-up of 0', () => {
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 3, warmUpSamples: 100 })).toEqual(
      baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 3, warmUpSamples: 4 }),
    );
    expect(baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 3, warmUpSamples: 0 })).toEqual(
      baseflow({ kind: 'lyne-hollick', alpha: 0.5, passes: 3 }),
    );
  });
});

describe('Eckhardt conventions (a = 0.5, BFImax = 0.5: b_k = (b_{k−1} + Q_k)/3)', () => {
  it('starts with all flow as baseflow and caps baseflow at the flow, carrying the capped value', () => {
    // b = 4; (4 + 2)/3 = 2; (2 + 1)/3 = 1; (1 + 3)/3 = 4/3; (4/3 + 1)/3 = 7/9.
    const b = baseflow({ kind: 'eckhardt', a: 0.5, bfiMax: 0.5 });
    [4, 2, 1, 4 / 3, 7 / 9].forEach((x, k) => expectClose(b[k] as number, x, 1e-15));
  });

  it('with a warm-up mirrors samples before the first only (one forward pass)', () => {
    // Padded: 1, 2, [4, 2, 1, 3, 1]. b = 1; (1 + 2)/3 = 1; (1 + 4)/3 = 5/3; (5/3 + 2)/3 = 11/9;
    // (11/9 + 1)/3 = 20/27; (20/27 + 3)/3 = 101/81; (101/81 + 1)/3 = 182/243.
    const b = baseflow({ kind: 'eckhardt', a: 0.5, bfiMax: 0.5, warmUpSamples: 2 });
    [5 / 3, 11 / 9, 20 / 27, 101 / 81, 182 / 243].forEach((x, k) => expectClose(b[k] as number, x, 1e-15));
  });
});

describe('time step of the published daily constants', () => {
  // A pure recession at 0.98 a day, sampled every 15 minutes for two days.
  const times = Array.from({ length: 193 }, (_, k) => k / 4);
  const recession = { timesH: times, dischargeM3s: times.map((t) => 10 * Math.pow(0.98, t / 24)) };

  it('with a = 0.98 per 24 h (the default) takes a recession at that rate as all baseflow (Eckhardt 2005: b = Q in a pure recession)', () => {
    // b_{k−1} = Q_{k−1}, Q_k = a·Q_{k−1} gives b_k = a·Q_{k−1}((1 − B) + (1 − a)B)/(1 − aB) = Q_k.
    const r = separateBaseflow(recession, { kind: 'eckhardt', a: 0.98, bfiMax: 0.8, stepH: 24 });
    expect(r.directVolumeM3).toBeLessThanOrEqual(1e-9 * r.totalVolumeM3);
    // Applying 0.98 to each 15-minute step instead treats the slow recession as quickflow.
    const perSample = separateBaseflow(recession, { kind: 'eckhardt', a: 0.98, bfiMax: 0.8 });
    expect(perSample.directVolumeM3).toBeGreaterThan(0.05 * perSample.totalVolumeM3);
  });

  it('scales α the same way: on a daily record the 24 h step changes nothing', () => {
    const daily = { timesH: [0, 24, 48, 72, 96, 120], dischargeM3s: [2, 9, 6, 4, 3, 2.5] };
    const a = separateBaseflow(daily, { kind: 'lyne-hollick', alpha: 0.925, passes: 3, stepH: 24 });
    const b = separateBaseflow(daily, { kind: 'lyne-hollick', alpha: 0.925, passes: 3 });
    Array.from(a.baseflowM3s).forEach((x, k) => expectClose(x, b.baseflowM3s[k] as number, 1e-14));
  });
});

describe('reflectPad', () => {
  it('mirrors values and times about each end sample without repeating it', () => {
    const p = reflectPad([0, 1, 3, 6], [5, 6, 7, 8], 2, true);
    expect(Array.from(p.values)).toEqual([7, 6, 5, 6, 7, 8, 7, 6]);
    expect(Array.from(p.timesH)).toEqual([-3, -1, 0, 1, 3, 6, 9, 11]);
    expect(p.offset).toBe(2);
    expect(Array.from(reflectPad([0, 1, 3, 6], [5, 6, 7, 8], 2, false).values)).toEqual([7, 6, 5, 6, 7, 8]);
  });
});
