// The redistribution of a Green–Ampt wetted zone in a dry spell: the equation of
// Smith, Corradini & Melone (1993, Water Resources Research 29(1)) as Ogden &
// Saghafian (1997, J. Irrig. Drain. Eng. 123(5)) use it in a rainfall hiatus,
// with Brooks & Corey (1964) soil relations (all from memory). In effective
// saturation S, τ = K·t/I:
//   dS/dτ = −x·[S^ε + b·x·(S^c − Sᵢ^c)],  x = S − Sᵢ,  ε = 3 + 2/λ,  c = 3 + 1/λ.
// Checked against an independent numerical integration written here, against
// closed forms of limiting cases worked by hand, and for the behaviour the model
// must show.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  redistribute,
  redistributeBySeries,
  redistributedSaturation,
  redistributionSoil,
  scaledSaturationPower,
} from '../../../src/core/loss/redistribution';

/** Right-hand side of the redistribution equation, written out from the equation above. */
function slope(s: number, si: number, lambda: number, b: number): number {
  const x = s - si;
  const eps = 3 + 2 / lambda;
  const c = 3 + 1 / lambda;
  return -x * (s ** eps + b * x * (s ** c - si ** c));
}

/**
 * Classical RK4 with step doubling: each step compared with two half steps
 * and halved until they agree to 1e-14, then accepted with Richardson's
 * correction; the step grows again after a success.
 */
function rk4Reference(start: number, tau: number, si: number, lambda: number, b: number): number {
  const f = (s: number): number => slope(s, si, lambda, b);
  const step = (s: number, h: number): number => {
    const k1 = f(s);
    const k2 = f(s + 0.5 * h * k1);
    const k3 = f(s + 0.5 * h * k2);
    const k4 = f(s + h * k3);
    return s + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
  };
  let s = start;
  let left = tau;
  let h = tau / 64;
  for (let n = 0; left > 0; n++) {
    if (n > 2e6) throw new Error('reference integration did not finish');
    h = Math.min(h, left);
    const whole = step(s, h);
    const halves = step(step(s, h / 2), h / 2);
    if (Math.abs(whole - halves) <= 1e-14) {
      s = halves + (halves - whole) / 15;
      left -= h;
      h *= 2;
    } else {
      h /= 2;
    }
  }
  return s;
}

