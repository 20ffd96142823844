// Calibration of every numeric parameter of the infiltration methods, the
// others held fixed: Brent's method inside each parameter's search bounds
// (the curve number through its closed form), to 1e-9 relative.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  calibrate,
  computeLosses,
  HORTON_K_CEILING_PER_H,
  METHODS,
  type LossMethod,
  type Storm,
} from '../../../src/core';
import { stormArb } from '../../helpers/arbitraries';

const excessOf = (storm: Storm, method: LossMethod): number => computeLosses(storm, method).totalExcessMm;
const withValue = (method: LossMethod, key: string, value: number): LossMethod =>
  ({ ...method, [key]: value }) as LossMethod;

interface Case {
  readonly name: string;
  readonly method: LossMethod;
  readonly key: string;
  /** Range the true value is drawn from: evenly, or evenly in its logarithm (a rate constant). */
  readonly low: number;
  readonly high: number;
  readonly log?: boolean;
  /**
   * False where runoff is not monotone in the parameter, so two values can give
   * the same runoff and the fit need not return the one drawn (it must still
   * reproduce the runoff).
   */
  readonly unique?: false;
  /** Storms to fit on (random storms of up to 30 bars when absent). */
  readonly storms?: fc.Arbitrary<{ durationsH: number[]; depthsMm: number[] }>;
}

/**
 * Two bursts of substance with a spell of an hour to two days between: the
 * storms on which the Green–Ampt soil values for recovery (Sᵢ, λ) act. On
 * random storms their effect can be a trace (a drop, then a minute dry) and
 * runoff need not be monotone in λ there, so a fit may answer that no value
 * in the bounds gives the target.
 */
const twoBurstArb = fc
  .record({
    first: fc.double({ min: 5, max: 60, noNaN: true }),
    firstH: fc.double({ min: 0.25, max: 3, noNaN: true }),
    gapH: fc.double({ min: 1, max: 48, noNaN: true }),
    second: fc.double({ min: 5, max: 60, noNaN: true }),
    secondH: fc.double({ min: 0.25, max: 3, noNaN: true }),
  })
  .map(({ first, firstH, gapH, second, secondH }) => ({
    durationsH: [firstH, gapH, secondH],
    depthsMm: [first, 0, second],
  }));

const hortonBase = (ponding: boolean): LossMethod => ({ kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding });
const greenAmptBase: LossMethod = { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 };

