// runoffHydrograph: what its samples mean, the invariants every transform
// keeps (volume, linearity, time shift, bar splitting) and its input checks.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  TRANSFORMS,
  convolve,
  convolveDirect,
  runoffHydrograph,
  unitResponse,
  type Excess,
  type Transform,
} from '../../../src/core';
import { stormArb } from '../../helpers/arbitraries';
import { expectInputError } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const AREA = 3.2e6;

/** Random transforms of every kind, with parameters where catchments have them. */
const transformArb: fc.Arbitrary<Transform> = fc.oneof(
  fc.record({ kind: fc.constant('nrcs-dimensionless' as const), lagH: fc.double({ min: 0.05, max: 8, noNaN: true }) }),
  fc.record({
    kind: fc.constant('nrcs-dimensionless' as const),
    lagH: fc.double({ min: 0.05, max: 8, noNaN: true }),
    peakRateFactor: fc.double({ min: 150, max: 900, noNaN: true }),
  }),
  fc.record({ kind: fc.constant('triangular' as const), lagH: fc.double({ min: 0.05, max: 8, noNaN: true }) }),
  fc.record({
    kind: fc.constant('nash' as const),
    n: fc.double({ min: 0.5, max: 8, noNaN: true }),
    kH: fc.double({ min: 0.05, max: 4, noNaN: true }),
  }),
  fc.constant(TRANSFORMS['unit-hydrograph'].defaults as Transform),
);

const excessArb = (maxBars: number): fc.Arbitrary<Excess> =>
  stormArb(maxBars).map((s) => ({ durationsH: s.durationsH, excessMm: s.depthsMm }));

const sum = (a: ArrayLike<number>): number => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] as number;
  return s;
};

const largest = (a: ArrayLike<number>): number => {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, a[i] as number);
  return m;
};

describe('what the samples are', () => {
  it('starts at the storm start, steps by the shortest bar and ends back at zero', () => {
    const h = runoffHydrograph(
      { durationsH: [0.5, 0.25, 1], excessMm: [2, 5, 1] },
      { kind: 'triangular', lagH: 0.4 },
      AREA,
    );
    expect(h.timesH[0]).toBe(0);
    for (let i = 0; i < h.timesH.length; i++) expect(h.timesH[i]).toBe(i * 0.25);
    expect(h.dischargeM3s[h.dischargeM3s.length - 1]).toBe(0);
    expect(h.dischargeM3s[0]).toBe(0);
    // Peak and its time are the highest sample.
    const i = h.dischargeM3s.indexOf(h.peakM3s);
    expect(h.timeOfPeakH).toBe(h.timesH[i]);
  });

  it('takes the output step asked for', () => {
    const h = runoffHydrograph({ durationsH: [1], excessMm: [3] }, { kind: 'nash', n: 2, kH: 0.5 }, AREA, {
      stepH: 0.1,
    });
    expectClose((h.timesH[7] as number) - (h.timesH[6] as number), 0.1, 1e-14);
  });

  it('gives a dry storm a flat zero hydrograph and no storm a single zero sample', () => {
    const dry = runoffHydrograph({ durationsH: [1, 1], excessMm: [0, 0] }, { kind: 'triangular', lagH: 1 }, AREA);
    expect(dry.peakM3s).toBe(0);
    expect(dry.timeOfPeakH).toBe(0);
    expect(dry.volumeM3).toBe(0);
    expect(Array.from(dry.dischargeM3s).every((q) => q === 0)).toBe(true);
    const none = runoffHydrograph({ durationsH: [], excessMm: [] }, { kind: 'triangular', lagH: 1 }, AREA);
    expect(Array.from(none.timesH)).toEqual([0]);
    expect(Array.from(none.dischargeM3s)).toEqual([0]);
  });

  it('spreads a bar that ends inside a step at its own intensity before gathering it', () => {
    // Bars of 0.25 h and 0.4 h, step 0.25 h: the second bar's 8 mm falls 0.25/0.4 in
    // the step 0.25–0.5 h and 0.15/0.4 in 0.5–0.75 h: 5 mm and 3 mm.
    const t: Transform = { kind: 'nash', n: 3, kH: 0.3 };
    const uneven = runoffHydrograph({ durationsH: [0.25, 0.4], excessMm: [2, 8] }, t, AREA);
    const gathered = runoffHydrograph({ durationsH: [0.25, 0.25, 0.25], excessMm: [2, 5, 3] }, t, AREA);
    expect(uneven.timesH.length).toBe(gathered.timesH.length);
    for (let i = 0; i < gathered.timesH.length; i++) {
      expectClose(uneven.dischargeM3s[i] as number, gathered.dischargeM3s[i] as number, 1e-13, 1e-15);
    }
  });
});

