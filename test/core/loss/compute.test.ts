// The public computeLosses: for the constant rate it checks every bar in the
// same loop that computes it (src/core/loss/constant.ts), in blocks of
// PASS_BLOCK bars, with one copy of the loop for Float64Array columns and one for
// everything else. These tests hold that path to what validating first gave:
// the same InputError (field, bar, words) wherever the bad bar lies, nothing
// returned or written for a refused storm, and the same numbers either way.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  InputError,
  computeLosses,
  computeLossesUnchecked,
  validateMethod,
  validateStorm,
  type LossMethod,
  type Storm,
} from '../../../src/core';
import { PASS_BLOCK } from '../../../src/core/storm';
import { stormArb } from '../../helpers/arbitraries';
import { thrown } from '../../helpers/thrown';

function rejection(fn: () => unknown): InputError {
  const error = thrown(fn);
  expect(error).toBeInstanceOf(InputError);
  return error as InputError;
}

/** The error validating first gives: validateStorm, then validateMethod (the order computeLosses keeps). */
function referenceError(storm: Storm, method: LossMethod): InputError {
  return rejection(() => {
    validateStorm(storm);
    validateMethod(method);
  });
}

const fields = (e: InputError) => ({ field: e.field, index: e.index, message: e.message });

/** A long wet storm of 5-minute bars, 1 mm each (invented), as plain arrays. */
function longStorm(n: number): { durationsH: unknown[]; depthsMm: unknown[] } {
  const durationsH: unknown[] = [];
  const depthsMm: unknown[] = [];
  for (let k = 0; k < n; k++) {
    durationsH.push(1 / 12);
    depthsMm.push(1);
  }
  return { durationsH, depthsMm };
}

const PHI: LossMethod = { kind: 'constant', rateMmH: 4 };

