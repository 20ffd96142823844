// Fitting a transform parameter to an observed direct runoff hydrograph.
import { describe, expect, it } from 'vitest';
import {
  brentMinimize,
  fitTransform,
  peakTimeBetweenSamples,
  runoffHydrograph,
  type Excess,
  type Transform,
} from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';

const AREA = 5e6;
const STEP = 1 / 12;
// Invented storm excess: unequal bars, a dry bar, a tail.
const excess: Excess = { durationsH: [0.25, 0.25, 0.5, 0.25, 1], excessMm: [1, 4, 6, 0, 2] };

/** An "observed" record: the hydrograph of a known transform on the same step. */
function observedFrom(transform: Transform) {
  const h = runoffHydrograph(excess, transform, AREA, { stepH: STEP });
  return { timesH: h.timesH, directM3s: h.dischargeM3s };
}

describe('brentMinimize (Brent 1973, ch. 5)', () => {
  it('finds the minimum of a parabola and of cos on [3, 4] (at π)', () => {
    expectClose(brentMinimize((x) => (x - 2) ** 2 + 1, 0, 5, { relTol: 1e-10, absTol: 1e-12 }).x, 2, 1e-8);
    expectClose(brentMinimize(Math.cos, 3, 4, { relTol: 1e-10, absTol: 1e-12 }).x, Math.PI, 1e-8);
  });

  it('stays inside its interval when the minimum is at an end', () => {
    const { x } = brentMinimize((t) => t, 1, 2, { relTol: 0, absTol: 1e-9 });
    expect(x).toBeGreaterThanOrEqual(1);
    expect(x).toBeLessThan(1 + 1e-8);
  });
});

describe('fitTransform recovers the parameter that made the record', () => {
  const cases: [Transform, string, number][] = [
    [{ kind: 'nrcs-dimensionless', lagH: 1.3 }, 'lagH', 1.3],
    [{ kind: 'nrcs-dimensionless', lagH: 0.6, peakRateFactor: 300 }, 'lagH', 0.6],
    [{ kind: 'triangular', lagH: 0.7 }, 'lagH', 0.7],
    [{ kind: 'nash', n: 2.5, kH: 0.8 }, 'kH', 0.8],
    [{ kind: 'nash', n: 2.5, kH: 0.8 }, 'n', 2.5],
  ];

  it.each(cases)('%o: %s by the peak, to 1e-9', (truth, parameter, value) => {
    const start = { ...truth, [parameter]: 3 } as Transform;
    const r = fitTransform(excess, start, parameter, AREA, observedFrom(truth), 'peak', { stepH: STEP });
    expect(r.ok, r.ok ? '' : r.message).toBe(true);
    if (!r.ok) return;
    expectClose(r.value, value, 1e-9);
    expect((r.transform as unknown as Record<string, number>)[parameter]).toBe(r.value);
    expectClose(r.comparison.peakErrorPct as number, 0, 0, 1e-7);
    // The excess is not touched: the volume stays the excess volume, 13 mm on 5 km².
    expectClose(r.hydrograph.volumeM3, 13 * 5000, 1e-12);
  });

  it.each(cases)('%o: %s by the Nash–Sutcliffe efficiency, to 1e-6', (truth, parameter, value) => {
    const start = { ...truth, [parameter]: 3 } as Transform;
    const r = fitTransform(excess, start, parameter, AREA, observedFrom(truth), 'nse', { stepH: STEP });
    expect(r.ok, r.ok ? '' : r.message).toBe(true);
    if (!r.ok) return;
    expectClose(r.value, value, 1e-6);
    expectClose(r.achieved, 1, 0, 1e-10);
    expect(r.comparison.nse).toBe(r.achieved);
  });

  it('by the time of peak: Tp = D/2 + lag lands on the observed peak time', () => {
    // One 0.1 h pulse, observed peak at 2.0 h: the NRCS hydrograph peaks at
    // Tp = 0.05 + lag (its rows around the peak, 0.99, 1, 0.99, are symmetric, so the
    // parabola through the samples peaks at Tp when Tp is a sample), hence lag = 1.95 h.
    const pulse = { durationsH: [0.1], excessMm: [5] };
    const observed = { timesH: [0, 1, 1.9, 2, 2.1, 3, 6], directM3s: [0, 1, 5, 6, 5, 2, 0] };
    const r = fitTransform(pulse, { kind: 'nrcs-dimensionless', lagH: 1 }, 'lagH', AREA, observed, 'time-of-peak');
    expect(r.ok, r.ok ? '' : r.message).toBe(true);
    if (!r.ok) return;
    expectClose(r.value, 1.95, 0, 0.01);
    expectClose(peakTimeBetweenSamples(r.hydrograph), 2, 0, 0.01);
    expectClose(r.comparison.timingErrorH, 0, 0, 0.05);
  });
});

