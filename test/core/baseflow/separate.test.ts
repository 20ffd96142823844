import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as core from '../../../src/core';
import { separateBaseflow, type BaseflowMethod } from '../../../src/core/baseflow';
import { hydrographs, triangleOver } from '../../helpers/hydrographs';
import { inputErrorOf } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const methods = fc.oneof(
  fc.constant<BaseflowMethod>({ kind: 'constant' }),
  fc
    .record({ alpha: fc.double({ min: 0, max: 0.999, noNaN: true }), passes: fc.integer({ min: 1, max: 9 }) })
    .map((p): BaseflowMethod => ({ kind: 'lyne-hollick', ...p })),
  fc
    .record({ a: fc.double({ min: 0, max: 0.999, noNaN: true }), bfiMax: fc.double({ min: 0, max: 1, noNaN: true }) })
    .map((p): BaseflowMethod => ({ kind: 'eckhardt', ...p })),
);

describe('separateBaseflow', () => {
  it('splits every sample into baseflow and direct runoff, 0 ≤ baseflow ≤ discharge, on any record', () => {
    fc.assert(
      fc.property(hydrographs(), methods, (h, method) => {
        const r = separateBaseflow(h, method);
        for (let k = 0; k < h.timesH.length; k++) {
          const q = h.dischargeM3s[k] as number;
          const b = r.baseflowM3s[k] as number;
          expect(b).toBeGreaterThanOrEqual(0);
          expect(b).toBeLessThanOrEqual(q);
          expect(r.directM3s[k]).toBe(q - b);
        }
        expect(r.directVolumeM3).toBeGreaterThanOrEqual(0);
        expect(r.directVolumeM3).toBeLessThanOrEqual(r.totalVolumeM3 * (1 + 1e-12));
        expectClose(r.baseflowVolumeM3 + r.directVolumeM3, r.totalVolumeM3, 1e-9, 1e-9);
        expect(r.baseflowIndex).toBeGreaterThanOrEqual(0);
        expect(r.baseflowIndex).toBeLessThanOrEqual(1);
        expect(r.peakM3s).toBe(Math.max(...Array.from(h.dischargeM3s)));
        expect(h.dischargeM3s[r.peakIndex]).toBe(r.peakM3s);
        expect(r.peakTimeH).toBe(h.timesH[r.peakIndex]);
        expect(r.directDepthMm).toBeUndefined();
      }),
    );
  });

  it('gives the filters a window of the whole record and a trapezoidal direct volume', () => {
    fc.assert(
      fc.property(hydrographs(), methods, (h, method) => {
        fc.pre(method.kind !== 'constant');
        const r = separateBaseflow(h, method);
        const n = h.timesH.length;
        expect(r.riseIndex).toBe(0);
        expect(r.endTimeH).toBe(h.timesH[n - 1]);
        let sum = 0;
        for (let k = 1; k < n; k++) {
          const dt = (h.timesH[k] as number) - (h.timesH[k - 1] as number);
          sum += 0.5 * ((r.directM3s[k] as number) + (r.directM3s[k - 1] as number)) * dt * 3600;
        }
        expectClose(r.directVolumeM3, sum, 1e-9, 1e-9);
      }),
    );
  });

  it('turns the direct volume into a depth over the catchment area', () => {
    // 40.5 m³/s·h = 145,800 m³ over 2 km² is 72.9 mm.
    const h = triangleOver([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], 2, 5, 11, 9, () => 3);
    const r = separateBaseflow(h, { kind: 'constant' }, { areaM2: 2e6 });
    expectClose(r.directDepthMm as number, 72.9);
    // Total 3 × 12 + 40.5 = 76.5 m³/s·h, so the baseflow index is 36 / 76.5.
    expectClose(r.baseflowIndex, 36 / 76.5);
    expect(r.peakM3s).toBe(12);
    expect(r.peakTimeH).toBe(5);
  });

  it('treats an area of 0 as not known, as the scenario stores it', () => {
    const h = { timesH: [0, 1, 2], dischargeM3s: [1, 3, 1] };
    expect(separateBaseflow(h, { kind: 'constant' }, { areaM2: 0 }).directDepthMm).toBeUndefined();
  });

  it('rejects a negative or non-finite area', () => {
    const h = { timesH: [0, 1, 2], dischargeM3s: [1, 3, 1] };
    for (const areaM2 of [-1, Number.NaN, Infinity]) {
      expect(inputErrorOf(() => separateBaseflow(h, { kind: 'constant' }, { areaM2 })).field).toBe('areaM2');
    }
  });

  it('has a baseflow index of 0 for a record with no flow', () => {
    const r = separateBaseflow(
      { timesH: [0, 1, 2], dischargeM3s: [0, 0, 0] },
      { kind: 'eckhardt', a: 0.98, bfiMax: 0.8 },
    );
    expect([r.totalVolumeM3, r.directVolumeM3, r.baseflowIndex]).toEqual([0, 0, 0]);
  });

  it('validates the record before the method, naming the bad sample', () => {
    const error = inputErrorOf(() =>
      separateBaseflow({ timesH: [0, 1, 2], dischargeM3s: [1, -3, 1] }, { kind: 'constant', riseIndex: 9 }),
    );
    expect([error.field, error.index]).toEqual(['dischargeM3s', 1]);
  });

  it('is reachable from the core index', () => {
    expect(core.separateBaseflow).toBe(separateBaseflow);
    expect(core.BASEFLOW_KINDS).toContain('lyne-hollick');
  });
});