const CASES: readonly Case[] = [
  ...[true, false].flatMap((ponding): Case[] => {
    const mode = ponding ? 'time compression' : 'from storm start';
    return [
      { name: `Horton f₀ (${mode})`, method: hortonBase(ponding), key: 'f0MmH', low: 10, high: 400 },
      { name: `Horton f_c (${mode})`, method: hortonBase(ponding), key: 'fcMmH', low: 0, high: 75 },
      { name: `Horton k (${mode})`, method: hortonBase(ponding), key: 'kPerH', low: 0.02, high: 50, log: true },
    ];
  }),
  // With capacity recovering in dry spells (stormArb's storms have dry bars).
  ...[true, false].flatMap((ponding): Case[] => {
    const mode = ponding ? 'time compression' : 'by the clock';
    const method: LossMethod = { ...hortonBase(ponding), recovers: true, recoveryPerH: 0.3 } as LossMethod;
    return [
      { name: `Horton f₀ with recovery (${mode})`, method, key: 'f0MmH', low: 10, high: 400 },
      { name: `Horton k with recovery (${mode})`, method, key: 'kPerH', low: 0.02, high: 50 },
      { name: `Horton k_r (${mode})`, method, key: 'recoveryPerH', low: 0.01, high: 20, log: true },
    ];
  }),
  { name: 'Green–Ampt K', method: greenAmptBase, key: 'ksMmH', low: 0.05, high: 60 },
  {
    name: 'Green–Ampt K with recovery',
    method: { ...greenAmptBase, recovers: true, initialSaturation: 0.3, poreSizeIndex: 0.22 },
    key: 'ksMmH',
    low: 0.05,
    high: 60,
  },
  {
    name: 'Green–Ampt Sᵢ (recovery)',
    method: { ...greenAmptBase, recovers: true, initialSaturation: 0.3, poreSizeIndex: 0.22 },
    key: 'initialSaturation',
    low: 0,
    high: 0.99,
    storms: twoBurstArb,
    // 5 mm, an hour dry, 5 mm (loam): runoff falls from 0.83 mm at Sᵢ = 0 to 0.324 mm near
    // Sᵢ = 0.95 and rises to 0.39 mm at 0.99 (a wetter start, but a larger porosity Δθ/(1 − Sᵢ)).
    unique: false,
  },
  {
    name: 'Green–Ampt λ (recovery)',
    method: { ...greenAmptBase, recovers: true, initialSaturation: 0.3, poreSizeIndex: 0.22 },
    key: 'poreSizeIndex',
    // The soils of Rawls, Brakensiek & Saxton (1982) lie within 0.1–0.7 (from memory).
    low: 0.05,
    high: 2,
    storms: twoBurstArb,
    // 5 mm, an hour dry, 5 mm (loam): runoff falls from 0.92 mm at λ = 0.01 to 0.65 mm at
    // λ = 1 and rises to 0.73 mm at λ = 10 (faster drainage, but less pull into the drained zone).
    unique: false,
  },
  { name: 'Green–Ampt ψ', method: greenAmptBase, key: 'suctionMm', low: 0, high: 400 },
  { name: 'Green–Ampt Δθ', method: greenAmptBase, key: 'moistureDeficit', low: 0, high: 1 },
  {
    name: 'curve number, Iₐ = 0.2 S',
    method: { kind: 'curve-number', cn: 75, iaRatio: 0.2 },
    key: 'cn',
    low: 20,
    high: 100,
  },
  {
    name: 'curve number, Iₐ = 0.05 S, power relation',
    method: { kind: 'curve-number', cn: 75, iaRatio: 0.05, conversion: 'power' },
    key: 'cn',
    low: 20,
    high: 100,
  },
  {
    name: 'curve number, Iₐ = 0.05 S, constant ratio',
    method: { kind: 'curve-number', cn: 75, iaRatio: 0.05, conversion: 'ratio' },
    key: 'cn',
    low: 20,
    high: 100,
  },
];

/**
 * Storms that pond (INVENTED): 1 to 20 bars of 1 to 30 min at 5 to 300 mm/h,
 * with dry bars between, so rain outruns the capacities drawn above for part
 * of the storm and the runoff answers to each parameter. stormArb's
 * gauge-like storms (half the draws) mostly stay below f₀ or Iₐ, where many
 * values give the same runoff and no true value can come back; short storms
 * keep the early capacity (f₀, k) from being swamped by hours of f_c.
 */
const pondingStormArb = fc
  .array(
    fc.record({
      durationH: fc.double({ min: 1 / 60, max: 0.5, noNaN: true }),
      rateMmH: fc.oneof(fc.constant(0), fc.double({ min: 5, max: 300, noNaN: true })),
    }),
    { minLength: 1, maxLength: 20, size: 'max' },
  )
  .map((bars) => ({ durationsH: bars.map((b) => b.durationH), depthsMm: bars.map((b) => b.rateMmH * b.durationH) }));

/**
 * Storms in bursts with a recovery rate to find (INVENTED): two ponding bursts
 * with one dry spell of T = 15 min to 8 h between them, and a true k_r of
 * c/T with c from 0.5 to 2, so the capacity is part way back when the second
 * burst starts (recovered share 1 − e^(−c), 39 % to 86 %). Drawn apart, most
 * pairs had the soil either fully back or hardly moved after the spell, and
 * k_r then barely changes the runoff: no true value can come back.
 */
const recoveryDraws = (low: number, high: number): fc.Arbitrary<[Storm, number]> =>
  fc
    .record({
      first: pondingStormArb.filter((s) => s.depthsMm.some((d) => d > 0)),
      second: pondingStormArb.filter((s) => s.depthsMm.some((d) => d > 0)),
      dryH: fc.double({ min: 0.25, max: 8, noNaN: true }),
      c: fc.double({ min: 0.5, max: 2, noNaN: true }),
    })
    .map(({ first, second, dryH, c }): [Storm, number] => [
      {
        durationsH: [...first.durationsH, dryH, ...second.durationsH],
        depthsMm: [...first.depthsMm, 0, ...second.depthsMm],
      },
      Math.min(high, Math.max(low, c / dryH)),
    ]);