describe('fitTransform says when there is no answer', () => {
  const tri: Transform = { kind: 'triangular', lagH: 1 };
  const observed = observedFrom({ kind: 'triangular', lagH: 0.7 });

  it('for a parameter the transform does not have', () => {
    const r = fitTransform(excess, { kind: 'nash', n: 3, kH: 1 }, 'lagH', AREA, observed, 'peak');
    expect(r).toMatchObject({ ok: false, reason: 'unknown-parameter' });
    if (!r.ok) expect(r.message).toMatch(/n, kH/);
    const own = fitTransform(
      excess,
      { kind: 'unit-hydrograph', durationH: 1, stepH: 1, ordinatesM3sPerMm: [0, 1, 0.5, 0] },
      'durationH',
      AREA,
      observed,
      'peak',
    );
    expect(own).toMatchObject({ ok: false, reason: 'unknown-parameter' });
    if (!own.ok) expect(own.message).toMatch(/no parameter to fit/);
    if (!r.ok) expect(r.message).toMatch(/^Nash cascade has no parameter "lagH"/);
  });

  it('for bad input, with the field in the message', () => {
    const badRecord = fitTransform(excess, tri, 'lagH', AREA, { timesH: [0, 1], directM3s: [0, -1] }, 'peak');
    expect(badRecord).toMatchObject({ ok: false, reason: 'invalid-input' });
    if (!badRecord.ok) expect(badRecord.message).toMatch(/observed hydrograph, sample 2/);
    expect(fitTransform(excess, tri, 'lagH', NaN, observed, 'peak')).toMatchObject({
      ok: false,
      reason: 'invalid-input',
    });
    expect(fitTransform(excess, tri, 'lagH', AREA, observed, 'volume' as never)).toMatchObject({
      ok: false,
      reason: 'invalid-input',
    });
    expect(fitTransform(excess, tri, 'lagH', AREA, observed, 'peak', { minValue: 2, maxValue: 1 })).toMatchObject({
      ok: false,
      reason: 'invalid-input',
    });
  });

  it('for a range the transform cannot take at this step, without throwing', () => {
    // At a lag of 500 h a 0.0001 h step needs a response of 1.3e7 steps.
    const r = fitTransform(excess, tri, 'lagH', AREA, observed, 'peak', { stepH: 1e-4, minValue: 500, maxValue: 1000 });
    expect(r).toMatchObject({ ok: false, reason: 'invalid-input' });
    if (!r.ok) expect(r.message).toMatch(/output step of at least/);
  });

  it('for a record that never rises', () => {
    const r = fitTransform(excess, tri, 'lagH', AREA, { timesH: [0, 5], directM3s: [0, 0] }, 'peak');
    expect(r).toMatchObject({ ok: false, reason: 'invalid-target' });
  });

  it('for a peak no lag in the range reaches, naming the closest end', () => {
    // Twice the observed peak: only a lag below the range's 0.01 h could give it.
    const high = { timesH: observed.timesH, directM3s: Array.from(observed.directM3s, (q) => 4 * q) };
    const r = fitTransform(excess, tri, 'lagH', AREA, high, 'peak', { stepH: STEP });
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'min' });
    if (!r.ok) expect(r.message).toMatch(/No lag from 0\.01 to/);
  });

  it('for the best efficiency past the end of the range', () => {
    const r = fitTransform(excess, tri, 'lagH', AREA, observed, 'nse', { stepH: STEP, maxValue: 0.4 });
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached', bound: 'max', boundValue: 0.4 });
  });

  it('for a time of peak the computed peak jumps over, from one burst to another', () => {
    // A short sharp burst at the start and a long heavy one from 10 h: a short lag
    // peaks on the first, a long lag on the second; no lag puts the peak at 5 h.
    const twoBursts = { durationsH: [0.25, 9.75, 6], excessMm: [5, 0, 30] };
    const at5 = { timesH: [0, 4, 5, 6, 20], directM3s: [0, 1, 3, 1, 0] };
    const r = fitTransform(twoBursts, tri, 'lagH', AREA, at5, 'time-of-peak');
    expect(r).toMatchObject({ ok: false, reason: 'no-exact-match' });
    if (!r.ok) expect(r.message).toMatch(/jumps/);
  });
});
