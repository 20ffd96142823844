import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  computeLosses,
  hortonCapacityMmH,
  hortonCumulativeMm,
  validateMethod,
  type HortonLoss,
} from '../../../src/core';
import { stormArb } from '../../helpers/arbitraries';
import { expectClose } from '../../helpers/tolerance';
import { expectInputError } from '../../helpers/input-error';

const horton = (ponding: boolean, f0MmH = 60, fcMmH = 8, kPerH = 3): HortonLoss => ({
  kind: 'horton',
  f0MmH,
  fcMmH,
  kPerH,
  ponding,
});

/**
 * Independent reference for time compression: integrate the position τ on the
 * capacity curve, dτ/dt = min(1, i/f(τ)) (all rain soaks in while i < f, so
 * dF = f dτ = i dt; ponded, τ runs with the clock), by classical RK4 in small
 * steps, and read F(τ) off Horton's curve (Horton 1940).
 */
function rk4TimeCompression(m: HortonLoss, durationsH: number[], depthsMm: number[], stepsPerBar = 4000): number[] {
  const f = (tau: number): number => hortonCapacityMmH(m.f0MmH, m.fcMmH, m.kPerH, tau);
  const losses: number[] = [];
  let tau = 0;
  for (let j = 0; j < durationsH.length; j++) {
    const i = (depthsMm[j] as number) / (durationsH[j] as number);
    // A dry bar does not move along the curve (also when the capacity is zero).
    const rate = (t: number): number => (i === 0 ? 0 : Math.min(1, i / f(t)));
    const h = (durationsH[j] as number) / stepsPerBar;
    const start = hortonCumulativeMm(m.f0MmH, m.fcMmH, m.kPerH, tau);
    for (let s = 0; s < stepsPerBar; s++) {
      const k1 = rate(tau);
      const k2 = rate(tau + 0.5 * h * k1);
      const k3 = rate(tau + 0.5 * h * k2);
      const k4 = rate(tau + h * k3);
      tau += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    }
    losses.push(hortonCumulativeMm(m.f0MmH, m.fcMmH, m.kPerH, tau) - start);
  }
  return losses;
}