describe('computeLosses with the constant rate (checks fused into the pass)', () => {
  // Worked by hand, φ = 4 mm/h. Bars (Δt h, P mm): (0.5, 1), (0.5, 6), (1, 2).
  // Capacity φ·Δt: 2, 2, 4 mm. Loss min(P, φΔt): 1, 2, 2. Excess: 0, 4, 0.
  // Totals: rain 9, loss 5, excess 4; runoff fraction 4/9; peak excess
  // intensity 4 mm / 0.5 h = 8 mm/h.
  const holey: number[] = new Array(3);
  [1, 6, 2].forEach((p, k) => (holey[k] = p));
  const layouts: [string, Storm][] = [
    ['plain arrays', { durationsH: [0.5, 0.5, 1], depthsMm: [1, 6, 2] }],
    ['Float64Array columns', { durationsH: new Float64Array([0.5, 0.5, 1]), depthsMm: new Float64Array([1, 6, 2]) }],
    ['holey arrays', { durationsH: [0.5, 0.5, 1], depthsMm: holey }],
    ['mixed columns', { durationsH: new Float64Array([0.5, 0.5, 1]), depthsMm: [1, 6, 2] }],
  ];
  it.each(layouts)('gives the hand-worked losses on %s', (_label, storm) => {
    const r = computeLosses(storm, PHI);
    expect(Array.from(r.lossMm)).toEqual([1, 2, 2]);
    expect(Array.from(r.excessMm)).toEqual([0, 4, 0]);
    expect([r.rainMm, r.totalLossMm, r.totalExcessMm, r.peakExcessMmH]).toEqual([9, 5, 4, 8]);
    expect(r.runoffFraction).toBe(4 / 9);
  });

  // The limits of time (time-limits.ts) hold in the fused pass as in validateStorm:
  // a bar of half a second, and two bars of 300 years (600 years past a 500-year span).
  it('refuses a bar shorter than one second, naming it', () => {
    const e = thrown(() => computeLosses({ durationsH: [1, 0.5 / 3600, 1], depthsMm: [1, 1, 1] }, PHI));
    expect(e).toMatchObject({ field: 'durationsH', index: 1 });
    expect((e as Error).message).toMatch(/^Bar 2: duration must be at least 1 second/);
  });
  it("refuses a storm that runs past a record's longest span, naming the bar that passes it", () => {
    const years300 = 300 * 8766;
    const e = thrown(() => computeLosses({ durationsH: [years300, years300], depthsMm: [1, 1] }, PHI));
    expect(e).toMatchObject({ field: 'durationsH', index: 1 });
    expect((e as Error).message).toMatch(
      /^Bar 2: the storm would run .* from its start; a record spans at most 500 years/,
    );
  });

  // 40,000 bars: full blocks and a part block. Bars either side of the first
  // block edge and the very last are the ones a blocked loop could miss.
  const N = 40_000;
  const badDepths: [string, unknown, string][] = [
    ['NaN', Number.NaN, 'NaN'],
    ['negative', -0.2, '-0.2'],
    ['infinite', Infinity, 'Infinity'],
    ['text', '1', '1'],
    ['null', null, 'null'],
    ['missing', undefined, 'undefined'],
  ];
  it('has storms long enough to cross block edges and end in a part block', () => {
    expect(N).toBeGreaterThan(2 * PASS_BLOCK);
    expect(N % PASS_BLOCK).not.toBe(0);
  });
  for (const at of [0, PASS_BLOCK - 1, PASS_BLOCK, N - 1]) {
    it.each(badDepths)(`names bar ${at + 1} of ${N} when its depth is %s`, (_label, bad, shown) => {
      const storm = longStorm(N);
      storm.depthsMm[at] = bad;
      const e = rejection(() => computeLosses(storm as unknown as Storm, PHI));
      expect(e.field).toBe('depthsMm');
      expect(e.index).toBe(at);
      expect(e.message).toBe(
        `Bar ${at + 1}: rainfall depth must be a finite number of millimetres, zero or more (got ${shown}).`,
      );
    });
  }

  const badDurations: [string, unknown][] = [
    ['zero', 0],
    ['negative', -1 / 12],
    ['NaN', Number.NaN],
    ['infinite', Infinity],
  ];
  it.each(badDurations)('names the last bar of a long storm when its duration is %s', (_label, bad) => {
    const storm = longStorm(N);
    storm.durationsH[N - 1] = bad;
    const e = rejection(() => computeLosses(storm as unknown as Storm, PHI));
    expect(fields(e)).toEqual(fields(referenceError(storm as unknown as Storm, PHI)));
    expect(fields(e)).toEqual({
      field: 'durationsH',
      index: N - 1,
      message: `Bar ${N}: duration must be a finite number of hours greater than zero (got ${String(bad)}).`,
    });
  });

  it('names the last bar of long Float64Array columns', () => {
    const durationsH = new Float64Array(N).fill(1 / 12);
    const depthsMm = new Float64Array(N).fill(1);
    depthsMm[N - 1] = -1;
    const e = rejection(() => computeLosses({ durationsH, depthsMm }, PHI));
    expect([e.field, e.index, e.message]).toEqual([
      'depthsMm',
      N - 1,
      `Bar ${N}: rainfall depth must be a finite number of millimetres, zero or more (got -1).`,
    ]);
  });

  it('names the first bad bar when several are bad, as validating first did', () => {
    const storm = longStorm(N);
    storm.depthsMm[30_000] = Infinity;
    storm.durationsH[20_000] = 0;
    storm.depthsMm[20_000] = Number.NaN;
    const e = rejection(() => computeLosses(storm as unknown as Storm, PHI));
    expect([e.field, e.index]).toEqual(['durationsH', 20_000]);
  });

  // The pass compares each bar against the lower limits only; a bar past a
  // record's span or an infinite depth shows in the sums at the end, and
  // validating again must still name the first bad bar, wherever it lies.
  it('names an infinite depth in an earlier block than a NaN depth', () => {
    const storm = longStorm(N);
    storm.depthsMm[5] = Infinity;
    storm.depthsMm[N - 1] = Number.NaN;
    const e = rejection(() => computeLosses(storm as unknown as Storm, PHI));
    expect(fields(e)).toEqual(fields(referenceError(storm as unknown as Storm, PHI)));
    expect([e.field, e.index]).toEqual(['depthsMm', 5]);
  });
  it('names a finite bar longer than a record before a bad depth after it', () => {
    const storm = longStorm(N);
    // 10⁹ h is about 114,000 years: past the 500-year limit on its own.
    storm.durationsH[PASS_BLOCK + 3] = 1e9;
    storm.depthsMm[N - 2] = -1;
    const e = rejection(() => computeLosses(storm as unknown as Storm, PHI));
    expect(fields(e)).toEqual(fields(referenceError(storm as unknown as Storm, PHI)));
    expect([e.field, e.index]).toEqual(['durationsH', PASS_BLOCK + 3]);
    expect(e.message).toMatch(new RegExp(`^Bar ${PASS_BLOCK + 4}: duration must be at most 500 years`));
  });
  it('accepts finite depths whose sum passes the largest double, as validating first does', () => {
    // Each depth is finite (7e307 < 1.797e308, the largest double), so every
    // bar is clean; their sum, 2.1e308, overflows to Infinity. φΔt = 4 mm/h ·
    // 1 h = 4 mm is lost from each bar (4 is far below an ulp of 7e307, so the
    // excess P − 4 rounds to P and the loss P − excess is 0 in floating point).
    const storm: Storm = { durationsH: [1, 1, 1], depthsMm: [7e307, 7e307, 7e307] };
    expect(() => validateStorm(storm)).not.toThrow();
    const r = computeLosses(storm, PHI);
    expect(Array.from(r.excessMm)).toEqual([7e307, 7e307, 7e307]);
    expect(Array.from(r.lossMm)).toEqual([0, 0, 0]);
    expect(r.rainMm).toBe(Infinity);
  });

  it('keeps the order of complaints: lists, then bars, then the start, then the method', () => {
    const badMethod = { kind: 'constant', rateMmH: -1 } as const;
    const cases: [Storm, LossMethod, string][] = [
      [{ durationsH: [1, 1], depthsMm: [1] }, badMethod, 'depthsMm'],
      [{ durationsH: [1, 1], depthsMm: [1, -1], startIso: 'soon' }, badMethod, 'depthsMm'],
      [{ durationsH: [1, 1], depthsMm: [1, 1], startIso: 'soon' }, badMethod, 'startIso'],
      [{ durationsH: [1, 1], depthsMm: [1, 1] }, badMethod, 'rateMmH'],
    ];
    for (const [storm, method, field] of cases) {
      const e = rejection(() => computeLosses(storm, method));
      expect(e.field).toBe(field);
      expect(fields(e)).toEqual(fields(referenceError(storm, method)));
    }
  });

  it('leaves the caller’s buffers holding their last result when a storm is refused', () => {
    const buffers = { lossMm: new Float64Array(N), excessMm: new Float64Array(N) };
    const good = longStorm(N);
    computeLosses(good as unknown as Storm, PHI, buffers);
    const before = [Float64Array.from(buffers.lossMm), Float64Array.from(buffers.excessMm)];
    // φ·Δt = 4/12 mm against 1 mm bars: every bar loses 1/3 mm.
    expect(buffers.lossMm[N - 1]).toBeCloseTo(1 / 3, 15);
    const bad = longStorm(N);
    for (let k = 0; k < N; k++) bad.depthsMm[k] = 2;
    bad.depthsMm[N - 1] = Number.NaN;
    expect(() => computeLosses(bad as unknown as Storm, PHI, buffers)).toThrow(InputError);
    expect(buffers.lossMm).toEqual(before[0]);
    expect(buffers.excessMm).toEqual(before[1]);
  });

  it('returns the same numbers for plain arrays, Float64Array columns and the unchecked path', () => {
    let reached = 0;
    fc.assert(
      fc.property(stormArb(1_000), fc.double({ min: 0, max: 60, noNaN: true }), (storm, rateMmH) => {
        const method: LossMethod = { kind: 'constant', rateMmH };
        const plain = computeLosses(storm, method);
        const typed = computeLosses(
          { durationsH: Float64Array.from(storm.durationsH), depthsMm: Float64Array.from(storm.depthsMm) },
          method,
        );
        const unchecked = computeLossesUnchecked(storm, method);
        for (const other of [typed, unchecked]) {
          expect(other.lossMm).toEqual(plain.lossMm);
          expect(other.excessMm).toEqual(plain.excessMm);
          expect([other.rainMm, other.totalLossMm, other.totalExcessMm, other.peakExcessMmH]).toEqual([
            plain.rainMm,
            plain.totalLossMm,
            plain.totalExcessMm,
            plain.peakExcessMmH,
          ]);
        }
        // Against the φ-index by its definition, loss = min(P, φΔt), bar by bar.
        const off: string[] = [];
        for (let k = 0; k < storm.depthsMm.length; k++) {
          const p = storm.depthsMm[k] as number;
          const expected = Math.min(p, rateMmH * (storm.durationsH[k] as number));
          const loss = plain.lossMm[k] as number;
          if (!(Math.abs(loss - expected) <= 1e-12 * Math.max(p, 1e-12))) off.push(`bar ${k}: ${loss} ≠ ${expected}`);
        }
        expect(off).toEqual([]);
        reached++;
      }),
      { numRuns: 200 },
    );
    expect(reached).toBe(200);
  });

  it('gives the φ-index by its definition across blocks of a long storm, in both copies of the loop', () => {
    // 40,000 bars of 1–15 min with depths 0–5 mm (invented), from a fixed
    // linear congruential sequence (Numerical Recipes' constants).
    let seed = 12345;
    const next = (): number => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 4294967296;
    const durationsH: number[] = [];
    const depthsMm: number[] = [];
    for (let k = 0; k < N; k++) {
      durationsH.push((1 + 14 * next()) / 60);
      depthsMm.push(next() < 0.3 ? 0 : 5 * next());
    }
    const method: LossMethod = { kind: 'constant', rateMmH: 9 };
    const plain = computeLosses({ durationsH, depthsMm }, method);
    const typed = computeLosses(
      { durationsH: Float64Array.from(durationsH), depthsMm: Float64Array.from(depthsMm) },
      method,
    );
    expect(typed.lossMm).toEqual(plain.lossMm);
    expect(typed.excessMm).toEqual(plain.excessMm);
    let rain = 0;
    let excess = 0;
    let peak = 0;
    const off: string[] = [];
    for (let k = 0; k < N; k++) {
      const p = depthsMm[k] as number;
      const dt = durationsH[k] as number;
      const e = Math.max(0, p - 9 * dt);
      rain += p;
      excess += e;
      peak = Math.max(peak, e / dt);
      if (!(Math.abs((plain.excessMm[k] as number) - e) <= 1e-12 * Math.max(p, 1e-12))) off.push(`bar ${k}`);
    }
    expect(off).toEqual([]);
    // Bar-by-bar sums in the same order: the blocks must carry the totals across exactly.
    expect(plain.rainMm).toBe(rain);
    expect(typed.rainMm).toBe(rain);
    expect(Math.abs(plain.totalExcessMm - excess)).toBeLessThanOrEqual(1e-12 * excess);
    expect(Math.abs(plain.peakExcessMmH - peak)).toBeLessThanOrEqual(1e-12 * peak);
  });

  it('refuses what validating first refused, for a bad value anywhere in a random storm', () => {
    const bad = fc.constantFrom<unknown>(Number.NaN, -1, -1e-9, Infinity, -Infinity, '2', null, undefined, true);
    let reached = 0;
    fc.assert(
      fc.property(stormArb(3_000), fc.nat(), fc.boolean(), bad, (storm, where, inDurations, value) => {
        const at = where % storm.depthsMm.length;
        const column: unknown[] = inDurations ? storm.durationsH : storm.depthsMm;
        column[at] = value;
        const e = rejection(() => computeLosses(storm, PHI));
        expect(fields(e)).toEqual(fields(referenceError(storm, PHI)));
        expect(e.index).toBe(at);
        expect(e.message.startsWith(`Bar ${at + 1}: `)).toBe(true);
        reached++;
      }),
      { numRuns: 300 },
    );
    expect(reached).toBe(300);
  });
});
