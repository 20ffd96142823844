import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  computeLosses,
  hortonCapacityMmH,
  hortonCumulativeMm,
  validateMethod,
  type HortonLoss,
  type Storm,
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

describe('Horton by time since the rain began (ponding: false)', () => {
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

  // 60 mm in 2 h (i = 30 mm/h), f₀ = 100, f_c = 10 mm/h, k = 4 /h, worked by hand
  // from L = ∫₀² min(30, f(t)) dt with f(t) = 10 + 90e^(−4t) (Horton 1940):
  //   crossing f(t_c) = 30: e^(−4 t_c) = 20/90 = 2/9, t_c = ln(4.5)/4 = 0.376019 h;
  //   before it all rain soaks in: 30·t_c;
  //   after it the curve from f = 30: 10·(2 − t_c) + (30 − 10)/4·(1 − e^(−4(2 − t_c))),
  //   with e^(−4(2 − t_c)) = e^(−8)·e^(4 t_c) = 4.5·e^(−8);
  //   L = 30 t_c + 20 − 10 t_c + 5 − 22.5 e^(−8) = 25 + 5 ln 4.5 − 22.5 e^(−8) = 32.512839 mm,
  //   excess = 60 − L = 35 − 5 ln 4.5 + 22.5 e^(−8) = 27.487161 mm.
  // (The old per-bar rule min(P, ∫f dt) gave 17.5 mm for one bar, 27.0 mm for
  // four half-hour bars and 27.5 mm for 2,000 bars.)
  const WORKED_EXCESS_MM = 35 - 5 * Math.log(4.5) + 22.5 * Math.exp(-8); // 27.48716092524643
  const worked: HortonLoss = { kind: 'horton', f0MmH: 100, fcMmH: 10, kPerH: 4, ponding: false };
  const cut = (bars: number): Storm => ({
    durationsH: Array(bars).fill(2 / bars) as number[],
    depthsMm: Array(bars).fill(60 / bars) as number[],
  });

  it('gives 35 − 5 ln 4.5 + 22.5 e^(−8) = 27.4872 mm of excess for 60 mm in one 2-hour bar (worked by hand)', () => {
    expect(WORKED_EXCESS_MM).toBeCloseTo(27.487160925, 8);
    expectClose(computeLosses(cut(1), worked).totalExcessMm, WORKED_EXCESS_MM, 1e-13);
  });

  it.each([2, 4, 7, 2000])('gives the same 27.4872 mm when the 2 hours are cut into %i bars', (bars) => {
    expectClose(computeLosses(cut(bars), worked).totalExcessMm, WORKED_EXCESS_MM, 1e-11);
  });

  it('starts the clock at the first bar with rain: dry bars before it leave the capacity at f₀', () => {
    // 30 mm in 0.5 h (60 mm/h ≥ f₀ = 60) after two dry hours loses the whole
    // curve from τ = 0: 8·0.5 + (52/3)(1 − e^(−1.5)) = 17.465744 mm (Horton 1940).
    const r = computeLosses({ durationsH: [1.5, 0.5, 0.5], depthsMm: [0, 0, 30] }, horton(false));
    expectClose(r.lossMm[2] as number, 8 * 0.5 + (52 / 3) * (1 - Math.exp(-1.5)), 1e-13);
    expectClose(r.lossMm[2] as number, 17.46574389076055, 1e-13);
  });

  it('lets the clock run on through dry bars once the rain has begun (without recovery)', () => {
    // 80 mm/h bars at 0–0.5 h and 1.5–2 h: the second loses ∫ f over τ = 1.5…2,
    // 8·0.5 + (52/3)(e^(−4.5) − e^(−6)) = 4.149591 mm.
    const r = computeLosses({ durationsH: [0.5, 1, 0.5], depthsMm: [40, 0, 40] }, horton(false));
    expectClose(r.lossMm[2] as number, 8 * 0.5 + (52 / 3) * (Math.exp(-4.5) - Math.exp(-6)), 1e-13);
  });

  it('loses all of a bar whose rain stays below the capacity at its end', () => {
    // Bar 2 (0.5–1.5 h) rains 5 mm/h, below f_c = 8 mm/h: nothing runs off.
    const r = computeLosses({ durationsH: [0.5, 1], depthsMm: [40, 5] }, horton(false));
    expect(r.lossMm[1]).toBe(5);
    expectClose(r.lossMm[0] as number, 8 * 0.5 + (52 / 3) * (1 - Math.exp(-1.5)), 1e-14);
  });

  it('loses ∫ min(i, f) dt inside a bar where the capacity crosses the rain (checked against fine numerical integration)', () => {
    // Independent reference: the midpoint rule on min(i, f(t)) with 200,000 steps
    // per bar, the crossing kink costing at most one step's error.
    const m = horton(false, 90, 5, 2.5);
    const storm = { durationsH: [0.25, 0.75, 0.4, 1.6], depthsMm: [3, 30, 0, 20] };
    const r = computeLosses(storm, m);
    let t0 = 0;
    let started = false;
    for (let j = 0; j < 4; j++) {
      const d = storm.durationsH[j] as number;
      const i = (storm.depthsMm[j] as number) / d;
      if (i > 0) started = true;
      const steps = 200_000;
      let sum = 0;
      for (let q = 0; q < steps; q++) {
        const tau = t0 + ((q + 0.5) * d) / steps;
        sum += Math.min(i, 5 + 85 * Math.exp(-2.5 * tau));
      }
      expect(Math.abs((r.lossMm[j] as number) - (sum * d) / steps)).toBeLessThanOrEqual(1e-6);
      if (started) t0 += d;
    }
  });
});

