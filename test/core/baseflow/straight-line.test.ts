import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AREA_UNITS } from '../../../src/core/units';
import { recessionDays, separateBaseflow } from '../../../src/core/baseflow';
import { fineVolumeAbove, hydrographs, triangleOver } from '../../helpers/hydrographs';
import { inputErrorOf } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const MI2 = AREA_UNITS.mi2;

describe('N = A^0.2 (Linsley, Kohler & Paulhus)', () => {
  it('is 2.512 days for 100 mi²', () => {
    // 100^0.2 = 10^0.4 = 2.51189…
    expectClose(recessionDays(100 * MI2), 2.5118864315, 1e-10, 1e-10);
  });

  it('is 1 day for 1 mi² and 2 days for 32 mi²', () => {
    expectClose(recessionDays(MI2), 1);
    expectClose(recessionDays(32 * MI2), 2);
  });

  it('takes the area in m², converted with the units table', () => {
    // 1000 km² = 386.102… mi², so N = 386.102^0.2 = 3.2911… days (3.2911⁵ = 386.1).
    expectClose(recessionDays(1000e6), Math.pow(1000e6 / 2589988.110336, 0.2));
    expect(recessionDays(1000e6)).toBeCloseTo(3.2911, 4);
  });
});

describe('straight-line separation', () => {
  // Triangle from 2 h up 9 m³/s to a peak at 5 h, down to 0 at 11 h: 40.5 m³/s·h.
  const triangleM3 = 40.5 * 3600;
  const regular = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13];
  const irregular = [0, 0.7, 2, 2.3, 3.9, 5, 5.25, 7.1, 8, 10.6, 11, 13.5];

  it('gives the area of a triangle over constant baseflow exactly, on regular and irregular steps', () => {
    for (const times of [regular, irregular]) {
      const h = triangleOver(times, 2, 5, 11, 9, () => 3);
      for (const endTimeH of [11, 12.5]) {
        const result = separateBaseflow(h, { kind: 'straight-line', endTimeH });
        expectClose(result.directVolumeM3, triangleM3);
        expect(result.riseIndex).toBe(2);
        expect(result.endTimeH).toBe(endTimeH);
      }
    }
  });

  it('gives the area of a triangle over a rising straight baseflow exactly', () => {
    // Baseflow 3 m³/s until 2 h, rising straight to 6 m³/s at 11 h, flat after.
    const base = (t: number) => (t <= 2 ? 3 : t >= 11 ? 6 : 3 + ((t - 2) * 3) / 9);
    for (const times of [regular, irregular]) {
      const result = separateBaseflow(triangleOver(times, 2, 5, 11, 9, base), { kind: 'straight-line', endTimeH: 11 });
      expectClose(result.directVolumeM3, triangleM3);
    }
  });

  it('ends N = A^0.2 days after the peak when no end time is given', () => {
    // 32 mi² → N = 2 days: the end is 48 h after the peak at 20 h, on the flat
    // recession. Triangle 20 m³/s high from 10 h to 50 h: 400 m³/s·h.
    const times = [0, 5, 10, 15, 20, 30, 40, 50, 60, 70, 80, 90, 100];
    const h = triangleOver(times, 10, 20, 50, 20, () => 5);
    const areaM2 = 32 * MI2;
    const result = separateBaseflow(h, { kind: 'straight-line' }, { areaM2 });
    expectClose(result.endTimeH, 68);
    expectClose(result.directVolumeM3, 400 * 3600);
    // 1.44e6 m³ over 82.88 km²: 17.374… mm.
    expectClose(result.directDepthMm as number, ((400 * 3600) / areaM2) * 1000);
  });

  it('meets the recession inside a step (hand-worked)', () => {
    // Line from (0 h, 1) to (2.5 h, Q = 2): slope 0.4 per h, so 1.4 at 1 h, 1.8 at 2 h.
    // Direct (0 + 3.6)/2 + (3.6 + 1.2)/2 + (1.2 + 0) × 0.5/2 = 4.5 m³/s·h = 16,200 m³.
    const result = separateBaseflow(
      { timesH: [0, 1, 2, 3], dischargeM3s: [1, 5, 3, 1] },
      { kind: 'straight-line', endTimeH: 2.5 },
    );
    expectClose(result.directVolumeM3, 16200);
    expectClose(result.totalVolumeM3, 32400);
    expectClose(result.baseflowIndex, 0.5);
    const baseflow = Array.from(result.baseflowM3s);
    [1, 1.4, 1.8, 1].forEach((b, k) => expectClose(baseflow[k] as number, b));
  });

  it('counts only the flow above the line where the discharge dips below it', () => {
    // Line from (0 h, 2) to (4 h, 2): the dip to 1 at 2 h is crossed twice.
    // Same steps as the constant-discharge case: 18,960 m³.
    const h = { timesH: [0, 1, 2, 3, 4, 5], dischargeM3s: [2, 4, 1, 6, 2, 2] };
    const result = separateBaseflow(h, { kind: 'straight-line', riseIndex: 0, endTimeH: 4 });
    expectClose(result.directVolumeM3, 18960);
  });

  it('needs an end time or the catchment area', () => {
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [1, 5, 3, 1] };
    expect(inputErrorOf(() => separateBaseflow(h, { kind: 'straight-line' })).field).toBe('areaM2');
    expect(inputErrorOf(() => separateBaseflow(h, { kind: 'straight-line' }, { areaM2: 0 })).field).toBe('areaM2');
  });

  it('rejects an end point after the record or not after the start of rise', () => {
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [1, 5, 3, 1] };
    expect(inputErrorOf(() => separateBaseflow(h, { kind: 'straight-line', endTimeH: 3.5 })).field).toBe('endTimeH');
    expect(inputErrorOf(() => separateBaseflow(h, { kind: 'straight-line', endTimeH: 0 })).field).toBe('endTimeH');
    const late = { kind: 'straight-line', riseIndex: 2, endTimeH: 1.5 } as const;
    expect(inputErrorOf(() => separateBaseflow(h, late)).field).toBe('endTimeH');
  });

  it('ends at the last sample when N = A^0.2 days runs past the end of the record, and says so', () => {
    // 100 mi²: N = 100^0.2 = 2.512 days, 60.3 h after the 1 h peak; the record ends at 3 h.
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [1, 5, 3, 1] };
    const result = separateBaseflow(h, { kind: 'straight-line' }, { areaM2: 100 * MI2 });
    expect(result.endTimeH).toBe(3);
    expect(result.notice).toMatch(
      /^N = A\^0\.2 = 2\.512 days puts the end 61\.29 h after the first sample, past the record's last sample \(3 h\), so the line ends at the last sample instead\./,
    );
    // The same as an end point given at the last sample: line from (0, 1) to (3, 1), the triangle above it.
    const given = separateBaseflow(h, { kind: 'straight-line', endTimeH: 3 });
    expect(result.directVolumeM3).toBe(given.directVolumeM3);
    expect(given.notice).toBeUndefined();
    // Inside the record: no notice.
    const small = separateBaseflow(h, { kind: 'straight-line' }, { areaM2: 1e-9 * MI2 });
    expect(small.notice).toBeUndefined();
  });

  it('matches a fine numerical integral of the flow above the line on any record', () => {
    fc.assert(
      fc.property(hydrographs(30), fc.double({ min: 0, max: 1, noNaN: true }), (h, where) => {
        const n = h.timesH.length;
        const t0 = h.timesH[0] as number;
        const tn = h.timesH[n - 1] as number;
        const endTimeH = Math.max(t0 + (tn - t0) * where, t0 + 1e-6);
        const method = { kind: 'straight-line', riseIndex: 0, endTimeH } as const;
        const result = separateBaseflow(h, method);
        const q0 = h.dischargeM3s[0] as number;
        const qe = interpolate(h.timesH, h.dischargeM3s, endTimeH);
        const line = (t: number) => q0 + ((qe - q0) * (t - t0)) / (endTimeH - t0);
        const fine = fineVolumeAbove(h.timesH, h.dischargeM3s, 0, endTimeH, line);
        expect(Math.abs(result.directVolumeM3 - fine.aboveM3)).toBeLessThanOrEqual(fine.toleranceM3);
      }),
      { numRuns: 150 },
    );
  });
});

/** Linear interpolation, written out again here so the check does not lean on the code under test. */
function interpolate(t: ArrayLike<number>, q: ArrayLike<number>, at: number): number {
  for (let k = 0; k < t.length - 1; k++) {
    const t1 = t[k + 1] as number;
    if (at <= t1) {
      const t0 = t[k] as number;
      return (q[k] as number) + (((q[k + 1] as number) - (q[k] as number)) * (at - t0)) / (t1 - t0);
    }
  }
  return q[t.length - 1] as number;
}