/**
 * A value spread evenly over [low, high]. fc.double spreads its draws evenly
 * over the doubles themselves, so most land within a few binades of `low`
 * (f_c = 1e-200 mm/h): runoff does not answer to those and no true value
 * could come back.
 */
const linearIn = (low: number, high: number): fc.Arbitrary<number> =>
  fc.integer({ min: 0, max: 2 ** 30 }).map((n) => low + ((high - low) * n) / 2 ** 30);

describe('calibration of every infiltration parameter', () => {
  it('covers every numeric parameter of Horton, Green–Ampt and curve number', () => {
    for (const kind of ['horton', 'green-ampt', 'curve-number'] as const) {
      const keys = METHODS[kind].params.map((p) => p.key).sort();
      expect(keys).toEqual([...new Set(CASES.filter((c) => c.method.kind === kind).map((c) => c.key))].sort());
    }
  });

  it.each(CASES)(
    'round-trips $name on random storms: the fitted value is within 1e-9 of an exact answer, and of the true value where runoff responds',
    (c) => {
      let checked = 0;
      let trueValueBack = 0;
      fc.assert(
        fc.property(
          c.storms
            ? fc.tuple(c.storms, linearIn(c.low, c.high))
            : c.key === 'recoveryPerH'
              ? recoveryDraws(c.low, c.high)
              : fc.tuple(
                  fc.oneof(pondingStormArb, stormArb(30)),
                  c.log ? linearIn(Math.log(c.low), Math.log(c.high)).map(Math.exp) : linearIn(c.low, c.high),
                ),
          ([storm, truth]) => {
            const truthMethod = withValue(c.method, c.key, truth);
            // Horton's f₀ ≥ f_c: keep the drawn pair valid.
            fc.pre(!(truthMethod.kind === 'horton' && truthMethod.f0MmH < truthMethod.fcMmH));
            const target = excessOf(storm, truthMethod);
            const rain = computeLosses(storm, c.method).rainMm;
            const r = calibrate(storm, c.method, c.key, target);
            if (!r.ok && c.unique === false) {
              // Runoff not monotone in the parameter: the scan of 49 values (and the search for a
              // dip or peak beside the closest) can miss a narrow bump, as where recovery first
              // takes hold on a fine soil (λ near 0.1: a rise of 3e-4 mm in 0.005 of λ). Then the
              // answer says so and names the closest value tried, with the runoff it really gives.
              expect(r.reason).toBe('bound-reached');
              expect(r.message).toMatch(/was found to give .* of 49 values tried across the range/);
              expect(r.boundExcessMm).toBe(excessOf(storm, withValue(c.method, c.key, r.boundValue as number)));
              checked++;
              return;
            }
            expect(r.ok).toBe(true);
            if (!r.ok) return;
            const nudged = (value: number, factor: number): number | undefined => {
              try {
                return excessOf(storm, withValue(c.method, c.key, value * factor));
              } catch {
                return undefined; // the nudge left the valid range (f₀ < f_c, Δθ > 1, CN > 100)
              }
            };
            // The fitted value is within 2e-9 of itself of an exact answer: the target
            // lies between the runoffs of value·(1 ± 2e-9), to rounding of the rain.
            const fitted = excessOf(storm, r.method);
            const around = [fitted, nudged(r.value, 1 - 2e-9) ?? fitted, nudged(r.value, 1 + 2e-9) ?? fitted];
            const slack = 1e-12 * Math.max(rain, 1);
            expect(target).toBeGreaterThanOrEqual(Math.min(...around) - slack);
            expect(target).toBeLessThanOrEqual(Math.max(...around) + slack);
            expect(Math.abs(fitted - target)).toBeLessThanOrEqual(1e-6 * target + slack);
            // Where runoff changes measurably on both sides of the true value (not on
            // a plateau, where many values fit), the value itself comes back.
            const up = nudged(truth, 1 + 1e-6);
            const down = nudged(truth, 1 - 1e-6);
            const moves = (e: number | undefined): boolean =>
              e !== undefined && Math.abs(e - target) > 1e-7 * Math.max(target, 1e-3);
            checked++;
            if (c.unique !== false && truth > 0 && moves(up) && moves(down)) {
              expect(Math.abs(r.value - truth)).toBeLessThanOrEqual(1e-9 * truth);
              trueValueBack++;
            }
          },
        ),
        { numRuns: 200 },
      );
      // Every draw reaches the fit check, and enough reach the true-value check
      // (measured: 26 to 95 of 200 over four seeds, the fewest for Horton k).
      expect(checked).toBeGreaterThanOrEqual(190);
      // Where runoff is not monotone in the parameter, two values can give the target.
      expect(trueValueBack).toBeGreaterThanOrEqual(c.unique === false ? 0 : 15);
    },
  );

  it('keeps the other parameters as they were', () => {
    const storm = { durationsH: [0.5, 0.25, 1], depthsMm: [10, 20, 6] };
    const r = calibrate(storm, { kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding: false }, 'kPerH', 8);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.method).toMatchObject({ kind: 'horton', f0MmH: 75, fcMmH: 10, ponding: false });
  });

  it('never fits Horton f₀ below f_c', () => {
    // f₀ = f_c = 10 mm/h already gives 24.25 mm; asking for more must stop at f₀ = f_c.
    const storm = { durationsH: [0.5, 0.25, 1], depthsMm: [10, 20, 6] };
    const method: LossMethod = { kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding: true };
    const r = calibrate(storm, method, 'f0MmH', 30);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'min', boundValue: 10 });
  });
});