describe('Horton with capacity recovery in dry spells (f₀ − f = (f₀ − f_w)·e^(−k_r t): Bedient, Huber & Vieux, Hydrology and Floodplain Analysis; from memory)', () => {
  const recovering = (ponding: boolean, recoveryPerH = 0.5): HortonLoss => ({
    ...horton(ponding),
    recovers: true,
    recoveryPerH,
  });

  it('by the clock, regains f₀ − f by e^(−k_r t) over a dry spell and falls again from there', () => {
    // After 0.5 h at 80 mm/h: D₁ = e^(−1.5). Two dry hours at k_r = 0.5 /h:
    // 1 − D₂ = (1 − e^(−1.5))·e^(−1), D₂ = 0.714206. The next 80 mm/h bar then loses
    // the curve from D₂: 8·0.5 + (52/3)·D₂·(1 − e^(−1.5)) = 13.617309 mm.
    const storm = { durationsH: [0.5, 2, 0.5], depthsMm: [40, 0, 40] };
    const d2 = 1 - (1 - Math.exp(-1.5)) * Math.exp(-1);
    const expected = 8 * 0.5 + (52 / 3) * d2 * (1 - Math.exp(-1.5));
    expect(expected).toBeCloseTo(13.617309122, 8);
    expectClose(computeLosses(storm, recovering(false)).lossMm[2] as number, expected, 1e-13);
  });

  it('by infiltrated depth, gives the same as by the clock when every wet bar is above f₀', () => {
    // Both readings then ride the curve; recovery moves both to the same D₂.
    const storm = { durationsH: [0.5, 2, 0.5], depthsMm: [40, 0, 40] };
    const byDepth = computeLosses(storm, recovering(true));
    const byClock = computeLosses(storm, recovering(false));
    for (let j = 0; j < 3; j++) expectClose(byDepth.lossMm[j] as number, byClock.lossMm[j] as number, 1e-13);
  });

  it('by infiltrated depth, moves F back to the depth the curve holds at the recovered capacity', () => {
    // After the dry spell the soil holds F₂ = 8τ₂ + (52/3)(1 − D₂), τ₂ = −ln(D₂)/3.
    // A storm that soaks in exactly F₂ at 2 mm/h (below f_c: no move along the
    // curve, all infiltrates) and then meets the same 30 mm/h bar must lose the same.
    const d2 = 1 - (1 - Math.exp(-1.5)) * Math.exp(-1);
    const f2 = (8 * -Math.log(d2)) / 3 + (52 / 3) * (1 - d2);
    const recovered = computeLosses({ durationsH: [0.5, 2, 0.5], depthsMm: [40, 0, 15] }, recovering(true));
    const refilled = computeLosses({ durationsH: [f2 / 2, 0.5], depthsMm: [f2, 15] }, horton(true));
    expectClose(recovered.lossMm[2] as number, refilled.lossMm[1] as number, 1e-12);
  });

  it('recovers fully after a long dry spell, and not at all with the option off', () => {
    for (const ponding of [false, true]) {
      const storm = { durationsH: [1, 200, 0.5], depthsMm: [80, 0, 40] };
      const fresh = computeLosses({ durationsH: [0.5], depthsMm: [40] }, horton(ponding));
      expectClose(computeLosses(storm, recovering(ponding)).lossMm[2] as number, fresh.lossMm[0] as number, 1e-12);
      const off = computeLosses(storm, { ...recovering(ponding), recovers: false });
      expect(off.lossMm[2] as number).toBeLessThan((fresh.lossMm[0] as number) - 1);
    }
  });

  it('keeps a curve decayed past what a double holds through a dry spell that recovers nothing measurable', () => {
    // A 200 h bar at 100 mm/h rides the curve to τ = 200 h, kτ = 800: e^(−kτ) underflows to 0 (D = 0).
    // k_r = 5e-324 /h regains nothing in the dry hour (e^(−k_r·1 h) rounds to 1), so the capacity stays
    // f_c = 5 mm/h and the last bar (20 mm in 1 h) loses 5 mm. Bar 1 loses F(200 h) =
    // 5·200 + (50 − 5)/4·(1 − e^(−800)) = 1000 + 11.25 = 1011.25 mm. (By infiltrated depth the
    // recovery once gave τ = −ln(1 − 1)/k = ∞, F = ∞ and NaN from the next bar: found by the
    // bar-splitting property on a random seed, with f₀ = f_c, where the curve is flat.)
    const storm = { durationsH: [200, 1, 1], depthsMm: [20000, 0, 20] };
    for (const ponding of [true, false]) {
      const method: HortonLoss = {
        kind: 'horton',
        f0MmH: 50,
        fcMmH: 5,
        kPerH: 4,
        ponding,
        recovers: true,
        recoveryPerH: 5e-324,
      };
      const r = computeLosses(storm, method);
      expectClose(r.lossMm[0] as number, 1011.25, 1e-14);
      expect(r.lossMm[1]).toBe(0);
      expectClose(r.lossMm[2] as number, 5, 1e-14);
      // f₀ = f_c: a flat curve at 5 mm/h whatever τ, recovery or not: 5 mm an hour.
      const flat = computeLosses(storm, { ...method, f0MmH: 5 });
      expectClose(flat.lossMm[0] as number, 1000, 1e-14);
      expectClose(flat.lossMm[2] as number, 5, 1e-14);
    }
  });

  it('ignores the recovery rate while the option is off (the same as leaving both out)', () => {
    const storm = { durationsH: [0.5, 2, 0.5], depthsMm: [40, 0, 40] };
    for (const ponding of [false, true]) {
      const plain = computeLosses(storm, horton(ponding));
      const off = computeLosses(storm, { ...horton(ponding), recovers: false, recoveryPerH: 3 });
      expect(Array.from(off.lossMm)).toEqual(Array.from(plain.lossMm));
    }
  });
});

describe('Horton with time compression (capacity follows infiltrated depth)', () => {
  it('equals the clock form when rain always exceeds capacity', () => {
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
    [{ ...horton(true), recovers: 'yes' }, 'recovers', /true or false/],
    [{ ...horton(true), recovers: true, recoveryPerH: -0.1 }, 'recoveryPerH', /at least 0 1\/h/],
    [{ ...horton(true), recoveryPerH: Number.NaN }, 'recoveryPerH', /finite number/],
  ])('rejects a bad method naming %#', (method, field, message) => {
    expectInputError(() => validateMethod(method as never), field, message);
  });
});
