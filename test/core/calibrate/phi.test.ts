// Exact φ-index calibration: hand cases, the edge cases the contract fixes, and
// agreement with a brute-force bisection on random storms of unequal bars.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  calibrate,
  calibrateUnchecked,
  computeLosses,
  exactPhi,
  peakIntensityMmH,
  totalDepthMm,
  type Storm,
} from '../../../src/core';
import { validateStormDepthMm } from '../../../src/core/storm';
import { exactPhiByBuckets, exactPhiBySelection, exactPhiInBracket } from '../../../src/core/calibrate/phi';
import { stormArb } from '../../helpers/arbitraries';
import { seeded } from '../../helpers/fuzz';
import { expectClose } from '../../helpers/tolerance';

/** The answer the slow way: bisect R(φ) − target on [0, i_max] to the last bit. */
function bruteForcePhi(storm: Storm, target: number): number {
  const runoff = (phi: number): number => computeLosses(storm, { kind: 'constant', rateMmH: phi }).totalExcessMm;
  let lo = 0;
  let hi = peakIntensityMmH(storm);
  for (let i = 0; i < 200 && hi - lo > 0; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    if (runoff(mid) > target) lo = mid;
    else hi = mid;
  }
  return hi;
}

const storm = { durationsH: [0.5, 0.5, 1, 0.25], depthsMm: [2, 10, 6, 5] };

describe('exact φ-index calibration', () => {
  it('solves a hand-worked case with unequal bars', () => {
    // Target 10 mm. Guess bars 2, 3, 4 above φ: 21 − φ·1.75 = 10 → φ = 6.2857;
    // bar 3 (6 mm/h) is then below φ, so drop it: 15 − 0.75φ = 10 → φ = 6.667,
    // above bar 3's 6 mm/h and below bar 4's 20 mm/h: consistent.
    const r = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', 10);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expectClose(r.value, 20 / 3, 1e-14);
      expect(r.method).toEqual({ kind: 'constant', rateMmH: r.value });
    }
  });

  it('Chow, Maidment & Mays (1988) Example 5.2.1 (values from memory): 2.55 in of direct runoff gives φ = 2.04 in/h', () => {
    // From memory, not checked against the printed page (see simple-methods.test.ts).
    const shoal = { durationsH: Array(7).fill(0.5), depthsMm: [0.15, 0.26, 1.33, 2.2, 2.08, 0.2, 0.09] };
    const r = calibrate(shoal, { kind: 'constant', rateMmH: 0 }, 'rateMmH', 2.55);
    expect(r.ok && r.value).toBeCloseTo(2.04, 10);
  });

  it('target 0 returns the peak intensity and target = rainfall returns 0', () => {
    const zero = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', 0);
    expect(zero.ok && zero.value).toBe(20);
    const all = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', 23);
    expect(all.ok && all.value).toBe(0);
  });

  it('says no, with a reason, to a negative target or one above the rainfall', () => {
    const neg = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', -1);
    expect(neg).toMatchObject({ ok: false, reason: 'negative-target' });
    const over = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', 23.5);
    expect(over).toMatchObject({ ok: false, reason: 'exceeds-rainfall' });
    if (!over.ok) expect(over.message).toMatch(/more than the storm's rainfall \(23 mm\)/);
    const nan = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', Number.NaN);
    expect(nan).toMatchObject({ ok: false, reason: 'invalid-target' });
  });

  it('handles ties: bars of equal intensity are decided together', () => {
    const flat = { durationsH: [1, 1, 1, 1], depthsMm: [5, 5, 5, 5] };
    const r = calibrate(flat, { kind: 'constant', rateMmH: 0 }, 'rateMmH', 8);
    expect(r.ok && r.value).toBe(3); // 4·(5 − φ) = 8
    expect(exactPhi(flat.durationsH, flat.depthsMm, 0)).toBe(5);
  });

  it('a dry storm: the only reachable target is 0, met by φ = 0', () => {
    const dry = { durationsH: [1, 1], depthsMm: [0, 0] };
    expect(calibrate(dry, { kind: 'constant', rateMmH: 2 }, 'rateMmH', 0)).toMatchObject({ ok: true, value: 0 });
  });

  it('agrees with brute-force bisection and reproduces the target (random storms, unequal bars)', () => {
    fc.assert(
      fc.property(stormArb(80), fc.double({ min: 0, max: 1, noNaN: true }), (s, share) => {
        const rain = totalDepthMm(s);
        const target = share * rain;
        const r = calibrate(s, { kind: 'constant', rateMmH: 0 }, 'rateMmH', target);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        const brute = bruteForcePhi(s, target);
        // Relative to φ, with a floor of 1e-12 of the peak intensity for φ near 0.
        expect(Math.abs(r.value - brute)).toBeLessThanOrEqual(1e-9 * brute + 1e-12 * peakIntensityMmH(s));
        const back = computeLosses(s, r.method).totalExcessMm;
        expect(Math.abs(back - target)).toBeLessThanOrEqual(1e-9 * Math.max(rain, 1e-9));
      }),
      { numRuns: 500 },
    );
  });

  it('returns the smallest φ: any smaller rate gives more runoff', () => {
    fc.assert(
      fc.property(stormArb(40), fc.double({ min: 0, max: 0.999, noNaN: true }), (s, share) => {
        const target = share * totalDepthMm(s);
        const r = calibrate(s, { kind: 'constant', rateMmH: 0 }, 'rateMmH', target);
        if (!r.ok || r.value === 0) return;
        const below = computeLosses(s, { kind: 'constant', rateMmH: r.value * (1 - 1e-6) }).totalExcessMm;
        expect(below).toBeGreaterThan(target);
      }),
      { numRuns: 300 },
    );
  });

  it('is linear-time friendly: sorted and reverse-sorted storms of 20,000 bars give the bisection answer', () => {
    const n = 20000;
    const up = {
      durationsH: Array.from({ length: n }, (_, k) => 0.1 + (k % 7) * 0.05),
      depthsMm: Array.from({ length: n }, (_, k) => k / 100),
    };
    const down = { durationsH: [...up.durationsH].reverse(), depthsMm: [...up.depthsMm].reverse() };
    for (const s of [up, down]) {
      const target = 0.4 * totalDepthMm(s);
      const r = calibrate(s, { kind: 'constant', rateMmH: 0 }, 'rateMmH', target);
      expect(r.ok).toBe(true);
      if (r.ok) expectClose(computeLosses(s, r.method).totalExcessMm, target, 1e-9);
    }
  });
});

