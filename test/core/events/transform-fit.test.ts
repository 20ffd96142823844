import { describe, expect, test } from 'vitest';
import {
  defaultMethod,
  fitEventTransforms,
  summariseTransformFits,
  type HydrographEvent,
  type TransformFitSettings,
} from '../../../src/core';
import { linearReservoirRecord } from '../../helpers/hydrographs';

// All events in this file are invented.
//
// The transform is a Nash cascade of one reservoir (n = 1): a linear reservoir,
// whose response to excess falling evenly over one bar of D hours is, at the
// end of the bar, Q(D) = (V/D)·(1 − e^(−D/k)), and afterwards Q(D)·e^(−(t−D)/k)
// (Chow, Maidment & Mays 1988, §7.5, the linear reservoir; worked here by
// hand). The records below are written from that formula, not from the core.

const AREA_M2 = 1e6; // 1 km²
/** Discharge of excess e mm spread evenly over one hour on 1 km²: e·1e6·1e-3 m³ / 3600 s. */
const inflowM3s = (excessMm: number): number => (excessMm * AREA_M2 * 1e-3) / 3600;

const reservoirRecord = (start: number, mm: number, kH: number, hours: number) =>
  linearReservoirRecord(start, mm, kH, hours, AREA_M2);

const settings = (objective: TransformFitSettings['objective']): TransformFitSettings => ({
  method: defaultMethod('constant'),
  lossParameter: 'rateMmH',
  transform: { kind: 'nash', n: 1, kH: 5 },
  parameter: 'kH',
  areaM2: AREA_M2,
  objective,
});

// Event A: one hour of 30 mm, 10 mm observed. By hand: 30 − φ = 10 → φ = 20 mm/h,
// excess 10 mm; recorded with k = 2 h, peak 2.7778·(1 − e^(−0.5)) = 1.0930 m³/s at 1 h.
// Event B: 10 mm then 30 mm, 14 mm observed. By hand: only the 30 mm bar is above
// φ (φ ≥ 10), 30 − φ = 14 → φ = 16 mm/h, excess [0, 14] mm; recorded with k = 1 h,
// peak 3.8889·(1 − e^(−1)) = 2.4582 m³/s at 2 h. Had the loss not been matched
// (the stored φ of the default method), the excess and so the fitted k would differ.
const eventA: HydrographEvent = {
  id: 'a',
  storm: { durationsH: [1], depthsMm: [30] },
  observedExcessMm: 10,
  observed: reservoirRecord(0, 10, 2, 24),
};
const eventB: HydrographEvent = {
  id: 'b',
  storm: { durationsH: [1, 1], depthsMm: [10, 30] },
  observedExcessMm: 14,
  observed: reservoirRecord(1, 14, 1, 24),
};

describe('fitting the transform to every event', () => {
  test('each event’s loss is matched to its volume, then k is fitted to its peak (k worked by hand)', () => {
    const fits = fitEventTransforms([eventA, eventB], settings('peak'));
    expect(fits.map((f) => (f.loss.ok ? f.loss.value : null))).toEqual([20, 16]);
    const [a, b] = fits;
    expect(a?.result.ok && a.result.value).toBeCloseTo(2, 7);
    expect(b?.result.ok && b.result.value).toBeCloseTo(1, 7);
  });

  test('the best efficiency finds the same k, since each record is the reservoir’s own', () => {
    const fits = fitEventTransforms([eventA, eventB], settings('nse'));
    expect(fits[0]?.result.ok && fits[0].result.value).toBeCloseTo(2, 5);
    expect(fits[1]?.result.ok && fits[1].result.value).toBeCloseTo(1, 5);
  });

  test('agrees with a brute-force scan of k written here (NSE by its definition, the reservoir by its formula)', () => {
    // Event C: 5 mm, 25 mm, 5 mm over three hours, 12 mm observed; the record is a
    // made-up smooth rise and fall, not any model's output.
    // Loss by hand: φ between 5 and 25 leaves 25 − φ = 12 → φ = 13 mm/h, excess [0, 12, 0].
    const times = Array.from({ length: 13 }, (_, i) => i);
    const direct = [0, 0, 0.9, 1.6, 1.3, 0.95, 0.7, 0.5, 0.36, 0.26, 0.19, 0.14, 0.1];
    const eventC: HydrographEvent = {
      id: 'c',
      storm: { durationsH: [1, 1, 1], depthsMm: [5, 25, 5] },
      observedExcessMm: 12,
      observed: { timesH: times, directM3s: direct },
    };
    const [fit] = fitEventTransforms([eventC], settings('nse'));
    expect(fit?.loss.ok && fit.loss.value).toBeCloseTo(13, 9);
    // The reservoir's discharge at whole hours for excess 12 mm in hour 1–2.
    const modelled = (k: number): number[] =>
      times.map((t) => {
        if (t <= 1) return 0;
        const peak = inflowM3s(12) * (1 - Math.exp(-1 / k));
        return peak * Math.exp(-(t - 2) / k);
      });
    const mean = direct.reduce((s, q) => s + q, 0) / direct.length;
    const nse = (k: number): number => {
      const m = modelled(k);
      let err = 0;
      let spread = 0;
      direct.forEach((q, i) => {
        err += (q - (m[i] as number)) ** 2;
        spread += (q - mean) ** 2;
      });
      return 1 - err / spread;
    };
    let bestK = 0;
    let best = -Infinity;
    for (let k = 0.5; k <= 6; k += 1e-4) {
      const e = nse(k);
      if (e > best) [best, bestK] = [e, k];
    }
    expect(fit?.result.ok).toBe(true);
    if (!fit?.result.ok) return;
    expect(Math.abs(fit.result.value - bestK)).toBeLessThan(2e-4);
    expect(fit.result.achieved).toBeCloseTo(best, 6);
  });

  test('events without a record or without a loss answer say why, and the others are still fitted', () => {
    const noRecord: HydrographEvent = { ...eventA, id: 'none', observed: null };
    const tooWet: HydrographEvent = { ...eventA, id: 'wet', observedExcessMm: 40 };
    const fits = fitEventTransforms([noRecord, tooWet, eventA], settings('peak'));
    expect(fits.map((f) => (f.result.ok ? 'ok' : f.result.reason))).toEqual(['no-record', 'no-loss-fit', 'ok']);
    expect(fits[0]?.result.ok === false && fits[0].result.message).toMatch(/no separated streamflow record/);
    expect(fits[1]?.result.ok === false && fits[1].result.message).toMatch(/cannot be matched to the observed volume/);
  });

  test('the spread counts the fitted events and reads like the loss’s (median of an even count is the middle mean)', () => {
    const noRecord: HydrographEvent = { ...eventA, id: 'none', observed: null };
    const summary = summariseTransformFits(fitEventTransforms([eventA, noRecord, eventB], settings('peak')));
    // Fitted k: 2 and 1 h → mean 1.5, median (1 + 2)/2 = 1.5, smallest 1, largest 2.
    expect(summary.count).toBe(2);
    expect(summary.withoutAnswer).toBe(1);
    expect(summary.median).toBeCloseTo(1.5, 7);
    expect(summary.mean).toBeCloseTo(1.5, 7);
    expect(summary.min).toBeCloseTo(1, 7);
    expect(summary.max).toBeCloseTo(2, 7);
  });
});