describe('out-of-reach targets say which bound was reached and what runoff it gives', () => {
  const storm = { durationsH: [0.5, 0.25, 1, 0.5], depthsMm: [4, 15, 12, 1] };

  it('Horton k: runoff above what the fastest decay gives stops at the top of the search', () => {
    const method: LossMethod = { kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding: false };
    const atTop = excessOf(storm, withValue(method, 'kPerH', HORTON_K_CEILING_PER_H));
    const r = calibrate(storm, method, 'kPerH', atTop + 1);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'max', boundValue: HORTON_K_CEILING_PER_H });
    if (r.ok) return;
    expect(r.boundExcessMm).toBeCloseTo(atTop, 12);
    expect(r.message).toMatch(
      /^No decay constant k greater than 0 1\/h gives .* mm of runoff: the highest value \(1000 1\/h\) gives .* mm\.$/,
    );
  });

  it('Horton f_c: runoff below what f_c = f₀ gives stops at the top of its range, f₀', () => {
    const method: LossMethod = { kind: 'horton', f0MmH: 30, fcMmH: 5, kPerH: 2, ponding: true };
    const atTop = excessOf(storm, withValue(method, 'fcMmH', 30));
    expect(atTop).toBeGreaterThan(0.5);
    const r = calibrate(storm, method, 'fcMmH', atTop - 0.5);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'max', boundValue: 30 });
    if (r.ok) return;
    expect(r.boundExcessMm).toBeCloseTo(atTop, 12);
    expect(r.message).toMatch(/the highest value \(30 mm\/h\) gives/);
  });

  it('Green–Ampt ψ: runoff above what no suction gives stops at ψ = 0', () => {
    const method: LossMethod = { kind: 'green-ampt', ksMmH: 8, suctionMm: 100, moistureDeficit: 0.3 };
    const atZero = excessOf(storm, withValue(method, 'suctionMm', 0));
    const r = calibrate(storm, method, 'suctionMm', atZero + 0.25);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'min', boundValue: 0 });
    if (r.ok) return;
    expect(r.boundExcessMm).toBeCloseTo(atZero, 12);
    expect(r.message).toMatch(
      /^No wetting-front suction head ψ at least 0 mm gives .* mm of runoff: the lowest value \(0 mm\) gives/,
    );
  });

  it('Green–Ampt Δθ: runoff above what a saturated soil gives stops at Δθ = 0 and names the symbol as written', () => {
    const method: LossMethod = { kind: 'green-ampt', ksMmH: 8, suctionMm: 100, moistureDeficit: 0.3 };
    const atZero = excessOf(storm, withValue(method, 'moistureDeficit', 0));
    const r = calibrate(storm, method, 'moistureDeficit', atZero + 0.5);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'min', boundValue: 0 });
    if (r.ok) return;
    expect(r.boundExcessMm).toBeCloseTo(atZero, 12);
    expect(r.message).toMatch(/^No moisture deficit Δθ between 0 and 1 gives/);
  });
});