describe('the three routes to the exact φ on long storms', () => {
  // Long storms take the sampled-bracket route (≥ 16,384 bars); it must agree
  // with plain selection and with the bucket route, including storms of
  // gauge-like discrete depths full of ties and storms where the guess misses.
  const longStorm = (n: number, seed: number, discrete: boolean) => {
    let s = seed >>> 0 || 1;
    const rand = (): number => {
      s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
      return s / 4294967296;
    };
    const durationsH: number[] = [];
    const depthsMm: number[] = [];
    for (let k = 0; k < n; k++) {
      durationsH.push(discrete ? (rand() < 0.8 ? 1 / 6 : 1 / 12) : (1 + 14 * rand()) / 60);
      const wet = rand() > 0.35;
      depthsMm.push(!wet ? 0 : discrete ? 0.2 * Math.ceil(rand() * 20) : -Math.log(rand() + 1e-12) * 3);
    }
    return { durationsH, depthsMm };
  };

  it.each([
    [20000, 3, false],
    [50000, 11, true],
    [40000, 99, false],
  ] as const)(
    '%i bars (seed %i, discrete %s): sampled, bucket and plain selection agree and reproduce the target',
    (n, seed, discrete) => {
      const s = longStorm(n, seed, discrete);
      const rain = totalDepthMm(s);
      for (const share of [0, 0.001, 0.05, 0.3, 0.7, 0.999, 1]) {
        const target = share * rain;
        const a = exactPhi(s.durationsH, s.depthsMm, target);
        const b = exactPhiByBuckets(s.durationsH, s.depthsMm, target);
        const c = exactPhiBySelection(s.durationsH, s.depthsMm, target);
        const peak = peakIntensityMmH(s);
        expect(Math.abs(a - c)).toBeLessThanOrEqual(1e-9 * c + 1e-12 * peak);
        expect(Math.abs(b - c)).toBeLessThanOrEqual(1e-9 * c + 1e-12 * peak);
        const back = computeLosses(s, { kind: 'constant', rateMmH: a }).totalExcessMm;
        expect(Math.abs(back - target)).toBeLessThanOrEqual(1e-9 * rain);
      }
    },
  );

  it('a bracket that misses φ is refused, so the caller falls back', () => {
    const s = longStorm(20000, 5, false);
    const target = 0.3 * totalDepthMm(s);
    const phi = exactPhiBySelection(s.durationsH, s.depthsMm, target);
    expect(exactPhiInBracket(s.durationsH, s.depthsMm, target, phi * 1.5, phi * 2)).toBeNull();
    expect(exactPhiInBracket(s.durationsH, s.depthsMm, target, 0, phi * 0.5)).toBeNull();
    const inside = exactPhiInBracket(s.durationsH, s.depthsMm, target, phi * 0.9, phi * 1.1);
    expect(inside).not.toBeNull();
    expect(Math.abs((inside as number) - phi)).toBeLessThanOrEqual(1e-9 * phi);
  });
});