describe('invariants of every transform (fast-check)', () => {
  it('conserves volume: Σ q·Δt = Σ excess × area to 1e-9 (storms of 1–40 unequal bars)', () => {
    fc.assert(
      fc.property(excessArb(40), transformArb, (excess, transform) => {
        const h = runoffHydrograph(excess, transform, AREA);
        const expected = sum(excess.excessMm) * AREA * 1e-3;
        const stepH = (h.timesH[1] ?? 1) - (h.timesH[0] as number);
        expectClose(sum(h.dischargeM3s) * stepH * 3600, expected, 1e-9, 1e-9);
        expectClose(h.volumeM3, expected, 1e-9, 1e-9);
        // The trapezoidal rule agrees: the first and last samples are zero.
        let trapezoid = 0;
        for (let i = 1; i < h.timesH.length; i++) {
          trapezoid += 0.5 * ((h.dischargeM3s[i] as number) + (h.dischargeM3s[i - 1] as number)) * stepH * 3600;
        }
        expectClose(trapezoid, expected, 1e-9, 1e-9);
      }),
      { numRuns: 120 },
    );
  });

  it('is linear: c·E gives c·q, and E₁ + E₂ on the same bars gives q₁ + q₂ (1–30 bars)', () => {
    fc.assert(
      fc.property(
        excessArb(30),
        transformArb,
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        (e1, transform, c, seed) => {
          // A second excess on the same bars, from a seeded walk.
          let s = seed;
          const e2 = Array.from(e1.excessMm, () => {
            s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
            return (s / 2 ** 32) * 20;
          });
          const q1 = runoffHydrograph(e1, transform, AREA).dischargeM3s;
          const scaled = runoffHydrograph(
            { durationsH: e1.durationsH, excessMm: Array.from(e1.excessMm, (x) => c * x) },
            transform,
            AREA,
          ).dischargeM3s;
          const q2 = runoffHydrograph({ durationsH: e1.durationsH, excessMm: e2 }, transform, AREA).dischargeM3s;
          const both = runoffHydrograph(
            { durationsH: e1.durationsH, excessMm: Array.from(e1.excessMm, (x, k) => x + (e2[k] as number)) },
            transform,
            AREA,
          ).dischargeM3s;
          const tol = 1e-12 * (c * largest(q1) + largest(q2)) + 1e-300;
          for (let i = 0; i < q1.length; i++) {
            expectClose(scaled[i] as number, c * (q1[i] as number), 0, tol);
            expectClose(both[i] as number, (q1[i] as number) + (q2[i] as number), 0, tol);
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it('is time-shift invariant: a dry lead of m steps delays the hydrograph by m samples (1–30 bars, m 1–12)', () => {
    fc.assert(
      fc.property(excessArb(30), transformArb, fc.integer({ min: 1, max: 12 }), (excess, transform, m) => {
        const stepH = 0.25;
        const base = runoffHydrograph(excess, transform, AREA, { stepH });
        const led = runoffHydrograph(
          { durationsH: [m * stepH, ...Array.from(excess.durationsH)], excessMm: [0, ...Array.from(excess.excessMm)] },
          transform,
          AREA,
          { stepH },
        );
        expect(led.timesH.length).toBe(base.timesH.length + m);
        const tol = 1e-12 * largest(base.dischargeM3s) + 1e-300;
        for (let i = 0; i < m; i++) expect(led.dischargeM3s[i]).toBe(0);
        for (let i = 0; i < base.timesH.length; i++) {
          expectClose(led.dischargeM3s[i + m] as number, base.dischargeM3s[i] as number, 0, tol);
        }
        // The peak moves with it. (Where two samples tie for the peak, round-off may
        // pick the other one, so check the sample, not the index.)
        expectClose(led.peakM3s, base.peakM3s, 0, tol);
        const atPeak = Math.round(led.timeOfPeakH / stepH) - m;
        if (base.peakM3s > 0) expectClose(base.dischargeM3s[atPeak] as number, base.peakM3s, 0, tol);
      }),
      { numRuns: 60 },
    );
  });

  it('is time-shift invariant where the storm ends at the edge of the snap to a step (seen on a random seed)', () => {
    // The bars end 0.99999999 millionths of a step past a step boundary (4.75000025 h at 0.25 h steps), just
    // inside SNAP_STEPS: the last edge is on the boundary. Summed plainly after a dry lead of 5 steps, the
    // edge drifted past the snap and the hydrograph came out one sample longer (32, not 31) with another tail.
    const excess = {
      durationsH: [0.7573553419623555, 2.767708333333329, 1.1866792674650344, 0.02159064057261295, 1 / 60],
      excessMm: [1e-6, 1e-6, 1e-6, 1e-6, 1e-6],
    };
    const transform = { kind: 'nash', n: 0.5, kH: 0.05 } as const;
    const base = runoffHydrograph(excess, transform, AREA, { stepH: 0.25 });
    const led = runoffHydrograph(
      { durationsH: [1.25, ...excess.durationsH], excessMm: [0, ...excess.excessMm] },
      transform,
      AREA,
      { stepH: 0.25 },
    );
    expect(led.timesH.length).toBe(base.timesH.length + 5);
    const tol = 1e-12 * largest(base.dischargeM3s);
    for (let i = 0; i < base.timesH.length; i++) {
      expectClose(led.dischargeM3s[i + 5] as number, base.dischargeM3s[i] as number, 0, tol);
    }
  });

  it('keeps a dry lead exactly dry where the convolution runs by FFT', () => {
    // 300 dry 1-min steps, then 4,700 wet ones, through a Nash cascade thousands of samples long: the FFT's
    // round-off (some 1e-16 of the peak, of either sign) once reached the dry samples as positive flow.
    const durationsH = [5, ...Array.from({ length: 4700 }, () => 1 / 60)];
    const excessMm = [0, ...Array.from({ length: 4700 }, (_, k) => 1 + Math.sin(k / 7))];
    const h = runoffHydrograph({ durationsH, excessMm }, { kind: 'nash', n: 3, kH: 2 }, AREA, { stepH: 1 / 60 });
    expect(h.dischargeM3s.length).toBeGreaterThan(5000);
    const dry = Array.from(h.dischargeM3s.subarray(0, 300));
    expect(dry.filter((q) => q !== 0)).toEqual([]);
    expect(h.dischargeM3s[301]).toBeGreaterThan(0);
  });

  it('is unchanged by cutting a bar in two at the same intensity (1–30 bars, fixed step)', () => {
    fc.assert(
      fc.property(
        excessArb(30),
        transformArb,
        fc.nat(),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        (excess, transform, pick, f) => {
          const k = pick % excess.durationsH.length;
          const d = Array.from(excess.durationsH);
          const e = Array.from(excess.excessMm);
          const cutD = [...d.slice(0, k), (d[k] as number) * f, (d[k] as number) * (1 - f), ...d.slice(k + 1)];
          const cutE = [...e.slice(0, k), (e[k] as number) * f, (e[k] as number) * (1 - f), ...e.slice(k + 1)];
          const stepH = Math.min(...d) / 2;
          const whole = runoffHydrograph(excess, transform, AREA, { stepH });
          const cut = runoffHydrograph({ durationsH: cutD, excessMm: cutE }, transform, AREA, { stepH });
          expect(cut.timesH.length).toBe(whole.timesH.length);
          const tol = 1e-11 * largest(whole.dischargeM3s) + 1e-300;
          for (let i = 0; i < whole.timesH.length; i++) {
            expectClose(cut.dischargeM3s[i] as number, whole.dischargeM3s[i] as number, 0, tol);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('long records', () => {
  it('through the FFT equal the direct convolution (20,000 bars of 5 minutes)', () => {
    const n = 20_000;
    const stepH = 1 / 12;
    const durationsH = new Float64Array(n).fill(stepH);
    const excessMm = Float64Array.from({ length: n }, (_, k) => (k % 97 < 40 ? 0 : ((k * 7) % 13) / 4));
    const transform: Transform = { kind: 'nrcs-dimensionless', lagH: 1.5 };
    const r = unitResponse(transform, stepH);
    expect(convolve(excessMm, r).byFft).toBe(true);
    const h = runoffHydrograph({ durationsH, excessMm }, transform, AREA);
    const direct = convolveDirect(excessMm, r);
    const perMm = (AREA * 1e-3) / (stepH * 3600);
    expect(h.timesH.length).toBe(direct.length + 1);
    const tol = 1e-12 * h.peakM3s;
    for (let i = 0; i < direct.length; i++) {
      expectClose(h.dischargeM3s[i] as number, (direct[i] as number) * perMm, 0, tol);
    }
  });
});

describe('input checks', () => {
  const excess = { durationsH: [0.5, 0.5], excessMm: [1, 2] };
  const tri: Transform = { kind: 'triangular', lagH: 1 };

  it('names the bar and the field of bad excess', () => {
    expectInputError(
      () => runoffHydrograph({ durationsH: [0.5, 0], excessMm: [1, 2] }, tri, AREA),
      'durationsH',
      /Bar 2/,
    );
    expectInputError(
      () => runoffHydrograph({ durationsH: [0.5, 0.5], excessMm: [1, -2] }, tri, AREA),
      'excessMm',
      /Bar 2/,
    );
    expectInputError(() => runoffHydrograph({ durationsH: [0.5], excessMm: [1, 2] }, tri, AREA), 'excessMm', /match/);
    expectInputError(() => runoffHydrograph(excess, tri, 0), 'areaM2', /area/);
    expectInputError(() => runoffHydrograph(excess, tri, AREA, { stepH: -1 }), 'options.stepH', /output step/);
  });

  describe('a step too short for the storm or the unit hydrograph', () => {
    // A year of daily bars, then one bar of a second (invented): the shortest bar sets the step.
    const year = {
      durationsH: [...new Array<number>(365).fill(24), 1 / 3600],
      excessMm: [...new Array<number>(365).fill(1), 1],
    };

    it('defaulted to the shortest bar, names that bar and the bars that would do', () => {
      // 365 × 24 h + 1 s = 8760 h 1 s = 31,536,001 s: as many 1-s steps, over the 10,000,000 kept.
      // A step of 31,536,001 s / 10⁷ = 3.1536001 s would do: 3.16 s, rounded up to 3 digits.
      const error = expectInputError(
        () => runoffHydrograph(year, tri, AREA),
        'durationsH',
        /^The output step is the storm’s shortest bar, bar 366 \(1 s\): the storm’s 8760 h would take 31536001 steps of it, more than the 10000000 a hydrograph holds\. Lengthen that bar, or resample the storm to bars of at least 3\.16 s\.$/,
      );
      expect(error.index).toBe(365);
    });

    it('asked for, names the output step and the step that would do', () => {
      expectInputError(
        () => runoffHydrograph(year, tri, AREA, { stepH: 1 / 3600 }),
        'options.stepH',
        /^The storm lasts 8760 h: 31536001 output steps of 1 s, more than the 10000000 a hydrograph holds; an output step of at least 3\.16 s would do\.$/,
      );
    });

    it('with a unit hydrograph too long for the shortest bar, says so in the same terms', () => {
      // One minute of 1-s bars under a lag of 1000 h: Tp = D/2 + lag = 1/7200 + 1000 h and the base
      // 8/3 Tp = 2666.66704 h, ceil(2666.66704 × 3600) + 1 = 9,600,003 steps, over the 2²³ = 8,388,608 kept.
      // 2666.66704 h / 2²³ = 3.17891e-4 h = 1.14441 s: 1.15 s rounded up.
      const minute = { durationsH: new Array<number>(60).fill(1 / 3600), excessMm: new Array<number>(60).fill(0.1) };
      const error = expectInputError(
        () => runoffHydrograph(minute, { kind: 'triangular', lagH: 1000 }, AREA),
        'durationsH',
        /^The output step is the storm’s shortest bar, bar 1 \(1 s\): the unit hydrograph lasts 2667 h, 9600003 steps of it, more than the 8388608 kept\. Lengthen that bar, or resample the storm to bars of at least 1\.15 s\.$/,
      );
      expect(error.index).toBe(0);
      // At the step suggested it is computed: 2666.667 h / (1.15 s = 3.19444e-4 h) = 8,347,828 steps.
      const bars = { durationsH: [1.15 / 3600], excessMm: [6] };
      expect(runoffHydrograph(bars, { kind: 'triangular', lagH: 1000 }, AREA).peakM3s).toBeGreaterThan(0);
    });
  });

  it('names the parameter of a bad transform', () => {
    expectInputError(() => runoffHydrograph(excess, { kind: 'triangular', lagH: 0 }, AREA), 'lagH', /Lag/);
    expectInputError(() => runoffHydrograph(excess, { kind: 'nash', n: -1, kH: 1 }, AREA), 'n', /reservoirs/);
    expectInputError(() => runoffHydrograph(excess, { kind: 'nash', n: 2, kH: NaN }, AREA), 'kH', /Storage/);
    expectInputError(
      () => runoffHydrograph(excess, { kind: 'nrcs-dimensionless', lagH: 1, peakRateFactor: 5000 }, AREA),
      'peakRateFactor',
      /100 and at most 1000/,
    );
    expectInputError(
      () => runoffHydrograph(excess, { kind: 'clark' } as unknown as Transform, AREA),
      'kind',
      /Unknown/,
    );
    const uh = { kind: 'unit-hydrograph', durationH: 1, stepH: 1 } as const;
    expectInputError(
      () => runoffHydrograph(excess, { ...uh, ordinatesM3sPerMm: [0, 1, -0.5, 0] }, AREA),
      'ordinatesM3sPerMm',
      /Ordinate 3/,
    );
    expectInputError(
      () => runoffHydrograph(excess, { ...uh, ordinatesM3sPerMm: [0, 0, 0] }, AREA),
      'ordinatesM3sPerMm',
      /no ordinate above zero/,
    );
    expectInputError(
      () => runoffHydrograph(excess, { ...uh, durationH: 3, ordinatesM3sPerMm: [0, 1, 0] }, AREA),
      'ordinatesM3sPerMm',
      /span 2 h/,
    );
    // Runoff only after T − D: its S-curve would never rise before it levels off.
    expectInputError(
      () => runoffHydrograph(excess, { ...uh, durationH: 2, ordinatesM3sPerMm: [0, 0, 0, 5, 0] }, AREA),
      'ordinatesM3sPerMm',
      /no runoff in its first 2 h/,
    );
  });

  it('asks for a longer step instead of building an enormous hydrograph', () => {
    expectInputError(
      () => runoffHydrograph({ durationsH: [1000], excessMm: [1] }, tri, AREA, { stepH: 1e-5 }),
      'options.stepH',
      /at least/,
    );
    // With no step asked for, the step is the one bar's, and the refusal names it.
    expectInputError(
      () => runoffHydrograph({ durationsH: [0.001], excessMm: [1] }, { kind: 'nash', n: 3, kH: 900 }, AREA),
      'durationsH',
      /bar 1 \(3\.6 s\).*resample the storm to bars of at least/,
    );
  });
});
