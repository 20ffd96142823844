import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  computeLosses,
  greenAmptForTexture,
  greenAmptPondedDepthMm,
  greenAmptPondedIncrementMm,
  greenAmptPondingDepthMm,
  greenAmptRateMmH,
  validateMethod,
  type GreenAmptLoss,
} from '../../../src/core';
import { shortcuts } from '../../../src/core/loss/shortcuts';
import { stormArb } from '../../helpers/arbitraries';
import { expectClose } from '../../helpers/tolerance';
import { expectInputError } from '../../helpers/input-error';

// Silt loam at initial effective saturation 0.3 (Rawls, Brakensiek & Miller 1983):
// K = 6.5 mm/h, ψ = 166.8 mm, Δθ = 0.7 × 0.486 = 0.3402, ψΔθ = 56.745 mm.
const siltLoam = greenAmptForTexture('silt loam', 0.3);
const M = siltLoam.suctionMm * siltLoam.moistureDeficit;

/**
 * The ponded Green–Ampt equation F − F₁ − M ln((F + M)/(F₁ + M)) = K t
 * (Chow, Maidment & Mays 1988, §4.3–4.4), solved here by plain bisection,
 * independently of the library's Newton iteration.
 */
function pondedByBisection(k: number, m: number, f1: number, t: number): number {
  const g = (f: number): number => f - f1 - m * Math.log((f + m) / (f1 + m)) - k * t;
  let lo = f1;
  let hi = f1 + k * t + Math.sqrt(2 * m * k * t) + 1;
  while (g(hi) < 0) hi *= 2;
  for (let iter = 0; iter < 300; iter++) {
    const mid = 0.5 * (lo + hi);
    if (g(mid) > 0) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Independent reference for variable rain: integrates dF/dt = min(i, f(F)),
 * f = K(1 + M/F), by classical RK4 with step doubling (each step compared
 * with two half steps, halved until they agree). While f(F) > i, F rises at
 * the rain rate, so the step is cut where F meets the depth at which f = i.
 */
function rk4GreenAmpt(k: number, m: number, durationsH: number[], depthsMm: number[]): number[] {
  const capacity = (f: number): number => (m === 0 ? k : f <= 0 ? Infinity : k * (1 + m / f));
  const rk4 = (f: number, h: number): number => {
    const k1 = capacity(f);
    const k2 = capacity(f + 0.5 * h * k1);
    const k3 = capacity(f + 0.5 * h * k2);
    const k4 = capacity(f + h * k3);
    return f + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
  };
  const losses: number[] = [];
  let f = 0;
  for (let j = 0; j < durationsH.length; j++) {
    const d = durationsH[j] as number;
    const i = (depthsMm[j] as number) / d;
    const start = f;
    let left = d;
    if (capacity(f) > i) {
      const reach = m === 0 || i <= k ? Infinity : (k * m) / (i - k) - f;
      if (reach >= i * d) {
        f += i * d;
        left = 0;
      } else {
        f += Math.max(reach, 0);
        left -= Math.max(reach, 0) / i;
      }
    }
    let h = left / 64;
    for (let steps = 0; left > 0; steps++) {
      if (steps > 1e6) throw new Error('reference integration did not finish');
      h = Math.min(h, left);
      const whole = rk4(f, h);
      const halves = rk4(rk4(f, h / 2), h / 2);
      if (Math.abs(whole - halves) <= 1e-13 * Math.max(1, halves) || h < 1e-300) {
        f = halves + (halves - whole) / 15;
        left -= h;
        h *= 2;
      } else {
        h /= 2;
      }
    }
    losses.push(f - start);
  }
  return losses;
}

describe('Green–Ampt against Chow, Maidment & Mays (1988)', () => {
  it('Example 4.3.1: silt loam, Sₑ = 0.3, ponded from t = 0 — F and f after 1 h', () => {
    // From the published equations at full precision: F(1 h) = 31.656 mm and
    // f = K(1 + ψΔθ/F) = 18.152 mm/h. The book prints F = 3.17 cm and
    // f = 1.81 cm/h (from memory; it rounds ψΔθ to 5.68 cm and takes f from the
    // rounded F, hence 1.81 rather than 1.82).
    const f1h = greenAmptPondedDepthMm(siltLoam.ksMmH, siltLoam.suctionMm, siltLoam.moistureDeficit, 1);
    expectClose(f1h, pondedByBisection(6.5, M, 0, 1), 1e-12);
    expect(Math.abs(f1h / 10 - 3.17)).toBeLessThanOrEqual(0.005);
    const rate = greenAmptRateMmH(siltLoam.ksMmH, siltLoam.suctionMm, siltLoam.moistureDeficit, f1h);
    expect(Math.abs(rate / 10 - 1.81)).toBeLessThanOrEqual(0.01);
  });

  it('Example 4.4.1: ponding time under constant rain of 1 and 5 cm/h on the same soil', () => {
    // F_p = Kψ Δθ/(i − K), t_p = F_p/i (Mein & Larson 1973). The book prints
    // t_p = 10.5 h for 1 cm/h, and F_p = 0.85 cm, t_p = 0.17 h for 5 cm/h
    // (from memory); full precision gives 105.38 mm / 10.538 h and 8.479 mm / 0.1696 h.
    const fp1 = greenAmptPondingDepthMm(6.5, 166.8, siltLoam.moistureDeficit, 10);
    expectClose(fp1, (6.5 * M) / 3.5, 1e-14);
    expect(Math.abs(fp1 / 10 - 10.5)).toBeLessThanOrEqual(0.05);
    const fp5 = greenAmptPondingDepthMm(6.5, 166.8, siltLoam.moistureDeficit, 50);
    expect(Math.abs(fp5 / 10 - 0.85)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(fp5 / 50 - 0.17)).toBeLessThanOrEqual(0.005);
  });

  it('under constant rain of 5 cm/h ponds at t_p and then follows the ponded equation from F_p', () => {
    const fp = (6.5 * M) / (50 - 6.5);
    const tp = fp / 50;
    // Just before t_p nothing runs off.
    const early = computeLosses({ durationsH: [tp * 0.999], depthsMm: [50 * tp * 0.999] }, siltLoam);
    expect(early.totalExcessMm).toBe(0);
    // Over 1 h (one bar, or unequal bars): F(1 h) from F_p over 1 − t_p hours.
    const expected = pondedByBisection(6.5, M, fp, 1 - tp);
    const one = computeLosses({ durationsH: [1], depthsMm: [50] }, siltLoam);
    expectClose(one.totalLossMm, expected, 1e-12);
    const bars = [0.03, 0.2, 0.07, 0.5, 0.2];
    const many = computeLosses({ durationsH: bars, depthsMm: bars.map((d) => 50 * d) }, siltLoam);
    expectClose(many.totalLossMm, expected, 1e-12);
  });
});

describe('Green–Ampt under variable rainfall', () => {
  it('with rain far above capacity from the first instant equals the ponded closed form', () => {
    // i = 10⁶ K ponds after F_p ≈ ψΔθ/10⁶; what is lost meanwhile is of order 10⁻¹¹ mm.
    for (const hours of [0.1, 1, 6]) {
      const i = 6.5e6;
      const r = computeLosses({ durationsH: [hours], depthsMm: [i * hours] }, siltLoam);
      expectClose(r.totalLossMm, pondedByBisection(6.5, M, 0, hours), 1e-9);
    }
  });

  it('loses everything when rain never exceeds K, whatever the bars', () => {
    fc.assert(
      fc.property(stormArb(40), (storm) => {
        let peak = 0;
        for (let j = 0; j < storm.depthsMm.length; j++) {
          peak = Math.max(peak, (storm.depthsMm[j] as number) / (storm.durationsH[j] as number));
        }
        const m: GreenAmptLoss = { kind: 'green-ampt', ksMmH: peak, suctionMm: 100, moistureDeficit: 0.3 };
        if (peak === 0) return;
        const r = computeLosses(storm, m);
        expect(r.totalExcessMm).toBe(0);
        expect(Array.from(r.lossMm)).toEqual(storm.depthsMm);
      }),
      { numRuns: 100 },
    );
  });

  it('does not pond while rain is below capacity: light rain first raises F and delays ponding', () => {
    // 8 mm/h for 4 h (below capacity throughout: F reaches 32 mm < F_p(8) = 245.9 mm),
    // then 50 mm/h: ponds when F reaches F_p(50) = 8.48 mm — at once.
    const r = computeLosses({ durationsH: [4, 1], depthsMm: [32, 50] }, siltLoam);
    expect(r.excessMm[0]).toBe(0);
    expectClose(r.lossMm[1] as number, pondedByBisection(6.5, M, 32, 1) - 32, 1e-12);
  });

  it('matches an independent adaptive RK4 integration of dF/dt = min(i, K(1 + ψΔθ/F)) on random storms', () => {
    fc.assert(
      fc.property(
        stormArb(6),
        fc.double({ min: 0.5, max: 40, noNaN: true }),
        // Physical ranges (ψΔθ = 0 or ≥ 1e-4 mm): subnormal suction heads make the
        // reference ODE too stiff to integrate, though the method handles them.
        fc.oneof(fc.constant(0), fc.double({ min: 0.1, max: 300, noNaN: true })),
        fc.oneof(fc.constant(0), fc.double({ min: 0.001, max: 0.5, noNaN: true })),
        (storm, ksMmH, suctionMm, moistureDeficit) => {
          const m: GreenAmptLoss = { kind: 'green-ampt', ksMmH, suctionMm, moistureDeficit };
          const r = computeLosses(storm, m);
          const ref = rk4GreenAmpt(ksMmH, suctionMm * moistureDeficit, storm.durationsH, storm.depthsMm);
          for (let j = 0; j < ref.length; j++) {
            expect(Math.abs((r.lossMm[j] as number) - (ref[j] as number))).toBeLessThanOrEqual(
              1e-8 * Math.max(1, storm.depthsMm[j] as number),
            );
          }
        },
      ),
      { numRuns: 100 },
    );
  });

  it('solves the ponded equation to rounding over extreme steps, inside its bracket [K t, f(F₁) t]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 500, noNaN: true }),
        fc.double({ min: 1e-6, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-9, max: 1e6, noNaN: true }),
        fc.double({ min: 1e-9, max: 1e4, noNaN: true }),
        (k, m, f1, t) => {
          const x = greenAmptPondedIncrementMm(k, m, f1, t);
          expect(x).toBeGreaterThanOrEqual(k * t * (1 - 1e-15));
          expect(x).toBeLessThanOrEqual(k * (1 + m / f1) * t * (1 + 1e-15));
          const residual = x - m * Math.log1p(x / (f1 + m)) - k * t;
          // Residual within rounding of its largest term.
          expect(Math.abs(residual)).toBeLessThanOrEqual(1e-12 * Math.max(x, k * t));
        },
      ),
      { numRuns: 2000 },
    );
  });

  it('solves steps short against F₁ (u = x/(F₁ + M) on both sides of 1e-3, where ln(1 + u) is summed as a series) to 1e-15 of 200-bit roots', () => {
    // Roots of x − M ln(1 + x/(F₁ + M)) = K t for this file's silt loam (K = 6.5 mm/h,
    // M = ψΔθ = 56.74536 mm as a double), found with mpmath's findroot at 200 bits,
    // independently of the library, and written to the nearest double; [F₁ mm, t h, x mm].
    for (const [f1, t, x] of [
      [300, 0.25, 1.9313853405814689], // u = 0.0054
      [3000, 0.5, 3.311440236840393], // u = 0.0011
      [3000, 0.25, 1.655728591064186], // u = 0.00054
      [30000, 1, 6.512293493734191], // u = 0.00022
      [300000, 0.1, 0.6501229481467811], // u = 2.2e-6
    ] as const) {
      expectClose(greenAmptPondedIncrementMm(6.5, M, f1, t), x, 1e-15, 0);
    }
  });

  it('solves steps far beyond F₁ + M (a new front after a dry spell, a dry start; u = K t/(F₁ + M) from 10 to 14,000) to 1e-15 of 200-bit roots', () => {
    // Roots of x − M ln(1 + x/(F₁ + M)) = K t found with mpmath's findroot at 200 bits from
    // the doubles shown, independently of the library, written to the nearest double;
    // [K mm/h, M mm, F₁ mm, t h, x mm]. The first is a new front after a short spell:
    // M₂ = 1e-4 mm, ponded from F₁ = K·M₂/(i − K) at i = 20 mm/h.
    for (const [k, m, f1, t, x] of [
      [3.4, 1e-4, 3.4e-4 / 16.6, 0.15, 0.5108352538478506],
      [3.4, 0.01, 0, 0.25, 0.895054096237677],
      [6.5, 0.5, 0.1, 1, 7.820763034813045],
      [0.3, 2e-6, 1e-7, 0.1, 0.030019135445827405],
      [117.8, 0.03, 0.002, 0.05, 6.047407799982943],
    ] as const) {
      expectClose(greenAmptPondedIncrementMm(k, m, f1, t), x, 1e-15, 0);
    }
  });

  it('takes shortcuts (ln(1 + u) by a series about an anchor, Newton stopped by its error bound) that stay within 1e-15 of the exact path', () => {
    // With the shortcuts off every step takes Math.log1p and the loop ends on a step
    // below 1e-15 of x, as before they came. Bound (green-ampt.ts): the anchored
    // logarithm moves the root by at most 6ε (ε = 2⁻⁵³ ≈ 1.1e-16) and the early stop by
    // at most 1e-16 of it; the exact path's own rounding is within 2ε: 1e-15 holds both.
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 500, noNaN: true }),
        fc.double({ min: 1e-9, max: 1e4, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: 1e-9, max: 1e6, noNaN: true })),
        fc.double({ min: 1e-6, max: 100, noNaN: true }),
        (k, m, f1, t) => {
          const fast = greenAmptPondedIncrementMm(k, m, f1, t);
          shortcuts.on = false;
          try {
            expectClose(fast, greenAmptPondedIncrementMm(k, m, f1, t), 1e-15, 0);
          } finally {
            shortcuts.on = true;
          }
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('stays finite and exact when ψΔθ or K·t underflow (subnormal inputs)', () => {
    for (const [k, m, f1, t] of [
      [1e-6, 5e-324, 0, 1.65],
      [1e-6, 5e-324, 1e-300, 1.65],
      [0.5, 1e-320, 0, 1e-300],
      [1e-300, 1e-10, 0, 1e-20],
    ] as const) {
      const x = greenAmptPondedIncrementMm(k, m, f1, t);
      expect(Number.isFinite(x)).toBe(true);
      expect(x).toBeGreaterThanOrEqual(k * t);
      expect(x).toBeLessThanOrEqual(k * t + Math.sqrt(2 * m * k * t) + (f1 > 0 ? k * t * (m / f1) : 0));
    }
  });

  it('with no suction or no deficit is a constant loss rate K', () => {
    const storm = { durationsH: [0.5, 1, 0.25], depthsMm: [2, 30, 9] };
    const c = computeLosses(storm, { kind: 'constant', rateMmH: 6.5 });
    for (const m of [
      { ...siltLoam, suctionMm: 0 },
      { ...siltLoam, moistureDeficit: 0 },
    ]) {
      const r = computeLosses(storm, m);
      for (let j = 0; j < 3; j++) expectClose(r.lossMm[j] as number, c.lossMm[j] as number, 1e-14, 1e-14);
    }
  });
});

describe('Green–Ampt input checks', () => {
  it.each([
    [{ ...siltLoam, ksMmH: 0 }, 'ksMmH', /greater than 0 mm\/h/],
    [{ ...siltLoam, suctionMm: -1 }, 'suctionMm', /at least 0 mm/],
    [{ ...siltLoam, moistureDeficit: 1.2 }, 'moistureDeficit', /between 0 and 1/],
    [{ ...siltLoam, moistureDeficit: undefined }, 'moistureDeficit', /finite number/],
  ])('rejects a bad method naming %#', (method, field, message) => {
    expectInputError(() => validateMethod(method as never), field, message);
  });
});