describe('redistribution of the wetted zone in a dry spell', () => {
  it('matches an adaptive RK4 integration of dS/dτ written in the test, over short and long spells, from S = 1 and below', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: 0.08, max: 1.5, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: 1e-4, max: 30, noNaN: true })),
        fc.double({ min: 1e-6, max: 30, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        (si, lambda, b, tau, fraction) => {
          // From saturation (the end of rain) and from part-way down (the spread rule's start).
          for (const start of [1, si + fraction * (1 - si)]) {
            const got = redistributedSaturation(start, tau, si, lambda, b);
            const ref = rk4Reference(start, tau, si, lambda, b);
            expect(Math.abs(got - ref)).toBeLessThanOrEqual(1e-10);
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it('agrees with the reference on the soils of the texture table (loam, sand, clay) over minutes to days', () => {
    // b = p·ψΔθ/(I(1 − Sᵢ)(2 + 3λ − Sᵢ^c)) for p = 1.7 and I from 2 to 200 mm; τ = K·t/I.
    const soils = [
      { name: 'loam', k: 3.4, psi: 88.9, lambda: 0.22, porosity: 0.434 },
      { name: 'sand', k: 117.8, psi: 49.5, lambda: 0.592, porosity: 0.417 },
      { name: 'clay', k: 0.3, psi: 316.3, lambda: 0.131, porosity: 0.385 },
    ];
    for (const soil of soils) {
      const si = 0.3;
      const deficit = (1 - si) * soil.porosity;
      const drive = 2 + 3 * soil.lambda - si ** (3 + 1 / soil.lambda);
      for (const depth of [2, 20, 200]) {
        const b = (1.7 * soil.psi * deficit) / (depth * (1 - si) * drive);
        for (const hours of [0.1, 3, 48]) {
          const tau = (soil.k * hours) / depth;
          const got = redistributedSaturation(1, tau, si, soil.lambda, b);
          expect(Math.abs(got - rk4Reference(1, tau, si, soil.lambda, b))).toBeLessThanOrEqual(1e-10);
        }
      }
    }
  });

  it('is as exact on the short spells of a long record (τ of 1e-7 to 1e-3: the series of S itself, to order 4, in pieces where needed)', () => {
    for (const [si, lambda] of [
      [0.3, 0.22],
      [0, 0.6],
      [0.6, 0.13],
    ] as const) {
      for (const b of [1e-3, 0.1, 2]) {
        for (const tau of [1e-7, 1e-5, 1e-4, 1e-3]) {
          for (const start of [1, si + 0.9 * (1 - si)]) {
            const got = redistributedSaturation(start, tau, si, lambda, b);
            // Over so short a spell the change itself is small: hold it to 1e-12 of itself.
            const ref = rk4Reference(start, tau, si, lambda, b);
            expect(Math.abs(got - ref)).toBeLessThanOrEqual(1e-12 * Math.abs(start - ref) + 1e-15);
          }
        }
      }
    }
  });

  it('takes short spells by the series of S itself (in pieces where needed) within 1e-14 of the general series', () => {
    // Both sum Taylor series of the same S(τ), each cut where its last term is below 1e-16
    // of S and the one before below 1e-12 (what is left then is smaller still), so each
    // piece differs by at most about 4e-16 (that, and a few roundings of numbers ≤ 1);
    // with at most 24 pieces, 24 × 4e-16 < 1e-14. S^(1/λ), kept beside S, goes by the
    // binomial series (1.4e-21 left out) or the general series' own, so it follows S:
    // 1e-14 of itself, and 1/λ times S's own 1e-14/S besides. (Measured over 200,000
    // random cases, before order 5 came: 6.7e-16 and 1.7e-15.)
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.99, noNaN: true }),
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: 1e-4, max: 100, noNaN: true })),
        fc.double({ min: -9, max: -2, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (si, lambda, b, logTau, fraction) => {
          const soil = redistributionSoil(si, lambda);
          for (const start of [1, si + fraction * (1 - si)]) {
            const quick = { sat: start, satPow: start ** (1 / lambda) };
            const general = { ...quick };
            redistribute(soil, quick, 10 ** logTau, b);
            redistributeBySeries(soil, general, 10 ** logTau, b);
            expect(Math.abs(quick.sat - general.sat)).toBeLessThanOrEqual(1e-14);
            // P = S^(1/λ) moves by dP/P = (1/λ)·dS/S with S, in either solve.
            const slack = 1e-14 * (1 + 1 / (lambda * general.sat));
            expect(Math.abs(quick.satPow - general.satPow)).toBeLessThanOrEqual(slack * general.satPow);
          }
        },
      ),
      { numRuns: 2000 },
    );
  });

  it('carries S^(1/λ) by its binomial series within 4 units in the last place of Math.pow', () => {
    // S₁^(1/λ) = S₀^(1/λ)·(1 + d)^(1/λ) for S₁ = S₀(1 + d): the series leaves out less than
    // 1.4e-21 of the sum while (1/λ + 5)|d| ≤ 1e-3 (redistribution.ts); what remains is
    // rounding: S₀^(1/λ) and Math.pow within a unit each (V8's pow), a product and a sum, 4ε.
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.oneof(fc.double({ min: -1.2, max: 1.2, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true })),
        (lambda, s0, reach) => {
          const soil = redistributionSoil(0.3, lambda);
          // d up to the series' limit and past it, where Math.pow itself is used (reach in units
          // of the limit 1e-3/(1/λ + 5)).
          // S₁ a double near S₀, and d from the two (S₁ − S₀ is exact, so d is within half a
          // unit of itself: a·d·ε/2 < 1e-3·ε on the result).
          const s1 = Math.min(1, s0 + (s0 * reach * 1e-3) / (1 / lambda + 5));
          const d = (s1 - s0) / s0;
          const exact = s1 ** (1 / lambda);
          const got = scaledSaturationPower(soil, s0 ** (1 / lambda), d, s1);
          expect(Math.abs(got - exact)).toBeLessThanOrEqual(4 * 2 ** -53 * exact);
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('without capillarity from dry soil follows the closed form S = (1 + ετ)^(−1/ε)', () => {
    // Sᵢ = 0, b = 0: dS/dτ = −S^(1+ε), so d(S^−ε)/dτ = ε and S^−ε = 1 + ετ.
    // λ = 0.25: ε = 3 + 2/0.25 = 11; τ = 2: S = 23^(−1/11) = e^(−3.1354942/11) = e^(−0.2850449) = 0.7519805.
    expect(Math.abs(redistributedSaturation(1, 2, 0, 0.25, 0) - 0.7519805)).toBeLessThanOrEqual(1e-7);
    for (const [lambda, tau] of [
      [0.25, 2],
      [0.13, 1e-3],
      [0.6, 500],
      [1, 1e6],
    ] as const) {
      const eps = 3 + 2 / lambda;
      const exact = (1 + eps * tau) ** (-1 / eps);
      expect(Math.abs(redistributedSaturation(1, tau, 0, lambda, 0) - exact)).toBeLessThanOrEqual(1e-13);
    }
  });

  it('starts down at the slope of the equation: −x·[1 + b·x·(1 − Sᵢ^c)] at S = 1', () => {
    // Sᵢ = 0.3, λ = 0.5 (c = 5), b = 2: x = 0.7, Sᵢ^c = 0.3⁵ = 0.00243,
    // slope = −0.7·(1 + 2·0.7·0.99757) = −0.7·2.396598 = −1.6776186.
    const tau = 1e-7;
    const moved = (1 - redistributedSaturation(1, tau, 0.3, 0.5, 2)) / tau;
    expect(Math.abs(moved - 1.6776186)).toBeLessThanOrEqual(1e-5);
  });

  it('changes nothing with no time, or with nothing to drain (S = Sᵢ)', () => {
    expect(redistributedSaturation(1, 0, 0.3, 0.22, 1)).toBe(1);
    expect(redistributedSaturation(0.4, 5, 0.4, 0.22, 1)).toBe(0.4);
  });

  it('lets the water content fall towards the initial content and never below it during a long hiatus', () => {
    // Sand-like λ = 0.6 drains fast enough to come close within the times shown.
    let previous = 1;
    for (const tau of [0.01, 0.1, 1, 10, 1e2, 1e3, 1e4, 2e4]) {
      const s = redistributedSaturation(1, tau, 0.3, 0.6, 0.5);
      expect(s).toBeLessThan(previous);
      expect(s).toBeGreaterThan(0.3);
      previous = s;
    }
    // Near Sᵢ the slope is x·Sᵢ^ε (ε = 3 + 2/0.6 = 6.33): x shrinks as e^(−0.3^6.33·τ) = e^(−4.9e-4·τ),
    // about e^(−4.9) = 1/134 from τ = 1e4 to 2e4.
    const at1e4 = redistributedSaturation(1, 1e4, 0.3, 0.6, 0.5) - 0.3;
    expect(previous - 0.3).toBeLessThan(at1e4 / 50);
    expect(previous - 0.3).toBeLessThan(1e-5);
    // So far on that the zone is at Sᵢ to rounding, and stays there.
    expect(redistributedSaturation(1, 1e6, 0.3, 0.6, 0.5)).toBe(0.3);
  });

  it('gives the same state for one spell as for the same spell in two parts', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: 0.08, max: 1.5, noNaN: true }),
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 1e-6, max: 100, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        (si, lambda, b, tau, cut) => {
          const whole = redistributedSaturation(1, tau, si, lambda, b);
          const half = redistributedSaturation(1, tau * cut, si, lambda, b);
          const parts = redistributedSaturation(half, tau * (1 - cut), si, lambda, b);
          expect(Math.abs(whole - parts)).toBeLessThanOrEqual(1e-12);
        },
      ),
      { numRuns: 300 },
    );
  });
});
