// The infiltration capacity through a storm, f(t), that the chart draws: from
// the methods' own state, checked against the capacity equations written out
// by hand (Horton 1940; Green & Ampt 1911) and against the losses.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLosses, infiltrationCapacity, type LossMethod, type Storm } from '../../../src/core';
import { stormArb } from '../../helpers/arbitraries';
import { expectInputError } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

/** f(τ) = 8 + 52e^(−3τ): the Horton curve used below (f₀ 60, f_c 8, k 3). */
const hortonF = (tau: number): number => 8 + 52 * Math.exp(-3 * tau);
/** F(τ) = 8τ + (52/3)(1 − e^(−3τ)) on the same curve (Horton 1940). */
const hortonDepth = (tau: number): number => 8 * tau + (52 / 3) * (1 - Math.exp(-3 * tau));

/** τ with F(τ) = depth, by bisection (independent of the core's Newton solve). */
function tauAtDepth(depth: number): number {
  let lo = 0;
  let hi = 100;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (hortonDepth(mid) < depth) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

const horton = (ponding: boolean, extra: Partial<LossMethod> = {}): LossMethod =>
  ({ kind: 'horton', f0MmH: 60, fcMmH: 8, kPerH: 3, ponding, ...extra }) as LossMethod;

const capacity = (storm: Storm, method: LossMethod, times: number[]): number[] =>
  Array.from(infiltrationCapacity(storm, method, times) ?? []);

describe('Horton capacity by the clock', () => {
  it('stays at f₀ through dry bars before the rain, then follows f(t − t_rain)', () => {
    const storm = { durationsH: [1, 2], depthsMm: [0, 60] };
    const f = capacity(storm, horton(false), [0, 0.5, 1, 1.25, 2, 3]);
    expect(f.slice(0, 3)).toEqual([60, 60, 60]);
    expectClose(f[3] as number, hortonF(0.25), 1e-14);
    expectClose(f[4] as number, hortonF(1), 1e-14);
    expectClose(f[5] as number, hortonF(2), 1e-14);
  });

  it('grows back by e^(−k_r t) in a dry spell with recovery, and reaches f₀ after a long one', () => {
    // After 0.5 h of rain D = e^(−1.5); one dry hour at k_r = 0.4: 1 − D = (1 − e^(−1.5))e^(−0.4).
    const storm = { durationsH: [0.5, 1, 300], depthsMm: [40, 0, 0] };
    const m = horton(false, { recovers: true, recoveryPerH: 0.4 });
    const f = capacity(storm, m, [0.5, 1.5, 301.5]);
    expectClose(f[0] as number, hortonF(0.5), 1e-14);
    expectClose(f[1] as number, 8 + 52 * (1 - (1 - Math.exp(-1.5)) * Math.exp(-0.4)), 1e-14);
    expectClose(f[2] as number, 60, 1e-12);
  });
});

describe('Horton capacity by infiltrated depth (f from F(t))', () => {
  it('falls while rain below capacity soaks in (F = i·t), and follows the curve once ponded', () => {
    // 20 mm/h for 3 h: F = 20t until f(F) = 20, i.e. e^(−3τ_p) = 12/52,
    // τ_p = ln(52/12)/3, reached at t_p = F(τ_p)/20; after that τ = τ_p + (t − t_p).
    const storm = { durationsH: [3], depthsMm: [60] };
    const tauP = Math.log(52 / 12) / 3;
    const tP = hortonDepth(tauP) / 20;
    const times = [0, 0.2, tP * 0.9, tP, tP + 0.5, 3];
    const f = capacity(storm, horton(true), times);
    expect(f[0]).toBe(60);
    expectClose(f[1] as number, hortonF(tauAtDepth(20 * 0.2)), 1e-12);
    expectClose(f[2] as number, hortonF(tauAtDepth(20 * tP * 0.9)), 1e-12);
    expectClose(f[3] as number, 20, 1e-12);
    expectClose(f[4] as number, hortonF(tauP + 0.5), 1e-12);
    expectClose(f[5] as number, hortonF(tauP + 3 - tP), 1e-12);
  });

  it('at every bar end equals f at the depth infiltrated so far (the sum of the losses)', () => {
    fc.assert(
      fc.property(stormArb(20), (storm) => {
        const m = horton(true);
        const loss = computeLosses(storm, m).lossMm;
        const ends: number[] = [];
        let t = 0;
        for (const d of storm.durationsH) ends.push((t += d));
        const f = capacity(storm, m, ends);
        let depth = 0;
        for (let j = 0; j < ends.length; j++) {
          depth += loss[j] as number;
          expect(Math.abs((f[j] as number) - hortonF(tauAtDepth(depth)))).toBeLessThanOrEqual(1e-9 * 60);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe('Green–Ampt capacity', () => {
  const ga: LossMethod = { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 };

  it('is unbounded on dry soil and K(1 + ψΔθ/F) at each bar end, F the losses so far (Green & Ampt 1911)', () => {
    const storm = { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [2, 6, 10, 2] };
    const loss = computeLosses(storm, ga).lossMm;
    const f = capacity(storm, ga, [0, 0.5, 1, 1.5, 2]);
    expect(f[0]).toBe(Infinity);
    let depth = 0;
    for (let j = 0; j < 4; j++) {
      depth += loss[j] as number;
      expectClose(f[j + 1] as number, 3.4 * (1 + (88.9 * 0.3) / depth), 1e-12);
    }
  });

  it('with recovery is unbounded through a dry spell: the next rain starts a new front at the surface (see green-ampt-recovery.test.ts)', () => {
    const storm = { durationsH: [1, 2], depthsMm: [20, 0] };
    const m = { ...ga, recovers: true } as LossMethod;
    const f1 = computeLosses(storm, m).lossMm[0] as number;
    const f = capacity(storm, m, [1, 1.5, 3]);
    expectClose(f[0] as number, 3.4 * (1 + 26.67 / f1), 1e-12);
    expect(f[1]).toBe(Infinity);
    expect(f[2]).toBe(Infinity);
  });
});

describe('infiltrationCapacity', () => {
  it('has no capacity curve for the rate and ratio methods', () => {
    const storm = { durationsH: [1], depthsMm: [5] };
    expect(infiltrationCapacity(storm, { kind: 'constant', rateMmH: 3 }, [0, 1])).toBeNull();
    expect(infiltrationCapacity(storm, { kind: 'curve-number', cn: 70, iaRatio: 0.2 }, [0, 1])).toBeNull();
  });

  it('refuses times out of order, naming the time', () => {
    expectInputError(
      () => infiltrationCapacity({ durationsH: [1], depthsMm: [5] }, horton(true), [0, 0.5, 0.25]),
      'timesH',
      /Time 3: .*non-decreasing/,
    );
  });
});