describe('Horton, capacity from storm start', () => {
  it('loses the closed-form cumulative infiltration F(t) = f_c t + (f₀ − f_c)(1 − e^(−kt))/k when rain always exceeds capacity (Horton 1940)', () => {
    const m = horton(false);
    const durationsH = [0.1, 0.35, 0.05, 0.5, 1.25];
    const depthsMm = durationsH.map((d) => 70 * d); // 70 mm/h > f₀ = 60 mm/h
    const r = computeLosses({ durationsH, depthsMm }, m);
    let t = 0;
    let cum = 0;
    for (let j = 0; j < durationsH.length; j++) {
      t += durationsH[j] as number;
      cum += r.lossMm[j] as number;
      // Closed form written out here, independent of the library's helper.
      expectClose(cum, 8 * t + ((60 - 8) * (1 - Math.exp(-3 * t))) / 3, 1e-13);
    }
  });

  it('loses a whole bar whose rain is below the capacity integrated over it', () => {
    const m = horton(false);
    // Bar 2 (0.5–1.5 h): ∫f dt = 8 + (52/3)(e^(−1.5) − e^(−4.5)) = 11.67 mm > 10 mm.
    const r = computeLosses({ durationsH: [0.5, 1], depthsMm: [40, 10] }, m);
    expect(r.lossMm[1]).toBe(10);
    expectClose(r.lossMm[0] as number, 8 * 0.5 + (52 / 3) * (1 - Math.exp(-1.5)), 1e-14);
  });

  it('lets capacity fall during dry bars, unlike time compression', () => {
    const storm = { durationsH: [2, 0.5], depthsMm: [0, 30] };
    const plain = computeLosses(storm, horton(false));
    const compressed = computeLosses(storm, horton(true));
    expectClose(plain.lossMm[1] as number, 8 * 0.5 + (52 / 3) * (Math.exp(-6) - Math.exp(-7.5)), 1e-13);
    expectClose(compressed.lossMm[1] as number, hortonCumulativeMm(60, 8, 3, 0.5), 1e-13);
  });

  it('changes under splitting a bar by at most half the difference of the halves’ capacities (stated tolerance)', () => {
    // Splitting bar [t_a, t_b] with capacities C₁ ≥ C₂ of its halves changes that
    // bar's loss from min(P, C₁ + C₂) to min(P/2, C₁) + min(P/2, C₂): never up,
    // and down by at most (C₁ − C₂)/2 = (f₀ − f_c)/(2k)·e^(−k t_a)(1 − e^(−kΔt/2))².
    fc.assert(
      fc.property(
        stormArb(30),
        fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 200, noNaN: true }),
        fc.double({ min: 0.01, max: 20, noNaN: true }),
        fc.nat(),
        (storm, fcMmH, extra, kPerH, pick) => {
          const m = horton(false, fcMmH + extra, fcMmH, kPerH);
          const j = pick % storm.depthsMm.length;
          const d = storm.durationsH[j] as number;
          let ta = 0;
          for (let q = 0; q < j; q++) ta += storm.durationsH[q] as number;
          const split = {
            durationsH: storm.durationsH.flatMap((x, q) => (q === j ? [x / 2, x / 2] : [x])),
            depthsMm: storm.depthsMm.flatMap((x, q) => (q === j ? [x / 2, x / 2] : [x])),
          };
          const whole = computeLosses(storm, m).totalLossMm;
          const halves = computeLosses(split, m).totalLossMm;
          const bound = (extra / (2 * kPerH)) * Math.exp(-kPerH * ta) * (1 - Math.exp((-kPerH * d) / 2)) ** 2;
          const slack = 1e-12 * Math.max(1, whole);
          expect(halves).toBeLessThanOrEqual(whole + slack);
          expect(whole - halves).toBeLessThanOrEqual(bound + slack);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('Horton with time compression (capacity follows infiltrated depth)', () => {
  it('equals the storm-start form when rain always exceeds capacity', () => {
    const durationsH = [0.2, 0.05, 0.75, 0.4, 2];
    const depthsMm = [16, 5, 50, 30, 140]; // 80, 100, 67, 75, 70 mm/h: all above f₀ = 60 mm/h
    const plain = computeLosses({ durationsH, depthsMm }, horton(false));
    const compressed = computeLosses({ durationsH, depthsMm }, horton(true));
    for (let j = 0; j < durationsH.length; j++) {
      expectClose(compressed.lossMm[j] as number, plain.lossMm[j] as number, 1e-12, 1e-12);
    }
  });

  it('ponds constant rain between f_c and f₀ at F_p = f_c τ_p + (f₀ − i)/k, then follows the curve', () => {
    // i = 20 mm/h: e^(−kτ_p) = (i − f_c)/(f₀ − f_c) = 12/52, τ_p = ln(52/12)/3,
    // F_p = 8τ_p + 40/3 mm, reached at t_p = F_p/i; then F(t) = F(τ_p + t − t_p).
    const tauP = Math.log(52 / 12) / 3;
    const fp = 8 * tauP + 40 / 3;
    const tp = fp / 20;
    const r = computeLosses(
      { durationsH: [tp * 0.999, 3 - tp * 0.999], depthsMm: [20 * tp * 0.999, 20 * (3 - tp * 0.999)] },
      horton(true),
    );
    expect(r.excessMm[0]).toBe(0);
    expectClose(r.totalLossMm, hortonCumulativeMm(60, 8, 3, tauP + 3 - tp), 1e-12);
  });

  it('loses all rain at or below f_c, however long it lasts', () => {
    const r = computeLosses({ durationsH: [10, 30, 5], depthsMm: [80, 240, 1] }, horton(true));
    expect(r.totalExcessMm).toBe(0);
  });

  it('keeps capacity that light rain did not use: less excess than the storm-start form', () => {
    const storm = { durationsH: [4, 0.5], depthsMm: [12, 40] }; // 3 mm/h, then 80 mm/h
    const plain = computeLosses(storm, horton(false));
    const compressed = computeLosses(storm, horton(true));
    expect(compressed.totalExcessMm).toBeLessThan(plain.totalExcessMm);
  });

  it('after light rain has moved F off the curve, ponds a heavier bar where F reaches F_p (RK4 reference)', () => {
    // 5 mm/h (below f_c: all soaks in) fills F₀, then 30 mm/h for half an hour.
    // F_p(30) = 8·ln(52/22)/3 + 10 = 12.294 mm; F₀ either side of it and of
    // the cheap bound (f₀ − i)·i/(k(i − f_c)) = 13.64 mm the method tests first.
    const m = horton(true);
    for (const f0Depth of [4, 10, 12.2, 12.4, 13.5, 14, 40]) {
      const durationsH = [f0Depth / 5, 0.5];
      const depthsMm = [f0Depth, 15];
      const r = computeLosses({ durationsH, depthsMm }, m);
      const ref = rk4TimeCompression(m, durationsH, depthsMm, 20000);
      expect(Math.abs((r.lossMm[1] as number) - (ref[1] as number))).toBeLessThanOrEqual(1e-7);
    }
  });

  it('matches an independent RK4 integration of dτ/dt = min(1, i/f(τ)) on random storms', () => {
    fc.assert(
      fc.property(
        stormArb(8),
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0.05, max: 6, noNaN: true }),
        (storm, fcMmH, extra, kPerH) => {
          const m = horton(true, fcMmH + extra, fcMmH, kPerH);
          const r = computeLosses(storm, m);
          const ref = rk4TimeCompression(m, storm.durationsH, storm.depthsMm, 2000);
          for (let j = 0; j < ref.length; j++) {
            // RK4 is only first/second order across the kink where ponding starts: 1e-6 of the rain.
            expect(Math.abs((r.lossMm[j] as number) - (ref[j] as number))).toBeLessThanOrEqual(
              1e-6 * Math.max(1, storm.depthsMm[j] as number),
            );
          }
        },
      ),
      { numRuns: 100 },
    );
  });

  it('is the same with f₀ = f_c as a constant loss rate', () => {
    const storm = { durationsH: [0.5, 1, 0.25], depthsMm: [2, 30, 9] };
    for (const ponding of [true, false]) {
      const r = computeLosses(storm, horton(ponding, 10, 10, 2));
      const c = computeLosses(storm, { kind: 'constant', rateMmH: 10 });
      for (let j = 0; j < 3; j++) expectClose(r.lossMm[j] as number, c.lossMm[j] as number, 1e-14, 1e-14);
    }
  });
});

describe('Horton input checks', () => {
  it.each([
    [{ ...horton(true), f0MmH: 5 }, 'f0MmH', /at least the final capacity/],
    [{ ...horton(true), fcMmH: -1 }, 'fcMmH', /at least 0 mm\/h/],
    [{ ...horton(true), kPerH: 0 }, 'kPerH', /greater than 0 1\/h/],
    [{ ...horton(true), f0MmH: Number.POSITIVE_INFINITY }, 'f0MmH', /finite number/],
    [{ ...horton(true), ponding: 'yes' }, 'ponding', /true or false/],
  ])('rejects a bad method naming %#', (method, field, message) => {
    expectInputError(() => validateMethod(method as never), field, message);
  });
});
