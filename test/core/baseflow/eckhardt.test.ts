import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { separateBaseflow } from '../../../src/core/baseflow';
import { separateEckhardt } from '../../../src/core/baseflow/eckhardt';
import { hydrographs } from '../../helpers/hydrographs';
import { inputErrorOf } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const eckhardt = (a: number, bfiMax: number, stepH?: number) =>
  stepH === undefined ? ({ kind: 'eckhardt', a, bfiMax } as const) : ({ kind: 'eckhardt', a, bfiMax, stepH } as const);

const flood = [2, 2, 10, 30, 22, 15, 10, 7, 5, 4, 3, 2.5, 2.2, 2];

describe('Eckhardt filter', () => {
  it('follows the filter step by step on a short record (hand-worked)', () => {
    // a = 0.5, BFImax = 0.5: b_k = (0.25 b_{k−1} + 0.25 Q_k) / 0.75, b_0 = Q_0 = 2.
    // b_1 = (0.5 + 1.5)/0.75 = 8/3; b_2 = (2/3 + 1)/0.75 = 20/9; b_3 = (5/9 + 1/2)/0.75 = 38/27.
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [2, 6, 4, 2] };
    const b = separateBaseflow(h, eckhardt(0.5, 0.5)).baseflowM3s;
    [2, 8 / 3, 20 / 9, 38 / 27].forEach((expected, k) => expectClose(b[k] as number, expected));
  });

  it('caps baseflow at the discharge when the flow drops faster than the filter', () => {
    // b_1 = (0.25 × 10 + 0)/0.75 = 3.33 > Q_1 = 1, so b_1 = 1.
    const b = separateBaseflow({ timesH: [0, 1, 2], dischargeM3s: [10, 1, 1] }, eckhardt(0.5, 0.5)).baseflowM3s;
    expect(b[1]).toBe(1);
  });

  it('with BFImax = 1 takes all flow as baseflow, for any a', () => {
    for (const a of [0, 0.5, 0.925, 0.98, 0.999]) {
      const h = { timesH: flood.map((_, k) => k), dischargeM3s: flood };
      const result = separateBaseflow(h, eckhardt(a, 1));
      result.baseflowM3s.forEach((b, k) => expectClose(b, flood[k] as number));
      expectClose(result.baseflowIndex, 1);
    }
  });

  it('with a = 0 takes the fraction BFImax of each sample after the first', () => {
    // b_k = (1 − BFImax)·0 + BFImax·Q_k.
    const h = { timesH: flood.map((_, k) => k), dischargeM3s: flood };
    const b = separateBaseflow(h, eckhardt(0, 0.3)).baseflowM3s;
    expect(b[0]).toBe(flood[0]);
    for (let k = 1; k < flood.length; k++) expectClose(b[k] as number, 0.3 * (flood[k] as number));
  });

  it('on a constant record decays from the discharge towards BFImax times it', () => {
    // b_k − B·Q = r (b_{k−1} − B·Q), r = a(1 − B)/(1 − aB), b_0 = Q.
    const q = 5;
    const a = 0.9;
    const bfiMax = 0.6;
    const r = (a * (1 - bfiMax)) / (1 - a * bfiMax);
    const n = 40;
    const h = { timesH: Float64Array.from({ length: n }, (_, k) => k), dischargeM3s: new Float64Array(n).fill(q) };
    const b = separateBaseflow(h, eckhardt(a, bfiMax)).baseflowM3s;
    for (let k = 0; k < n; k++) expectClose(b[k] as number, bfiMax * q + (1 - bfiMax) * q * r ** k);
  });

  it('over a long constant record has a baseflow index that tends to BFImax', () => {
    const n = 5000;
    const h = { timesH: Float64Array.from({ length: n }, (_, k) => k), dischargeM3s: new Float64Array(n).fill(3) };
    const result = separateBaseflow(h, eckhardt(0.98, 0.8));
    expect(Math.abs(result.baseflowIndex - 0.8)).toBeLessThan(0.01);
  });

  it('leaves a pure recession at rate a entirely as baseflow', () => {
    // Q_k = Q_0 a^k: b_{k−1} = Q_{k−1} gives b_k = a Q_{k−1} (1 − aB)/(1 − aB) = Q_k.
    const a = 0.95;
    const q = Array.from({ length: 30 }, (_, k) => 40 * a ** k);
    const result = separateBaseflow({ timesH: q.map((_, k) => k), dischargeM3s: q }, eckhardt(a, 0.8));
    result.baseflowM3s.forEach((b, k) => expectClose(b, q[k] as number, 1e-11, 1e-11));
    expectClose(result.directVolumeM3, 0, 1e-9, 1e-9);
  });

  it('with a time step for a, leaves an irregularly sampled recession entirely as baseflow', () => {
    // Q(t) = 40 · 0.98^(t/24), sampled at uneven times; each step uses 0.98^(Δt/24).
    const times = [0, 1, 3, 3.5, 9, 20, 26, 50, 51, 80];
    const q = times.map((t) => 40 * 0.98 ** (t / 24));
    const result = separateBaseflow({ timesH: times, dischargeM3s: q }, eckhardt(0.98, 0.8, 24));
    result.baseflowM3s.forEach((b, k) => expectClose(b, q[k] as number, 1e-11, 1e-11));
  });

  it('keeps 0 ≤ baseflow ≤ discharge on any record', () => {
    fc.assert(
      fc.property(
        hydrographs(),
        fc.double({ min: 0, max: 0.999, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.option(fc.double({ min: 0.1, max: 48, noNaN: true }), { nil: undefined }),
        (h, a, bfiMax, stepH) => {
          // The filter's own output, before separateBaseflow's final clipping.
          const { lineM3s } = separateEckhardt(h.timesH, h.dischargeM3s, eckhardt(a, bfiMax, stepH), {
            peakIndex: 0,
            areaM2: undefined,
          });
          for (let k = 0; k < h.timesH.length; k++) {
            const b = lineM3s[k] as number;
            expect(b).toBeGreaterThanOrEqual(0);
            expect(b).toBeLessThanOrEqual(h.dischargeM3s[k] as number);
          }
        },
      ),
    );
  });

  it('rejects a outside [0, 1) and BFImax outside [0, 1]', () => {
    const h = { timesH: [0, 1], dischargeM3s: [1, 2] };
    expect(inputErrorOf(() => separateBaseflow(h, eckhardt(1, 0.8))).field).toBe('a');
    expect(inputErrorOf(() => separateBaseflow(h, eckhardt(-0.01, 0.8))).field).toBe('a');
    expect(inputErrorOf(() => separateBaseflow(h, eckhardt(0.98, 1.1))).field).toBe('bfiMax');
    expect(inputErrorOf(() => separateBaseflow(h, eckhardt(0.98, Number.NaN))).field).toBe('bfiMax');
  });
});