describe('calibrate checks the bars in the exact φ pass itself', () => {
  // calibrate reads a long storm once for the constant rate: the bracket pass
  // checks each bar as it reads it (exactPhiChecked), where it used to
  // validate the storm first. The answer and every refusal must be what the
  // validated road gives: calibrateUnchecked after validateStormDepthMm.
  const validatedRoad = (s: Storm, target: number) => {
    try {
      const rain = validateStormDepthMm(s);
      return calibrateUnchecked(s, { kind: 'constant', rateMmH: 1 }, 'rateMmH', target, rain);
    } catch (error) {
      return { ok: false, message: (error as Error).message };
    }
  };
  const gaugeLike = (n: number, seed: number): { durationsH: number[]; depthsMm: number[] } => {
    const rand = seeded(seed);
    const durationsH: number[] = [];
    const depthsMm: number[] = [];
    for (let k = 0; k < n; k++) {
      durationsH.push(rand() < 0.9 ? 1 / 12 : 1 / 4);
      depthsMm.push(rand() < 0.3 ? 0 : -Math.log(rand() + 1e-12) * 2);
    }
    return { durationsH, depthsMm };
  };

  it.each([
    [300, 1],
    [20000, 2],
    [40000, 3],
  ])('%i bars: the same φ and excess as the validated road, plain lists and Float64Array', (n, seed) => {
    const plain = gaugeLike(n, seed);
    const typed = { durationsH: Float64Array.from(plain.durationsH), depthsMm: Float64Array.from(plain.depthsMm) };
    const rain = totalDepthMm(plain);
    for (const target of [0, 0.2 * rain, 0.65 * rain, rain, rain * (1 + 1e-13)]) {
      const expected = validatedRoad(plain, target);
      expect(expected.ok).toBe(true);
      expect(calibrate(plain, { kind: 'constant', rateMmH: 1 }, 'rateMmH', target)).toEqual(expected);
      expect(calibrate(typed, { kind: 'constant', rateMmH: 1 }, 'rateMmH', target)).toEqual(expected);
    }
  });

  it('refuses every unclean storm with the message of the validated road, naming the bar', () => {
    const base = gaugeLike(20000, 7);
    const at = 12345; // a bar well inside the bracket pass, far from its first block
    const bad: [string, (s: { durationsH: unknown[]; depthsMm: unknown[] }) => void][] = [
      ['NaN depth', (s) => (s.depthsMm[at] = NaN)],
      ['negative depth', (s) => (s.depthsMm[at] = -0.1)],
      ['infinite depth', (s) => (s.depthsMm[at] = Infinity)],
      ['depth as text', (s) => (s.depthsMm[at] = '1.5')],
      ['missing depth', (s) => (s.depthsMm[at] = undefined)],
      ['zero duration', (s) => (s.durationsH[at] = 0)],
      ['duration past a record', (s) => (s.durationsH[at] = 1e9)],
      ['duration as text', (s) => (s.durationsH[at] = '0.25')],
      ['one depth too few', (s) => s.depthsMm.pop()],
    ];
    for (const [what, spoil] of bad) {
      const s = { durationsH: [...base.durationsH] as unknown[], depthsMm: [...base.depthsMm] as unknown[] };
      spoil(s);
      const storm = s as unknown as Storm;
      const expected = validatedRoad(storm, 10);
      if (expected.ok) throw new Error(`${what}: the validated road accepted the storm`);
      const got = calibrate(storm, { kind: 'constant', rateMmH: 1 }, 'rateMmH', 10);
      expect(got, what).toMatchObject({ ok: false, reason: 'invalid-input', message: expected.message });
    }
  });

  it('a target above the rain is refused as before, with the rain in the message', () => {
    const s = gaugeLike(20000, 9);
    const rain = totalDepthMm(s);
    const got = calibrate(s, { kind: 'constant', rateMmH: 1 }, 'rateMmH', rain * 1.01);
    expect(got).toEqual(validatedRoad(s, rain * 1.01));
    expect(got).toMatchObject({ ok: false, reason: 'exceeds-rainfall' });
  });
});
