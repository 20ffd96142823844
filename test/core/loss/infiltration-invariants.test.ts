// Invariants of the infiltration methods (Horton, Green–Ampt, curve number)
// over random storms with unequal bar durations and dry spells (fast-check),
// with parameter draws that cover both Horton readings, recovery on and off,
// both Iₐ ratios and both S conversions. Split-invariance holds every variant
// to the same 1e-9 (Horton by the clock had a looser bound while it used the
// hand-table rule min(P, ∫f dt); the exact per-bar integral removed the need).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLosses, type LossMethod, type Storm } from '../../../src/core';
import { stormArb } from '../../helpers/arbitraries';

// Recovery in dry spells drawn on or off, with rates from slow drying to
// near-instant recovery.
const recoveryArb = fc.record({
  recovers: fc.boolean(),
  recoveryPerH: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 20, noNaN: true })),
});

const hortonArb = (ponding: boolean): fc.Arbitrary<LossMethod> =>
  fc
    .record({
      fcMmH: fc.double({ min: 0, max: 40, noNaN: true }),
      extra: fc.double({ min: 0, max: 300, noNaN: true }),
      kPerH: fc.double({ min: 1e-3, max: 50, noNaN: true }),
      recovery: recoveryArb,
    })
    .map(({ fcMmH, extra, kPerH, recovery }) => ({
      kind: 'horton',
      f0MmH: fcMmH + extra,
      fcMmH,
      kPerH,
      ponding,
      ...recovery,
    }));

// Green–Ampt recovery has no rate: the soil's Sᵢ and λ set the redistribution,
// drawn over their whole allowed ranges.
const greenAmptArb: fc.Arbitrary<LossMethod> = fc.record({
  kind: fc.constant('green-ampt' as const),
  ksMmH: fc.double({ min: 1e-3, max: 150, noNaN: true }),
  suctionMm: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 400, noNaN: true })),
  moistureDeficit: fc.oneof(fc.constant(0), fc.double({ min: 0, max: 1, noNaN: true })),
  recovers: fc.boolean(),
  initialSaturation: fc.oneof(fc.constantFrom(0, 0.99), fc.double({ min: 0, max: 0.99, noNaN: true })),
  poreSizeIndex: fc.oneof(fc.constantFrom(0.01, 10), fc.double({ min: 0.01, max: 10, noNaN: true })),
});

const curveNumberArb: fc.Arbitrary<LossMethod> = fc.record({
  kind: fc.constant('curve-number' as const),
  cn: fc.oneof(fc.constant(100), fc.double({ min: 1, max: 100, noNaN: true })),
  iaRatio: fc.constantFrom(0.2 as const, 0.05 as const),
  conversion: fc.constantFrom('power' as const, 'ratio' as const),
});

/** Every variant: Horton by the clock and by infiltrated depth, Green–Ampt, curve number. */
const every = fc.oneof(hortonArb(false), hortonArb(true), greenAmptArb, curveNumberArb);

/**
 * Event records as they come: dry bars before the rain, and bursts of rain
 * separated by dry spells of a minute to a day.
 */
const drySpellStormArb: fc.Arbitrary<{ durationsH: number[]; depthsMm: number[] }> = fc
  .record({
    lead: fc.array(fc.double({ min: 1 / 60, max: 6, noNaN: true }), { maxLength: 3 }),
    bursts: fc.array(
      fc.record({
        storm: stormArb(8),
        gap: fc.array(fc.double({ min: 1 / 60, max: 24, noNaN: true }), { maxLength: 3 }),
      }),
      { minLength: 1, maxLength: 4 },
    ),
  })
  .map(({ lead, bursts }) => {
    const durationsH = [...lead];
    const depthsMm = lead.map(() => 0);
    for (const { storm, gap } of bursts) {
      durationsH.push(...storm.durationsH, ...gap);
      depthsMm.push(...storm.depthsMm, ...gap.map(() => 0));
    }
    return { durationsH, depthsMm };
  });

const anyStorm = fc.oneof(stormArb(40), drySpellStormArb);

const splitBar = (storm: { durationsH: number[]; depthsMm: number[] }, k: number): Storm => ({
  durationsH: storm.durationsH.flatMap((d, j) => (j === k ? [d / 2, d / 2] : [d])),
  depthsMm: storm.depthsMm.flatMap((p, j) => (j === k ? [p / 2, p / 2] : [p])),
});

describe('Horton, Green–Ampt and curve number', () => {
  it('keep 0 ≤ loss ≤ rain in every bar and rain = loss + excess to 1e-9 relative', () => {
    fc.assert(
      fc.property(fc.oneof(stormArb(80), drySpellStormArb), every, (storm, method) => {
        const r = computeLosses(storm, method);
        let rain = 0;
        for (let k = 0; k < storm.depthsMm.length; k++) {
          const p = storm.depthsMm[k] as number;
          const l = r.lossMm[k] as number;
          const e = r.excessMm[k] as number;
          rain += p;
          expect(Number.isFinite(l) && Number.isFinite(e)).toBe(true);
          expect(l).toBeGreaterThanOrEqual(0);
          expect(e).toBeGreaterThanOrEqual(0);
          expect(l).toBeLessThanOrEqual(p);
          expect(Math.abs(p - l - e)).toBeLessThanOrEqual(1e-9 * p);
        }
        expect(Math.abs(rain - r.totalLossMm - r.totalExcessMm)).toBeLessThanOrEqual(1e-9 * Math.max(rain, 1e-300));
      }),
      { numRuns: 600 },
    );
  });

  it('give the same result when any bar, wet or dry, is split into two halves of equal intensity (to 1e-9; every variant, with and without recovery, storms with leading and inner dry bars)', () => {
    fc.assert(
      fc.property(anyStorm, every, fc.nat(), (storm, method, pick) => {
        const k = pick % storm.depthsMm.length;
        const whole = computeLosses(storm, method);
        const halves = computeLosses(splitBar(storm, k), method);
        const scale = Math.max(whole.rainMm, 1e-9);
        expect(Math.abs(whole.totalExcessMm - halves.totalExcessMm)).toBeLessThanOrEqual(1e-9 * scale);
        const joined = (halves.excessMm[k] as number) + (halves.excessMm[k + 1] as number);
        expect(Math.abs((whole.excessMm[k] as number) - joined)).toBeLessThanOrEqual(1e-9 * scale);
        // Bars after the split see the same state.
        for (let j = k + 1; j < storm.depthsMm.length; j++) {
          expect(Math.abs((whole.excessMm[j] as number) - (halves.excessMm[j + 1] as number))).toBeLessThanOrEqual(
            1e-9 * scale,
          );
        }
      }),
      { numRuns: 1500 },
    );
  });

  it('give exactly zero excess for a dry storm', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.01, max: 5, noNaN: true }), { minLength: 1, maxLength: 20 }),
        every,
        (durationsH, method) => {
          const r = computeLosses({ durationsH, depthsMm: durationsH.map(() => 0) }, method);
          expect(r.totalExcessMm).toBe(0);
          expect(r.totalLossMm).toBe(0);
        },
      ),
      { numRuns: 100 },
    );
  });
});
