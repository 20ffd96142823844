import { expect, test } from 'vitest';
import {
  alternatingBlockStorm,
  applyDesignValue,
  computeLosses,
  fitEvents,
  pickDesignValue,
  summariseFits,
  type CatchmentEvent,
  type Idf,
} from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';

test('three events fitted, the median picked and applied to a design storm, end to end in the core', () => {
  // Invented catchment: three events in 1-hour bars, φ by hand from the bars above it.
  const events: CatchmentEvent[] = [
    // Bars above φ: 12 and 8, so 20 − 2φ = 10 → φ = 5.
    { id: 'e1', name: 'Spring', storm: { durationsH: [1, 1, 1], depthsMm: [3, 12, 8] }, observedExcessMm: 10 },
    // Bar above φ: 20, so 20 − φ = 12 → φ = 8.
    { id: 'e2', name: 'Summer', storm: { durationsH: [1, 1], depthsMm: [20, 4] }, observedExcessMm: 12 },
    // Bars above φ: 9, 9, 9, so 27 − 3φ = 9 → φ = 6.
    { id: 'e3', name: 'Autumn', storm: { durationsH: [1, 1, 1], depthsMm: [9, 9, 9] }, observedExcessMm: 9 },
  ];
  const method = { kind: 'constant', rateMmH: 1 } as const;
  const fits = fitEvents(events, method, 'rateMmH');
  expect(fits.map((f) => (f.result.ok ? f.result.value : Number.NaN))).toEqual([5, 8, 6]);

  const design = pickDesignValue(summariseFits(fits));
  expect(design).toBe(6);
  const errors = applyDesignValue(events, method, 'rateMmH', design).map((r) => (r.ok ? r.errorMm : Number.NaN));
  // Runoff with φ = 6: 6 + 2 = 8, 14, 9 mm against 10, 12, 9 observed.
  [-2, 2, 0].forEach((e, k) => expectClose(errors[k] as number, e));

  // Invented IDF: i = 1500 / (t + 12)^0.75, t in min, mm/h.
  const idf: Idf = { kind: 'a/(t+b)^c', a: 1500, b: 12, c: 0.75, durationUnit: 'min', intensityUnit: 'mm/h' };
  const storm = alternatingBlockStorm({ idf, durationH: 2, stepH: 0.25 });
  const result = computeLosses(storm, { kind: 'constant', rateMmH: design });
  // Each 15-min bar loses min(P, 6 × 0.25 = 1.5 mm).
  let expectedExcess = 0;
  for (let k = 0; k < storm.depthsMm.length; k++) expectedExcess += Math.max(0, (storm.depthsMm[k] as number) - 1.5);
  expectClose(result.totalExcessMm, expectedExcess);
  expect(result.totalExcessMm).toBeGreaterThan(0);
  expect(result.totalExcessMm).toBeLessThan(result.rainMm);
});
